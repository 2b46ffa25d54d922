package org.twinorbit.harness.baseline;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * The metrics a check compares, with their default tolerances. A stored value is named
 * {@code metric} or {@code metric.summary} ({@code mean}, {@code rms}, {@code worst}, or an
 * invariant's name); tolerances are given per metric and apply to all its summaries.
 *
 * <p>Why relative 1e-9: on one JVM the results are bit-identical for any thread count, so on the
 * machine that wrote the baseline every difference is zero. Another x86 machine or JDK build may
 * round a few {@code Math} intrinsics differently in the last bit; over the 10^3–10^4 steps of a
 * quick-suite orbit such differences grow to about 1e-12 relative at most, three orders below
 * 1e-9, while a real change of a scheme (a coefficient off by 1e-6, a reordered update) moves the
 * errors by far more. The absolute floors keep values at round-off level (a Boris energy error of
 * 1e-15) from failing on noise: each lies two or more orders below the smallest value of that
 * metric that means something.
 */
public enum Metric {
    MU_CHANGE("mu_change", 1e-9, 1e-12, Direction.SMALLER_IS_BETTER, false),
    /**
     * The exact orbit's own μ change beside a pusher's: physics, not an error, so no better side.
     * Floor as for mu_change, 1e-12: the smallest value of the quick suite, ~3e-10 in the uniform
     * and crossed fields where μ is exact, is the reference's own tolerance (rtol 1e-10) and lies
     * two orders above it; every field with a gradient has a ripple of 1e-8 or more.
     */
    REFERENCE_MU_CHANGE("reference_mu_change", 1e-9, 1e-12, Direction.NONE, false),
    MU_JUMP("mu_jump", 1e-9, 1e-12, Direction.SMALLER_IS_BETTER, false),
    ENERGY_ERROR("energy_error", 1e-9, 1e-13, Direction.SMALLER_IS_BETTER, false),
    PHASE_ERROR("phase_error", 1e-9, 1e-12, Direction.SMALLER_IS_BETTER, false),
    DRIFT_ERROR("drift_error", 1e-9, 1e-12, Direction.SMALLER_IS_BETTER, false),
    POSITION_ERROR("position_error_rho", 1e-9, 1e-12, Direction.SMALLER_IS_BETTER, false),
    /**
     * The particle's own end-position error (ρ0). Floor 1e-10: a position's last bit is |x|·1e-16,
     * at most ~1e-11 ρ0 for the suite's starts (|x|/ρ0 below 1e5, the dipole's 5 Earth radii over
     * a proton gyroradius of ~1e3 m), while a pusher's gyrophase error alone puts the particle
     * 1e-6 ρ0 or more off within one gyration at the steps the suite uses.
     */
    PARTICLE_POSITION_ERROR("particle_position_error_rho", 1e-9, 1e-10, Direction.SMALLER_IS_BETTER, false),
    /** Seconds: the period itself has no round-off floor, only a relative tolerance. */
    BOUNCE_PERIOD("bounce_period_s", 1e-9, 0, Direction.NONE, false),
    BOUNCE_PERIOD_ERROR("bounce_period_error", 1e-9, 1e-12, Direction.SMALLER_IS_BETTER, false),
    /** Tesla. */
    MIRROR_FIELD("mirror_field_t", 1e-9, 0, Direction.NONE, false),
    MIRROR_FIELD_ERROR("mirror_field_error", 1e-9, 1e-12, Direction.SMALLER_IS_BETTER, false),
    INVARIANT_ERROR("invariant_error", 1e-9, 1e-13, Direction.SMALLER_IS_BETTER, false),
    /** Measured convergence order: a change either way means the scheme changed. */
    ORDER("order", 1e-9, 1e-9, Direction.NONE, false),
    /** Fraction of phases classed like the reference: counts of phases, compared exactly. */
    CLASS_AGREEMENT("class_agreement", 0, 0, Direction.LARGER_IS_BETTER, false),
    /** Scan: fraction of orbits trapped in one model and lost in the other, compared exactly. */
    CLASS_CHANGE("class_change", 0, 0, Direction.SMALLER_IS_BETTER, false),
    /** Scan: a reference's self-estimated error (ρ0). */
    REFERENCE_ERROR("reference_error_rho", 1e-9, 1e-15, Direction.SMALLER_IS_BETTER, false),
    /** Scan: 0/1 flags of a point, compared exactly. */
    LOST("lost", 0, 0, Direction.NONE, false),
    NO_BOUNCE("no_bounce", 0, 0, Direction.NONE, false),
    POINT_FAILED("point_failed", 0, 0, Direction.NONE, false),
    /** Scan: κ = sqrt(R_c/ρ) of a current-sheet point. */
    KAPPA("kappa", 1e-9, 0, Direction.NONE, false),
    /** Scan: the threshold ε* and its energy (eV); where the model breaks down has no better side. */
    EPS_STAR("eps_star", 1e-9, 0, Direction.NONE, false),
    ENERGY_STAR("energy_ev_star", 1e-9, 0, Direction.NONE, false),
    /**
     * Cost: field evaluations per orbit, the machine-independent stand-in for wall time (which a
     * baseline never stores). Compared only with {@code --cost-tolerance}.
     */
    FIELD_EVALUATIONS("field_evaluations", 0.25, 0, Direction.SMALLER_IS_BETTER, true),
    /** Cost of a scan point's references (field evaluations); compared only with {@code --cost-tolerance}. */
    EVALUATIONS("evaluations", 0.25, 0, Direction.SMALLER_IS_BETTER, true),
    /** A stored value this version does not know (compared at the default tolerance). */
    OTHER("other", 1e-9, 1e-12, Direction.NONE, false);

    private final String key;
    private final Tolerance defaultTolerance;
    private final Direction direction;
    private final boolean cost;

    Metric(String key, double relative, double absolute, Direction direction, boolean cost) {
        this.key = key;
        this.defaultTolerance = new Tolerance(relative, absolute);
        this.direction = direction;
        this.cost = cost;
    }

    public String key() {
        return key;
    }

    public Tolerance defaultTolerance() {
        return defaultTolerance;
    }

    public Direction direction() {
        return direction;
    }

    /** True for a cost metric, compared only when the check asks for a cost ratio. */
    public boolean cost() {
        return cost;
    }

    /** The names a tolerance may be given for, in this order in messages. */
    public static List<String> names() {
        return Arrays.stream(values()).filter(m -> m != OTHER).map(Metric::key).toList();
    }

    /** @throws IllegalArgumentException naming {@code option} and listing the valid names */
    public static Metric ofKey(String key, String option) {
        String k = key.trim().toLowerCase(Locale.ROOT);
        for (Metric m : values()) {
            if (m != OTHER && m.key.equals(k)) {
                return m;
            }
        }
        throw new IllegalArgumentException(option + ": unknown metric '" + key + "'; valid metrics: "
                + String.join(", ", names()));
    }

    /**
     * The metric of a stored value's name: the part before the first '.', or for a scan's
     * prefixed names ({@code boris_drift_error}, {@code full_orbit_reference_error_rho}) the
     * longest metric name it ends with.
     */
    public static Metric of(String valueName) {
        int dot = valueName.indexOf('.');
        String base = dot < 0 ? valueName : valueName.substring(0, dot);
        Metric best = OTHER;
        for (Metric m : values()) {
            if (m == OTHER) {
                continue;
            }
            boolean match = base.equals(m.key) || base.endsWith("_" + m.key);
            if (match && (best == OTHER || m.key.length() > best.key.length())) {
                best = m;
            }
        }
        return best;
    }
}
