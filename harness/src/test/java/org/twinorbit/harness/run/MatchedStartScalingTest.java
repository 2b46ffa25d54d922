package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.twinorbit.harness.cases.CaseSpec;

/**
 * The guiding-center model's error is second order in ε: its drift velocity and bounce period
 * differ from the gyro-averaged exact orbit's by O(ε²) (Northrop, The Adiabatic Motion of
 * Charged Particles, 1963; Littlejohn, J. Plasma Phys. 29, 1983). Compared with a guiding
 * center of its own (the matched start), the model row must show that: a log-log slope of at
 * least 1.8 over ε = 0.005–0.05. The zeroth-order ring around one shared guiding center gives each
 * phase an O(ε) offset in p∥ and position (in the toroidal field m R u_φ is exact, so a particle
 * at R0 + ρ cos θ has v∥ (1 + (ρ/R0) cos θ)), and the same fit then has slope ≈ 1.
 */
class MatchedStartScalingTest {

    private static final double[] EPS = {0.005, 0.01, 0.02, 0.05};

    private static double slope(String field, double pitch, String metric, String start, boolean bounces) {
        SimpleRegression fit = new SimpleRegression();
        for (double eps : EPS) {
            CaseSpec s = TestCases.spec(field, "none", "none");
            s.eps = eps;
            s.pitch = pitch;
            s.phases = 8;
            s.duration = bounces ? 2.0 : 20.0;
            s.durationUnit = bounces ? "bounces" : "gyroperiods";
            s.gcStart = start;
            ResultRow model = TestCases.row(TestCases.run(s), "gc-reference");
            fit.addData(Math.log(eps), Math.log(Math.abs(model.metric(metric).worst())));
        }
        return fit.getSlope();
    }

    @ParameterizedTest(name = "{0} pitch {1} {2}")
    @CsvSource({
            "toroidal, 60, drift_error, false",
            "toroidal, 30, drift_error, false",
            "dipole,   60, drift_error, true",
            "dipole,   60, bounce_period_error, true",
            "dipole,   40, bounce_period_error, true"})
    void modelErrorIsSecondOrderWithTheMatchedStartAndFirstOrderWithTheShared(String field, double pitch,
                                                                              String metric, boolean bounces) {
        double matched = slope(field, pitch, metric, "matched", bounces);
        double shared = slope(field, pitch, metric, "shared", bounces);
        assertTrue(matched >= 1.8, field + " " + metric + " matched-start slope " + matched);
        // first order: the start-up offset, not the model
        assertTrue(shared > 0.7 && shared < 1.3, field + " " + metric + " shared-start slope " + shared);
    }

    /** In the gradient field the drift is second order either way; the matched start must keep it so. */
    @ParameterizedTest(name = "gradient pitch {0}")
    @CsvSource({"90", "60"})
    void gradientDriftStaysSecondOrder(double pitch) {
        double matched = slope("gradient", pitch, "drift_error", "matched", false);
        assertTrue(matched >= 1.8, "gradient drift matched-start slope " + matched);
    }
}
