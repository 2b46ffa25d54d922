package org.twinorbit.integrators.fullorbit;

/**
 * The non-relativistic Boris variant through the leapfrog family's checks (rotation angle
 * 2·atan(Ω dt/2): Birdsall & Langdon (1991); volume preservation: Qin et al. (2013)); sources and
 * tolerances are named beside each check in {@link AbstractLeapfrogPusherTest}.
 */
class BorisNonRelativisticPusherTest extends AbstractLeapfrogPusherTest {
    @Override FullOrbitPusher pusher() { return new BorisNonRelativisticPusher(); }

    /** γ = 1 by construction. */
    @Override double rotationGamma(double[] u, double tau) { return 1.0; }

    /** Not used: the scheme is not relativistic. */
    @Override double relativisticDriftTolerance() { return Double.NaN; }
}
