package org.twinorbit.harness.cases;

import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * Initial states of one gyrophase of the ensemble. The default placement of DESIGN.md: the
 * guiding center X0 with μ and p∥ from the energy and pitch, and the particle placed at zeroth
 * order around it, x = X0 + m(b×w)/(qB), u = u∥ b + w + γ v_E, with w of length u⊥ turned by
 * the gyrophase in the plane perpendicular to b.
 *
 * @param x       particle position (m)
 * @param u       particle u = γv (m/s)
 * @param gc      guiding-center position (m)
 * @param pPar    parallel momentum (kg m/s)
 * @param mu      magnetic moment p⊥²/(2mB) (J/T)
 */
public record Placement(double[] x, double[] u, double[] gc, double pPar, double mu) {

    /**
     * The state of gyrophase {@code phaseRad} (rad).
     *
     * @param uTotal |u| = γ|v| (m/s) @param pitchDeg pitch angle (degrees)
     */
    public static Placement of(Field field, Species s, Vec3 x0, double uTotal, double pitchDeg, double phaseRad) {
        FieldSample fs = new FieldSample();
        field.evaluate(0, x0.x(), x0.y(), x0.z(), fs);
        double bm = fs.bMag();
        double[] b = fs.unitB(new double[3]);
        double[] e1 = perpendicular(b);
        double[] e2 = {b[1] * e1[2] - b[2] * e1[1], b[2] * e1[0] - b[0] * e1[2], b[0] * e1[1] - b[1] * e1[0]};
        double uPar = uTotal * Math.cos(Math.toRadians(pitchDeg));
        double uPerp = uTotal * Math.sin(Math.toRadians(pitchDeg));
        double c = Math.cos(phaseRad);
        double sn = Math.sin(phaseRad);
        double[] w = new double[3];
        for (int k = 0; k < 3; k++) {
            w[k] = uPerp * (c * e1[k] + sn * e2[k]);
        }
        double gamma = Math.sqrt(1 + uTotal * uTotal / (org.twinorbit.shared.Constants.C * org.twinorbit.shared.Constants.C));
        double inv2 = 1.0 / (bm * bm);
        double[] vE = {(fs.ey * fs.bz - fs.ez * fs.by) * inv2, (fs.ez * fs.bx - fs.ex * fs.bz) * inv2,
                (fs.ex * fs.by - fs.ey * fs.bx) * inv2};
        double k = s.mass() / (s.charge() * bm);
        double[] bxw = {b[1] * w[2] - b[2] * w[1], b[2] * w[0] - b[0] * w[2], b[0] * w[1] - b[1] * w[0]};
        double[] x = {x0.x() + k * bxw[0], x0.y() + k * bxw[1], x0.z() + k * bxw[2]};
        double[] u = new double[3];
        for (int i = 0; i < 3; i++) {
            u[i] = uPar * b[i] + w[i] + gamma * vE[i];
        }
        double mu = s.mass() * uPerp * uPerp / (2 * bm);
        return new Placement(x, u, x0.toArray(), s.mass() * uPar, mu);
    }

    /** A unit vector perpendicular to b, built from the Cartesian axis least aligned with it. */
    static double[] perpendicular(double[] b) {
        int axis = 0;
        for (int k = 1; k < 3; k++) {
            if (Math.abs(b[k]) < Math.abs(b[axis]) - 1e-12) {
                axis = k;
            }
        }
        double[] a = new double[3];
        a[axis] = 1;
        double d = b[axis];
        double[] e = {a[0] - d * b[0], a[1] - d * b[1], a[2] - d * b[2]};
        double n = Math.sqrt(e[0] * e[0] + e[1] * e[1] + e[2] * e[2]);
        return new double[] {e[0] / n, e[1] / n, e[2] / n};
    }
}
