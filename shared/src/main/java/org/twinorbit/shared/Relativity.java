package org.twinorbit.shared;

/**
 * Relativistic kinematics of one particle. The state variable is u = γv (m/s), the momentum per
 * unit rest mass, so p = m u and γ = sqrt(1 + u²/c²) (special relativity; Jackson, Classical
 * Electrodynamics, 3rd ed., ch. 11).
 */
public final class Relativity {

    private static final double C2 = Constants.C * Constants.C;

    private Relativity() {}

    /** Lorentz factor from u = γv. @param u2 |u|² (m²/s²) */
    public static double gammaFromU2(double u2) {
        return Math.sqrt(1.0 + u2 / C2);
    }

    /** Lorentz factor from the kinetic energy. @param kineticEv kinetic energy (eV) */
    public static double gammaFromKinetic(Species s, double kineticEv) {
        return 1.0 + kineticEv * Constants.E / s.restEnergy();
    }

    /**
     * |u| = γ|v| (m/s) for a kinetic energy (eV). With k = (γ − 1) = W/(mc²), γ² − 1 is written
     * k (2 + k): forming γ² − 1 from γ would lose all digits of a small k.
     */
    public static double uFromKinetic(Species s, double kineticEv) {
        double k = kineticEv * Constants.E / s.restEnergy();
        return Constants.C * Math.sqrt(k * (2.0 + k));
    }

    /** Momentum magnitude p = m γ v (kg m/s) for a kinetic energy (eV). */
    public static double momentumFromKinetic(Species s, double kineticEv) {
        return s.mass() * uFromKinetic(s, kineticEv);
    }

    /** Speed |v| (m/s) for a kinetic energy (eV); 1 − 1/γ² is written k (2 + k)/(1 + k)² for precision. */
    public static double speedFromKinetic(Species s, double kineticEv) {
        double k = kineticEv * Constants.E / s.restEnergy();
        return Constants.C * Math.sqrt(k * (2.0 + k)) / (1.0 + k);
    }

    /**
     * Kinetic energy (eV) for |u| = γ|v| (m/s). Written as m u²/(γ+1) rather than (γ−1) m c² so
     * that it keeps full precision in the non-relativistic limit.
     */
    public static double kineticFromU(Species s, double u) {
        double u2 = u * u;
        return s.mass() * u2 / (gammaFromU2(u2) + 1.0) / Constants.E;
    }

    /** Kinetic energy (eV) for a speed |v| (m/s), |v| &lt; c. */
    public static double kineticFromSpeed(Species s, double v) {
        double beta2 = v * v / C2;
        double g = 1.0 / Math.sqrt(1.0 - beta2);
        return kineticFromU(s, g * v);
    }

    /** Kinetic energy (J) for a state u = γv (m/s). */
    public static double kineticJoules(Species s, double ux, double uy, double uz) {
        double u2 = ux * ux + uy * uy + uz * uz;
        return s.mass() * u2 / (gammaFromU2(u2) + 1.0);
    }

    /** Parallel part u cos α (m/s) of u for a pitch angle α (degrees). */
    public static double parallel(double u, double pitchDeg) {
        return u * Math.cos(Math.toRadians(pitchDeg));
    }

    /** Perpendicular part u sin α (m/s, ≥ 0 for 0 ≤ α ≤ 180°) of u for a pitch angle α (degrees). */
    public static double perpendicular(double u, double pitchDeg) {
        return u * Math.sin(Math.toRadians(pitchDeg));
    }
}
