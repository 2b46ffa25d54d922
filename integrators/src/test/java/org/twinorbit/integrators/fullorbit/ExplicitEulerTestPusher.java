package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.OrbitStatus;
import java.util.Set;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Species;

/**
 * A pusher that lives only on the test class path, registered through
 * {@code src/test/resources/META-INF/services}, as a user's jar would add one: explicit
 * (forward) Euler on the Lorentz equations (Euler 1768; Hairer, Nørsett &amp; Wanner, Solving
 * ODEs I, 1993, §I.7, section from memory).
 */
public final class ExplicitEulerTestPusher implements FullOrbitPusher {

    @Override public String name() { return "test-explicit-euler"; }
    @Override public String description() { return "explicit Euler, for the registry test only"; }
    @Override public int order() { return 1; }
    @Override public Set<String> properties() { return Set.of("relativistic"); }

    @Override
    public FullOrbitStepper stepper(Field field, Species species, double dt) {
        LorentzEquations eq = new LorentzEquations(field, species);
        double[] y = new double[6], dy = new double[6];
        return new FullOrbitStepper() {
            private double t0;
            private long steps;

            @Override
            public void start(double t0, double[] x0, double[] u0) {
                this.t0 = t0;
                System.arraycopy(x0, 0, y, 0, 3);
                System.arraycopy(u0, 0, y, 3, 3);
                steps = 0;
            }

            @Override
            public boolean step() {
                eq.derivatives(time(), y, dy);
                for (int i = 0; i < 6; i++) {
                    y[i] += dt * dy[i];
                }
                steps++;
                return true;
            }

            @Override public OrbitStatus status() { return OrbitStatus.OK; }
            @Override public double time() { return t0 + steps * dt; }
            @Override public void position(double[] out) { System.arraycopy(y, 0, out, 0, 3); }
            @Override public void velocity(double[] out) { System.arraycopy(y, 3, out, 0, 3); }
            @Override public long steps() { return steps; }
            @Override public long fieldEvaluations() { return eq.evaluations(); }
        };
    }

    @Override
    public EnsembleStepper ensemble(Field field, Species species, double dt, int n) {
        throw new UnsupportedOperationException("not needed by the registry test");
    }
}
