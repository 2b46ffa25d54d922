package org.twinorbit.fields;

import java.util.function.DoublePredicate;

/**
 * One named parameter of a field.
 *
 * @param name         the name users type (e.g. {@code Rm})
 * @param defaultValue the default, in {@code unit}
 * @param unit         SI unit, or "1" for a pure number
 * @param description  one line
 * @param allowed      text of the allowed range (e.g. "> 1")
 * @param check        true for an allowed value
 */
public record ParameterSpec(String name, double defaultValue, String unit, String description,
                            String allowed, DoublePredicate check) {

    /** A parameter that must be finite and strictly positive. */
    public static ParameterSpec positive(String name, double def, String unit, String description) {
        return new ParameterSpec(name, def, unit, description, "> 0", v -> v > 0 && Double.isFinite(v));
    }

    /** A parameter that may take any finite value. */
    public static ParameterSpec any(String name, double def, String unit, String description) {
        return new ParameterSpec(name, def, unit, description, "any finite number", Double::isFinite);
    }

    /** A parameter that must be finite and strictly greater than {@code min}. */
    public static ParameterSpec above(String name, double def, String unit, String description, double min) {
        return new ParameterSpec(name, def, unit, description, "> " + trim(min),
                v -> v > min && Double.isFinite(v));
    }

    static String trim(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
