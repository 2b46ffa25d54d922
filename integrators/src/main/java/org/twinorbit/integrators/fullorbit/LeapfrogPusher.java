package org.twinorbit.integrators.fullorbit;

import java.util.Objects;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Species;

/**
 * A member of the leapfrog family — the extension point for a new leapfrog scheme, inside this
 * package or outside it: supply only the velocity update ({@link LeapfrogUpdate}); the stepping
 * loops (field evaluation, position drift, domain and finiteness checks, the half-step start
 * and the synchronised velocity) are written once for all members. Leapfrog schemes are second
 * order. Implement {@link #name()}, {@link #description()} and {@link #properties()} too, and
 * list the class in {@code META-INF/services/org.twinorbit.integrators.fullorbit.FullOrbitPusher}
 * to make it selectable by name (examples/java-pusher shows a complete one).
 */
public abstract class LeapfrogPusher implements FullOrbitPusher {

    /** A fresh update for one loop. @param electric whether the field has an E anywhere */
    protected abstract LeapfrogUpdate newUpdate(boolean electric);

    @Override
    public final int order() {
        return 2;
    }

    @Override
    public final FullOrbitStepper stepper(Field field, Species species, double dt) {
        Objects.requireNonNull(field, "field");
        return new LeapfrogStepper(field, species, dt, newUpdate(field.hasElectricField()));
    }

    @Override
    public final FullOrbitEnsemble ensemble(Field field, Species species, double dt, int n) {
        Objects.requireNonNull(field, "field");
        return new LeapfrogEnsemble(field, species, dt, n, newUpdate(field.hasElectricField()));
    }

    @Override
    public String toString() {
        return name();
    }
}
