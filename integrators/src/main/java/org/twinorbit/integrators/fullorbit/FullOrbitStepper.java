package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.OrbitStatus;

/**
 * One particle pushed by a fixed-step scheme. Not thread-safe: one stepper per thread. No
 * method allocates after construction.
 */
public interface FullOrbitStepper {

    /**
     * Starts at time t0 (s) from position x0 (m) and u0 = γv (m/s), both at t0; leapfrog schemes
     * offset their velocity by half a step here.
     */
    void start(double t0, double[] x0, double[] u0);

    /**
     * Advances one step. Returns false, and leaves the state at the last good step, when the
     * particle left the domain ({@link OrbitStatus#LOST}) or the state stopped being finite
     * ({@link OrbitStatus#UNSTABLE}).
     */
    boolean step();

    /** {@link OrbitStatus#OK} while running; why it stopped otherwise. */
    OrbitStatus status();

    /** Time (s) of the current position. */
    double time();

    /** Position (m) at {@link #time()} into {@code out}. */
    void position(double[] out);

    /**
     * u = γv (m/s) synchronised to the position at {@link #time()} into {@code out} (for a
     * leapfrog scheme, advanced from the half step by half a step of the scheme itself, not by
     * averaging the two half-step velocities).
     */
    void velocity(double[] out);

    /** Steps taken since {@link #start}. */
    long steps();

    /** Field evaluations since {@link #start}. */
    long fieldEvaluations();
}
