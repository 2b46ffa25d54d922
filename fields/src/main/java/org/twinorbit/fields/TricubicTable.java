package org.twinorbit.fields;

/**
 * Tricubic Hermite interpolation of several components on a uniform 3-D grid: the tensor product of
 * cubic Hermite polynomials along each axis, built from the nodal values and the nodal derivatives
 * ∂/∂1, ∂/∂2, ∂/∂3, ∂²/∂1∂2, ∂²/∂1∂3, ∂²/∂2∂3, ∂³/∂1∂2∂3 (Lekien &amp; Marsden, Int. J. Numer.
 * Meth. Eng. 63, 2005), the derivatives being second-order differences of the grid
 * ({@link CubicHermite#diff}). Value and first derivatives are continuous across cells; an axis may
 * be periodic (the last node's cell wraps round to the first). The derivatives returned are the
 * interpolant's own. Evaluation allocates nothing after a thread's first call.
 */
final class TricubicTable {

    private final double[] x0 = new double[3];
    private final double[] h = new double[3];
    private final int[] n = new int[3];
    private final boolean[] periodic;
    /** Per component c: value and derivative tables [c][d][i][j][k], d over the 8 Hermite data. */
    private final double[][][][][] data;

    /**
     * @param origin   the first node's coordinate along each axis
     * @param spacing  the node spacing along each axis (the axis's unit)
     * @param values   the components at the nodes, [component][i][j][k]
     * @param periodic per axis: true when the axis wraps round (nodes cover one full period)
     */
    TricubicTable(double[] origin, double[] spacing, double[][][][] values, boolean[] periodic) {
        this.periodic = periodic.clone();
        n[0] = values[0].length;
        n[1] = values[0][0].length;
        n[2] = values[0][0][0].length;
        for (int a = 0; a < 3; a++) {
            x0[a] = origin[a];
            h[a] = spacing[a];
        }
        data = new double[values.length][8][][][];
        for (int c = 0; c < values.length; c++) {
            data[c][0] = values[c];
            data[c][1] = CubicHermite.diff(values[c], 0, h[0], periodic[0]);
            data[c][2] = CubicHermite.diff(values[c], 1, h[1], periodic[1]);
            data[c][3] = CubicHermite.diff(values[c], 2, h[2], periodic[2]);
            data[c][4] = CubicHermite.diff(data[c][1], 1, h[1], periodic[1]);
            data[c][5] = CubicHermite.diff(data[c][1], 2, h[2], periodic[2]);
            data[c][6] = CubicHermite.diff(data[c][2], 2, h[2], periodic[2]);
            data[c][7] = CubicHermite.diff(data[c][4], 2, h[2], periodic[2]);
        }
    }

    /** Per-thread scratch, so that an evaluation allocates nothing. */
    private static final class Scratch {
        final int[] lo = new int[3];
        final int[] hi = new int[3];
        final double[][] w = new double[3][4];
        final double[][] dw = new double[3][4];
    }

    private final ThreadLocal<Scratch> scratch = ThreadLocal.withInitial(Scratch::new);

    /**
     * The interpolated components at (p0, p1, p2) into val[c], their derivatives ∂/∂p_a into
     * grad[c][a]. Outside a non-periodic axis the end cell's polynomial is extended.
     */
    void evaluate(double p0, double p1, double p2, double[] val, double[][] grad) {
        Scratch sc = scratch.get();
        int[] lo = sc.lo;
        int[] hi = sc.hi;
        for (int a = 0; a < 3; a++) {
            double p = a == 0 ? p0 : a == 1 ? p1 : p2;
            double s = (p - x0[a]) / h[a];
            int c;
            if (periodic[a]) {
                s -= n[a] * Math.floor(s / n[a]);
                c = Math.min((int) s, n[a] - 1);
                hi[a] = c + 1 == n[a] ? 0 : c + 1;
            } else {
                c = Math.max(0, Math.min(n[a] - 2, (int) Math.floor(s)));
                hi[a] = c + 1;
            }
            lo[a] = c;
            CubicHermite.basis(s - c, h[a], sc.w[a], sc.dw[a]);
        }
        double[][] w = sc.w;
        double[][] dw = sc.dw;
        for (int c = 0; c < data.length; c++) {
            double v = 0, g0 = 0, g1 = 0, g2 = 0;
            double[][][][] dc = data[c];
            for (int ci = 0; ci < 2; ci++) {
                int i = ci == 0 ? lo[0] : hi[0];
                for (int cj = 0; cj < 2; cj++) {
                    int j = cj == 0 ? lo[1] : hi[1];
                    for (int ck = 0; ck < 2; ck++) {
                        int k = ck == 0 ? lo[2] : hi[2];
                        // d = 0..7 over (value, d1, d2, d3, d12, d13, d23, d123): which factor is a slope
                        for (int d = 0; d < 8; d++) {
                            boolean s1 = d == 1 || d == 4 || d == 5 || d == 7;
                            boolean s2 = d == 2 || d == 4 || d == 6 || d == 7;
                            boolean s3 = d == 3 || d == 5 || d == 6 || d == 7;
                            int b1 = (s1 ? 2 : 0) + ci, b2 = (s2 ? 2 : 0) + cj, b3 = (s3 ? 2 : 0) + ck;
                            double f = dc[d][i][j][k];
                            v += f * w[0][b1] * w[1][b2] * w[2][b3];
                            g0 += f * dw[0][b1] * w[1][b2] * w[2][b3];
                            g1 += f * w[0][b1] * dw[1][b2] * w[2][b3];
                            g2 += f * w[0][b1] * w[1][b2] * dw[2][b3];
                        }
                    }
                }
            }
            val[c] = v;
            grad[c][0] = g0;
            grad[c][1] = g1;
            grad[c][2] = g2;
        }
    }
}
