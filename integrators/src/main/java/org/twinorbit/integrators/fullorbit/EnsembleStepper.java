package org.twinorbit.integrators.fullorbit;

/**
 * n particles of one species pushed together, stored as structure of arrays so that the loop
 * over particles allocates nothing and the JIT can keep it tight. Arrays are public and owned
 * by the stepper; length n.
 */
public abstract class EnsembleStepper {

    /** Positions (m). */
    public final double[] x, y, z;
    /** u = γv (m/s); staggered by half a step for leapfrog schemes after {@link #start}. */
    public final double[] ux, uy, uz;
    /** Number of particles. */
    public final int n;

    protected EnsembleStepper(int n) {
        this.n = n;
        x = new double[n];
        y = new double[n];
        z = new double[n];
        ux = new double[n];
        uy = new double[n];
        uz = new double[n];
    }

    /** Takes the arrays as positions and velocities at time t0 (s) and prepares the first step. */
    public abstract void start(double t0);

    /** Advances every particle by one step. */
    public abstract void step();

    /** Time (s) of the positions. */
    public abstract double time();
}
