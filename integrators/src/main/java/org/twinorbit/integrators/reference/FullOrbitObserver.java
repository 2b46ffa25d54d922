package org.twinorbit.integrators.reference;

/** Receives full-orbit samples; arrays are reused by the caller, copy what you keep. */
@FunctionalInterface
public interface FullOrbitObserver {
    /** @param t time (s) @param x position (m) @param u γv (m/s), synchronised to x */
    void observe(double t, double[] x, double[] u);
}
