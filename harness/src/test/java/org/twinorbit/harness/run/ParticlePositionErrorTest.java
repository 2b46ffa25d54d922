package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.harness.cases.CaseSpec;

/**
 * The particle's own position error (beside the gyro-averaged center's) and the reference's own
 * μ change beside a pusher's, against closed forms in the uniform field.
 */
class ParticlePositionErrorTest {

    @Test
    void borisParticleErrorIsTheClosedFormOfItsRotation() {
        // Boris in a uniform B turns u by θ = 2 arctan(Ω dt/2) per step (Birdsall & Langdon,
        // Plasma Physics via Computer Simulation, 1991, §4-4). With u on half steps,
        // x_n = x_0 + v dt Σ e^{i(α + (k+½)θ)} = x_0 − i R_b e^{iα} (e^{inθ} − 1), a circle of radius
        // R_b = v dt / (2 sin(θ/2)) = ρ sqrt(1 + (Ω dt/2)²); the exact orbit is the same expression
        // with θ → Ω dt and R_b → ρ (geometric sum; common practice). The start takes u back by half
        // a Boris rotation, so α is the particle's own phase; what is left is the reference's error
        // (rtol 1e-10, ~1e-8 ρ0), far inside 1e-6, while the lag itself is of order 1.
        CaseSpec s = TestCases.spec("uniform", "boris", "none");
        s.pitch = 90.0;
        s.phases = 1;
        s.stepsPerGyro = 16;
        s.duration = 20.0;
        ResultRow boris = TestCases.row(TestCases.run(s), "boris");
        double w = 2 * Math.PI / 16; // Ω dt
        double theta = 2 * Math.atan(w / 2);
        int n = 16 * 20;
        double rb = Math.sqrt(1 + w * w / 4); // R_b / ρ
        double re = rb * (Math.cos(n * theta) - 1) - (Math.cos(n * w) - 1);
        double im = rb * Math.sin(n * theta) - Math.sin(n * w);
        double predicted = Math.hypot(re, im);
        double measured = boris.metric("particle_position_error_rho").worst();
        assertEquals(predicted, Math.abs(measured), 1e-6, "|x - x_ref|/rho0 after 20 gyrations");
        // Boris lags (θ < Ω dt, by 1.6 rad over the run): behind the reference particle
        assertTrue(measured < 0, "sign " + measured);
        // the gyro-averaged center of Boris in a uniform B stays where the reference's is, to
        // O((Ω dt)²): the two position errors are different quantities
        assertTrue(Math.abs(boris.metric("position_error_rho").worst()) < 0.05 * Math.abs(measured),
                "center error " + boris.metric("position_error_rho"));
    }

    @Test
    void referenceMuChangeSitsBesideThePushersAndIsTheModelRowsOwn() {
        CaseSpec s = TestCases.spec("mirror", "boris", "gc-rk4");
        s.eps = 0.05;
        s.phases = 2;
        s.duration = 20.0;
        CaseResult r = TestCases.run(s);
        ResultRow boris = TestCases.row(r, "boris");
        ResultRow model = TestCases.row(r, "gc-reference");
        // both are the exact (reference) full orbit's μ change over the same phases
        assertEquals(model.metric("mu_change").worst(), boris.metric("reference_mu_change").worst());
        // the physical ripple of the gyro-averaged μ is O(ε²) (Northrop, The Adiabatic Motion of
        // Charged Particles, 1963): well above round-off at ε = 0.05, below ε
        double ripple = boris.metric("reference_mu_change").worst();
        assertTrue(ripple > 1e-6 && ripple < 0.05, "ripple " + ripple);
        // not defined for guiding-center rows or the model row
        assertTrue(!TestCases.row(r, "gc-rk4").metric("reference_mu_change").defined());
        assertTrue(!model.metric("reference_mu_change").defined());
        assertTrue(!model.metric("particle_position_error_rho").defined());
    }

    @Test
    void uniformFieldReferenceMuChangeIsRoundOff() {
        // μ is an exact invariant of the uniform field: the reference's own change is only its tolerance
        CaseSpec s = TestCases.spec("uniform", "boris", "none");
        s.phases = 1;
        ResultRow boris = TestCases.row(TestCases.run(s), "boris");
        assertTrue(Math.abs(boris.metric("reference_mu_change").worst()) < 1e-8, boris.metric("reference_mu_change").toString());
    }
}
