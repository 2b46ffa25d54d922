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
import java.nio.file.Files;
import org.twinorbit.harness.scan.RecordedOptions;
import org.twinorbit.harness.scan.SafeUseMap;
import org.twinorbit.harness.scan.Shard;
import org.twinorbit.harness.scan.ShardFile;
import org.twinorbit.harness.suite.CaseReport;
import org.twinorbit.harness.suite.SuiteShards;
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
 * same bytes; the times go to the terminal and to {@link Timings#FILE_NAME} beside them. With
 * {@code --shard I/K} it computes one part into its own folder ({@link SuiteShards}), and
 * {@link MergeCommand} writes the files from all parts.
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

    @Option(names = "--shard", paramLabel = "I/K",
            description = "Compute only part I (counted from 0) of K: the cases and safe-use points a cost-balanced cut "
                    + "gives it, e.g. the task id of a job array, into --out/shard-I-of-K; 'twinorbit merge --out DIR' "
                    + "joins the K parts into the files one suite run writes, with its verdicts and exit code.")
    String shard;

    @Option(names = "--resume", description = "With --shard: take up the cases and points an interrupted run of "
            + "the same shard saved in --out.")
    boolean resume;

    @Mixin
    ExecutionOptions execution;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        int threads = execution.threads();
        Shard part = shard == null ? null : Shard.parse(shard);
        if (resume && part == null) {
            throw new IllegalArgumentException("--resume: only with --shard I/K (a suite shard takes up its saved cases "
                    + "and points); a whole suite runs from the start");
        }
        List<Case> cases = cases(this);
        OutputDirectory.prepare(out);
        if (part != null) {
            return runShard(part, cases, threads);
        }
        long t0 = System.nanoTime();
        List<CaseResult> results = new CaseRunner(threads, execution.quiet()).run(cases);
        List<CaseReport> reports = ValidationReport.write(results, quick, out, threads);
        double seconds = (System.nanoTime() - t0) * 1e-9;
        PrintWriter pw = spec.commandLine().getOut();
        String total = String.format(java.util.Locale.ROOT, "%d cases in %.1f s on %d threads", cases.size(), seconds,
                threads);
        List<RowVerdict> verdicts = printReport(pw, reports, total, out);
        Timings timings = new Timings("twinorbit suite" + (quick ? " --quick" : "")).total(total).cases(results);
        if (withSafeUse()) {
            timings.total(writeSafeUseMap(pw, threads));
        }
        timings.write(out);
        pw.printf("wall times in %s%n", out.resolve(Timings.FILE_NAME));
        pw.flush();
        return VerdictReport.exitCode(verdicts);
    }

    /**
     * Prints what a suite run prints of its report: the overview, where the files are, the verdicts.
     *
     * @param what how the cases came about ("31 cases in 12.0 s on 2 threads", "merged 3 shards")
     * @return the verdicts, in report order
     */
    static List<RowVerdict> printReport(PrintWriter pw, List<CaseReport> reports, String what, Path out) {
        pw.print(ValidationReport.overview(reports).aligned());
        pw.println();
        pw.printf("%s; wrote %s, validation.csv, validation.json and plots/%n", what, out.resolve("validation.md"));
        List<RowVerdict> verdicts = ValidationReport.verdicts(reports);
        for (String line : VerdictReport.lines(verdicts)) {
            pw.println(line);
        }
        pw.flush();
        return verdicts;
    }

    /** The cases of the suite the recorded options of a suite shard give, with this class path's pushers. */
    static List<Case> cases(SuiteCommand recorded) {
        return ValidationSuite.cases(recorded.quick, recorded.pushers == null ? Registry.pusherNames()
                : checked(recorded.pushers));
    }

    /** True when the suite of these options has the safe-use map. */
    boolean withSafeUse() {
        return !quick && !noSafeUse;
    }

    /** Runs one shard; its verdicts are the merge's, so a finished shard exits 0. */
    private int runShard(Shard part, List<Case> cases, int threads) {
        PrintWriter pw = spec.commandLine().getOut();
        Path folder = out.resolve(part.folder());
        if (resume && Files.exists(folder.resolve(ShardFile.FILE_NAME))) {
            pw.printf("--resume: shard %d/%d in %s is finished (%s): nothing to resume%n", part.index(), part.count(),
                    folder, ShardFile.FILE_NAME);
            pw.flush();
            return 0;
        }
        long t0 = System.nanoTime();
        SuiteShards.Outcome o = SuiteShards.run(SuiteShards.plan(cases, withSafeUse(), part.count()), quick,
                RecordedOptions.of(spec), part, out, resume, threads, execution.quiet());
        String total = String.format(java.util.Locale.ROOT, "shard %d/%d: %d of %d cases%s%s in %.1f s", part.index(),
                part.count(), o.cases(), cases.size(), o.resumed() > 0 ? " (" + o.resumed() + " resumed)" : "",
                withSafeUse() ? " and its safe-use points" : "", (System.nanoTime() - t0) * 1e-9);
        new Timings("twinorbit suite" + (quick ? " --quick" : "") + " --shard " + part.index() + "/" + part.count())
                .total(total).write(folder);
        pw.printf("wrote %s/%s; %s (%s); when every shard is done: twinorbit merge --out %s%n", folder,
                ShardFile.FILE_NAME, total, Timings.FILE_NAME, out);
        pw.flush();
        return 0;
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
