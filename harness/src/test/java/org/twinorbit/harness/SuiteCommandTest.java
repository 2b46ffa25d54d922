package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.fields.FieldProvider;
import org.twinorbit.fields.Fields;

/** {@code suite --quick} covers every field and writes the report files the README shows. */
class SuiteCommandTest {

    @TempDir
    Path tmp;

    @Test
    void quickSuiteWritesEveryFileAndCoversEveryField() throws IOException {
        // the built-in pushers only: the test class path also registers deliberately broken ones
        String builtIn = String.join(",", org.twinorbit.harness.run.Registry.pusherNames().stream()
                .filter(n -> !n.startsWith("test-")).toList());
        TestCommandLine.Outcome o = TestCommandLine.exec("suite", "--quick", "--quiet", "--pushers", builtIn,
                "--out", tmp.toString());
        assertEquals(0, o.code(), o.err());
        for (String f : new String[] {"validation.md", "validation.csv", "validation.json"}) {
            assertTrue(Files.size(tmp.resolve(f)) > 0, f);
        }
        JsonNode doc = new ObjectMapper().readTree(tmp.resolve("validation.json").toFile());
        assertEquals("quick", doc.get("suite").asText());
        Set<String> fields = new HashSet<>();
        for (JsonNode c : doc.get("cases")) {
            fields.add(c.get("case").get("field").asText());
            assertTrue(c.get("case").has("eps") && c.get("case").has("rho_m") && c.get("case").has("l_m")
                    && c.get("case").has("gyro_period_s"));
            boolean model = false;
            for (JsonNode r : c.get("results")) {
                model |= r.get("error_kind").asText().equals("model");
                assertTrue(r.has("mu_change") && r.has("position_error_rho") && r.has("status"));
            }
            assertTrue(model, "a model row in " + c.get("case").get("name"));
            assertTrue(c.get("reference").has("full_orbit") && c.get("reference").has("guiding_center"));
        }
        for (FieldProvider p : Fields.all()) {
            if (p.name().startsWith("test-")) {
                continue; // registered from the test class path only
            }
            assertTrue(fields.contains(p.name()), "suite covers field " + p.name());
            assertTrue(Files.exists(tmp.resolve("plots")), "plots directory");
        }
        try (var s = Files.list(tmp.resolve("plots"))) {
            long library = Fields.all().stream().filter(p -> !p.name().startsWith("test-")).count();
            assertEquals(4 * library, s.filter(p -> p.toString().endsWith(".png")).count());
        }
        assertTrue(o.out().contains("cases in"), o.out());
        assertTrue(o.out().contains("verdicts: ") && o.out().contains(" rows pass"), o.out());
    }
}
