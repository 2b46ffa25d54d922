package org.twinorbit.integrators.guidingcenter;

import java.util.Set;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Species;

/**
 * A fixed-step integrator of the first-order relativistic guiding-center equations
 * ({@link GuidingCenterEquations}). Discovered through {@link java.util.ServiceLoader}: list the
 * class in {@code META-INF/services/org.twinorbit.integrators.GuidingCenterIntegrator}.
 */
public interface GuidingCenterIntegrator {

    /** Stable name used in tables, options and tests (e.g. {@code gc-rk4}). */
    String name();

    /** One line: the method and its source. */
    String description();

    /** Order of accuracy of the global error in dt. */
    int order();

    /** Properties such as "relativistic". */
    Set<String> properties();

    /**
     * A stepper for one guiding center. @param mu magnetic moment p⊥²/(2mB) (J/T)
     * @param dt time step (s)
     */
    GuidingCenterStepper stepper(Field field, Species species, double mu, double dt);
}
