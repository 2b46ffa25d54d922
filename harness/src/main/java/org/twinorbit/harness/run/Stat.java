package org.twinorbit.harness.run;

/**
 * A metric over the gyrophase ensemble: the mean and the worst case (the value of largest
 * magnitude, sign kept). NaN members (a metric that is not defined for a phase) are left out;
 * both are NaN when no member is defined.
 *
 * @param mean  mean over the defined members
 * @param worst member of largest magnitude
 */
public record Stat(double mean, double worst) {

    public static final Stat NONE = new Stat(Double.NaN, Double.NaN);

    public static Stat of(double[] values) {
        double sum = 0;
        int n = 0;
        double worst = Double.NaN;
        for (double v : values) {
            if (Double.isNaN(v)) {
                continue;
            }
            sum += v;
            n++;
            if (Double.isNaN(worst) || Math.abs(v) > Math.abs(worst)) {
                worst = v;
            }
        }
        return n == 0 ? NONE : new Stat(sum / n, worst);
    }

    public boolean defined() {
        return !Double.isNaN(worst);
    }
}
