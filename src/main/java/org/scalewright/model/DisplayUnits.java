package org.scalewright.model;


/**
 * The units lengths and forces are shown and entered in. Stress is always shown in MPa,
 * percent of breaking strength and inharmonicity have no unit.
 *
 * @param length unit of speaking lengths and wire diameters
 * @param force  unit of tensions
 */
public record DisplayUnits(LengthUnit length, ForceUnit force) {
    /** Millimetres and newtons. */
    public static final DisplayUnits METRIC = new DisplayUnits(LengthUnit.MM, ForceUnit.N);
    /** Inches and pounds-force. */
    public static final DisplayUnits IMPERIAL = new DisplayUnits(LengthUnit.IN, ForceUnit.LBF);

    public DisplayUnits {
        if (length == null || force == null) {
            throw new IllegalArgumentException("display units need a length and a force unit, were "
                    + length + " and " + force);
        }
    }

    /** @return the same units with another force unit */
    public DisplayUnits withForce(ForceUnit f) {
        return new DisplayUnits(length, f);
    }

    /** @return the same units with another length unit */
    public DisplayUnits withLength(LengthUnit l) {
        return new DisplayUnits(l, force);
    }
}
