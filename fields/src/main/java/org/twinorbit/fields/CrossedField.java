package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/** Uniform crossed fields: B = B0 ẑ, E = E0 x̂, potential Φ = −E0 x. */
public final class CrossedField implements Field {

    private final double b0;
    private final double e0;
    private final List<Invariant> invariants;

    /**
     * @param b0 magnetic field strength (T)
     * @param e0 electric field along x (V/m)
     */
    public CrossedField(double b0, double e0) {
        this.b0 = b0;
        this.e0 = e0;
        this.invariants = List.of(
                Invariants.energy(this),
                Invariants.canonical(this, 1, "p_y", "m u_y + q B0 x"),
                Invariants.of("p_z", "m u_z", "kg m/s", true,
                        (s, t, x, u) -> s.mass() * u[2], Invariants::momentumScale));
    }

    @Override public String name() { return "crossed"; }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        out.bz = b0;
        out.ex = e0;
    }

    @Override public double length() { return Double.POSITIVE_INFINITY; }
    @Override public String lengthMeaning() { return "none (infinite)"; }
    @Override public boolean hasElectricField() { return true; }
    @Override public boolean hasPotential() { return true; }

    @Override
    public double potential(double t, double x, double y, double z) {
        return -e0 * x;
    }

    /** A = (0, B0 x, 0), the gauge in which p_y is the canonical momentum. */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        out[0] = 0;
        out[1] = b0 * x;
        out[2] = 0;
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return Vec3.ZERO; }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "crossed"; }
        @Override public String description() {
            return "uniform B0 along z crossed with uniform E0 along x (E x B drift along -y)";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("B0", 1.0, "T", "magnetic field strength"),
                    ParameterSpec.any("E0", 1.0e4, "V/m", "electric field along x"));
        }
        @Override public String lengthMeaning() { return "none: L is infinite, eps = 0"; }
        @Override public String invariantsMeaning() {
            return "W = kinetic + q Phi with Phi = -E0 x; p_y = m u_y + q B0 x; p_z = m u_z";
        }
        @Override public Field create(FieldParameters p, Species species) {
            double b0 = p.get("B0");
            double e0 = p.get("E0");
            // With |E0| >= c B0 no frame removes E: there is no E x B drift and no gyration.
            if (Math.abs(e0) >= Constants.C * b0) {
                throw new FieldParameterException("parameter 'E0' of field 'crossed' must satisfy |E0| < c B0 = "
                        + Constants.C * b0 + " V/m (so that the E x B drift is slower than light), got " + e0);
            }
            return new CrossedField(b0, e0);
        }
    }
}
