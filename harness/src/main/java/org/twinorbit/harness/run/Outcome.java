package org.twinorbit.harness.run;

import org.twinorbit.integrators.OrbitStatus;


/**
 * How one integration ended and what it cost.
 *
 * @param status           ok, lost, unstable, model-failure, or failed (the integrator threw)
 * @param endTime          time reached (s): the end time, or when the run stopped
 * @param steps            steps taken (accepted steps for an adaptive reference)
 * @param fieldEvaluations field evaluations
 * @param wallNanos        wall-clock time (ns); not part of any machine-readable output
 * @param failure          what the integrator threw, for a failed run; null otherwise
 */
public record Outcome(OrbitStatus status, double endTime, long steps, long fieldEvaluations, long wallNanos,
                      String failure) {

    /** An outcome without a failure. */
    public Outcome(OrbitStatus status, double endTime, long steps, long fieldEvaluations, long wallNanos) {
        this(status, endTime, steps, fieldEvaluations, wallNanos, null);
    }
}
