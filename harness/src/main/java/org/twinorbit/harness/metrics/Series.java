package org.twinorbit.harness.metrics;

import java.util.Arrays;

/**
 * A time series for plots, thinned while it records: it keeps every {@code stride}-th point
 * (plus the last), so that a long run stays a few thousand points.
 */
public final class Series {

    private final int stride;
    private double[] t = new double[256];
    private double[] v = new double[256];
    private int n;
    private long seen;
    private double lastT = Double.NaN;
    private double lastV = Double.NaN;

    /** @param stride keep one point in this many (≥ 1) */
    public Series(int stride) {
        this.stride = Math.max(1, stride);
    }

    /** Offers a point. @param time (s) @param value the quantity */
    public void offer(double time, double value) {
        lastT = time;
        lastV = value;
        if (seen++ % stride == 0) {
            append(time, value);
        }
    }

    private void append(double time, double value) {
        if (n == t.length) {
            t = Arrays.copyOf(t, 2 * n);
            v = Arrays.copyOf(v, 2 * n);
        }
        t[n] = time;
        v[n] = value;
        n++;
    }

    /** The kept times (s), the last offered point included. */
    public double[] times() {
        return withLast(t, lastT);
    }

    /** The kept values, the last offered point included. */
    public double[] values() {
        return withLast(v, lastV);
    }

    private double[] withLast(double[] a, double last) {
        boolean tailKept = (seen - 1) % stride == 0;
        if (seen == 0 || tailKept) {
            return Arrays.copyOf(a, n);
        }
        double[] r = Arrays.copyOf(a, n + 1);
        r[n] = last;
        return r;
    }
}
