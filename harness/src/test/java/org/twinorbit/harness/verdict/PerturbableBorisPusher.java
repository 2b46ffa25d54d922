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
        return SkewedBorisPusher.skewed(field, species, dt, Double.parseDouble(System.getProperty(PROPERTY, "0")));
    }

    @Override
    public EnsembleStepper ensemble(Field field, Species species, double dt, int n) {
        throw new UnsupportedOperationException("test pusher: single particles only");
    }
}
