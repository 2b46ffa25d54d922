package org.twinorbit.harness.verdict;

import org.twinorbit.fields.Field;
import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/**
 * A one-particle stepper for the deliberately wrong test pushers: holds x and u = γv at the
 * same time and lets a subclass advance them by one step.
 */
abstract class SimpleStepper implements FullOrbitStepper {

    final Field field;
    final double qm;
    final double dt;
    final FieldSample f = new FieldSample();
    final double[] x = new double[3];
    final double[] u = new double[3];
    double t;
    long steps;
    long evaluations;
    OrbitStatus status = OrbitStatus.OK;

    SimpleStepper(Field field, Species s, double dt) {
        this.field = field;
        this.qm = s.charge() / s.mass();
        this.dt = dt;
    }

    @Override
    public void start(double t0, double[] x0, double[] u0) {
        t = t0;
        System.arraycopy(x0, 0, x, 0, 3);
        System.arraycopy(u0, 0, u, 0, 3);
    }

    /** Advances x and u from t to t + dt. */
    abstract void advance();

    void sample(double time, double[] at) {
        field.evaluate(time, at[0], at[1], at[2], f);
        evaluations++;
    }

    double inverseGamma() {
        return 1.0 / Relativity.gammaFromU2(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
    }

    @Override
    public boolean step() {
        double[] x0 = x.clone();
        double[] u0 = u.clone();
        advance();
        if (!Double.isFinite(x[0] + x[1] + x[2] + u[0] + u[1] + u[2])) {
            System.arraycopy(x0, 0, x, 0, 3);
            System.arraycopy(u0, 0, u, 0, 3);
            status = OrbitStatus.UNSTABLE;
            return false;
        }
        if (!field.inDomain(x[0], x[1], x[2])) {
            System.arraycopy(x0, 0, x, 0, 3);
            System.arraycopy(u0, 0, u, 0, 3);
            status = OrbitStatus.LOST;
            return false;
        }
        t += dt;
        steps++;
        return true;
    }

    @Override public OrbitStatus status() { return status; }
    @Override public double time() { return t; }
    @Override public void position(double[] out) { System.arraycopy(x, 0, out, 0, 3); }
    @Override public void velocity(double[] out) { System.arraycopy(u, 0, out, 0, 3); }
    @Override public long steps() { return steps; }
    @Override public long fieldEvaluations() { return evaluations; }
}
