package org.twinorbit.harness.suite;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.scan.SafeUseMap;
import org.twinorbit.harness.scan.ShardFile;
import org.twinorbit.harness.scan.ShardMerge;

/**
 * Joins the shards of a suite ({@link SuiteShards}) into exactly the files one {@code suite} run
 * writes: validation.md, .csv and .json by {@link ValidationReport#writeTables} from the saved
 * {@link CaseReport}s in report order, the plots copied as the shards drew them, and the safe-use
 * map by the scan merge. Every check runs before anything is written.
 */
public final class SuiteMerge {

    private SuiteMerge() {}

    /**
     * What the merge wrote.
     *
     * @param reports every case's share of the tables, in report order
     * @param safeUse the safe-use map, or null when the suite has none
     */
    public record Merged(List<CaseReport> reports, SafeUseMap.Result safeUse) {}

    /**
     * Merges the checked shard files ({@link ShardMerge#collect}) of a suite whose cases the
     * recorded options give.
     *
     * @param options the options the shards recorded
     * @param cases   the suite's cases for those options, in report order
     * @param safeUse whether the suite has a safe-use map
     * @throws IllegalArgumentException naming a missing, duplicated, foreign or damaged case or plot
     */
    public static Merged merge(Path out, Map<Integer, ShardFile> files, List<String> options, List<Case> cases,
                               boolean quick, boolean safeUse) {
        int count = files.get(0).shard().count();
        SuiteShards.Plan plan = SuiteShards.plan(cases, safeUse, count);
        Map<String, Integer> index = new HashMap<>();
        for (int i = 0; i < cases.size(); i++) {
            index.put(cases.get(i).name(), i);
        }
        CaseReport[] reports = new CaseReport[cases.size()];
        int[] from = new int[cases.size()];
        for (Map.Entry<Integer, ShardFile> f : files.entrySet()) {
            Path folder = out.resolve(f.getValue().shard().folder());
            for (Path file : caseFiles(folder)) {
                CaseReport r = SuiteShards.read(file, options, "merge: the case");
                Integer i = index.get(r.name());
                if (i == null || !file.getFileName().toString().equals(r.name() + ".json")) {
                    throw new IllegalArgumentException("merge: " + file + " holds case '" + r.name() + "', which the "
                            + "suite with options [" + String.join(" ", options) + "] does not have under that name; "
                            + "remove it and run shard " + f.getKey() + " again");
                }
                if (reports[i] != null) {
                    throw new IllegalArgumentException("merge: shards " + from[i] + " and " + f.getKey() + " both hold "
                            + "case " + r.name() + "; the shards were not cut by one rule: run them again with one build");
                }
                Case c = cases.get(i);
                if (!r.document().path("case").path("pushers").toString().equals(pushers(c))) {
                    throw new IllegalArgumentException("merge: shard " + f.getKey() + " ran case " + r.name() + " with "
                            + "the pushers " + r.document().path("case").path("pushers") + ", here the suite has "
                            + pushers(c) + " (another class path?); merge with the class path the shards ran with");
                }
                reports[i] = r;
                from[i] = f.getKey();
            }
        }
        for (int i = 0; i < reports.length; i++) {
            if (reports[i] == null) {
                throw new IllegalArgumentException("merge: no shard holds case " + cases.get(i).name() + " (shard "
                        + plan.shardOf(i) + " by the cut); run that shard again, with --resume");
            }
        }
        Map<Path, Path> plots = new LinkedHashMap<>();
        for (String name : ValidationReport.plotted(cases)) {
            int i = index.get(name);
            Path dir = out.resolve(files.get(from[i]).shard().folder()).resolve(ValidationReport.PLOTS);
            for (String kind : ValidationReport.PLOT_KINDS) {
                Path p = dir.resolve(name + "-" + kind + ".png");
                if (!Files.isRegularFile(p)) {
                    throw new IllegalArgumentException("merge: shard " + from[i] + " holds case " + name
                            + " but not its plot " + p + "; run that shard again");
                }
                plots.put(p, out.resolve(ValidationReport.PLOTS).resolve(p.getFileName()));
            }
        }
        SafeUseMap.Result map = safeUse ? ShardMerge.safeUse(plan.safeUse(), files) : null;
        List<CaseReport> all = List.of(reports);
        plots.forEach((source, target) -> {
            try {
                AtomicFiles.write(target, Files.readAllBytes(source));
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read " + source + ": " + e.getMessage(), e);
            }
        });
        ValidationReport.writeTables(all, quick, out);
        if (map != null) {
            SafeUseMap.write(map, out);
        }
        return new Merged(all, map);
    }

    private static String pushers(Case c) {
        return new com.fasterxml.jackson.databind.ObjectMapper().valueToTree(c.pushers()).toString();
    }

    private static List<Path> caseFiles(Path folder) {
        Path dir = folder.resolve(SuiteShards.CASES);
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(dir)) {
            List<Path> l = new ArrayList<>(s.filter(p -> p.getFileName().toString().endsWith(".json")).sorted().toList());
            return l;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot list " + dir + ": " + e.getMessage(), e);
        }
    }
}
