package org.twinorbit.harness;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Walks a JSON document for keys that break the contract's naming rule. */
public final class JsonKeys {

    /** Objects keyed by data (parameter names as -P takes them, field names), not by contract names. */
    private static final Set<String> DATA_KEYED = Set.of("field_parameters", "parameters", "not_scanned");

    private JsonKeys() {}

    /** Every key, at any depth, that is not lower-case snake_case, with its path. */
    public static List<String> notSnakeCase(JsonNode n) {
        List<String> bad = new java.util.ArrayList<>();
        walk(n, "", bad);
        return bad;
    }

    private static void walk(JsonNode n, String path, List<String> bad) {
        if (n.isArray()) {
            for (JsonNode c : n) {
                walk(c, path + "[]", bad);
            }
        } else if (n.isObject()) {
            for (Iterator<Map.Entry<String, JsonNode>> it = n.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                if (!e.getKey().matches("[a-z][a-z0-9_]*")) {
                    bad.add(path + "." + e.getKey());
                }
                if (!DATA_KEYED.contains(e.getKey())) {
                    walk(e.getValue(), path + "." + e.getKey(), bad);
                }
            }
        }
    }
}
