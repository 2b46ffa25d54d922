package org.twinorbit.integrators.fullorbit;

import java.util.Set;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Species;

/**
 * A fixed-step full-orbit scheme for the Lorentz equations dx/dt = u/γ, du/dt = (q/m)(E + u×B/γ)
 * with u = γv. Discovered through {@link java.util.ServiceLoader}: list the class in
 * {@code META-INF/services/org.twinorbit.integrators.fullorbit.FullOrbitPusher}.
 */
public interface FullOrbitPusher {

    /** Stable name used in tables, options and tests (e.g. {@code boris}). */
    String name();

    /** One line: the method and its source. */
    String description();

    /** Order of accuracy of the global error in dt. */
    int order();

    /** Properties such as "relativistic", "volume-preserving", "time-reversible". */
    Set<String> properties();

    /** A stepper for one particle with its own buffers. @param dt time step (s) */
    FullOrbitStepper stepper(Field field, Species species, double dt);

    /** A stepper for n particles held in flat arrays. @param dt time step (s) */
    EnsembleStepper ensemble(Field field, Species species, double dt, int n);
}
