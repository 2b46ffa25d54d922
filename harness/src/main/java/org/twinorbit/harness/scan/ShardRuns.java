package org.twinorbit.harness.scan;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.twinorbit.harness.report.ToolInfo;

/**
 * Runs one shard of a scan or of the safe-use map: the points {@link Shard#cut} gives this shard,
 * each saved as it completes (so an interrupted shard resumes like {@code scan --resume}), then
 * {@link ShardFile} in the shard's own folder. Nothing outside that folder is written.
 */
public final class ShardRuns {

    private ShardRuns() {}

    /** True when the shard's folder under {@code out} holds its finished file. */
    static boolean finished(Path out, Shard shard) {
        return Files.exists(out.resolve(shard.folder()).resolve(ShardFile.FILE_NAME));
    }

    /** One shard of one scan. @return the shard's folder */
    static Path scan(ScanRequest.Built b, List<String> options, Shard shard, Path out, boolean resume, int threads,
                     ScanProgress progress) {
        Path folder = out.resolve(shard.folder());
        int[] part = Shard.cut(PointCost.of(b.scan()), shard.count());
        ShardFile.Part p = part(b, (String) b.scan().settings().get("field"), folder, part, 0, shard, resume, threads,
                progress, false);
        new ShardFile(ToolInfo.json(), shard, "scan", options, List.of(p)).write(folder);
        ScanCheckpoint.open(folder, b.scan(), false).delete();
        return folder;
    }

    /**
     * One shard of the safe-use map: the points of all its scans are cut together, so that a
     * shard's share is balanced over fields of very different cost.
     *
     * @return the shard's folder
     */
    static Path safeUse(SafeUseMap.Plan plan, List<String> options, Shard shard, Path out, boolean resume, int threads,
                        ScanProgress progress) {
        Path folder = out.resolve(shard.folder());
        int[] part = Shard.cut(safeUseCosts(plan), shard.count());
        List<ShardFile.Part> parts = safeUseParts(plan, part, 0, shard, folder, resume, threads, progress);
        new ShardFile(ToolInfo.json(), shard, "safe-use", options, parts).write(folder);
        deleteSafeUseWork(plan, folder);
        return folder;
    }

    /** The estimated cost ({@link PointCost}) of every point of the map, scan after scan in the plan's order. */
    public static double[] safeUseCosts(SafeUseMap.Plan plan) {
        List<double[]> costs = new ArrayList<>();
        int n = 0;
        for (ScanRequest.Built b : plan.scans()) {
            double[] c = PointCost.of(b.scan());
            costs.add(c);
            n += c.length;
        }
        double[] all = new double[n];
        int at = 0;
        for (double[] c : costs) {
            System.arraycopy(c, 0, all, at, c.length);
            at += c.length;
        }
        return all;
    }

    /**
     * A shard's points of the safe-use map, each scan checkpointed in {@code folder}/&lt;scan name&gt;
     * (so that {@code resume} takes them up).
     *
     * @param part   the shard of every unit of the whole cut
     * @param offset index in {@code part} of the map's first point ({@link #safeUseCosts} order)
     * @return the shard's part of each scan, in the plan's order
     */
    public static List<ShardFile.Part> safeUseParts(SafeUseMap.Plan plan, int[] part, int offset, Shard shard,
                                                    Path folder, boolean resume, int threads, ScanProgress progress) {
        int mine = 0;
        int total = plan.totalPoints();
        for (int k = 0; k < total; k++) {
            mine += part[offset + k] == shard.index() ? 1 : 0;
        }
        ScanProgress overall = new SafeUseMap.Overall(progress, mine);
        List<ShardFile.Part> parts = new ArrayList<>();
        int at = offset;
        for (int i = 0; i < plan.scans().size(); i++) {
            ScanRequest.Built b = plan.scans().get(i);
            String name = plan.names().get(i);
            parts.add(part(b, name, folder.resolve(name), part, at, shard, resume, threads, overall, true));
            at += b.scan().size();
        }
        return parts;
    }

    /** Deletes the checkpoints {@link #safeUseParts} left in {@code folder}, once its file is written. */
    public static void deleteSafeUseWork(SafeUseMap.Plan plan, Path folder) {
        for (String name : plan.names()) {
            SafeUseMap.deleteTree(folder.resolve(name));
        }
    }

    /**
     * This shard's points of one scan, checkpointed in {@code dir}.
     *
     * @param part   the shard of every point of the whole run
     * @param offset index in {@code part} of this scan's first point
     * @param listFailure true to record a scan that cannot run (as the safe-use map lists it), false
     *                    to stop with its error (as a scan does)
     */
    private static ShardFile.Part part(ScanRequest.Built b, String name, Path dir, int[] part, int offset, Shard shard,
                                       boolean resume, int threads, ScanProgress progress,
                                       boolean listFailure) {
        BreakdownScan s = b.scan();
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create " + dir + ": " + e.getMessage(), e);
        }
        try {
            ScanCheckpoint cp = ScanCheckpoint.open(dir, s, resume);
            ScanPoint[] points = ScanRunner.run(s, b.evaluator(), cp, threads, progress,
                    k -> part[offset + k] == shard.index());
            List<ScanPoint> mine = new ArrayList<>();
            for (ScanPoint p : points) {
                if (p != null) {
                    mine.add(p);
                }
            }
            return new ShardFile.Part(name, s.settings(), mine, null);
        } catch (IllegalArgumentException e) {
            if (!listFailure || e.getMessage() != null && e.getMessage().startsWith("--resume")) {
                throw e; // the user's partial results, not the scan, are at fault
            }
            return new ShardFile.Part(name, s.settings(), List.of(), SafeUseMap.failure(e));
        }
    }
}
