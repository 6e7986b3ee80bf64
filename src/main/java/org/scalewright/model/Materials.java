package org.scalewright.model;

/**
 * Material constants used by the string physics, all SI.
 *
 * @param steelDensity  density of the music wire (plain wire and cores), kg/m³, &gt; 0
 * @param copperDensity density of copper wrap wire, kg/m³, &gt; 0
 * @param ironDensity   density of soft iron wrap wire, kg/m³, &gt; 0
 * @param youngsModulus Young's modulus of music wire, Pa, &gt; 0
 */
public record Materials(double steelDensity, double copperDensity, double ironDensity, double youngsModulus) {

    public Materials {
        Checks.positive("steel density", steelDensity, "kg/m³", 1);
        Checks.positive("copper density", copperDensity, "kg/m³", 1);
        Checks.positive("iron density", ironDensity, "kg/m³", 1);
        Checks.positive("Young's modulus", youngsModulus, "GPa", 1e-9);
    }

    /** @return the density of the given wrap metal, kg/m³ (a steel wrap has the music wire's density) */
    public double densityOf(WrapMetal metal) {
        return switch (metal) {
            case COPPER -> copperDensity;
            case IRON -> ironDensity;
            case STEEL -> steelDensity;
        };
    }
}
