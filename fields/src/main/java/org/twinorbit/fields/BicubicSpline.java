package org.twinorbit.fields;

import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;

/**
 * The bicubic interpolating spline of values on a uniform (R, Z) grid: twice continuously
 * differentiable, built as de Boor does (J. Math. Phys. 41, 212, 1962): the nodal slopes f_R, f_Z
 * and the cross derivative f_RZ come from one-dimensional cubic splines along the grid lines
 * (Commons Math {@link SplineInterpolator}, natural end conditions), and each cell is the bicubic
 * Hermite patch of those 16 numbers, which is then exactly the tensor-product spline.
 *
 * <p>Why this interpolant: B needs ∇ψ and its Jacobian needs ψ's second derivatives; a C² ψ
 * makes the Jacobian the interpolant's own, continuous derivative, so the guiding-center
 * equations see one consistent field. Error for a smooth ψ away from the grid's edge: O(h⁴) in ψ,
 * O(h³) in B, O(h²) in the Jacobian. The natural end condition costs accuracy only within a few
 * cells of the grid's edge (the error decays by 2 − √3 per cell inward).
 */
public final class BicubicSpline {

    private final double r0;
    private final double z0;
    private final double hr;
    private final double hz;
    private final int nr;
    private final int nz;
    private final double[][] f;
    private final double[][] fr;
    private final double[][] fz;
    private final double[][] frz;

    /**
     * @param r0     the first grid R (m)
     * @param hr     the R spacing (m)
     * @param z0     the first grid Z (m)
     * @param hz     the Z spacing (m)
     * @param values [iR][iZ], at least 4 × 4
     */
    public BicubicSpline(double r0, double hr, double z0, double hz, double[][] values) {
        this.r0 = r0;
        this.z0 = z0;
        this.hr = hr;
        this.hz = hz;
        this.nr = values.length;
        this.nz = values[0].length;
        this.f = values;
        this.fr = new double[nr][nz];
        this.fz = new double[nr][nz];
        this.frz = new double[nr][nz];
        double[] rs = axis(r0, hr, nr);
        double[] zs = axis(z0, hz, nz);
        double[] line = new double[nr];
        for (int j = 0; j < nz; j++) {
            for (int i = 0; i < nr; i++) {
                line[i] = f[i][j];
            }
            double[] d = slopes(rs, line);
            for (int i = 0; i < nr; i++) {
                fr[i][j] = d[i];
            }
        }
        for (int i = 0; i < nr; i++) {
            double[] d = slopes(zs, f[i]);
            double[] dd = slopes(zs, fr[i]);
            for (int j = 0; j < nz; j++) {
                fz[i][j] = d[j];
                frz[i][j] = dd[j];
            }
        }
    }

    private static double[] axis(double x0, double h, int n) {
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = x0 + i * h;
        }
        return a;
    }

    /** The cubic spline's slopes at its own knots. */
    private static double[] slopes(double[] x, double[] y) {
        PolynomialSplineFunction s = new SplineInterpolator().interpolate(x, y);
        PolynomialSplineFunction d = s.polynomialSplineDerivative();
        double[] out = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            out[i] = d.value(x[i]);
        }
        return out;
    }

    /** Per-thread Hermite weights, so that an evaluation allocates nothing. */
    private static final class Weights {
        final double[] wr = new double[4];
        final double[] dwr = new double[4];
        final double[] d2wr = new double[4];
        final double[] wz = new double[4];
        final double[] dwz = new double[4];
        final double[] d2wz = new double[4];
    }

    private final ThreadLocal<Weights> weights = ThreadLocal.withInitial(Weights::new);

    /**
     * f, ∂f/∂R, ∂f/∂Z, ∂²f/∂R², ∂²f/∂R∂Z, ∂²f/∂Z² at (R, Z) (m) into out[0..5]; outside the grid
     * the edge cell's polynomial continues.
     */
    public void evaluate(double r, double z, double[] out) {
        Weights w = weights.get();
        double sr = (r - r0) / hr;
        int i = Math.max(0, Math.min(nr - 2, (int) Math.floor(sr)));
        double sz = (z - z0) / hz;
        int j = Math.max(0, Math.min(nz - 2, (int) Math.floor(sz)));
        basis(sr - i, hr, w.wr, w.dwr, w.d2wr);
        basis(sz - j, hz, w.wz, w.dwz, w.d2wz);
        double v = 0, vr = 0, vz = 0, vrr = 0, vrz = 0, vzz = 0;
        for (int a = 0; a < 2; a++) {
            for (int b = 0; b < 2; b++) {
                int ii = i + a;
                int jj = j + b;
                // the four data of a corner (f, f_R, f_Z, f_RZ) and the basis function each takes
                // in R and in Z: the value's (a, b) or the slope's (2 + a, 2 + b)
                for (int k = 0; k < 4; k++) {
                    int br = (k == 1 || k == 3 ? 2 : 0) + a;
                    int bz = (k == 2 || k == 3 ? 2 : 0) + b;
                    double c = k == 0 ? f[ii][jj] : k == 1 ? fr[ii][jj] : k == 2 ? fz[ii][jj] : frz[ii][jj];
                    v += c * w.wr[br] * w.wz[bz];
                    vr += c * w.dwr[br] * w.wz[bz];
                    vz += c * w.wr[br] * w.dwz[bz];
                    vrr += c * w.d2wr[br] * w.wz[bz];
                    vrz += c * w.dwr[br] * w.dwz[bz];
                    vzz += c * w.wr[br] * w.d2wz[bz];
                }
            }
        }
        out[0] = v;
        out[1] = vr;
        out[2] = vz;
        out[3] = vrr;
        out[4] = vrz;
        out[5] = vzz;
    }

    /**
     * The cubic Hermite basis w and its d/dx dw on a cell of width h (m) at fraction u
     * ({@link CubicHermite#basis}), and its d²/dx² d2w.
     */
    private static void basis(double u, double h, double[] w, double[] dw, double[] d2w) {
        CubicHermite.basis(u, h, w, dw);
        d2w[0] = (12 * u - 6) / (h * h);
        d2w[1] = (6 - 12 * u) / (h * h);
        d2w[2] = (6 * u - 4) / h;
        d2w[3] = (6 * u - 2) / h;
    }
}
