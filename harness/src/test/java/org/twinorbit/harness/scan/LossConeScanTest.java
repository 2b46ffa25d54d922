package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A pitch angle inside the loss cone escapes the mirror in both models: sin²α < B_min/B_max =
 * 1/Rm = 1/4 for the default mirror, α < 30° (common practice; e.g. Chen, Introduction to Plasma
 * Physics, 1984). Such a particle has no breakdown threshold — it is lost — and the scan must say
 * so instead of giving an ε* for μ or the drift, while a trapped pitch keeps its thresholds.
 */
class LossConeScanTest {

    @Test
    void lossConePitchIsReportedLostNotThresholded(@TempDir Path dir) {
        ScanResult r = ScanTestSupport.run(dir, "--field", "mirror", "--phases", "4", "--pitch", "20,60",
                "--eps-min", "0.02", "--eps-max", "0.2", "--points", "4");
        for (ScanPoint p : r.points()) {
            assertEquals(p.pitchDeg() == 20 ? 1.0 : 0.0, p.value("lost"), "lost flag at pitch " + p.pitchDeg());
        }
        for (Threshold t : r.thresholds()) {
            if (t.pitchDeg() == 20) {
                ThresholdOutcome want = t.metric() == ScanMetric.CLASS_CHANGE
                        ? ThresholdOutcome.NOT_REACHED : ThresholdOutcome.LOST;
                assertEquals(want, t.outcome(), t.metric() + " at 20 deg");
                assertTrue(Double.isNaN(t.epsStar()));
            } else {
                assertTrue(t.outcome() != ThresholdOutcome.LOST, t.metric() + " at 60 deg is trapped");
            }
        }
    }
}
