package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Species;

/**
 * What the full-orbit ensembles of this package share: the time, the per-particle status (a
 * particle that left the domain or went non-finite is frozen at its last good state), the
 * synchronised velocity and the count of field evaluations.
 */
public abstract class FullOrbitEnsemble extends EnsembleStepper {

    static final byte RUNNING = 0, LOST = 1, UNSTABLE = 2;

    final Field field;
    final double dt;
    /** q Δt / (2m) (s C/kg). */
    final double h;
    /** q/m (C/kg). */
    final double qm;
    final byte[] state;
    /** Time (s) of the state a particle was frozen at. */
    private final double[] stoppedAt;
    long steps;
    long evaluations;
    private double t0;

    /** @param dt time step (s) */
    FullOrbitEnsemble(Field field, Species species, double dt, int n) {
        super(n);
        if (n < 1) {
            throw new IllegalArgumentException("ensemble size must be at least 1, got " + n);
        }
        if (!(dt != 0) || !Double.isFinite(dt)) {
            throw new IllegalArgumentException("time step dt must be a non-zero finite number of s, got " + dt);
        }
        this.field = field;
        this.dt = dt;
        this.qm = species.chargeToMass();
        this.h = 0.5 * qm * dt;
        this.state = new byte[n];
        this.stoppedAt = new double[n];
    }

    /** Freezes particle i at its current (last good) state, at time t (s). */
    final void freeze(int i, byte why, double t) {
        state[i] = why;
        stoppedAt[i] = t;
    }

    /** Time (s) of particle i's state: the ensemble's time, or when it was frozen. */
    public final double time(int i) {
        return state[i] == RUNNING ? time() : stoppedAt[i];
    }

    /** Resets time, counters and statuses. @param t0 start time (s) */
    final void begin(double t0) {
        this.t0 = t0;
        steps = 0;
        evaluations = 0;
        java.util.Arrays.fill(state, RUNNING);
    }

    /** Refuses a start position outside the field's domain. */
    final void checkStart(int i) {
        if (!field.inDomain(x[i], y[i], z[i])) {
            throw new IllegalArgumentException("particle " + i + " starts at (" + x[i] + ", " + y[i] + ", "
                    + z[i] + ") m, outside the domain of field '" + field.name() + "': " + field.domainMeaning());
        }
    }

    @Override
    public final double time() {
        return t0 + steps * dt;
    }

    /** Steps taken since {@link #start}. */
    public final long steps() {
        return steps;
    }

    /** Field evaluations (all particles) since {@link #start}. */
    public final long fieldEvaluations() {
        return evaluations;
    }

    /** How particle i stands: OK while it is being pushed, LOST or UNSTABLE once frozen at {@link #time(int)}. */
    public final OrbitStatus status(int i) {
        return switch (state[i]) {
            case RUNNING -> OrbitStatus.OK;
            case LOST -> OrbitStatus.LOST;
            default -> OrbitStatus.UNSTABLE;
        };
    }

    /** u = γv (m/s) of particle i synchronised to its position at {@link #time(int)}, into out. */
    public abstract void velocity(int i, double[] out);
}
