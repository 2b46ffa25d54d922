package org.twinorbit.harness;

import java.util.List;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.VerdictReport;
import org.twinorbit.harness.verdict.Verdicts;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.ResolvedCase;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ResultTables;
import org.twinorbit.harness.report.RunReport;
import org.twinorbit.harness.report.Timings;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.CaseRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code twinorbit run}: one case, every chosen integrator, a metrics table. The table on the
 * terminal ends with a wall-time column; run.md, run.csv and run.json have none (they must not
 * depend on the machine), and with {@code --out} the wall times go to {@link Timings#FILE_NAME}.
 */
@Command(name = "run", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Run one case: every chosen full-orbit pusher and guiding-center integrator and both references "
                + "on a gyrophase ensemble; print the errors, discretisation and model error in separate rows.")
public final class RunCommand implements Callable<Integer> {

    @Mixin
    CaseOptions caseOptions;

    @Mixin
    ExecutionOptions execution;

    @Option(names = "--out", paramLabel = "DIR", description = "Also write run.md, run.csv, run.json and PNG plots into DIR.")
    Path out;

    @Option(names = "--allow-long", description = "Start a run beyond about 5e9 full-orbit steps (refused otherwise).")
    boolean allowLong;

    @Option(names = "--json", description = "Print run.json on stdout instead of the table.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Case c = caseOptions.toCase();
        int threads = execution.threads();
        new ResolvedCase(c); // checks the field, start and energy before anything runs
        if (out != null) {
            OutputDirectory.prepare(out);
        }
        long t0 = System.nanoTime();
        CaseRunner runner = new CaseRunner(threads, execution.quiet());
        CaseResult r = (allowLong ? runner.allowingLong() : runner).run(c);
        List<RowVerdict> verdicts = Verdicts.judge(r);
        String total = String.format(java.util.Locale.ROOT, "%s in %.1f s on %d threads", r.resolved().spec().name(),
                (System.nanoTime() - t0) * 1e-9, threads);
        PrintWriter pw = spec.commandLine().getOut();
        if (json) {
            pw.print(ResultJson.write(ResultJson.document(r)));
        } else {
            ResultPrinter.print(pw, r, ResultTables.tableWithWallTime(r), verdicts);
        }
        if (out != null) {
            RunReport.write(r, out);
            new Timings("twinorbit run").total(total).cases(java.util.List.of(r)).write(out);
            if (!json) {
                pw.println();
                pw.println("wrote " + out.resolve("run.md") + ", run.csv, run.json and plots; wall times in "
                        + Timings.FILE_NAME);
            }
        }
        pw.flush();
        return VerdictReport.exitCode(verdicts);
    }
}
