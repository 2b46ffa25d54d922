package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.verdict.Check;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.Verdicts;

/**
 * A particle inside the loss cone is lost by every model, which is the right answer, not a
 * failure: the verdicts must not name it unstable or of another class than the reference.
 */
class LossConeClassTest {

    @Test
    void lostInTheLossConeIsNotAFailure() {
        // Rm = 4 (docs/design.md default): loss cone sin²α < B_min/B_max = 1/4, α < 30°
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
        }
        for (RowVerdict v : Verdicts.judge(r)) {
            assertFalse(v.findings().stream().anyMatch(f -> f.check() == Check.STABLE || f.check() == Check.CLASS),
                    v.integrator() + ": " + v.findings());
        }
    }
}
