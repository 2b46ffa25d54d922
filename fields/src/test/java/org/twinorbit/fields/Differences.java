package org.twinorbit.fields;

import org.twinorbit.shared.FieldSample;

/**
 * Fourth-order central differences, f'(x) ≈ [f(x−2h) − 8 f(x−h) + 8 f(x+h) − f(x+2h)]/(12h),
 * truncation error h⁴ f⁽⁵⁾/30 (Abramowitz &amp; Stegun, Handbook of Mathematical Functions, 1964,
 * 25.3.6). With h = 1e-3 of the local length scale ℓ the truncation error is ~1e-12 |f|/ℓ and the
 * round-off error ~1e-16 |f|/h = 1e-13 |f|/ℓ, both far below the 1e-9 the tests ask for.
 */
final class Differences {

    static final double STEP_FRACTION = 1e-3;
    private static final double[] WEIGHTS = {1.0 / 12, -8.0 / 12, 8.0 / 12, -1.0 / 12};
    private static final double[] OFFSETS = {-2, -1, 1, 2};

    /** A vector function of (t, x, y, z) written into out[0..2]. */
    @FunctionalInterface
    interface VectorFunction {
        void apply(double t, double x, double y, double z, double[] out);
    }

    /** A scalar function of (t, x, y, z). */
    @FunctionalInterface
    interface ScalarFunction {
        double apply(double t, double x, double y, double z);
    }

    private Differences() {}

    static VectorFunction magnetic(Field f) {
        FieldSample s = new FieldSample();
        return (t, x, y, z, out) -> {
            f.evaluate(t, x, y, z, s);
            out[0] = s.bx;
            out[1] = s.by;
            out[2] = s.bz;
        };
    }

    static VectorFunction electric(Field f) {
        FieldSample s = new FieldSample();
        return (t, x, y, z, out) -> {
            f.evaluate(t, x, y, z, s);
            out[0] = s.ex;
            out[1] = s.ey;
            out[2] = s.ez;
        };
    }

    static VectorFunction vectorPotential(Field f) {
        return f::vectorPotential;
    }

    /**
     * Row-major Jacobian ∂F_i/∂x_j of g at p = (t, x, y, z) with step h (m).
     */
    static double[] jacobian(VectorFunction g, double[] p, double h) {
        double[] jac = new double[9];
        double[] v = new double[3];
        for (int j = 0; j < 3; j++) {
            for (int k = 0; k < 4; k++) {
                double[] q = p.clone();
                q[1 + j] += OFFSETS[k] * h;
                g.apply(q[0], q[1], q[2], q[3], v);
                for (int i = 0; i < 3; i++) {
                    jac[3 * i + j] += WEIGHTS[k] * v[i] / h;
                }
            }
        }
        return jac;
    }

    /** ∂F/∂t of g at p with time step h (s). */
    static double[] timeDerivative(VectorFunction g, double[] p, double h) {
        double[] d = new double[3];
        double[] v = new double[3];
        for (int k = 0; k < 4; k++) {
            g.apply(p[0] + OFFSETS[k] * h, p[1], p[2], p[3], v);
            for (int i = 0; i < 3; i++) {
                d[i] += WEIGHTS[k] * v[i] / h;
            }
        }
        return d;
    }

    /** ∇φ at p with step h (m). */
    static double[] gradient(ScalarFunction phi, double[] p, double h) {
        double[] g = new double[3];
        for (int j = 0; j < 3; j++) {
            for (int k = 0; k < 4; k++) {
                double[] q = p.clone();
                q[1 + j] += OFFSETS[k] * h;
                g[j] += WEIGHTS[k] * phi.apply(q[0], q[1], q[2], q[3]) / h;
            }
        }
        return g;
    }

    /** The curl of a field whose row-major Jacobian is given. */
    static double[] curl(double[] jac) {
        return new double[] {jac[7] - jac[5], jac[2] - jac[6], jac[3] - jac[1]};
    }

    static double maxAbs(double[] a) {
        double m = 0;
        for (double v : a) {
            m = Math.max(m, Math.abs(v));
        }
        return m;
    }

    static double maxAbsDiff(double[] a, double[] b) {
        double m = 0;
        for (int i = 0; i < a.length; i++) {
            m = Math.max(m, Math.abs(a[i] - b[i]));
        }
        return m;
    }

    static double norm(double x, double y, double z) {
        return Math.sqrt(x * x + y * y + z * z);
    }
}
