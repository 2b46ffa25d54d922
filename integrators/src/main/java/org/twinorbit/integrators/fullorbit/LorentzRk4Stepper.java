package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.fields.Field;

/** One particle pushed by {@link LorentzRk4Step}; position and u are both at integer steps. */
final class LorentzRk4Stepper implements FullOrbitStepper {

    private final Field field;
    private final LorentzRk4Step rk4;
    private final double dt;
    private final double[] y = new double[6];
    private final double[] last = new double[6];
    private double t0;
    private long steps;
    private OrbitStatus status = OrbitStatus.OK;

    /** @param dt time step (s) */
    LorentzRk4Stepper(LorentzEquations equations, double dt) {
        if (!(dt != 0) || !Double.isFinite(dt)) {
            throw new IllegalArgumentException("time step dt must be a non-zero finite number of s, got " + dt);
        }
        this.field = equations.field();
        this.rk4 = new LorentzRk4Step(equations);
        this.dt = dt;
    }

    @Override
    public void start(double t0, double[] x0, double[] u0) {
        if (!field.inDomain(x0[0], x0[1], x0[2])) {
            throw new IllegalArgumentException("start position (" + x0[0] + ", " + x0[1] + ", " + x0[2]
                    + ") m lies outside the domain of field '" + field.name() + "': " + field.domainMeaning());
        }
        this.t0 = t0;
        System.arraycopy(x0, 0, y, 0, 3);
        System.arraycopy(u0, 0, y, 3, 3);
        steps = 0;
        rk4.equations().resetCount();
        status = OrbitStatus.OK;
    }

    @Override
    public boolean step() {
        if (status != OrbitStatus.OK) {
            return false;
        }
        System.arraycopy(y, 0, last, 0, 6);
        rk4.advance(time(), dt, y);
        if (!field.inDomain(y[0], y[1], y[2])) {
            return stop(OrbitStatus.LOST);
        }
        if (!Double.isFinite(y[0] + y[1] + y[2] + y[3] + y[4] + y[5])) {
            return stop(OrbitStatus.UNSTABLE);
        }
        steps++;
        return true;
    }

    private boolean stop(OrbitStatus why) {
        System.arraycopy(last, 0, y, 0, 6);
        status = why;
        return false;
    }

    @Override public OrbitStatus status() { return status; }
    @Override public double time() { return t0 + steps * dt; }

    @Override
    public void position(double[] out) {
        System.arraycopy(y, 0, out, 0, 3);
    }

    @Override
    public void velocity(double[] out) {
        System.arraycopy(y, 3, out, 0, 3);
    }

    @Override public long steps() { return steps; }
    @Override public long fieldEvaluations() { return rk4.equations().evaluations(); }
}
