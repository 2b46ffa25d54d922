package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * A force-free sheared field: B = B0 (sin(x/Ls) ŷ + cos(x/Ls) ẑ), no E. |B| is constant and the
 * field lines are straight; only their direction turns with x (∇×B = B/Ls).
 */
public final class ShearField implements Field {

    private final double b0;
    private final double ls;
    private final List<Invariant> invariants;

    /**
     * @param b0 field strength (T)
     * @param ls shear length (m): the field turns by one radian over Ls
     */
    public ShearField(double b0, double ls) {
        this.b0 = b0;
        this.ls = ls;
        this.invariants = List.of(
                Invariants.energy(this),
                Invariants.canonical(this, 1, "p_y", "m u_y + q Ls B_y"),
                Invariants.canonical(this, 2, "p_z", "m u_z + q Ls B_z"));
    }

    @Override public String name() { return "shear"; }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        double s = Math.sin(x / ls);
        double c = Math.cos(x / ls);
        out.by = b0 * s;
        out.bz = b0 * c;
        out.dB[3] = b0 / ls * c;     // ∂By/∂x
        out.dB[6] = -b0 / ls * s;    // ∂Bz/∂x
    }

    @Override public double length() { return ls; }
    @Override public String lengthMeaning() { return "Ls, the length over which the field turns by one radian"; }
    @Override public boolean hasElectricField() { return false; }

    /** A = Ls B. */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        out[0] = 0;
        out[1] = ls * b0 * Math.sin(x / ls);
        out[2] = ls * b0 * Math.cos(x / ls);
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return Vec3.ZERO; }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "shear"; }
        @Override public String description() {
            return "force-free sheared field B0 (sin(x/Ls) y + cos(x/Ls) z): constant |B|, turning direction";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("B0", 1.0, "T", "field strength"),
                    ParameterSpec.positive("Ls", 1.0, "m", "shear length (one radian of turn)"));
        }
        @Override public String lengthMeaning() { return "Ls, the shear length"; }
        @Override public String invariantsMeaning() {
            return "energy; p_y = m u_y + q Ls B_y; p_z = m u_z + q Ls B_z";
        }
        @Override public Field create(FieldParameters p, Species species) {
            return new ShearField(p.get("B0"), p.get("Ls"));
        }
    }
}
