package org.twinorbit.harness;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Callable;
import org.twinorbit.harness.scan.ScanCommand;
import org.twinorbit.harness.scan.ShardFile;
import org.twinorbit.harness.scan.ShardMerge;
import org.twinorbit.harness.suite.SuiteMerge;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.VerdictReport;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code twinorbit merge}: joins the shards of a scan, a safe-use map ({@code scan --shard I/K})
 * or a suite ({@code suite --shard I/K}) into the files a single run writes (ShardMerge,
 * SuiteMerge). A suite's merge prints and exits as {@code suite} does: 1 when a verdict fails.
 */
@Command(name = "merge", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Join the K shards of a scan, a safe-use map or a suite (each run with '... --shard I/K --out DIR') "
                + "into exactly the files one run of the same command writes into DIR: scan.md/.csv/.json/.png, "
                + "safe-use.md/.csv/.json/.png, or validation.md/.csv/.json with plots/ (and the safe-use map of a full "
                + "suite). Refuses, writing nothing, shards of different options or builds, and names missing, "
                + "unfinished or duplicated shards. A suite's merge exits 1 when a verdict fails, as suite does.")
public final class MergeCommand implements Callable<Integer> {

    @Option(names = "--out", required = true, paramLabel = "DIR",
            description = "The directory the shards were given as --out (it holds shard-I-of-K folders).")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (out.toString().isBlank()) {
            throw new IllegalArgumentException("--out: give the directory the shards wrote into");
        }
        Map<Integer, ShardFile> files = ShardMerge.collect(out);
        PrintWriter w = spec.commandLine().getOut();
        if (files.get(0).command().equals("suite")) {
            return mergeSuite(files, w);
        }
        ShardMerge.Merged m = ShardMerge.merge(out, files);
        if (m.scan() != null) {
            ScanCommand.printSummary(w, m.scan());
        }
        w.printf("merged %d shards: wrote %s/%s%n", m.shards(), out, String.join(", ", m.files()));
        w.flush();
        return 0;
    }

    private int mergeSuite(Map<Integer, ShardFile> files, PrintWriter w) {
        ShardFile first = files.get(0);
        SuiteCommand recorded = new SuiteCommand();
        try {
            new CommandLine(recorded).parseArgs(first.options().toArray(String[]::new));
        } catch (CommandLine.ParameterException e) {
            throw new IllegalArgumentException("merge: the options the shards recorded (" + String.join(" ",
                    first.options()) + ") do not parse: " + e.getMessage());
        }
        SuiteMerge.Merged m = SuiteMerge.merge(out, files, first.options(), SuiteCommand.cases(recorded),
                recorded.quick, recorded.withSafeUse());
        java.util.List<RowVerdict> verdicts = SuiteCommand.printReport(w, m.reports(), String.format(
                java.util.Locale.ROOT, "merged %d shards: %d cases", files.size(), m.reports().size()), out);
        if (m.safeUse() != null) {
            w.printf("safe-use map: %d rows; wrote %s, safe-use.csv, safe-use.json, safe-use.png%n",
                    m.safeUse().rows().size(), out.resolve("safe-use.md"));
        }
        w.flush();
        return VerdictReport.exitCode(verdicts);
    }
}
