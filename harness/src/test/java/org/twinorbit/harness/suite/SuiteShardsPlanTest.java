package org.twinorbit.harness.suite;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.scan.ShardRuns;

/** The cut of the full suite: its cases and the safe-use map's points in one balanced, deterministic plan. */
class SuiteShardsPlanTest {

    /**
     * Longest-processing-time-first (Graham, "Bounds on multiprocessing timing anomalies", 1969):
     * the largest part is within 4/3 of the best possible, itself at least max(total/K, largest unit).
     */
    @Test
    void casesAndSafeUsePointsAreCutTogetherWithinGrahamsBound() {
        List<Case> cases = ValidationSuite.cases(false);
        for (int k : new int[] {3, 8}) {
            SuiteShards.Plan plan = SuiteShards.plan(cases, true, k);
            double[] points = ShardRuns.safeUseCosts(plan.safeUse());
            assertEquals(cases.size() + points.length, plan.part().length, "one part per case and point");
            assertArrayEquals(plan.part(), SuiteShards.plan(cases, true, k).part(), "deterministic");
            double[] load = new double[k];
            double total = 0;
            double largest = 0;
            for (int i = 0; i < plan.part().length; i++) {
                double c = i < cases.size() ? SuiteShards.cost(cases.get(i)) : points[i - cases.size()];
                assertTrue(c > 0 && Double.isFinite(c), "cost of unit " + i);
                load[plan.part()[i]] += c;
                total += c;
                largest = Math.max(largest, c);
            }
            double best = Math.max(total / k, largest);
            for (int s = 0; s < k; s++) {
                assertTrue(load[s] <= 4.0 / 3 * best * (1 + 1e-12), "shard " + s + " of " + k + ": " + load[s]
                        + " > 4/3 of " + best);
            }
        }
        assertEquals(0, SuiteShards.plan(cases, false, 3).part().length - cases.size(), "no map, cases only");
    }
}
