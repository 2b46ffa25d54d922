package org.twinorbit.integrators.fullorbit;

import java.util.Objects;
import java.util.Set;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Species;

/**
 * Classic fourth-order Runge–Kutta on the Lorentz equations in (x, u) (W. Kutta, Z. Math. Phys.
 * 46, 1901; E. Hairer, S. P. Nørsett & G. Wanner, Solving Ordinary Differential Equations I,
 * 1993, §II.1, section from memory). Four field evaluations per step. Not symplectic: in a pure magnetic field it
 * loses energy secularly, by about (Ω Δt)⁶/144 per step (the amplification factor of RK4 for
 * an oscillator; Hairer, Nørsett & Wanner §IV.2, section from memory), which is the contrast to the leapfrog schemes.
 */
public final class LorentzRk4Pusher implements FullOrbitPusher {

    /** The stable name. */
    public static final String NAME = "rk4";

    @Override public String name() { return NAME; }

    @Override
    public String description() {
        return "classic 4th-order Runge-Kutta on the Lorentz equations (Kutta 1901)";
    }

    @Override public int order() { return 4; }

    @Override
    public Set<String> properties() {
        return Set.of("relativistic");
    }

    @Override
    public FullOrbitStepper stepper(Field field, Species species, double dt) {
        Objects.requireNonNull(field, "field");
        return new LorentzRk4Stepper(new LorentzEquations(field, species), dt);
    }

    @Override
    public FullOrbitEnsemble ensemble(Field field, Species species, double dt, int n) {
        Objects.requireNonNull(field, "field");
        return new LorentzRk4Ensemble(field, species, dt, n);
    }

    @Override
    public String toString() {
        return NAME;
    }
}
