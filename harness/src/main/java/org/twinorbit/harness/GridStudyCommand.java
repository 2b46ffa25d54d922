package org.twinorbit.harness;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.twinorbit.fields.GridFile;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.gridstudy.GridSpec;
import org.twinorbit.harness.gridstudy.GridStudy;
import org.twinorbit.harness.gridstudy.GridStudyTables;
import org.twinorbit.harness.run.CaseRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code twinorbit gridstudy}: interpolation error as a third kind of error ({@link GridStudy}).
 * With {@code --eps-min/--eps-max} it also scans ε on every field and compares ε*.
 */
@Command(name = "gridstudy", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Grid study: run one case (the options of 'run') on an analytic field of the library and on its "
                + "grids at spacing h, h/2, h/4, ..., compare the model row's metrics (guiding-center reference "
                + "against the gyro-averaged full-orbit reference) with the analytic ones, fit how the difference "
                + "shrinks with h, and give the spacing at which each metric stays within --tolerance of its analytic "
                + "value. Pushers and guiding-center integrators are not run; --gc-start defaults to shared here (a matched "
                + "start uses the analytic field's canonical momenta, which a grid does not carry). Writes gridstudy.md, .csv and .json "
                + "into --out. With --eps-min and --eps-max it also runs the breakdown scan of the case on every field and "
                + "compares eps*.")
public final class GridStudyCommand implements Callable<Integer> {

    @Mixin
    CaseOptions caseOptions;

    @Option(names = "--geometry", paramLabel = "GEOMETRY", description = GridSpec.GEOMETRY_HELP)
    String geometry = "cartesian";

    @Option(names = "--box", paramLabel = "BOUNDS", required = true, split = ",", description = GridSpec.BOX_HELP)
    List<Double> box;

    @Option(names = "--nodes", paramLabel = "COUNTS", required = true, split = ",",
            description = "The coarsest grid (spacing h). " + GridSpec.NODES_HELP)
    List<Integer> nodes;

    @Option(names = "--levels", paramLabel = "N", description = "Number of grids, each with every cell halved, "
            + "in [2, 5] (default: ${DEFAULT-VALUE}).")
    int levels = 3;

    @Option(names = "--tolerance", paramLabel = "FRACTION", description = "Relative difference from the analytic value "
            + "a metric may reach, in (0, 1) (default: ${DEFAULT-VALUE}).")
    double tolerance = 0.05;

    @Option(names = "--eps-min", paramLabel = "EPS", description = "With --eps-max: also scan eps from here (log-spaced) "
            + "on the analytic field and on every grid, and compare eps* (the scan's default tolerances).")
    Double epsMin;

    @Option(names = "--eps-max", paramLabel = "EPS", description = "Largest eps of that scan, below 1.")
    Double epsMax;

    @Option(names = "--points", paramLabel = "N", description = "Number of eps values of that scan, in [2, 1000] "
            + "(default: ${DEFAULT-VALUE}).")
    int points = 8;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "gridstudy-results",
            description = "Output directory (default: ${DEFAULT-VALUE}).")
    Path out;

    @Mixin
    ExecutionOptions execution;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        GridSpec grid = GridSpec.parse(geometry, box, nodes);
        if (levels < 2 || levels > 5) {
            throw new BadInputException("--levels: give 2 to 5 grids, got " + levels);
        }
        if (!(tolerance > 0 && tolerance < 1)) {
            throw new BadInputException("--tolerance: give a fraction in (0, 1), got " + tolerance);
        }
        if (caseOptions.gcStart == null) {
            // matched starts use the analytic field's canonical momenta, which a grid does not carry
            caseOptions.gcStart = "shared";
        }
        GridStudy.EpsRange range = null;
        if (epsMin != null || epsMax != null) {
            if (epsMin == null || epsMax == null || !(epsMin > 0 && epsMax > epsMin && epsMax < 1)) {
                throw new BadInputException("--eps-min/--eps-max: give both, with 0 < eps-min < eps-max < 1, got "
                        + epsMin + " and " + epsMax);
            }
            if (points < 2 || points > 1000) {
                throw new BadInputException("--points: give 2 to 1000 eps values, got " + points);
            }
            range = new GridStudy.EpsRange(epsMin, epsMax, points);
        }
        Case c = caseOptions.toCase();
        if (range != null && c.durationUnit() != org.twinorbit.harness.cases.DurationUnit.GYROPERIODS) {
            throw new BadInputException("--duration-unit: with --eps-min/--eps-max give the duration in gyroperiods (a "
                    + "scan of a grid file counts no bounces or crossings), got " + c.durationUnit().label());
        }
        if (c.field().startsWith(GridFile.PREFIX)) {
            throw new BadInputException("--field: the grid study samples an analytic field of the library; '" + c.field()
                    + "' is already a grid");
        }
        OutputDirectory.prepare(out);
        GridStudy.Result r;
        try {
            r = GridStudy.run(c, grid, levels, tolerance, new CaseRunner(execution.threads(), true), range,
                    execution.threads());
        } catch (org.twinorbit.fields.FieldParameterException e) {
            throw new BadInputException("--geometry: " + e.getMessage());
        }
        GridStudyTables.write(r, out);
        PrintWriter pw = spec.commandLine().getOut();
        for (String line : GridStudyTables.describe(r)) {
            pw.println(line);
        }
        pw.println();
        pw.print(GridStudyTables.levels(r).aligned());
        pw.println();
        pw.print(GridStudyTables.answers(r).aligned());
        pw.println();
        if (range != null) {
            if (r.epsStars().isEmpty()) {
                pw.println("no metric crossed its tolerance on the analytic field between eps " + Format.number(epsMin)
                        + " and " + Format.number(epsMax));
            } else {
                pw.print(GridStudyTables.epsStars(r).aligned());
            }
            pw.println();
        }
        pw.println("wrote " + out.resolve("gridstudy.md") + ", gridstudy.csv, gridstudy.json");
        pw.flush();
        return 0;
    }
}
