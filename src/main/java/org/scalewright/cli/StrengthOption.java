package org.scalewright.cli;

import java.nio.file.Path;
import org.scalewright.io.BadInputException;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.StrengthTableReader;
import org.scalewright.physics.AnalysisSettings;
import picocli.CommandLine.Option;

/** The {@code --strength TABLE.csv} of the archive's break list: the table the breaks are compared with. */
public final class StrengthOption {
    @Option(names = "--strength", paramLabel = "TABLE.csv",
            description = "a wire maker's strength table to compare with (default: ASTM A228 minimum tensile strength)")
    Path file;

    /** @return the default analysis settings with the table chosen */
    AnalysisSettings settings() throws BadInputException {
        return BuiltInData.defaultSettings().withStrength(file == null ? BuiltInData.astmMinimum()
                : StrengthTableReader.read(file));
    }
}
