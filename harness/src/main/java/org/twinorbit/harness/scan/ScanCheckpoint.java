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
import java.util.TreeMap;

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

    private record Key(double pitchDeg, double eps) {}

    private static final Comparator<Key> ORDER =
            Comparator.comparingDouble(Key::pitchDeg).thenComparingDouble(Key::eps);

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
     * @param settings what the points depend on; a resumed file must have been made with equal ones
     * @param resume   true to take up the points already saved; false to start afresh
     * @throws IllegalArgumentException when resuming from a file made with other settings
     */
    public static ScanCheckpoint open(Path dir, Map<String, Object> settings, boolean resume) {
        ScanCheckpoint cp = new ScanCheckpoint(dir.resolve(FILE_NAME), settings);
        if (resume && Files.exists(cp.file)) {
            cp.load();
        }
        return cp;
    }

    private void load() {
        JsonNode root;
        try {
            root = ScanJson.MAPPER.readTree(file.toFile());
        } catch (IOException e) {
            throw new IllegalArgumentException("--resume: cannot read the partial results " + file
                    + " (" + e.getMessage() + "); delete it to start afresh");
        }
        JsonNode saved = root.get("scan");
        JsonNode now = ScanJson.MAPPER.valueToTree(settings);
        if (saved == null || !resolved(saved).equals(resolved(now))) {
            throw new IllegalArgumentException("--resume: the partial results in " + file.getParent()
                    + " were made with different settings (saved: " + saved + "; now: " + now
                    + "); use the same options, another --out, or drop --resume");
        }
        for (JsonNode n : root.withArray("points")) {
            ScanPoint p = ScanJson.readPoint(n);
            done.put(new Key(p.pitchDeg(), p.eps()), p);
        }
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

    /** The saved point at this pitch angle (degrees) and ε, or null. */
    public synchronized ScanPoint get(double pitchDeg, double eps) {
        return done.get(new Key(pitchDeg, eps));
    }

    /** Number of points saved. */
    public synchronized int size() {
        return done.size();
    }

    /** Saves a finished point: the file is rewritten atomically with it included. */
    public synchronized void add(ScanPoint p) {
        done.put(new Key(p.pitchDeg(), p.eps()), p);
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("scan", settings);
        List<Object> points = new ArrayList<>();
        for (ScanPoint q : done.values()) {
            points.add(ScanJson.pointMap(q));
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
