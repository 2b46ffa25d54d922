package org.twinorbit.harness.api;

import java.util.List;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.run.Registry;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.Verdicts;
import org.twinorbit.integrators.fullorbit.FullOrbitPusher;

/**
 * One case run with a pusher instance beside the references, as {@code twinorbit run} runs it:
 * <pre>{@code
 * CaseSpec s = PusherTrial.spec("gradient");
 * s.eps = 0.05;
 * PusherTrial t = PusherTrial.run(new MyPusher(), s);
 * double energy = t.row().metric("energy_error").worst();
 * }</pre>
 *
 * @param result   everything the case measured (all rows, references, curves)
 * @param pusher   the pusher's name, its row in {@code result}
 * @param verdicts the verdicts of the pusher's row
 */
public record PusherTrial(CaseResult result, String pusher, RowVerdict verdicts) {

    /**
     * A case on field {@code field} with every setting at its default and no built-in pusher
     * or guiding-center integrator: set its public fields (the keys of a case file) before
     * running it.
     */
    public static CaseSpec spec(String field) {
        CaseSpec s = new CaseSpec();
        s.field = field;
        s.pushers = List.of("none");
        s.gcIntegrators = List.of("none");
        return s;
    }

    /**
     * Runs the case with the pusher (on all cores; results do not depend on the thread count).
     *
     * @throws IllegalArgumentException naming the setting when the case is not valid
     */
    public static PusherTrial run(FullOrbitPusher pusher, CaseSpec spec) {
        Case c = spec.toCase(Registry.pusherNames(), Registry.guidingCenterNames());
        CaseResult r = new CaseRunner(Runtime.getRuntime().availableProcessors(), true).with(List.of(pusher)).run(c);
        RowVerdict v = Verdicts.judge(r).stream().filter(x -> x.integrator().equals(pusher.name())).findFirst()
                .orElseThrow();
        return new PusherTrial(r, pusher.name(), v);
    }

    /** The pusher's row: its metrics (each mean, rms and worst over the phases), order and status. */
    public ResultRow row() {
        return result.rows().stream().filter(x -> x.integrator().equals(pusher) && x.errorKind().equals("discretisation"))
                .findFirst().orElseThrow();
    }
}
