package org.twinorbit.fields;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/** Checked parameter values of one field, every parameter present (defaults filled in). */
public final class FieldParameters {

    private final Map<String, Double> values;

    FieldParameters(Map<String, Double> values) {
        this.values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    /** The value of a declared parameter, in the unit of its {@link ParameterSpec}. */
    public double get(String name) {
        Double v = values.get(name);
        if (v == null) {
            throw new IllegalStateException("parameter '" + name + "' was not declared");
        }
        return v;
    }

    public Map<String, Double> asMap() {
        return values;
    }
}
