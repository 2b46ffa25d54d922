package org.twinorbit.harness.run;

import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.integrators.guidingcenter.GuidingCenterIntegrator;
import org.twinorbit.integrators.guidingcenter.GuidingCenterStepper;
import org.twinorbit.integrators.reference.FullOrbitObserver;
import org.twinorbit.fields.Field;
import org.twinorbit.harness.metrics.EnergyMonitor;
import org.twinorbit.harness.metrics.GuidingCenterRecorder;
import org.twinorbit.harness.metrics.GyroAverager;
import org.twinorbit.harness.metrics.InvariantMonitor;
import org.twinorbit.shared.Species;

/**
 * Drives one integration and attaches the metric observers (STYLE.md point 1: the integrator
 * only steps; what is measured watches it through observer hooks).
 */
public final class Orbits {

    private Orbits() {}

    /** The observers of a full orbit, fanned out from one hook. */
    static final class FullOrbitWatch implements FullOrbitObserver {
        final GyroAverager gyro;
        final EnergyMonitor energy;
        final InvariantMonitor invariants;
        final double[] lastX = new double[3];
        final double[] lastU = new double[3];
        double lastT = Double.NaN;

        FullOrbitWatch(Field field, Species s, int stride, double deadband) {
            gyro = new GyroAverager(field, s, deadband);
            energy = new EnergyMonitor(field, s, stride);
            invariants = new InvariantMonitor(field, s);
        }

        @Override
        public void observe(double t, double[] x, double[] u) {
            gyro.observe(t, x, u);
            energy.observe(t, x, u);
            invariants.observe(t, x, u);
            System.arraycopy(x, 0, lastX, 0, 3);
            System.arraycopy(u, 0, lastU, 0, 3);
            lastT = t;
        }

        FullOrbitRecord record(Outcome o) {
            return new FullOrbitRecord(o, gyro, energy, invariants, lastX.clone(), lastU.clone(), lastT);
        }
    }

    /**
     * Pushes one particle n steps of dt from (x0, u0) at t = 0.
     *
     * @param dt step (s) @param stride keep one sample in this many for plots
     * @param deadband |v∥| (m/s) treated as zero when looking for mirror points
     */
    public static FullOrbitRecord push(FullOrbitPusher pusher, Field field, Species s, double[] x0, double[] u0,
                                       double dt, long n, int stride, double deadband) {
        long t0 = System.nanoTime();
        FullOrbitWatch watch = new FullOrbitWatch(field, s, stride, deadband);
        watch.energy.splitAt(0.5 * n * dt);
        FullOrbitStepper st = null;
        try {
            st = pusher.stepper(field, s, dt);
            st.start(0.0, x0.clone(), u0.clone());
            double[] x = new double[3];
            double[] u = new double[3];
            st.position(x);
            st.velocity(u);
            watch.observe(st.time(), x, u);
            OrbitStatus status = OrbitStatus.OK;
            for (long i = 0; i < n; i++) {
                if (!st.step()) {
                    status = st.status();
                    break;
                }
                st.position(x);
                st.velocity(u);
                watch.observe(st.time(), x, u);
                if (watch.energy.blownUp()) {
                    status = OrbitStatus.UNSTABLE;
                    break;
                }
            }
            return watch.record(new Outcome(status, st.time(), st.steps(), st.fieldEvaluations(), System.nanoTime() - t0));
        } catch (RuntimeException e) {
            // the pusher's own code failed: its row says so, every other orbit goes on
            return watch.record(failed(e, st, t0));
        }
    }

    /** The outcome of an integrator that threw: status failed, with what it threw. */
    private static Outcome failed(RuntimeException e, FullOrbitStepper st, long t0) {
        double t = 0;
        long steps = 0;
        try {
            if (st != null) {
                t = st.time();
                steps = st.steps();
            }
        } catch (RuntimeException ignored) {
            // the stepper that threw may not answer either
        }
        return new Outcome(OrbitStatus.FAILED, t, steps, steps, System.nanoTime() - t0,
                e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage()));
    }

    /**
     * Advances one guiding center n steps of dt from (X0, p∥0) at t = 0.
     *
     * @param mu magnetic moment (J/T) @param dt step (s)
     */
    public static GuidingCenterRecord advance(GuidingCenterIntegrator integrator, Field field, Species s,
                                              double mu, double[] gc0, double pPar0, double dt, long n, int stride,
                                              double deadband) {
        long t0 = System.nanoTime();
        GuidingCenterRecorder rec = new GuidingCenterRecorder(field, s, mu, stride, deadband);
        double[] x = gc0.clone();
        GuidingCenterStepper st = null;
        try {
            st = integrator.stepper(field, s, mu, dt);
            st.start(0.0, gc0.clone(), pPar0);
            st.position(x);
            rec.observe(st.time(), x, st.parallelMomentum());
            OrbitStatus status = OrbitStatus.OK;
            for (long i = 0; i < n; i++) {
                if (!st.step()) {
                    status = st.status();
                    break;
                }
                st.position(x);
                rec.observe(st.time(), x, st.parallelMomentum());
                if (rec.blownUp()) {
                    status = OrbitStatus.UNSTABLE;
                    break;
                }
            }
            Outcome o = new Outcome(status, st.time(), st.steps(), st.fieldEvaluations(), System.nanoTime() - t0);
            return new GuidingCenterRecord(o, rec, x.clone(), st.time(), java.util.List.of());
        } catch (RuntimeException e) {
            Outcome o = failed(e, null, t0);
            return new GuidingCenterRecord(o, rec, x.clone(), o.endTime(), java.util.List.of());
        }
    }
}
