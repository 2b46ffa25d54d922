package org.twinorbit.harness.scan;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;
import org.twinorbit.harness.report.PictureChecks;
import org.twinorbit.harness.run.PhaseStatistic;

/** The scan plot and the safe-use figure render at their size, are not blank and have their series. */
class ScanPicturesTest {

    @Test
    void scanPanelsHaveTheirCurvesAndTolerances(@TempDir Path dir) {
        ScanResult r = ScanTestSupport.run(dir, "--field", "mirror", "--phases", "2", "--pitch", "60",
                "--eps-min", "0.02", "--eps-max", "0.2", "--points", "3");
        List<XYChart> panels = ScanPlot.charts(r);
        org.junit.jupiter.api.Assertions.assertFalse(panels.isEmpty());
        for (XYChart c : panels) {
            String metric = c.getSeriesMap().keySet().iterator().next();
            PictureChecks.check(c, 640, 600, List.of(metric));
            org.junit.jupiter.api.Assertions.assertTrue(metric.endsWith(" @ 60 deg"), metric);
            org.junit.jupiter.api.Assertions.assertTrue(c.getSeriesMap().keySet().stream()
                    .anyMatch(k -> k.startsWith("tolerance ")), c.getTitle());
            PictureChecks.logTicks(c, true, true);
            // class_change has no panel of its own (0 has no place on a log axis): every panel says it
            org.junit.jupiter.api.Assertions.assertTrue(c.getSeriesMap().keySet().stream()
                    .anyMatch(k -> k.startsWith("orbit class change")), c.getSeriesMap().keySet().toString());
        }
        PictureChecks.check(panels.get(0), 640, 600, List.of("mu_jump @ 60 deg", "mu_change (ripple included) @ 60 deg"));
    }

    /**
     * With many pitches and both charge signs the legend below a panel has many rows; the panel
     * grows with them, else the legend squeezes the plot itself away (seen on a 3-pitch, 2-sign
     * tokamak scan before the panels grew).
     */
    @Test
    void panelsGrowWithTheirLegends(@TempDir Path dir) {
        ScanResult r = ScanTestSupport.run(dir, "--field", "mirror", "--phases", "2", "--pitch", "50,70",
                "--charge-signs", "both", "--eps-min", "0.02", "--eps-max", "0.2", "--points", "3");
        List<XYChart> panels = ScanPlot.charts(r);
        int rows = panels.stream().mapToInt(c -> c.getSeriesMap().size()).max().orElseThrow();
        org.junit.jupiter.api.Assertions.assertTrue(rows > 8, rows + " legend rows");
        for (XYChart c : panels) {
            org.junit.jupiter.api.Assertions.assertTrue(c.getHeight() >= 600 + (rows - 8) * 20, c.getHeight() + " px");
            PictureChecks.check(c, 640, c.getHeight(), List.of(c.getSeriesMap().keySet().iterator().next()));
        }
    }

    @Test
    void safeUsePanelsShowEpsStarAndTheOpenOutcomes() {
        Threshold crossed = new Threshold(ScanMetric.MU_JUMP, 0.01, PhaseStatistic.WORST, 60, ThresholdOutcome.CROSSED,
                0.09, 1.2e5);
        Threshold open = new Threshold(ScanMetric.DRIFT_ERROR, 0.05, PhaseStatistic.WORST, 60,
                ThresholdOutcome.NOT_REACHED, Double.NaN, Double.NaN);
        SafeUseMap.Result r = new SafeUseMap.Result(List.of(
                new SafeUseMap.Row("mirror", "proton", "rho0/L", 60, 3e-3, 0.3, crossed),
                new SafeUseMap.Row("mirror", "proton", "rho0/L", 60, 3e-3, 0.3, open)), Map.of());
        var panels = SafeUseMap.charts(r);
        org.junit.jupiter.api.Assertions.assertEquals(2, panels.size(), "eps* and energy for protons");
        PictureChecks.check(panels.get(0), 1000, 560, List.of("mu_jump", "not reached"));
        PictureChecks.check(panels.get(1), 1000, 560, List.of("mu_jump"));
        PictureChecks.logTicks(panels.get(0), false, true);
        PictureChecks.logTicks(panels.get(1), false, true);
    }
}
