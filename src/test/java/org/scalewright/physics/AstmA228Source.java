package org.scalewright.physics;

/**
 * The outside reference for the built-in ASTM A228/A228M tables, typed here by hand from the
 * source, not read from the program's resources.
 *
 * <p>Source: ASTM A228/A228M tensile requirements (inch-pound units) as republished by Interwire
 * Group, product page "Tinned Coated Music Wire",
 * https://www.interwiregroup.com/product/tinned-coated-music-wire/ — table "Tensile Requirements",
 * columns Diameter (Inch), Tensile Strength KSI Min, Tensile Strength KSI Max. Every row of that
 * table, as printed. The page prints 255 as the maximum for 0.036 in, below its own minimum of
 * 321: kept here as printed ({@link #MISPRINTED_MAX_DIAMETER_IN}); the built-in maximum table
 * leaves that row out.
 */
final class AstmA228Source {
    static final String SOURCE = "ASTM A228/A228M tensile requirements as republished by Interwire Group, "
            + "https://www.interwiregroup.com/product/tinned-coated-music-wire/";

    /** The row whose printed maximum is a misprint (255 ksi, below the 321 ksi minimum). */
    static final double MISPRINTED_MAX_DIAMETER_IN = 0.036;

    /** {diameter in, minimum ksi, maximum ksi}, in the page's order. */
    static final double[][] ROWS = {
        {0.004, 439, 485}, {0.005, 426, 471}, {0.006, 415, 459}, {0.007, 407, 449}, {0.008, 399, 441},
        {0.009, 393, 434}, {0.010, 387, 428}, {0.011, 382, 422}, {0.012, 377, 417}, {0.013, 373, 412},
        {0.014, 369, 408}, {0.015, 365, 404}, {0.016, 362, 400}, {0.018, 356, 393}, {0.020, 350, 387},
        {0.022, 345, 382}, {0.024, 341, 377}, {0.026, 337, 373}, {0.028, 333, 368}, {0.030, 330, 365},
        {0.032, 327, 361}, {0.034, 324, 358}, {0.036, 321, 255}, {0.038, 318, 352}, {0.040, 315, 349},
        {0.042, 313, 346}, {0.045, 309, 342}, {0.048, 306, 339}, {0.051, 303, 335}, {0.055, 300, 331},
        {0.059, 296, 327}, {0.063, 293, 324}, {0.067, 290, 321}, {0.072, 287, 317}, {0.076, 284, 314},
        {0.080, 282, 312}, {0.085, 279, 308}, {0.090, 276, 305}, {0.095, 274, 303}, {0.100, 271, 300},
        {0.102, 270, 299}, {0.107, 268, 296}, {0.110, 267, 295}, {0.112, 266, 294}, {0.121, 263, 290},
        {0.125, 261, 288}, {0.130, 259, 286}, {0.135, 258, 285}, {0.140, 256, 283}, {0.145, 254, 281},
        {0.150, 253, 279}, {0.156, 251, 277}, {0.162, 249, 275}, {0.177, 245, 270}, {0.192, 241, 267},
        {0.207, 238, 264}, {0.225, 235, 260}, {0.250, 230, 255},
    };

    private AstmA228Source() {
    }

    /**
     * The source's minimum at {@code dIn} inches, interpolated here, independently of
     * {@link StrengthTable}: linear in log d – log σ between the two tabulated rows around it.
     *
     * @param dIn a diameter within the table, in
     * @return minimum tensile strength, ksi
     */
    static double minimumKsi(double dIn) {
        for (int i = 0; i + 1 < ROWS.length; i++) {
            double d0 = ROWS[i][0];
            double d1 = ROWS[i + 1][0];
            if (dIn >= d0 && dIn <= d1) {
                double t = Math.log(dIn / d0) / Math.log(d1 / d0);
                return ROWS[i][1] * Math.pow(ROWS[i + 1][1] / ROWS[i][1], t);
            }
        }
        throw new IllegalArgumentException(dIn + " in is outside the source table");
    }
}
