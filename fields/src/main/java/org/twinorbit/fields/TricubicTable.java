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
    private final int components;
    /**
     * Values and derivatives, node-major so that a cell corner's data sit together: entry
     * ((node · components + c) · 8 + d), node = (i · n1 + j) · n2 + k, d over the 8 Hermite data
     * (value, ∂1, ∂2, ∂3, ∂1∂2, ∂1∂3, ∂2∂3, ∂1∂2∂3).
     */
    private final double[] table;

    /** Per Hermite datum d: whether the factor along axis 1, 2, 3 is a slope. */
    private static final int[] SLOPE1 = {0, 1, 0, 0, 1, 1, 0, 1};
    private static final int[] SLOPE2 = {0, 0, 1, 0, 1, 0, 1, 1};
    private static final int[] SLOPE3 = {0, 0, 0, 1, 0, 1, 1, 1};

    /**
     * @param origin   the first node's coordinate along each axis
     * @param spacing  the node spacing along each axis (the axis's unit)
     * @param values   the components at the nodes, [component][i][j][k]
     * @param periodic per axis: true when the axis wraps round (nodes cover one full period)
     */
    TricubicTable(double[] origin, double[] spacing, double[][][][] values, boolean[] periodic) {
        this.periodic = periodic.clone();
        components = values.length;
        n[0] = values[0].length;
        n[1] = values[0][0].length;
        n[2] = values[0][0][0].length;
        for (int a = 0; a < 3; a++) {
            x0[a] = origin[a];
            h[a] = spacing[a];
        }
        table = new double[n[0] * n[1] * n[2] * components * 8];
        for (int c = 0; c < components; c++) {
            double[][][][] d = new double[8][][][];
            d[0] = values[c];
            d[1] = CubicHermite.diff(values[c], 0, h[0], periodic[0]);
            d[2] = CubicHermite.diff(values[c], 1, h[1], periodic[1]);
            d[3] = CubicHermite.diff(values[c], 2, h[2], periodic[2]);
            d[4] = CubicHermite.diff(d[1], 1, h[1], periodic[1]);
            d[5] = CubicHermite.diff(d[1], 2, h[2], periodic[2]);
            d[6] = CubicHermite.diff(d[2], 2, h[2], periodic[2]);
            d[7] = CubicHermite.diff(d[4], 2, h[2], periodic[2]);
            for (int i = 0; i < n[0]; i++) {
                for (int j = 0; j < n[1]; j++) {
                    for (int k = 0; k < n[2]; k++) {
                        int base = (((i * n[1] + j) * n[2] + k) * components + c) * 8;
                        for (int q = 0; q < 8; q++) {
                            table[base + q] = d[q][i][j][k];
                        }
                    }
                }
            }
        }
    }

    /** Per-thread scratch, so that an evaluation allocates nothing. */
    private static final class Scratch {
        final int[] lo = new int[3];
        final int[] hi = new int[3];
        final double[][] w = new double[3][4];
        final double[][] dw = new double[3][4];
        /** Weights of the 8 data of one corner for the value and the three derivatives. */
        final double[] wv = new double[8];
        final double[] w1 = new double[8];
        final double[] w2 = new double[8];
        final double[] w3 = new double[8];
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
        for (int c = 0; c < components; c++) {
            val[c] = 0;
            grad[c][0] = 0;
            grad[c][1] = 0;
            grad[c][2] = 0;
        }
        double[] wa = sc.w[0], wb = sc.w[1], wc = sc.w[2];
        double[] da = sc.dw[0], db = sc.dw[1], dc = sc.dw[2];
        double[] wv = sc.wv, w1 = sc.w1, w2 = sc.w2, w3 = sc.w3;
        for (int corner = 0; corner < 8; corner++) {
            int ci = corner >> 2, cj = (corner >> 1) & 1, ck = corner & 1;
            int i = ci == 0 ? lo[0] : hi[0];
            int j = cj == 0 ? lo[1] : hi[1];
            int k = ck == 0 ? lo[2] : hi[2];
            for (int d = 0; d < 8; d++) {
                int b1 = 2 * SLOPE1[d] + ci, b2 = 2 * SLOPE2[d] + cj, b3 = 2 * SLOPE3[d] + ck;
                double yz = wb[b2] * wc[b3];
                wv[d] = wa[b1] * yz;
                w1[d] = da[b1] * yz;
                w2[d] = wa[b1] * db[b2] * wc[b3];
                w3[d] = wa[b1] * wb[b2] * dc[b3];
            }
            int base = ((i * n[1] + j) * n[2] + k) * components * 8;
            for (int c = 0; c < components; c++) {
                int off = base + 8 * c;
                double v = 0, g0 = 0, g1 = 0, g2 = 0;
                for (int d = 0; d < 8; d++) {
                    double f = table[off + d];
                    v += f * wv[d];
                    g0 += f * w1[d];
                    g1 += f * w2[d];
                    g2 += f * w3[d];
                }
                val[c] += v;
                grad[c][0] += g0;
                grad[c][1] += g1;
                grad[c][2] += g2;
            }
        }
    }
}
