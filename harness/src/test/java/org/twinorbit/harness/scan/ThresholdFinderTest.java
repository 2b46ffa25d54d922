package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The ε* finder on synthetic error curves whose crossings are derived here in closed form
 * (power laws, and the exp(−b/ε) shape of μ jumps, Chirikov, Phys. Rep. 52 (1979)); no physics
 * value is involved.
 */
class ThresholdFinderTest {

    private static double[] apply(double[] eps, java.util.function.DoubleUnaryOperator f) {
        double[] e = new double[eps.length];
        for (int i = 0; i < eps.length; i++) {
            e[i] = f.applyAsDouble(eps[i]);
        }
        return e;
    }

    @Test
    void powerLawIsInterpolatedExactly() {
        // error = A eps^k is a straight line in log-log, so log-log interpolation between any two
        // grid points gives the exact crossing eps* = (tol/A)^(1/k) (algebra).
        double[] eps = EpsilonGrid.logSpaced(1e-3, 0.5, 13);
        for (double k : new double[] {1, 2, 3.5}) {
            double a = 0.5;
            double tol = 0.01;
            ThresholdFinder.Crossing c = ThresholdFinder.find(eps, apply(eps, e -> a * Math.pow(e, k)), tol);
            assertEquals(ThresholdOutcome.CROSSED, c.outcome());
            assertEquals(Math.pow(tol / a, 1 / k), c.epsStar(), 1e-12 * c.epsStar(), "k = " + k);
        }
    }

    @Test
    void exponentialInInverseEpsConvergesToExactCrossing() {
        // error = A exp(-b/eps) (the shape of Chirikov's mu jumps) crosses tol exactly at
        // eps* = b / ln(A/tol). Log-log interpolation is not exact for it; its error must shrink
        // roughly as the square of the grid spacing (linear interpolation of a smooth curve).
        double a = 5.0;
        double b = 0.4;
        double tol = 0.01;
        double exact = b / Math.log(a / tol);
        double coarse = Math.abs(ThresholdFinder.find(EpsilonGrid.logSpaced(0.01, 0.3, 16),
                apply(EpsilonGrid.logSpaced(0.01, 0.3, 16), e -> a * Math.exp(-b / e)), tol).epsStar() / exact - 1);
        double[] fineGrid = EpsilonGrid.logSpaced(0.01, 0.3, 61);
        double fine = Math.abs(ThresholdFinder.find(fineGrid, apply(fineGrid, e -> a * Math.exp(-b / e)), tol)
                .epsStar() / exact - 1);
        assertTrue(coarse < 0.02, "16 points: relative error " + coarse);
        assertTrue(fine < coarse / 8, "61 points: relative error " + fine + " vs " + coarse);
    }

    @Test
    void crossingLiesBetweenTheBracketingPoints() {
        double[] eps = {0.01, 0.02, 0.04, 0.08};
        double[] err = {1e-4, 2e-3, 0.5, 0.9};
        ThresholdFinder.Crossing c = ThresholdFinder.find(eps, err, 0.01);
        assertEquals(ThresholdOutcome.CROSSED, c.outcome());
        assertTrue(c.epsStar() > 0.02 && c.epsStar() < 0.04, "eps* = " + c.epsStar());
    }

    @Test
    void notReachedAndExceededAtStartCarryNoNumber() {
        double[] eps = {0.01, 0.1};
        ThresholdFinder.Crossing low = ThresholdFinder.find(eps, new double[] {1e-5, 1e-3}, 0.01);
        assertEquals(ThresholdOutcome.NOT_REACHED, low.outcome());
        assertTrue(Double.isNaN(low.epsStar()));
        ThresholdFinder.Crossing high = ThresholdFinder.find(eps, new double[] {0.02, 0.5}, 0.01);
        assertEquals(ThresholdOutcome.EXCEEDED_AT_START, high.outcome());
        assertTrue(Double.isNaN(high.epsStar()));
    }

    @Test
    void equalToToleranceIsNotExceeding() {
        ThresholdFinder.Crossing c = ThresholdFinder.find(new double[] {0.1, 0.2}, new double[] {0.01, 0.01}, 0.01);
        assertEquals(ThresholdOutcome.NOT_REACHED, c.outcome());
    }

    @Test
    void firstCrossingWinsEvenIfTheCurveComesBack() {
        double[] eps = {0.01, 0.02, 0.04, 0.08};
        ThresholdFinder.Crossing c = ThresholdFinder.find(eps, new double[] {1e-3, 0.1, 1e-3, 0.5}, 0.01);
        assertTrue(c.epsStar() > 0.01 && c.epsStar() < 0.02, "eps* = " + c.epsStar());
    }

    @Test
    void unmeasuredPointsAreSkipped() {
        // A NaN between the bracketing points: interpolation uses the measured neighbours.
        double[] eps = {0.01, 0.02, 0.04};
        double[] err = {1e-4, Double.NaN, 1.0};
        ThresholdFinder.Crossing c = ThresholdFinder.find(eps, err, 0.01);
        // log-log line through (0.01, 1e-4) and (0.04, 1): slope 4 decades per log10(4), so
        // eps* = 0.01 * 4^(2/4) = 0.02 (algebra).
        assertEquals(0.02, c.epsStar(), 1e-15);
        assertEquals(ThresholdOutcome.NO_DATA,
                ThresholdFinder.find(eps, new double[] {Double.NaN, Double.NaN, Double.NaN}, 0.01).outcome());
        // unmeasured at the smallest eps and beyond tolerance where first measured: nothing is
        // known about the smaller eps, so it is not "exceeded at start"
        assertEquals(ThresholdOutcome.EXCEEDED_ONCE_MEASURED,
                ThresholdFinder.find(eps, new double[] {Double.NaN, 0.5, 1.0}, 0.01).outcome());
    }

    @Test
    void undefinedInterpolationFallsBackToFirstExceedingEps() {
        double[] eps = {0.01, 0.02, 0.04};
        // zero error below: no log; infinite error above (failed orbit): no slope; boolean
        // metric at tolerance 0.
        assertEquals(0.04, ThresholdFinder.find(eps, new double[] {0, 0, 0.3}, 0.01).epsStar());
        assertEquals(0.02, ThresholdFinder.find(eps, new double[] {1e-3, Double.POSITIVE_INFINITY, 1}, 0.01).epsStar());
        assertEquals(0.04, ThresholdFinder.find(eps, new double[] {0, 0, 0.125}, 0.0).epsStar());
    }

    @Test
    void refusesMalformedInput() {
        assertThrows(IllegalArgumentException.class,
                () -> ThresholdFinder.find(new double[] {0.1, 0.1}, new double[] {1, 2}, 0.1));
        assertThrows(IllegalArgumentException.class,
                () -> ThresholdFinder.find(new double[] {0.1}, new double[] {1, 2}, 0.1));
        assertThrows(IllegalArgumentException.class,
                () -> ThresholdFinder.find(new double[] {0.1}, new double[] {1}, -0.1));
    }
}
