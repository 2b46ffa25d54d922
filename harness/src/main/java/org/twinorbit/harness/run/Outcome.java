package org.twinorbit.harness.run;

import org.twinorbit.integrators.OrbitStatus;


/**
 * How one integration ended and what it cost.
 *
 * @param status           ok, lost, unstable or model-failure
 * @param endTime          time reached (s): the end time, or when the run stopped
 * @param steps            steps taken (accepted steps for an adaptive reference)
 * @param fieldEvaluations field evaluations
 * @param wallNanos        wall-clock time (ns); not part of any machine-readable output
 */
public record Outcome(OrbitStatus status, double endTime, long steps, long fieldEvaluations, long wallNanos) {}
