package org.twinorbit.integrators.reference;

/** Receives guiding-center samples; arrays are reused by the caller, copy what you keep. */
@FunctionalInterface
public interface GuidingCenterObserver {
    /** @param t time (s) @param gc guiding-center position X (m) @param pPar parallel momentum (kg m/s) */
    void observe(double t, double[] gc, double pPar);
}
