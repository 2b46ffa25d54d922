package org.twinorbit.integrators.fullorbit;

import org.twinorbit.shared.Constants;
import org.twinorbit.shared.FieldSample;

/**
 * The velocity update of one leapfrog scheme: the only part a member of the family supplies.
 * {@link LeapfrogStepper} and {@link LeapfrogEnsemble} write the stepping loop (field
 * evaluation, position drift, domain and finiteness checks) once for all of them.
 *
 * <p>The update works in place on {@link #ux}, {@link #uy}, {@link #uz} (u = γv, m/s) so that
 * the single-particle and the ensemble loops can share it without allocating. The step enters
 * as h = q Δt / (2m) (s C/kg): h E is the half electric kick (m/s) and h B the rotation
 * parameter Ω Δt / 2 of a non-relativistic particle. A negative h runs the scheme backwards.
 */
public abstract class LeapfrogUpdate {

    /** 1/c² (s²/m²). */
    protected static final double INV_C2 = 1.0 / (Constants.C * Constants.C);

    /** The velocity being updated, u = γv (m/s). */
    protected double ux, uy, uz;

    /** False when the field has no E anywhere: every kick is skipped. */
    protected final boolean electric;
    /** False for a scheme that sets γ = 1 (then u = v). */
    protected final boolean relativistic;

    /**
     * @param electric     whether the field has an E anywhere (pass on the argument of
     *                     {@link LeapfrogPusher#newUpdate})
     * @param relativistic false for a scheme that sets γ = 1
     */
    protected LeapfrogUpdate(boolean electric, boolean relativistic) {
        this.electric = electric;
        this.relativistic = relativistic;
    }

    /**
     * Advances u from t − Δt/2 to t + Δt/2 with the field f at the position at time t.
     *
     * @param h q Δt / (2m) (s C/kg)
     * @return 1/γ of the new u, by which the position drift multiplies u
     */
    protected abstract double push(FieldSample f, double h);

    /**
     * 1/γ at which the scheme rotates a vector u in the magnetic field, from quantities a
     * rotation about B leaves unchanged.
     *
     * @param u2      |u|² (m²/s²)
     * @param uDotTau u·τ (m/s), τ = h B
     * @param tau2    |τ|²
     */
    protected abstract double rotationInverseGamma(double u2, double uDotTau, double tau2);

    /**
     * Advances u from t − Δt/2 to t, synchronising it with the position: half the scheme's
     * rotation in the frame drifting at E×B/B², plus half the kick of E along B. In uniform
     * fields this is exactly half a step of the scheme (applied twice it gives {@link #push};
     * Boris non-relativistically, and any scheme for a particle at rest in the drift frame); in
     * a pure magnetic field it is the half rotation. Where E⊥ ≥ cB there is no drift frame and
     * it falls back to half kick + half rotation. Rotating in the drift frame keeps the drift
     * velocity exact; rotating u + hE instead would lengthen it by sqrt(1 + (Ω Δt/2)²).
     *
     * @param h q Δt / (2m) (s C/kg) of the full step
     */
    final void firstHalf(FieldSample f, double h) {
        halfStep(f, h, 1);
    }

    /**
     * The exact inverse of {@link #firstHalf}: takes u at t back to t − Δt/2, the leapfrog start.
     *
     * @param h q Δt / (2m) (s C/kg) of the full step
     */
    final void undoFirstHalf(FieldSample f, double h) {
        halfStep(f, h, -1);
    }

    private void halfStep(FieldSample f, double h, int sign) {
        double bx = f.bx, by = f.by, bz = f.bz;
        double b2 = bx * bx + by * by + bz * bz;
        double dx = 0, dy = 0, dz = 0; // u of the drift frame (m/s)
        double kx = 0, ky = 0, kz = 0; // half kick (m/s)
        if (electric) {
            if (b2 > 0) {
                double ex = f.ex, ey = f.ey, ez = f.ez;
                double vx = (ey * bz - ez * by) / b2, vy = (ez * bx - ex * bz) / b2, vz = (ex * by - ey * bx) / b2;
                double v2 = vx * vx + vy * vy + vz * vz;
                double par = (ex * bx + ey * by + ez * bz) / b2;
                double g = relativistic ? 1.0 - v2 * INV_C2 : 1.0;
                if (g > 0) {
                    g = 1.0 / Math.sqrt(g);
                    dx = g * vx;
                    dy = g * vy;
                    dz = g * vz;
                    kx = h * par * bx;
                    ky = h * par * by;
                    kz = h * par * bz;
                } else {
                    kx = h * ex;
                    ky = h * ey;
                    kz = h * ez;
                }
            } else {
                kx = h * f.ex;
                ky = h * f.ey;
                kz = h * f.ez;
            }
        }
        if (sign < 0) {
            ux -= kx;
            uy -= ky;
            uz -= kz;
        }
        ux -= dx;
        uy -= dy;
        uz -= dz;
        double tx = h * bx, ty = h * by, tz = h * bz;
        double ig = rotationInverseGamma(ux * ux + uy * uy + uz * uz + dx * dx + dy * dy + dz * dz,
                ux * tx + uy * ty + uz * tz, tx * tx + ty * ty + tz * tz);
        rotateHalf(ig * tx, ig * ty, ig * tz, sign);
        ux += dx;
        uy += dy;
        uz += dz;
        if (sign > 0) {
            ux += kx;
            uy += ky;
            uz += kz;
        }
    }

    /**
     * 1/γ of the implicit rotation of Vay (2008) and Higuera &amp; Cary (2017): γ² is the positive
     * root of γ⁴ − σγ² − (τ² + u*²) = 0 with σ = 1 + u²/c² − τ², u* = u·τ/c. When σ &lt; 0
     * (Ω Δt ≳ 2γ) the textbook form (σ + sqrt(σ² + 4(τ² + u*²)))/2 cancels, so the same root is
     * taken as 2(τ² + u*²)/(sqrt(…) − σ) there (common practice for quadratic roots).
     *
     * @param u2      |u|² (m²/s²) of the vector being rotated
     * @param uDotTau u·τ (m/s) with τ = h B
     * @param tau2    |τ|²
     */
    static double implicitInverseGamma(double u2, double uDotTau, double tau2) {
        double sigma = 1.0 + u2 * INV_C2 - tau2;
        double q = tau2 + uDotTau * uDotTau * INV_C2;
        double root = Math.sqrt(sigma * sigma + 4.0 * q);
        double g2 = sigma >= 0 ? 0.5 * (sigma + root) : 2.0 * q / (root - sigma);
        return 1.0 / Math.sqrt(g2);
    }

    /** 1/γ of the current u. */
    protected final double inverseGamma() {
        return 1.0 / Math.sqrt(1.0 + (ux * ux + uy * uy + uz * uz) * INV_C2);
    }

    /**
     * Rotates u about t by the angle 2·atan(|t|) (the Boris rotation; Boris 1970, Birdsall &
     * Langdon 1991, §4-4, section from memory), in the two cross products of the published form.
     *
     * @param tx rotation vector (dimensionless), the rotation is right-handed about −t
     */
    protected final void rotate(double tx, double ty, double tz) {
        rotate(tx, ty, tz, 2.0 / (1.0 + tx * tx + ty * ty + tz * tz));
    }

    /** {@link #rotate(double, double, double)} with f = 2/(1 + |t|²) supplied by the caller. */
    protected final void rotate(double tx, double ty, double tz, double f) {
        double sx = f * tx, sy = f * ty, sz = f * tz;
        double px = ux + (uy * tz - uz * ty);
        double py = uy + (uz * tx - ux * tz);
        double pz = uz + (ux * ty - uy * tx);
        ux += py * sz - pz * sy;
        uy += pz * sx - px * sz;
        uz += px * sy - py * sx;
    }

    /**
     * Rotates u by half the angle of {@code rotate(t)}: tan(θ/4) = |t| / (1 + sqrt(1 + |t|²))
     * follows from tan(θ/2) = |t| by the half-angle formula (common practice).
     */
    protected final void rotateHalf(double tx, double ty, double tz, int sign) {
        double k = sign / (1.0 + Math.sqrt(1.0 + tx * tx + ty * ty + tz * tz));
        rotate(k * tx, k * ty, k * tz);
    }
}
