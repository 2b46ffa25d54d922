package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.Orbits;

class BorisPusherTest extends AbstractLeapfrogPusherTest {
    @Override FullOrbitPusher pusher() { return new BorisPusher(); }

    /** Boris rotates at the γ of u after the first half kick, which in pure B is γ(u). */
    @Override double rotationGamma(double[] u, double tau) { return Orbits.gamma(u); }

    /** Boris's relativistic drift is off at O((Ω Δt)²) (Vay, Phys. Plasmas 15 (2008)): (Ω Δt)²/40 ≈ 2.4e-4 here, halving Δt quarters it. */
    @Override double relativisticDriftTolerance() { return 5e-4; }
}
