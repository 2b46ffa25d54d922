package org.twinorbit.fields;

import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Vec3;

/**
 * A static magnetic field given on a uniform Cartesian grid, interpolated by tricubic Hermite
 * interpolation of each component ({@link TricubicTable}; Lekien &amp; Marsden, Int. J. Numer.
 * Meth. Eng. 63, 2005). The interpolant and its first derivatives are continuous across cells,
 * and the Jacobian reported is the interpolant's own derivative, so the guiding-center equations
 * see one consistent field. Error: O(h³) in B and O(h²) in its Jacobian for a smooth field (the
 * O(h²) nodal differences set it). An electrostatic potential Φ on the same nodes, when given, is
 * interpolated the same way and E = −∇Φ is the interpolant's own gradient (O(h²)), so the energy
 * W = kinetic + qΦ is an exact invariant of the interpolated field. The domain is the grid box; a
 * particle leaving it is lost.
 */
public final class GridField extends GriddedFieldBase {

    private final double[][] axes;
    private final double[] x0 = new double[3];
    private final double[] h = new double[3];
    private final int[] n = new int[3];
    private final TricubicTable table;

    /**
     * @param name   the field's name in reports
     * @param axes   the grid coordinates (m) along x, y and z, uniform, at least 4 nodes each
     * @param b      B_x, B_y, B_z (T) at the nodes, [component][i][j][k]
     * @param phi    Φ (V) at the nodes, [i][j][k]; null for a field without E
     * @param length the field's length L (m) that defines ε
     * @param meaning what L means, for reports
     */
    public GridField(String name, double[][] axes, double[][][][] b, double[][][] phi, double length, String meaning) {
        super(name, length, meaning, phi != null);
        this.axes = axes;
        for (int a = 0; a < 3; a++) {
            n[a] = axes[a].length;
            x0[a] = axes[a][0];
            h[a] = (axes[a][n[a] - 1] - axes[a][0]) / (n[a] - 1);
        }
        this.table = new TricubicTable(x0, h, electric ? new double[][][][] {b[0], b[1], b[2], phi} : b, new boolean[3]);
    }

    /** Per-thread scratch, so that an evaluation allocates nothing. */
    private static final class Scratch {
        final double[] val = new double[4];
        final double[][] grad = new double[4][3];
    }

    private final ThreadLocal<Scratch> scratch = ThreadLocal.withInitial(Scratch::new);

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        Scratch sc = scratch.get();
        table.evaluate(x, y, z, sc.val, sc.grad);
        out.bx = sc.val[0];
        out.by = sc.val[1];
        out.bz = sc.val[2];
        for (int c = 0; c < 3; c++) {
            for (int a = 0; a < 3; a++) {
                out.dB[3 * c + a] = sc.grad[c][a];
            }
        }
        if (electric) {
            out.ex = -sc.grad[3][0];
            out.ey = -sc.grad[3][1];
            out.ez = -sc.grad[3][2];
        }
    }

    @Override
    double interpolatedPotential(double x, double y, double z) {
        Scratch sc = scratch.get();
        table.evaluate(x, y, z, sc.val, sc.grad);
        return sc.val[3];
    }

    @Override
    double gridMargin(double x, double y, double z) {
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
    String gridMeaning() {
        return "the grid box";
    }

    @Override
    public Vec3 defaultStart() {
        return new Vec3(x0[0] + h[0] * (n[0] - 1) / 2, x0[1] + h[1] * (n[1] - 1) / 2, x0[2] + h[2] * (n[2] - 1) / 2);
    }

    @Override public GridGeometry geometry() { return GridGeometry.CARTESIAN; }

    @Override
    public String gridSummary() {
        return String.format(java.util.Locale.ROOT, "cartesian grid of %d x %d x %d nodes (x, y, z), spacing %.4g, %.4g, "
                + "%.4g m, tricubic Hermite%s", n[0], n[1], n[2], h[0], h[1], h[2], electric ? ", with Phi" : "");
    }

    @Override
    public double[][] cellCentres() {
        double[][] p = new double[(n[0] - 1) * (n[1] - 1) * (n[2] - 1)][];
        int m = 0;
        for (int i = 0; i + 1 < n[0]; i++) {
            for (int j = 0; j + 1 < n[1]; j++) {
                for (int k = 0; k + 1 < n[2]; k++) {
                    p[m++] = new double[] {(axes[0][i] + axes[0][i + 1]) / 2, (axes[1][j] + axes[1][j + 1]) / 2,
                        (axes[2][k] + axes[2][k + 1]) / 2};
                }
            }
        }
        return p;
    }

    @Override
    double extent() {
        return Math.max(h[0] * (n[0] - 1), Math.max(h[1] * (n[1] - 1), h[2] * (n[2] - 1)));
    }
}
