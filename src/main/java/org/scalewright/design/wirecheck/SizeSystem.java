package org.scalewright.design.wirecheck;

/** The size system plain wire is converted to for a wire check. */
public enum SizeSystem {
    /** keep every wire as it is */
    KEEP,
    /** metric diameters (the metric plain-wire list) */
    METRIC,
    /** music-wire size numbers (inch diameters) */
    INCH
}
