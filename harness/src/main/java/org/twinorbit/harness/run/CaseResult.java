package org.twinorbit.harness.run;

import java.util.List;
import org.twinorbit.harness.cases.ResolvedCase;
import org.twinorbit.harness.metrics.Track;

/**
 * Everything one case measured, in report order.
 *
 * @param resolved        the case and its scales
 * @param endTime         length of every run (s), a whole number of full-orbit steps
 * @param bouncePeriod    bounce period (s) measured on the guiding-center reference when the
 *                        duration was given in bounces; NaN otherwise
 * @param fullOrbitSteps  full-orbit steps per run at the case's step
 * @param gcStep          guiding-center step (s)
 * @param rows            discretisation rows (full-orbit, then guiding-center) and the model row
 * @param references      the two references with their self-estimated errors
 * @param muCurves        ⟨μ⟩/⟨μ⟩_0 − 1 against time per full-orbit integrator, phase 0
 * @param energyCurves    (W − W0)/K0 against time per integrator, phase 0
 * @param fullOrbitCenters gyro-averaged full-orbit reference, phase 0
 * @param gcTrack         the guiding-center reference compared with phase 0 (its own with the matched start)
 * @param orbits          phase 0 of every integrator: a pusher's gyro-averaged centers, a
 *                        guiding-center integrator's own track, in row order
 * @param convergence     what the convergence sweeps measured over, and their references' own error
 */
public record CaseResult(ResolvedCase resolved, double endTime, double bouncePeriod, long fullOrbitSteps,
                         double gcStep, List<ResultRow> rows, List<ReferenceSummary> references,
                         List<Curve> muCurves, List<Curve> energyCurves, Track fullOrbitCenters, Track gcTrack,
                         List<Orbit> orbits, Sweeps convergence) {

    /** A labelled curve for a plot. @param label legend @param t times (s) @param y values */
    public record Curve(String label, double[] t, double[] y) {}

    /**
     * One integrator's orbit for the overlay. @param integrator its name @param model
     * {@code full-orbit} (gyro-averaged centers) or {@code guiding-center} @param track phase 0
     */
    public record Orbit(String integrator, String model, Track track) {}

    /**
     * The spans of the convergence sweeps (end-position error of phase 0 against the reference).
     *
     * @param fullOrbitSpan           time (s) the full-orbit sweep runs; NaN without pushers
     * @param fullOrbitReferenceError the full-orbit reference's own error at that time (ρ0), from
     *                                a rerun at a 100× tighter tolerance
     * @param guidingCenterSpan       time (s) the guiding-center sweep runs (the whole run)
     * @param guidingCenterReferenceError the guiding-center reference's own error there (ρ0)
     */
    public record Sweeps(double fullOrbitSpan, double fullOrbitReferenceError, double guidingCenterSpan,
                         double guidingCenterReferenceError) {}
}
