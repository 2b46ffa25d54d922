package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The irreversible μ jump in a magnetic mirror is exponentially small in 1/ε (Chirikov, Phys.
 * Rep. 52 (1979)): ln(mu_jump) must be close to linear in 1/ε over the small-ε end of the scan,
 * above the floor set by the references' own accuracy.
 */
class MirrorChirikovScanTest {

    /**
     * The references at relative tolerance 1e-10 leave a μ jump of ~2e-8 over three bounces
     * (measured at ε = 0.003); points below 100 times that floor are not used.
     */
    private static final double FLOOR = 2e-6;

    @Test
    void muJumpFallsExponentiallyInInverseEps(@TempDir Path dir) {
        ScanResult r = ScanTestSupport.run(dir, "--field", "mirror", "--phases", "8",
                "--eps-min", "0.025", "--eps-max", "0.1", "--points", "7");
        List<ScanPoint> used = r.points().stream().filter(p -> p.worst(ScanMetric.MU_JUMP) > FLOOR).toList();
        assertTrue(used.size() >= 4, "points above the floor: " + used.size());
        SimpleRegression exp = new SimpleRegression();
        SimpleRegression power = new SimpleRegression();
        for (ScanPoint p : used) {
            double y = Math.log(p.worst(ScanMetric.MU_JUMP));
            exp.addData(1 / p.eps(), y);
            power.addData(Math.log(p.eps()), y);
        }
        assertTrue(exp.getSlope() < 0, "mu_jump must fall as 1/eps grows: slope " + exp.getSlope());
        // R² of a straight line in (1/ε, ln mu_jump): 0.9 allows the gyrophase-dependent scatter
        // of single jumps that 8 phases leave in the worst case
        assertTrue(exp.getRSquare() > 0.9, "R^2 of ln(mu_jump) against 1/eps: " + exp.getRSquare());
        assertTrue(exp.getRSquare() > power.getRSquare(), "an exponential in 1/eps must fit better than a power "
                + "law: R^2 " + exp.getRSquare() + " vs " + power.getRSquare());
    }
}
