package org.twinorbit.integrators;

import java.util.List;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Invariant;
import org.twinorbit.fields.Invariants;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Vec3;

/**
 * Small fields for the full-orbit tests, beside the library: a constant B and E (pure E, E×B),
 * a smooth non-uniform field with E for one-step map tests, and fields with an edge or a NaN
 * region for the LOST / UNSTABLE checks.
 */
public abstract class TestField implements Field {

    private final String name;

    TestField(String name) {
        this.name = name;
    }

    @Override public String name() { return name; }
    @Override public double length() { return Double.POSITIVE_INFINITY; }
    @Override public String lengthMeaning() { return "test field"; }
    @Override public boolean hasElectricField() { return true; }

    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        out[0] = out[1] = out[2] = Double.NaN;
    }

    @Override public List<Invariant> invariants() { return List.of(Invariants.energy(this)); }
    @Override public Vec3 defaultStart() { return Vec3.ZERO; }

    /** Constant B (T) and E (V/m); Φ = −E·x. */
    public static TestField constant(double bx, double by, double bz, double ex, double ey, double ez) {
        boolean electric = ex != 0 || ey != 0 || ez != 0;
        return new TestField("constant") {
            @Override
            public void evaluate(double t, double x, double y, double z, FieldSample out) {
                out.clear();
                out.bx = bx;
                out.by = by;
                out.bz = bz;
                out.ex = ex;
                out.ey = ey;
                out.ez = ez;
            }

            @Override public boolean hasElectricField() { return electric; }
            @Override public boolean hasPotential() { return true; }

            @Override
            public double potential(double t, double x, double y, double z) {
                return -(ex * x + ey * y + ez * z);
            }
        };
    }

    /**
     * A smooth, bounded, non-uniform field on the scale L (m):
     * B = B0 (0.2 sin(y/L), 0.2 sin(x/L), 1 + 0.3 cos(z/L)),
     * E = E0 (1 + 0.5 sin(y/L), 0.3 cos(x/L) sin(z/L), 0.2 sin(x/L)). Neither needs to be physical for the one-step map
     * properties tested with it (volume, reversibility hold for any smooth B(x), E(x); Qin et al.
     * 2013).
     */
    public static TestField smooth(double b0, double e0, double l) {
        return new TestField("smooth") {
            @Override
            public void evaluate(double t, double x, double y, double z, FieldSample out) {
                out.clear();
                out.bx = 0.2 * b0 * Math.sin(y / l);
                out.by = 0.2 * b0 * Math.sin(x / l);
                out.bz = b0 * (1 + 0.3 * Math.cos(z / l));
                out.ex = e0 * (1 + 0.5 * Math.sin(y / l));
                out.ey = 0.3 * e0 * Math.cos(x / l) * Math.sin(z / l);
                out.ez = 0.2 * e0 * Math.sin(x / l);
            }
        };
    }

    /** Constant B = bz ẑ, no E, domain |x| < edge (m). */
    public static TestField walled(double bz, double edge) {
        return new TestField("walled") {
            @Override
            public void evaluate(double t, double x, double y, double z, FieldSample out) {
                out.clear();
                out.bz = bz;
            }

            @Override public boolean hasElectricField() { return false; }

            @Override
            public double domainMargin(double x, double y, double z) {
                return edge - Math.abs(x);
            }
        };
    }

    /** Constant B = bz ẑ that turns to NaN beyond x > edge (m): a field gone wrong. */
    public static TestField poisoned(double bz, double edge) {
        return new TestField("poisoned") {
            @Override
            public void evaluate(double t, double x, double y, double z, FieldSample out) {
                out.clear();
                out.bz = x > edge ? Double.NaN : bz;
            }

            @Override public boolean hasElectricField() { return false; }
        };
    }
}
