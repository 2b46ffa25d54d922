package org.twinorbit.integrators.guidingcenter;

import org.twinorbit.integrators.OrbitStatus;

/** One guiding center advanced by a fixed step. Not thread-safe; allocates nothing per step. */
public interface GuidingCenterStepper {

    /** Starts at time t0 (s) from X0 (m) with parallel momentum pPar0 (kg m/s). */
    void start(double t0, double[] gc0, double pPar0);

    /**
     * Advances one step. Returns false, leaving the last good state, when the guiding center
     * left the domain, the state stopped being finite, or B*∥ ≤ 0 (see {@link #status()}).
     */
    boolean step();

    OrbitStatus status();

    /** Time (s) of the current state. */
    double time();

    /** Guiding-center position (m) into {@code out}. */
    void position(double[] out);

    /** Parallel momentum p∥ (kg m/s). */
    double parallelMomentum();

    long steps();

    long fieldEvaluations();
}
