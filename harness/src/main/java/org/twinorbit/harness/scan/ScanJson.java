package org.twinorbit.harness.scan;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.twinorbit.harness.report.ToolInfo;

/**
 * The JSON form of a scan (scan.json), the documented contract:
 * <ul>
 * <li>{@code tool}: name, version and git commit of the build that wrote the file
 *     ({@link org.twinorbit.harness.report.ToolInfo});
 * <li>{@code scan}: the settings (field, parameters, species, axis, ε range, ensemble, duration;
 *     {@code l_m} is the field's length L where ε is ρ0/L); the keys of {@code parameters} are
 *     the field's parameter names as {@code -P} takes them (e.g. {@code Rm}), every other key is
 *     lower-case snake_case;
 * <li>{@code points}: one object per ε and pitch angle with {@code eps}, {@code energy_ev},
 *     {@code pitch_deg}, with {@code --charge-signs both} {@code charge_sign} (1: the species as
 *     given, -1: its twin of charge -q; absent otherwise), for each metric {@code <metric>_mean} (phase mean of the signed error),
 *     {@code <metric>_rms} (rms over phases) and {@code <metric>_worst} (largest magnitude) over
 *     the gyrophase ensemble ({@code mu_jump}, {@code mu_change}, {@code drift_error},
 *     {@code position_error_rho}, {@code bounce_period_error}, {@code class_change}), then
 *     {@code kappa} (current sheets), {@code point_failed} (1 when the particles could not be
 *     placed), {@code lost} (1 when both models lost the particle in every phase, as in a loss
 *     cone), {@code no_bounce} (1 when a bounce-counted point did not bounce and ran one sheet
 *     crossing or 50 gyroperiods instead), {@code full_orbit_reference_error_rho} and
 *     {@code guiding_center_reference_error_rho} (each reference against itself at a 100×
 *     tighter tolerance), {@code full_orbit_evaluations} and {@code guiding_center_evaluations}
 *     (per orbit), and with {@code --integrators} {@code <integrator>_<metric>_worst} for
 *     mu_change, energy_error and position_error_rho (hyphens of the name as underscores);
 * <li>{@code thresholds}: one per metric, tolerance and pitch angle (and charge sign) with {@code metric},
 *     {@code tolerance}, {@code pitch_deg}, {@code charge_sign} (as for points), {@code eps_star}, {@code energy_ev_star},
 *     {@code outcome} ({@code crossed}, {@code not-reached}, {@code exceeded-at-start},
 *     {@code exceeded-once-measured}: not measurable at the smallest eps and beyond tolerance where
 *     first measured, {@code no-data}, {@code lost}: every point of that pitch lost by both models, {@code lost-above}: within
 *     tolerance wherever the particle stays, lost by both models from eps_star on), plus {@code kappa_star} for current sheets.
 * </ul>
 * Counts are JSON integers: the flags {@code point_failed}, {@code lost} and {@code no_bounce}
 * (0 or 1), and {@code full_orbit_evaluations} and {@code guiding_center_evaluations}, which are
 * the mean over the gyrophase ensemble rounded to the nearest integer ({@link #COUNTS}).
 * A value that was not measured is {@code null}; an orbit that failed makes a worst case
 * {@code "inf"}. Other numbers are written in their shortest exact form, so they read back unchanged.
 */
public final class ScanJson {

    static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    /** The key of a point's and a threshold's charge sign, present only in a scan of both signs. */
    static final String CHARGE_SIGN = "charge_sign";

    /** The keys of a point that are counts, written as integers. */
    static final Set<String> COUNTS = Set.of("point_failed", "lost", "no_bounce", "full_orbit_evaluations",
            "guiding_center_evaluations");

    private ScanJson() {}

    /** The whole scan as JSON text. */
    public static String toJson(ScanResult r) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("tool", ToolInfo.json());
        root.put("scan", r.settings());
        List<Object> points = new ArrayList<>();
        for (ScanPoint p : r.points()) {
            points.add(pointMap(p));
        }
        root.put("points", points);
        List<Object> thresholds = new ArrayList<>();
        for (Threshold t : r.thresholds()) {
            thresholds.add(thresholdMap(t, r.axis()));
        }
        root.put("thresholds", thresholds);
        return write(root);
    }

    static String write(Object tree) {
        try {
            return MAPPER.writeValueAsString(tree) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /** One point as an ordered map ready for Jackson, counts rounded as scan.json has them. */
    static Map<String, Object> pointMap(ScanPoint p) {
        return pointMap(p, false);
    }

    /**
     * One point as an ordered map, every value exact when {@code exact}: the form of the partial
     * and shard files, read back into the very values an uninterrupted run holds (a count that is
     * a mean over the phases, such as 7974.5, would otherwise come back rounded and print
     * differently in scan.md).
     */
    static Map<String, Object> pointMap(ScanPoint p, boolean exact) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("eps", p.eps());
        m.put("energy_ev", p.energyEv());
        m.put("pitch_deg", p.pitchDeg());
        if (p.chargeSign() != ChargeSigns.GIVEN) {
            m.put(CHARGE_SIGN, p.chargeSign());
        }
        for (Map.Entry<String, Double> e : p.values().entrySet()) {
            m.put(e.getKey(), COUNTS.contains(e.getKey()) && !exact ? count(e.getValue()) : number(e.getValue()));
        }
        return m;
    }

    /**
     * Reads back a point written by {@link #pointMap} and checks it: an object whose {@code eps},
     * {@code energy_ev} and {@code pitch_deg} are finite numbers, {@code eps} and {@code pitch_deg} among {@code eps}
     * and {@code pitches} (unless null), every other value a number, null, "inf" or "-inf", and
     * every key of {@code required} present.
     *
     * @throws IllegalArgumentException saying what is wrong, worded to follow "point N"
     */
    static ScanPoint readCheckedPoint(JsonNode n, double[] eps, List<Double> pitches, Set<String> required) {
        return readCheckedPoint(n, eps, pitches, null, required);
    }

    /**
     * As {@link #readCheckedPoint(JsonNode, double[], List, Set)}, with the point's
     * {@code charge_sign} (absent: {@link ChargeSigns#GIVEN}) among {@code signs} (unless null).
     */
    static ScanPoint readCheckedPoint(JsonNode n, double[] eps, List<Double> pitches, List<Integer> signs,
                                      Set<String> required) {
        if (n == null || !n.isObject()) {
            throw new IllegalArgumentException("is " + kind(n) + ", not an object");
        }
        double e = coordinate(n, "eps");
        double w = coordinate(n, "energy_ev");
        double pitch = coordinate(n, "pitch_deg");
        if (eps != null && java.util.Arrays.stream(eps).noneMatch(x -> x == e)) {
            throw new IllegalArgumentException("has eps " + e + ", which is not on the scan's grid");
        }
        if (pitches != null && !pitches.contains(pitch)) {
            throw new IllegalArgumentException("has pitch_deg " + pitch + ", which is not one of the scan's " + pitches);
        }
        JsonNode s = n.get(CHARGE_SIGN);
        if (s != null && !(s.isInt() && (s.asInt() == 1 || s.asInt() == -1))) {
            throw new IllegalArgumentException("has '" + CHARGE_SIGN + "' = " + s + ", not 1 or -1");
        }
        int sign = s == null ? ChargeSigns.GIVEN : s.asInt();
        if (signs != null && !signs.contains(sign)) {
            throw new IllegalArgumentException(sign == ChargeSigns.GIVEN ? "has no '" + CHARGE_SIGN
                    + "', which a scan of both charge signs needs" : "has '" + CHARGE_SIGN + "' = " + sign
                    + ", but the scan does not scan charge signs");
        }
        for (String k : required) {
            if (!n.has(k)) {
                throw new IllegalArgumentException("(eps " + e + ", pitch " + pitch + " deg) has no '" + k
                        + "', a metric the scan's thresholds read");
            }
        }
        Map<String, Double> values = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = n.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> entry = it.next();
            String k = entry.getKey();
            if (!k.equals("eps") && !k.equals("energy_ev") && !k.equals("pitch_deg") && !k.equals(CHARGE_SIGN)) {
                JsonNode v = entry.getValue();
                if (!(v.isNumber() || v.isNull() || v.isTextual() && (v.asText().equals("inf") || v.asText().equals("-inf")))) {
                    throw new IllegalArgumentException("(eps " + e + ", pitch " + pitch + " deg) has '" + k + "' = " + v
                            + ": not a number, null, \"inf\" or \"-inf\"");
                }
                values.put(k, readNumber(v));
            }
        }
        return new ScanPoint(e, w, pitch, values, sign);
    }

    /** What a JSON value is, for messages: "an object", "an array", "a string", ..., "missing". */
    static String kind(JsonNode n) {
        if (n == null || n.isMissingNode()) {
            return "missing";
        }
        return switch (n.getNodeType()) {
            case OBJECT, POJO -> "an object";
            case ARRAY -> "an array";
            case STRING -> "a string";
            case NUMBER -> "a number";
            case BOOLEAN -> "a boolean";
            case NULL -> "null";
            default -> "a " + n.getNodeType().toString().toLowerCase(java.util.Locale.ROOT);
        };
    }

    private static double coordinate(JsonNode n, String key) {
        JsonNode v = n.get(key);
        if (v == null) {
            throw new IllegalArgumentException("has no '" + key + "'");
        }
        if (!v.isNumber() || !Double.isFinite(v.asDouble())) {
            throw new IllegalArgumentException("has '" + key + "' = " + v + ", not a finite number");
        }
        return v.asDouble();
    }

    /**
     * Reads a JSON file that must hold an object.
     *
     * @param what the start of a message naming the file's role, e.g. "--resume: the partial results"
     * @throws IllegalArgumentException when the file cannot be read, is empty, is not JSON (with
     *         line and column) or does not hold an object
     */
    static JsonNode readFile(java.nio.file.Path file, String what) {
        String text;
        try {
            text = java.nio.file.Files.readString(file);
        } catch (java.io.IOException e) {
            throw new IllegalArgumentException(what + " " + file + " cannot be read (" + e.getMessage() + ")");
        }
        if (text.isBlank()) {
            throw new IllegalArgumentException(what + " " + file + " are an empty file: no settings, no points; "
                    + "delete it to start afresh");
        }
        JsonNode root;
        try {
            root = MAPPER.readTree(text);
        } catch (JsonProcessingException e) {
            com.fasterxml.jackson.core.JsonLocation at = e.getLocation();
            throw new IllegalArgumentException(what + " " + file + " are not valid JSON"
                    + (at == null ? "" : " at line " + at.getLineNr() + ", column " + at.getColumnNr())
                    + " (" + e.getOriginalMessage() + "; a truncated or edited file?); delete it to start afresh");
        }
        if (!root.isObject()) {
            throw new IllegalArgumentException(what + " " + file + " are damaged: the file holds "
                    + kind(root) + ", not a JSON object; "
                    + "delete it to start afresh");
        }
        return root;
    }

    static Map<String, Object> thresholdMap(Threshold t, ScanAxis axis) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("metric", t.metric().key());
        m.put("tolerance", t.tolerance());
        m.put("statistic", t.statistic().key());
        m.put("pitch_deg", t.pitchDeg());
        if (t.chargeSign() != ChargeSigns.GIVEN) {
            m.put(CHARGE_SIGN, t.chargeSign());
        }
        m.put("eps_star", number(t.epsStar()));
        m.put("energy_ev_star", number(t.energyEvStar()));
        if (axis.derivedName() != null) {
            m.put(axis.derivedName() + "_star", t.outcome().hasEpsStar()
                    ? number(axis.derived().applyAsDouble(t.epsStar())) : null);
        }
        m.put("outcome", t.outcome().label());
        return m;
    }

    /** NaN as null, ±∞ as the strings "inf"/"-inf", finite values as numbers. */
    static Object number(double v) {
        if (Double.isNaN(v)) {
            return null;
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "inf" : "-inf";
        }
        return v;
    }

    /** A count rounded to the nearest integer; NaN (not counted) as null. */
    static Object count(double v) {
        return Double.isFinite(v) ? (Object) Math.round(v) : number(v);
    }

    static double readNumber(JsonNode n) {
        if (n == null || n.isNull()) {
            return Double.NaN;
        }
        if (n.isTextual()) {
            return switch (n.asText()) {
                case "inf" -> Double.POSITIVE_INFINITY;
                case "-inf" -> Double.NEGATIVE_INFINITY;
                default -> throw new IllegalArgumentException("not a number: '" + n.asText() + "'");
            };
        }
        return n.asDouble();
    }
}
