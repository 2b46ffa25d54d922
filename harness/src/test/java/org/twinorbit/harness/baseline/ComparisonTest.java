package org.twinorbit.harness.baseline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** How one value and one row compare; expectations derived from the definitions in {@link Tolerance} and {@link Comparison}. */
class ComparisonTest {

    private static final Tolerance T = new Tolerance(1e-9, 1e-13);

    /** Source: derived — within max(rel |b|, abs) is no change; the floor absorbs round-off-level values. */
    @Test
    void withinToleranceOrFloorIsNoChange() {
        assertNull(Comparison.change(1.0, 1.0 + 0.9e-9, T, Direction.SMALLER_IS_BETTER, false));
        assertNull(Comparison.change(1e-15, 5e-14, T, Direction.SMALLER_IS_BETTER, false));
        assertEquals(Difference.Kind.REGRESSION, Comparison.change(1e-15, 2e-13, T, Direction.SMALLER_IS_BETTER, false));
    }

    /** Source: derived — worse only by default; --two-sided counts an improvement as a change; no-direction metrics always count. */
    @Test
    void oneSidedByDefault() {
        assertEquals(Difference.Kind.IMPROVEMENT, Comparison.change(1e-3, 5e-4, T, Direction.SMALLER_IS_BETTER, false));
        assertEquals(Difference.Kind.REGRESSION, Comparison.change(1e-3, 5e-4, T, Direction.SMALLER_IS_BETTER, true));
        assertEquals(Difference.Kind.REGRESSION, Comparison.change(-1e-3, 1e-3, T, Direction.SMALLER_IS_BETTER, false));
        assertEquals(Difference.Kind.REGRESSION, Comparison.change(2.0, 1.9, T, Direction.NONE, false));
        assertEquals(Difference.Kind.IMPROVEMENT, Comparison.change(0.5, 1.0, T, Direction.LARGER_IS_BETTER, false));
    }

    /** Source: derived — rows and labels: missing fails, new passes, ok -> unstable fails, class changes fail. */
    @Test
    void rowsAndLabels() {
        MeasuredRow a = new MeasuredRow("c", "boris", Map.of("status", "ok", "orbit_class", "trapped"),
                Map.of("energy_error.worst", 1e-15));
        MeasuredRow unstable = new MeasuredRow("c", "boris", Map.of("status", "unstable", "orbit_class", "passing"),
                Map.of("energy_error.worst", 1e-15));
        MeasuredRow other = new MeasuredRow("c", "vay", Map.of(), Map.of());
        CheckResult r = Comparison.compare(List.of(a), List.of(unstable, other), new Tolerances());
        assertEquals(2, r.count(Difference.Kind.REGRESSION));
        assertEquals(1, r.count(Difference.Kind.NEW));
        assertEquals(1, r.exitCode());
        CheckResult gone = Comparison.compare(List.of(a, other), List.of(a), new Tolerances());
        assertEquals(1, gone.count(Difference.Kind.MISSING));
        assertEquals(1, gone.exitCode());
        assertEquals(0, Comparison.compare(List.of(a), List.of(a), new Tolerances()).differences().size());
    }

    /** Source: derived — a case's entry beats a metric's, a later entry (the options after the file) beats an earlier one. */
    @Test
    void tolerancePrecedence() {
        Tolerance wide = new Tolerance(1e-3, 0);
        Tolerance wider = new Tolerance(1e-2, 0);
        Tolerances t = new Tolerances().metric(Metric.DRIFT_ERROR, wide).forCase("c", Metric.DRIFT_ERROR, wider);
        assertEquals(wider, t.of("c", Metric.DRIFT_ERROR));
        assertEquals(wide, t.of("d", Metric.DRIFT_ERROR));
        assertEquals(Metric.ENERGY_ERROR.defaultTolerance(), t.of("c", Metric.ENERGY_ERROR));
        t.metric(Metric.DRIFT_ERROR, wider);
        assertEquals(wider, t.of("d", Metric.DRIFT_ERROR));
        assertEquals(Metric.INVARIANT_ERROR, Metric.of("invariant_error.l_z"));
        assertEquals(Metric.DRIFT_ERROR, Metric.of("boris_drift_error.worst"));
        assertEquals(Metric.REFERENCE_ERROR, Metric.of("full_orbit_reference_error_rho"));
    }
}
