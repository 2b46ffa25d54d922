package org.twinorbit.harness.export;

import java.util.List;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;

/**
 * A field at one point, as {@code twinorbit probe} prints it and the field card tabulates it:
 * B, |B|, b, E, the Jacobian ∂B_i/∂x_j (row i, column j), ∇|B| and the curvature (b·∇)b.
 */
public final class FieldProbe {

    private FieldProbe() {}

    /** Columns after the point, in output order, with their SI units in the names. */
    public static final List<String> COLUMNS = List.of("bx_t", "by_t", "bz_t", "b_t", "ux", "uy", "uz",
            "ex_v_per_m", "ey_v_per_m", "ez_v_per_m",
            "dbx_dx_t_per_m", "dbx_dy_t_per_m", "dbx_dz_t_per_m",
            "dby_dx_t_per_m", "dby_dy_t_per_m", "dby_dz_t_per_m",
            "dbz_dx_t_per_m", "dbz_dy_t_per_m", "dbz_dz_t_per_m",
            "grad_b_x_t_per_m", "grad_b_y_t_per_m", "grad_b_z_t_per_m",
            "curvature_x_per_m", "curvature_y_per_m", "curvature_z_per_m", "in_domain");

    /** The output columns at point p = (x, y, z, t); NaN for a point outside the domain. */
    public static double[] values(Field f, double[] p, FieldSample s) {
        double[] v = new double[COLUMNS.size()];
        boolean inside = f.inDomain(p[0], p[1], p[2]);
        if (!inside) {
            java.util.Arrays.fill(v, Double.NaN);
            v[v.length - 1] = 0;
            return v;
        }
        f.evaluate(p[3], p[0], p[1], p[2], s);
        double[] b = s.unitB(new double[3]);
        double[] g = s.gradBMag(new double[3]);
        double[] k = s.curvature(new double[3]);
        double[] head = {s.bx, s.by, s.bz, s.bMag(), b[0], b[1], b[2], s.ex, s.ey, s.ez};
        System.arraycopy(head, 0, v, 0, head.length);
        System.arraycopy(s.dB, 0, v, head.length, 9);
        System.arraycopy(g, 0, v, head.length + 9, 3);
        System.arraycopy(k, 0, v, head.length + 12, 3);
        v[v.length - 1] = 1;
        return v;
    }

}
