package org.twinorbit.harness.verdict;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.TestCases;

/**
 * Verdicts catch deliberately broken pushers that the numbers alone would let pass: explicit
 * Euler declared second order (first order and unstable for gyration: common practice; Hairer,
 * Nørsett &amp; Wanner, Solving Ordinary Differential Equations I, 1993), and Boris with its
 * rotation factor off by 1e-4, which no longer keeps |u| in a magnetic field (Boris 1970), so
 * its energy error grows secularly instead of staying bounded as a volume-preserving,
 * time-reversible scheme's must (Hairer &amp; Lubich, 2018, from memory). The unchanged pushers
 * pass the same checks.
 */
class BrokenPushersTest {

    @TempDir
    Path tmp;

    private static List<Finding> findings(CaseResult r, String integrator) {
        return Verdicts.judge(r).stream().filter(v -> v.integrator().equals(integrator)).findFirst().orElseThrow()
                .findings();
    }

    private static boolean fails(List<Finding> f, Check c) {
        return f.stream().anyMatch(x -> x.check() == c && x.failure());
    }

    @Test
    void firstOrderSchemeDeclaredSecondOrderFailsTheOrderCheck() {
        // Euler multiplies |u| by sqrt(1 + (Ω dt)²) per step; at 512 to 4096 steps per gyroperiod
        // the energy grows by at most 4 % per gyration, so the 4-gyration sweep stays measurable
        CaseSpec s = TestCases.spec("gradient", "test-euler,boris", "none");
        s.eps = 0.01;
        s.pitch = 90.0;
        s.phases = 2;
        s.duration = 4.0;
        s.stepsPerGyro = 512;
        CaseResult r = TestCases.run(s);
        List<Finding> euler = findings(r, "test-euler");
        Finding order = euler.stream().filter(x -> x.check() == Check.ORDER).findFirst().orElseThrow();
        assertTrue(order.failure(), order.describe());
        assertTrue(order.detail().contains("declared 2"), order.detail());
        assertFalse(fails(findings(r, "boris"), Check.ORDER), findings(r, "boris").toString());
    }

    @Test
    void skewedBorisFailsTheEnergyTrendAndBorisPasses() {
        CaseSpec s = TestCases.spec("gradient", "test-boris-skewed,boris", "none");
        s.eps = 0.05;
        s.pitch = 90.0;
        s.phases = 2;
        s.duration = 20.0;
        CaseResult r = TestCases.run(s);
        List<Finding> skewed = findings(r, "test-boris-skewed");
        assertTrue(fails(skewed, Check.ENERGY_TREND), skewed.toString());
        assertTrue(findings(r, "boris").stream().noneMatch(Finding::failure), findings(r, "boris").toString());
    }

    @Test
    void quickSuiteExitsOneWithTheBrokenPushersAndNamesThem() {
        TestCommandLine.Outcome o = TestCommandLine.exec("suite", "--quick", "--quiet", "--pushers",
                "boris,test-euler,test-boris-skewed", "--out", tmp.toString());
        assertEquals(1, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("rows FAIL"), o.out());
        assertTrue(o.out().contains("/ test-euler: stable") || o.out().contains("/ test-euler: runaway"), o.out());
        assertTrue(o.out().contains("/ test-boris-skewed: energy-trend"), o.out());
        assertFalse(o.out().contains("/ boris: stable") || o.out().contains("/ boris: runaway")
                || o.out().contains("/ boris: energy-trend") || o.out().contains("/ boris: order:"), o.out());
    }

    /**
     * In a time-dependent field the energy is not conserved, so only the comparison with the
     * reference along the run can see Euler's growth of |u| (a factor sqrt(1 + (Ω dt)²) per step).
     */
    @Test
    void runExitsOneWhenEulerRunsAwayInTheRamp() {
        TestCommandLine.Outcome o = TestCommandLine.exec("run", "--field", "ramp", "--phases", "2", "--pushers",
                "test-euler,boris", "--gc-integrators", "none", "--quiet");
        assertEquals(1, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("ramp-proton / test-euler: runaway"), o.out());
        assertFalse(o.out().contains("/ boris:"), o.out());
    }
}
