package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * μ scattering in a current sheet: strong where R_c/ρ falls below about 8 (Sergeev et al.,
 * Planet. Space Sci. 31, 1983), orbits chaotic near κ = sqrt(R_c/ρ) ~ 1 and adiabatic for κ ≳ 3
 * (Büchner &amp; Zelenyi, J. Geophys. Res. 94, 1989). The scan's ε* = ρ/R_c for a 10 % μ jump
 * must therefore lie where κ² = 1/ε* is between 3 and 25.
 */
class CurrentSheetScanTest {

    @Test
    void muBreaksDownWhereKappaIsOfOrderOne(@TempDir Path dir) throws IOException {
        ScanResult r = ScanTestSupport.run(dir, "--field", "current-sheet", "--phases", "4",
                "--eps-min", "0.03", "--eps-max", "0.5", "--points", "8", "--duration", "2",
                "--tolerance", "mu_jump=0.1");
        Threshold t = r.thresholds().stream().filter(x -> x.metric() == ScanMetric.MU_JUMP).findFirst().orElseThrow();
        assertEquals(ThresholdOutcome.CROSSED, t.outcome());
        double kappa2 = 1 / t.epsStar();
        assertTrue(kappa2 >= 3 && kappa2 <= 25, "kappa^2 at eps* = " + kappa2);
        // κ is reported beside every point and beside ε* (κ* = ε*^(-1/2) when L = R_c and ρ is taken in Bn)
        assertEquals(1 / Math.sqrt(0.03), r.points().get(0).value("kappa"), 1e-12);
        JsonNode json = ScanJson.MAPPER.readTree(dir.resolve("scan.json").toFile());
        JsonNode mu = json.get("thresholds").get(0);
        assertEquals("mu_jump", mu.get("metric").asText());
        assertEquals(1 / Math.sqrt(t.epsStar()), mu.get("kappa_star").asDouble(), 1e-12);
    }
}
