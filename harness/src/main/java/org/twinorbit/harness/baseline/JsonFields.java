package org.twinorbit.harness.baseline;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.BadInputException;

/**
 * Reading a baseline's JSON tree with messages that say where it is wrong ("baseline FILE:
 * cases[3].phases: missing"), and the number convention both ways: NaN is {@code null}, ±∞ the
 * strings {@code "inf"}/{@code "-inf"}, finite values their shortest exact form (Jackson writes
 * {@link Double#toString}, which reads back to the same bits).
 */
final class JsonFields {

    private final String source;

    /** @param source names the file in messages */
    JsonFields(String source) {
        this.source = source;
    }

    BadInputException bad(String path, String problem) {
        return new BadInputException(source + ": " + path + ": " + problem);
    }

    JsonNode required(JsonNode parent, String key, String path) {
        JsonNode n = parent.get(key);
        if (n == null) {
            throw bad(path + key, "missing");
        }
        return n;
    }

    String text(JsonNode parent, String key, String path) {
        JsonNode n = required(parent, key, path);
        if (!n.isTextual()) {
            throw bad(path + key, "must be a string, got " + n);
        }
        return n.asText();
    }

    double number(JsonNode parent, String key, String path) {
        JsonNode n = required(parent, key, path);
        if (!n.isNumber()) {
            throw bad(path + key, "must be a number, got " + n);
        }
        return n.asDouble();
    }

    /** A number that may be null (returned as null). */
    Double optionalNumber(JsonNode parent, String key, String path) {
        JsonNode n = required(parent, key, path);
        if (n.isNull()) {
            return null;
        }
        if (!n.isNumber()) {
            throw bad(path + key, "must be a number or null, got " + n);
        }
        return n.asDouble();
    }

    int integer(JsonNode parent, String key, String path) {
        JsonNode n = required(parent, key, path);
        if (!n.canConvertToInt() || !n.isIntegralNumber()) {
            throw bad(path + key, "must be an integer, got " + n);
        }
        return n.asInt();
    }

    JsonNode array(JsonNode parent, String key, String path) {
        JsonNode n = required(parent, key, path);
        if (!n.isArray()) {
            throw bad(path + key, "must be an array, got " + n);
        }
        return n;
    }

    JsonNode object(JsonNode parent, String key, String path) {
        JsonNode n = required(parent, key, path);
        if (!n.isObject()) {
            throw bad(path + key, "must be an object, got " + n);
        }
        return n;
    }

    List<String> texts(JsonNode parent, String key, String path) {
        List<String> out = new ArrayList<>();
        for (JsonNode n : array(parent, key, path)) {
            if (!n.isTextual()) {
                throw bad(path + key, "must hold strings, got " + n);
            }
            out.add(n.asText());
        }
        return out;
    }

    List<Double> numbers(JsonNode parent, String key, String path) {
        List<Double> out = new ArrayList<>();
        for (JsonNode n : array(parent, key, path)) {
            if (!n.isNumber()) {
                throw bad(path + key, "must hold numbers, got " + n);
            }
            out.add(n.asDouble());
        }
        return out;
    }

    Map<String, Double> numberMap(JsonNode parent, String key, String path) {
        Map<String, Double> out = new LinkedHashMap<>();
        var it = object(parent, key, path).fields();
        while (it.hasNext()) {
            var e = it.next();
            out.put(e.getKey(), value(e.getValue(), path + key + "." + e.getKey()));
        }
        return out;
    }

    Map<String, String> textMap(JsonNode parent, String key, String path) {
        Map<String, String> out = new LinkedHashMap<>();
        var it = object(parent, key, path).fields();
        while (it.hasNext()) {
            var e = it.next();
            if (!e.getValue().isTextual()) {
                throw bad(path + key + "." + e.getKey(), "must be a string, got " + e.getValue());
            }
            out.put(e.getKey(), e.getValue().asText());
        }
        return out;
    }

    /** A stored value: a number, null (NaN), or "inf"/"-inf". */
    double value(JsonNode n, String path) {
        if (n.isNull()) {
            return Double.NaN;
        }
        if (n.isNumber()) {
            return n.asDouble();
        }
        if (n.isTextual() && n.asText().equals("inf")) {
            return Double.POSITIVE_INFINITY;
        }
        if (n.isTextual() && n.asText().equals("-inf")) {
            return Double.NEGATIVE_INFINITY;
        }
        throw bad(path, "must be a number, null, \"inf\" or \"-inf\", got " + n);
    }

    /** The JSON form of a stored value. */
    static Object write(double v) {
        if (Double.isNaN(v)) {
            return null;
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "inf" : "-inf";
        }
        return v;
    }
}
