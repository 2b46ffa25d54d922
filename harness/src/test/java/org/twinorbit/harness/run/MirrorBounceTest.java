package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.harness.cases.CaseSpec;

/**
 * Bounce period in the paraxial {@code mirror} field against the harmonic on-axis period. On the
 * axis B = B0(1 + (Rm − 1) z²/Lm²), so the mirror force −(μ/γ) dB/dz is linear in z and the
 * guiding center oscillates harmonically with ω_b = v⊥0 sqrt(γ (Rm − 1))/Lm (μ conservation and
 * the mirror force: common practice; Chen, Introduction to Plasma Physics, §2.3.3).
 */
class MirrorBounceTest {

    @Test
    void bouncePeriodMatchesHarmonicOnAxisPeriod() {
        CaseSpec s = TestCases.spec("mirror", "boris", "gc-rk4");
        s.eps = 0.005;
        s.pitch = 60.0;
        s.phases = 2;
        s.duration = 2.0;
        s.durationUnit = "bounces";
        CaseResult r = TestCases.run(s);
        double rm = 4.0; // docs/design.md default mirror ratio, Lm = 1 m
        double lm = 1.0;
        double gamma = r.resolved().gamma();
        double u = r.resolved().momentum() / r.resolved().species().mass();
        double vPerp = u * Math.sin(Math.toRadians(60)) / gamma;
        double harmonic = 2 * Math.PI * lm / (vPerp * Math.sqrt(gamma * (rm - 1)));
        // the guiding-center reference on the axis is exactly harmonic; its mirror points are
        // interpolated between samples 1/32 gyroperiod apart, which is exact to O(dt³) for a sine
        ResultRow model = TestCases.row(r, "gc-reference");
        assertEquals(harmonic, model.metric("bounce_period_s").mean(), 1e-6 * harmonic);
        // the gyro-averaged full orbit differs by finite-Larmor-radius terms of relative order
        // ε² = 2.5e-5 (the ring samples B at r ~ ρ off the axis); 1e-3 bounds that generously
        // while a wrong bounce (a 2π or a factor sqrt(γ) slip) would be far outside it
        double fullOrbit = model.metric("bounce_period_s").mean() / (1 + model.metric("bounce_period_error").mean());
        assertEquals(harmonic, fullOrbit, 1e-3 * harmonic);
        // ⟨μ⟩ ripples reversibly at O(ε²) within each bounce, while the net change between
        // equivalent bounce phases is exponentially small in 1/ε (Chirikov, Phys. Rep. 52, 1979):
        // the μ jump must be far below the μ change, which must itself be visible
        double change = model.metric("mu_change").worst();
        double jump = model.metric("mu_jump").worst();
        assertTrue(change > 1e-7, "mu change " + change);
        assertTrue(jump < 1e-2 * change, "mu jump " + jump + " against change " + change);
        ResultRow boris = TestCases.row(r, "boris");
        assertEquals(harmonic, boris.metric("bounce_period_s").mean(), 1e-3 * harmonic);
        assertEquals("trapped", boris.orbitClass());
        assertEquals(1.0, boris.classAgreement());
    }
}
