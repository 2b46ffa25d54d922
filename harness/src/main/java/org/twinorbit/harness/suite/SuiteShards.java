package org.twinorbit.harness.suite;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ToolInfo;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.scan.SafeUseMap;
import org.twinorbit.harness.scan.ScanProgress;
import org.twinorbit.harness.scan.ScanProgressBar;
import org.twinorbit.harness.scan.Shard;
import org.twinorbit.harness.scan.ShardFile;
import org.twinorbit.harness.scan.ShardRuns;

/**
 * The suite cut into shards ({@code suite --shard I/K}): its validation cases and the points of
 * its safe-use map are cut together by estimated cost ({@link Shard#cut}), and shard I computes
 * its share into its own folder {@code shard-I-of-K}:
 * <ul>
 * <li>{@value #CASES}/&lt;case&gt;.json per finished case: the build, the recorded options and the
 *     case's {@link CaseReport}, written atomically as soon as the case is done (what
 *     {@code --resume} takes up);
 * <li>plots/ with the finished PNGs of its cases whose plots the report shows;
 * <li>the safe-use map's points as a scan shard keeps them, and at the end {@link ShardFile}
 *     (command {@code suite}) that marks the shard finished.
 * </ul>
 * {@link SuiteMerge} joins the shards into the files one {@code suite} run writes.
 */
public final class SuiteShards {

    /** The folder of the finished cases in a shard's folder. */
    public static final String CASES = "cases";

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private SuiteShards() {}

    /**
     * The cut of a suite.
     *
     * @param cases   the suite's cases in report order
     * @param safeUse the safe-use map's scans, or null when the suite has none (--quick, --no-safe-use)
     * @param part    the shard of every unit: the cases first, then the map's points
     */
    public record Plan(List<Case> cases, SafeUseMap.Plan safeUse, int[] part) {

        /** The shard the cut gives case {@code i}. */
        public int shardOf(int i) {
            return part[i];
        }
    }

    /** Cuts the cases and (when {@code safeUse}) the safe-use map's points into {@code count} shards. */
    public static Plan plan(List<Case> cases, boolean safeUse, int count) {
        SafeUseMap.Plan map = safeUse ? SafeUseMap.plan(SafeUseMap.Resolution.FULL, 1) : null;
        double[] points = map == null ? new double[0] : ShardRuns.safeUseCosts(map);
        double[] costs = new double[cases.size() + points.length];
        for (int i = 0; i < cases.size(); i++) {
            costs[i] = cost(cases.get(i));
        }
        System.arraycopy(points, 0, costs, cases.size(), points.length);
        return new Plan(cases, map, Shard.cut(costs, count));
    }

    /**
     * The estimated cost of a case, in the unit of a scan point's estimate (gyroperiod-orbits,
     * {@code PointCost}) so that both are cut together: phases × gyroperiods run × (2 references +
     * pushers + guiding-center integrators), a bounce or sheet crossing counted as 1/ε
     * gyroperiods (a length ~L at a speed ~v). It only balances shards and never changes a result.
     */
    static double cost(Case c) {
        double eps = c.eps() == null ? 0.05 : c.eps();
        double gyroperiods = switch (c.durationUnit()) {
            case GYROPERIODS -> c.duration();
            case BOUNCES, CROSSINGS -> c.duration() / eps;
        };
        return c.phases() * gyroperiods * (2 + c.pushers().size() + c.gcIntegrators().size());
    }

    /** What a shard did. @param ran cases computed now @param resumed cases taken up @param cases the shard's cases */
    public record Outcome(Path folder, int cases, int ran, int resumed) {}

    /**
     * Runs shard {@code shard} of {@code plan} into {@code out}/shard-I-of-K.
     *
     * @param options the recorded options ({@code RecordedOptions}), kept with every case for the merge
     * @param resume  take up the cases and points an interrupted run of this shard saved
     * @throws IllegalArgumentException naming --resume when saved cases are damaged or of other options or build
     */
    public static Outcome run(Plan plan, boolean quick, List<String> options, Shard shard, Path out, boolean resume,
                              int threads, boolean quiet) {
        Path folder = out.resolve(shard.folder());
        Path cases = folder.resolve(CASES);
        try {
            if (!resume) {
                // a new run of the shard: nothing of an earlier one may be merged with it
                Files.deleteIfExists(folder.resolve(ShardFile.FILE_NAME));
                SafeUseMap.deleteTree(cases);
            }
            Files.createDirectories(cases);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot prepare " + folder + ": " + e.getMessage(), e);
        }
        java.util.Set<String> plotted = ValidationReport.plotted(plan.cases());
        List<Case> todo = new ArrayList<>();
        int mine = 0;
        for (int i = 0; i < plan.cases().size(); i++) {
            if (plan.shardOf(i) != shard.index()) {
                continue;
            }
            mine++;
            Case c = plan.cases().get(i);
            Path file = caseFile(folder, c.name());
            if (resume && Files.exists(file)) {
                read(file, options, "--resume: the saved case");
            } else {
                todo.add(c);
            }
        }
        if (!todo.isEmpty()) {
            new CaseRunner(threads, quiet).run(todo, r -> {
                if (plotted.contains(r.resolved().spec().name())) {
                    ValidationReport.writePlots(r, folder); // before the case file, which marks the case done
                }
                Map<String, Object> root = new LinkedHashMap<>();
                root.put("tool", ToolInfo.json());
                root.put("options", options);
                root.put("report", CaseReport.of(r, quick).toMap());
                AtomicFiles.write(caseFile(folder, r.resolved().spec().name()), ResultJson.write(root));
            });
        }
        List<ShardFile.Part> parts = List.of();
        if (plan.safeUse() != null) {
            if (quiet) {
                parts = ShardRuns.safeUseParts(plan.safeUse(), plan.part(), plan.cases().size(), shard, folder, resume,
                        threads, ScanProgress.NONE);
            } else {
                try (ScanProgressBar bar = new ScanProgressBar("safe-use map, shard " + shard.index() + "/"
                        + shard.count())) {
                    parts = ShardRuns.safeUseParts(plan.safeUse(), plan.part(), plan.cases().size(), shard, folder,
                            resume, threads, bar);
                }
            }
        }
        new ShardFile(ToolInfo.json(), shard, "suite", options, parts).write(folder);
        if (plan.safeUse() != null) {
            ShardRuns.deleteSafeUseWork(plan.safeUse(), folder);
        }
        return new Outcome(folder, mine, todo.size(), mine - todo.size());
    }

    /** A case's file in a shard's folder. */
    static Path caseFile(Path folder, String caseName) {
        return folder.resolve(CASES).resolve(caseName + ".json");
    }

    /**
     * Reads a saved case and checks that this build with these options made it.
     *
     * @param what how messages name the file ("--resume: the saved case", "merge: the case")
     * @throws IllegalArgumentException starting with {@code what}, naming the file and the defect
     */
    static CaseReport read(Path file, List<String> options, String what) {
        JsonNode root;
        try {
            root = MAPPER.readTree(file.toFile());
        } catch (IOException e) {
            throw new IllegalArgumentException(what + " " + file + " cannot be read (" + e.getMessage()
                    + "); delete it and run the shard again");
        }
        try {
            if (root == null || !root.isObject() || !root.has("tool") || !root.has("options")) {
                throw new IllegalArgumentException("it has no 'tool' and 'options'");
            }
            if (!root.get("tool").equals(MAPPER.valueToTree(ToolInfo.json()))) {
                throw new IllegalArgumentException("it was computed by another build (" + root.get("tool") + ")");
            }
            if (!root.get("options").equals(MAPPER.valueToTree(options))) {
                throw new IllegalArgumentException("it was computed with other options (" + root.get("options")
                        + ", now " + MAPPER.valueToTree(options) + ")");
            }
            return CaseReport.fromTree(root.get("report"));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(what + " " + file + " does not fit: " + e.getMessage()
                    + "; delete it or use another --out");
        }
    }
}
