package org.scalewright.design.diagnosis;

import org.scalewright.model.Checks;
import org.scalewright.model.Materials;
import org.scalewright.model.Note;
import org.scalewright.physics.StringPhysics;

/**
 * The speaking length at which a string tuned to f reaches a given stress, with the stiffness
 * term kept: σ A = 4 L² μ f² − c / L² with c = π³ E d⁴ / 64 (K = c / L²), a quadratic in L²:
 * L² = (σ A + √((σ A)² + 16 μ f² c)) / (8 μ f²).
 */
public final class LengthSolver {
    private LengthSolver() {
    }

    /**
     * @param note      the note (its core, wrap and strings; its length is not used)
     * @param frequency the pitch, Hz, &gt; 0
     * @param stress    the stress to reach, Pa, &gt; 0
     * @param materials densities and Young's modulus
     * @return the speaking length, m
     */
    public static double lengthFor(Note note, double frequency, double stress, Materials materials) {
        Checks.positive("frequency", frequency, "Hz", 1);
        Checks.positive("stress", stress, "MPa", 1e-6);
        double d = note.wire().diameter();
        double mu = StringPhysics.massPerLength(d, note.wrap(), materials);
        double a = StringPhysics.area(d);
        double c = Math.PI * Math.PI * Math.PI * materials.youngsModulus() * Math.pow(d, 4) / 64.0;
        double q = 4.0 * mu * frequency * frequency;
        double sa = stress * a;
        double x = (sa + Math.sqrt(sa * sa + 4.0 * q * c)) / (2.0 * q);
        return Math.sqrt(x);
    }
}
