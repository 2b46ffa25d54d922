package org.twinorbit.harness.precision;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;

/**
 * The work–precision sweep against the closed form of Boris's phase error in a uniform field:
 * one step turns u by 2·atan(Ω Δt/2) instead of Ω Δt (Birdsall &amp; Langdon, Plasma Physics
 * via Computer Simulation, 1991, §4-4, from memory), so with N steps per gyroperiod the measured
 * gyrofrequency is off by 2 atan(π/N)/(2π/N) − 1 at every N of the sweep.
 */
class PrecisionCommandTest {

    @TempDir
    Path tmp;

    @Test
    void borisPhaseErrorFollowsItsClosedFormAtEveryStep() throws IOException {
        TestCommandLine.succeeded("precision", "--field", "uniform", "--energy", "1e4", "--phases", "2", "--duration", "10",
                "--pushers", "boris", "--gc-integrators", "none", "--sweep", "6,8,12,16,24,32", "--quiet", "--out",
                tmp.toString());
        JsonNode doc = new ObjectMapper().readTree(tmp.resolve("precision.json").toFile());
        JsonNode points = doc.get("points");
        assertEquals(6, points.size());
        for (JsonNode p : points) {
            int n = p.get("steps_per_gyro").asInt();
            double exact = 1 - 2 * Math.atan(Math.PI / n) / (2 * Math.PI / n);
            assertEquals(exact, p.get("phase_error").asDouble(), 1e-6 * exact, "N = " + n);
            assertEquals(n * 10L, p.get("steps").asLong(), "N = " + n);
        }
        for (String f : new String[] {"precision.md", "precision.csv", "precision.png"}) {
            assertTrue(Files.size(tmp.resolve(f)) > 0, f);
        }
    }

    @Test
    void aSweepOfFewerThanSixStepsIsRefused() {
        TestCommandLine.Outcome o = TestCommandLine.exec("precision", "--field", "uniform", "--sweep", "8,16,32");
        assertEquals(2, o.code());
        assertTrue(o.err().contains("--sweep: give at least 6 values"), o.err());
    }
}
