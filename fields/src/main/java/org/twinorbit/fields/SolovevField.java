package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * A shaped tokamak: the analytic Solov'ev equilibrium (Solov'ev, Sov. Phys. JETP 26, 400, 1968)
 * in the up-down symmetric form of Cerfon &amp; Freidberg (Phys. Plasmas 17, 032502, 2010) with
 * elongation κ and triangularity δ, ψ = ψ0 ψ̄(R/R0, Z/R0) ({@link SolovevFlux}), no E.
 *
 * <p>Profiles (Cerfon &amp; Freidberg 2010, Eq. 3–4): μ0 p(ψ) = −(1 − A) ψ0 ψ / R0⁴ and
 * F²(ψ) = R0² B0² − 2 A ψ0 ψ / R0², so that Δ*ψ = −μ0 R² p' − F F' is solved exactly. ψ = 0 on the
 * last closed flux surface, which is the domain's edge; B0 is the vacuum toroidal field at R0.
 * The scale ψ0 is set by the safety factor on the axis, q0 = F/(R √(ψ_RR ψ_ZZ)) there. ψ0 &lt; 0:
 * ψ is largest on the axis, the plasma current and B0 both run along +φ.
 *
 * <p>Field convention: {@link AxisymmetricEquilibrium} (COCOS 3, ψ per radian); p_φ = m R u_φ + q ψ
 * is the exact invariant. L = R0, as for the circular tokamak, so ε of the two tokamaks compare.
 */
public final class SolovevField implements AxisymmetricEquilibrium {

    /** Vacuum permeability (H/m), CODATA 2018. */
    static final double MU0 = 1.25663706212e-6;

    private final double r0;
    private final double minor;
    private final double b0;
    private final double q0;
    private final double psi0;
    private final SolovevFlux flux;
    private final double axisX;
    private final double psiBarAxis;
    /** |∂ψ̄/∂x| at the outer equatorial point: turns −ψ̄ into a distance there. */
    private final double edgeGradient;
    private final List<Invariant> invariants;

    /**
     * @param r0    major radius (m)
     * @param a     minor radius (m), &lt; R0
     * @param kappa elongation
     * @param delta triangularity
     * @param b0    vacuum toroidal field at R0 (T), &gt; 0
     * @param q0    safety factor on the magnetic axis, &gt; 0
     * @param mix   Cerfon–Freidberg A: the share of F F' in the current (0: all pressure)
     * @throws FieldParameterException when the shape has no closed surfaces around one axis
     */
    public SolovevField(double r0, double a, double kappa, double delta, double b0, double q0, double mix) {
        this.r0 = r0;
        this.minor = a;
        this.b0 = b0;
        this.q0 = q0;
        double eps = a / r0;
        this.flux = new SolovevFlux(eps, kappa, delta, mix);
        // the axis: ψ̄_x(x, 0) = 0 by Newton from the geometric centre (ψ̄ is even in y)
        double x = 1;
        for (int i = 0; i < 50; i++) {
            double step = flux.derivative(1, 0, x, 0) / flux.derivative(2, 0, x, 0);
            x -= step;
            if (Math.abs(step) < 1e-15) {
                break;
            }
        }
        this.axisX = x;
        this.psiBarAxis = flux.value(x, 0);
        double dxx = flux.derivative(2, 0, x, 0);
        double dyy = flux.derivative(0, 2, x, 0);
        if (!(x > 1 - eps && x < 1 + eps) || !(psiBarAxis < 0) || !(dxx > 0 && dyy > 0)) {
            throw new FieldParameterException("field 'solovev': the shape (a/R0 = " + eps + ", kappa = " + kappa
                    + ", delta = " + delta + ", A = " + mix + ") has no magnetic axis inside its boundary");
        }
        double denominator = q0 * q0 * x * x * dxx * dyy + 2 * mix * psiBarAxis;
        if (!(denominator > 0)) {
            throw new FieldParameterException("field 'solovev': no equilibrium with q0 = " + q0 + " and A = " + mix
                    + " (F^2 on the axis would be negative); raise q0 or A");
        }
        this.psi0 = -r0 * r0 * b0 / Math.sqrt(denominator);
        this.edgeGradient = Math.abs(flux.derivative(1, 0, 1 + eps, 0));
        this.invariants = List.of(
                Invariants.energy(this),
                AxisymmetricEquilibrium.toroidalMomentum(this));
    }

    @Override public String name() { return "solovev"; }

    /** Per-thread scratch, so that an evaluation allocates nothing. */
    private static final class Scratch {
        final SolovevFlux.Powers powers = new SolovevFlux.Powers();
        final double[] d = new double[6];
    }

    private final ThreadLocal<Scratch> scratch = ThreadLocal.withInitial(Scratch::new);

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        Scratch sc = scratch.get();
        double[] d = sc.d;
        flux.fieldDerivatives(Math.sqrt(x * x + y * y) / r0, z / r0, sc.powers, d);
        double s1 = psi0 / r0;
        double s2 = psi0 / (r0 * r0);
        double psi = psi0 * d[0];
        double f = f(psi);
        AxisymmetricEquilibrium.fill(x, y, s1 * d[1], s1 * d[2], s2 * d[3], s2 * d[4], s2 * d[5], f,
                -flux.a() * psi0 / (r0 * r0 * f), out);
    }

    @Override
    public void psi(double r, double z, double[] out) {
        double xb = r / r0;
        double yb = z / r0;
        out[0] = psi0 * flux.value(xb, yb);
        out[1] = psi0 / r0 * flux.derivative(1, 0, xb, yb);
        out[2] = psi0 / r0 * flux.derivative(0, 1, xb, yb);
        out[3] = psi0 / (r0 * r0) * flux.derivative(2, 0, xb, yb);
        out[4] = psi0 / (r0 * r0) * flux.derivative(1, 1, xb, yb);
        out[5] = psi0 / (r0 * r0) * flux.derivative(0, 2, xb, yb);
    }

    /**
     * A derivative of ψ of order dr + dz ≤ 3 (T m^(2 − dr − dz)), exact.
     *
     * @param r major radius (m)
     * @param z height (m)
     */
    public double psiDerivative(int dr, int dz, double r, double z) {
        return psi0 / Math.pow(r0, dr + dz) * flux.derivative(dr, dz, r / r0, z / r0);
    }

    @Override
    public double f(double psi) {
        return Math.sqrt(r0 * r0 * b0 * b0 - 2 * flux.a() * psi0 * psi / (r0 * r0));
    }

    @Override
    public double fPrime(double psi) {
        return -flux.a() * psi0 / (r0 * r0 * f(psi));
    }

    @Override
    public double pressure(double psi) {
        return Math.max(0, pressureLaw(psi));
    }

    private double pressureLaw(double psi) {
        return -(1 - flux.a()) * psi0 * psi / (MU0 * Math.pow(r0, 4));
    }

    @Override
    public double pressurePrime(double psi) {
        return -(1 - flux.a()) * psi0 / (MU0 * Math.pow(r0, 4));
    }

    @Override public double[] axis() { return new double[] {axisX * r0, 0}; }
    @Override public double psiAxis() { return psi0 * psiBarAxis; }
    @Override public double psiBoundary() { return 0; }

    /** The flux scale ψ0 (T m²) that q0 sets. */
    public double psi0() { return psi0; }
    public double majorRadius() { return r0; }
    public double minorRadius() { return minor; }
    public double b0() { return b0; }
    public double q0() { return q0; }
    /** The dimensionless flux and its shape. */
    public SolovevFlux flux() { return flux; }

    /**
     * The shape the coefficients were fitted to: R = R0 + a cos(τ + α sin τ), Z = κ a sin τ with
     * α = arcsin δ (Cerfon &amp; Freidberg 2010, Eq. 9) — {R, Z} (m) at parameter τ.
     */
    public double[] shape(double tau) {
        double alpha = Math.asin(flux.delta());
        return new double[] {r0 + minor * Math.cos(tau + alpha * Math.sin(tau)), flux.kappa() * minor * Math.sin(tau)};
    }

    @Override public double length() { return r0; }
    @Override public String lengthMeaning() { return "R0, the major radius"; }
    @Override public boolean hasElectricField() { return false; }

    /**
     * −ψ̄ divided by its gradient at the outer equatorial point, times R0: the distance to the
     * last closed flux surface there, a smooth and signed stand-in for it elsewhere; capped by
     * the distance to a box 20% wider than the plasma, beyond which ψ̄'s other zero contours lie.
     */
    @Override
    public double domainMargin(double x, double y, double z) {
        double r = Math.hypot(x, y);
        double inside = -flux.value(r / r0, z / r0) * r0 / edgeGradient;
        double halfWidth = 1.2 * minor;
        double halfHeight = 1.2 * flux.kappa() * minor;
        double box = Math.min(halfWidth - Math.abs(r - r0), halfHeight - Math.abs(z));
        return Math.min(inside, box);
    }

    @Override
    public String domainMeaning() {
        return "inside the last closed flux surface psi = 0; a particle reaching it is lost";
    }

    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        AxisymmetricEquilibrium.vectorPotential(this, x, y, z, out);
    }

    @Override public List<Invariant> invariants() { return invariants; }

    /** Halfway from the axis to the outer equatorial point. */
    @Override public Vec3 defaultStart() { return new Vec3(0.5 * (axisX * r0 + r0 + minor), 0, 0); }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "solovev"; }
        @Override public String description() {
            return "shaped tokamak: Solov'ev equilibrium with elongation and triangularity (Cerfon-Freidberg 2010)";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("R0", 1.7, "m", "major radius"),
                    ParameterSpec.positive("a", 0.5, "m", "minor radius (half width at Z = 0), <= 0.7 R0"),
                    new ParameterSpec("kappa", 1.7, "1", "elongation: height over width of the boundary",
                            "in [1, 2.5]", v -> v >= 1 && v <= 2.5),
                    new ParameterSpec("delta", 0.33, "1", "triangularity: the top point sits at R0 - delta a",
                            "in [-0.6, 0.6]", v -> v >= -0.6 && v <= 0.6),
                    ParameterSpec.positive("B0", 2.5, "T", "vacuum toroidal field at R = R0"),
                    new ParameterSpec("q0", 2.0, "1", "safety factor on the magnetic axis",
                            "in [0.3, 10]", v -> v >= 0.3 && v <= 10),
                    new ParameterSpec("A", -0.05, "1", "share of F F' in the current (Cerfon-Freidberg A; 0: all pressure)",
                            "in [-0.5, 1]", v -> v >= -0.5 && v <= 1));
        }
        @Override public String lengthMeaning() { return "R0, the major radius"; }
        @Override public String invariantsMeaning() {
            return "energy; p_phi = m R u_phi + q psi(R,Z), psi = psi0 psibar(R/R0, Z/R0), 0 on the boundary";
        }
        @Override public Field create(FieldParameters p, Species species) {
            double r0 = p.get("R0");
            double a = p.get("a");
            if (a > 0.7 * r0) {
                throw new FieldParameterException("parameter 'a' of field 'solovev' must be <= 0.7 R0 = " + 0.7 * r0
                        + " m (the shape conditions need a clear hole), got " + a);
            }
            return new SolovevField(r0, a, p.get("kappa"), p.get("delta"), p.get("B0"), p.get("q0"), p.get("A"));
        }
    }
}
