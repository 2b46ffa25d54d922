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

    @Option(names = "--grid-box", paramLabel = "X0,X1,Y0,Y1,Z0,Z1", split = ",", description = "Also write the field "
            + "sampled on a grid over this box (m) as field-grid.h5, in the grid-file layout (see 'twinorbit grid').")
    List<Double> gridBox;

    @Option(names = "--grid-nodes", paramLabel = "NX,NY,NZ", split = ",", description = "Nodes of that grid per axis "
            + "(default 33,33,33).")
    List<Integer> gridNodes = List.of(33, 33, 33);

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
        if (gridBox != null && (gridBox.size() != 6 || gridNodes.size() != 3
                || gridNodes.stream().anyMatch(n -> n < 4 || n > 1000))) {
            throw new BadInputException("--grid-box/--grid-nodes: give X0,X1,Y0,Y1,Z0,Z1 (m) and NX,NY,NZ in [4, 1000]");
        }
        OutputDirectory.prepare(out);
        PrintWriter pw = spec.commandLine().getOut();
        List<String> names = new ArrayList<>();
        for (Case c : cases) {
            Path dir = out.resolve(c.name());
            OutputDirectory.prepare(dir);
            CaseExport.write(c, dir);
            if (gridBox != null) {
                org.twinorbit.fields.Field f = new org.twinorbit.harness.cases.ResolvedCase(c).field();
                if (!f.isStatic() || f.hasElectricField()) {
                    throw new BadInputException("--grid-box: a grid file holds a static magnetic field; field '" + c.field()
                            + "' is not one");
                }
                org.twinorbit.fields.GridFile.write(f, new double[] {gridBox.get(0), gridBox.get(2), gridBox.get(4)},
                        new double[] {gridBox.get(1), gridBox.get(3), gridBox.get(5)},
                        new int[] {gridNodes.get(0), gridNodes.get(1), gridNodes.get(2)}, dir.resolve("field-grid.h5"));
            }
            names.add(c.name());
        }
        if (suite != null) {
            CaseExport.writeIndex(names, out);
        }
        pw.println("wrote " + cases.size() + " case" + (cases.size() == 1 ? "" : "s") + " into " + out
                + (cases.size() == 1 ? "/" + names.get(0) : "") + ": manifest.json, case.csv, runs.csv, initial-states.csv, "
                + "initial-states.h5, gc-start.csv, gc-runs.csv, field-card.json, field-card.csv"
                + (gridBox != null ? ", field-grid.h5" : ""));
        pw.flush();
        return 0;
    }
}
