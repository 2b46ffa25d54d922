package org.twinorbit.harness.report;

import org.twinorbit.harness.TestCommandLine;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.JsonKeys;

/**
 * Every JSON output names the build that wrote it, writes counts as integers and spells every
 * key of the contract in lower-case snake_case.
 */
class JsonContractTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path tmp;

    /** A uniform-field run: it has the canonical angular momentum L_z among its invariants. */
    private static final String[] RUN = {"run", "--quiet", "--field", "uniform", "--energy", "1e4", "--pitch", "60",
        "--phases", "3", "--duration", "4", "--pushers", "boris,rk4"};

    private static String stdout(String... args) {
        return TestCommandLine.succeeded(args);
    }

    private static String[] with(String[] a, String... b) {
        String[] r = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, r, a.length, b.length);
        return r;
    }

    static void assertTool(JsonNode doc, String what) {
        JsonNode tool = doc.get("tool");
        assertTrue(tool != null && tool.isObject(), what + ": a tool object");
        assertEquals("twinorbit", tool.get("name").asText(), what);
        // the build hands the Maven project version to the tests (harness/pom.xml, surefire)
        assertEquals(System.getProperty("twinorbit.expected.version"), tool.get("version").asText(), what);
        assertTrue(tool.get("git_commit").asText().matches("[0-9a-f]{40}(-dirty)?|unknown"),
                what + ": git_commit " + tool.get("git_commit"));
    }

    private static void assertSnakeCase(JsonNode doc, String what) {
        List<String> bad = JsonKeys.notSnakeCase(doc);
        assertTrue(bad.isEmpty(), what + ": keys not in lower-case snake_case: " + bad);
    }

    /** The value is an integer or null (not counted), never a number with a fraction part. */
    private static void assertCount(JsonNode v, String what) {
        assertTrue(v != null && (v.isIntegralNumber() || v.isNull()), what + " is a count: " + v);
    }

    @Test
    void runJsonHasToolIntegerCountsAndSnakeCaseKeys() throws IOException {
        JsonNode doc = JSON.readTree(stdout(with(RUN, "--json")));
        assertTool(doc, "run --json");
        assertSnakeCase(doc, "run --json");
        assertTrue(doc.get("case").has("l_m"), "L as l_m");
        assertCount(doc.get("case").get("phases"), "phases");
        boolean invariant = false;
        for (JsonNode row : doc.get("results")) {
            assertCount(row.get("steps"), "steps");
            assertCount(row.get("field_evaluations"), "field_evaluations");
            invariant |= row.get("invariant_error").has("l_z");
        }
        assertTrue(invariant, "the uniform field's L_z appears as l_z");
        for (JsonNode ref : doc.get("reference")) {
            assertCount(ref.get("steps"), "reference steps");
            assertCount(ref.get("field_evaluations"), "reference field_evaluations");
            assertTrue(ref.get("field_evaluations").isIntegralNumber(), "a reference counts its evaluations");
        }
    }

    @Test
    void runJsonFileIsTheStdoutDocument() throws IOException {
        Path out = tmp.resolve("run");
        String printed = stdout(with(RUN, "--json", "--out", out.toString()));
        assertEquals(printed, java.nio.file.Files.readString(out.resolve("run.json")));
    }

    @Test
    void listingsHaveToolAndSnakeCaseKeys() throws IOException {
        for (String command : new String[] {"fields", "integrators"}) {
            JsonNode doc = JSON.readTree(stdout(command, "--json"));
            assertTool(doc, command + " --json");
            assertSnakeCase(doc, command + " --json");
        }
        JsonNode fields = JSON.readTree(stdout("fields", "--json")).get("fields");
        assertTrue(fields.get(0).has("l_m"), "fields --json names L l_m");
    }

    @Test
    void scanJsonHasToolIntegerCountsAndSnakeCaseKeys() throws IOException {
        Path out = tmp.resolve("scan");
        stdout("scan", "--quiet", "--field", "gradient", "--points", "2", "--phases", "2", "--out", out.toString());
        JsonNode doc = JSON.readTree(out.resolve("scan.json").toFile());
        assertTool(doc, "scan.json");
        assertSnakeCase(doc, "scan.json");
        assertTrue(doc.get("scan").has("l_m"), "L as l_m");
        for (JsonNode p : doc.get("points")) {
            for (String k : List.of("point_failed", "lost", "no_bounce", "full_orbit_evaluations",
                    "guiding_center_evaluations")) {
                assertTrue(p.get(k).isIntegralNumber(), k + " is an integer: " + p.get(k));
            }
        }
        List<String> csv = java.nio.file.Files.readAllLines(out.resolve("scan.csv"));
        List<String> header = List.of(csv.get(0).split(","));
        String[] cells = csv.get(1).split(",", -1);
        for (String k : List.of("point_failed", "lost", "no_bounce", "full_orbit_evaluations",
                "guiding_center_evaluations")) {
            assertTrue(cells[header.indexOf(k)].matches("[0-9]+"), k + " is an integer in scan.csv: " + csv.get(1));
        }
    }

    @Test
    void keyCheckFindsUpperCaseKeysOutsideDataMaps() {
        JsonNode bad = JSON.valueToTree(Map.of("case", Map.of("L_m", 1, "field_parameters", Map.of("B0", 2))));
        assertEquals(List.of(".case.L_m"), JsonKeys.notSnakeCase(bad));
    }
}
