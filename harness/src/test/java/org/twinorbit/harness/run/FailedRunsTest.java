package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/** A run whose model breaks down is reported with its status and time; the others go on. */
class FailedRunsTest {

    @Test
    void guidingCenterModelFailureIsReportedAndFullOrbitsContinue() {
        // In the force-free shear field ∇×b = b/Ls, so B*∥ = B0 + p∥/(q Ls) (Littlejohn, J. Plasma Phys. 29 (1983), with
        // b·∇×b = 1/Ls for this field): a proton moving against b with ρ∥ = |p∥|/(qB0) > Ls starts
        // with B*∥ < 0, where the guiding-center model does not exist.
        Species p = Species.PROTON;
        double momentum = 2.0 * p.charge() * 1.0 * 1.0; // ρ0 = 2 Ls with B0 = 1 T, Ls = 1 m
        double ev = Relativity.kineticFromU(p, momentum / p.mass());
        // ε = ρ0/Ls = 2 is refused for the library field; its copy without a length runs it
        CaseSpec s = TestCases.spec("test-shear-no-length", "boris", "gc-rk4");
        s.energy = ev;
        s.pitch = 180.0;
        s.phases = 2;
        // the shared guiding center starts at t = 0, where B*par is already negative
        s.gcStart = "shared";
        s.duration = 5.0;
        CaseResult r = TestCases.run(s);
        ResultRow model = TestCases.row(r, "gc-reference");
        assertEquals("model-failure", model.status());
        assertEquals(0.0, model.statusTime());
        assertEquals("model-failure", TestCases.row(r, "gc-rk4").status());
        ResultRow boris = TestCases.row(r, "boris");
        assertEquals("ok", boris.status());
        assertTrue(Double.isNaN(boris.statusTime()));
        // the full orbit ran its whole course: 5 gyroperiods of 32 steps
        assertEquals(5 * 32, boris.steps());
        assertTrue(boris.metric("energy_error").worst() < 1e-12, "Boris energy " + boris.metric("energy_error"));
    }
}
