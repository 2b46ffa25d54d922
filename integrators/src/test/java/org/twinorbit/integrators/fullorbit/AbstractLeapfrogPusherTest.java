package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.DriftMeter;
import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.Orbits;
import org.twinorbit.integrators.TestField;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/**
 * What every leapfrog pusher must do; each concrete test states only its scheme's rotation
 * Lorentz factor and its tolerances.
 */
abstract class AbstractLeapfrogPusherTest {

    static final Species P = Species.PROTON;
    static final double C = Constants.C;

    abstract FullOrbitPusher pusher();

    /** The Lorentz factor at which the scheme rotates u in a pure magnetic field. @param tau q B Δt/(2m) */
    abstract double rotationGamma(double[] u, double tau);

    /**
     * Largest relative error of the gyro-averaged drift against E×B/B² at v_E = c/2 with 64 steps
     * per gyration. The measurement itself is good to ~1e-8 (Hermite interpolation at 64 steps
     * per gyration over 200 gyrations); Boris and Higuera–Cary add their own O((Ω Δt)²) error.
     */
    abstract double relativisticDriftTolerance();

    boolean relativistic() {
        return pusher().properties().contains("relativistic");
    }

    /**
     * One step turns u by exactly 2·atan(q B Δt / (2γm)) in a uniform B, for any Δt (Birdsall &
     * Langdon, Plasma Physics via Computer Simulation, 1991, §4-4, section from memory; Qin et al., Phys. Plasmas 20,
     * 084503, 2013), here summed over 20 gyrations.
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.05, 0.1, 0.3, 1.0, 2.0})
    void turnsByTwiceArctanOfHalfOmegaDtPerStep(double omegaDt) {
        double b = 1.0;
        double dt = omegaDt * P.mass() / (P.charge() * b);
        double[] x0 = {0, 0, 0};
        double[] u0 = {Relativity.uFromKinetic(P, 10e6), 0, 3e6}; // a 10 MeV proton, γ = 1.0107
        double tau = 0.5 * omegaDt;
        double perStep = 2 * Math.atan(tau / rotationGamma(u0, tau));
        int n = (int) Math.ceil(20 * 2 * Math.PI / perStep);
        FullOrbitStepper s = pusher().stepper(TestField.constant(0, 0, b, 0, 0, 0), P, dt);
        s.start(0, x0, u0);
        double[] prev = u0.clone(), u = new double[3];
        double turned = 0;
        for (int k = 0; k < n; k++) {
            assertTrue(s.step());
            s.velocity(u);
            // a positive charge turns clockwise about +z: count that as positive
            turned += Math.atan2(prev[1] * u[0] - prev[0] * u[1], prev[0] * u[0] + prev[1] * u[1]);
            System.arraycopy(u, 0, prev, 0, 3);
        }
        // round-off: ~1e-16 rad per step over ≤ 2600 steps; using Ω Δt instead of the arctan
        // would be off by ~n (Ω Δt)³/12 ≥ 1e-4 rad
        assertEquals(n * perStep, turned, 1e-9, "total angle over " + n + " steps");
    }

    /**
     * In a pure magnetic field the kinetic energy is exact (common practice: every scheme here
     * turns u by a rotation in that case); round-off grows at most like N·ε.
     */
    @Test
    void keepsEnergyToRoundOffInPureMagneticField() {
        Field f = TestField.smooth(1.0, 0.0, 0.5);
        double[] x0 = {0.01, 0, 0};
        double[] u0 = {Relativity.uFromKinetic(P, 1e6), 0, 5e6};
        double dt = 2 * Math.PI * P.mass() / (P.charge() * 1.0) / 16;
        FullOrbitStepper s = pusher().stepper(f, P, dt);
        s.start(0, x0, u0);
        double u2 = u0[0] * u0[0] + u0[2] * u0[2];
        double[] u = new double[3];
        double worst = 0;
        int n = 20_000;
        for (int k = 0; k < n; k++) {
            assertTrue(s.step());
            s.velocity(u);
            worst = Math.max(worst, Math.abs((u[0] * u[0] + u[1] * u[1] + u[2] * u[2]) / u2 - 1));
        }
        assertTrue(worst < n * Math.ulp(1.0), "max |Δ(u²)|/u² = " + worst);
    }

    /** start() then velocity() gives back u0: the half-step offset and the synchronisation are inverse. */
    @Test
    void synchronisedVelocityAtStartIsTheInitialOne() {
        Field f = TestField.smooth(1.0, 2e5, 0.5);
        double[] x0 = {0.02, 0.01, -0.01};
        double[] u0 = {3e7, -1e7, 2e7};
        FullOrbitStepper s = pusher().stepper(f, P, 3e-9);
        s.start(0, x0, u0);
        double[] u = new double[3];
        s.velocity(u);
        assertEquals(0, Orbits.distance(u, u0) / Orbits.norm(u0), 1e-14);
    }

    /**
     * E×B drift, non-relativistic: the guiding center moves at E×B/B² (Jackson, Classical
     * Electrodynamics, 3rd ed., §12.3, section from memory). The step is chosen so that one discrete gyration is
     * exactly 32 steps; over whole gyrations the gyration cancels and the mean velocity is the
     * drift.
     */
    @Test
    void driftsAtExBNonRelativistic() {
        double b = 1.0, e = 1e3;
        double[] u0 = {1e4, 0, 2e3};
        int m = 32, gyrations = 50;
        // τ/γ_rot = tan(π/m) makes one discrete gyration exactly m steps
        double tau = Math.tan(Math.PI / m) * rotationGamma(u0, Math.tan(Math.PI / m));
        double dt = 2 * tau * P.mass() / (P.charge() * b);
        FullOrbitStepper s = pusher().stepper(TestField.constant(0, 0, b, e, 0, 0), P, dt);
        double[] x0 = {0, 0, 0}, x = new double[3];
        s.start(0, x0, u0);
        for (int k = 0; k < m * gyrations; k++) {
            assertTrue(s.step());
        }
        s.position(x);
        double vy = x[1] / s.time();
        double expected = -e / b; // E x̂ × B ẑ / B² = −(E/B) ŷ
        // γ − 1 ~ 6e-10 at these speeds: relativistic schemes may differ from the exact
        // commensurate step by that much, times v⊥/v_E = 10
        assertEquals(expected, vy, 1e-8 * Math.abs(expected));
        assertEquals(0, x[0] / s.time(), 1e-8 * Math.abs(expected));
    }

    /**
     * The synchronised velocity of a particle gyrating in crossed fields keeps its gyration speed
     * |u − v_E| exactly (non-relativistic exact motion; Jackson §12.3, section from memory): the plain average of the
     * two half-step velocities would be short by 1/sqrt(1 + (Ω Δt/2)²) = −3.7 % at 16 steps per
     * gyration (docs/design.md). At u ~ 1e4 m/s, γ − 1 ~ 1e-9 bounds what the relativistic schemes
     * may differ.
     */
    @Test
    void synchronisedVelocityKeepsGyrationSpeedInCrossedFields() {
        double b = 1.0, e = 2e3;
        FullOrbitStepper s = pusher().stepper(TestField.constant(0, 0, b, e, 0, 0), P, 2 * Math.PI * P.mass() / (P.charge() * b) / 16);
        double[] u0 = {1e4, 0, 3e3}, u = new double[3];
        double vE = -e / b;
        s.start(0, new double[3], u0);
        double w0 = Math.hypot(u0[0], u0[1] - vE), worst = 0;
        for (int k = 0; k < 1000; k++) {
            s.step();
            s.velocity(u);
            worst = Math.max(worst, Math.abs(Math.hypot(u[0], u[1] - vE) / w0 - 1));
            assertEquals(u0[2], u[2], 1e-9 * u0[2]);
        }
        assertTrue(worst < 1e-9, "gyration speed changed by " + worst);
    }

    /**
     * E×B drift at v_E = c/2: the guiding center still moves at E×B/B² (Jackson §12.3, section from memory, by a
     * Lorentz transformation to the frame where E vanishes), measured between same-phase
     * crossings (u_x rising through 0) located by cubic Hermite interpolation.
     */
    @Test
    void driftsAtExBRelativistic() {
        if (!relativistic()) {
            return;
        }
        double b = 1.0, e = 0.5 * C * b;
        Field f = TestField.constant(0, 0, b, e, 0, 0);
        double[] v0 = {0.3 * C, -0.5 * C, 0};
        double g0 = 1 / Math.sqrt(1 - 0.34);
        double[] u0 = {g0 * v0[0], g0 * v0[1], 0};
        double tc = 2 * Math.PI * g0 * P.mass() / (P.charge() * b);
        double dt = tc / 64;
        double measured = DriftMeter.exbDriftY(pusher().stepper(f, P, dt), P, f, u0, 64 * 200);
        double expected = -e / b;
        assertEquals(expected, measured, relativisticDriftTolerance() * Math.abs(expected));
    }

    /**
     * Uniform E from rest, no B: x(t) = (mc²/qE)(sqrt(1 + (qEt/mc)²) − 1) (Jackson, Classical
     * Electrodynamics, 3rd ed., ch. 12, hyperbolic motion; section from memory); non-relativistically
     * x = qEt²/(2m), which leapfrog reproduces exactly at integer steps (common practice).
     */
    @Test
    void acceleratesInUniformElectricField() {
        double e = 1e7;
        Field f = TestField.constant(0, 0, 0, e, 0, 0);
        double a = P.charge() * e / P.mass();
        double tEnd = 3 * C / a; // qEt/mc = 3: strongly relativistic
        double[] err = new double[2];
        for (int r = 0; r < 2; r++) {
            int n = 1000 << r;
            FullOrbitStepper s = pusher().stepper(f, P, tEnd / n);
            s.start(0, new double[3], new double[3]);
            for (int k = 0; k < n; k++) {
                assertTrue(s.step());
            }
            double[] x = new double[3];
            s.position(x);
            double exact = relativistic()
                    ? C * C / a * (Math.sqrt(1 + Math.pow(a * tEnd / C, 2)) - 1)
                    : 0.5 * a * tEnd * tEnd;
            err[r] = Math.abs(x[0] / exact - 1);
        }
        if (relativistic()) {
            // midpoint rule on dx/dt = u/γ: second order, error ~ (Δt/t)² = 1e-6 at n = 1000
            assertTrue(err[0] < 1e-5, "relative error " + err[0]);
            assertEquals(4.0, err[0] / err[1], 0.4, "halving Δt must quarter the error");
        } else {
            assertTrue(err[0] < 1e-13 && err[1] < 1e-13, "leapfrog is exact here: " + err[0] + ", " + err[1]);
        }
    }

    /**
     * The one-step map (x_n, u_{n−1/2}) → (x_{n+1}, u_{n+1/2}) preserves phase-space volume:
     * det of its 6-D Jacobian = 1 (Qin et al., Phys. Plasmas 20, 084503, 2013; for the
     * relativistic schemes Higuera & Cary, Phys. Plasmas 24, 052104, 2017). Jacobian by 4th-order
     * central differences in units of ρ and |u|: truncation ~δ⁴ = 1e-12, round-off ~ε/δ = 1e-13.
     */
    @Test
    void oneStepPreservesPhaseSpaceVolume() {
        double det = oneStepJacobianDeterminant();
        if (pusher().properties().contains("volume-preserving")) {
            assertEquals(1.0, det, 1e-10);
        } else {
            // not claimed; Vay's scheme is not volume-preserving (Higuera & Cary 2017)
            assertTrue(Math.abs(det - 1) > 1e-8, "det − 1 = " + (det - 1));
        }
    }

    double oneStepJacobianDeterminant() {
        Field f = TestField.smooth(1.0, 0.3 * C, 0.5);
        double[] s0 = {0.01, -0.02, 0.015, 0.3 * C, -0.4 * C, 0.5 * C};
        double rho = 0.7 * C * P.mass() / (P.charge() * 1.0);
        double[] scale = {rho, rho, rho, 0.7 * C, 0.7 * C, 0.7 * C};
        double dt = 0.3 * P.mass() / (P.charge() * 1.0);
        double delta = 1e-3;
        double[][] jac = new double[6][6];
        double[] w = {1.0 / 12, -2.0 / 3, 0, 2.0 / 3, -1.0 / 12}; // offsets −2δ … +2δ
        for (int j = 0; j < 6; j++) {
            for (int p = 0; p < 5; p++) {
                if (w[p] == 0) {
                    continue;
                }
                double[] s = s0.clone();
                s[j] += (p - 2) * delta * scale[j];
                double[] out = oneStep(f, s, dt);
                for (int i = 0; i < 6; i++) {
                    jac[i][j] += w[p] * out[i] / scale[i] / delta;
                }
            }
        }
        return new LUDecomposition(new Array2DRowRealMatrix(jac)).getDeterminant();
    }

    private double[] oneStep(Field f, double[] s, double dt) {
        LeapfrogStepper st = (LeapfrogStepper) pusher().stepper(f, P, dt);
        st.resume(0, new double[] {s[0], s[1], s[2]}, new double[] {s[3], s[4], s[5]});
        assertTrue(st.step());
        double[] x = new double[3], u = new double[3];
        st.position(x);
        st.staggeredVelocity(u);
        return new double[] {x[0], x[1], x[2], u[0], u[1], u[2]};
    }

    /**
     * Time-reversible: N steps forward, then N steps with −Δt from the mirrored staggering, come
     * back to the start (common practice for symmetric leapfrog schemes; Hairer, Lubich & Wanner,
     * Geometric Numerical Integration, 2006, §V.1, section from memory). Round-off only: ~N ε in units of ρ.
     */
    @Test
    void retracesItsOrbitBackwards() {
        // ρ ≈ 1.3 m ≪ L = 50 m: a regular orbit, so round-off is not amplified exponentially
        Field f = TestField.smooth(1.0, 0.1 * C, 50);
        double[] x0 = {0.01, 0, 0}, u0 = {0.2 * C, 0.1 * C, 0.3 * C};
        double rho = 0.4 * C * P.mass() / P.charge();
        double dt = 0.2 * P.mass() / P.charge();
        int n = 2000;
        LeapfrogStepper fwd = (LeapfrogStepper) pusher().stepper(f, P, dt);
        fwd.start(0, x0, u0);
        double[] uFirst = new double[3];
        for (int k = 0; k <= n; k++) {
            assertTrue(fwd.step());
            if (k == 0) {
                fwd.staggeredVelocity(uFirst); // u at step 1/2
            }
        }
        double[] x = new double[3], u = new double[3];
        fwd.position(x);
        fwd.staggeredVelocity(u); // u at step n + 1/2
        double g = relativistic() ? dt / Orbits.gamma(u) : dt;
        double[] xn = {x[0] - u[0] * g, x[1] - u[1] * g, x[2] - u[2] * g}; // x_n
        LeapfrogStepper back = (LeapfrogStepper) pusher().stepper(f, P, -dt);
        back.resume(fwd.time() - dt, xn, u);
        for (int k = 0; k < n; k++) {
            assertTrue(back.step());
        }
        back.position(x);
        back.staggeredVelocity(u); // the backward run ends on x_0 holding u at step 1/2
        assertEquals(0, Orbits.distance(x, x0) / rho, 1e-11, "position");
        assertEquals(0, Orbits.distance(u, uFirst) / Orbits.norm(u0), 1e-11, "velocity");
    }

    /** The ensemble loop performs the same arithmetic as the single-particle loop: identical orbits. */
    @Test
    void ensembleMatchesSingleParticle() {
        Field f = TestField.smooth(1.0, 0.05 * C, 0.5);
        double dt = 0.1 * P.mass() / P.charge();
        int n = 5;
        FullOrbitEnsemble en = (FullOrbitEnsemble) pusher().ensemble(f, P, dt, n);
        double[][] x0 = new double[n][], u0 = new double[n][];
        for (int i = 0; i < n; i++) {
            x0[i] = new double[] {0.001 * i, -0.002 * i, 0.0005};
            u0[i] = new double[] {1e7 * (i + 1), 2e6, -3e6 * i};
            en.x[i] = x0[i][0];
            en.y[i] = x0[i][1];
            en.z[i] = x0[i][2];
            en.ux[i] = u0[i][0];
            en.uy[i] = u0[i][1];
            en.uz[i] = u0[i][2];
        }
        en.start(0);
        for (int k = 0; k < 500; k++) {
            en.step();
        }
        double[] x = new double[3], u = new double[3], ue = new double[3];
        for (int i = 0; i < n; i++) {
            FullOrbitStepper s = pusher().stepper(f, P, dt);
            s.start(0, x0[i], u0[i]);
            for (int k = 0; k < 500; k++) {
                s.step();
            }
            s.position(x);
            s.velocity(u);
            en.velocity(i, ue);
            assertEquals(x[0], en.x[i], 0.0);
            assertEquals(x[1], en.y[i], 0.0);
            assertEquals(x[2], en.z[i], 0.0);
            assertEquals(0, Orbits.distance(u, ue), 0.0);
            assertEquals(s.time(), en.time(), 0.0);
        }
    }

    /** A step allocates nothing (docs/design.md): measured with the JVM's per-thread allocation counter. */
    @Test
    void stepsWithoutAllocating() {
        var mx = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        Field f = TestField.smooth(1.0, 1e5, 0.5);
        FullOrbitStepper s = pusher().stepper(f, P, 1e-9);
        s.start(0, new double[] {0.01, 0, 0}, new double[] {1e6, 0, 1e5});
        double[] u = new double[3];
        for (int k = 0; k < 20_000; k++) { // warm up
            s.step();
            s.velocity(u);
        }
        long before = mx.getCurrentThreadAllocatedBytes();
        for (int k = 0; k < 100_000; k++) {
            s.step();
            s.velocity(u);
        }
        long allocated = mx.getCurrentThreadAllocatedBytes() - before;
        // the counter itself may account a few bytes; one object per step would be ≥ 1.6 MB
        assertTrue(allocated < 1024, allocated + " bytes over 1e5 steps");
    }

    /** Leaving the domain stops the run as LOST at the last position inside (docs/design.md). */
    @Test
    void marksLostAndKeepsLastGoodState() {
        Field f = TestField.walled(1e-3, 1.0);
        FullOrbitStepper s = pusher().stepper(f, P, 1e-8);
        s.start(0, new double[] {0, 0, 0}, new double[] {1e6, 0, 0}); // ρ ≈ 10 m ≫ wall at 1 m
        double[] x = new double[3];
        int k = 0;
        while (s.step()) {
            k++;
        }
        assertEquals(OrbitStatus.LOST, s.status());
        s.position(x);
        assertTrue(Math.abs(x[0]) < 1.0 && Math.abs(x[0]) > 0.98, "last good x = " + x[0]);
        assertEquals(k, s.steps());
        assertFalse(s.step());
    }

    /** In an ensemble a particle that leaves is frozen at its last good state and time; the others go on. */
    @Test
    void ensembleFreezesALostParticleOnly() {
        FullOrbitEnsemble en = (FullOrbitEnsemble) pusher().ensemble(TestField.walled(1e-3, 1.0), P, 1e-8, 2);
        en.ux[0] = 1e6; // ρ ≈ 10 m: reaches the wall at 1 m
        en.ux[1] = 1e3; // ρ ≈ 1 cm: stays inside
        en.start(0);
        for (int k = 0; k < 2000; k++) {
            en.step();
        }
        assertEquals(OrbitStatus.LOST, en.status(0));
        assertEquals(OrbitStatus.OK, en.status(1));
        assertTrue(en.time(0) < en.time() && en.time(0) > 0.9e-6, "stopped at " + en.time(0));
        assertTrue(en.x[0] < 1.0 && en.x[0] > 0.98, "last good x = " + en.x[0]);
        assertEquals(en.time(), en.time(1), 0.0);
    }

    /** A field turning NaN makes the run UNSTABLE with the last finite state kept. */
    @Test
    void marksUnstableOnNonFiniteState() {
        Field f = TestField.poisoned(1e-3, 0.5);
        FullOrbitStepper s = pusher().stepper(f, P, 1e-8);
        s.start(0, new double[] {0, 0, 0}, new double[] {1e6, 0, 0});
        while (s.step()) {
            // run until it stops
        }
        assertEquals(OrbitStatus.UNSTABLE, s.status());
        double[] x = new double[3], u = new double[3];
        s.position(x);
        s.velocity(u);
        assertTrue(Double.isFinite(x[0]) && x[0] <= 0.5 && Double.isFinite(u[0]));
    }
}
