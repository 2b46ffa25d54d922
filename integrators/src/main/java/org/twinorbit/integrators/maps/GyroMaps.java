package org.twinorbit.integrators.maps;

import org.twinorbit.integrators.guidingcenter.GuidingCenterEquations;
import org.twinorbit.integrators.guidingcenter.GuidingCenterState;
import java.util.ArrayList;
import java.util.List;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * Maps between a particle (x, u = γv) and a guiding center (X, p∥, μ, θ).
 *
 * <p><b>Gyroradius.</b> X = x − ρ with ρ = m (b × u⊥)/(q|B|), the sign carried by q
 * (Jackson, Classical Electrodynamics, 3rd ed., §12.2). b, |B| and E are taken at the guiding
 * center X, not at the particle: the particle -> guiding-center map solves X = x − ρ(X) by
 * fixed-point iteration (it contracts at a rate of order ε = ρ/L), so the zeroth-order round
 * trip guiding center -> particle -> guiding center is exact up to rounding.
 *
 * <p><b>E×B frame.</b> With E, u⊥ is taken in the frame moving with v_E = E×B/|B|²: u is
 * Lorentz-boosted by −v_E before it is split (and by +v_E when a particle is placed). The
 * boost of u is exact; the position is not Lorentz-transformed: the gyroradius uses the
 * laboratory |B|, and the drift-frame ring is placed at equal laboratory time (ignoring its
 * contraction along v_E and the relativity of simultaneity), errors of order (v_E v/c²) ρ.
 *
 * <p><b>Gyrophase convention.</b> e1 is the part of x̂ perpendicular to b, normalised (ŷ instead
 * when |b_x| &gt; 0.9), and e2 = b × e1. The gyrophase θ is defined by the direction of the
 * perpendicular velocity in the drift frame, u⊥ = |u⊥| (cos θ e1 + sin θ e2), so the particle
 * sits at x = X + (m|u⊥|/(q|B|)) (cos θ e2 − sin θ e1). θ decreases in time for a positive
 * charge and increases for a negative one.
 */
public final class GyroMaps {

    private static final double C2 = Constants.C * Constants.C;
    /** Fixed-point iterations allowed; the map contracts like ε, so 200 covers ε up to ~0.85. */
    private static final int MAX_ITERATIONS = 200;

    private GyroMaps() {}

    /**
     * Particle -> guiding center at time t (s), from position x (m) and u = γv (m/s).
     *
     * @param inDriftFrame take u⊥ in the E×B frame (as {@link GyroPlacement#ZEROTH_EXB} places
     *                     particles); false takes u⊥ in the laboratory (as {@link GyroPlacement#ZEROTH})
     * @throws IllegalArgumentException when the iteration for X does not converge (ρ ≳ L)
     */
    public static GuidingCenterState toGuidingCenter(Field field, Species s, double t, double[] x,
                                                     double[] u, boolean inDriftFrame) {
        FieldSample f = new FieldSample();
        double[] gc = x.clone();
        double[] b = new double[3];
        double[] v = new double[3];
        double[] w = new double[3];
        double[] up = new double[3];
        double scale = norm(x);
        double lastChange = Double.POSITIVE_INFINITY;
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            double bMag = split(field, t, gc, u, inDriftFrame, f, b, v, up, w);
            double k = s.mass() / (s.charge() * bMag);
            double[] next = {
                    x[0] - k * (b[1] * w[2] - b[2] * w[1]),
                    x[1] - k * (b[2] * w[0] - b[0] * w[2]),
                    x[2] - k * (b[0] * w[1] - b[1] * w[0])};
            double change = Math.sqrt(sq(next[0] - gc[0]) + sq(next[1] - gc[1]) + sq(next[2] - gc[2]));
            System.arraycopy(next, 0, gc, 0, 3);
            double size = scale + Math.abs(k) * norm(w);
            // converged, or stalled at the rounding level of the position
            if (change <= 1e-15 * size || (change >= lastChange && change <= 1e-12 * size)) {
                bMag = split(field, t, gc, u, inDriftFrame, f, b, v, up, w);
                double[] e1 = new double[3];
                double[] e2 = new double[3];
                perpendicularBasis(b, e1, e2);
                double theta = Math.atan2(dot(w, e2), dot(w, e1));
                double mu = s.mass() * dot(w, w) / (2.0 * bMag);
                return new GuidingCenterState(Vec3.of(gc), s.mass() * dot(up, b), mu, theta);
            }
            lastChange = change;
        }
        throw new IllegalArgumentException("particle -> guiding-center map did not converge at x = "
                + Vec3.of(x) + ": the gyroradius is not small compared with the field's length scale");
    }

    /** Guiding center -> particle at time t (s) with the chosen placement. */
    public static GyroParticle toParticle(Field field, Species s, double t, GuidingCenterState gc,
                                          GyroPlacement placement) {
        FieldSample f = new FieldSample();
        double[] xg = gc.position().toArray();
        double[] b = new double[3];
        double[] v = new double[3];
        double bMag = frame(field, t, xg, f, b, placement != GyroPlacement.ZEROTH, v);
        double[] e1 = new double[3];
        double[] e2 = new double[3];
        perpendicularBasis(b, e1, e2);
        double m = s.mass();
        double uPar = gc.parallelMomentum() / m;
        double uPerp = Math.sqrt(2.0 * gc.mu() * bMag / m);
        double c = Math.cos(gc.gyrophase()), sn = Math.sin(gc.gyrophase());
        double[] w = new double[3];
        for (int i = 0; i < 3; i++) {
            w[i] = uPerp * (c * e1[i] + sn * e2[i]);
        }
        double[] drift = new double[3];
        if (placement == GyroPlacement.FIRST_ORDER_ENERGY_KEPT) {
            magneticDrift(field, s, t, gc, xg, b, v, drift);
            // gyration speed a along ê = w/|w| with |a ê + d|² = |w|², d ⊥ b: energy kept
            double ed = (c * dot(e1, drift) + sn * dot(e2, drift));
            double disc = ed * ed + uPerp * uPerp - dot(drift, drift);
            if (disc < 0) {
                throw new IllegalArgumentException("first-order placement impossible: the magnetic drift"
                        + " exceeds the gyration speed (epsilon too large)");
            }
            double a = -ed + Math.sqrt(disc);
            for (int i = 0; i < 3; i++) {
                w[i] = a * (c * e1[i] + sn * e2[i]);
            }
        }
        double k = m / (s.charge() * bMag);
        double[] x = {
                xg[0] + k * (b[1] * w[2] - b[2] * w[1]),
                xg[1] + k * (b[2] * w[0] - b[0] * w[2]),
                xg[2] + k * (b[0] * w[1] - b[1] * w[0])};
        double[] up = new double[3];
        for (int i = 0; i < 3; i++) {
            up[i] = uPar * b[i] + w[i] + drift[i];
        }
        double[] u = new double[3];
        boost(up, v[0], v[1], v[2], u);
        return new GyroParticle(Vec3.of(x), Vec3.of(u), gc.gyrophase());
    }

    /**
     * The gyrophase ensemble of one guiding center: n particles at θ = θ0 + 2πk/n, k = 0..n−1.
     *
     * @param theta0 phase of the first particle (rad)
     */
    public static List<GyroParticle> ensemble(Field field, Species s, double t, GuidingCenterState gc,
                                              int n, double theta0, GyroPlacement placement) {
        if (n < 1) {
            throw new IllegalArgumentException("number of gyrophases must be >= 1, got " + n);
        }
        List<GyroParticle> list = new ArrayList<>(n);
        for (int k = 0; k < n; k++) {
            list.add(toParticle(field, s, t, gc.withGyrophase(theta0 + 2.0 * Math.PI * k / n), placement));
        }
        return List.copyOf(list);
    }

    /**
     * The gyrophase basis for unit vector b: e1 = normalised part of x̂ perpendicular to b (ŷ
     * when |b_x| &gt; 0.9), e2 = b × e1.
     */
    public static void perpendicularBasis(double[] b, double[] e1, double[] e2) {
        double ax = 1, ay = 0;
        if (Math.abs(b[0]) > 0.9) {
            ax = 0;
            ay = 1;
        }
        double ab = ax * b[0] + ay * b[1];
        e1[0] = ax - ab * b[0];
        e1[1] = ay - ab * b[1];
        e1[2] = -ab * b[2];
        double n = norm(e1);
        e1[0] /= n;
        e1[1] /= n;
        e1[2] /= n;
        e2[0] = b[1] * e1[2] - b[2] * e1[1];
        e2[1] = b[2] * e1[0] - b[0] * e1[2];
        e2[2] = b[0] * e1[1] - b[1] * e1[0];
    }

    /**
     * Lorentz boost of u' = γ'v' (m/s), given in a frame moving with velocity (vx, vy, vz) (m/s)
     * relative to the laboratory, into the laboratory u (m/s):
     * u = u' + [(γ_V − 1)(u'·n) + γ_V γ' |V|] n, n = V/|V| (Jackson, Classical Electrodynamics,
     * 3rd ed., §11.3). Boosting by −V inverts it.
     */
    public static void boost(double[] uPrime, double vx, double vy, double vz, double[] out) {
        double v2 = vx * vx + vy * vy + vz * vz;
        if (v2 == 0) {
            System.arraycopy(uPrime, 0, out, 0, 3);
            return;
        }
        if (v2 >= C2) {
            throw new IllegalArgumentException("E×B drift speed " + Math.sqrt(v2)
                    + " m/s is not below c: no drift frame exists (|E| >= c|B|)");
        }
        double vMag = Math.sqrt(v2);
        double nx = vx / vMag, ny = vy / vMag, nz = vz / vMag;
        double gV = 1.0 / Math.sqrt(1.0 - v2 / C2);
        double gP = Math.sqrt(1.0 + dot(uPrime, uPrime) / C2);
        double un = uPrime[0] * nx + uPrime[1] * ny + uPrime[2] * nz;
        double a = (gV - 1.0) * un + gV * gP * vMag;
        out[0] = uPrime[0] + a * nx;
        out[1] = uPrime[1] + a * ny;
        out[2] = uPrime[2] + a * nz;
    }

    /**
     * Fields at X, then u boosted into the drift frame (u' into {@code up}) and split: writes b,
     * v_E and u'⊥ (into {@code w}); returns |B| (T).
     */
    private static double split(Field field, double t, double[] xg, double[] u, boolean inDriftFrame,
                                FieldSample f, double[] b, double[] v, double[] up, double[] w) {
        double bMag = frame(field, t, xg, f, b, inDriftFrame, v);
        boost(u, -v[0], -v[1], -v[2], up);
        double uPar = dot(up, b);
        for (int i = 0; i < 3; i++) {
            w[i] = up[i] - uPar * b[i];
        }
        return bMag;
    }

    /** Evaluates the field at X, writes b and (when wanted) v_E = E×B/|B|²; returns |B| (T). */
    private static double frame(Field field, double t, double[] xg, FieldSample f, double[] b,
                                boolean withDrift, double[] vE) {
        field.evaluate(t, xg[0], xg[1], xg[2], f);
        double bMag = f.bMag();
        f.unitB(b);
        if (withDrift) {
            double inv2 = 1.0 / (bMag * bMag);
            vE[0] = (f.ey * f.bz - f.ez * f.by) * inv2;
            vE[1] = (f.ez * f.bx - f.ex * f.bz) * inv2;
            vE[2] = (f.ex * f.by - f.ey * f.bx) * inv2;
        } else {
            vE[0] = vE[1] = vE[2] = 0;
        }
        return bMag;
    }

    /**
     * γ times the guiding-center velocity perpendicular to b minus v_E (m/s): the grad-B and
     * curvature drifts (and the difference between E×b/B*∥ and v_E), from the equations.
     */
    private static void magneticDrift(Field field, Species s, double t, GuidingCenterState gc,
                                      double[] xg, double[] b, double[] vE, double[] out) {
        GuidingCenterEquations eq = new GuidingCenterEquations(field, s, gc.mu());
        double[] y = {xg[0], xg[1], xg[2], gc.parallelMomentum()};
        double[] yDot = new double[4];
        if (!(eq.derivatives(t, y, yDot) > 0)) {
            throw new IllegalArgumentException("first-order placement impossible: B*∥ <= 0 at the guiding center");
        }
        double gamma = eq.gamma(t, y);
        double vb = yDot[0] * b[0] + yDot[1] * b[1] + yDot[2] * b[2];
        for (int i = 0; i < 3; i++) {
            out[i] = gamma * (yDot[i] - vb * b[i] - vE[i]);
        }
    }

    private static double dot(double[] a, double[] c) {
        return a[0] * c[0] + a[1] * c[1] + a[2] * c[2];
    }

    private static double norm(double[] a) {
        return Math.sqrt(dot(a, a));
    }

    private static double sq(double a) {
        return a * a;
    }
}
