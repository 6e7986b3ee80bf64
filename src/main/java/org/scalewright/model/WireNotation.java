package org.scalewright.model;

import java.util.OptionalDouble;

/**
 * The one way a string's wire is written, in the terminal, the window, the CSV files and the PDF:
 * <ul>
 * <li>plain wire given by size: {@code #14.5}; given by diameter: {@code 1.100 mm} ({@code 0.0433 in});</li>
 * <li>wound string: core / inner wrap [+ outer wrap], the unit, the wrap metal's symbol and the
 *     outside diameter (core + 2 · wrap1 + 2 · wrap2) in the same unit:
 *     {@code 1.600 / 1.250 + 1.080 mm Cu (OD 6.260)}, {@code #17 / 0.450 mm Fe (OD 1.941)}.</li>
 * </ul>
 * Diameters are written to 0.001 mm, with a fourth decimal only where the value has one (a planned
 * 1.075 mm core reads 1.075, never 1.08), or to 0.0001 in. Metals: {@code Cu} copper, {@code Fe}
 * soft iron, {@code St} steel.
 */
public final class WireNotation {
    /** The notation in words, for the legend of a table or a file. */
    public static final String LEGEND = "wire: #size or diameter; wound: core / wrap1 + wrap2, unit, wrap metal "
            + "(Cu copper, Fe iron, St steel), (OD outside diameter)";

    private WireNotation() {
    }

    /** @return the symbol of a wrap metal: {@code Cu}, {@code Fe} or {@code St} */
    public static String symbol(WrapMetal metal) {
        return switch (metal) {
            case COPPER -> "Cu";
            case IRON -> "Fe";
            case STEEL -> "St";
        };
    }

    /** @return a note's wire in millimetres */
    public static String of(Note note) {
        return of(note, LengthUnit.MM);
    }

    /** @return a note's wire with diameters in {@code unit} */
    public static String of(Note note, LengthUnit unit) {
        return of(note.wire().musicWireSize(), note.wire().diameter(), note.isWound() ? note.wrap() : null, unit);
    }

    /** @return a plain wire (or core) alone: {@code #14.5} or {@code 1.100 mm} */
    public static String of(CoreWire wire, LengthUnit unit) {
        return of(wire.musicWireSize(), wire.diameter(), null, unit);
    }

    /**
     * @param size     the music-wire size of the plain wire or core, if it was given by size
     * @param diameter the diameter of the plain wire or core, m
     * @param wrap     the wrap of a wound string, or null for plain wire
     * @param unit     the unit for diameters
     */
    public static String of(OptionalDouble size, double diameter, Wrap wrap, LengthUnit unit) {
        String core = size.isPresent() ? "#" + NumberText.plain(size.getAsDouble()) : diameter(diameter, unit);
        if (wrap == null) {
            return size.isPresent() ? core : core + " " + unit.symbol();
        }
        StringBuilder b = new StringBuilder(48).append(core).append(" / ").append(diameter(wrap.inner(), unit));
        if (wrap.isDouble()) {
            b.append(" + ").append(diameter(wrap.outer(), unit));
        }
        double od = diameter + 2 * wrap.inner() + 2 * wrap.outer();
        return b.append(' ').append(unit.symbol()).append(' ').append(symbol(wrap.metal()))
                .append(" (OD ").append(diameter(od, unit)).append(')').toString();
    }

    /** @return a diameter (m) in {@code unit} without the unit: {@code 1.075}, {@code 0.0433} */
    public static String diameter(double metres, LengthUnit unit) {
        return unit == LengthUnit.MM ? NumberText.upTo(unit.fromMetres(metres), 3, 4)
                : NumberText.fixed(unit.fromMetres(metres), 4);
    }
}
