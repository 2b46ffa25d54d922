package org.twinorbit.harness;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Repeatable NAME=VALUE options (-P, --tolerance) read into a map, each name at most once: a
 * name given twice is refused rather than the last one silently winning.
 */
public final class OptionPairs {

    private OptionPairs() {}

    /** @throws BadInputException naming the option for a pair without '=' or a name given twice */
    public static Map<String, String> of(List<String> raw, String option) {
        Map<String, String> out = new LinkedHashMap<>();
        if (raw == null) {
            return out;
        }
        for (String pair : raw) {
            int eq = pair.indexOf('=');
            if (eq <= 0) {
                throw new BadInputException(option + ": '" + pair + "' is not NAME=VALUE");
            }
            String name = pair.substring(0, eq).trim();
            if (out.containsKey(name)) {
                throw new BadInputException(option + ": '" + name + "' is given twice (" + name + "=" + out.get(name)
                        + " and " + pair.trim() + "); give each once");
            }
            out.put(name, pair.substring(eq + 1).trim());
        }
        return out;
    }

    /** As {@link #of}, with numeric values. */
    public static Map<String, Double> numbers(List<String> raw, String option) {
        Map<String, Double> out = new LinkedHashMap<>();
        of(raw, option).forEach((k, v) -> {
            try {
                out.put(k, Double.parseDouble(v));
            } catch (NumberFormatException e) {
                throw new BadInputException(option + ": '" + k + "=" + v + "': the value is not a number");
            }
        });
        return out;
    }
}
