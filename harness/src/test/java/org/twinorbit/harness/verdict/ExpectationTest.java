package org.twinorbit.harness.verdict;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Declared failures: one that happens is reported as expected and does not fail the run; one
 * that no longer happens is itself a failure, so a change that "fixes" the point of a case is
 * noticed (the definition of an expectation; derived).
 */
class ExpectationTest {

    private static final Expectation RK4_UNSTABLE = new Expectation("long", "rk4", Check.STABLE, "secular energy loss");

    @Test
    void anExpectedFailureDoesNotFailTheRun() {
        RowVerdict v = new RowVerdict("long", "rk4", List.of(new Finding(Check.STABLE, true, "unstable at 60 Tc", false)));
        List<RowVerdict> out = Expectation.apply(List.of(v), List.of(RK4_UNSTABLE));
        assertFalse(out.get(0).failed());
        assertEquals("expected-fail", out.get(0).label());
        assertEquals(0, VerdictReport.exitCode(out));
    }

    @Test
    void anExpectedFailureThatNoLongerHappensFails() {
        RowVerdict v = new RowVerdict("long", "rk4", List.of());
        List<RowVerdict> out = Expectation.apply(List.of(v), List.of(RK4_UNSTABLE));
        assertTrue(out.get(0).failed());
        assertTrue(out.get(0).findings().get(0).detail().contains("but passed"));
        assertEquals(VerdictReport.CHECK_FAILED, VerdictReport.exitCode(out));
    }

    @Test
    void otherRowsAndOtherChecksAreUntouched() {
        RowVerdict boris = new RowVerdict("long", "boris", List.of(new Finding(Check.STABLE, true, "unstable", false)));
        RowVerdict rk4 = new RowVerdict("long", "rk4", List.of(new Finding(Check.STABLE, true, "unstable", false),
                new Finding(Check.ORDER, true, "local orders 1, 1, 1", false)));
        List<RowVerdict> out = Expectation.apply(List.of(boris, rk4), List.of(RK4_UNSTABLE));
        assertTrue(out.get(0).failed(), "boris is not covered by the expectation");
        assertTrue(out.get(1).failed(), "the order failure of rk4 is not declared");
        assertTrue(out.get(1).findings().get(0).expected());
    }
}
