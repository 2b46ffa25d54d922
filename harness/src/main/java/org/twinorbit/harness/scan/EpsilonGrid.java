package org.twinorbit.harness.scan;

/** The values of the small parameter ε visited by a breakdown scan, equally spaced in log ε. */
public final class EpsilonGrid {

    private EpsilonGrid() {}

    /**
     * {@code n} values from {@code min} to {@code max}, equally spaced in log ε, both ends exact.
     *
     * @param min smallest ε, in (0, 1)
     * @param max largest ε, in (min, 1): the guiding-center model has no meaning at ε ≥ 1
     * @param n   number of values, at least 2
     * @throws IllegalArgumentException naming the option and the allowed range
     */
    public static double[] logSpaced(double min, double max, int n) {
        if (!(min > 0 && min < 1)) {
            throw new IllegalArgumentException("--eps-min must be in (0, 1), got " + min);
        }
        if (!(max > min && max < 1)) {
            throw new IllegalArgumentException("--eps-max must be greater than --eps-min (" + min
                    + ") and below 1, got " + max);
        }
        if (n < 2) {
            throw new IllegalArgumentException("--points must be at least 2, got " + n);
        }
        double a = Math.log(min);
        double step = (Math.log(max) - a) / (n - 1);
        double[] eps = new double[n];
        for (int i = 0; i < n; i++) {
            eps[i] = Math.exp(a + i * step);
        }
        eps[0] = min;
        eps[n - 1] = max;
        return eps;
    }
}
