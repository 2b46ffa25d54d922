package org.twinorbit.harness.scan;

/**
 * Mean and worst case of one metric over a gyrophase ensemble (DESIGN.md: first-order offsets
 * depend on gyrophase, so every comparison reports both).
 *
 * @param mean  mean over the phases where the metric was measured; NaN when none was
 * @param worst largest value over those phases; +∞ when an orbit failed
 */
public record EnsembleStat(double mean, double worst) {

    /** Both NaN: the metric does not apply to any orbit of the ensemble. */
    public static final EnsembleStat NONE = new EnsembleStat(Double.NaN, Double.NaN);

    /** Mean and maximum of the non-NaN values, in index order so that the sum is reproducible. */
    public static EnsembleStat of(double[] values) {
        double sum = 0;
        double worst = Double.NEGATIVE_INFINITY;
        int n = 0;
        for (double v : values) {
            if (Double.isNaN(v)) {
                continue;
            }
            sum += v;
            worst = Math.max(worst, v);
            n++;
        }
        return n == 0 ? NONE : new EnsembleStat(sum / n, worst);
    }
}
