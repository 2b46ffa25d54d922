package org.twinorbit.harness.run;

import org.twinorbit.integrators.OrbitStatus;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.harness.cases.CaseSpec;

/**
 * The model row compares two models, so its status must say what happened to both. In the
 * gradient field B = B0(1 + x/Lg) the exact orbit keeps |u| and p_y = m u_y + q B0 (x + x²/(2Lg)),
 * so a 90° particle swings in x between the roots of u_y = ±|u| (Brizard, Phys. Plasmas 24 (2017));
 * at ε = 0.5 the inner swing of some gyrophases passes x = −Lg, where B vanishes and the domain
 * ends, while the guiding center drifts along y at x = 0 and stays inside.
 */
class ModelRowStatusTest {

    @Test
    void fullOrbitsLostWhileGuidingCenterStaysIsNotOk() {
        CaseSpec s = TestCases.spec("gradient", "none", "none");
        s.eps = 0.5;
        s.pitch = 90.0;
        s.phases = 8;
        s.duration = 20.0;
        ResultRow model = TestCases.row(TestCases.run(s), "gc-reference");
        assertEquals("lost-full-orbit", model.status());
        assertTrue(model.statusTime() > 0, "time of the first full-orbit loss");
        assertTrue(model.classAgreement() < 1.0);
    }

    @Test
    void combinedStatusOfBothModelsPhaseByPhase() {
        // both lost (a loss-cone particle): the right answer, plain "lost"
        assertEquals("lost", Assembly.modelStatus(OrbitStatus.LOST, OrbitStatus.LOST));
        assertEquals("lost-full-orbit", Assembly.modelStatus(OrbitStatus.OK, OrbitStatus.LOST));
        assertEquals("lost-guiding-center", Assembly.modelStatus(OrbitStatus.LOST, OrbitStatus.OK));
        assertEquals("model-failure", Assembly.modelStatus(OrbitStatus.MODEL_FAILURE, OrbitStatus.OK));
        assertEquals("unstable-full-orbit", Assembly.modelStatus(OrbitStatus.OK, OrbitStatus.UNSTABLE));
        assertEquals("ok", Assembly.modelStatus(OrbitStatus.OK, OrbitStatus.OK));
    }
}
