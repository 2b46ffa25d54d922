package org.twinorbit.integrators;

import org.twinorbit.integrators.reference.FullOrbitReference;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

class FullOrbitReferenceTest {

    private static final Species P = Species.PROTON;

    /**
     * Uniform B: an exact helix with Ω = qB/(γm) about the guiding center (Jackson, Classical
     * Electrodynamics, 3rd ed., §12.2, section from memory), here a 1 MeV proton over 20 gyrations. The reference
     * must agree to 1e-9 ρ and its self-estimate must be within 10× of its true error.
     */
    @Test
    void followsTheExactHelixAndEstimatesItsErrorHonestly() {
        double b = 1.0;
        double u = Relativity.uFromKinetic(P, 1e6);
        double[] x0 = {0, 0, 0}, u0 = {u * 0.8, 0, u * 0.6};
        double gamma = Orbits.gamma(u0);
        double omega = P.charge() * b / (gamma * P.mass());
        double tEnd = 20 * 2 * Math.PI / omega;
        FullOrbitReference ref = new FullOrbitReference(TestField.constant(0, 0, b, 0, 0, 0), P);
        FullOrbitReference.Estimate est = ref.estimate(0, x0, u0, tEnd);
        // positive charge, B along +z: clockwise, centre at −ρ ŷ for u along +x
        double rho = u0[0] / omega / gamma;
        double ph = omega * tEnd;
        Vec3 exact = new Vec3(rho * Math.sin(ph), rho * (Math.cos(ph) - 1), u0[2] / gamma * tEnd);
        double trueError = est.result().position().minus(exact).norm() / est.result().lengthScale();
        assertEquals(OrbitStatus.OK, est.result().status());
        assertEquals(tEnd, est.result().endTime(), 1e-12 * tEnd);
        assertTrue(trueError < 1e-9, "true error " + trueError + " ρ");
        assertHonest(trueError, est.positionError());
    }

    /**
     * Crossed E and B, non-relativistic exact solution: v = v_E + rotating gyration,
     * v_E = E×B/B² (Jackson §12.3, section from memory), at u ~ 30 m/s so that relativistic terms (u²/c² ~ 1e-14)
     * stay far below the 1e-9 checked.
     */
    @Test
    void followsTheExactExBOrbit() {
        double b = 1.0, e = 10.0;
        double[] x0 = {0, 0, 0}, u0 = {30.0, 5.0, 2.0};
        double vE = -e / b; // along y
        double omega = P.charge() * b / P.mass();
        double tEnd = 15 * 2 * Math.PI / omega;
        Field f = TestField.constant(0, 0, b, e, 0, 0);
        FullOrbitReference.Estimate est = new FullOrbitReference(f, P).estimate(0, x0, u0, tEnd);
        double wx = u0[0], wy = u0[1] - vE, c = Math.cos(omega * tEnd), s = Math.sin(omega * tEnd);
        Vec3 exact = new Vec3((wx * s - wy * c + wy) / omega,
                vE * tEnd + (wx * c - wx + wy * s) / omega, u0[2] * tEnd);
        double trueError = est.result().position().minus(exact).norm() / est.result().lengthScale();
        assertTrue(trueError < 1e-9, "true error " + trueError + " ρ");
        assertHonest(trueError, est.positionError());
    }

    private static void assertHonest(double trueError, double estimate) {
        System.out.printf("reference: true error %.3e, self-estimate %.3e%n", trueError, estimate);
        assertTrue(estimate <= 10 * trueError && estimate >= trueError / 10,
                "self-estimate " + estimate + " against true error " + trueError);
    }

    /** Samples arrive at t0 + k·interval and at the end; u stays on the exact circle. */
    @Test
    void samplesAtTheRequestedInterval() {
        double b = 1.0;
        double[] u0 = {1e5, 0, 0};
        double tc = 2 * Math.PI * P.mass() / (P.charge() * b);
        List<double[]> seen = new ArrayList<>();
        FullOrbitReference.Result r = new FullOrbitReference(TestField.constant(0, 0, b, 0, 0, 0), P)
                .run(0, new double[3], u0, 2 * tc, tc / 10, (t, x, u) -> seen.add(new double[] {t, Orbits.norm(u)}));
        assertEquals(21, seen.size());
        for (int k = 0; k < seen.size(); k++) {
            assertEquals(k * tc / 10, seen.get(k)[0], 1e-9 * tc);
            // the dense output holds about the step tolerance (rtol = 1e-11); 10× that as margin
            assertEquals(1e5, seen.get(k)[1], 1e-10 * 1e5);
        }
        assertTrue(r.evaluations() > 0);
    }

    /** Leaving the domain stops the run as LOST at the crossing (docs/design.md), located by the event. */
    @Test
    void stopsAtTheDomainEdge() {
        FullOrbitReference.Result r = new FullOrbitReference(TestField.walled(1e-3, 1.0), P)
                .run(0, new double[3], new double[] {1e6, 0, 0}, 1e-3);
        assertEquals(OrbitStatus.LOST, r.status());
        assertEquals(1.0, r.position().x(), 1e-9);
        assertTrue(r.endTime() < 1e-3);
    }

    @Test
    void marksUnstableWhenTheStateTurnsNaN() {
        FullOrbitReference.Result r = new FullOrbitReference(TestField.poisoned(1e-3, 0.5), P)
                .run(0, new double[3], new double[] {1e6, 0, 0}, 1e-3);
        assertEquals(OrbitStatus.UNSTABLE, r.status());
        assertTrue(r.position().isFinite() && r.position().x() <= 0.5 + 1e-9);
    }

    @Test
    void refusesAToleranceOutOfRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new FullOrbitReference(TestField.constant(0, 0, 1, 0, 0, 0), P, 1e-16));
        assertTrue(e.getMessage().contains("tolerance"), e.getMessage());
    }
}
