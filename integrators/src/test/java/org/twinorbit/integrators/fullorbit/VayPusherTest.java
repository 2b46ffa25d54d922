package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.Orbits;

class VayPusherTest extends AbstractLeapfrogPusherTest {
    @Override FullOrbitPusher pusher() { return new VayPusher(); }

    /** In pure B Vay's implicit half step solves for the γ of the new u, which equals γ(u). */
    @Override double rotationGamma(double[] u, double tau) { return Orbits.gamma(u); }

    /** Vay's drift is exact (Vay 2008): only the measurement error (~1e-8) remains. */
    @Override double relativisticDriftTolerance() { return 1e-7; }
}
