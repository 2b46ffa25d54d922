package org.twinorbit.harness;

import org.twinorbit.harness.run.Registry;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.VerdictReport;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.report.Timings;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.scan.SafeUseMap;
import org.twinorbit.harness.scan.ScanProgress;
import org.twinorbit.harness.scan.ScanProgressBar;
import org.twinorbit.harness.suite.ValidationReport;
import org.twinorbit.harness.suite.ValidationSuite;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code twinorbit suite}: the built-in validation suite into tables and plots. The files it
 * writes have no wall-clock times, so that regenerating them with an unchanged tool gives the
 * same bytes; the times go to the terminal and to {@link Timings#FILE_NAME} beside them.
 */
@Command(name = "suite", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Run the built-in validation suite (every field of the library with its cases, every integrator) "
                + "and write validation.md, validation.csv, validation.json and PNG plots; the full suite also "
                + "writes the safe-use map (eps* per field, metric and species: safe-use.md, .csv, .json, .png). "
                + "Wall-clock times go to timings.md only, so that the other files do not change between runs.",
        footer = {"", "The suite is short enough that the JIT's optimising compiler costs more CPU than it saves:",
            "java -XX:TieredStopAtLevel=1 -jar twinorbit.jar suite runs it about twice as fast, with identical results."})
public final class SuiteCommand implements Callable<Integer> {

    @Option(names = "--quick", description = "The reduced suite for CI: one case per field, 4 gyrophases, "
            + "no safe-use map.")
    boolean quick;

    @Option(names = "--no-safe-use", description = "Skip the safe-use map (about 50 s of the full suite's time).")
    boolean noSafeUse;

    @Option(names = "--pushers", paramLabel = "NAMES", split = ",", description = "Full-orbit pushers of every "
            + "case, comma-separated (default: all registered, your own on the class path included).")
    List<String> pushers;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "results",
            description = "Directory of the report (default: ${DEFAULT-VALUE}).")
    Path out;

    @Mixin
    ExecutionOptions execution;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        int threads = execution.threads();
        OutputDirectory.prepare(out);
        List<Case> cases = ValidationSuite.cases(quick, pushers == null ? Registry.pusherNames() : checked(pushers));
        long t0 = System.nanoTime();
        List<CaseResult> results = new CaseRunner(threads, execution.quiet()).run(cases);
        ValidationReport.write(results, quick, out, threads);
        double seconds = (System.nanoTime() - t0) * 1e-9;
        PrintWriter pw = spec.commandLine().getOut();
        pw.print(ValidationReport.overview(results, quick).aligned());
        pw.println();
        String total = String.format(java.util.Locale.ROOT, "%d cases in %.1f s on %d threads", cases.size(), seconds,
                threads);
        pw.printf("%s; wrote %s, validation.csv, validation.json and plots/%n", total, out.resolve("validation.md"));
        List<RowVerdict> verdicts = ValidationSuite.verdicts(results, quick);
        for (String line : VerdictReport.lines(verdicts)) {
            pw.println(line);
        }
        pw.flush();
        Timings timings = new Timings("twinorbit suite" + (quick ? " --quick" : "")).total(total).cases(results);
        if (!quick && !noSafeUse) {
            timings.total(writeSafeUseMap(pw, threads));
        }
        timings.write(out);
        pw.printf("wall times in %s%n", out.resolve(Timings.FILE_NAME));
        pw.flush();
        return VerdictReport.exitCode(verdicts);
    }

    /** The names, each checked against the registry. @throws IllegalArgumentException naming --pushers */
    static List<String> checked(List<String> names) {
        names = names.stream().map(Registry::current).toList();
        for (String n : names) {
            if (!Registry.pusherNames().contains(n)) {
                throw new IllegalArgumentException("--pushers: unknown pusher '" + n + "'; allowed: "
                        + String.join(", ", Registry.pusherNames()));
            }
        }
        return List.copyOf(names);
    }

    /**
     * The breakdown threshold eps* of every field, metric and species at the default tolerances.
     * @return the line of totals for the timings
     */
    private String writeSafeUseMap(PrintWriter pw, int threads) {
        long t0 = System.nanoTime();
        SafeUseMap.Result r;
        if (execution.quiet()) {
            r = SafeUseMap.run(out, SafeUseMap.Resolution.FULL, false, threads, ScanProgress.NONE);
        } else {
            try (ScanProgressBar bar = new ScanProgressBar("safe-use map")) {
                r = SafeUseMap.run(out, SafeUseMap.Resolution.FULL, false, threads, bar);
            }
        }
        String total = String.format(java.util.Locale.ROOT, "safe-use map: %d rows in %.1f s", r.rows().size(),
                (System.nanoTime() - t0) * 1e-9);
        pw.printf("%s; wrote %s, safe-use.csv, safe-use.json, safe-use.png%n", total, out.resolve("safe-use.md"));
        pw.flush();
        return total;
    }
}
