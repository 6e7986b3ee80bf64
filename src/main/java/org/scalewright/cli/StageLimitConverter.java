package org.scalewright.cli;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.scalewright.design.wirecheck.StageLimit;
import org.scalewright.model.UnitConversions;
import picocli.CommandLine;

/** Reads {@code --stage-above}: a force ({@code 10kN}, {@code 9000N}, {@code 2000lbf}) or a percent ({@code 5%}). */
final class StageLimitConverter implements CommandLine.ITypeConverter<StageLimit> {
    private static final Pattern FORM = Pattern.compile("\\s*([0-9]*\\.?[0-9]+)\\s*(%|kn|n|lbf)\\s*");

    @Override
    public StageLimit convert(String value) {
        Matcher m = FORM.matcher(value.toLowerCase(Locale.ROOT));
        if (!m.matches()) {
            throw new CommandLine.TypeConversionException("expected a force or a percent of the present total "
                    + "tension, such as 10kN, 2200lbf or 5%, was '" + value + "'");
        }
        double v = Double.parseDouble(m.group(1));
        if (!(v > 0)) {
            throw new CommandLine.TypeConversionException("the stage limit must be > 0, was '" + value + "'");
        }
        return switch (m.group(2)) {
            case "%" -> StageLimit.percentOfTotal(v);
            case "kn" -> StageLimit.kiloNewtons(v);
            case "n" -> StageLimit.kiloNewtons(v / 1e3);
            default -> StageLimit.kiloNewtons(UnitConversions.lbfToNewtons(v) / 1e3);
        };
    }
}
