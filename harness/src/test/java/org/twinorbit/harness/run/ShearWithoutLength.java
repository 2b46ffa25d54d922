package org.twinorbit.harness.run;

import java.util.List;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.FieldParameters;
import org.twinorbit.fields.FieldProvider;
import org.twinorbit.fields.Invariant;
import org.twinorbit.fields.ParameterSpec;
import org.twinorbit.fields.ShearField;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * The library's shear field with no declared length, for tests only: B*∥ ≤ 0 in the shear needs
 * ρ∥ > Ls, which is ε > 1 and refused for the library field, so a test of how a guiding-center
 * model failure is reported uses this copy, for which ε is not defined.
 */
record ShearWithoutLength(ShearField shear) implements Field {

    @Override public String name() { return "test-shear-no-length"; }
    @Override public void evaluate(double t, double x, double y, double z, FieldSample out) {
        shear.evaluate(t, x, y, z, out);
    }
    @Override public double length() { return Double.POSITIVE_INFINITY; }
    @Override public String lengthMeaning() { return "none (test field)"; }
    @Override public boolean hasElectricField() { return false; }
    @Override public void vectorPotential(double t, double x, double y, double z, double[] out) {
        shear.vectorPotential(t, x, y, z, out);
    }
    @Override public List<Invariant> invariants() { return shear.invariants(); }
    @Override public Vec3 defaultStart() { return shear.defaultStart(); }

    /** Registered from the harness's test class path only. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "test-shear-no-length"; }
        @Override public String description() { return "the shear field (B0 = 1 T, Ls = 1 m) without a length"; }
        @Override public List<ParameterSpec> parameters() { return List.of(); }
        @Override public String lengthMeaning() { return "none"; }
        @Override public String invariantsMeaning() { return "energy; p_y; p_z"; }
        @Override public Field create(FieldParameters p, Species species) {
            return new ShearWithoutLength(new ShearField(1.0, 1.0));
        }
    }
}
