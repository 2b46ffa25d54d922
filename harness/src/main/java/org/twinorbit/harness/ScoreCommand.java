package org.twinorbit.harness;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ResultTables;
import org.twinorbit.harness.report.RunReport;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.score.ExportedRuns;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.VerdictReport;
import org.twinorbit.harness.verdict.Verdicts;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code twinorbit score}: an outside code's trajectories of an exported case, scored like a
 * built-in pusher (the same rows, verdicts and reports, against the same references).
 */
@Command(name = "score", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Score the trajectories an outside pusher wrote for a case exported with 'twinorbit export': the "
                + "same table, verdicts and run.json as a built-in pusher gets, against the same references.")
public final class ScoreCommand implements Callable<Integer> {

    /** Properties a scheme may declare; the verdicts read them. */
    static final List<String> PROPERTIES = List.of("relativistic", "time-reversible", "volume-preserving", "leapfrog");

    @Option(names = "--export", paramLabel = "DIR", required = true, description = "The case directory written by "
            + "'twinorbit export' (with manifest.json).")
    Path export;

    @Option(names = "--trajectories", paramLabel = "DIR", description = "Directory of the trajectory files the manifest "
            + "names (default: the --export directory).")
    Path trajectories;

    @Option(names = "--model", paramLabel = "MODEL", defaultValue = "full-orbit", description = "What the trajectories "
            + "are: full-orbit (trajectory-*.csv) or guiding-center (gc-trajectory-*.csv) (default ${DEFAULT-VALUE}).")
    String model;

    @Option(names = "--name", paramLabel = "NAME", defaultValue = "outside", description = "The scheme's name in "
            + "reports (default ${DEFAULT-VALUE}).")
    String name;

    @Option(names = "--order", paramLabel = "N", required = true, description = "The order the scheme declares; "
            + "the order verdict checks it.")
    int order;

    @Option(names = "--property", paramLabel = "P", description = "A property the scheme declares, repeatable: "
            + "relativistic, time-reversible, volume-preserving, leapfrog.")
    List<String> properties = List.of();

    @Option(names = "--out", paramLabel = "DIR", description = "Also write run.md, run.csv, run.json and plots into DIR.")
    Path out;

    @Option(names = "--json", description = "Print run.json on stdout instead of the table.")
    boolean json;

    @Mixin
    ExecutionOptions execution;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (order < 1 || order > 12) {
            throw new BadInputException("--order: the declared order must lie in [1, 12], got " + order);
        }
        Set<String> declared = new LinkedHashSet<>();
        for (String p : properties) {
            if (!PROPERTIES.contains(p)) {
                throw new BadInputException("--property: unknown property '" + p + "'; allowed: " + String.join(", ", PROPERTIES));
            }
            declared.add(p);
        }
        if (out != null) {
            OutputDirectory.prepare(out);
        }
        if (trajectories != null && !java.nio.file.Files.isDirectory(trajectories)) {
            throw new BadInputException("--trajectories: " + trajectories + " is not a directory");
        }
        Path from = trajectories != null ? trajectories : export;
        CaseRunner runner = new CaseRunner(execution.threads(), execution.quiet());
        ExportedRuns runs;
        switch (model) {
            case "full-orbit" -> {
                runs = ExportedRuns.read(export, from, name, order, declared);
                runner = runner.with(List.of(runs.pusher()));
            }
            case "guiding-center" -> {
                runs = ExportedRuns.readGuidingCenter(export, from, name, order, declared);
                runner = runner.withGuidingCenters(List.of(runs.gc()));
            }
            default -> throw new BadInputException("--model: unknown model '" + model
                    + "'; allowed: full-orbit, guiding-center");
        }
        CaseResult r = runner.run(runs.c());
        List<RowVerdict> verdicts = Verdicts.judge(r);
        PrintWriter pw = spec.commandLine().getOut();
        if (json) {
            pw.print(ResultJson.write(ResultJson.document(r)));
        } else {
            ResultPrinter.print(pw, r, ResultTables.table(r, null), verdicts);
        }
        if (out != null) {
            RunReport.write(r, out);
        }
        pw.flush();
        return VerdictReport.exitCode(verdicts);
    }
}
