package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The log-spaced ε grid; expected values are derived by algebra, no physics value is involved. */
class EpsilonGridTest {

    @Test
    void equalRatiosAndExactEnds() {
        double[] eps = EpsilonGrid.logSpaced(1e-3, 0.1, 5);
        assertEquals(1e-3, eps[0]);
        assertEquals(0.1, eps[4]);
        for (int i = 1; i < 5; i++) {
            // two decades in four steps: each step is a factor 10^(1/2) (algebra)
            assertEquals(Math.sqrt(10), eps[i] / eps[i - 1], 1e-12);
        }
    }

    @Test
    void badRangesNameTheOption() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> EpsilonGrid.logSpaced(0, 0.1, 4))
                .getMessage().contains("--eps-min"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> EpsilonGrid.logSpaced(0.1, 0.05, 4))
                .getMessage().contains("--eps-max"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> EpsilonGrid.logSpaced(0.1, 1.5, 4))
                .getMessage().contains("below 1"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> EpsilonGrid.logSpaced(0.01, 0.1, 1))
                .getMessage().contains("--points"));
    }
}
