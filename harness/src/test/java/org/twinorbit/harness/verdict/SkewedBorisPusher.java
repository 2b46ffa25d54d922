package org.twinorbit.harness.verdict;

import java.util.Set;
import org.twinorbit.fields.Field;
import org.twinorbit.integrators.fullorbit.EnsembleStepper;
import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.shared.Species;

/**
 * The relativistic Boris rotation with its factor s = 2t/(1 + t²) made 1e-4 too large, so the
 * rotation no longer keeps |u| (Boris 1970; the rotation's norm-keeping factor: Birdsall &amp;
 * Langdon, Plasma Physics via Computer Simulation, 1991, §4-4, from memory). Still declared
 * volume-preserving and time-reversible, as a broken implementation of Boris would be: the
 * energy-trend verdict must catch it. Positions and velocities are kept at the same time
 * (half kicks of the rotation about the midpoint), which keeps the scheme second order. A test
 * pusher, registered from the test class path only.
 */
public final class SkewedBorisPusher implements FullOrbitPusher {

    /** The relative error put into the rotation factor. */
    static final double SKEW = 1e-4;

    @Override public String name() { return "test-boris-skewed"; }
    @Override public String description() { return "Boris with its rotation factor off by 1e-4 (tests only)"; }
    @Override public int order() { return 2; }
    @Override public Set<String> properties() { return Set.of("relativistic", "volume-preserving", "time-reversible"); }

    @Override
    public FullOrbitStepper stepper(Field field, Species species, double dt) {
        return skewed(field, species, dt, SKEW);
    }

    /** The scheme with its rotation factor multiplied by 1 + skew. */
    static FullOrbitStepper skewed(Field field, Species species, double dt, double skew) {
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
