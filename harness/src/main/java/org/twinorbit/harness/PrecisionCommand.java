package org.twinorbit.harness;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.precision.WorkPrecision;
import org.twinorbit.harness.precision.WorkPrecisionReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code twinorbit precision}: every chosen pusher over a sweep of steps, errors against cost. */
@Command(name = "precision", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Work against precision: run a case at several steps per gyroperiod with every chosen pusher and "
                + "tabulate and plot each pusher's errors against its cost (steps, field evaluations, wall time).")
public final class PrecisionCommand implements Callable<Integer> {

    @Mixin
    CaseOptions caseOptions;

    @Option(names = "--sweep", paramLabel = "N", split = ",", description = "Steps per gyroperiod to run, at least 6 "
            + "values, comma-separated (default 8,16,32,64,128,256).")
    List<Integer> sweep;

    @Option(names = "--out", paramLabel = "DIR", description = "Also write precision.md, .csv, .json and .png into DIR.")
    Path out;

    @Mixin
    ExecutionOptions execution;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        List<Integer> steps = sweep == null ? WorkPrecision.DEFAULT_STEPS : List.copyOf(sweep);
        if (steps.size() < 6) {
            throw new BadInputException("--sweep: give at least 6 values of steps per gyroperiod, got " + steps.size());
        }
        for (int n : steps) {
            if (n < 4 || n > 100_000) {
                throw new BadInputException("--sweep: steps per gyroperiod must lie in [4, 100000], got " + n);
            }
        }
        Case c = caseOptions.toCase();
        if (out != null) {
            OutputDirectory.prepare(out);
        }
        WorkPrecision.Result r = WorkPrecision.sweep(c, steps, execution.threads());
        PrintWriter pw = spec.commandLine().getOut();
        pw.print(WorkPrecisionReport.table(r, true).aligned());
        pw.printf(java.util.Locale.ROOT, "full-orbit reference's own error: %s rho0%n", Format.number(r.referenceError()));
        if (out != null) {
            WorkPrecisionReport.write(r, out);
            pw.println("wrote " + out.resolve("precision.md") + ", precision.csv, precision.json, precision.png");
        }
        pw.flush();
        return 0;
    }
}
