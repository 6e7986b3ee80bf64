package org.scalewright.physics;

/**
 * Limits outside which a legal value is flagged as implausible for a piano string (it still
 * loads and is analysed). Common practice, no source.
 *
 * @param minSpeakingLength shortest plausible speaking length, m
 * @param maxSpeakingLength longest plausible speaking length, m
 * @param minWire           thinnest plausible plain wire or core, m
 * @param maxPlainWire      thickest plausible plain wire, m
 * @param maxCore           thickest plausible wound-string core, m
 * @param maxWrap           thickest plausible wrap wire, m
 */
public record PlausibleRange(double minSpeakingLength, double maxSpeakingLength, double minWire,
                             double maxPlainWire, double maxCore, double maxWrap) {
    /** 30 mm – 2.6 m speaking length; plain wire 0.5–2.0 mm; core up to 3 mm; wrap up to 3 mm. */
    public static final PlausibleRange DEFAULT = new PlausibleRange(0.030, 2.6, 0.0005, 0.002, 0.003, 0.003);
}
