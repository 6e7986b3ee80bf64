package org.scalewright.cli;

import org.scalewright.design.wirecheck.SizeRounding;
import picocli.CommandLine;

/** Reads {@code nearest}, {@code up} or {@code down} for {@code --to-metric} and {@code --to-inch}. */
final class SizeRoundingConverter implements CommandLine.ITypeConverter<SizeRounding> {
    @Override
    public SizeRounding convert(String value) {
        try {
            return SizeRounding.parse(value);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.TypeConversionException("expected nearest, up or down, was '" + value + "'");
        }
    }
}
