package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * Paraxial magnetic mirror: B_z = B0 [1 + (Rm − 1) z²/Lm²], B_r = −(r/2) ∂B_z/∂z, no E.
 * The radial part makes ∇·B = 0 exactly; ∇×B is not zero (the paraxial form is not vacuum).
 * The mirror throats are at z = ±Lm where B_z = Rm B0 on the axis; a particle past them has
 * escaped.
 */
public final class MirrorField implements Field {

    private final double b0;
    private final double lm;
    /** (Rm − 1)/Lm² (1/m²). */
    private final double k;
    private final List<Invariant> invariants;

    /**
     * @param b0 field strength at the centre (T)
     * @param rm mirror ratio B(z = Lm)/B(0) on the axis, &gt; 1
     * @param lm distance from the centre to a throat (m)
     */
    public MirrorField(double b0, double rm, double lm) {
        this.b0 = b0;
        this.lm = lm;
        this.k = (rm - 1.0) / (lm * lm);
        this.invariants = List.of(
                Invariants.energy(this),
                Invariants.canonicalAngular(this, "p_phi", "m r u_phi + q r A_phi, A_phi = r B_z/2"));
    }

    @Override public String name() { return "mirror"; }

    @Override
    public void evaluateForce(double t, double x, double y, double z, FieldSample out) {
        double bk = b0 * k;
        out.bx = -bk * x * z;
        out.by = -bk * y * z;
        out.bz = b0 * (1.0 + k * z * z);
        out.ex = out.ey = out.ez = 0;
    }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        double bk = b0 * k;
        out.bx = -bk * x * z;
        out.by = -bk * y * z;
        out.bz = b0 * (1.0 + k * z * z);
        out.dB[0] = -bk * z;          // ∂Bx/∂x
        out.dB[2] = -bk * x;          // ∂Bx/∂z
        out.dB[4] = -bk * z;          // ∂By/∂y
        out.dB[5] = -bk * y;          // ∂By/∂z
        out.dB[8] = 2.0 * bk * z;     // ∂Bz/∂z
    }

    @Override public double length() { return lm; }
    @Override public String lengthMeaning() { return "Lm, the distance from the centre to a mirror throat"; }
    @Override public boolean hasElectricField() { return false; }

    @Override
    public double domainMargin(double x, double y, double z) {
        return lm - Math.abs(z);
    }

    @Override
    public String domainMeaning() {
        return "|z| < Lm; a particle past a throat has escaped";
    }

    /** A = A_φ φ̂ with A_φ = r B_z/2, i.e. A = (B_z/2)(−y, x, 0). */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        double half = 0.5 * b0 * (1.0 + k * z * z);
        out[0] = -half * y;
        out[1] = half * x;
        out[2] = 0;
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return Vec3.ZERO; }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "mirror"; }
        @Override public String description() {
            return "paraxial magnetic mirror along z, B(z) = B0 [1 + (Rm-1) z^2/Lm^2], throats at |z| = Lm";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("B0", 0.5, "T", "field strength at the centre"),
                    ParameterSpec.above("Rm", 4.0, "1", "mirror ratio B(Lm)/B(0) on the axis", 1.0),
                    ParameterSpec.positive("Lm", 1.0, "m", "distance from the centre to a throat"));
        }
        @Override public String lengthMeaning() { return "Lm, the centre-to-throat distance"; }
        @Override public String invariantsMeaning() {
            return "energy; p_phi = m r u_phi + q r A_phi with A_phi = r B_z/2";
        }
        @Override public Field create(FieldParameters p, Species species) {
            return new MirrorField(p.get("B0"), p.get("Rm"), p.get("Lm"));
        }
    }
}
