package org.twinorbit.integrators;

import org.twinorbit.integrators.guidingcenter.GcRk4;
import org.twinorbit.integrators.guidingcenter.GuidingCenterIntegrators;
import org.twinorbit.integrators.guidingcenter.GuidingCenterStepper;
import org.twinorbit.integrators.maps.InitialCondition;
import org.twinorbit.integrators.reference.GuidingCenterReference;
import org.twinorbit.integrators.reference.GuidingCenterResult;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.fields.UniformField;
import org.twinorbit.shared.Species;

/** The ServiceLoader registry and its error message (picocli-style: list the valid names). */
class GuidingCenterIntegratorsTest {

    @Test
    void rk4IsRegistered() {
        assertTrue(GuidingCenterIntegrators.all().stream().anyMatch(g -> g.name().equals(GcRk4.NAME)));
        assertEquals(4, GuidingCenterIntegrators.byName("gc-rk4").order());
    }

    @Test
    void unknownNameListsTheKnownOnes() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> GuidingCenterIntegrators.byName("gc-nope"));
        assertTrue(e.getMessage().contains("gc-nope") && e.getMessage().contains("gc-rk4"), e.getMessage());
    }

    @Test
    void badStepIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new GcRk4().stepper(new UniformField(1), Species.PROTON, 0, -1));
        assertTrue(e.getMessage().contains("dt"), e.getMessage());
    }

    @Test
    void uniformFieldGivesStraightParallelMotion() {
        // exact: in B = B0 ẑ the guiding center moves along z at v∥ = p∥/(γm) (common practice)
        UniformField f = new UniformField(1.0);
        InitialCondition ic = InitialCondition.ofEnergy(f, Species.ELECTRON, 1e6, 30, org.twinorbit.shared.Vec3.ZERO);
        double vPar = ic.parallelMomentum() / (ic.gamma() * Species.ELECTRON.mass());
        double tEnd = 1e-8;
        GuidingCenterResult r = new GuidingCenterReference(f, Species.ELECTRON, ic.mu())
                .run(0, new double[3], ic.parallelMomentum(), tEnd, 0, null);
        assertEquals(OrbitStatus.OK, r.status());
        assertEquals(vPar * tEnd, r.position().z(), 1e-12 * vPar * tEnd);
        assertEquals(0, r.position().x(), 0);
        GuidingCenterStepper st = new GcRk4().stepper(f, Species.ELECTRON, ic.mu(), tEnd / 10);
        st.start(0, new double[3], ic.parallelMomentum());
        for (int i = 0; i < 10; i++) {
            assertTrue(st.step());
        }
        double[] x = new double[3];
        st.position(x);
        assertEquals(vPar * tEnd, x[2], 1e-13 * vPar * tEnd);
        assertEquals(4 * 10 + 1, st.fieldEvaluations()); // 4 stages per step + the B*∥ check at start
    }
}
