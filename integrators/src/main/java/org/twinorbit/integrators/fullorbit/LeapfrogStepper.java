package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * The stepping loop shared by every leapfrog scheme (positions at integer steps, u = γv at half
 * steps), for one particle. Per step: the scheme's velocity update with the field at the current
 * position, the drift x += (u/γ) Δt, the domain check, the field at the new position (kept for
 * the next step and for {@link #velocity}), the finiteness check. Nothing allocates after
 * construction.
 */
final class LeapfrogStepper implements FullOrbitStepper {

    private final Field field;
    private final LeapfrogUpdate update;
    private final FieldSample sample = new FieldSample();
    private final double dt;
    /** q Δt / (2m) (s C/kg). */
    private final double h;

    private double x, y, z;
    private double t0;
    private long steps;
    private long evaluations;
    private OrbitStatus status = OrbitStatus.OK;

    /** @param dt time step (s), may be negative to run backwards */
    LeapfrogStepper(Field field, Species species, double dt, LeapfrogUpdate update) {
        if (!(dt != 0) || !Double.isFinite(dt)) {
            throw new IllegalArgumentException("time step dt must be a non-zero finite number of s, got " + dt);
        }
        this.field = field;
        this.update = update;
        this.dt = dt;
        this.h = species.charge() * dt / (2.0 * species.mass());
    }

    @Override
    public void start(double t0, double[] x0, double[] u0) {
        resume(t0, x0, u0);
        update.undoFirstHalf(sample, h);
    }

    /**
     * Starts from a state already staggered: u0 (m/s) is u at t0 − Δt/2, x0 (m) the position at
     * t0 (s). Used to continue a run and to test the one-step map.
     */
    void resume(double t0, double[] x0, double[] uHalf) {
        this.t0 = t0;
        x = x0[0];
        y = x0[1];
        z = x0[2];
        update.ux = uHalf[0];
        update.uy = uHalf[1];
        update.uz = uHalf[2];
        steps = 0;
        evaluations = 0;
        status = OrbitStatus.OK;
        if (!field.inDomain(x, y, z)) {
            throw new IllegalArgumentException("start position (" + x + ", " + y + ", " + z
                    + ") m lies outside the domain of field '" + field.name() + "': " + field.domainMeaning());
        }
        evaluate();
    }

    @Override
    public boolean step() {
        if (status != OrbitStatus.OK) {
            return false;
        }
        double ux0 = update.ux, uy0 = update.uy, uz0 = update.uz;
        double x0 = x, y0 = y, z0 = z;
        double g = update.push(sample, h) * dt;
        x = x0 + update.ux * g;
        y = y0 + update.uy * g;
        z = z0 + update.uz * g;
        if (!field.inDomain(x, y, z)) {
            return stop(OrbitStatus.LOST, x0, y0, z0, ux0, uy0, uz0);
        }
        steps++;
        evaluate();
        // one sum is NaN or infinite as soon as any term is: a single test per step
        double all = x + y + z + update.ux + update.uy + update.uz + sample.bx + sample.by + sample.bz;
        if (!Double.isFinite(all)) {
            steps--;
            return stop(OrbitStatus.UNSTABLE, x0, y0, z0, ux0, uy0, uz0);
        }
        return true;
    }

    private boolean stop(OrbitStatus why, double x0, double y0, double z0, double ux0, double uy0, double uz0) {
        x = x0;
        y = y0;
        z = z0;
        update.ux = ux0;
        update.uy = uy0;
        update.uz = uz0;
        if (why == OrbitStatus.UNSTABLE) {
            evaluate(); // the sample was overwritten at the bad position
        }
        status = why;
        return false;
    }

    private void evaluate() {
        field.evaluate(time(), x, y, z, sample);
        evaluations++;
    }

    @Override
    public OrbitStatus status() {
        return status;
    }

    @Override
    public double time() {
        return t0 + steps * dt;
    }

    @Override
    public void position(double[] out) {
        out[0] = x;
        out[1] = y;
        out[2] = z;
    }

    @Override
    public void velocity(double[] out) {
        double ux0 = update.ux, uy0 = update.uy, uz0 = update.uz;
        update.firstHalf(sample, h);
        out[0] = update.ux;
        out[1] = update.uy;
        out[2] = update.uz;
        update.ux = ux0;
        update.uy = uy0;
        update.uz = uz0;
    }

    /** u (m/s) at half a step before {@link #time()}, the scheme's own staggered variable. */
    void staggeredVelocity(double[] out) {
        out[0] = update.ux;
        out[1] = update.uy;
        out[2] = update.uz;
    }

    @Override
    public long steps() {
        return steps;
    }

    @Override
    public long fieldEvaluations() {
        return evaluations;
    }
}
