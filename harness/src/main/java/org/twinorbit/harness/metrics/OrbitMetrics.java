package org.twinorbit.harness.metrics;

import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;

/**
 * The metrics of docs/design.md "What is measured" computed from what the observers recorded. Every
 * average is over whole periods: whole gyrations for a full orbit, whole bounce periods
 * (between mirror points of the same direction) for a trapped orbit.
 */
public final class OrbitMetrics {

    private OrbitMetrics() {}

    /** Trapped, passing or lost, as reported. */
    public enum OrbitClass {
        TRAPPED("trapped"), PASSING("passing"), LOST("lost");

        private final String label;

        OrbitClass(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /** μ change: max over gyrations k of |⟨μ⟩_k − ⟨μ⟩_0| / ⟨μ⟩_0; NaN with fewer than two gyrations. */
    public static double muChange(GyroAverager g) {
        if (g.gyrations() < 2 || !(g.mu(0) > 0)) {
            return Double.NaN;
        }
        double mu0 = g.mu(0);
        double max = 0;
        for (int k = 1; k < g.gyrations(); k++) {
            max = Math.max(max, Math.abs(g.mu(k) - mu0) / mu0);
        }
        return max;
    }

    /** ⟨μ⟩ at time t (s), linear between gyration mid-times. */
    static double muAt(GyroAverager g, double t) {
        Track c = g.centers();
        int n = g.gyrations();
        if (t <= c.time(0)) {
            return g.mu(0);
        }
        for (int k = 1; k < n; k++) {
            if (t <= c.time(k)) {
                double f = (t - c.time(k - 1)) / (c.time(k) - c.time(k - 1));
                return g.mu(k - 1) + f * (g.mu(k) - g.mu(k - 1));
            }
        }
        return g.mu(n - 1);
    }

    /**
     * The averaging window [t_a, t_b] (s) of a track: from the first to the last mirror point of
     * the same direction when there are two (whole bounce periods), else the whole track.
     */
    public static double[] window(Track t) {
        double[] ev = t.upwardMirrorTimes();
        if (ev.length >= 2) {
            return new double[] {ev[0], ev[ev.length - 1]};
        }
        return new double[] {t.firstTime(), t.lastTime()};
    }

    /**
     * Mean perpendicular velocity (m/s) of a guiding-center track over [ta, tb]: the sum of the
     * displacements between samples with their component along b (at the midpoint) removed,
     * divided by the time span. NaN when the track does not cover the window.
     */
    public static double[] meanPerpendicularVelocity(Field field, Track track, double ta, double tb) {
        return meanPerpendicularVelocity(field, track, ta, tb, track);
    }

    /**
     * As {@link #meanPerpendicularVelocity(Field, Track, double, double)}, but with the track read
     * (interpolated) at the sample times of {@code grid} inside [ta, tb]. Two tracks compared on
     * the same grid have the same chords: removing the parallel part of a chord with b at its
     * midpoint leaves a residue of relative order (chord · field-line curvature)², which on a
     * helical field line does not vanish and would otherwise differ between a track sampled once
     * per gyration and one sampled 32 times.
     */
    public static double[] meanPerpendicularVelocity(Field field, Track track, double ta, double tb, Track grid) {
        double[] v = {Double.NaN, Double.NaN, Double.NaN};
        if (track.size() < 2 || !(tb > ta) || ta < track.firstTime() - 1e-9 * (tb - ta)
                || tb > track.lastTime() + 1e-9 * (tb - ta)) {
            return v;
        }
        FieldSample fs = new FieldSample();
        double[] b = new double[3];
        double[] prev = track.positionAt(ta, new double[3]);
        double tPrev = ta;
        double[] cur = new double[3];
        double sx = 0, sy = 0, sz = 0;
        int i = 0;
        while (i < grid.size() && grid.time(i) <= ta) {
            i++;
        }
        boolean last = false;
        while (!last) {
            double t;
            if (i < grid.size() && grid.time(i) < tb) {
                t = grid.time(i);
                track.positionAt(t, cur);
                i++;
            } else {
                t = tb;
                track.positionAt(tb, cur);
                last = true;
            }
            double dx = cur[0] - prev[0], dy = cur[1] - prev[1], dz = cur[2] - prev[2];
            field.evaluate(0.5 * (t + tPrev), 0.5 * (cur[0] + prev[0]), 0.5 * (cur[1] + prev[1]),
                    0.5 * (cur[2] + prev[2]), fs);
            fs.unitB(b);
            double par = dx * b[0] + dy * b[1] + dz * b[2];
            sx += dx - par * b[0];
            sy += dy - par * b[1];
            sz += dz - par * b[2];
            System.arraycopy(cur, 0, prev, 0, 3);
            tPrev = t;
        }
        double span = tb - ta;
        v[0] = sx / span;
        v[1] = sy / span;
        v[2] = sz / span;
        return v;
    }

    /**
     * Signed drift error (V − V_ref)·V_ref / |V_ref|² of mean perpendicular velocities: the
     * relative error of the drift speed along the reference drift, positive when the drift is too
     * fast. Linear in V, so a phase mean cancels errors that depend on the gyrophase. NaN when the
     * reference drift is below {@code floor} (m/s), where a relative error means nothing.
     */
    public static double driftError(double[] v, double[] vRef, double floor) {
        double ref2 = vRef[0] * vRef[0] + vRef[1] * vRef[1] + vRef[2] * vRef[2];
        if (!(Math.sqrt(ref2) > floor)) {
            return Double.NaN;
        }
        return ((v[0] - vRef[0]) * vRef[0] + (v[1] - vRef[1]) * vRef[1] + (v[2] - vRef[2]) * vRef[2]) / ref2;
    }

    /**
     * Signed position error per orbit period, in ρ0: |X − X_ref| / ρ0 at the last time t both
     * tracks reach, divided by the number of bounce periods the reference has run by then (its
     * length over the mean spacing of the reference's mirror points of one direction; at least 1,
     * and 1 when it does not bounce twice the same way), so that it stays comparable after many
     * bounces. The sign says whether X is
     * ahead (+) or behind (−) the reference along the reference's motion at t.
     *
     * @param rho0 gyroradius (m)
     */
    public static double positionError(Track a, Track ref, double rho0) {
        if (a.size() == 0 || ref.size() < 2) {
            return Double.NaN;
        }
        double t = Math.min(a.lastTime(), ref.lastTime());
        double[] p = a.positionAt(t, new double[3]);
        double[] q = ref.positionAt(t, new double[3]);
        // the reference's direction of motion at t, from the chord ending there
        double dt = Math.min(t - ref.firstTime(), (ref.lastTime() - ref.firstTime()) / (ref.size() - 1));
        double[] q0 = ref.positionAt(t - dt, new double[3]);
        double along = 0;
        double d2 = 0;
        for (int i = 0; i < 3; i++) {
            along += (p[i] - q[i]) * (q[i] - q0[i]);
            d2 += (p[i] - q[i]) * (p[i] - q[i]);
        }
        // the bounce period from the reference's mirror points of one direction; the run's
        // length in it, at least 1 (a run shorter than a bounce, or one that does not bounce)
        double[] ev = ref.upwardMirrorTimes();
        double periods = ev.length >= 2 ? (t - ref.firstTime()) / ((ev[ev.length - 1] - ev[0]) / (ev.length - 1)) : 1;
        return Math.copySign(Math.sqrt(d2) / rho0 / Math.max(1, periods), along);
    }

    /**
     * Signed particle position error, in ρ0: |x − x_ref| / ρ0 of the particle itself (not of its
     * gyration center) at the end, where both runs stopped at the same time; the sign says
     * whether x is ahead (+) or behind (−) along the reference particle's velocity there, so a
     * gyrophase lag shows as a negative error. NaN when the runs ended at different times (one
     * was lost or failed) or a state is not finite.
     *
     * @param x    particle position (m) at time t
     * @param t    its time (s)
     * @param xRef reference particle position (m) at time tRef
     * @param uRef reference particle u = γv (m/s) at time tRef
     * @param tRef its time (s)
     * @param rho0 gyroradius (m)
     */
    public static double particlePositionError(double[] x, double t, double[] xRef, double[] uRef, double tRef,
                                               double rho0) {
        if (!(Math.abs(t - tRef) <= 1e-9 * Math.abs(tRef)) || !(tRef > 0)) {
            return Double.NaN;
        }
        double d2 = 0;
        double along = 0;
        for (int i = 0; i < 3; i++) {
            double d = x[i] - xRef[i];
            d2 += d * d;
            along += d * uRef[i];
        }
        double e = Math.sqrt(d2) / rho0;
        return Double.isFinite(e) ? Math.copySign(e, along) : Double.NaN;
    }

    /** Bounce period (s): mean spacing of mirror points of the same direction; NaN with fewer than two. */
    public static double bouncePeriod(Track t) {
        double[] ev = t.upwardMirrorTimes();
        return ev.length < 2 ? Double.NaN : (ev[ev.length - 1] - ev[0]) / (ev.length - 1);
    }

    /**
     * Mean |B| (T) at the mirror points (both directions) of a track, the position there read
     * from a parabola through the nearest samples; NaN without one.
     */
    public static double mirrorField(Field field, Track t) {
        double[] ev = t.allMirrorTimes();
        if (ev.length == 0) {
            return Double.NaN;
        }
        FieldSample fs = new FieldSample();
        double[] p = new double[3];
        double sum = 0;
        for (double e : ev) {
            t.positionSmooth(e, p);
            field.evaluate(e, p[0], p[1], p[2], fs);
            sum += fs.bMag();
        }
        return sum / ev.length;
    }

    /** Lost when the run left the domain, trapped when v∥ changed sign, passing otherwise. */
    public static OrbitClass classify(OrbitStatus status, Track t) {
        if (status == OrbitStatus.LOST) {
            return OrbitClass.LOST;
        }
        return t.allMirrorTimes().length > 0 ? OrbitClass.TRAPPED : OrbitClass.PASSING;
    }

    /**
     * Phase error of a full orbit against its reference: the mean gyrofrequency measured over
     * the same time window for both — from the first sample to the last sample both reached —
     * as the ratio of the signed gyrophases turned in it, minus 1. Both phases are exact sample
     * values there, so where Ω varies along the orbit the result is the Ω-weighted mean of the
     * local error, smooth in dt. Counting whole gyrations instead compared windows that differ
     * by up to a gyration, and reading a phase between gyration ends is off by ~Ω̇T_g²/8, which
     * in a mirror is as large as the whole lag at 64 steps per gyration. What remains: where Ω
     * varies around the gyration (a gradient across the orbit) the phase ripples by O(ε) rad,
     * and the two runs, a lag apart, sit at different points of that ripple — an error of
     * relative order ε in the phase error. NaN when the reference turned less than one gyration.
     */
    public static double phaseError(GyroAverager g, GyroAverager ref) {
        double t = Math.min(g.lastTime(), ref.lastTime());
        double phiRef = ref.phaseAt(t);
        if (!(phiRef >= 2 * Math.PI) || g.firstTime() != ref.firstTime()) {
            return Double.NaN;
        }
        return g.phaseAt(t) / phiRef - 1.0;
    }

    /** Relative difference a/b − 1; NaN when either is NaN or b is 0. */
    public static double relative(double a, double b) {
        return b == 0 ? Double.NaN : a / b - 1.0;
    }
}
