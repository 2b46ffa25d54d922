package org.twinorbit.harness.verdict;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.run.TestCases;
import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.fullorbit.EnsembleStepper;
import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.integrators.fullorbit.Pushers;
import org.twinorbit.shared.Species;

/**
 * A pusher whose own code throws (here an IllegalArgumentException after 20 steps, which must
 * not pass for the user's bad input) gets the status {@code failed} with what it threw; every
 * other row and both references are still computed, and the verdict fails (exit 1). The rule
 * that one integrator's failure never costs the others is the project's (docs/design.md, bad
 * input; derived).
 */
class ThrowingPusherTest {

    /** Boris that throws at its 20th step. */
    static final class ThrowingPusher implements FullOrbitPusher {
        @Override public String name() { return "test-throwing"; }
        @Override public String description() { return "throws after 20 steps (tests only)"; }
        @Override public int order() { return 2; }
        @Override public Set<String> properties() { return Set.of("relativistic"); }

        @Override
        public FullOrbitStepper stepper(Field field, Species species, double dt) {
            FullOrbitStepper boris = Pushers.byName("boris").stepper(field, species, dt);
            return new FullOrbitStepper() {
                @Override public void start(double t0, double[] x0, double[] u0) { boris.start(t0, x0, u0); }
                @Override public boolean step() {
                    if (boris.steps() == 20) {
                        throw new IllegalArgumentException("index 20 out of bounds in my buffer");
                    }
                    return boris.step();
                }
                @Override public OrbitStatus status() { return boris.status(); }
                @Override public double time() { return boris.time(); }
                @Override public void position(double[] out) { boris.position(out); }
                @Override public void velocity(double[] out) { boris.velocity(out); }
                @Override public long steps() { return boris.steps(); }
                @Override public long fieldEvaluations() { return boris.fieldEvaluations(); }
            };
        }

        @Override
        public EnsembleStepper ensemble(Field field, Species species, double dt, int n) {
            throw new UnsupportedOperationException();
        }
    }

    @Test
    void aThrowingPusherFailsItsOwnRowOnly() {
        CaseSpec s = TestCases.spec("gradient", "boris", "gc-rk4");
        s.eps = 0.02;
        s.phases = 2;
        s.duration = 5.0;
        CaseResult r = new CaseRunner(2, true).with(List.of(new ThrowingPusher())).run(TestCases.build(s));
        ResultRow bad = TestCases.row(r, "test-throwing");
        assertEquals("failed", bad.status());
        ResultRow boris = TestCases.row(r, "boris");
        assertEquals("ok", boris.status());
        assertTrue(boris.metric("energy_error").worst() < 1e-12);
        List<RowVerdict> v = Verdicts.judge(r);
        RowVerdict thrown = v.stream().filter(x -> x.integrator().equals("test-throwing")).findFirst().orElseThrow();
        assertTrue(thrown.failed());
        assertTrue(thrown.findings().get(0).detail().contains("IllegalArgumentException: index 20 out of bounds"),
                thrown.findings().toString());
        assertFalse(v.stream().filter(x -> x.integrator().equals("boris")).findFirst().orElseThrow().failed());
        assertEquals(VerdictReport.CHECK_FAILED, VerdictReport.exitCode(v));
    }
}
