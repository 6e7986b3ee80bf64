package org.scalewright.cli;

import org.scalewright.model.InvalidInput;
import org.scalewright.model.KeyRange;
import picocli.CommandLine;

/** Reads a {@code --keys A-B} option: key numbers or note names ({@code 33-88}, {@code F3-C8}). */
public final class KeyRangeConverter implements CommandLine.ITypeConverter<KeyRange> {
    @Override
    public KeyRange convert(String value) {
        try {
            return KeyRange.parse(value);
        } catch (InvalidInput e) {
            throw new CommandLine.TypeConversionException(e.getMessage());
        }
    }
}
