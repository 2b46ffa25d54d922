package org.twinorbit.harness;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.twinorbit.harness.baseline.Baseline;
import org.twinorbit.harness.baseline.BaselineFile;
import org.twinorbit.harness.baseline.MeasuredRow;
import org.twinorbit.harness.baseline.Runs;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.ResolvedCase;
import org.twinorbit.harness.report.ToolInfo;
import org.twinorbit.harness.run.Registry;
import org.twinorbit.harness.scan.ScanCommand;
import org.twinorbit.harness.scan.ScanRequest;
import org.twinorbit.harness.suite.ValidationSuite;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code twinorbit baseline FILE COMMAND [OPTIONS]}: runs {@code run}, {@code suite} or
 * {@code scan} with exactly the options those commands take, and stores the fully resolved
 * cases with every number measured in FILE (see {@link BaselineFile}). The options are parsed by
 * the command itself, so a baseline means what the command means.
 */
@Command(name = "baseline", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Run a case, the suite or a scan and store a baseline of it in FILE: the build, the fully "
                + "resolved case definitions and every metric of every case and integrator (mean, rms and worst "
                + "over the gyrophases), statuses, orbit classes, verdicts, and a scan's eps*. No wall-clock "
                + "time is stored. 'twinorbit check FILE' reruns exactly those cases and compares.",
            "COMMAND is run, suite or scan, followed by its own options (see 'twinorbit COMMAND --help'), "
                + "for example: twinorbit baseline results/baseline-quick.json suite --quick"},
        footer = {"", "Options that only say where a command writes its report (--out, --json, --resume, "
                + "--no-safe-use, --safe-use) do not apply."})
public final class BaselineCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FILE", description = "The baseline file to write (JSON).")
    Path file;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "COMMAND", description = "run, suite or scan, then its options.")
    List<String> command;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        OutputFile.check(file, "FILE");
        String name = command.get(0);
        String[] args = command.subList(1, command.size()).toArray(String[]::new);
        PrintWriter pw = spec.commandLine().getOut();
        Baseline b = switch (name) {
            case "run" -> run(args);
            case "suite" -> suite(args);
            case "scan" -> scan(args);
            default -> throw new BadInputException("baseline: unknown COMMAND '" + name + "'; allowed: run, suite, scan");
        };
        BaselineFile.write(b, file);
        long cases = b.rows().stream().map(MeasuredRow::caseName).distinct().count();
        long failing = b.rows().stream().filter(r -> "fail".equals(r.labels().get("verdict"))).count();
        pw.printf("wrote %s: %s, %d cases, %d rows, %s%s%n", file, b.kind().label(), cases, b.rows().size(),
                ToolInfo.NAME + " " + ToolInfo.version() + " (" + ToolInfo.gitCommit() + ")",
                failing == 0 ? "" : "; " + failing + " rows with a failed verdict (stored as they are)");
        pw.printf("check it with: twinorbit check %s%n", file);
        pw.flush();
        return 0;
    }

    private Baseline run(String[] args) {
        RunCommand c = parse(new RunCommand(), "run", args, "--out", "--json");
        Case k = c.caseOptions.toCase();
        new ResolvedCase(k); // checks the field, start and energy before anything runs
        List<MeasuredRow> rows = Runs.cases(List.of(k), Baseline.Kind.RUN, c.execution.threads(), c.execution.quiet());
        return new Baseline(Baseline.Kind.RUN, ToolInfo.json(), List.of(k), null, rows);
    }

    private Baseline suite(String[] args) {
        SuiteCommand c = parse(new SuiteCommand(), "suite", args, "--out", "--no-safe-use");
        List<Case> cases = ValidationSuite.cases(c.quick,
                c.pushers == null ? Registry.pusherNames() : SuiteCommand.checked(c.pushers));
        Baseline.Kind kind = c.quick ? Baseline.Kind.SUITE_QUICK : Baseline.Kind.SUITE;
        List<MeasuredRow> rows = Runs.cases(cases, kind, c.execution.threads(), c.execution.quiet());
        return new Baseline(kind, ToolInfo.json(), cases, null, rows);
    }

    private Baseline scan(String[] args) {
        ScanCommand c = parse(new ScanCommand(), "scan", args, "--out", "--resume", "--safe-use");
        ScanRequest.Built built = c.setup();
        var definition = Runs.scanDefinition(built, c.species());
        List<MeasuredRow> rows = Runs.scan(built, Runs.scanCaseName(definition), c.threads());
        return new Baseline(Baseline.Kind.SCAN, ToolInfo.json(), List.of(), definition, rows);
    }

    /** The command's options parsed by the command itself; options about its report files refused. */
    private static <T> T parse(T command, String name, String[] args, String... refused) {
        CommandLine cl = new CommandLine(command);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        CommandLine.ParseResult pr;
        try {
            pr = cl.parseArgs(args);
        } catch (CommandLine.ParameterException e) {
            throw new BadInputException("baseline " + name + ": " + e.getMessage());
        }
        if (pr.isUsageHelpRequested() || pr.isVersionHelpRequested()) {
            throw new BadInputException("baseline " + name + ": see 'twinorbit " + name + " --help' for its options");
        }
        for (String r : refused) {
            if (pr.hasMatchedOption(r)) {
                throw new BadInputException("baseline " + name + ": " + r + " does not apply; the baseline writes FILE only");
            }
        }
        return command;
    }
}
