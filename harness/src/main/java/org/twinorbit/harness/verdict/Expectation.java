package org.twinorbit.harness.verdict;

import java.util.ArrayList;
import java.util.List;

/**
 * A failure a case exists to show (RK4's secular energy loss, say): reported as expected, so
 * that an unchanged tool passes; when it no longer happens, that is reported as a failure too.
 *
 * @param caseName   the case
 * @param integrator the row
 * @param check      the check that must fail
 * @param why        the physics, for the report
 */
public record Expectation(String caseName, String integrator, Check check, String why) {

    /**
     * The verdicts with every expected failure marked, and a failure added for each expectation
     * whose row exists but passed that check. Expectations for rows that were not run (another
     * choice of pushers) are ignored.
     */
    public static List<RowVerdict> apply(List<RowVerdict> verdicts, List<Expectation> expected) {
        List<RowVerdict> out = new ArrayList<>();
        for (RowVerdict v : verdicts) {
            List<Finding> f = new ArrayList<>();
            for (Finding x : v.findings()) {
                boolean declared = expected.stream().anyMatch(e -> e.matches(v) && e.check() == x.check());
                f.add(declared && x.failure() ? x.asExpected() : x);
            }
            for (Expectation e : expected) {
                if (e.matches(v) && f.stream().noneMatch(x -> x.check() == e.check() && x.failure())) {
                    f.add(new Finding(e.check(), true, "expected to fail (" + e.why() + ") but passed", false));
                }
            }
            out.add(new RowVerdict(v.caseName(), v.integrator(), f));
        }
        return out;
    }

    private boolean matches(RowVerdict v) {
        return v.caseName().equals(caseName) && v.integrator().equals(integrator);
    }
}
