package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * The field library as users see it: names, parameters, and refusals of bad input. The defaults
 * checked are the project's own scenarios as tabled in docs/design.md (not physical constants);
 * the one physics limit, E0 < c B0 in the crossed field (an E×B drift slower than light), is a
 * textbook fact (Jackson, Classical Electrodynamics, 3rd ed., 1999, §12.3).
 */
class FieldRegistryTest {

    private static final Species P = Species.PROTON;

    @Test
    void everyBuiltInFieldIsListedInOrderThenUserFields() {
        List<String> names = Fields.all().stream().map(FieldProvider::name).toList();
        assertEquals(List.of("uniform", "crossed", "gradient", "toroidal", "mirror", "dipole", "tokamak", "solovev",
                "current-sheet", "shear", "ramp", "wave", "test-along-x"), names);
        for (FieldProvider p : Fields.all()) {
            Field f = Fields.create(p.name(), P);
            assertEquals(p.name(), f.name(), "provider and field disagree on the name");
        }
    }

    @Test
    void aFieldOnTheTestClassPathIsFoundByName() {
        Field f = Fields.create("test-along-x", Map.of("Bx", 0.25), P);
        FieldSample s = new FieldSample();
        f.evaluate(0, 1, 2, 3, s);
        assertEquals(0.25, s.bx);
        assertEquals(0.0, s.bz);
    }

    @Test
    void unknownFieldListsTheKnownOnes() {
        FieldParameterException e = assertThrows(FieldParameterException.class,
                () -> Fields.create("mirorr", P));
        assertTrue(e.getMessage().contains("'mirorr'"), e.getMessage());
        assertTrue(e.getMessage().contains("mirror") && e.getMessage().contains("current-sheet"), e.getMessage());
    }

    @Test
    void unknownParameterListsTheValidOnes() {
        FieldParameterException e = assertThrows(FieldParameterException.class,
                () -> Fields.create("mirror", Map.of("Bz", 1.0), P));
        String m = e.getMessage();
        assertTrue(m.contains("'Bz'") && m.contains("B0") && m.contains("Rm") && m.contains("Lm"), m);
    }

    /** One out-of-range value per kind of rule; each message names the parameter and what is allowed. */
    @Test
    void valuesOutOfRangeAreRefusedWithTheAllowedRange() {
        assertRefused("mirror", Map.of("Rm", 1.0), "'Rm'", "> 1");
        assertRefused("gradient", Map.of("Lg", -1.0), "'Lg'", "> 0");
        assertRefused("tokamak", Map.of("qa", 0.0), "'qa'", "> 0");
        assertRefused("tokamak", Map.of("q0", Double.NaN), "'q0'", "> 0");
        assertRefused("dipole", Map.of("lshell", 0.9), "'lshell'", "> 1");
        assertRefused("current-sheet", Map.of("delta", 0.0), "'delta'", "> 0");
        assertRefused("ramp", Map.of("tau_periods", -5.0), "'tau_periods'", "> 0");
        assertRefused("crossed", Map.of("E0", Double.POSITIVE_INFINITY), "'E0'", "finite");
    }

    /** Rules that tie two parameters together are checked when the field is built. */
    @Test
    void crossParameterRulesAreRefused() {
        assertRefused("tokamak", Map.of("a", 1.5), "'a'", "< R0");
        assertRefused("crossed", Map.of("E0", 3.1e8, "B0", 1.0), "'E0'", "c B0");
        assertRefused("wave", Map.of("omega_ratio", 1.0), "'omega_ratio'", "not within 0.001 of 1");
    }

    private static void assertRefused(String field, Map<String, Double> overrides, String name, String allowed) {
        FieldParameterException e = assertThrows(FieldParameterException.class,
                () -> Fields.create(field, overrides, P));
        assertTrue(e.getMessage().contains(name) && e.getMessage().contains(allowed),
                field + " " + overrides + ": " + e.getMessage());
    }

    @Test
    void defaultsAreTheDocumentedOnes() {
        assertEquals(Map.of("B_s", 3.0e-5, "R_p", 6.4e6, "lshell", 4.0),
                Fields.check(Fields.provider("dipole"), Map.of()).asMap());
        assertEquals(Map.of("R0", 1.5, "a", 0.5, "B0", 2.0, "q0", 1.1, "qa", 3.5),
                Fields.check(Fields.provider("tokamak"), Map.of()).asMap());
        assertEquals(Map.of("B0", 20e-9, "Bn", 2e-9, "delta", 6.4e6),
                Fields.check(Fields.provider("current-sheet"), Map.of()).asMap());
        assertEquals(Map.of("B0", 1.0, "E0", 1e3, "omega_ratio", 0.05),
                Fields.check(Fields.provider("wave"), Map.of()).asMap());
    }
}
