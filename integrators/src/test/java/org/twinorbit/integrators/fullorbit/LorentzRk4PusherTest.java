package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.Orbits;
import org.twinorbit.integrators.TestField;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Species;

/** Classic RK4 on the Lorentz equations. */
class LorentzRk4PusherTest {

    private static final Species P = Species.PROTON;
    private final FullOrbitPusher rk4 = new LorentzRk4Pusher();

    /**
     * In a uniform B, RK4 multiplies the gyration amplitude by |R(iΩΔt)| per step with
     * R(z) = 1 + z + z²/2 + z³/6 + z⁴/24, |R(ix)|² = (1 − x²/2 + x⁴/24)² + (x − x³/6)² &lt; 1
     * (Hairer, Nørsett &amp; Wanner, Solving ODEs I, 1993, §IV.2, section from memory): the energy decreases every
     * step, secularly, by exactly that factor. At u = 1 km/s relativistic corrections are 1e-11.
     */
    @Test
    void losesEnergySecularlyAtTheStabilityFunctionRate() {
        double b = 1.0, omegaDt = 0.5;
        double dt = omegaDt * P.mass() / (P.charge() * b);
        FullOrbitStepper s = rk4.stepper(TestField.constant(0, 0, b, 0, 0, 0), P, dt);
        double[] u0 = {1e3, 0, 0}, u = new double[3];
        s.start(0, new double[3], u0);
        double prev = 1.0;
        int n = 2000;
        for (int k = 0; k < n; k++) {
            s.step();
            s.velocity(u);
            double w = (u[0] * u[0] + u[1] * u[1]) / (u0[0] * u0[0]);
            assertTrue(w < prev, "energy must fall at every step, step " + k);
            prev = w;
        }
        double x = omegaDt;
        double r2 = Math.pow(1 - x * x / 2 + x * x * x * x / 24, 2) + Math.pow(x - x * x * x / 6, 2);
        double expected = Math.pow(r2, n);
        assertEquals(expected, prev, 1e-10 * expected);
        assertTrue(prev < 0.99, "a visible loss: " + prev);
    }

    /** Position and velocity are both at integer steps: start then velocity gives u0 exactly. */
    @Test
    void velocityIsTheStateItself() {
        FullOrbitStepper s = rk4.stepper(TestField.smooth(1, 1e5, 0.5), P, 1e-9);
        double[] u0 = {1e6, 2e5, -3e5}, u = new double[3];
        s.start(0, new double[] {0.01, 0, 0}, u0);
        s.velocity(u);
        assertEquals(0, Orbits.distance(u, u0), 0.0);
        s.step();
        assertEquals(4, s.fieldEvaluations());
    }

    @Test
    void ensembleMatchesSingleParticle() {
        Field f = TestField.smooth(1.0, 1e6, 0.5);
        double dt = 0.1 * P.mass() / P.charge();
        FullOrbitEnsemble en = (FullOrbitEnsemble) rk4.ensemble(f, P, dt, 3);
        for (int i = 0; i < 3; i++) {
            en.x[i] = 0.01 * i;
            en.ux[i] = 1e6 * (i + 1);
            en.uz[i] = 1e5;
        }
        en.start(0);
        for (int k = 0; k < 300; k++) {
            en.step();
        }
        double[] x = new double[3], u = new double[3];
        for (int i = 0; i < 3; i++) {
            FullOrbitStepper s = rk4.stepper(f, P, dt);
            s.start(0, new double[] {0.01 * i, 0, 0}, new double[] {1e6 * (i + 1), 0, 1e5});
            for (int k = 0; k < 300; k++) {
                s.step();
            }
            s.position(x);
            s.velocity(u);
            assertEquals(x[0], en.x[i], 0.0);
            assertEquals(x[1], en.y[i], 0.0);
            assertEquals(u[2], en.uz[i], 0.0);
        }
        assertEquals(3 * 300 * 4, en.fieldEvaluations());
    }

    @Test
    void marksLostAndUnstable() {
        FullOrbitStepper s = rk4.stepper(TestField.walled(1e-3, 1.0), P, 1e-8);
        s.start(0, new double[3], new double[] {1e6, 0, 0});
        while (s.step()) {
            // until it stops
        }
        assertEquals(OrbitStatus.LOST, s.status());
        double[] x = new double[3];
        s.position(x);
        assertTrue(x[0] < 1.0 && x[0] > 0.98);

        s = rk4.stepper(TestField.poisoned(1e-3, 0.5), P, 1e-8);
        s.start(0, new double[3], new double[] {1e6, 0, 0});
        while (s.step()) {
            // until it stops
        }
        assertEquals(OrbitStatus.UNSTABLE, s.status());
        s.position(x);
        assertTrue(x[0] <= 0.5 + 1e-2 && Double.isFinite(x[0]));
    }
}
