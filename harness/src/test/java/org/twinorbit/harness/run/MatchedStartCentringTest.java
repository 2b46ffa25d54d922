package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.twinorbit.harness.metrics.Track;

/**
 * The centring of gyration means in {@link MatchedStart}: the mean of f over [t0 − T/2, t0 + T/2]
 * is f(t0) + f''(t0) T²/24 + O(T⁴) (Taylor's theorem, the midpoint rule's error term:
 * common practice), so for a quadratic f the corrected value is f(t0) exactly, while the plain mean is
 * off by c T²/12 for f = c t².
 */
class MatchedStartCentringTest {

    @Test
    void quadraticMeansAreCentredExactly() {
        double period = 0.3;
        double a = 2.0, b = -1.5, c = 7.0;
        Track t = new Track(0);
        for (int k = 0; k < 4; k++) {
            double lo = k * period;
            double hi = lo + period;
            // exact mean of a + b t + c t² over [lo, hi]
            double mean = a + b * (lo + hi) / 2 + c * (hi * hi + hi * lo + lo * lo) / 3;
            t.add((lo + hi) / 2, mean, 0, 0, mean);
        }
        double t0 = period / 2;
        double exact = a + b * t0 + c * t0 * t0;
        assertEquals(exact, MatchedStart.centered(t, 0), 1e-13);
        assertEquals(exact, MatchedStart.centered(t, 3), 1e-13);
        // the plain mean is off by c T²/12: the test would see an uncentred value
        assertEquals(c * period * period / 12, t.coord(0, 0) - exact, 1e-13);
    }
}
