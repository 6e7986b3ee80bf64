package org.scalewright.cli;

import org.scalewright.design.wirecheck.SizeRounding;
import org.scalewright.model.InvalidInput;
import picocli.CommandLine;

/** Reads {@code nearest}, {@code up} or {@code down} for {@code --to-metric} and {@code --to-inch}. */
final class SizeRoundingConverter implements CommandLine.ITypeConverter<SizeRounding> {
    @Override
    public SizeRounding convert(String value) {
        try {
            return SizeRounding.parse(value);
        } catch (InvalidInput e) {
            throw new CommandLine.TypeConversionException(e.getMessage());
        }
    }
}
