package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.Species;

/**
 * A kind of field in the library, discovered through {@link java.util.ServiceLoader}: list the
 * implementing class in {@code META-INF/services/org.twinorbit.fields.FieldProvider} of a jar on
 * the class path and it appears in {@code twinorbit fields}.
 */
public interface FieldProvider {

    /** Library name, lower case with hyphens (e.g. {@code current-sheet}). */
    String name();

    /** One line saying what the field is. */
    String description();

    /** The parameters with their defaults, units and allowed ranges. */
    List<ParameterSpec> parameters();

    /** What L is for this field, in words, for the listing. */
    String lengthMeaning();

    /** The invariants in words, for the listing (e.g. "energy; p_y = m u_y + q A_y"). */
    String invariantsMeaning();

    /**
     * Builds the field from parameter values already checked against {@link #parameters()}.
     *
     * @param p       every parameter, defaults filled in
     * @param species the particle of the case: fields whose time scale is given in gyroperiods
     *                (ramp, wave) need its charge and mass
     */
    Field create(FieldParameters p, Species species);
}
