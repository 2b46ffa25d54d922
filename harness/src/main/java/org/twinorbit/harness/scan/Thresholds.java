package org.twinorbit.harness.scan;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.run.PhaseStatistic;

/** ε* for every thresholded metric, tolerance and pitch angle of a scan. */
public final class Thresholds {

    private Thresholds() {}

    /**
     * @param points     the measured points, in any order
     * @param pitches    the pitch angles scanned (degrees), in the order to report them
     * @param tolerances metric -> tolerances, in the order to report them
     * @param axis       how ε reads as an energy
     * @param statistic  which summary over the gyrophase ensemble is compared with a tolerance
     */
    public static List<Threshold> find(List<ScanPoint> points, List<Double> pitches,
                                       Map<ScanMetric, List<Double>> tolerances, ScanAxis axis,
                                       PhaseStatistic statistic) {
        return find(points, pitches, List.of(ChargeSigns.GIVEN), tolerances, axis, statistic);
    }

    /**
     * As {@link #find(List, List, Map, ScanAxis, PhaseStatistic)}, for every charge sign scanned
     * ({@link ChargeSigns}): sign-major, then metric, tolerance and pitch.
     */
    public static List<Threshold> find(List<ScanPoint> points, List<Double> pitches, List<Integer> signs,
                                       Map<ScanMetric, List<Double>> tolerances, ScanAxis axis,
                                       PhaseStatistic statistic) {
        List<Threshold> out = new ArrayList<>();
        for (int sign : signs) {
            for (Map.Entry<ScanMetric, List<Double>> e : tolerances.entrySet()) {
                ScanMetric m = e.getKey();
                for (double tol : e.getValue()) {
                    for (double pitch : pitches) {
                        List<ScanPoint> curve = points.stream().filter(p -> p.pitchDeg() == pitch && p.chargeSign() == sign)
                                .sorted((a, b) -> Double.compare(a.eps(), b.eps())).toList();
                        double[] eps = curve.stream().mapToDouble(ScanPoint::eps).toArray();
                        // a point lost by both models (a loss cone) measures no breakdown: only the
                        // class comparison applies there
                        boolean classes = m == ScanMetric.CLASS_CHANGE;
                        double[] error = curve.stream()
                                .mapToDouble(p -> classes || !lost(p) ? p.magnitude(m, statistic) : Double.NaN).toArray();
                        boolean allLost = !curve.isEmpty() && curve.stream().allMatch(Thresholds::lost);
                        ThresholdFinder.Crossing c = allLost && !classes
                                ? new ThresholdFinder.Crossing(ThresholdOutcome.LOST, Double.NaN)
                                : ThresholdFinder.find(eps, error, tol);
                        double firstLost = curve.stream().filter(Thresholds::lost).mapToDouble(ScanPoint::eps)
                                .min().orElse(Double.NaN);
                        if (!classes && c.outcome() == ThresholdOutcome.NOT_REACHED && !Double.isNaN(firstLost)) {
                            // "safe over the whole range" would hide that the particle escapes above firstLost
                            c = new ThresholdFinder.Crossing(ThresholdOutcome.LOST_ABOVE, firstLost);
                        }
                        boolean hasEps = c.outcome() == ThresholdOutcome.CROSSED || c.outcome() == ThresholdOutcome.LOST_ABOVE;
                        double energy = hasEps && axis.variesEnergy()
                                ? axis.energyEv().applyAsDouble(c.epsStar()) : Double.NaN;
                        out.add(new Threshold(m, tol, statistic, pitch, c.outcome(), c.epsStar(), energy, sign));
                    }
                }
            }
        }
        return out;
    }

    /** True when both models lost the particle of this point (its {@code lost} value is 1). */
    static boolean lost(ScanPoint p) {
        return p.value("lost") == 1.0;
    }
}
