package org.twinorbit.harness.scan;

/**
 * Finds ε*, the first ε at which an error exceeds a tolerance, refined by log-log interpolation
 * between the last point within tolerance and the first point beyond it (docs/design.md "Breakdown
 * scan"). Errors of breakdown typically follow a power law or an exponential in 1/ε; a power law
 * is a straight line in log-log, so the interpolation is exact for it and close for the other
 * between neighbouring points.
 */
public final class ThresholdFinder {

    private ThresholdFinder() {}

    /**
     * Where an error curve crosses a tolerance.
     *
     * @param outcome crossed, not reached, exceeded at start, exceeded once measured, or no data
     * @param epsStar ε* for {@link ThresholdOutcome#CROSSED}, NaN otherwise
     */
    public record Crossing(ThresholdOutcome outcome, double epsStar) {}

    /**
     * Locates the first ε whose error exceeds {@code tolerance}.
     *
     * <p>Points whose error is NaN (metric not measured there) are skipped. When log-log
     * interpolation is undefined — the last error within tolerance is zero, or the first error
     * beyond it is infinite (an orbit that failed) — ε* is the first exceeding ε itself, without
     * refinement.
     *
     * @param eps       ε values, strictly increasing
     * @param error     error at each ε (worst case over the ensemble), same length
     * @param tolerance the largest acceptable error, ≥ 0
     */
    public static Crossing find(double[] eps, double[] error, double tolerance) {
        if (eps.length != error.length) {
            throw new IllegalArgumentException("eps and error differ in length: " + eps.length
                    + " vs " + error.length);
        }
        if (!(tolerance >= 0) || Double.isInfinite(tolerance)) {
            throw new IllegalArgumentException("tolerance must be a finite number >= 0, got " + tolerance);
        }
        for (int i = 1; i < eps.length; i++) {
            if (!(eps[i] > eps[i - 1])) {
                throw new IllegalArgumentException("eps must increase strictly, got " + eps[i - 1]
                        + " then " + eps[i]);
            }
        }
        int previous = -1;
        for (int i = 0; i < eps.length; i++) {
            if (Double.isNaN(error[i])) {
                continue;
            }
            if (error[i] > tolerance) {
                if (previous < 0) {
                    return new Crossing(i == 0 ? ThresholdOutcome.EXCEEDED_AT_START
                            : ThresholdOutcome.EXCEEDED_ONCE_MEASURED, Double.NaN);
                }
                return new Crossing(ThresholdOutcome.CROSSED,
                        interpolate(eps[previous], error[previous], eps[i], error[i], tolerance));
            }
            previous = i;
        }
        return new Crossing(previous < 0 ? ThresholdOutcome.NO_DATA : ThresholdOutcome.NOT_REACHED,
                Double.NaN);
    }

    /** ε where the straight line through (log ε0, log e0) and (log ε1, log e1) reaches log tol. */
    private static double interpolate(double eps0, double e0, double eps1, double e1, double tol) {
        if (!(e0 > 0) || !(tol > 0) || Double.isInfinite(e1)) {
            return eps1;
        }
        double f = (Math.log(tol) - Math.log(e0)) / (Math.log(e1) - Math.log(e0));
        return Math.exp(Math.log(eps0) + f * (Math.log(eps1) - Math.log(eps0)));
    }
}
