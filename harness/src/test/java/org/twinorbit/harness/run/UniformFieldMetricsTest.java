package org.twinorbit.harness.run;

import org.twinorbit.integrators.fullorbit.Pushers;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.metrics.GyroAverager;
import org.twinorbit.harness.metrics.OrbitMetrics;
import org.twinorbit.shared.Gyration;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/** The metrics on the uniform field, where every answer is known in closed form. */
class UniformFieldMetricsTest {

    @Test
    void borisKeepsMuAndEnergyToRoundOff() {
        CaseSpec s = TestCases.spec("uniform", "boris", "none");
        s.phases = 4;
        s.duration = 50.0;
        CaseResult r = TestCases.run(s);
        ResultRow boris = TestCases.row(r, "boris");
        // Boris rotates u exactly (|u| kept to round-off; Birdsall & Langdon, Plasma Physics via
        // Computer Simulation, 1991, §4-4): in a uniform B both μ and the energy change only by
        // round-off. 1e-12 allows ~10⁴ roundings of 1e-16.
        assertTrue(boris.metric("mu_change").worst() < 1e-12, () -> "mu change " + boris.metric("mu_change"));
        assertTrue(boris.metric("energy_error").worst() < 1e-12, () -> "energy " + boris.metric("energy_error"));
        assertEquals("ok", boris.status());
        // and a scheme that is not exact does show an error: the μ change measures something
        CaseSpec k = TestCases.spec("uniform", "rk4", "none");
        k.phases = 1;
        k.duration = 50.0;
        k.stepsPerGyro = 8;
        ResultRow rk4 = TestCases.row(TestCases.run(k), "rk4");
        assertTrue(rk4.metric("mu_change").worst() > 1e-4, () -> "rk4 mu change " + rk4.metric("mu_change"));
    }

    @Test
    void borisPhaseErrorIsTheRotationAnglePrediction() {
        // one Boris step turns u by θ = 2 arctan(Ω dt/2) instead of Ω dt (Birdsall & Langdon 1991,
        // §4-4; Qin et al., Phys. Plasmas 20, 084503, 2013): the measured gyrofrequency is θ/dt,
        // so the phase error is 2 arctan(Ω dt/2)/(Ω dt) − 1.
        Species p = Species.PROTON;
        Field f = Fields.create("uniform", p);
        double ev = 1e4;
        double gamma = Relativity.gammaFromKinetic(p, ev);
        double omega = Gyration.frequency(p, 1.0, gamma);
        double u = Relativity.uFromKinetic(p, ev);
        for (int spg : new int[] {8, 16, 64}) {
            double dt = 2 * Math.PI / omega / spg;
            FullOrbitRecord rec = Orbits.push(Pushers.byName("boris"), f, p, new double[] {0.01, 0, 0},
                    new double[] {0, u * 0.8, u * 0.6}, dt, 40L * spg, 1, 1e-6 * u);
            GyroAverager g = rec.gyro();
            double measured = g.frequency() / omega - 1;
            double predicted = 2 * Math.atan(omega * dt / 2) / (omega * dt) - 1;
            // the crossings are interpolated linearly in a phase that grows exactly linearly,
            // so only round-off separates the two; 1e-9 is far below the 1e-3 effect measured
            assertEquals(predicted, measured, 1e-9, "steps per gyration " + spg);
        }
        // the full harness reports the same number against its reference
        CaseSpec s = TestCases.spec("uniform", "boris", "none");
        s.phases = 2;
        s.stepsPerGyro = 16;
        ResultRow boris = TestCases.row(TestCases.run(s), "boris");
        double x = 2 * Math.PI / 16;
        // the reference's own gyrofrequency is exact to its tolerance (rtol 1e-10)
        assertEquals(2 * Math.atan(x / 2) / x - 1, boris.metric("phase_error").worst(), 1e-8);
        assertEquals(0.0, OrbitMetrics.relative(1.0, 1.0));
    }
}
