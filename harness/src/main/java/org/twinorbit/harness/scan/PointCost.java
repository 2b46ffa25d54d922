package org.twinorbit.harness.scan;

import java.util.List;
import java.util.Map;

/**
 * The estimated cost of one scan point, used only to cut a scan into shards of similar run time
 * ({@link Shard#cut}); it never changes a result.
 *
 * <p>A point integrates every gyrophase of the ensemble through both references (and through
 * each pusher or guiding-center integrator asked for). The adaptive references take a roughly
 * fixed number of steps per gyration at a given tolerance, so the cost is taken proportional to
 * the gyroperiods run:
 * <pre>
 *   cost = phases × gyroperiods(ε) × (1 + integrators)
 * </pre>
 * where {@code gyroperiods} is the duration itself when counted in gyroperiods; the time-scale
 * fields' periods converted exactly ({@link ScanField#periodInGyroperiods}, at least
 * {@link ModelErrorEvaluator#MIN_GYRO}); and for bounces and
 * sheet crossings duration/ε: a bounce or a crossing covers a length of order L at a speed of
 * order v, that is L/ρ0 = 1/ε gyroradii, about 1/ε gyroperiods up to a factor of order one set
 * by the pitch angle and the field. The estimate spans the same factor of 100 as the real costs
 * over an ε range of 100 in bounce-counted fields; results/benchmarks.md compares it with
 * measured times.
 */
final class PointCost {

    private PointCost() {}

    /** The estimated cost (gyroperiod-orbits, relative units) of each point of {@code scan}, sign-major, then pitch, then ε. */
    static double[] of(BreakdownScan scan) {
        Map<String, Object> s = scan.settings();
        double phases = ((Number) s.get("phases")).doubleValue();
        double duration = ((Number) s.get("duration")).doubleValue();
        String unit = (String) s.get("duration_unit");
        int integrators = ((List<?>) s.get("integrators")).size();
        ScanField recipe = ScanField.of((String) s.get("field"));
        double[] eps = scan.eps();
        double[] cost = new double[scan.size()];
        for (int k = 0; k < cost.length; k++) {
            double e = eps[k % eps.length];
            double gyroperiods = switch (ScanDuration.Unit.parse(unit)) {
                case GYROPERIODS -> duration;
                case FIELD_PERIODS -> Math.max(duration * recipe.periodInGyroperiods(e), ModelErrorEvaluator.MIN_GYRO);
                case BOUNCES, CROSSINGS -> duration / e;
            };
            cost[k] = phases * gyroperiods * (1 + integrators);
        }
        return cost;
    }
}
