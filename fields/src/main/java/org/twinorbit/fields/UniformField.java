package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Vec3;

/** B = B0 ẑ everywhere, no E. */
public final class UniformField implements Field {

    private final double b0;
    private final List<Invariant> invariants;

    /** @param b0 field strength (T) */
    public UniformField(double b0) {
        this.b0 = b0;
        this.invariants = List.of(
                Invariants.energy(this),
                Invariants.of("p_x", "m u_x - q B0 y", "kg m/s", true,
                        (s, t, x, u) -> s.mass() * u[0] - s.charge() * b0 * x[1], Invariants::momentumScale),
                Invariants.of("p_y", "m u_y + q B0 x", "kg m/s", true,
                        (s, t, x, u) -> s.mass() * u[1] + s.charge() * b0 * x[0], Invariants::momentumScale),
                Invariants.of("p_z", "m u_z", "kg m/s", true,
                        (s, t, x, u) -> s.mass() * u[2], Invariants::momentumScale),
                Invariants.canonicalAngular(this, "L_z", "m R u_phi + q R A_phi, A = (B0/2)(-y, x, 0)"));
    }

    @Override public String name() { return "uniform"; }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        out.bz = b0;
    }

    @Override public double length() { return Double.POSITIVE_INFINITY; }
    @Override public String lengthMeaning() { return "none (infinite)"; }
    @Override public boolean hasElectricField() { return false; }

    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        out[0] = -0.5 * b0 * y;
        out[1] = 0.5 * b0 * x;
        out[2] = 0;
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return Vec3.ZERO; }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "uniform"; }
        @Override public String description() { return "uniform magnetic field B0 along z, no electric field"; }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("B0", 1.0, "T", "field strength"));
        }
        @Override public String lengthMeaning() { return "none: L is infinite, eps = 0"; }
        @Override public String invariantsMeaning() {
            return "energy; p_x = m u_x - q B0 y; p_y = m u_y + q B0 x; p_z; L_z = m R u_phi + q B0 R^2/2";
        }
        @Override public Field create(FieldParameters p, org.twinorbit.shared.Species species) {
            return new UniformField(p.get("B0"));
        }
    }
}
