package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * A Harris-type current sheet with a normal component: B = B0 tanh(z/δ) x̂ + Bn ẑ, no E.
 * Field lines are sharply bent at z = 0, with curvature radius R_c = δ Bn/B0 there.
 */
public final class CurrentSheetField implements Field {

    private static final double LN2 = Math.log(2.0);

    private final double b0;
    private final double bn;
    private final double delta;
    private final List<Invariant> invariants;

    /**
     * @param b0    lobe field strength far from the sheet (T)
     * @param bn    normal field across the sheet (T)
     * @param delta half-thickness of the sheet (m)
     */
    public CurrentSheetField(double b0, double bn, double delta) {
        this.b0 = b0;
        this.bn = bn;
        this.delta = delta;
        this.invariants = List.of(
                Invariants.energy(this),
                Invariants.canonical(this, 1, "p_y", "m u_y + q A_y, A_y = -B0 delta ln cosh(z/delta) + Bn x"));
    }

    @Override public String name() { return "current-sheet"; }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        double zeta = z / delta;
        double sech = 1.0 / Math.cosh(zeta);   // 1/∞ = 0 far out, where 1 − tanh² would lose all digits
        out.bx = b0 * Math.tanh(zeta);
        out.bz = bn;
        out.dB[2] = b0 / delta * sech * sech;
    }

    /** ln cosh ζ without overflow: for |ζ| ≥ 1, ln cosh ζ = |ζ| + ln(1 + e^(−2|ζ|)) − ln 2. */
    static double logCosh(double zeta) {
        double a = Math.abs(zeta);
        if (a < 1.0) {
            return Math.log(Math.cosh(a));
        }
        return a + Math.log1p(Math.exp(-2.0 * a)) - LN2;
    }

    /** The curvature radius δ Bn/B0 (m) of the field lines at z = 0. */
    public double curvatureRadius() {
        return delta * bn / b0;
    }

    @Override public double length() { return curvatureRadius(); }
    /** κ = sqrt(R_c/ρ) is defined with ρ in Bn, so ε is too, wherever the particle starts. */
    @Override public double epsilonFieldStrength(double bAtStart) { return bn; }
    /** The sheet is the plane z = 0, where B_x reverses. */
    @Override public double[] sheetNormal() { return new double[] {0, 0, 1}; }
    @Override public String lengthMeaning() {
        return "R_c = delta Bn/B0, the field-line curvature radius at z = 0 (rho taken in Bn)";
    }
    @Override public boolean hasElectricField() { return false; }

    /** A = (0, −B0 δ ln cosh(z/δ) + Bn x, 0). */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        out[0] = 0;
        out[1] = -b0 * delta * logCosh(z / delta) + bn * x;
        out[2] = 0;
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return Vec3.ZERO; }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "current-sheet"; }
        @Override public String description() {
            return "current sheet B0 tanh(z/delta) along x plus a normal field Bn along z (magnetotail-like)";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("B0", 20e-9, "T", "lobe field far from the sheet"),
                    ParameterSpec.positive("Bn", 2e-9, "T", "normal field across the sheet"),
                    ParameterSpec.positive("delta", 6.4e6, "m", "sheet half-thickness"));
        }
        @Override public String lengthMeaning() {
            return "R_c = delta Bn/B0, the curvature radius at z = 0; rho taken in Bn";
        }
        @Override public String invariantsMeaning() {
            return "energy; p_y = m u_y + q (-B0 delta ln cosh(z/delta) + Bn x)";
        }
        @Override public Field create(FieldParameters p, Species species) {
            return new CurrentSheetField(p.get("B0"), p.get("Bn"), p.get("delta"));
        }
    }
}
