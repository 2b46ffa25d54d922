package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Vec3;

/**
 * An electromagnetic field with exact first derivatives of B, evaluated at (t, x) into a reusable
 * {@link FieldSample} without allocating. Implementations are immutable and thread-safe; all
 * state of an evaluation lives in the sample.
 */
public interface Field {

    /** The library name of this field (e.g. {@code mirror}). */
    String name();

    /**
     * Fills {@code out} with B (T), E (V/m), ∂B_i/∂x_j (T/m) and ∂B/∂t (T/s) at time t (s) and
     * position (x, y, z) (m). Every member of the sample is written.
     */
    void evaluate(double t, double x, double y, double z, FieldSample out);

    /**
     * Fills B (T) and E (V/m) of {@code out} at time t (s) and position (x, y, z) (m), with the
     * same values as {@link #evaluate}; the other members may be left as they were. This is all
     * the Lorentz force needs: a field whose derivatives cost much overrides it to skip them. The
     * default evaluates everything.
     */
    default void evaluateForce(double t, double x, double y, double z, FieldSample out) {
        evaluate(t, x, y, z, out);
    }

    /** The characteristic length L (m) that defines ε = ρ0/L; +∞ for a field without one. */
    double length();

    /**
     * The field strength (T) in which ρ0 is taken for ε = ρ0/L, given |B| (T) at the initial
     * guiding center: that |B| itself unless the field's L is defined with a fixed strength
     * (a current sheet takes ρ0 in its normal field Bn, wherever the particle starts).
     */
    default double epsilonFieldStrength(double bAtStart) {
        return bAtStart;
    }

    /** Text saying what L is for this field (e.g. "Lm, the mirror half-length"). */
    String lengthMeaning();

    /**
     * Unit normal (dimensionless) of a current sheet through the origin that guiding centers
     * cross — the plane where the duration unit {@code crossings} counts passages; null for a
     * field without one.
     */
    default double[] sheetNormal() {
        return null;
    }

    /** The characteristic time scale (s) of a time-dependent field; +∞ for a static field. */
    default double timeScale() {
        return Double.POSITIVE_INFINITY;
    }

    /** True when neither B nor E depends on time. */
    default boolean isStatic() {
        return true;
    }

    /** False when E is zero everywhere, so a pusher may skip the electric kick. */
    boolean hasElectricField();

    /**
     * A signed distance-like margin (m) to the edge of the domain: positive inside, negative
     * outside, continuous across the edge so that an event detector can locate the crossing;
     * +∞ for a field defined everywhere.
     */
    default double domainMargin(double x, double y, double z) {
        return Double.POSITIVE_INFINITY;
    }

    /** True when (x, y, z) (m) lies inside the domain. */
    default boolean inDomain(double x, double y, double z) {
        return domainMargin(x, y, z) > 0;
    }

    /** Text describing the domain (e.g. "|z| < Lm; beyond it the particle has escaped"). */
    default String domainMeaning() {
        return "all space";
    }

    /** The electrostatic potential Φ (V) at (t, x); 0 for a field without E. */
    default double potential(double t, double x, double y, double z) {
        return 0.0;
    }

    /** True when {@link #potential} is the potential of E (E = −∇Φ); false when E has none. */
    default boolean hasPotential() {
        return !hasElectricField();
    }

    /**
     * The vector potential A (T m) used by this field's invariants, written into {@code out}.
     * Fields whose invariants use none write NaN.
     */
    void vectorPotential(double t, double x, double y, double z, double[] out);

    /** The exact (and adiabatic) invariants of the motion in this field. */
    List<Invariant> invariants();

    /** A sensible default guiding-center position (m) for cases that do not name one. */
    Vec3 defaultStart();
}
