package org.twinorbit.integrators.fullorbit;

import java.util.Objects;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Species;

/**
 * A member of the leapfrog family: supplies only its velocity update; the stepping loops are
 * {@link LeapfrogStepper} and {@link LeapfrogEnsemble}. Leapfrog schemes are second order.
 */
abstract class LeapfrogPusher implements FullOrbitPusher {

    /** A fresh update for one loop. @param electric whether the field has an E anywhere */
    abstract LeapfrogUpdate newUpdate(boolean electric);

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
