package org.example.pusher;

import static org.twinorbit.harness.api.PusherAssertions.assertEnergyErrorBelow;
import static org.twinorbit.harness.api.PusherAssertions.assertOrder;
import static org.twinorbit.harness.api.PusherAssertions.assertPhaseErrorBelow;
import static org.twinorbit.harness.api.PusherAssertions.assertVerdictsPass;

import org.junit.jupiter.api.Test;
import org.twinorbit.harness.api.PusherTrial;
import org.twinorbit.harness.cases.CaseSpec;

/**
 * The example pusher tested with twinorbit's Java API, as an outside project would: in a
 * uniform field its rotation angle is the exact gyration angle Ω Δt, so the measured gyrophase
 * error must vanish to round-off, where Boris lags by −(Ω Δt)²/12 ≈ −3.2e-3 at 32 steps per
 * gyroperiod (Taylor expansion of 2 atan(Ω Δt/2); common practice); it keeps the energy in a
 * magnetic field (an exact rotation) and converges at second order.
 */
class ExactAngleBorisPusherTest {

    @Test
    void gyrophaseIsExactInAUniformField() {
        CaseSpec s = PusherTrial.spec("uniform");
        s.energy = 1e4;
        s.phases = 2;
        s.duration = 20.0;
        PusherTrial t = PusherTrial.run(new ExactAngleBorisPusher(), s);
        assertPhaseErrorBelow(t, 1e-10);
        assertEnergyErrorBelow(t, 1e-13);
        assertVerdictsPass(t);
    }

    @Test
    void secondOrderInAGradientField() {
        CaseSpec s = PusherTrial.spec("gradient");
        s.eps = 0.02;
        s.phases = 2;
        s.duration = 10.0;
        PusherTrial t = PusherTrial.run(new ExactAngleBorisPusher(), s);
        assertOrder(t, 2.0, 0.2);
        assertEnergyErrorBelow(t, 1e-13);
        assertVerdictsPass(t);
    }
}
