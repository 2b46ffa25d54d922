package org.twinorbit.harness.scan;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.report.ToolInfo;

/**
 * A finished shard: {@value #FILE_NAME} in the shard's folder, written atomically once every point
 * of the shard is computed (until then the folder holds only partial results, which
 * {@code --resume} takes up). Its JSON:
 * <ul>
 * <li>{@code tool}: the build that computed the points ({@link ToolInfo});
 * <li>{@code shard}: {@code index} and {@code count};
 * <li>{@code command}: {@code scan}, {@code safe-use} or {@code suite} (whose cases are saved
 *     beside this file, see {@code suite.SuiteShards});
 * <li>{@code options}: the command's options as given, sorted by option name, without those that
 *     do not change a result ({@code --shard}, {@code --out}, {@code --resume}, {@code --threads},
 *     {@code --quiet}); {@code twinorbit merge} rebuilds the scans from them;
 * <li>{@code scans}: one per scan of the command (one for {@code scan}, one per field and species
 *     for the safe-use map, alone or in a full suite; none in a suite without the map), each with
 *     {@code name}, {@code scan} (the settings, as in scan.json),
 *     {@code points} (the shard's points, as in scan.json but
 *     every value exact, counts included) and {@code failed} (null, or why the
 *     scan could not run).
 * </ul>
 *
 * @param tool    the build's tool object
 * @param shard   which part
 * @param command {@code scan}, {@code safe-use} or {@code suite}
 * @param options the result-relevant options
 * @param scans   the shard's part of each scan
 */
public record ShardFile(Map<String, Object> tool, Shard shard, String command, List<String> options, List<Part> scans) {

    /** Name of the file in a shard's folder. */
    public static final String FILE_NAME = "shard.json";

    /**
     * One scan's part of a shard.
     *
     * @param name     the scan's name ({@code <field>-<species>} in the safe-use map, the field for a scan)
     * @param settings the scan's settings
     * @param points   the shard's points of this scan, pitch-major then increasing ε
     * @param failed   null, or why the scan could not run
     */
    public record Part(String name, Map<String, Object> settings, List<ScanPoint> points, String failed) {}

    public void write(Path folder) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("tool", tool);
        Map<String, Object> s = new LinkedHashMap<>();
        s.put("index", shard.index());
        s.put("count", shard.count());
        root.put("shard", s);
        root.put("command", command);
        root.put("options", options);
        List<Object> parts = new ArrayList<>();
        for (Part p : scans) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", p.name());
            m.put("scan", p.settings());
            m.put("points", p.points().stream().map(q -> ScanJson.pointMap(q, true)).toList());
            m.put("failed", p.failed());
            parts.add(m);
        }
        root.put("scans", parts);
        AtomicFiles.write(folder.resolve(FILE_NAME), ScanJson.write(root));
    }

    /**
     * Reads a shard's file.
     *
     * @throws IllegalArgumentException naming the file and what is wrong with it
     */
    @SuppressWarnings("unchecked")
    public static ShardFile read(Path file) {
        JsonNode root = ScanJson.readFile(file, "merge: the shard results");
        try {
            Map<String, Object> tool = ScanJson.MAPPER.convertValue(need(root, "tool", JsonNode::isObject), Map.class);
            JsonNode s = need(root, "shard", JsonNode::isObject);
            Shard shard = new Shard(need(s, "index", JsonNode::isInt).asInt(), need(s, "count", JsonNode::isInt).asInt());
            String command = need(root, "command", JsonNode::isTextual).asText();
            List<String> options = new ArrayList<>();
            for (JsonNode o : need(root, "options", JsonNode::isArray)) {
                options.add(o.asText());
            }
            List<Part> parts = new ArrayList<>();
            for (JsonNode p : need(root, "scans", JsonNode::isArray)) {
                List<ScanPoint> points = new ArrayList<>();
                JsonNode pts = need(p, "points", JsonNode::isArray);
                for (int i = 0; i < pts.size(); i++) {
                    try {
                        points.add(ScanJson.readCheckedPoint(pts.get(i), null, null, java.util.Set.of()));
                    } catch (IllegalArgumentException e) {
                        throw new IllegalArgumentException("point " + (i + 1) + " of " + pts.size() + " " + e.getMessage());
                    }
                }
                JsonNode failed = p.get("failed");
                parts.add(new Part(need(p, "name", JsonNode::isTextual).asText(),
                        ScanJson.MAPPER.convertValue(need(p, "scan", JsonNode::isObject), LinkedHashMap.class), points,
                        failed == null || failed.isNull() ? null : failed.asText()));
            }
            return new ShardFile(tool, shard, command, options, parts);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("merge: the shard results " + file + " are damaged: " + e.getMessage()
                    + "; run that shard again");
        }
    }

    private static JsonNode need(JsonNode n, String key, java.util.function.Predicate<JsonNode> type) {
        JsonNode v = n.get(key);
        if (v == null || !type.test(v)) {
            throw new IllegalArgumentException("'" + key + "' is " + ScanJson.kind(v) + ", not what a shard file holds there");
        }
        return v;
    }
}
