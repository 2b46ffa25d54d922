package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.twinorbit.harness.cases.CaseSpec;

/**
 * A particle inside the loss cone is lost by every model, which is the right answer, not a
 * failure: only a class that disagrees with the reference's, or a run that went unstable, is.
 */
class LossConeClassTest {

    @Test
    void lostInTheLossConeIsNotAProblem() {
        // Rm = 4 (DESIGN.md default): loss cone sin²α < B_min/B_max = 1/4, α < 30°
        // (common practice); a pitch of 20° escapes past |z| = Lm within a bounce-free transit
        CaseSpec s = TestCases.spec("mirror", "boris", "gc-rk4");
        s.eps = 0.02;
        s.pitch = 20.0;
        s.phases = 2;
        s.duration = 60.0;
        CaseResult r = TestCases.run(s);
        for (ResultRow row : r.rows()) {
            assertEquals("lost", row.status(), row.integrator());
            assertEquals("lost", row.orbitClass(), row.integrator());
            assertEquals(1.0, row.classAgreement(), row.integrator());
            assertEquals("", row.problem(), row.integrator());
        }
    }

    @Test
    void unstableAndClassDisagreementAreProblems() {
        assertEquals("unstable", row("unstable", "trapped", 1.0).problem());
        assertEquals("model-failure", row("model-failure", "trapped", 1.0).problem());
        assertEquals("class lost/trapped differs from the reference's in 50% of phases",
                row("lost", "lost/trapped", 0.5).problem());
        assertEquals("class passing differs from the reference's in 100% of phases",
                row("ok", "passing", 0.0).problem());
        assertEquals("", row("ok", "trapped", 1.0).problem());
    }

    private static ResultRow row(String status, String cls, double agreement) {
        return new ResultRow("boris", "full-orbit", "discretisation", status, Double.NaN, Map.of(), Map.of(), cls,
                agreement, Double.NaN, new double[0], new double[0], 1, 1, 0, "", Diagnostics.NONE);
    }
}
