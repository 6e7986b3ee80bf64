package org.scalewright.physics;

/**
 * Fast fixed-point formatting for flag texts, which are built on every analysis (the
 * general {@code String.format} costs microseconds a call). Rounds half away from zero.
 */
final class Decimals {
    private static final long[] POW10 = {1, 10, 100, 1000, 10000};

    private Decimals() {
    }

    /** @return {@code v} with {@code places} (0–4) decimals, e.g. {@code of(61.64, 1)} → {@code 61.6} */
    static String of(double v, int places) {
        if (!Double.isFinite(v) || Math.abs(v) > 1e12) {
            return Double.toString(v);
        }
        long scale = POW10[places];
        long r = Math.round(Math.abs(v) * scale);
        String sign = v < 0 && r != 0 ? "-" : "";
        if (places == 0) {
            return sign + r;
        }
        String frac = Long.toString(r % scale);
        return sign + (r / scale) + "." + "0".repeat(places - frac.length()) + frac;
    }

    /** @return like {@link #of} with a leading {@code +} for positive values */
    static String signed(double v, int places) {
        String s = of(v, places);
        return s.startsWith("-") ? s : "+" + s;
    }
}
