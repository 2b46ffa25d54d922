package org.twinorbit.harness.verdict;

import java.util.Set;
import org.twinorbit.fields.Field;
import org.twinorbit.integrators.fullorbit.EnsembleStepper;
import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.shared.Species;

/**
 * Explicit (forward) Euler on the Lorentz equations, declared — wrongly — second order: first
 * order, and unstable for gyration, since every step multiplies |u⊥| by sqrt(1 + (Ω dt)²)
 * (common practice; Birdsall &amp; Langdon, Plasma Physics via Computer Simulation, 1991, §4-3,
 * from memory). A test pusher, registered from the test class path only.
 */
public final class ExplicitEulerPusher implements FullOrbitPusher {

    @Override public String name() { return "test-euler"; }
    @Override public String description() { return "explicit Euler, declared order 2 (deliberately wrong; tests only)"; }
    @Override public int order() { return 2; }
    @Override public Set<String> properties() { return Set.of("relativistic"); }

    @Override
    public FullOrbitStepper stepper(Field field, Species species, double dt) {
        return new SimpleStepper(field, species, dt) {
            @Override
            void advance() {
                sample(t, x);
                double ig = inverseGamma();
                double ax = qm * (f.ex + (u[1] * f.bz - u[2] * f.by) * ig);
                double ay = qm * (f.ey + (u[2] * f.bx - u[0] * f.bz) * ig);
                double az = qm * (f.ez + (u[0] * f.by - u[1] * f.bx) * ig);
                for (int k = 0; k < 3; k++) {
                    x[k] += dt * u[k] * ig;
                }
                u[0] += dt * ax;
                u[1] += dt * ay;
                u[2] += dt * az;
            }
        };
    }

    @Override
    public EnsembleStepper ensemble(Field field, Species species, double dt, int n) {
        throw new UnsupportedOperationException("test pusher: single particles only");
    }
}
