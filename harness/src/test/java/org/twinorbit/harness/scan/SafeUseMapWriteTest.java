package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.twinorbit.harness.run.PhaseStatistic;
import org.junit.jupiter.api.io.TempDir;

/** The files of the safe-use map, from made-up rows (computing a real map takes minutes). */
class SafeUseMapWriteTest {

    @Test
    void writesTableJsonCsvAndFigure(@TempDir Path dir) throws IOException {
        Threshold crossed = new Threshold(ScanMetric.MU_JUMP, 0.01, PhaseStatistic.WORST, 60, ThresholdOutcome.CROSSED, 0.09, 1.2e5);
        Threshold open = new Threshold(ScanMetric.DRIFT_ERROR, 0.05, PhaseStatistic.WORST, 60, ThresholdOutcome.NOT_REACHED, Double.NaN, Double.NaN);
        SafeUseMap.Result r = new SafeUseMap.Result(List.of(
                new SafeUseMap.Row("mirror", "proton", "rho0/L", 60, 3e-3, 0.3, crossed),
                new SafeUseMap.Row("mirror", "electron", "rho0/L", 60, 3e-3, 0.3, open)),
                Map.of("uniform", "no length L"));
        SafeUseMap.write(r, dir);
        JsonNode root = ScanJson.MAPPER.readTree(dir.resolve("safe-use.json").toFile());
        assertEquals(2, root.get("rows").size());
        JsonNode first = root.get("rows").get(0);
        for (String k : List.of("field", "species", "metric", "tolerance", "eps_meaning", "pitch_deg", "eps_min",
                "eps_max", "outcome", "eps_star", "energy_ev_star")) {
            assertTrue(first.has(k), k);
        }
        assertEquals(0.09, first.get("eps_star").asDouble());
        assertTrue(root.get("rows").get(1).get("eps_star").isNull(), "no number for an open outcome");
        assertEquals("no length L", root.get("not_scanned").get("uniform").asText());
        assertEquals("twinorbit", root.get("tool").get("name").asText());
        assertEquals(System.getProperty("twinorbit.expected.version"), root.get("tool").get("version").asText());
        assertTrue(root.get("tool").has("git_commit"));
        assertEquals(List.of(), org.twinorbit.harness.JsonKeys.notSnakeCase(root));
        List<String> csv = Files.readAllLines(dir.resolve("safe-use.csv"));
        assertEquals(3, csv.size());
        assertTrue(csv.get(2).endsWith("not-reached,,"), csv.get(2));
        String md = Files.readString(dir.resolve("safe-use.md"));
        assertTrue(md.contains("| mirror | proton | mu_jump | rho0/L | 60 | 0.003000 – 0.3000 | crossed | 0.09000 | 120000 |"), md);
        assertTrue(md.contains("- uniform: no length L"), md);
        assertTrue(Files.size(dir.resolve("safe-use.png")) > 1000);
    }
}
