package org.scalewright.cli;

import java.nio.file.Path;
import org.scalewright.io.BadInputException;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.StrengthTableReader;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;
import org.scalewright.physics.StrengthTable;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The inputs most commands share: the scale sheet, the pitch standard and the strength table. */
public final class Inputs {
    @Parameters(index = "0", paramLabel = "SCALE.csv", description = "the scale sheet (CSV, see scales/README.md)")
    Path scaleFile;

    @Option(names = "--a4", paramLabel = "HZ",
            description = "pitch standard: frequency of A4 in Hz (default: the sheet's '# a4_hz:' or 440)")
    Double a4;

    @Option(names = "--strength", paramLabel = "TABLE.csv",
            description = "a wire maker's strength table (default: ASTM A228 minimum tensile strength)")
    Path strengthFile;

    /** @return the scale as read, tuned to {@code --a4} where given */
    public Scale scale() throws BadInputException {
        PitchStandard pitch = pitch();
        Scale s = ScaleSheetReader.standard().read(scaleFile);
        return pitch == null ? s : s.withPitch(pitch);
    }

    /**
     * @return the pitch standard of {@code --a4}, or null where it is not given
     * @throws org.scalewright.model.InvalidInput when {@code --a4} is outside the accepted range
     */
    public PitchStandard pitch() {
        return a4 == null ? null : PitchStandard.of(a4);
    }

    /** @return the strength table chosen */
    public StrengthTable strength() throws BadInputException {
        return strengthFile == null ? BuiltInData.astmMinimum() : StrengthTableReader.read(strengthFile);
    }

    /** @return the scale as read ({@link #scale()}) analysed with the chosen settings ({@link #settings()}) */
    public ScaleAnalysis analysis() throws BadInputException {
        return ScaleAnalyzer.analyze(scale(), settings());
    }

    /** @return the analysis settings for the chosen strength table */
    public AnalysisSettings settings() throws BadInputException {
        return BuiltInData.defaultSettings().withStrength(strength());
    }
}
