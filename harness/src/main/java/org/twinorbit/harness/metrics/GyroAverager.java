package org.twinorbit.harness.metrics;

import org.twinorbit.integrators.reference.FullOrbitObserver;
import java.util.Arrays;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/**
 * Averages a full orbit over whole gyrations. Every sample is taken to the local E×B frame:
 * w = u⊥ − γ v_E with v_E = E×B/B²; the gyrophase advances by the signed angle between
 * successive w about b, and a gyration ends each time the accumulated phase passes a multiple of
 * 2π (the crossing located by linear interpolation inside the step). Over each gyration the
 * time averages of μ = m|w|²/(2B) (= p⊥²/(2mB)), of the guiding center X = x − m(b×w)/(qB) and
 * of v∥ are taken with the trapezoidal rule, split exactly at the crossings, so that no
 * partial gyration enters a mean (docs/design.md "What is measured").
 *
 * <p>Beside the whole gyrations it accumulates the signed gyrophase (positive in the sense the
 * charge gyrates), from which the mean gyrofrequency over any window is read: comparing two runs
 * over the same time window measures their phase error without depending on how many whole
 * gyrations each happens to complete in it (where Ω varies along the orbit, a window one
 * gyration longer shifts the mean frequency by ~ (Ω_end − ⟨Ω⟩)/N).
 *
 * <p>Needs a sampling of at least 4 samples per gyration so that one step turns w by less than
 * π. Allocates only when a gyration completes.
 */
public final class GyroAverager implements FullOrbitObserver {

    /** Averaged quantities: μ, X, Y, Z, v∥. */
    private static final int NQ = 5;
    private static final double TWO_PI = 2 * Math.PI;

    private final Field field;
    private final double mass;
    private final double charge;
    private final FieldSample fs = new FieldSample();

    private final double[] q0 = new double[NQ];
    private final double[] q1 = new double[NQ];
    private final double[] acc = new double[NQ];
    private final double[] w0 = new double[3];
    private final double[] w1 = new double[3];
    private final double[] b1 = new double[3];
    private boolean started;
    private double tPrev;
    private double phase;
    /** Signed gyrophase turned since the first sample (rad), positive in the charge's sense. */
    private double turned;
    private double lastTime;
    private double gyrationStart;
    private double firstTime;
    private int completed;

    private final Track centers;
    private double[] mu = new double[64];
    private double[] ends = new double[64];
    /** Signed gyrophase (rad) at the end of each gyration. */
    private double[] turnedAtEnd = new double[64];
    /** +1 for a positive charge: its w turns clockwise about b, (w0 × w1)·b < 0. */
    private final double sense;

    /** @param deadband |v∥| (m/s) treated as zero when looking for mirror points (see {@link Track}) */
    public GyroAverager(Field field, Species species, double deadband) {
        this.field = field;
        this.centers = new Track(deadband);
        this.mass = species.mass();
        this.charge = species.charge();
        this.sense = -Math.signum(charge);
    }

    @Override
    public void observe(double t, double[] x, double[] u) {
        sample(t, x, u, q1, w1);
        if (!started) {
            started = true;
            gyrationStart = t;
            firstTime = t;
            lastTime = t;
            tPrev = t;
            System.arraycopy(q1, 0, q0, 0, NQ);
            System.arraycopy(w1, 0, w0, 0, 3);
            return;
        }
        double dt = t - tPrev;
        // signed angle from w0 to w1 about b: atan2((w0 × w1)·b, w0·w1)
        double cx = w0[1] * w1[2] - w0[2] * w1[1];
        double cy = w0[2] * w1[0] - w0[0] * w1[2];
        double cz = w0[0] * w1[1] - w0[1] * w1[0];
        double signed = sense * Math.atan2(cx * b1[0] + cy * b1[1] + cz * b1[2],
                w0[0] * w1[0] + w0[1] * w1[1] + w0[2] * w1[2]);
        double dphi = Math.abs(signed);
        double target = TWO_PI * (completed + 1);
        if (dphi > 0 && phase + dphi >= target) {
            double f = (target - phase) / dphi;
            double tc = tPrev + f * dt;
            mark(turned + f * signed);
            for (int k = 0; k < NQ; k++) {
                double qc = q0[k] + f * (q1[k] - q0[k]);
                acc[k] += 0.5 * (q0[k] + qc) * f * dt;
                q0[k] = qc; // the rest of the step starts from the crossing
            }
            close(tc);
            dt -= f * dt;
        }
        for (int k = 0; k < NQ; k++) {
            acc[k] += 0.5 * (q0[k] + q1[k]) * dt;
        }
        phase += dphi;
        turned += signed;
        tPrev = t;
        lastTime = t;
        System.arraycopy(q1, 0, q0, 0, NQ);
        System.arraycopy(w1, 0, w0, 0, 3);
    }

    /** Keeps the signed phase (rad) at the end of the gyration about to close. */
    private void mark(double signedPhase) {
        if (completed == mu.length) {
            mu = Arrays.copyOf(mu, 2 * completed);
            ends = Arrays.copyOf(ends, 2 * completed);
            turnedAtEnd = Arrays.copyOf(turnedAtEnd, 2 * completed);
        }
        turnedAtEnd[completed] = signedPhase;
    }

    private void close(double tc) {
        double span = tc - gyrationStart;
        mu[completed] = acc[0] / span;
        ends[completed] = tc;
        centers.add(0.5 * (gyrationStart + tc), acc[1] / span, acc[2] / span, acc[3] / span, acc[4] / span);
        completed++;
        Arrays.fill(acc, 0.0);
        gyrationStart = tc;
    }

    /** μ, X and v∥ of one sample into q; w = u⊥ − γ v_E into w; b into b1. */
    private void sample(double t, double[] x, double[] u, double[] q, double[] w) {
        field.evaluate(t, x[0], x[1], x[2], fs);
        double bm = fs.bMag();
        fs.unitB(b1);
        double gamma = Relativity.gammaFromU2(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
        double inv2 = 1.0 / (bm * bm);
        // v_E = E × B / B²
        double vex = (fs.ey * fs.bz - fs.ez * fs.by) * inv2;
        double vey = (fs.ez * fs.bx - fs.ex * fs.bz) * inv2;
        double vez = (fs.ex * fs.by - fs.ey * fs.bx) * inv2;
        double uPar = u[0] * b1[0] + u[1] * b1[1] + u[2] * b1[2];
        w[0] = u[0] - uPar * b1[0] - gamma * vex;
        w[1] = u[1] - uPar * b1[1] - gamma * vey;
        w[2] = u[2] - uPar * b1[2] - gamma * vez;
        double w2 = w[0] * w[0] + w[1] * w[1] + w[2] * w[2];
        q[0] = mass * w2 / (2 * bm);
        double k = mass / (charge * bm);
        q[1] = x[0] - k * (b1[1] * w[2] - b1[2] * w[1]);
        q[2] = x[1] - k * (b1[2] * w[0] - b1[0] * w[2]);
        q[3] = x[2] - k * (b1[0] * w[1] - b1[1] * w[0]);
        q[4] = uPar / gamma;
    }

    /** Number of whole gyrations seen. */
    public int gyrations() {
        return completed;
    }

    /** ⟨μ⟩ over gyration k (J/T). */
    public double mu(int k) {
        return mu[k];
    }

    /** Time (s) at which gyration k ended. */
    public double end(int k) {
        return ends[k];
    }

    /** The gyration centers: mid-time of each gyration, averaged X and v∥. */
    public Track centers() {
        return centers;
    }

    /** Time (s) of the first sample; NaN before any. */
    public double firstTime() {
        return started ? firstTime : Double.NaN;
    }

    /** Time (s) of the last sample; NaN before any. */
    public double lastTime() {
        return started ? lastTime : Double.NaN;
    }

    /**
     * Signed gyrophase (rad) turned between the first sample and time t (s): exact at the
     * samples' end and at every gyration end, linear in time between gyration ends (a window
     * that ends inside a gyration is off by the phase's non-uniformity within that one
     * gyration); NaN outside [first sample, last sample].
     */
    public double phaseAt(double t) {
        if (!started || t < firstTime || t > lastTime) {
            return Double.NaN;
        }
        if (t == lastTime) {
            return turned;
        }
        int i = Arrays.binarySearch(ends, 0, completed, t);
        if (i >= 0) {
            return turnedAtEnd[i];
        }
        int hi = -i - 1;
        double ta = hi == 0 ? firstTime : ends[hi - 1];
        double pa = hi == 0 ? 0.0 : turnedAtEnd[hi - 1];
        double tb = hi == completed ? lastTime : ends[hi];
        double pb = hi == completed ? turned : turnedAtEnd[hi];
        return pa + (pb - pa) * (t - ta) / (tb - ta);
    }

    /**
     * Measured mean gyrofrequency (rad/s) over [first sample, t]: the signed gyrophase turned
     * divided by the time; NaN when t is not after the first sample or past the last.
     */
    public double frequencyUntil(double t) {
        return t > firstTime ? phaseAt(t) / (t - firstTime) : Double.NaN;
    }

    /**
     * Measured mean gyrofrequency (rad/s) over the whole run: the signed gyrophase turned
     * between the first and the last sample over their time; NaN with fewer than one gyration.
     */
    public double frequency() {
        return completed == 0 ? Double.NaN : frequencyUntil(lastTime);
    }
}
