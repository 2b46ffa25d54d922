package org.twinorbit.integrators.guidingcenter;

import org.twinorbit.fields.Field;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * Right-hand side of the first-order relativistic guiding-center equations (Littlejohn, J.
 * Plasma Phys. 29, 111, 1983; Cary &amp; Brizard, Rev. Mod. Phys. 81, 693, 2009), for the state
 * y = (X, Y, Z, p∥) with the magnetic moment μ = p⊥²/(2m|B|) a constant parameter:
 * <pre>
 *   B* = B + (p∥/q) ∇×b,      B*∥ = b·B*,
 *   E* = E − (μ/(qγ)) ∇|B| − (p∥/q) ∂b/∂t,
 *   dX/dt = [ (p∥/(γm)) B* + E* × b ] / B*∥,     dp∥/dt = q (B*·E*) / B*∥,
 *   γ = sqrt(1 + (p∥² + 2mμ|B|)/(m²c²)).
 * </pre>
 * All derivatives of B come from the field's exact Jacobian (through {@link FieldSample}).
 *
 * <p>In static fields these equations conserve W = (γ − 1)mc² + qΦ and the phase-space volume
 * B*∥ d³X dp∥ (Cary &amp; Brizard 2009, §IV). In time-dependent fields (ramp, wave) the same
 * first-order equations are used, including the −(p∥/q)∂b/∂t term; they omit the polarization
 * drift (order ε relative to E×B, dropped in the first-order ordering E ~ εvB) and the kinetic
 * energy of the E×B drift, ½ m v_E², in the guiding-center Hamiltonian.
 *
 * <p>B*∥ ≤ 0 is the model's singularity (Jacobian of the guiding-center transformation vanishes);
 * {@link #derivatives} returns B*∥ so the integrator can report a model failure instead of
 * producing non-finite values.
 *
 * <p>One instance per thread: it owns its field sample and buffers; no method allocates.
 */
public final class GuidingCenterEquations {

    private static final double C2 = Constants.C * Constants.C;

    private final Field field;
    private final Species species;
    private final double mu;
    private final double m;
    private final double q;
    private final boolean timeDependent;
    private final FieldSample sample = new FieldSample();
    private final double[] grad = new double[3];
    private final double[] curl = new double[3];
    private long evaluations;

    /** @param mu magnetic moment p⊥²/(2m|B|) (J/T), ≥ 0 */
    public GuidingCenterEquations(Field field, Species species, double mu) {
        if (!(mu >= 0) || !Double.isFinite(mu)) {
            throw new IllegalArgumentException("magnetic moment mu must be a finite number >= 0 J/T, got " + mu);
        }
        this.field = field;
        this.species = species;
        this.mu = mu;
        this.m = species.mass();
        this.q = species.charge();
        this.timeDependent = !field.isStatic();
    }

    public Field field() {
        return field;
    }

    public Species species() {
        return species;
    }

    /** Magnetic moment (J/T). */
    public double mu() {
        return mu;
    }

    /** Field evaluations made by this instance so far. */
    public long fieldEvaluations() {
        return evaluations;
    }

    /**
     * Writes dy/dt for y = (X (m), Y (m), Z (m), p∥ (kg m/s)) at time t (s) into {@code yDot}
     * (velocity in m/s, force in N) and returns B*∥ (T). When B*∥ ≤ 0 the values written are
     * finite but meaningless; the caller must treat the state as a model failure.
     */
    public double derivatives(double t, double[] y, double[] yDot) {
        field.evaluate(t, y[0], y[1], y[2], sample);
        evaluations++;
        FieldSample s = sample;
        double bMag = s.bMag();
        double inv = 1.0 / bMag;
        double b0 = s.bx * inv, b1 = s.by * inv, b2 = s.bz * inv;
        s.gradBMag(grad);
        s.curlUnitB(curl);
        double pPar = y[3];
        double gamma = Math.sqrt(1.0 + (pPar * pPar + 2.0 * m * mu * bMag) / (m * m * C2));
        double k = pPar / q;
        double bs0 = s.bx + k * curl[0];
        double bs1 = s.by + k * curl[1];
        double bs2 = s.bz + k * curl[2];
        double bsPar = b0 * bs0 + b1 * bs1 + b2 * bs2;
        double muq = mu / (q * gamma);
        double es0 = s.ex - muq * grad[0];
        double es1 = s.ey - muq * grad[1];
        double es2 = s.ez - muq * grad[2];
        if (timeDependent) {
            // ∂b/∂t = (∂B/∂t − b (b·∂B/∂t)) / |B|
            double bdot = b0 * s.dBdtX + b1 * s.dBdtY + b2 * s.dBdtZ;
            es0 -= k * (s.dBdtX - b0 * bdot) * inv;
            es1 -= k * (s.dBdtY - b1 * bdot) * inv;
            es2 -= k * (s.dBdtZ - b2 * bdot) * inv;
        }
        // a zero denominator would give infinities; the sign still says "failed"
        double invPar = 1.0 / (bsPar != 0 ? bsPar : Double.MIN_NORMAL);
        double vPar = pPar / (gamma * m);
        yDot[0] = (vPar * bs0 + (es1 * b2 - es2 * b1)) * invPar;
        yDot[1] = (vPar * bs1 + (es2 * b0 - es0 * b2)) * invPar;
        yDot[2] = (vPar * bs2 + (es0 * b1 - es1 * b0)) * invPar;
        yDot[3] = q * (bs0 * es0 + bs1 * es1 + bs2 * es2) * invPar;
        return bsPar;
    }

    /** B*∥ (T) at time t (s) and state y; ≤ 0 where the model fails. */
    public double parallelBStar(double t, double[] y) {
        field.evaluate(t, y[0], y[1], y[2], sample);
        evaluations++;
        double bMag = sample.bMag();
        sample.curlUnitB(curl);
        double k = y[3] / q;
        return bMag + k * (sample.bx * curl[0] + sample.by * curl[1] + sample.bz * curl[2]) / bMag;
    }

    /** B*∥/|B| (dimensionless) at time t (s) and state y; ≤ 0 where the model fails. */
    public double parallelBStarRatio(double t, double[] y) {
        field.evaluate(t, y[0], y[1], y[2], sample);
        evaluations++;
        double bMag = sample.bMag();
        sample.curlUnitB(curl);
        double k = y[3] / q;
        return 1.0 + k * (sample.bx * curl[0] + sample.by * curl[1] + sample.bz * curl[2]) / (bMag * bMag);
    }

    /** Lorentz factor γ of the guiding center at time t (s) and state y. */
    public double gamma(double t, double[] y) {
        field.evaluate(t, y[0], y[1], y[2], sample);
        evaluations++;
        return gamma(y[3], sample.bMag());
    }

    /** γ for parallel momentum pPar (kg m/s) at field strength b (T). */
    public double gamma(double pPar, double b) {
        return Math.sqrt(1.0 + (pPar * pPar + 2.0 * m * mu * b) / (m * m * C2));
    }

    /**
     * Kinetic energy (γ − 1)mc² (J) at time t (s) and state y, written as p²/(m(γ + 1)) to keep
     * full precision in the non-relativistic limit.
     */
    public double kineticEnergy(double t, double[] y) {
        field.evaluate(t, y[0], y[1], y[2], sample);
        evaluations++;
        double b = sample.bMag();
        double p2 = y[3] * y[3] + 2.0 * m * mu * b;
        return p2 / (m * (gamma(y[3], b) + 1.0));
    }

    /** Total energy W = kinetic + qΦ(X) (J) at time t (s) and state y. */
    public double energy(double t, double[] y) {
        return kineticEnergy(t, y) + q * field.potential(t, y[0], y[1], y[2]);
    }
}
