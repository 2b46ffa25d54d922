package org.twinorbit.harness.run;

import java.util.Map;

/**
 * One row of a case's results: an integrator against the reference of its own model
 * ({@code discretisation}), or the guiding-center reference against the gyro-averaged
 * full-orbit reference ({@code model}).
 *
 * @param integrator       the integrator's name (for the model row: {@code gc-reference})
 * @param model            {@code full-orbit} or {@code guiding-center}
 * @param errorKind        {@code discretisation} or {@code model}
 * @param status           the most severe status over the ensemble; the model row combines both
 *                         models phase by phase ({@code lost-full-orbit}, {@code lost-guiding-center},
 *                         {@code unstable-full-orbit}; plain {@code lost} only when both lost it)
 * @param statusTime       earliest time (s) a phase stopped with that status; NaN when ok
 * @param metrics          metric name -> mean, rms and worst over the ensemble, in report order
 *                         ({@code position_error_rho}: of the gyro-averaged center;
 *                         {@code particle_position_error_rho}: of the particle itself, full-orbit rows;
 *                         {@code reference_mu_change}: the full-orbit reference's own μ change,
 *                         full-orbit rows)
 * @param invariants       exact invariant name -> its drift (full-orbit rows)
 * @param orbitClass       trapped / passing / lost, or several joined with '/' when phases differ
 * @param classAgreement   fraction of phases whose class equals the reference's
 * @param order            measured convergence order; NaN when not measurable
 * @param convergenceDt    steps (s) of the convergence runs
 * @param convergenceError end-position error (in ρ0) of each convergence run against the reference
 *                         (full orbit: over the first few gyrations; guiding center: the whole run)
 * @param steps            steps per orbit (mean over the ensemble)
 * @param fieldEvaluations field evaluations per orbit (mean over the ensemble)
 * @param wallSeconds      wall time summed over the ensemble (s); never in JSON or CSV
 * @param muJumpFrom       the points {@code mu_jump} compared ({@link org.twinorbit.harness.metrics.MuJump.From}
 *                         labels, '/'-joined when phases differ); empty for a row without μ
 * @param diagnostics      the facts its verdicts are read from
 */
public record ResultRow(String integrator, String model, String errorKind, String status, double statusTime,
                        Map<String, Stat> metrics, Map<String, Stat> invariants, String orbitClass,
                        double classAgreement, double order, double[] convergenceDt, double[] convergenceError,
                        double steps, double fieldEvaluations, double wallSeconds, String muJumpFrom,
                        Diagnostics diagnostics) {

    /** Metric names in report order (the JSON and CSV field names). */
    public static final java.util.List<String> METRICS = java.util.List.of("mu_change", "reference_mu_change",
            "mu_jump", "energy_error", "phase_error", "drift_error", "position_error_rho",
            "particle_position_error_rho", "bounce_period_s", "bounce_period_error", "mirror_field_t",
            "mirror_field_error");

    /** A metric by name, {@link Stat#NONE} when the row has none. */
    public Stat metric(String name) {
        return metrics.getOrDefault(name, Stat.NONE);
    }
}
