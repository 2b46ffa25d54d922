package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * Vacuum toroidal field B = B0 R0/R φ̂ about the z axis (R the cylindrical radius), no E.
 * Curvature and grad-B drifts both point along z.
 */
public final class ToroidalField implements Field {

    /**
     * The domain stops at R = AXIS_FRACTION · R0: B grows as 1/R and is singular on the axis,
     * so a particle that gets this close is recorded as lost rather than integrated through
     * a field 1000 times stronger than B0.
     */
    static final double AXIS_FRACTION = 1e-3;

    private final double b0;
    private final double r0;
    private final List<Invariant> invariants;

    /**
     * @param b0 field strength at R = R0 (T)
     * @param r0 reference major radius (m)
     */
    public ToroidalField(double b0, double r0) {
        this.b0 = b0;
        this.r0 = r0;
        this.invariants = List.of(
                Invariants.energy(this),
                Invariants.canonical(this, 2, "p_z", "m u_z + q A_z, A_z = -B0 R0 ln(R/R0)"),
                Invariants.canonicalAngular(this, "p_phi", "m R u_phi"));
    }

    @Override public String name() { return "toroidal"; }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        double c = b0 * r0;
        double r2 = x * x + y * y;
        double inv2 = 1.0 / r2;
        double inv4 = inv2 * inv2;
        out.bx = -c * y * inv2;
        out.by = c * x * inv2;
        out.dB[0] = 2.0 * c * x * y * inv4;            // ∂Bx/∂x
        out.dB[1] = -c * (x * x - y * y) * inv4;       // ∂Bx/∂y
        out.dB[3] = c * (y * y - x * x) * inv4;        // ∂By/∂x
        out.dB[4] = -2.0 * c * x * y * inv4;           // ∂By/∂y
    }

    @Override public double length() { return r0; }
    @Override public String lengthMeaning() { return "R0, the major radius where B = B0"; }
    @Override public boolean hasElectricField() { return false; }

    @Override
    public double domainMargin(double x, double y, double z) {
        return Math.hypot(x, y) - AXIS_FRACTION * r0;
    }

    @Override
    public String domainMeaning() {
        return "R > 0.001 R0 (B is singular on the z axis)";
    }

    /** A = −B0 R0 ln(R/R0) ẑ. */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        out[0] = 0;
        out[1] = 0;
        out[2] = -b0 * r0 * Math.log(Math.hypot(x, y) / r0);
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return new Vec3(r0, 0, 0); }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "toroidal"; }
        @Override public String description() {
            return "vacuum toroidal field B0 R0/R around the z axis: curvature and grad-B drift along z";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("B0", 1.0, "T", "field strength at R = R0"),
                    ParameterSpec.positive("R0", 1.0, "m", "major radius"));
        }
        @Override public String lengthMeaning() { return "R0, the major radius (field-line curvature radius there)"; }
        @Override public String invariantsMeaning() {
            return "energy; p_z = m u_z - q B0 R0 ln(R/R0); p_phi = m R u_phi";
        }
        @Override public Field create(FieldParameters p, Species species) {
            return new ToroidalField(p.get("B0"), p.get("R0"));
        }
    }
}
