package org.twinorbit.fields;

/**
 * Bicubic Hermite interpolation of several components on a uniform 2-D grid: the tensor product of
 * cubic Hermite polynomials built from the nodal values and the nodal derivatives ∂/∂1, ∂/∂2 and
 * ∂²/∂1∂2, the derivatives being second-order differences of the grid ({@link CubicHermite#diff}).
 * Value and first derivatives are continuous across cells, and the derivatives returned are the
 * interpolant's own. Evaluation allocates nothing after a thread's first call.
 */
final class BicubicTable {

    private final double[] x0 = new double[2];
    private final double[] h = new double[2];
    private final int[] n = new int[2];
    /** Per component c: [c][d][i][k], d over value, ∂1, ∂2, ∂1∂2. */
    private final double[][][][] data;

    /**
     * @param origin  the first node's coordinate along each axis
     * @param spacing the node spacing along each axis (the axis's unit)
     * @param values  the components at the nodes, [component][i][k]
     */
    BicubicTable(double[] origin, double[] spacing, double[][][] values) {
        n[0] = values[0].length;
        n[1] = values[0][0].length;
        for (int a = 0; a < 2; a++) {
            x0[a] = origin[a];
            h[a] = spacing[a];
        }
        data = new double[values.length][4][][];
        for (int c = 0; c < values.length; c++) {
            double[][][] v = {values[c]};
            double[][][] d1 = CubicHermite.diff(v, 1, h[0], false);
            data[c][0] = values[c];
            data[c][1] = d1[0];
            data[c][2] = CubicHermite.diff(v, 2, h[1], false)[0];
            data[c][3] = CubicHermite.diff(d1, 2, h[1], false)[0];
        }
    }

    private static final class Scratch {
        final int[] lo = new int[2];
        final double[][] w = new double[2][4];
        final double[][] dw = new double[2][4];
    }

    private final ThreadLocal<Scratch> scratch = ThreadLocal.withInitial(Scratch::new);

    /**
     * The interpolated components at (p0, p1) into val[c], their derivatives ∂/∂p_a into
     * grad[c][a] (a = 0, 1). Outside the grid the end cell's polynomial is extended.
     */
    void evaluate(double p0, double p1, double[] val, double[][] grad) {
        Scratch sc = scratch.get();
        int[] lo = sc.lo;
        for (int a = 0; a < 2; a++) {
            double s = ((a == 0 ? p0 : p1) - x0[a]) / h[a];
            int c = Math.max(0, Math.min(n[a] - 2, (int) Math.floor(s)));
            lo[a] = c;
            CubicHermite.basis(s - c, h[a], sc.w[a], sc.dw[a]);
        }
        double[][] w = sc.w;
        double[][] dw = sc.dw;
        for (int c = 0; c < data.length; c++) {
            double v = 0, g0 = 0, g1 = 0;
            double[][][] dc = data[c];
            for (int ci = 0; ci < 2; ci++) {
                int i = lo[0] + ci;
                for (int ck = 0; ck < 2; ck++) {
                    int k = lo[1] + ck;
                    // d = 0..3 over (value, d1, d2, d12): which factor is a slope
                    for (int d = 0; d < 4; d++) {
                        int b1 = ((d & 1) != 0 ? 2 : 0) + ci;
                        int b2 = ((d & 2) != 0 ? 2 : 0) + ck;
                        double f = dc[d][i][k];
                        v += f * w[0][b1] * w[1][b2];
                        g0 += f * dw[0][b1] * w[1][b2];
                        g1 += f * w[0][b1] * dw[1][b2];
                    }
                }
            }
            val[c] = v;
            grad[c][0] = g0;
            grad[c][1] = g1;
        }
    }
}
