package org.twinorbit.harness.run;

import org.twinorbit.harness.cases.ResolvedCase;

/**
 * What a run of a case integrates ({@link CaseRunner#schedule}): every phase's initial state,
 * the full-orbit step and count, and the convergence sweep (each level from phase 0's state).
 *
 * @param resolved         the case and its scales
 * @param x0               initial positions (m), one per gyrophase, at t = 0
 * @param u0               initial u = γv (m/s), one per gyrophase, at t = 0
 * @param dt               full-orbit step (s)
 * @param steps            full-orbit steps of the run
 * @param endTime          steps × dt (s)
 * @param bouncePeriod     bounce period (s) measured first when the duration is in bounces; NaN otherwise
 * @param convergenceDt    steps (s) of the convergence sweep: dt, dt/2, dt/4, dt/8
 * @param convergenceSteps steps of each sweep run (the same time span)
 * @param guidingCenter    what the guiding-center integrators run
 */
public record RunSchedule(ResolvedCase resolved, double[][] x0, double[][] u0, double dt, long steps, double endTime,
                          double bouncePeriod, double[] convergenceDt, long[] convergenceSteps,
                          GuidingCenterRuns guidingCenter) {

    /**
     * The guiding-center integrators' runs: one shared guiding center for the whole ensemble.
     *
     * @param x0    initial guiding center (m)
     * @param pPar0 initial p∥ (kg m/s)
     * @param mu    μ (J/T), constant
     * @param dt    steps (s): the run's, then the sweep's levels 1–3 (dt/2, dt/4, dt/8)
     * @param steps step counts of the same, each over the whole run
     */
    public record GuidingCenterRuns(double[] x0, double pPar0, double mu, double[] dt, long[] steps) {}
}
