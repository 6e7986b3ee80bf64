package org.scalewright.cli;

import org.scalewright.model.KeyRange;
import picocli.CommandLine.Option;

/** The required {@code --keys A-B} of the commands that work on a range of keys. */
public final class KeysOption {
    @Option(names = "--keys", required = true, paramLabel = "A-B", converter = KeyRangeConverter.class,
            description = "the keys: key numbers or note names, e.g. 29-88 or C#3-C8")
    KeyRange keys;
}
