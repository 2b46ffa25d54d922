package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Vec3;

/**
 * A static magnetic field given on a uniform Cartesian grid, interpolated by tricubic Hermite
 * interpolation of each component: the tensor product of cubic Hermite polynomials in x, y and
 * z, built from the nodal values and the nodal derivatives ∂/∂x, ∂/∂y, ∂/∂z, ∂²/∂x∂y, ∂²/∂x∂z,
 * ∂²/∂y∂z, ∂³/∂x∂y∂z (Lekien &amp; Marsden, Int. J. Numer. Meth. Eng. 63, 2005). The nodal
 * derivatives are central differences of the grid (one-sided at the faces). The interpolant and
 * its first derivatives are continuous across cells, and the Jacobian reported is the
 * interpolant's own derivative, so the guiding-center equations see one consistent field. Error:
 * O(h³) in B and O(h²) in its Jacobian for a smooth field (the O(h²) nodal derivatives set it).
 * The domain is the grid box; a particle leaving it is lost.
 */
public final class GridField implements Field {

    private final String name;
    private final double[] x0 = new double[3];
    private final double[] h = new double[3];
    private final int[] n = new int[3];
    /** Per component c: value and derivative tables [c][d][i][j][k], d over the 8 Hermite data. */
    private final double[][][][][] data;
    private final double length;
    private final String meaning;
    private final List<Invariant> invariants;

    /**
     * @param name   the field's name in reports
     * @param axes   the grid coordinates (m) along x, y and z, uniform, at least 4 nodes each
     * @param b      B_x, B_y, B_z (T) at the nodes, [component][i][j][k]
     * @param length the field's length L (m) that defines ε
     * @param meaning what L means, for reports
     */
    public GridField(String name, double[][] axes, double[][][][] b, double length, String meaning) {
        this.name = name;
        for (int a = 0; a < 3; a++) {
            n[a] = axes[a].length;
            x0[a] = axes[a][0];
            h[a] = (axes[a][n[a] - 1] - axes[a][0]) / (n[a] - 1);
        }
        this.length = length;
        this.meaning = meaning;
        data = new double[3][8][][][];
        for (int c = 0; c < 3; c++) {
            data[c][0] = b[c];
            data[c][1] = diff(b[c], 0);
            data[c][2] = diff(b[c], 1);
            data[c][3] = diff(b[c], 2);
            data[c][4] = diff(data[c][1], 1);
            data[c][5] = diff(data[c][1], 2);
            data[c][6] = diff(data[c][2], 2);
            data[c][7] = diff(data[c][4], 2);
        }
        this.invariants = List.of(Invariants.energy(this));
    }

    /** ∂f/∂(axis) at the nodes: central differences, one-sided second-order at the faces. */
    private double[][][] diff(double[][][] f, int axis) {
        double[][][] d = new double[n[0]][n[1]][n[2]];
        for (int i = 0; i < n[0]; i++) {
            for (int j = 0; j < n[1]; j++) {
                for (int k = 0; k < n[2]; k++) {
                    int[] idx = {i, j, k};
                    int m = idx[axis];
                    int last = n[axis] - 1;
                    double v;
                    if (m == 0) {
                        v = (-3 * at(f, idx, axis, 0) + 4 * at(f, idx, axis, 1) - at(f, idx, axis, 2)) / (2 * h[axis]);
                    } else if (m == last) {
                        v = (3 * at(f, idx, axis, last) - 4 * at(f, idx, axis, last - 1) + at(f, idx, axis, last - 2))
                                / (2 * h[axis]);
                    } else {
                        v = (at(f, idx, axis, m + 1) - at(f, idx, axis, m - 1)) / (2 * h[axis]);
                    }
                    d[i][j][k] = v;
                }
            }
        }
        return d;
    }

    private static double at(double[][][] f, int[] idx, int axis, int m) {
        int i = axis == 0 ? m : idx[0];
        int j = axis == 1 ? m : idx[1];
        int k = axis == 2 ? m : idx[2];
        return f[i][j][k];
    }

    @Override public String name() { return name; }

    /** Per-thread scratch, so that an evaluation allocates nothing. */
    private static final class Scratch {
        final int[] cell = new int[3];
        final double[] u = new double[3];
        final double[][] w = new double[3][4];
        final double[][] dw = new double[3][4];
        final double[] val = new double[3];
        final double[][] grad = new double[3][3];
    }

    private final ThreadLocal<Scratch> scratch = ThreadLocal.withInitial(Scratch::new);

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        Scratch sc = scratch.get();
        int[] cell = sc.cell;
        double[] u = sc.u;
        for (int a = 0; a < 3; a++) {
            double p = a == 0 ? x : a == 1 ? y : z;
            double s = (p - x0[a]) / h[a];
            int c = (int) Math.floor(s);
            c = Math.max(0, Math.min(n[a] - 2, c));
            cell[a] = c;
            u[a] = s - c;
            basis(u[a], h[a], sc.w[a], sc.dw[a]);
        }
        double[][] w = sc.w;
        double[][] dw = sc.dw;
        double[] val = sc.val;
        double[][] grad = sc.grad;
        for (int c = 0; c < 3; c++) {
            val[c] = 0;
            grad[c][0] = grad[c][1] = grad[c][2] = 0;
            for (int ci = 0; ci < 2; ci++) {
                for (int cj = 0; cj < 2; cj++) {
                    for (int ck = 0; ck < 2; ck++) {
                        int i = cell[0] + ci, j = cell[1] + cj, k = cell[2] + ck;
                        // d = 0..7 over (value, dx, dy, dz, dxy, dxz, dyz, dxyz): which factor is a slope
                        for (int d = 0; d < 8; d++) {
                            boolean sx = d == 1 || d == 4 || d == 5 || d == 7;
                            boolean sy = d == 2 || d == 4 || d == 6 || d == 7;
                            boolean sz = d == 3 || d == 5 || d == 6 || d == 7;
                            int bx = (sx ? 2 : 0) + ci, by = (sy ? 2 : 0) + cj, bz = (sz ? 2 : 0) + ck;
                            double f = data[c][d][i][j][k];
                            val[c] += f * w[0][bx] * w[1][by] * w[2][bz];
                            grad[c][0] += f * dw[0][bx] * w[1][by] * w[2][bz];
                            grad[c][1] += f * w[0][bx] * dw[1][by] * w[2][bz];
                            grad[c][2] += f * w[0][bx] * w[1][by] * dw[2][bz];
                        }
                    }
                }
            }
        }
        out.bx = val[0];
        out.by = val[1];
        out.bz = val[2];
        for (int c = 0; c < 3; c++) {
            for (int a = 0; a < 3; a++) {
                out.dB[3 * c + a] = grad[c][a];
            }
        }
    }

    /**
     * Cubic Hermite basis on a cell of width hh at fraction u: w[0], w[1] weigh the values at the
     * cell's two ends, w[2], w[3] the slopes (per metre, hence the factor hh); dw are d/dx.
     */
    private static void basis(double u, double hh, double[] w, double[] dw) {
        double u2 = u * u, u3 = u2 * u;
        w[0] = 2 * u3 - 3 * u2 + 1;
        w[1] = -2 * u3 + 3 * u2;
        w[2] = (u3 - 2 * u2 + u) * hh;
        w[3] = (u3 - u2) * hh;
        dw[0] = (6 * u2 - 6 * u) / hh;
        dw[1] = (-6 * u2 + 6 * u) / hh;
        dw[2] = 3 * u2 - 4 * u + 1;
        dw[3] = 3 * u2 - 2 * u;
    }

    /** Not known for a field given only as B on a grid: NaN (no canonical invariant uses it). */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        java.util.Arrays.fill(out, Double.NaN);
    }

    @Override public double length() { return length; }
    @Override public String lengthMeaning() { return meaning; }
    @Override public boolean hasElectricField() { return false; }

    @Override
    public double domainMargin(double x, double y, double z) {
        double[] p = {x, y, z};
        double m = Double.POSITIVE_INFINITY;
        for (int a = 0; a < 3; a++) {
            double lo = p[a] - x0[a];
            double hi = x0[a] + h[a] * (n[a] - 1) - p[a];
            m = Math.min(m, Math.min(lo, hi));
        }
        return m;
    }

    @Override
    public String domainMeaning() {
        return "the grid box; a particle leaving it is lost";
    }

    @Override public List<Invariant> invariants() { return invariants; }

    @Override
    public Vec3 defaultStart() {
        return new Vec3(x0[0] + h[0] * (n[0] - 1) / 2, x0[1] + h[1] * (n[1] - 1) / 2, x0[2] + h[2] * (n[2] - 1) / 2);
    }
}
