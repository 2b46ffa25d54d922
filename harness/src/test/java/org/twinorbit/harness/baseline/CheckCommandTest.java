package org.twinorbit.harness.baseline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;
import org.twinorbit.harness.verdict.PerturbableBorisPusher;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** {@code baseline} then {@code check}: passes unchanged, fails on a perturbed pusher, refuses bad input. */
class CheckCommandTest {

    /** A short gradient-drift case: a few hundred steps per orbit, every metric of a drift defined. */
    private static final String[] CASE = {"run", "--field", "gradient", "--eps", "0.05", "--pitch", "60",
        "--duration", "5", "--phases", "2", "--pushers", "test-boris-perturbable,boris", "--gc-integrators", "gc-rk4"};

    @TempDir
    Path tmp;

    private Path baseline(String... command) {
        Path file = tmp.resolve("baseline.json");
        String[] args = new String[command.length + 2];
        args[0] = "baseline";
        args[1] = file.toString();
        System.arraycopy(command, 0, args, 2, command.length);
        TestCommandLine.succeeded(args);
        return file;
    }

    /**
     * Source: derived — results are identical for any thread count (README), so a check on the
     * build that wrote the baseline finds no difference at all, with 1 or 2 threads, from a
     * baseline written with the other count.
     */
    @Test
    void sameBuildPassesWithNoDifferenceForOneAndTwoThreads() throws Exception {
        String[] withThreads = java.util.Arrays.copyOf(CASE, CASE.length + 2);
        withThreads[CASE.length] = "--threads";
        withThreads[CASE.length + 1] = "1";
        Path b = baseline(withThreads);
        for (String threads : new String[] {"1", "2"}) {
            Path json = tmp.resolve("check-" + threads + ".json");
            TestCommandLine.Outcome o = TestCommandLine.exec("check", b.toString(), "--threads", threads,
                    "--json", json.toString());
            assertEquals(0, o.code(), o.out() + o.err());
            JsonNode c = new ObjectMapper().readTree(json.toFile());
            assertEquals("pass", c.get("result").asText());
            assertEquals(0, c.get("differences").size(), c.get("differences").toString());
            assertEquals(4, c.get("counts").get("rows").asInt()); // 2 pushers, gc-rk4, the model row
            assertTrue(o.out().contains("No differences."), o.out());
        }
    }

    /**
     * Source: derived — a rotation factor off by 1e-6 changes |u| every step, so the pusher's
     * energy error grows far beyond its round-off floor: a regression (exit 1) in the row of that
     * pusher only. The JUnit XML must parse with the JDK's standard XML parser and name the
     * failing metric with both values (JUnit XML layout: testsuites/testsuite/testcase/failure).
     */
    @Test
    void perturbedPusherFailsWithJunitNamingTheMetric() throws Exception {
        Path b = baseline(CASE);
        Path junit = tmp.resolve("out/junit.xml");
        TestCommandLine.Outcome o;
        System.setProperty(PerturbableBorisPusher.PROPERTY, "1e-6");
        try {
            o = TestCommandLine.exec("check", b.toString(), "--junit", junit.toString());
        } finally {
            System.clearProperty(PerturbableBorisPusher.PROPERTY);
        }
        assertEquals(1, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("FAIL") && o.out().contains("| test-boris-perturbable | FAIL |"), o.out());
        Document doc = DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(junit.toFile());
        assertEquals("testsuites", doc.getDocumentElement().getTagName());
        NodeList cases = doc.getElementsByTagName("testcase");
        assertEquals(4, cases.getLength());
        Element perturbed = null;
        for (int i = 0; i < cases.getLength(); i++) {
            Element tc = (Element) cases.item(i);
            boolean failed = tc.getElementsByTagName("failure").getLength() > 0;
            if (tc.getAttribute("name").equals("test-boris-perturbable")) {
                perturbed = tc;
                assertTrue(failed, "the perturbed pusher's test case fails");
            } else {
                assertFalse(failed, tc.getAttribute("name") + " is unchanged");
            }
        }
        assertNotNull(perturbed);
        Element failure = (Element) perturbed.getElementsByTagName("failure").item(0);
        assertTrue(failure.getTextContent().contains("energy_error.worst: "), failure.getTextContent());
        assertTrue(failure.getAttribute("message").contains(" -> ") && failure.getAttribute("message").contains("tolerance rel"),
                failure.getAttribute("message"));
        assertEquals("1", doc.getDocumentElement().getAttribute("failures"));
    }

    /** Source: derived — the file format is versioned; another version is bad input (exit 2), with no stack trace. */
    @Test
    void wrongSchemaVersionIsBadInput() throws Exception {
        Path b = baseline(CASE);
        ObjectMapper m = new ObjectMapper();
        ObjectNode doc = (ObjectNode) m.readTree(b.toFile());
        doc.put("schema_version", Baseline.SCHEMA_VERSION + 1);
        Files.writeString(b, m.writeValueAsString(doc));
        TestCommandLine.Outcome o = TestCommandLine.exec("check", b.toString());
        assertEquals(2, o.code(), o.err());
        assertTrue(o.err().contains("schema_version " + (Baseline.SCHEMA_VERSION + 1)), o.err());
        assertFalse(o.err().contains("\tat "), "no stack trace: " + o.err());
    }

    /** Source: derived — a missing or corrupt baseline, an unknown metric, an unwritable output: exit 2 naming the cause. */
    @Test
    void badInputGivesExitTwoWithTheCause() throws Exception {
        TestCommandLine.Outcome missing = TestCommandLine.exec("check", tmp.resolve("none.json").toString());
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("no such file"), missing.err());

        Path corrupt = tmp.resolve("corrupt.json");
        Files.writeString(corrupt, "{\"schema\": \"twinorbit-baseline\", ");
        TestCommandLine.Outcome bad = TestCommandLine.exec("check", corrupt.toString());
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("not valid JSON"), bad.err());

        Path b = baseline(CASE);
        Path tolerances = tmp.resolve("tol.yaml");
        Files.writeString(tolerances, "metrics:\n  drift_eror: {relative: 1e-6}\n");
        TestCommandLine.Outcome unknown = TestCommandLine.exec("check", b.toString(), "--tolerances", tolerances.toString());
        assertEquals(2, unknown.code());
        assertTrue(unknown.err().contains("unknown metric 'drift_eror'") && unknown.err().contains("drift_error"),
                unknown.err());

        TestCommandLine.Outcome unknownCase = TestCommandLine.exec("check", b.toString(), "--tolerance",
                "no-such-case:drift_error=1e-3");
        assertEquals(2, unknownCase.code());
        assertTrue(unknownCase.err().contains("no case 'no-such-case'"), unknownCase.err());

        Path blocker = tmp.resolve("file");
        Files.writeString(blocker, "");
        TestCommandLine.Outcome unwritable = TestCommandLine.exec("check", b.toString(), "--junit",
                blocker.resolve("junit.xml").toString());
        assertEquals(2, unwritable.code());
        assertTrue(unwritable.err().contains("--junit"), unwritable.err());
        for (TestCommandLine.Outcome o : new TestCommandLine.Outcome[] {missing, bad, unknown, unknownCase, unwritable}) {
            assertFalse(o.err().contains("\tat "), "no stack trace: " + o.err());
        }
    }

    /**
     * Source: derived — a tolerance wider than a change removes it from the differences; a
     * case's entry beats a metric's. Without the file, the same perturbation lists energy_error.
     */
    @Test
    void perCaseToleranceBeatsPerMetric() throws Exception {
        Path b = baseline(CASE);
        Path tolerances = tmp.resolve("tol.yaml");
        Files.writeString(tolerances, "metrics:\n  energy_error: {relative: 1.0e-9}\n"
                + "cases:\n  gradient-proton:\n    energy_error: {relative: 1.0e3, absolute: 1.0}\n");
        JsonNode plain = perturbedCheck(b);
        JsonNode widened = perturbedCheck(b, "--tolerances", tolerances.toString());
        assertTrue(plain.toString().contains("\"energy_error.worst\""), plain.toString());
        assertFalse(widened.toString().contains("\"energy_error."), widened.toString());
        assertTrue(widened.toString().contains("\"invariant_error."), "other metrics still fail: " + widened);
    }

    /** The differences of a check with the pusher perturbed by 1e-6. */
    private JsonNode perturbedCheck(Path b, String... options) throws Exception {
        Path json = tmp.resolve("perturbed.json");
        String[] args = new String[options.length + 4];
        args[0] = "check";
        args[1] = b.toString();
        args[2] = "--json";
        args[3] = json.toString();
        System.arraycopy(options, 0, args, 4, options.length);
        System.setProperty(PerturbableBorisPusher.PROPERTY, "1e-6");
        try {
            TestCommandLine.Outcome o = TestCommandLine.exec(args);
            assertEquals(1, o.code(), o.out() + o.err());
        } finally {
            System.clearProperty(PerturbableBorisPusher.PROPERTY);
        }
        return new ObjectMapper().readTree(json.toFile()).get("differences");
    }
}
