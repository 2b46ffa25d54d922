package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A G-EQDSK equilibrium end to end: {@code geqdsk} writes the Solov'ev tokamak, {@code run --field
 * geqdsk:FILE} runs deuterons in it, and every file of the malformed corpus is refused with exit
 * code 2 and its line named (common practice for input errors).
 */
class GeqdskRunTest {

    @TempDir
    Path tmp;

    private static final Path CORPUS = Path.of("..", "fields", "src", "test", "resources", "geqdsk-malformed");

    @Test
    void aWrittenEquilibriumRunsLikeTheAnalyticOne() throws IOException {
        Path file = tmp.resolve("solovev.geqdsk");
        String wrote = TestCommandLine.succeeded("geqdsk", "--nodes", "65,65", "--out", file.toString());
        assertTrue(wrote.contains("use it as --field geqdsk:"), wrote);
        String[] common = {"--species", "deuteron", "--energy", "2e4", "--pitch", "70", "--duration", "5",
            "--pushers", "boris", "--gc-integrators", "none", "--phases", "2", "--quiet", "--json"};
        ObjectMapper json = new ObjectMapper();
        JsonNode g = json.readTree(TestCommandLine.succeeded(concat(new String[] {"run", "--field", "geqdsk:" + file}, common)));
        JsonNode a = json.readTree(TestCommandLine.succeeded(concat(new String[] {"run", "--field", "solovev"}, common)));
        // the same start (halfway from the axis to the outer boundary), L = R0 and |B| there to the
        // spline's 65-node error (3e-8 relative, GeqdskFieldTest): the same eps
        assertEquals(a.get("case").get("l_m").asDouble(), g.get("case").get("l_m").asDouble(), 1e-12);
        assertEquals(a.get("case").get("eps").asDouble(), g.get("case").get("eps").asDouble(),
                1e-6 * a.get("case").get("eps").asDouble());
    }

    /**
     * The limiter is the wall: a 100 keV deuteron whose guiding center starts 2 cm inside the wall
     * on the outer midplane (the demo's wall is at R = 2.25 m there, 5 cm outside the boundary at
     * 2.2 m) gyrates out to R_gc + ρ0 ≈ 2.26 m (ρ0 = 3.2 cm, derived) and is lost within its first
     * gyration.
     */
    @Test
    void aParticleCrossingTheLimiterIsLost() throws IOException {
        String out = TestCommandLine.succeeded("run", "--field", "geqdsk:" + Path.of("..", "examples", "geqdsk-demo",
                "shaped-deuteron.geqdsk"), "--species", "deuteron", "--energy", "1e5", "--pitch", "75", "--start", "2.23,0,0",
                "--duration", "50", "--pushers", "boris", "--gc-integrators", "none", "--phases", "2", "--quiet", "--json");
        JsonNode doc = new ObjectMapper().readTree(out);
        double rho = doc.get("case").get("rho_m").asDouble();
        assertTrue(2.23 + rho > 2.25 && 2.23 + 0.5 * rho < 2.25, "the gyration reaches the wall: rho = " + rho);
        for (JsonNode r : doc.get("results")) {
            assertTrue(r.get("status").asText().startsWith("lost"), r.toString());
        }
    }

    /** A scan reads the file too and counts bounces of the trapped orbit, like the library's tokamaks. */
    @Test
    void aScanRunsOnTheFileInBounces() throws IOException {
        Path out = tmp.resolve("scan");
        TestCommandLine.succeeded("scan", "--field", "geqdsk:" + Path.of("..", "examples", "geqdsk-demo",
                "shaped-deuteron.geqdsk"), "--species", "deuteron", "--eps-min", "0.005", "--eps-max", "0.01",
                "--points", "2", "--phases", "1", "--duration", "1", "--out", out.toString(), "--quiet");
        JsonNode doc = new ObjectMapper().readTree(out.resolve("scan.json").toFile());
        assertTrue(doc.toString().contains("\"duration_unit\":\"bounces\""), doc.toString().substring(0, 300));
    }

    private static String[] concat(String[] a, String[] b) {
        String[] c = new String[a.length + b.length];
        System.arraycopy(a, 0, c, 0, a.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }

    @Test
    void malformedFilesExitWithTwoAndTheLine() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(CORPUS)) {
            files = s.filter(p -> p.toString().endsWith(".geqdsk") && !p.getFileName().toString().startsWith("valid")).toList();
        }
        assertTrue(files.size() >= 10, "corpus of " + files.size());
        for (Path f : files) {
            TestCommandLine.Outcome o = TestCommandLine.exec("run", "--field", "geqdsk:" + f);
            assertEquals(2, o.code(), f + ": " + o.err());
            assertTrue(o.err().contains("line "), f + ": " + o.err());
            assertTrue(!o.err().contains("Exception") && !o.err().contains("\tat "), "no stack trace: " + o.err());
        }
        TestCommandLine.Outcome cocos = TestCommandLine.exec("run", "--field", "geqdsk:" + CORPUS.resolve("valid-17x17.geqdsk"),
                "-P", "cocos=3");
        assertEquals(2, cocos.code());
        assertTrue(cocos.err().contains("contradicts COCOS 3"), cocos.err());
        TestCommandLine.Outcome bad = TestCommandLine.exec("run", "--field", "geqdsk:" + CORPUS.resolve("valid-17x17.geqdsk"),
                "-P", "cocos=9");
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("1-8 or 11-18"), bad.err());
    }
}
