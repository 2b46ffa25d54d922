package org.twinorbit.harness.scan;

import java.util.List;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Invariant;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Vec3;

/** A uniform B = b0 ẑ that declares a length L, so that ε = ρ/L is defined: for unit tests only. */
record ConstantFieldWithLength(double b0, double length) implements Field {

    @Override
    public String name() {
        return "test-constant";
    }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        out.bz = b0;
    }

    @Override
    public String lengthMeaning() {
        return "a declared length";
    }

    @Override
    public boolean hasElectricField() {
        return false;
    }

    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        java.util.Arrays.fill(out, Double.NaN);
    }

    @Override
    public List<Invariant> invariants() {
        return List.of();
    }

    @Override
    public Vec3 defaultStart() {
        return Vec3.ZERO;
    }
}
