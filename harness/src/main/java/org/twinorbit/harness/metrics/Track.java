package org.twinorbit.harness.metrics;

import java.util.Arrays;

/**
 * A guiding-center path sampled in time: the gyro-averaged positions of a full orbit (one point
 * per gyration, at its mid-time) or the states of a guiding-center integration. Grows while a
 * run records, then is read by the comparisons; linear interpolation between samples.
 */
public final class Track {

    private double[] t = new double[64];
    private double[] x = new double[64];
    private double[] y = new double[64];
    private double[] z = new double[64];
    private double[] vPar = new double[64];
    private int n;
    private final double deadband;

    /**
     * @param deadband |v∥| (m/s) below which v∥ counts as neither sign, so that round-off noise
     *                 around v∥ = 0 (a pitch of exactly 90° in a uniform field) makes no mirror points
     */
    /** Samples closer in time than this fraction of the time are one sample: the later is kept. */
    static final double SAME_TIME = 1e-12;

    public Track(double deadband) {
        this.deadband = deadband;
    }

    /** Appends a sample. @param time (s) @param px @param py @param pz position (m) @param vParallel v∥ (m/s) */
    public void add(double time, double px, double py, double pz, double vParallel) {
        if (n > 0 && Math.abs(time - t[n - 1]) <= SAME_TIME * Math.abs(time)) {
            // an event that splits an integrator step can emit its time twice (~1e-20 s apart,
            // slightly different states); two nodes that close make any fit through them blow up
            n--;
        }
        if (n == t.length) {
            int m = 2 * n;
            t = Arrays.copyOf(t, m);
            x = Arrays.copyOf(x, m);
            y = Arrays.copyOf(y, m);
            z = Arrays.copyOf(z, m);
            vPar = Arrays.copyOf(vPar, m);
        }
        t[n] = time;
        x[n] = px;
        y[n] = py;
        z[n] = pz;
        vPar[n] = vParallel;
        n++;
    }

    public int size() {
        return n;
    }

    /** Time (s) of sample i. */
    public double time(int i) {
        return t[i];
    }

    /** Coordinate k (0..2) of sample i (m). */
    public double coord(int i, int k) {
        return k == 0 ? x[i] : k == 1 ? y[i] : z[i];
    }

    /** v∥ (m/s) of sample i. */
    public double vParallel(int i) {
        return vPar[i];
    }

    public double firstTime() {
        return n == 0 ? Double.NaN : t[0];
    }

    public double lastTime() {
        return n == 0 ? Double.NaN : t[n - 1];
    }

    /** Position (m) at time s (s), linearly interpolated (clamped to the ends), into out. */
    public double[] positionAt(double s, double[] out) {
        if (n == 0) {
            Arrays.fill(out, Double.NaN);
            return out;
        }
        int i = Arrays.binarySearch(t, 0, n, s);
        if (i >= 0) {
            out[0] = x[i];
            out[1] = y[i];
            out[2] = z[i];
            return out;
        }
        int hi = -i - 1;
        if (hi <= 0) {
            return positionAt(t[0], out);
        }
        if (hi >= n) {
            return positionAt(t[n - 1], out);
        }
        int lo = hi - 1;
        double f = (s - t[lo]) / (t[hi] - t[lo]);
        out[0] = x[lo] + f * (x[hi] - x[lo]);
        out[1] = y[lo] + f * (y[hi] - y[lo]);
        out[2] = z[lo] + f * (z[hi] - z[lo]);
        return out;
    }

    /**
     * Position (m) at time s (s) by the parabola through the three samples nearest to s, into
     * out; linear when the track has fewer than three. Where the path turns — at a mirror point
     * the position along the field is quadratic in time — linear interpolation between samples
     * a gyroperiod apart cuts the corner by a·h²/8 and misses the mirror-point field.
     */
    public double[] positionSmooth(double s, double[] out) {
        if (n < 3) {
            return positionAt(s, out);
        }
        int i = Arrays.binarySearch(t, 0, n, s);
        int c = i >= 0 ? i : -i - 1;
        if (i < 0 && c > 0 && (c == n || s - t[c - 1] < t[c] - s)) {
            c--;
        }
        int lo = Math.max(0, Math.min(n - 3, c - 1));
        double t0 = t[lo], t1 = t[lo + 1], t2 = t[lo + 2];
        double l0 = (s - t1) * (s - t2) / ((t0 - t1) * (t0 - t2));
        double l1 = (s - t0) * (s - t2) / ((t1 - t0) * (t1 - t2));
        double l2 = (s - t0) * (s - t1) / ((t2 - t0) * (t2 - t1));
        out[0] = l0 * x[lo] + l1 * x[lo + 1] + l2 * x[lo + 2];
        out[1] = l0 * y[lo] + l1 * y[lo + 1] + l2 * y[lo + 2];
        out[2] = l0 * z[lo] + l1 * z[lo + 1] + l2 * z[lo + 2];
        return out;
    }

    /**
     * Times (s) where v∥ changes sign from negative to positive (one per bounce, always the same
     * bounce phase: the mirror point on the same side), linearly interpolated.
     */
    public double[] upwardMirrorTimes() {
        return mirrorTimes(true);
    }

    /** Times (s) of every sign change of v∥, both directions. */
    public double[] allMirrorTimes() {
        return mirrorTimes(false);
    }

    private double[] mirrorTimes(boolean upwardOnly) {
        double[] out = new double[8];
        int m = 0;
        int state = 0;
        int lastOfState = -1;
        for (int i = 0; i < n; i++) {
            int sign = vPar[i] > deadband ? 1 : vPar[i] < -deadband ? -1 : 0;
            if (sign == 0) {
                continue;
            }
            if (state != 0 && sign != state && (!upwardOnly || sign > 0)) {
                // the zero crossing lies after the last sample of the old sign
                int j = lastOfState;
                while (j + 1 < i && Math.signum(vPar[j + 1]) == state) {
                    j++;
                }
                double a = vPar[j];
                double b = vPar[j + 1];
                if (m == out.length) {
                    out = Arrays.copyOf(out, 2 * m);
                }
                out[m++] = a == b ? t[j] : t[j] + (t[j + 1] - t[j]) * a / (a - b);
            }
            state = sign;
            lastOfState = i;
        }
        return Arrays.copyOf(out, m);
    }
}
