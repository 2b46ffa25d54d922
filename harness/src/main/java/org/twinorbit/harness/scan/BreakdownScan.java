package org.twinorbit.harness.scan;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.run.PhaseStatistic;

/**
 * One breakdown scan from start to written files: points measured in parallel with a checkpoint
 * after each, ε* found for every metric, tolerance and pitch angle, outputs written atomically.
 *
 * @param settings   what the points depend on (field, species, ε grid, ensemble, duration, ...);
 *                   written to scan.json and compared on {@code --resume}
 * @param eps        the ε grid, increasing
 * @param pitches    pitch angles (degrees)
 * @param axis       what ε means and how it reads as an energy
 * @param tolerances metric -> tolerances at which to find ε*
 * @param statistic  the summary over the gyrophase ensemble compared with the tolerances; not a
 *                   setting of the points, so a resumed scan may threshold another one
 * @param chargeSigns [{@link ChargeSigns#GIVEN}], or {@link ChargeSigns#BOTH}: the points are
 *                   sign-major, then pitch, then increasing ε
 */
public record BreakdownScan(Map<String, Object> settings, double[] eps, List<Double> pitches, ScanAxis axis,
                            Map<ScanMetric, List<Double>> tolerances, PhaseStatistic statistic,
                            List<Integer> chargeSigns) {

    public BreakdownScan {
        settings = new LinkedHashMap<>(settings);
        eps = eps.clone();
        pitches = List.copyOf(pitches);
        tolerances = new LinkedHashMap<>(tolerances);
        chargeSigns = List.copyOf(chargeSigns);
    }

    /** A scan of the species as given. */
    public BreakdownScan(Map<String, Object> settings, double[] eps, List<Double> pitches, ScanAxis axis,
                         Map<ScanMetric, List<Double>> tolerances, PhaseStatistic statistic) {
        this(settings, eps, pitches, axis, tolerances, statistic, List.of(ChargeSigns.GIVEN));
    }

    /** Number of points: ε values × pitch angles × charge signs. */
    public int size() {
        return eps.length * pitches.size() * chargeSigns.size();
    }

    /**
     * Measures every point not already saved, then writes scan.md/.csv/.json/.png into
     * {@code out} and removes the partial results.
     *
     * @param resume       true to take up the points saved by an interrupted run of the same scan
     * @param pointThreads points measured at the same time. {@link ModelErrorEvaluator} also spreads
     *                     each point's orbits over the cores; running as many points at once as
     *                     there are cores as well keeps every core busy through the long tail of a
     *                     point (its tighter self-estimate run) at the price of a little
     *                     time-slicing; the results do not depend on either count
     */
    public ScanResult run(PointEvaluator evaluator, Path out, boolean resume, int pointThreads, ScanProgress progress) {
        ScanCheckpoint cp = ScanCheckpoint.open(out, this, resume);
        List<ScanPoint> points = ScanRunner.run(this, evaluator, cp, pointThreads, progress);
        ScanResult r = result(points);
        ScanOutputs.write(r, out);
        cp.delete();
        return r;
    }

    /** The finished scan of these points (all of them, sign-major, pitch, then increasing ε): ε* found. */
    ScanResult result(List<ScanPoint> points) {
        return new ScanResult(settings, axis, points,
                Thresholds.find(points, pitches, chargeSigns, tolerances, axis, statistic));
    }

    /** The files of a finished scan, as the messages about them name them. */
    public static final String FINISHED_FILES = "scan.json, scan.csv, scan.md, scan.png";

    /**
     * True when {@code out} holds this scan finished (a scan.json with equal settings and no
     * partial results), so that {@code --resume} has nothing to do.
     *
     * @throws IllegalArgumentException when {@code out} holds a finished scan of other settings
     *         (resuming would overwrite it with another scan)
     */
    public boolean finishedIn(Path out) {
        Path json = out.resolve("scan.json");
        if (!Files.exists(json) || Files.exists(out.resolve(ScanCheckpoint.FILE_NAME))) {
            return false;
        }
        JsonNode saved = ScanJson.readFile(json, "--resume: the finished results").get("scan");
        if (saved == null || !saved.equals(ScanJson.MAPPER.valueToTree(settings))) {
            throw new IllegalArgumentException("--resume: " + out + " holds a finished scan made with different settings ("
                    + FINISHED_FILES + "; saved: " + saved + "); use another --out, or drop --resume to replace it");
        }
        return true;
    }
}
