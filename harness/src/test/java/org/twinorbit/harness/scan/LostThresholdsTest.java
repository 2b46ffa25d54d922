package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.twinorbit.harness.run.PhaseStatistic;

/**
 * Thresholds over points where the particle escapes in both models. The expected outcomes follow
 * from the definitions in {@link ThresholdOutcome} (derived in closed form from the synthetic
 * curves): a lost point measures no breakdown, so it neither crosses a tolerance nor counts as safe.
 */
class LostThresholdsTest {

    private static ScanPoint point(double eps, double muJump, boolean lost) {
        return new ScanPoint(eps, 1e3 * eps, 60, Map.of("mu_jump_worst", muJump, "mu_jump_mean", muJump,
                "lost", lost ? 1.0 : 0.0));
    }

    private static Threshold muJump(List<ScanPoint> pts) {
        return Thresholds.find(pts, List.of(60.0), Map.of(ScanMetric.MU_JUMP, List.of(0.01)),
                new ScanAxis("rho0/L", true, e -> 1e3 * e, null, null), PhaseStatistic.WORST).get(0);
    }

    @Test
    void withinToleranceUntilLostIsLostAbove() {
        List<ScanPoint> pts = new ArrayList<>();
        pts.add(point(0.01, 1e-4, false));
        pts.add(point(0.02, 1e-3, false));
        // escaping orbits show large mu changes before they leave: not a breakdown of the model
        pts.add(point(0.04, 0.05, true));
        pts.add(point(0.08, 0.2, true));
        Threshold t = muJump(pts);
        assertEquals(ThresholdOutcome.LOST_ABOVE, t.outcome());
        assertEquals(0.04, t.epsStar());
        assertEquals(40.0, t.energyEvStar(), 1e-12);
    }

    @Test
    void crossingBeforeTheLossesStaysACrossing() {
        List<ScanPoint> pts = new ArrayList<>();
        pts.add(point(0.01, 1e-3, false));
        pts.add(point(0.02, 0.1, false));
        pts.add(point(0.04, 0.5, true));
        Threshold t = muJump(pts);
        assertEquals(ThresholdOutcome.CROSSED, t.outcome());
        // log-log interpolation between (0.01, 1e-3) and (0.02, 0.1) reaches 0.01 at 0.01·2^(1/2)
        assertEquals(0.01 * Math.sqrt(2), t.epsStar(), 1e-12);
    }

    @Test
    void lostEverywhereIsLost() {
        Threshold t = muJump(List.of(point(0.01, 0.5, true), point(0.02, 0.5, true)));
        assertEquals(ThresholdOutcome.LOST, t.outcome());
    }
}
