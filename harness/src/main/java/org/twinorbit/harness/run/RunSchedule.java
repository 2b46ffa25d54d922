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
 */
public record RunSchedule(ResolvedCase resolved, double[][] x0, double[][] u0, double dt, long steps, double endTime,
                          double bouncePeriod, double[] convergenceDt, long[] convergenceSteps) {}
