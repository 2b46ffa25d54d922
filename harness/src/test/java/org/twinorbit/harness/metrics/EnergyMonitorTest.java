package org.twinorbit.harness.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.shared.Species;

/**
 * A run whose energy grows without bound is caught as blown up at the right time. The orbit fed
 * to the monitor is forward Euler on the gyration in a uniform B: each step multiplies |v| by
 * sqrt(1 + (Ω dt)²) exactly (the amplification factor of explicit Euler on a rotation; Hairer,
 * Nørsett & Wanner, Solving Ordinary Differential Equations I, 1993, stability of explicit
 * methods — common practice), so the kinetic energy after n steps is K0 (1 + (Ω dt)²)^n.
 */
class EnergyMonitorTest {

    @Test
    void explicitEulerGyrationBlowsUpWhenTheEnergyHasDoubled() {
        Species p = Species.PROTON;
        Field f = Fields.create("uniform", p);
        double omegaDt = 2 * Math.PI / 32;          // 32 steps per gyroperiod
        double dt = 1e-9;                           // s; only labels the samples
        double growth = 1 + omegaDt * omegaDt;      // energy factor per step
        EnergyMonitor m = new EnergyMonitor(f, p, 1);
        double[] x = {0, 0, 0};
        double[] u = {1e5, 0, 0};                   // m/s, non-relativistic
        int firstOver = (int) Math.ceil(Math.log(2) / Math.log(growth)); // (growth^n − 1) > 1
        for (int n = 0; n <= firstOver + 5; n++) {
            m.observe(n * dt, x, u);
            if (n < firstOver) {
                assertFalse(m.blownUp(), "blown up too early, at step " + n);
            }
            double c = Math.cos(omegaDt), s = Math.sin(omegaDt), k = Math.sqrt(growth);
            double ux = k * (c * u[0] + s * u[1]);
            double uy = k * (-s * u[0] + c * u[1]);
            u[0] = ux;
            u[1] = uy;
        }
        assertTrue(m.blownUp());
        assertEquals(firstOver * dt, m.blowUpTime(), 1e-15);
        // the monitor's kinetic energy is relativistic: it departs from the ½mu² scaling of the
        // Euler factor by O(u²/c²) ≈ 1e-7 at these speeds, hence 1e-6 relative
        double expected = Math.pow(growth, firstOver + 5) - 1;
        assertEquals(expected, m.maxError(), 1e-6 * expected);
    }

    @Test
    void aBoundedRippleIsNotABlowUp() {
        // Boris-like: |u| kept to round-off (Boris is energy-conserving in pure B; Birdsall &
        // Langdon 1991), so the error stays at round-off and nothing is flagged
        Species p = Species.PROTON;
        EnergyMonitor m = new EnergyMonitor(Fields.create("uniform", p), p, 1);
        double[] x = {0, 0, 0};
        for (int n = 0; n < 1000; n++) {
            double a = 0.2 * n;
            m.observe(n * 1e-9, x, new double[] {1e5 * Math.cos(a), -1e5 * Math.sin(a), 0});
        }
        assertFalse(m.blownUp());
        assertTrue(m.maxError() < 1e-14, "round-off expected, got " + m.maxError());
    }
}
