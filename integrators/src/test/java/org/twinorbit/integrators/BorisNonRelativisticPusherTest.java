package org.twinorbit.integrators;

class BorisNonRelativisticPusherTest extends AbstractLeapfrogPusherTest {
    @Override FullOrbitPusher pusher() { return new BorisNonRelativisticPusher(); }

    /** γ = 1 by construction. */
    @Override double rotationGamma(double[] u, double tau) { return 1.0; }

    /** Not used: the scheme is not relativistic. */
    @Override double relativisticDriftTolerance() { return Double.NaN; }
}
