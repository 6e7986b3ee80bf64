package org.scalewright.app.session;

import java.nio.file.Path;
import java.util.Optional;
import org.scalewright.io.BuiltInData;
import org.scalewright.physics.StrengthTable;

/**
 * The breaking-strength table the analysis uses: the built-in ASTM A228 minimum (the
 * default) or maximum, or a wire maker's table read from a file.
 *
 * @param label shown in the window
 * @param table the table
 * @param file  the maker's file, or empty for a built-in table
 */
public record StrengthChoice(String label, StrengthTable table, Optional<Path> file) {

    public static StrengthChoice minimum() {
        return new StrengthChoice("ASTM A228 minimum", BuiltInData.astmMinimum(), Optional.empty());
    }

    public static StrengthChoice maximum() {
        return new StrengthChoice("ASTM A228 maximum", BuiltInData.astmMaximum(), Optional.empty());
    }

    public static StrengthChoice maker(Path file, StrengthTable table) {
        return new StrengthChoice("maker: " + file.getFileName(), table, Optional.of(file));
    }

    @Override
    public String toString() {
        return label;
    }
}
