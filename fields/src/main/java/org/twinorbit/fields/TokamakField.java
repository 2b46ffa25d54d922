package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * A tokamak with circular flux surfaces, no E: B = B0 R0/R φ̂ + (ψ'(r)/R) θ̂, with
 * r = sqrt((R − R0)² + Z²) the minor radius, θ̂ = (−sin θ, cos θ) in the (R, Z) plane,
 * ψ'(r) = B0 r/q(r) and the safety-factor profile q(r) = q0 + (qa − q0) r²/a².
 *
 * <p>Written with g = B0/q, the poloidal part is B_R = −g Z/R, B_Z = g (R − R0)/R; g depends on
 * s = r² only, so every derivative is smooth on the magnetic axis. The poloidal flux
 * ψ = (B0/2k) ln(1 + k r²/q0), k = (qa − q0)/a² (ψ = B0 r²/(2 q0) when k = 0) satisfies
 * B_pol = ∇ψ × ∇φ, so A = −B0 R0 ln(R/R0) Ẑ + (ψ/R) φ̂.
 */
public final class TokamakField implements Field {

    private final double r0;
    private final double a;
    private final double b0;
    private final double q0;
    /** (qa − q0)/a² (1/m²). */
    private final double k;
    private final List<Invariant> invariants;

    /**
     * @param r0 major radius (m)
     * @param a  minor radius of the last flux surface (m), &lt; R0
     * @param b0 toroidal field at R = R0 (T)
     * @param q0 safety factor on the magnetic axis
     * @param qa safety factor at r = a
     */
    public TokamakField(double r0, double a, double b0, double q0, double qa) {
        this.r0 = r0;
        this.a = a;
        this.b0 = b0;
        this.q0 = q0;
        this.k = (qa - q0) / (a * a);
        this.invariants = List.of(
                Invariants.energy(this),
                Invariants.canonicalAngular(this, "p_phi", "m R u_phi + q psi(r)"));
    }

    @Override public String name() { return "tokamak"; }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        double c = b0 * r0;
        double rr2 = x * x + y * y;
        double rr = Math.sqrt(rr2);
        double dr = rr - r0;
        double s = dr * dr + z * z;
        double qs = q0 + k * s;
        double g = b0 / qs;
        double gs = -k * g / qs;                // dg/ds
        double gx = gs * 2.0 * dr * x / rr;    // ∂g/∂x
        double gy = gs * 2.0 * dr * y / rr;
        double gz = gs * 2.0 * z;
        double inv2 = 1.0 / rr2;
        double inv4 = inv2 * inv2;

        double n = -(g * z * x + c * y);        // Bx = n/R²
        double m = -g * z * y + c * x;          // By = m/R²
        double ratio = 1.0 - r0 / rr;           // (R − R0)/R
        out.bx = n * inv2;
        out.by = m * inv2;
        out.bz = g * ratio;

        out.dB[0] = -(gx * z * x + g * z) * inv2 - 2.0 * x * n * inv4;
        out.dB[1] = -(gy * z * x + c) * inv2 - 2.0 * y * n * inv4;
        out.dB[2] = -(gz * z * x + g * x) * inv2;
        out.dB[3] = (-gx * z * y + c) * inv2 - 2.0 * x * m * inv4;
        out.dB[4] = (-gy * z * y - g * z) * inv2 - 2.0 * y * m * inv4;
        out.dB[5] = (-gz * z * y - g * y) * inv2;
        double rr3 = rr2 * rr;
        out.dB[6] = gx * ratio + g * r0 * x / rr3;
        out.dB[7] = gy * ratio + g * r0 * y / rr3;
        out.dB[8] = gz * ratio;
    }

    /**
     * Poloidal flux per radian ψ(r) (T m²).
     *
     * @param s the squared minor radius r² (m²)
     */
    public double psi(double s) {
        if (k == 0) {
            return b0 * s / (2.0 * q0);
        }
        return b0 / (2.0 * k) * Math.log1p(k * s / q0);
    }

    @Override public double length() { return r0; }
    @Override public String lengthMeaning() { return "R0, the major radius"; }
    @Override public boolean hasElectricField() { return false; }

    @Override
    public double domainMargin(double x, double y, double z) {
        double dr = Math.hypot(x, y) - r0;
        return a - Math.hypot(dr, z);
    }

    @Override
    public String domainMeaning() {
        return "minor radius r < a; a particle reaching r = a is lost to the wall";
    }

    /** A = −B0 R0 ln(R/R0) Ẑ + (ψ/R) φ̂. */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        double rr2 = x * x + y * y;
        double rr = Math.sqrt(rr2);
        double dr = rr - r0;
        double p = psi(dr * dr + z * z) / rr2;
        out[0] = -p * y;
        out[1] = p * x;
        out[2] = -b0 * r0 * Math.log(rr / r0);
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return new Vec3(r0 + 0.5 * a, 0, 0); }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "tokamak"; }
        @Override public String description() {
            return "tokamak with circular flux surfaces and safety factor q0 + (qa-q0) r^2/a^2";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("R0", 1.5, "m", "major radius"),
                    ParameterSpec.positive("a", 0.5, "m", "minor radius of the last flux surface, < R0"),
                    ParameterSpec.positive("B0", 2.0, "T", "toroidal field at R = R0"),
                    ParameterSpec.positive("q0", 1.1, "1", "safety factor on the magnetic axis"),
                    ParameterSpec.positive("qa", 3.5, "1", "safety factor at r = a"));
        }
        @Override public String lengthMeaning() { return "R0, the major radius"; }
        @Override public String invariantsMeaning() {
            return "energy; p_phi = m R u_phi + q psi(r), psi = (B0/2k) ln(1 + k r^2/q0), k = (qa-q0)/a^2";
        }
        @Override public Field create(FieldParameters p, Species species) {
            double r0 = p.get("R0");
            double a = p.get("a");
            if (a >= r0) {
                throw new FieldParameterException("parameter 'a' of field 'tokamak' must be < R0 = " + r0
                        + " m (the plasma must not reach the major axis), got " + a);
            }
            return new TokamakField(r0, a, p.get("B0"), p.get("q0"), p.get("qa"));
        }
    }
}
