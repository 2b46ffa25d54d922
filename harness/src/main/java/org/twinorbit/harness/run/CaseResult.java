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
 */
public record CaseResult(ResolvedCase resolved, double endTime, double bouncePeriod, long fullOrbitSteps,
                         double gcStep, List<ResultRow> rows, List<ReferenceSummary> references,
                         List<Curve> muCurves, List<Curve> energyCurves, Track fullOrbitCenters, Track gcTrack) {

    /** A labelled curve for a plot. @param label legend @param t times (s) @param y values */
    public record Curve(String label, double[] t, double[] y) {}
}
