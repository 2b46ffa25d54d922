package org.twinorbit.harness.scan;

import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * The one-to-one relation between ε = ρ0/L and the kinetic energy of a species at a fixed field
 * (docs/design.md "What is measured"): ρ0 = p/(|q|B0) with p the total momentum and B0 = |B| at the
 * initial guiding center, L the field's declared length. Relativistic throughout, so that an
 * electron scan reaching MeV energies reads correctly.
 */
public final class EnergyScale {

    private final Species species;
    private final double b0;
    private final double length;

    /**
     * @param field   the field; its length L must be finite
     * @param species the particle
     * @param start   the initial guiding center (m), inside the field's domain
     * @throws IllegalArgumentException when the field has no length or |B| vanishes at the start
     */
    public EnergyScale(Field field, Species species, Vec3 start) {
        if (!(field.length() > 0) || Double.isInfinite(field.length())) {
            throw new IllegalArgumentException("field '" + field.name() + "' has no length L, so eps = rho/L "
                    + "is undefined; scan a field with a finite L (see 'twinorbit fields')");
        }
        FieldSample s = new FieldSample();
        field.evaluate(0.0, start.x(), start.y(), start.z(), s);
        double b = s.bMag();
        if (!(b > 0) || Double.isInfinite(b)) {
            throw new IllegalArgumentException("|B| at the start " + start + " of field '" + field.name()
                    + "' is " + b + " T; choose a start where the field is non-zero");
        }
        this.species = species;
        this.b0 = b;
        this.length = field.length();
    }

    /** Kinetic energy (eV) at which ρ0/L equals {@code eps}. */
    public double energyEv(double eps) {
        double p = eps * length * Math.abs(species.charge()) * b0;
        return Relativity.kineticFromU(species, p / species.mass());
    }

    /** ε = ρ0/L for a kinetic energy (eV). */
    public double eps(double energyEv) {
        return Relativity.momentumFromKinetic(species, energyEv) / (Math.abs(species.charge()) * b0 * length);
    }
}
