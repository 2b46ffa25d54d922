package org.twinorbit.integrators;

import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * Measures a guiding-center drift over whole gyrations: between the first and the last time u_x
 * rises through zero (the same gyration phase), both located by cubic Hermite interpolation of
 * the synchronised states (u and du/dt for the time, x and v for the position), so that a
 * window of whole periods is used (docs/design.md: a partial window biases the mean).
 */
public final class DriftMeter {

    private DriftMeter() {}

    /** The y component (m/s) of the drift, starting at the origin with u0 (m/s). */
    public static double exbDriftY(FullOrbitStepper s, Species sp, Field f, double[] u0, int steps) {
        s.start(0, new double[3], u0);
        double[] x0 = new double[3], u0s = new double[3], a0 = new double[3];
        double[] x1 = new double[3], u1 = new double[3], a1 = new double[3];
        FieldSample fs = new FieldSample();
        s.position(x0);
        s.velocity(u0s);
        accel(f, sp, 0, x0, u0s, a0, fs);
        double tFirst = Double.NaN, yFirst = 0, tLast = 0, yLast = 0;
        for (int k = 0; k < steps; k++) {
            double t0 = s.time();
            if (!s.step()) {
                throw new AssertionError(s.status().label());
            }
            double dt = s.time() - t0;
            s.position(x1);
            s.velocity(u1);
            accel(f, sp, s.time(), x1, u1, a1, fs);
            if (u0s[0] < 0 && u1[0] >= 0) {
                double lo = 0, hi = 1;
                for (int it = 0; it < 60; it++) {
                    double mid = 0.5 * (lo + hi);
                    if (hermite(mid, u0s[0], a0[0] * dt, u1[0], a1[0] * dt) < 0) {
                        lo = mid;
                    } else {
                        hi = mid;
                    }
                }
                double sc = 0.5 * (lo + hi);
                double g0 = Orbits.gamma(u0s), g1 = Orbits.gamma(u1);
                double y = hermite(sc, x0[1], u0s[1] / g0 * dt, x1[1], u1[1] / g1 * dt);
                double t = t0 + sc * dt;
                if (Double.isNaN(tFirst)) {
                    tFirst = t;
                    yFirst = y;
                }
                tLast = t;
                yLast = y;
            }
            System.arraycopy(x1, 0, x0, 0, 3);
            System.arraycopy(u1, 0, u0s, 0, 3);
            System.arraycopy(a1, 0, a0, 0, 3);
        }
        return (yLast - yFirst) / (tLast - tFirst);
    }

    /** du/dt = (q/m)(E + v×B) (m/s²). */
    private static void accel(Field f, Species sp, double t, double[] x, double[] u, double[] out, FieldSample fs) {
        f.evaluate(t, x[0], x[1], x[2], fs);
        double ig = 1 / Orbits.gamma(u), qm = sp.chargeToMass();
        out[0] = qm * (fs.ex + ig * (u[1] * fs.bz - u[2] * fs.by));
        out[1] = qm * (fs.ey + ig * (u[2] * fs.bx - u[0] * fs.bz));
        out[2] = qm * (fs.ez + ig * (u[0] * fs.by - u[1] * fs.bx));
    }

    /** Cubic Hermite on [0, 1] with values p0, p1 and slopes m0, m1 (already times the interval). */
    private static double hermite(double s, double p0, double m0, double p1, double m1) {
        double s2 = s * s, s3 = s2 * s;
        return (2 * s3 - 3 * s2 + 1) * p0 + (s3 - 2 * s2 + s) * m0 + (-2 * s3 + 3 * s2) * p1 + (s3 - s2) * m1;
    }
}
