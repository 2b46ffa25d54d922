package org.twinorbit.harness;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.export.CaseExport;
import org.twinorbit.harness.run.Registry;
import org.twinorbit.harness.suite.ValidationSuite;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code twinorbit export}: everything an outside code needs to push the same particles as a
 * case (or every case of the suite): initial states, steps, cadence and a field card
 * ({@link CaseExport} documents the layout).
 */
@Command(name = "export", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Write what an outside pusher needs to run the same particles as a case, or as every case of "
                + "the suite: manifest.json (species, steps, durations, cadence, file layout), initial-states.csv "
                + "(x and u = gamma v of every gyrophase at t = 0) and the field card (parameters in words and a "
                + "table of B, E and the Jacobian at sample points).")
public final class ExportCommand implements Callable<Integer> {

    @Mixin
    CaseOptions caseOptions;

    @Option(names = "--suite", paramLabel = "WHICH", description = "Export every case of the suite instead: quick or full.")
    String suite;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "Directory to write into (one "
            + "subdirectory per case).")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        List<Case> cases = new ArrayList<>();
        if (suite != null) {
            if (!suite.equals("quick") && !suite.equals("full")) {
                throw new BadInputException("--suite: unknown suite '" + suite + "'; allowed: quick, full");
            }
            cases.addAll(ValidationSuite.cases(suite.equals("quick"), Registry.pusherNames()));
        } else {
            cases.add(caseOptions.toCase());
        }
        OutputDirectory.prepare(out);
        PrintWriter pw = spec.commandLine().getOut();
        List<String> names = new ArrayList<>();
        for (Case c : cases) {
            Path dir = out.resolve(c.name());
            OutputDirectory.prepare(dir);
            CaseExport.write(c, dir);
            names.add(c.name());
        }
        if (suite != null) {
            CaseExport.writeIndex(names, out);
        }
        pw.println("wrote " + cases.size() + " case" + (cases.size() == 1 ? "" : "s") + " into " + out
                + (cases.size() == 1 ? "/" + names.get(0) : "") + ": manifest.json, case.csv, runs.csv, initial-states.csv, "
                + "gc-start.csv, gc-runs.csv, field-card.json, field-card.csv");
        pw.flush();
        return 0;
    }
}
