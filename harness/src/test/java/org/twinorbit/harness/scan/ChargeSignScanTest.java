package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;

/**
 * {@code --charge-signs both}: the species and its twin of charge -q at the same pitches and
 * energies.
 *
 * <p>The physics checked: the Lorentz equations are invariant under q -> -q together with a
 * reflection x -> P x through a plane that contains the symmetry axis, provided P B(P x) = B(x)
 * (P(a x b) = -(P a x P b) for the reflection of ordinary vectors; common practice). A purely
 * poloidal axisymmetric field (the mirror) satisfies it, so the -q orbit is the mirror image of
 * the +q orbit, the gyrophase ring {2 pi k/N} maps onto itself, and every metric and threshold
 * agrees up to the references' own error. A toroidal field component breaks it (P flips B_phi):
 * in the tokamak the grad-B and curvature drift reverses with q while the motion along B does not,
 * so the twin's banana (or passing orbit) is displaced to the other side of its flux surface, and
 * its model errors differ.
 */
class ChargeSignScanTest {

    @TempDir
    Path tmp;

    private static double relative(double a, double b) {
        return Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b));
    }

    @Test
    void theTokamakGivesTheTwinOtherModelErrors() {
        ScanResult r = ScanTestSupport.run(tmp, "--field", "tokamak", "--charge-signs", "both", "--eps-min", "0.001",
                "--eps-max", "0.002", "--points", "2", "--phases", "2", "--duration", "1", "--threads", "1");
        assertEquals(4, r.points().size());
        ScanPoint plus = r.points().stream().filter(p -> p.chargeSign() == 1 && p.eps() == 0.001).findFirst()
                .orElseThrow();
        ScanPoint minus = r.points().stream().filter(p -> p.chargeSign() == -1 && p.eps() == 0.001).findFirst()
                .orElseThrow();
        // the mirror below agrees to 1e-5 at worst; here the orbits are different orbits
        double drift = relative(plus.worst(ScanMetric.DRIFT_ERROR), minus.worst(ScanMetric.DRIFT_ERROR));
        double position = relative(plus.worst(ScanMetric.POSITION_ERROR), minus.worst(ScanMetric.POSITION_ERROR));
        assertTrue(drift > 1e-2 && position > 1e-3, "drift " + drift + ", position " + position);
    }

    @Test
    void theMirrorGivesBothSignsOneAnswer() throws IOException {
        Path out = tmp.resolve("mirror");
        String printed = TestCommandLine.succeeded("scan", "--field", "mirror", "--charge-signs", "both", "--points", "3",
                "--phases", "2", "--threads", "1", "--out", out.toString(), "-q");
        JsonNode doc = new ObjectMapper().readTree(out.resolve("scan.json").toFile());
        assertEquals("both", doc.get("scan").get("charge_signs").asText());
        JsonNode points = doc.get("points");
        assertEquals(6, points.size());
        for (int i = 0; i < 3; i++) {
            JsonNode plus = points.get(i);
            JsonNode minus = points.get(i + 3);
            assertEquals(1, plus.get("charge_sign").asInt());
            assertEquals(-1, minus.get("charge_sign").asInt());
            assertEquals(plus.get("eps").asDouble(), minus.get("eps").asDouble(), 0);
            for (String k : List.of("mu_jump_worst", "drift_error_worst", "position_error_rho_worst",
                    "bounce_period_error_worst")) {
                // the references run at rtol 1e-10; the smallest mu jumps (1e-8) sit near their floor
                assertTrue(relative(plus.get(k).asDouble(), minus.get(k).asDouble()) < 1e-4,
                        k + ": " + plus.get(k) + " against " + minus.get(k));
            }
        }
        JsonNode th = doc.get("thresholds");
        assertEquals(10, th.size());
        for (int i = 0; i < 5; i++) {
            JsonNode plus = th.get(i);
            JsonNode minus = th.get(i + 5);
            assertEquals(plus.get("metric"), minus.get("metric"));
            assertEquals(plus.get("outcome"), minus.get("outcome"));
            assertEquals(-1, minus.get("charge_sign").asInt());
            if (plus.get("eps_star").isNumber()) {
                assertTrue(relative(plus.get("eps_star").asDouble(), minus.get("eps_star").asDouble()) < 1e-7,
                        plus + " against " + minus);
            }
        }
        assertTrue(printed.contains("proton, pitch 60 deg: ") && printed.contains("proton (-q), pitch 60 deg: ")
                && printed.contains("overall: ") && printed.contains(", at proton"), printed);
        assertTrue(Files.readString(out.resolve("scan.csv")).startsWith("eps,energy_ev,pitch_deg,charge_sign,"));
        assertTrue(Files.readString(out.resolve("scan.md")).contains("| pitch (deg) | charge |"));
    }

    @Test
    void aScanOfTheGivenSpeciesKeepsItsLayout() {
        ScanRequest.Built b = ScanTestSupport.setup("--field", "gradient", "--points", "2");
        assertFalse(b.scan().settings().containsKey("charge_signs"));
        assertEquals(List.of(ChargeSigns.GIVEN), b.scan().chargeSigns());
        Map<String, Object> m = ScanJson.pointMap(new ScanPoint(0.01, 1e3, 60, Map.of("lost", 0.0)));
        assertFalse(m.containsKey("charge_sign"), m.toString());
        TestCommandLine.Outcome bad = TestCommandLine.exec("scan", "--field", "gradient", "--charge-signs", "minus",
                "--out", tmp.toString());
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("--charge-signs must be given or both"), bad.err());
    }

    /** Shards and resume keep the sign: a merge of two shards and a resumed run equal one run. */
    @Test
    void shardsAndResumeKeepTheSigns() throws IOException {
        String[] scan = {"scan", "--field", "gradient", "--charge-signs", "both", "--points", "3", "--phases", "1",
            "--duration", "5", "-q", "--threads", "1"};
        Path one = tmp.resolve("one");
        TestCommandLine.succeeded(concat(scan, "--out", one.toString()));
        Path sharded = tmp.resolve("sharded");
        for (int i = 0; i < 2; i++) {
            TestCommandLine.succeeded(concat(scan, "--shard", i + "/2", "--out", sharded.toString()));
        }
        TestCommandLine.Outcome merged = TestCommandLine.exec("merge", "--out", sharded.toString());
        assertEquals(0, merged.code(), merged.err());
        ObjectMapper json = new ObjectMapper();
        JsonNode a = json.readTree(one.resolve("scan.json").toFile());
        JsonNode b = json.readTree(sharded.resolve("scan.json").toFile());
        assertEquals(a.get("points"), b.get("points"));
        assertEquals(a.get("thresholds"), b.get("thresholds"));

        // resume: a checkpoint holding the first two points (the +q ones of the two smallest eps) and one of -q
        String[] options = java.util.Arrays.copyOfRange(scan, 1, scan.length);
        ScanRequest.Built built = ScanTestSupport.setup(options);
        Path resumed = tmp.resolve("resumed");
        Files.createDirectories(resumed);
        ScanResult full = ScanTestSupport.run(tmp.resolve("full"), options);
        ScanCheckpoint cp = ScanCheckpoint.open(resumed, built.scan(), false);
        cp.add(full.points().get(0));
        cp.add(full.points().get(1));
        cp.add(full.points().get(3));
        AtomicInteger measured = new AtomicInteger();
        PointEvaluator counting = new PointEvaluator() {
            @Override
            public Map<String, Double> measure(double eps, double energyEv, double pitchDeg) {
                return measure(eps, energyEv, pitchDeg, ChargeSigns.GIVEN);
            }

            @Override
            public Map<String, Double> measure(double eps, double energyEv, double pitchDeg, int sign) {
                measured.incrementAndGet();
                return built.evaluator().measure(eps, energyEv, pitchDeg, sign);
            }
        };
        ScanResult r = built.scan().run(counting, resumed, true, 1, ScanProgress.NONE);
        assertEquals(3, measured.get(), "only the missing points are computed");
        assertEquals(full.points(), r.points());
    }

    private static String[] concat(String[] a, String... b) {
        String[] all = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return all;
    }
}
