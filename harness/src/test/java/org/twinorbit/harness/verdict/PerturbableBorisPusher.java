package org.twinorbit.harness.verdict;

import java.util.Set;
import org.twinorbit.fields.Field;
import org.twinorbit.integrators.fullorbit.EnsembleStepper;
import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.shared.Species;

/**
 * The scheme of {@link SkewedBorisPusher} with its rotation factor off by a relative amount read
 * from the system property {@value #PROPERTY} when a stepper is made: 0 (an exact rotation) unless
 * set. A baseline can thus be written with the unperturbed pusher and checked, under the same
 * name, with a perturbed one (baseline/CheckCommandTest). A test pusher, registered from the test
 * class path only.
 */
public final class PerturbableBorisPusher implements FullOrbitPusher {

    /** The system property holding the relative error of the rotation factor. */
    public static final String PROPERTY = "twinorbit.test.perturbation";

    @Override public String name() { return "test-boris-perturbable"; }
    @Override public String description() { return "Boris with its rotation factor off by the system property " + PROPERTY + " (tests only)"; }
    @Override public int order() { return 2; }
    @Override public Set<String> properties() { return Set.of("relativistic", "volume-preserving", "time-reversible"); }

    @Override
    public FullOrbitStepper stepper(Field field, Species species, double dt) {
        double skew = Double.parseDouble(System.getProperty(PROPERTY, "0"));
        return new SimpleStepper(field, species, dt) {
            final double[] mid = new double[3];

            @Override
            void advance() {
                double ig = inverseGamma();
                for (int k = 0; k < 3; k++) {
                    mid[k] = x[k] + 0.5 * dt * u[k] * ig;
                }
                sample(t + 0.5 * dt, mid);
                double h = 0.5 * qm * dt;
                u[0] += h * f.ex;
                u[1] += h * f.ey;
                u[2] += h * f.ez;
                double g = 1.0 / inverseGamma();
                double tx = h * f.bx / g, ty = h * f.by / g, tz = h * f.bz / g;
                double s = 2.0 / (1.0 + tx * tx + ty * ty + tz * tz) * (1 + skew);
                double px = u[0] + (u[1] * tz - u[2] * ty);
                double py = u[1] + (u[2] * tx - u[0] * tz);
                double pz = u[2] + (u[0] * ty - u[1] * tx);
                u[0] += s * (py * tz - pz * ty);
                u[1] += s * (pz * tx - px * tz);
                u[2] += s * (px * ty - py * tx);
                u[0] += h * f.ex;
                u[1] += h * f.ey;
                u[2] += h * f.ez;
                ig = inverseGamma();
                for (int k = 0; k < 3; k++) {
                    x[k] = mid[k] + 0.5 * dt * u[k] * ig;
                }
            }
        };
    }

    @Override
    public EnsembleStepper ensemble(Field field, Species species, double dt, int n) {
        throw new UnsupportedOperationException("test pusher: single particles only");
    }
}
