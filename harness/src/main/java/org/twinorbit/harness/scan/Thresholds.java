package org.twinorbit.harness.scan;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** ε* for every thresholded metric, tolerance and pitch angle of a scan. */
public final class Thresholds {

    private Thresholds() {}

    /**
     * @param points     the measured points, in any order
     * @param pitches    the pitch angles scanned (degrees), in the order to report them
     * @param tolerances metric -> tolerances, in the order to report them
     * @param axis       how ε reads as an energy
     */
    public static List<Threshold> find(List<ScanPoint> points, List<Double> pitches,
                                       Map<ScanMetric, List<Double>> tolerances, ScanAxis axis) {
        List<Threshold> out = new ArrayList<>();
        for (Map.Entry<ScanMetric, List<Double>> e : tolerances.entrySet()) {
            ScanMetric m = e.getKey();
            for (double tol : e.getValue()) {
                for (double pitch : pitches) {
                    List<ScanPoint> curve = points.stream().filter(p -> p.pitchDeg() == pitch)
                            .sorted((a, b) -> Double.compare(a.eps(), b.eps())).toList();
                    double[] eps = curve.stream().mapToDouble(ScanPoint::eps).toArray();
                    double[] worst = curve.stream().mapToDouble(p -> p.worst(m)).toArray();
                    ThresholdFinder.Crossing c = ThresholdFinder.find(eps, worst, tol);
                    double energy = c.outcome() == ThresholdOutcome.CROSSED && axis.variesEnergy()
                            ? axis.energyEv().applyAsDouble(c.epsStar()) : Double.NaN;
                    out.add(new Threshold(m, tol, pitch, c.outcome(), c.epsStar(), energy));
                }
            }
        }
        return out;
    }
}
