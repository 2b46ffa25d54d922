package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.run.PhaseStatistic;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/** Checkpointing, resume and thread-count independence, on a synthetic error curve. */
class BreakdownScanResumeTest {

    private static final double[] EPS = EpsilonGrid.logSpaced(1e-3, 0.3, 8);
    private static final List<Double> PITCHES = List.of(30.0, 80.0);

    /** A deterministic made-up model error with a power law and an exponential part. */
    static Map<String, Double> synthetic(double eps, double energyEv, double pitchDeg) {
        Map<String, Double> m = new LinkedHashMap<>();
        double s = Math.sin(Math.toRadians(pitchDeg));
        m.put(ScanMetric.MU_JUMP.meanKey(), 3 * Math.exp(-0.2 / eps) * s);
        m.put(ScanMetric.MU_JUMP.worstKey(), 5 * Math.exp(-0.2 / eps) * s);
        m.put(ScanMetric.DRIFT_ERROR.meanKey(), eps);
        m.put(ScanMetric.DRIFT_ERROR.worstKey(), 2 * eps);
        m.put(ScanMetric.POSITION_ERROR.meanKey(), Double.NaN);
        m.put(ScanMetric.POSITION_ERROR.worstKey(), eps > 0.1 ? Double.POSITIVE_INFINITY : 10 * eps);
        // a count that is a mean over the phases: scan.json rounds it, scan.md prints it
        m.put("full_orbit_evaluations", Math.floor(1e4 * eps) + 0.5);
        return m;
    }

    static BreakdownScan scan() {
        EnergyScale scale = new EnergyScale(new ConstantFieldWithLength(1.0, 1.0), Species.PROTON, Vec3.ZERO);
        Map<String, Object> settings = new LinkedHashMap<>();
        settings.put("field", "test-constant");
        settings.put("species", "proton");
        settings.put("eps_min", EPS[0]);
        settings.put("eps_max", EPS[EPS.length - 1]);
        settings.put("n_eps", EPS.length);
        settings.put("pitch_deg", PITCHES);
        Map<ScanMetric, List<Double>> tol = new LinkedHashMap<>();
        tol.put(ScanMetric.MU_JUMP, List.of(0.01, 0.1));
        tol.put(ScanMetric.DRIFT_ERROR, List.of(0.05));
        tol.put(ScanMetric.POSITION_ERROR, List.of(1.0));
        return new BreakdownScan(settings, EPS, PITCHES, ScanAxis.energy(scale), tol, PhaseStatistic.WORST);
    }

    @Test
    void interruptedThenResumedEqualsUninterrupted(@TempDir Path dir) throws IOException {
        Path whole = dir.resolve("whole");
        scan().run(BreakdownScanResumeTest::synthetic, whole, false, 2, ScanProgress.NONE);
        String expected = Files.readString(whole.resolve("scan.json"));
        String expectedMd = Files.readString(whole.resolve("scan.md"));
        for (String f : List.of("scan.md", "scan.csv", "scan.png")) {
            assertTrue(Files.size(whole.resolve(f)) > 0, f);
        }
        assertFalse(Files.exists(whole.resolve(ScanCheckpoint.FILE_NAME)), "partial file left behind");

        Path broken = dir.resolve("broken");
        int k = 5;
        AtomicInteger calls = new AtomicInteger();
        PointEvaluator dying = (e, w, p) -> {
            if (calls.incrementAndGet() > k) {
                throw new IllegalStateException("simulated interruption");
            }
            return synthetic(e, w, p);
        };
        assertThrows(IllegalStateException.class, () -> scan().run(dying, broken, false, 1, ScanProgress.NONE));
        JsonNode partial = ScanJson.MAPPER.readTree(broken.resolve(ScanCheckpoint.FILE_NAME).toFile());
        assertEquals(k, partial.get("points").size());
        assertFalse(Files.exists(broken.resolve("scan.json")));

        AtomicInteger resumed = new AtomicInteger();
        int[] started = new int[2];
        ScanProgress watch = new ScanProgress() {
            @Override
            public void start(int total, int alreadyDone) {
                started[0] = total;
                started[1] = alreadyDone;
            }

            @Override
            public void pointDone() {}
        };
        scan().run((e, w, p) -> {
            resumed.incrementAndGet();
            return synthetic(e, w, p);
        }, broken, true, 2, watch);
        assertEquals(EPS.length * PITCHES.size() - k, resumed.get(), "points recomputed on resume");
        assertEquals(EPS.length * PITCHES.size(), started[0]);
        assertEquals(k, started[1]);
        assertEquals(expected, Files.readString(broken.resolve("scan.json")));
        // the partial file keeps every value exact, so the resumed table prints the same numbers
        assertEquals(expectedMd, Files.readString(broken.resolve("scan.md")));
    }

    @Test
    void resultDoesNotDependOnThreadCount(@TempDir Path dir) throws IOException {
        scan().run(BreakdownScanResumeTest::synthetic, dir.resolve("one"), false, 1, ScanProgress.NONE);
        scan().run(BreakdownScanResumeTest::synthetic, dir.resolve("two"), false, 2, ScanProgress.NONE);
        assertEquals(Files.readString(dir.resolve("one/scan.json")), Files.readString(dir.resolve("two/scan.json")));
        assertEquals(Files.readString(dir.resolve("one/scan.csv")), Files.readString(dir.resolve("two/scan.csv")));
    }

    @Test
    void resumeWithOtherSettingsIsRefused(@TempDir Path dir) {
        BreakdownScan a = scan();
        ScanCheckpoint cp = ScanCheckpoint.open(dir, a, false);
        cp.add(new ScanPoint(EPS[1], 1.0, PITCHES.get(0), synthetic(EPS[1], 1.0, PITCHES.get(0))));
        assertEquals(1, ScanCheckpoint.open(dir, a, true).size());
        assertEquals(0, ScanCheckpoint.open(dir, a, false).size());
        Map<String, Object> other = new LinkedHashMap<>(a.settings());
        other.put("field", "dipole");
        BreakdownScan b = new BreakdownScan(other, a.eps(), a.pitches(), a.axis(), a.tolerances(), a.statistic());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ScanCheckpoint.open(dir, b, true));
        assertTrue(e.getMessage().startsWith("--resume"), e.getMessage());
    }

    @Test
    void thresholdsFollowTheContract(@TempDir Path dir) throws IOException {
        ScanResult r = scan().run(BreakdownScanResumeTest::synthetic, dir, false, 2, ScanProgress.NONE);
        JsonNode root = ScanJson.MAPPER.readTree(dir.resolve("scan.json").toFile());
        JsonNode p0 = root.get("points").get(0);
        for (String key : List.of("eps", "energy_ev", "pitch_deg", "mu_jump_mean", "mu_jump_worst")) {
            assertTrue(p0.has(key), key);
        }
        // 2 tolerances for mu_jump + 1 drift + 1 position, each at 2 pitches
        assertEquals(8, root.get("thresholds").size());
        for (JsonNode t : root.get("thresholds")) {
            for (String key : List.of("metric", "tolerance", "pitch_deg", "eps_star", "energy_ev_star", "outcome")) {
                assertTrue(t.has(key), key);
            }
            boolean crossed = t.get("outcome").asText().equals("crossed");
            assertEquals(crossed, t.get("eps_star").isNumber(), t.toString());
        }
        // drift worst = 2 eps crosses 0.05 at eps* = 0.025 exactly (power law, see ThresholdFinderTest)
        Threshold drift = r.thresholds().stream().filter(t -> t.metric() == ScanMetric.DRIFT_ERROR).findFirst().orElseThrow();
        assertEquals(0.025, drift.epsStar(), 1e-12);
        assertEquals(new EnergyScale(new ConstantFieldWithLength(1.0, 1.0), Species.PROTON, Vec3.ZERO).energyEv(0.025),
                drift.energyEvStar(), 1e-9 * drift.energyEvStar());
    }
}
