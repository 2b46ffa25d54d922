package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * In {@code wave}, B = B0 ẑ and E = E0 sin(ωt) x̂, the exact driven solution of the forced
 * oscillator (common practice) is v_x = (E0/B0)(r/(1 − r²)) cos ωt, v_y = −(E0/B0)(1/(1 − r²))
 * sin ωt with r = ω/Ω: the E×B drift plus the polarization drift. The guiding-center model has
 * only v_y = −(E0/B0) sin ωt, so the RMS of the velocity difference over the RMS of the driven
 * velocity is sqrt(r² + r⁴)/sqrt(1 + r²) = r exactly: the relative drift error equals ω/Ω.
 */
class WaveDriftScanTest {

    @Test
    void missingPolarizationDriftGivesErrorOmegaOverOmegaC() {
        ScanRequest.Built setup = ScanTestSupport.setup("--field", "wave", "--phases", "4");
        for (double r : new double[] {0.02, 0.05, 0.1}) {
            Map<String, Double> m = setup.evaluator().measure(r, 1e3, 90.0);
            // Two wave periods hold 2/r gyrations; the gyro-averaged track covers all but about
            // one of them, so the RMS misses up to r/2 of a period (5 % at r = 0.1), and gyro-
            // averaging shrinks the full orbit's oscillation by sin(πr)/(πr) (1.6 % at r = 0.1):
            // 8 % of r covers both.
            assertEquals(r, m.get("drift_error_mean"), 0.08 * r, "mean at omega/Omega = " + r);
            assertEquals(r, m.get("drift_error_worst"), 0.08 * r, "worst at omega/Omega = " + r);
        }
    }
}
