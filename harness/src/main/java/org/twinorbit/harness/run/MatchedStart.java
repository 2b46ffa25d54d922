package org.twinorbit.harness.run;

import java.util.Arrays;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Invariant;
import org.twinorbit.harness.metrics.GyroAverager;
import org.twinorbit.harness.metrics.Track;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * The guiding center of one full orbit, to second order in ε: the initial condition (t0, X, p∥, μ)
 * of the model row's guiding center for one gyrophase ({@code gc-start matched}).
 *
 * <ul>
 *   <li>t0 and X: the mid-time of the reference orbit's first whole gyration and the guiding-center
 *       position there, from the means over the first three gyrations (a mean over one gyration
 *       is off by f'' T²/24, which is removed; see {@link #centered}). A gyration mean differs
 *       from the guiding center by O(ε²ρ) apart from that term (common practice; Northrop, The
 *       Adiabatic Motion of Charged Particles, 1963).</li>
 *   <li>p∥, where the field has an exact canonical momentum of a symmetry along which b has a
 *       component of at least {@value #MIN_ALONG_SYMMETRY}: the value that gives the guiding center
 *       the particle's own canonical momentum plus the first-order gyration term
 *       {@link #gyroCorrection}. Each such invariant is m u_k + q A_k (or R times it about the
 *       axis); the guiding center's is the same expression with m u replaced by p∥ b + γ m v_E,
 *       the conjugate momentum of the guiding-center Lagrangian (Littlejohn, J. Plasma Phys. 29,
 *       1983), so p∥ follows from an affine equation. The gyration term, μ-dependent and of
 *       order ε relative to p∥ b·K, vanishes in the toroidal field but not in the tokamak, where
 *       without it the drift error kept an O(ε) part (a floor of ~1e-4 at 75°).</li>
 *   <li>p∥ elsewhere: γ m ⟨v·b⟩ (centred the same way) plus the Baños term m μ (b·∇×b)/q.
 *       The particle's v·b is taken with b at the particle, which differs from b at X by (ρ·∇)b; averaged over the gyration
 *       that leaves −(v⊥²/2Ω) b·∇×b, which vanishes only where field lines do not twist (derived
 *       from ρ = b×v⊥/Ω; Baños, J. Plasma Phys. 1, 1967).</li>
 *   <li>μ where field lines twist (b·∇×b ≠ 0), in a static field without E: from the
 *       particle's exact energy, μ = (p² − p∥²)/(2 m B(X)), so the guiding center has the
 *       particle's energy exactly; there the gyration mean of p⊥²/(2mB) is off at first order,
 *       like that of v·b. Elsewhere the gyration mean, which is good to O(ε²) with a smaller
 *       coefficient (measured: 13× smaller in the gradient drift, and on the mirror axis the
 *       bounce period of the model agrees with the full orbit to 2e-7 at ε = 0.05 instead of 1e-3).</li>
 * </ul>
 * Measured: with these choices the model's drift and bounce-period errors scale as ε² in the
 * toroidal, dipole, mirror, current-sheet, gradient and tokamak fields, and the tokamak's mirror
 * field too (MatchedStartScalingTest); with ⟨v·b⟩ and ⟨μ⟩ alone the tokamak's phase-mean errors
 * stay first order (the twist). The
 * start removes the O(ε) offset; at second order its own convention still enters the
 * coefficient, so a threshold set by a second-order error carries that convention.
 */
final class MatchedStart {

    /** Smallest |b_k| (or |b_φ|) for which a canonical momentum fixes p∥ (dividing by it amplifies errors of X). */
    static final double MIN_ALONG_SYMMETRY = 0.5;
    /** |b·∇×b| ρ above which field lines count as twisted (where they do not, it is zero to rounding). */
    static final double TWISTED = 1e-9;
    /** Finite-difference step of ∇∇ψ relative to the field's length (its error, ~1e-8 of the O(ε) term, is far below ε²). */
    static final double HESSIAN_STEP = 1e-4;

    /** Time (s), position (m), p∥ (kg m/s) and μ (J/T) of the guiding center. */
    record State(double t0, double[] x, double pPar, double mu) {}

    private MatchedStart() {}

    /**
     * @param g     gyration averages of the reference orbit
     * @param x0    the particle's initial position (m)
     * @param u0    its initial u = γv (m/s)
     * @param gamma its Lorentz factor at the start
     * @param p     its momentum |p| (kg m/s) at the start
     * @return the guiding center's state, or null when the orbit completed no gyration
     */
    static State of(Field f, Species s, GyroAverager g, double[] x0, double[] u0, double gamma, double p) {
        if (g.gyrations() < 1) {
            return null;
        }
        Track centers = g.centers();
        double t0 = centers.time(0);
        double[] x = {centered(centers, 0), centered(centers, 1), centered(centers, 2)};
        FieldSample fs = new FieldSample();
        f.evaluate(t0, x[0], x[1], x[2], fs);
        double bm = fs.bMag();
        double[] b = fs.unitB(new double[3]);
        double[] curl = fs.curlUnitB(new double[3]);
        double twist = b[0] * curl[0] + b[1] * curl[1] + b[2] * curl[2];
        double pPar = canonicalParallel(f, s, t0, x, b, fs, x0, u0, gamma, p, g.mu(0), twist);
        if (Double.isNaN(pPar)) {
            pPar = gamma * s.mass() * centered(centers, 3) + s.mass() * g.mu(0) * twist / s.charge();
        }
        double mu = g.mu(0);
        double rho = p / Math.abs(s.charge() * bm);
        if (Math.abs(twist) * rho > TWISTED && f.isStatic() && !f.hasElectricField()) {
            // a field-aligned orbit can come out a rounding error below zero
            mu = Math.max(0, (p * p - pPar * pPar) / (2 * s.mass() * bm));
        }
        return new State(t0, x, pPar, mu);
    }

    /**
     * The guiding center's canonical momentum minus the particle's, to first order: (mμ/q) [τ b·K + (∇²ψ − b·∇∇ψ·b)/(2B)], with ψ = A·K and K the symmetry's
     * direction (ẑ × x for a rotation, the fixed axis for a translation), τ = b·∇×b.
     *
     * <p>Derived by expanding the particle's m u·K + q ψ(x) about X = x − ρ (ρ = m b×u⊥/(qB)):
     * m u⊥·K + q ρ·∇ψ vanishes at the particle (∇ψ = K×B where the gauge shares the symmetry), and
     * what is left, averaged over the gyration, is q ψ(X) + m⟨v·b⟩ b·K − (q/2)⟨ρρ⟩:∇∇ψ with
     * ⟨ρρ⟩ = (ρ²/2)(I − bb). The guiding center's p∥ is m⟨v·b⟩ + mμτ/q (the Baños term; Baños,
     * J. Plasma Phys. 1, 1967), so the guiding center's momentum q ψ(X) + p∥ b·K exceeds the
     * particle's by the two μ terms. They are O(ε) relative to p∥ b·K where field lines twist or
     * ψ curves across b (the tokamak), and zero in a field without them (the toroidal field).
     * Checked against the Baños p∥ of exact orbits: the two agree to O(ε²) with the term, O(ε) without
     * (MatchedStartMomentumTest). Derived without E (an E×B drift adds terms of its own order).
     *
     * @param t0    time (s)
     * @param x     the guiding center X (m)
     * @param b     unit vector of B at X
     * @param bm    |B| at X (T)
     * @param mu    magnetic moment (J/T)
     * @param twist b·∇×b at X (1/m)
     * @param bk    b·K (m for a rotation, 1 for a translation)
     * @return the gap (kg m²/s for a rotation, kg m/s for a translation)
     */
    static double gyroCorrection(Field f, Invariant inv, Species s, double t0, double[] x, double[] b, double bm,
                                 double mu, double twist, double bk) {
        double q = s.charge();
        double h = HESSIAN_STEP * f.length();
        double[] zero = new double[3];
        double c = inv.value(s, t0, x, zero);
        // trace of ∇∇(qψ) minus its second derivative along b, by central differences
        double perp = -(shifted(inv, s, t0, x, b, h) + shifted(inv, s, t0, x, b, -h) - 2 * c);
        double[] e = new double[3];
        for (int i = 0; i < 3; i++) {
            Arrays.fill(e, 0);
            e[i] = 1;
            perp += shifted(inv, s, t0, x, e, h) + shifted(inv, s, t0, x, e, -h) - 2 * c;
        }
        perp /= q * h * h;
        return s.mass() * mu / q * (twist * bk + perp / (2 * bm));
    }

    /** q ψ at x + h d: the invariant of a particle at rest there. */
    private static double shifted(Invariant inv, Species s, double t0, double[] x, double[] d, double h) {
        double[] y = {x[0] + h * d[0], x[1] + h * d[1], x[2] + h * d[2]};
        return inv.value(s, t0, y, new double[3]);
    }

    /**
     * The value at the mid-time of the first gyration of a quantity whose gyration means are
     * given (k = 0–2: X, Y, Z; 3: v∥): a mean over a gyration of length T centred on t0 is
     * f(t0) + f''(t0) T²/24 (Taylor; the midpoint rule's error), and f'' T² is estimated from the
     * means of the first three gyrations. Without three gyrations, the first mean itself.
     */
    static double centered(Track c, int k) {
        if (c.size() < 3) {
            return k < 3 ? c.coord(0, k) : c.vParallel(0);
        }
        double[] f = new double[3];
        for (int i = 0; i < 3; i++) {
            f[i] = k < 3 ? c.coord(i, k) : c.vParallel(i);
        }
        return f[0] - (f[0] - 2 * f[1] + f[2]) / 24;
    }

    /**
     * p∥ (kg m/s) from the best-conditioned canonical momentum, NaN when none has b along it.
     *
     * @param mu    the first gyration's mean μ (J/T), for the first-order term
     * @param twist b·∇×b at X (1/m)
     */
    private static double canonicalParallel(Field f, Species s, double t0, double[] x, double[] b, FieldSample fs,
                                            double[] x0, double[] u0, double gamma, double p, double mu,
                                            double twist) {
        double inv2 = 1.0 / (fs.bMag() * fs.bMag());
        // γ v_E at X, the E×B part of the guiding center's momentum per mass
        double[] ue = {gamma * (fs.ey * fs.bz - fs.ez * fs.by) * inv2, gamma * (fs.ez * fs.bx - fs.ex * fs.bz) * inv2,
                gamma * (fs.ex * fs.by - fs.ey * fs.bx) * inv2};
        double[] u1 = {ue[0] + p / s.mass() * b[0], ue[1] + p / s.mass() * b[1], ue[2] + p / s.mass() * b[2]};
        double best = MIN_ALONG_SYMMETRY;
        double out = Double.NaN;
        for (Invariant inv : f.invariants()) {
            if (!inv.exact() || inv.name().equals("energy")) {
                continue;
            }
            double v0 = inv.value(s, t0, x, ue);
            double v1 = inv.value(s, t0, x, u1);
            double along = Math.abs(v1 - v0) / inv.scale(s, t0, x, u1);
            if (along >= best) {
                best = along;
                double gcMomentum = inv.value(s, 0, x0, u0)
                        + gyroCorrection(f, inv, s, t0, x, b, fs.bMag(), mu, twist, (v1 - v0) / p);
                out = p * (gcMomentum - v0) / (v1 - v0);
            }
        }
        return out;
    }
}
