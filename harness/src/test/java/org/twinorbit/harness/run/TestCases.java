package org.twinorbit.harness.run;

import java.util.List;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.CaseSpec;

/** Small cases for tests, written as a user would write them. */
public final class TestCases {

    private TestCases() {}

    /** A spec for field f with the given pushers and GC integrators ("none" for none). */
    public static CaseSpec spec(String field, String pushers, String gc) {
        CaseSpec s = new CaseSpec();
        s.field = field;
        s.pushers = List.of(pushers.split(","));
        s.gcIntegrators = List.of(gc.split(","));
        return s;
    }

    public static Case build(CaseSpec s) {
        return s.toCase(Registry.pusherNames(), Registry.guidingCenterNames());
    }

    /** Runs on two threads, quietly. */
    public static CaseResult run(CaseSpec s) {
        return new CaseRunner(2, true).run(build(s));
    }

    public static ResultRow row(CaseResult r, String integrator) {
        return r.rows().stream().filter(x -> x.integrator().equals(integrator)).findFirst().orElseThrow();
    }
}
