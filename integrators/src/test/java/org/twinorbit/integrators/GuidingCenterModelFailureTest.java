package org.twinorbit.integrators;

import org.twinorbit.integrators.guidingcenter.GcRk4;
import org.twinorbit.integrators.guidingcenter.GuidingCenterStepper;
import org.twinorbit.integrators.reference.GuidingCenterReference;
import org.twinorbit.integrators.reference.GuidingCenterResult;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.shared.Species;

/**
 * B*∥ ≤ 0 must end a run as a model failure with its time, never as NaN. Constructed case
 * ({@link GcShearTestField}): on x = 0, b = ẑ, ∇×b = b/Ls and |B| = B0, so the equations reduce
 * to dp∥/dt = qE0 and B*∥ = B0 + p∥/(q Ls) (derived by hand from the equations of Littlejohn
 * 1983); B*∥ reaches 0 at t* = −(q B0 Ls + p∥0)/(q E0).
 */
class GuidingCenterModelFailureTest {

    private static final Species P = Species.PROTON;
    private static final double B0 = 1e-3, LS = 1.0, E0 = -1e3;
    private static final double T_STAR = -(P.charge() * B0 * LS) / (P.charge() * E0); // p∥0 = 0

    private static final double MU = 1e-20; // any small μ: |B| is uniform, μ does not enter

    @Test
    void referenceReportsModelFailureAtTheExactTime() {
        GcShearTestField field = new GcShearTestField(B0, LS, E0);
        GuidingCenterResult r = new GuidingCenterReference(field, P, MU)
                .run(0, new double[3], 0.0, 3 * T_STAR, 0, null);
        assertEquals(OrbitStatus.MODEL_FAILURE, r.status());
        // event located by Brent iteration to 1e-13 of the span: 1e-10 leaves margin
        assertEquals(T_STAR, r.endTime(), 1e-10 * T_STAR);
        assertTrue(Double.isFinite(r.parallelMomentum()) && r.position().isFinite());
    }

    @Test
    void rk4StopsAtTheStepThatCrossesBStarZero() {
        GcShearTestField field = new GcShearTestField(B0, LS, E0);
        double dt = T_STAR / 37.3;
        GuidingCenterStepper st = new GcRk4().stepper(field, P, MU, dt);
        st.start(0, new double[3], 0.0);
        int n = 0;
        while (st.step()) {
            n++;
            assertTrue(n < 1000, "never failed");
        }
        assertEquals(OrbitStatus.MODEL_FAILURE, st.status());
        // the last good state is before t*, and the next step would reach past it
        assertTrue(st.time() <= T_STAR && st.time() + dt > T_STAR, "failure time " + st.time());
        assertTrue(Double.isFinite(st.parallelMomentum()));
        assertFalse(st.step());
    }

    @Test
    void startingWhereBStarIsNegativeFailsAtOnce() {
        GcShearTestField field = new GcShearTestField(B0, LS, E0);
        double pBad = -2 * P.charge() * B0 * LS; // B*∥ = −B0
        GuidingCenterResult r = new GuidingCenterReference(field, P, MU).run(0, new double[3], pBad, 1e-6, 0, null);
        assertEquals(OrbitStatus.MODEL_FAILURE, r.status());
        assertEquals(0.0, r.endTime());
    }
}
