package org.twinorbit.integrators;

import java.util.Arrays;
import java.util.List;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Invariant;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Vec3;

/**
 * Test-only field: the force-free sheared field B = B0 (0, sin(x/Ls), cos(x/Ls)) (|B| = B0,
 * ∇×b = b/Ls) plus a uniform E = E0 ẑ. On the plane x = 0 a guiding center is accelerated along
 * b = ẑ at constant rate qE0 while B*∥ = B0 + p∥/(q Ls) falls linearly: a constructed case in
 * which the guiding-center model reaches B*∥ = 0 at a time known in closed form.
 */
final class GcShearTestField implements Field {

    private final double b0;
    private final double ls;
    private final double e0;

    /** @param b0 (T) @param ls shear length (m) @param e0 axial electric field (V/m) */
    GcShearTestField(double b0, double ls, double e0) {
        this.b0 = b0;
        this.ls = ls;
        this.e0 = e0;
    }

    @Override public String name() { return "test-shear-with-axial-e"; }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        double s = Math.sin(x / ls), c = Math.cos(x / ls);
        out.by = b0 * s;
        out.bz = b0 * c;
        out.ez = e0;
        out.dB[3] = b0 * c / ls; // ∂By/∂x
        out.dB[6] = -b0 * s / ls; // ∂Bz/∂x
    }

    @Override public double length() { return ls; }
    @Override public String lengthMeaning() { return "Ls"; }
    @Override public boolean hasElectricField() { return true; }
    @Override public boolean hasPotential() { return true; }
    @Override public double potential(double t, double x, double y, double z) { return -e0 * z; }

    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        Arrays.fill(out, Double.NaN);
    }

    @Override public List<Invariant> invariants() { return List.of(); }
    @Override public Vec3 defaultStart() { return Vec3.ZERO; }
}
