package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * A field that only the test class path knows, registered through
 * META-INF/services in the test resources, to show that users can add fields.
 */
public final class TestAlongXField {

    private TestAlongXField() {}

    /** The provider the ServiceLoader finds: a uniform field along x. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "test-along-x"; }
        @Override public String description() { return "test only: uniform Bx"; }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("Bx", 0.5, "T", "field along x"));
        }
        @Override public String lengthMeaning() { return "none"; }
        @Override public String invariantsMeaning() { return "none declared"; }
        @Override public Field create(FieldParameters p, Species species) {
            double bx = p.get("Bx");
            return new Field() {
                @Override public String name() { return "test-along-x"; }
                @Override public void evaluate(double t, double x, double y, double z, FieldSample out) {
                    out.clear();
                    out.bx = bx;
                }
                @Override public double length() { return Double.POSITIVE_INFINITY; }
                @Override public String lengthMeaning() { return "none"; }
                @Override public boolean hasElectricField() { return false; }
                @Override public void vectorPotential(double t, double x, double y, double z, double[] out) {
                    out[0] = Double.NaN;
                    out[1] = Double.NaN;
                    out[2] = Double.NaN;
                }
                @Override public List<Invariant> invariants() { return List.of(); }
                @Override public Vec3 defaultStart() { return Vec3.ZERO; }
            };
        }
    }
}
