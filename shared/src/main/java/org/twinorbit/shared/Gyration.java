package org.twinorbit.shared;

/**
 * Gyration of a charged particle in a magnetic field of strength B: Ω = |q|B/(γm),
 * T_c = 2π/Ω, ρ = p⊥/(|q|B) (Jackson, Classical Electrodynamics, 3rd ed., §12.2).
 */
public final class Gyration {

    private Gyration() {}

    /** Gyrofrequency Ω = |q|B/(γm) (rad/s). @param b field strength (T) @param gamma Lorentz factor */
    public static double frequency(Species s, double b, double gamma) {
        return Math.abs(s.charge()) * b / (gamma * s.mass());
    }

    /** Gyroperiod T_c = 2πγm/(|q|B) (s). @param b field strength (T) @param gamma Lorentz factor */
    public static double period(Species s, double b, double gamma) {
        return 2.0 * Math.PI / frequency(s, b, gamma);
    }

    /** Gyroradius ρ = m u⊥/(|q|B) (m). @param uPerp perpendicular γv (m/s) @param b field strength (T) */
    public static double radius(Species s, double uPerp, double b) {
        return s.mass() * uPerp / (Math.abs(s.charge()) * b);
    }

    /** Gyroperiod (s) of a particle with the given kinetic energy (eV) in field strength b (T). */
    public static double periodAtEnergy(Species s, double b, double kineticEv) {
        return period(s, b, Relativity.gammaFromKinetic(s, kineticEv));
    }
}
