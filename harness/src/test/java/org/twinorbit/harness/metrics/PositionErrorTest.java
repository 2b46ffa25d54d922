package org.twinorbit.harness.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Position error per bounce period, on tracks whose answer follows from the definition: a
 * reference bouncing as z = A sin(ωt) (v∥ = Aω cos ωt, mirror points a half period apart, exact
 * for a sine), and a copy of it shifted by δ along x. After N bounce periods the distance is δ,
 * so the metric is δ/ρ0/N, positive when the copy leads along the reference's motion (derived).
 */
class PositionErrorTest {

    private static Track bouncing(double shiftX, double shiftT, double periods) {
        double a = 2.0, w = 2 * Math.PI;      // period 1 s
        Track t = new Track(1e-9);
        int n = (int) Math.round(400 * periods);
        for (int i = 0; i <= n; i++) {
            double time = i * periods / n;
            double s = time + shiftT;
            t.add(time, shiftX + 0.1 * time, 0, a * Math.sin(w * s), a * w * Math.cos(w * s));
        }
        return t;
    }

    @Test
    void distanceIsDividedByTheBouncePeriodsRun() {
        double rho = 0.01;
        for (double periods : new double[] {2.0, 3.5, 6.0}) {
            Track ref = bouncing(0, 0, periods);
            Track ahead = bouncing(0.003, 0, periods);   // shifted along the drift (+x)
            assertEquals(0.003 / rho / periods, OrbitMetrics.positionError(ahead, ref, rho), 1e-9,
                    "after " + periods + " periods");
            Track behind = bouncing(-0.003, 0, periods);
            assertEquals(-0.003 / rho / periods, OrbitMetrics.positionError(behind, ref, rho), 1e-9);
        }
    }

    @Test
    void aRunShorterThanABounceIsNotDividedBelowOne() {
        Track ref = bouncing(0, 0, 0.8);
        Track other = bouncing(0.002, 0, 0.8);
        assertEquals(0.2, OrbitMetrics.positionError(other, ref, 0.01), 1e-9);
    }
}
