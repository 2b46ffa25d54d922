package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.Orbits;
import org.twinorbit.shared.Constants;

class HigueraCaryPusherTest extends AbstractLeapfrogPusherTest {
    @Override FullOrbitPusher pusher() { return new HigueraCaryPusher(); }

    /**
     * Higuera & Cary (Phys. Plasmas 24, 052104 (2017)) rotate at γ² = (σ + sqrt(σ² + 4(τ² + u*²)))/2
     * with σ = γ² − τ², u* = u·τ/c: slightly above γ(u) when u has a part across B.
     */
    @Override
    double rotationGamma(double[] u, double tau) {
        double g2 = Orbits.gamma(u) * Orbits.gamma(u);
        double ustar = u[2] * tau / Constants.C; // B along z
        double sigma = g2 - tau * tau;
        return Math.sqrt(0.5 * (sigma + Math.sqrt(sigma * sigma + 4 * (tau * tau + ustar * ustar))));
    }

    /** Exact for a particle at rest in the drift frame (Higuera & Cary 2017); a gyrating one drifts with an O((Ω Δt)²) error, −1.6e-4 here, halving Δt quarters it. */
    @Override double relativisticDriftTolerance() { return 5e-4; }
}
