package org.twinorbit.harness.baseline;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.BadInputException;

/**
 * A YAML file of tolerances:
 *
 * <pre>
 * metrics:                       # for every case
 *   drift_error: {relative: 1.0e-6}
 *   energy_error: {relative: 1.0e-9, absolute: 1.0e-12}
 * cases:                         # for one case, beating the entries above
 *   mirror-proton-eps0.05:
 *     bounce_period_error: {relative: 1.0e-3}
 * </pre>
 *
 * An entry that leaves out {@code relative} or {@code absolute} keeps the metric's default for it.
 * Unknown keys and unknown metrics are refused with the valid names.
 */
public final class ToleranceFile {

    private static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory());
    private static final String OPTION = "--tolerances";

    private ToleranceFile() {}

    /** Adds the file's entries to {@code into}. @throws BadInputException naming the file and the entry */
    public static void read(Path file, Tolerances into) {
        String text;
        try {
            text = Files.readString(file);
        } catch (NoSuchFileException e) {
            throw new BadInputException(OPTION + ": no such file " + file);
        } catch (IOException e) {
            throw new BadInputException(OPTION + ": cannot read " + file + ": " + e.getMessage());
        }
        JsonNode root;
        try {
            root = YAML.readTree(text);
        } catch (JsonProcessingException e) {
            throw new BadInputException(OPTION + " " + file + ": not valid YAML (line " + e.getLocation().getLineNr()
                    + "): " + e.getOriginalMessage());
        }
        String src = OPTION + " " + file;
        if (root == null || root.isMissingNode() || root.isNull()) {
            return; // an empty file changes nothing
        }
        if (!root.isObject()) {
            throw new BadInputException(src + ": must be a mapping with the keys metrics, cases");
        }
        for (Iterator<String> it = root.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!k.equals("metrics") && !k.equals("cases")) {
                throw new BadInputException(src + ": unknown key '" + k + "'; allowed keys: metrics, cases");
            }
        }
        if (root.has("metrics")) {
            entries(root.get("metrics"), src + ": metrics", (m, t) -> into.metric(m, t));
        }
        if (root.has("cases")) {
            JsonNode cases = root.get("cases");
            if (!cases.isObject()) {
                throw new BadInputException(src + ": cases: must map case names to metrics");
            }
            cases.fields().forEachRemaining(c -> entries(c.getValue(), src + ": cases." + c.getKey(),
                    (m, t) -> into.forCase(c.getKey(), m, t)));
        }
    }

    private static void entries(JsonNode node, String where, java.util.function.BiConsumer<Metric, Tolerance> put) {
        if (!node.isObject()) {
            throw new BadInputException(where + ": must map metric names to {relative, absolute}");
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            Metric m;
            try {
                m = Metric.ofKey(e.getKey(), where);
            } catch (IllegalArgumentException ex) {
                throw new BadInputException(ex.getMessage());
            }
            put.accept(m, tolerance(e.getValue(), m, where + "." + e.getKey()));
        }
    }

    private static Tolerance tolerance(JsonNode n, Metric m, String where) {
        if (!n.isObject()) {
            throw new BadInputException(where + ": must be {relative: R, absolute: A}");
        }
        double rel = m.defaultTolerance().relative();
        double abs = m.defaultTolerance().absolute();
        for (Iterator<Map.Entry<String, JsonNode>> it = n.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            if (!List.of("relative", "absolute").contains(e.getKey())) {
                throw new BadInputException(where + ": unknown key '" + e.getKey() + "'; allowed keys: relative, absolute");
            }
            double v = number(e.getValue(), where + "." + e.getKey());
            if (e.getKey().equals("relative")) {
                rel = v;
            } else {
                abs = v;
            }
        }
        try {
            return new Tolerance(rel, abs);
        } catch (IllegalArgumentException ex) {
            throw new BadInputException(where + ": " + ex.getMessage());
        }
    }

    /** A number; YAML 1.1 reads 1e-6 (no decimal point) as a string, so numeric strings count too. */
    private static double number(JsonNode n, String where) {
        if (n.isNumber()) {
            return n.asDouble();
        }
        if (n.isTextual()) {
            try {
                return Double.parseDouble(n.asText().trim());
            } catch (NumberFormatException ignored) {
                // the message below
            }
        }
        throw new BadInputException(where + ": must be a number, got " + n);
    }
}
