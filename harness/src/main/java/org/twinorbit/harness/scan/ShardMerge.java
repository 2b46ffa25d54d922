package org.twinorbit.harness.scan;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.twinorbit.harness.report.ToolInfo;
import picocli.CommandLine;

/**
 * Joins the finished shards under an output directory into exactly the files a single run of the
 * same command writes there: the scans are rebuilt from the options the shards recorded, the
 * points taken from the shards in the run's own order, ε* found and every file written by the
 * same code as a single run. Refuses — before writing anything — shards of different settings,
 * counts or builds, missing, unfinished or duplicated shards, so a finished result is never
 * replaced by a partial one.
 */
public final class ShardMerge {

    private ShardMerge() {}

    /** What a merge wrote. */
    public record Merged(String command, int shards, List<String> files, ScanResult scan) {}

    /**
     * Merges the scan or safe-use map whose shards {@code out} holds.
     *
     * @throws IllegalArgumentException when the shards do not fit (see {@link #collect}) or are a suite's
     */
    public static Merged merge(Path out) {
        return merge(out, collect(out));
    }

    /**
     * Merges a scan's or safe-use map's checked shards ({@link #collect}).
     *
     * @throws IllegalArgumentException naming the command when the shards are of another
     */
    public static Merged merge(Path out, Map<Integer, ShardFile> files) {
        ShardFile first = files.get(0);
        return switch (first.command()) {
            case "scan" -> mergeScan(out, files);
            case "safe-use" -> mergeSafeUse(out, files);
            default -> throw new IllegalArgumentException("merge: shard 0 names the command '" + first.command()
                    + "'; shards come from scan, scan --safe-use or suite");
        };
    }

    /**
     * The finished shard files under {@code out}, by shard index, after every check that needs no
     * knowledge of the command: one cut, every shard present once and finished, the same build
     * (this one) and the same options everywhere.
     *
     * @throws IllegalArgumentException naming each problem; nothing is written
     */
    public static Map<Integer, ShardFile> collect(Path out) {
        if (!Files.isDirectory(out)) {
            throw new IllegalArgumentException("--out: " + out + " is not a directory holding shard folders");
        }
        TreeMap<String, Shard> folders = new TreeMap<>();
        try (Stream<Path> list = Files.list(out)) {
            list.filter(Files::isDirectory).forEach(d -> {
                Shard s = Shard.ofFolder(d.getFileName().toString());
                if (s != null) {
                    folders.put(d.getFileName().toString(), s);
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException("cannot list " + out + ": " + e.getMessage(), e);
        }
        if (folders.isEmpty()) {
            throw new IllegalArgumentException("merge: no shard folders (shard-I-of-K) in " + out
                    + "; run each shard with --shard I/K --out " + out + " first");
        }
        TreeSet<Integer> counts = folders.values().stream().map(Shard::count).collect(Collectors.toCollection(TreeSet::new));
        if (counts.size() > 1) {
            throw new IllegalArgumentException("merge: " + out + " holds shards of runs cut " + counts.stream()
                    .map(String::valueOf).collect(Collectors.joining(" and ")) + " ways (" + String.join(", ", folders.keySet())
                    + "); keep the folders of one run only");
        }
        int count = counts.first();
        TreeMap<Integer, List<String>> byIndex = new TreeMap<>();
        TreeSet<Integer> unfinished = new TreeSet<>();
        Map<Integer, ShardFile> files = new TreeMap<>();
        for (Map.Entry<String, Shard> f : folders.entrySet()) {
            Path file = out.resolve(f.getKey()).resolve(ShardFile.FILE_NAME);
            if (!Files.exists(file)) {
                unfinished.add(f.getValue().index());
                continue;
            }
            ShardFile sf = ShardFile.read(file);
            if (!sf.shard().equals(f.getValue())) {
                throw new IllegalArgumentException("merge: " + file + " holds shard " + sf.shard().index() + "/"
                        + sf.shard().count() + ", not the " + f.getValue().index() + "/" + count + " its folder names");
            }
            byIndex.computeIfAbsent(sf.shard().index(), k -> new ArrayList<>()).add(f.getKey());
            files.put(sf.shard().index(), sf);
        }
        List<String> problems = new ArrayList<>();
        List<Integer> missing = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            if (!byIndex.containsKey(i) && !unfinished.contains(i)) {
                missing.add(i);
            }
        }
        if (!missing.isEmpty()) {
            problems.add("missing shard(s) " + join(missing) + " (no folder: never run, or removed)");
        }
        unfinished.removeAll(byIndex.keySet());
        if (!unfinished.isEmpty()) {
            problems.add("unfinished shard(s) " + join(unfinished) + " (partial results only: run each again with "
                    + "--resume --shard I/" + count + ")");
        }
        byIndex.forEach((i, names) -> {
            if (names.size() > 1) {
                problems.add("shard " + i + " given twice (" + String.join(", ", names) + ")");
            }
        });
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException("merge: cannot merge the " + count + " shards in " + out + ": "
                    + String.join("; ", problems) + "; nothing written");
        }
        ShardFile first = files.get(0);
        sameEverywhere(files, "builds", sf -> describe(sf.tool()));
        sameEverywhere(files, "settings", sf -> sf.command() + " " + String.join(" ", sf.options()));
        if (!first.tool().equals(ToolInfo.json())) {
            throw new IllegalArgumentException("merge: the shards were computed by " + describe(first.tool())
                    + ", this is " + describe(ToolInfo.json()) + "; merge with the build that ran them, so that the "
                    + "results name the build that computed them");
        }
        return files;
    }

    private static Merged mergeScan(Path out, Map<Integer, ShardFile> files) {
        ScanCommand cmd = rebuild(files.get(0));
        ScanRequest.Built b = cmd.setup();
        String name = (String) b.scan().settings().get("field");
        Joined j = join(b.scan(), name, files);
        if (j.failed() != null) {
            throw new IllegalArgumentException("merge: " + j.failed());
        }
        ScanResult r = b.scan().result(j.points());
        Path json = out.resolve("scan.json");
        if (Files.exists(json)) {
            JsonNode saved = ScanJson.readFile(json, "merge: the finished results").get("scan");
            if (!Objects.equals(saved, ScanJson.MAPPER.valueToTree(r.settings()))) {
                throw new IllegalArgumentException("merge: " + out + " already holds a finished scan of other settings ("
                        + BreakdownScan.FINISHED_FILES + "); merge into its own --out");
            }
        }
        ScanOutputs.write(r, out);
        return new Merged("scan", files.size(), List.of("scan.md", "scan.csv", "scan.json", "scan.png"), r);
    }

    private static Merged mergeSafeUse(Path out, Map<Integer, ShardFile> files) {
        ScanCommand cmd = rebuild(files.get(0));
        SafeUseMap.Plan plan = SafeUseMap.plan(new SafeUseMap.Resolution(cmd.points, cmd.phases), 1);
        SafeUseMap.write(safeUse(plan, files), out);
        return new Merged("safe-use", files.size(), List.of("safe-use.md", "safe-use.csv", "safe-use.json",
                "safe-use.png"), null);
    }

    /**
     * The safe-use map of {@code plan} from the points the shards hold, as a single run finds it.
     *
     * @throws IllegalArgumentException when a point is missing, duplicated or off the grid, or a
     *                                  shard ran a scan with other settings
     */
    public static SafeUseMap.Result safeUse(SafeUseMap.Plan plan, Map<Integer, ShardFile> files) {
        Map<String, String> skipped = new LinkedHashMap<>(plan.skipped());
        List<SafeUseMap.Row> rows = new ArrayList<>();
        for (int i = 0; i < plan.scans().size(); i++) {
            ScanRequest.Built b = plan.scans().get(i);
            Joined j = join(b.scan(), plan.names().get(i), files);
            if (j.failed() != null) {
                skipped.put(plan.names().get(i), j.failed());
                continue;
            }
            rows.addAll(SafeUseMap.rows(b, b.scan().result(j.points())));
        }
        return new SafeUseMap.Result(rows, skipped);
    }

    /** The scan command as the shards ran it, options parsed by this build. */
    private static ScanCommand rebuild(ShardFile sf) {
        ScanCommand cmd = new ScanCommand();
        try {
            new CommandLine(cmd).parseArgs(sf.options().toArray(String[]::new));
        } catch (CommandLine.ParameterException e) {
            throw new IllegalArgumentException("merge: the options the shards recorded (" + String.join(" ", sf.options())
                    + ") do not parse: " + e.getMessage());
        }
        return cmd;
    }

    /** One scan's points from every shard, or why it failed. */
    private record Joined(List<ScanPoint> points, String failed) {}

    private static Joined join(BreakdownScan scan, String name, Map<Integer, ShardFile> files) {
        double[] eps = scan.eps();
        List<Double> pitches = scan.pitches();
        List<Integer> signs = scan.chargeSigns();
        ScanPoint[] all = new ScanPoint[scan.size()];
        int[] from = new int[all.length];
        JsonNode settings = ScanJson.MAPPER.valueToTree(scan.settings());
        String failed = null;
        for (Map.Entry<Integer, ShardFile> f : files.entrySet()) {
            ShardFile.Part part = f.getValue().scans().stream().filter(p -> p.name().equals(name)).findFirst()
                    .orElseThrow(() -> new IllegalArgumentException("merge: shard " + f.getKey() + " has no part of scan "
                            + name + "; run that shard again"));
            if (!settings.equals(ScanJson.MAPPER.valueToTree(part.settings()))) {
                throw new IllegalArgumentException("merge: shard " + f.getKey() + " ran scan " + name + " with the settings "
                        + ScanJson.MAPPER.valueToTree(part.settings()) + ", but its options give " + settings
                        + " with this build; run the shards again");
            }
            if (part.failed() != null && failed == null) {
                failed = part.failed();
            }
            for (ScanPoint p : part.points()) {
                int e = indexOf(eps, p.eps());
                int q = pitches.indexOf(p.pitchDeg());
                int g = signs.indexOf(p.chargeSign());
                if (e < 0 || q < 0 || g < 0) {
                    throw new IllegalArgumentException("merge: shard " + f.getKey() + " holds a point of scan " + name
                            + " (eps " + p.eps() + ", pitch " + p.pitchDeg() + " deg) off the scan's grid; run that shard again");
                }
                int k = (g * pitches.size() + q) * eps.length + e;
                if (all[k] != null) {
                    throw new IllegalArgumentException("merge: shards " + from[k] + " and " + f.getKey() + " both hold the "
                            + "point eps " + p.eps() + ", pitch " + p.pitchDeg() + " deg of scan " + name
                            + "; the shards were not cut by one rule: run them again with one build");
                }
                all[k] = p;
                from[k] = f.getKey();
            }
        }
        if (failed != null) {
            return new Joined(List.of(), failed);
        }
        for (int k = 0; k < all.length; k++) {
            if (all[k] == null) {
                throw new IllegalArgumentException("merge: no shard holds the point eps " + eps[k % eps.length] + ", pitch "
                        + ScanRunner.pitchOf(scan, k) + " deg" + (signs.size() > 1 ? ", charge sign "
                        + ScanRunner.signOf(scan, k) : "") + " of scan " + name + "; the shards were not cut by one rule: "
                        + "run them again with one build");
            }
        }
        return new Joined(List.of(all), null);
    }

    private static int indexOf(double[] values, double v) {
        for (int i = 0; i < values.length; i++) {
            if (values[i] == v) {
                return i;
            }
        }
        return -1;
    }

    /** Refuses unless {@code what} reads the same for every shard, naming the shards that differ from shard 0. */
    private static void sameEverywhere(Map<Integer, ShardFile> files, String what,
                                       java.util.function.Function<ShardFile, String> of) {
        String ref = of.apply(files.get(0));
        List<String> differ = new ArrayList<>();
        files.forEach((i, sf) -> {
            if (!of.apply(sf).equals(ref)) {
                differ.add("shard " + i + ": " + of.apply(sf));
            }
        });
        if (!differ.isEmpty()) {
            throw new IllegalArgumentException("merge: the shards come from different " + what + " (shard 0: " + ref + "; "
                    + String.join("; ", differ) + "); run every shard with one build and the same options");
        }
    }

    private static String describe(Map<String, Object> tool) {
        return tool.get("name") + " " + tool.get("version") + " (" + tool.get("git_commit") + ")";
    }

    private static String join(java.util.Collection<Integer> indices) {
        return indices.stream().map(String::valueOf).collect(Collectors.joining(", "));
    }
}
