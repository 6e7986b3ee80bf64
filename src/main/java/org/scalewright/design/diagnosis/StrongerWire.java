package org.scalewright.design.diagnosis;

import java.util.List;
import java.util.Locale;
import org.scalewright.physics.StrengthTable;

/**
 * Restring the range with a stronger wire: how much stronger it must be, and which loaded maker's
 * table would do.
 *
 * @param tableName          the table the wire is judged by now
 * @param requiredStrongerPct how much stronger than that table the wire must be at these
 *                           diameters, % (checked by recomputing with the table scaled by it)
 * @param maxPctWithRequired the highest percent in the range with a wire that much stronger, %
 * @param fixes              true when a wire that much stronger brings the range under the
 *                           caution band (recomputed with the scaled table)
 * @param options            the loaded makers' tables tried, each with its effect
 */
public record StrongerWire(String tableName, double requiredStrongerPct, double maxPctWithRequired, boolean fixes,
                           List<TableOption> options) implements Remedy {

    /**
     * One maker's table tried on the range.
     *
     * @param table       the table
     * @param maxPctAfter the highest percent of breaking strength in the range under it, %
     * @param fixes       true when that is under the caution band
     */
    public record TableOption(StrengthTable table, double maxPctAfter, boolean fixes) {
    }

    public StrongerWire {
        options = List.copyOf(options);
    }

    @Override
    public double maxPctAfter() {
        return maxPctWithRequired;
    }

    /** @return the loaded tables that would do */
    public List<TableOption> thatWouldDo() {
        return options.stream().filter(TableOption::fixes).toList();
    }

    @Override
    public String describe() {
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "A stronger wire: at least %.1f %% stronger "
                + "than %s at these diameters (that brings the highest note to %.1f %%).", requiredStrongerPct,
                tableName, maxPctWithRequired));
        if (options.isEmpty()) {
            b.append(" No other maker's table was loaded to try.");
        }
        for (TableOption o : options) {
            b.append(String.format(Locale.ROOT, " '%s': highest note %.1f %%, %s.", o.table().name(), o.maxPctAfter(),
                    o.fixes() ? "would do" : "not enough"));
        }
        return b.toString();
    }
}
