package org.twinorbit.fields;

import org.twinorbit.shared.FieldSample;

/**
 * An axisymmetric magnetic field B = ∇ψ × ∇φ + F(ψ) ∇φ in right-handed cylindrical coordinates
 * (R, φ, Z), φ = atan2(y, x) counter-clockwise seen from +z, ψ the poloidal flux per radian:
 * B_R = −∂ψ/∂Z / R, B_Z = ∂ψ/∂R / R, B_φ = F/R. In the convention of Sauter &amp; Medvedev
 * (Comput. Phys. Commun. 184, 293, 2013) this is COCOS 3 with ψ per radian (σ_Bp = −1,
 * σ_RφZ = +1, e_Bp = 0). The vector potential is A_φ = ψ/R, so R A_φ = ψ and the canonical
 * toroidal momentum is p_φ = m R u_φ + q ψ, exact by the symmetry in φ.
 */
public interface AxisymmetricEquilibrium extends Field {

    /**
     * ψ and its derivatives at (R, Z), written into {@code out}: ψ (T m²), ∂ψ/∂R, ∂ψ/∂Z (T m),
     * ∂²ψ/∂R², ∂²ψ/∂R∂Z, ∂²ψ/∂Z² (T).
     *
     * @param r major radius (m), &gt; 0
     * @param z height (m)
     */
    void psi(double r, double z, double[] out);

    /** F = R B_φ (T m) as a function of ψ (T m²). */
    double f(double psi);

    /** dF/dψ (1/m) at ψ (T m²). */
    double fPrime(double psi);

    /** The pressure (Pa) at ψ (T m²); 0 outside the plasma. */
    double pressure(double psi);

    /** dp/dψ (Pa / (T m²)) at ψ (T m²). */
    double pressurePrime(double psi);

    /** The magnetic axis {R, Z} (m). */
    double[] axis();

    /** ψ (T m²) on the magnetic axis. */
    double psiAxis();

    /** ψ (T m²) on the last closed flux surface. */
    double psiBoundary();

    /**
     * Fills B and its Jacobian at (x, y) (m) from ψ's derivatives ∂ψ/∂R, ∂ψ/∂Z (T m), ∂²ψ/∂R²,
     * ∂²ψ/∂R∂Z, ∂²ψ/∂Z² (T) and F (T m), dF/dψ (1/m) at that ψ: the one place where the
     * cylindrical field becomes Cartesian. Allocates nothing.
     */
    static void fill(double x, double y, double pr, double pz, double prr, double prz, double pzz,
                     double f, double fp, FieldSample out) {
        out.clear();
        double r2 = x * x + y * y;
        double r = Math.sqrt(r2);
        double ir = 1 / r;
        double ir2 = ir * ir;
        // Bx = g x − h y, By = g y + h x, Bz = k with g = −ψ_Z/R², h = F/R², k = ψ_R/R
        double g = -pz * ir2;
        double h = f * ir2;
        double k = pr * ir;
        double gR = -prz * ir2 + 2 * pz * ir2 * ir;
        double gZ = -pzz * ir2;
        double hR = fp * pr * ir2 - 2 * f * ir2 * ir;
        double hZ = fp * pz * ir2;
        double kR = prr * ir - pr * ir2;
        double kZ = prz * ir;
        double cx = x * ir;
        double cy = y * ir;
        out.bx = g * x - h * y;
        out.by = g * y + h * x;
        out.bz = k;
        out.dB[0] = g + (x * gR - y * hR) * cx;
        out.dB[1] = (x * gR - y * hR) * cy - h;
        out.dB[2] = x * gZ - y * hZ;
        out.dB[3] = (y * gR + x * hR) * cx + h;
        out.dB[4] = g + (y * gR + x * hR) * cy;
        out.dB[5] = y * gZ + x * hZ;
        out.dB[6] = kR * cx;
        out.dB[7] = kR * cy;
        out.dB[8] = kZ;
    }

    /**
     * p_φ = m R u_φ + q ψ(R, Z) (kg m²/s), R u_φ = x u_y − y u_x: the canonical toroidal momentum
     * R (m u_φ + q A_φ) with R A_φ = ψ, from ψ directly (no quadrature for A's other parts).
     */
    static Invariant toroidalMomentum(AxisymmetricEquilibrium e) {
        return Invariants.of("p_phi", "m R u_phi + q psi(R,Z)", "kg m^2/s", true, (s, t, x, u) -> {
            double[] p = new double[6];
            e.psi(Math.hypot(x[0], x[1]), x[2], p);
            return s.mass() * (x[0] * u[1] - x[1] * u[0]) + s.charge() * p[0];
        }, Invariants::angularScale);
    }

    /**
     * A = (ψ/R) φ̂ + A_R R̂ with A_R = (1/R) ∫₀^Z F(ψ(R, Z')) dZ', so that ∂A_R/∂Z = F/R = B_φ;
     * the integral by 48-point Gauss–Legendre quadrature (smooth integrand). Off the hot path:
     * the invariants use only R A_φ = ψ, which A_R does not change.
     */
    static void vectorPotential(AxisymmetricEquilibrium e, double x, double y, double z, double[] out) {
        double r = Math.hypot(x, y);
        double[] p = new double[6];
        e.psi(r, z, p);
        double aPhi = p[0] / r;
        double sum = 0;
        double[] nodes = GaussLegendre.NODES;
        double[] weights = GaussLegendre.WEIGHTS;
        for (int i = 0; i < nodes.length; i++) {
            double zi = 0.5 * z * (nodes[i] + 1);
            e.psi(r, zi, p);
            sum += weights[i] * e.f(p[0]);
        }
        double aR = 0.5 * z * sum / r;
        double c = x / r;
        double s = y / r;
        out[0] = aR * c - aPhi * s;
        out[1] = aR * s + aPhi * c;
        out[2] = 0;
    }
}
