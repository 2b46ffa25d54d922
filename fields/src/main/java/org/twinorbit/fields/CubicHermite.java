package org.twinorbit.fields;

/**
 * The pieces shared by the gridded fields: the cubic Hermite basis on one cell and the nodal
 * derivatives it is fed with (second-order differences of the grid values).
 */
final class CubicHermite {

    private CubicHermite() {}

    /**
     * Cubic Hermite basis on a cell of width hh at fraction u: w[0], w[1] weigh the values at the
     * cell's two ends, w[2], w[3] the slopes (per unit of the coordinate, hence the factor hh);
     * dw are the derivatives with respect to the coordinate.
     */
    static void basis(double u, double hh, double[] w, double[] dw) {
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

    /**
     * ∂f/∂(axis) at the nodes of f[i][j][k], spacing h along that axis: central differences,
     * wrapping round on a periodic axis and one-sided second order at the faces otherwise
     * (common practice). An axis of one node has derivative 0.
     */
    static double[][][] diff(double[][][] f, int axis, double h, boolean periodic) {
        int[] n = {f.length, f[0].length, f[0][0].length};
        double[][][] d = new double[n[0]][n[1]][n[2]];
        int last = n[axis] - 1;
        if (last == 0) {
            return d;
        }
        int[] idx = new int[3];
        for (idx[0] = 0; idx[0] < n[0]; idx[0]++) {
            for (idx[1] = 0; idx[1] < n[1]; idx[1]++) {
                for (idx[2] = 0; idx[2] < n[2]; idx[2]++) {
                    int m = idx[axis];
                    double v;
                    if (periodic) {
                        v = (at(f, idx, axis, (m + 1) % n[axis]) - at(f, idx, axis, (m + last) % n[axis])) / (2 * h);
                    } else if (m == 0) {
                        v = (-3 * at(f, idx, axis, 0) + 4 * at(f, idx, axis, 1) - at(f, idx, axis, 2)) / (2 * h);
                    } else if (m == last) {
                        v = (3 * at(f, idx, axis, last) - 4 * at(f, idx, axis, last - 1) + at(f, idx, axis, last - 2))
                                / (2 * h);
                    } else {
                        v = (at(f, idx, axis, m + 1) - at(f, idx, axis, m - 1)) / (2 * h);
                    }
                    d[idx[0]][idx[1]][idx[2]] = v;
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
}
