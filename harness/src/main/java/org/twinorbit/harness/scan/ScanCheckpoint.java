package org.twinorbit.harness.scan;

import org.twinorbit.harness.report.AtomicFiles;
import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * The partial results of a scan, saved as each point completes so that an interrupted scan
 * resumes where it stopped without recomputing or losing a point. The file
 * ({@value #FILE_NAME} in the output directory) holds the scan settings and the finished points;
 * it is rewritten atomically after every point, so an interruption leaves the previous complete
 * version, and deleted once the final results are written.
 */
public final class ScanCheckpoint {

    /** Name of the partial-results file in the output directory. */
    public static final String FILE_NAME = "scan.partial.json";

    private record Key(int chargeSign, double pitchDeg, double eps) {}

    private static final Comparator<Key> ORDER = Comparator.comparingInt((Key k) -> -k.chargeSign())
            .thenComparingDouble(Key::pitchDeg).thenComparingDouble(Key::eps);

    private final Path file;
    private final Map<String, Object> settings;
    private final TreeMap<Key, ScanPoint> done = new TreeMap<>(ORDER);

    private ScanCheckpoint(Path file, Map<String, Object> settings) {
        this.file = file;
        this.settings = new LinkedHashMap<>(settings);
    }

    /**
     * Opens the checkpoint of a scan in {@code dir}.
     *
     * @param scan   the scan: its settings must equal the saved ones, and every saved point must
     *               be one of its grid and carry the values its thresholds read
     * @param resume true to take up the points already saved; false to start afresh
     * @throws IllegalArgumentException when resuming from a file made with other settings, or
     *         from a file that is empty, not JSON, or damaged ({@link #load}); nothing is computed then
     */
    public static ScanCheckpoint open(Path dir, BreakdownScan scan, boolean resume) {
        ScanCheckpoint cp = new ScanCheckpoint(dir.resolve(FILE_NAME), scan.settings());
        if (resume && Files.exists(cp.file)) {
            cp.load(scan);
        }
        return cp;
    }

    /**
     * Reads and checks the saved file. A damaged file is refused as a whole rather than taken up in
     * part: a point with a missing or mistyped value would otherwise enter the results as a
     * silent gap (or be recomputed unnoticed), and a file that was edited or damaged once is not
     * trusted for its other points either. The message names the file and the first defect.
     */
    private void load(BreakdownScan scan) {
        JsonNode root = ScanJson.readFile(file, "--resume: the partial results");
        JsonNode saved = root.get("scan");
        if (saved == null || !saved.isObject()) {
            throw damaged("it has no 'scan' object with the settings");
        }
        JsonNode now = ScanJson.MAPPER.valueToTree(settings);
        if (!resolved(saved).equals(resolved(now))) {
            throw new IllegalArgumentException("--resume: the partial results in " + file.getParent()
                    + " were made with different settings (saved: " + saved + "; now: " + now
                    + "); use the same options, another --out, or drop --resume");
        }
        JsonNode points = root.get("points");
        if (points == null || !points.isArray()) {
            throw damaged("'points' is " + ScanJson.kind(points) + ", not an array");
        }
        Set<String> metricKeys = null;
        for (int i = 0; i < points.size(); i++) {
            String where = "point " + (i + 1) + " of " + points.size();
            ScanPoint p;
            try {
                p = ScanJson.readCheckedPoint(points.get(i), scan.eps(), scan.pitches(), scan.chargeSigns(),
                        requiredKeys(scan));
            } catch (IllegalArgumentException e) {
                throw damaged(where + " " + e.getMessage());
            }
            Set<String> keys = new TreeSet<>(p.values().keySet());
            keys.removeIf(k -> !ScanMetric.isMetricKey(k));
            if (metricKeys != null && !metricKeys.equals(keys)) {
                throw damaged(where + " has the metrics " + keys + " where point 1 has " + metricKeys);
            }
            metricKeys = keys;
            if (done.put(new Key(p.chargeSign(), p.pitchDeg(), p.eps()), p) != null) {
                throw damaged(where + " repeats pitch " + p.pitchDeg() + " deg, eps " + p.eps()
                        + (p.chargeSign() == ChargeSigns.GIVEN ? "" : ", charge sign " + p.chargeSign()));
            }
        }
    }

    /** The values the scan's thresholds read: each thresholded metric's chosen summary. */
    private static Set<String> requiredKeys(BreakdownScan scan) {
        Set<String> keys = new TreeSet<>();
        for (ScanMetric m : scan.tolerances().keySet()) {
            keys.add(m.key(scan.statistic()));
        }
        return keys;
    }

    private IllegalArgumentException damaged(String what) {
        return new IllegalArgumentException("--resume: the partial results " + file + " are damaged: " + what
                + "; delete the file to start afresh (its points are then computed again)");
    }

    /**
     * The settings with the field's parameters resolved (defaults filled in), so that
     * {@code -P Lg=1} compares equal to leaving the default of 1; unchanged when they cannot be
     * resolved (a grid field, an unknown name), which then compare as given.
     */
    private static JsonNode resolved(JsonNode settings) {
        JsonNode field = settings.get("field");
        JsonNode given = settings.get("parameters");
        if (field == null || !field.isTextual() || given == null || !given.isObject()) {
            return settings;
        }
        try {
            Map<String, Double> overrides = new LinkedHashMap<>();
            given.fields().forEachRemaining(e -> overrides.put(e.getKey(), e.getValue().asDouble()));
            Map<String, Double> all = new TreeMap<>(org.twinorbit.fields.Fields.check(
                    org.twinorbit.fields.Fields.provider(field.asText()), overrides).asMap());
            com.fasterxml.jackson.databind.node.ObjectNode copy = settings.deepCopy();
            copy.set("parameters", ScanJson.MAPPER.valueToTree(all));
            return copy;
        } catch (IllegalArgumentException e) {
            return settings;
        }
    }

    /** The saved point at this pitch angle (degrees), ε and charge sign ({@link ChargeSigns}), or null. */
    public synchronized ScanPoint get(double pitchDeg, double eps, int chargeSign) {
        return done.get(new Key(chargeSign, pitchDeg, eps));
    }

    /** Number of points saved. */
    public synchronized int size() {
        return done.size();
    }

    /** Saves a finished point: the file is rewritten atomically with it included. */
    public synchronized void add(ScanPoint p) {
        done.put(new Key(p.chargeSign(), p.pitchDeg(), p.eps()), p);
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("scan", settings);
        List<Object> points = new ArrayList<>();
        for (ScanPoint q : done.values()) {
            points.add(ScanJson.pointMap(q, true));
        }
        root.put("points", points);
        AtomicFiles.write(file, ScanJson.write(root));
    }

    /** Removes the file once the final results are safely written. */
    public synchronized void delete() {
        try {
            Files.deleteIfExists(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
