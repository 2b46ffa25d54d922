package org.twinorbit.harness.run;

/**
 * A signed metric over the gyrophase ensemble: the phase mean (where errors that depend on the
 * gyrophase cancel), the rms over phases (their spread included) and the worst phase (the value
 * of largest magnitude, sign kept). NaN members (a metric that is not defined for a phase) are
 * left out; all three are NaN when no member is defined.
 *
 * @param mean  mean over the defined members
 * @param rms   root mean square over the defined members, sqrt(Σv²/n)
 * @param worst member of largest magnitude
 */
public record Stat(double mean, double rms, double worst) {

    public static final Stat NONE = new Stat(Double.NaN, Double.NaN, Double.NaN);

    public static Stat of(double[] values) {
        double sum = 0;
        double sumSq = 0;
        int n = 0;
        double worst = Double.NaN;
        for (double v : values) {
            if (Double.isNaN(v)) {
                continue;
            }
            sum += v;
            sumSq += v * v;
            n++;
            if (Double.isNaN(worst) || Math.abs(v) > Math.abs(worst)) {
                worst = v;
            }
        }
        return n == 0 ? NONE : new Stat(sum / n, Math.sqrt(sumSq / n), worst);
    }

    /** One value standing for the whole ensemble (mean, rms and worst all equal to it). */
    public static Stat single(double v) {
        return new Stat(v, Math.abs(v), v);
    }

    public boolean defined() {
        return !Double.isNaN(worst);
    }

    /** The summary a statistic names, as a magnitude (thresholds compare it with a tolerance). */
    public double magnitude(PhaseStatistic statistic) {
        return Math.abs(switch (statistic) {
            case WORST -> worst;
            case MEAN -> mean;
            case RMS -> rms;
        });
    }
}
