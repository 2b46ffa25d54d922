package org.twinorbit.fields;

import org.twinorbit.shared.Species;

/**
 * A quantity the full-orbit motion keeps: exactly (energy, a canonical momentum of a symmetry) or
 * adiabatically (μ under a slow change).
 */
public interface Invariant {

    /** Short name used in tables (e.g. {@code energy}, {@code p_y}, {@code p_phi}). */
    String name();

    /** Formula in words, shown by {@code twinorbit fields}. */
    String description();

    /** Unit of {@link #value} (e.g. "J", "kg m/s", "kg m^2/s"). */
    String unit();

    /** True for an exact invariant, false for an adiabatic one. */
    boolean exact();

    /**
     * The invariant's value for species s at time t (s), position x (m) and u = γv (m/s).
     */
    double value(Species s, double t, double[] x, double[] u);

    /**
     * The scale (same unit as the value) by which a change of this invariant is divided to make
     * it relative: the kinetic energy for energies, m|u| for linear momenta, m|u|R for angular
     * momenta, R being the distance from the symmetry axis.
     */
    double scale(Species s, double t, double[] x, double[] u);
}
