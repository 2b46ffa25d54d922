package org.twinorbit.integrators;

import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Invariant;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/** Small helpers the full-orbit tests share. */
public final class Orbits {

    private Orbits() {}

    public static double norm(double[] a) {
        return Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
    }

    public static double distance(double[] a, double[] b) {
        return Math.sqrt((a[0] - b[0]) * (a[0] - b[0]) + (a[1] - b[1]) * (a[1] - b[1])
                + (a[2] - b[2]) * (a[2] - b[2]));
    }

    public static double gamma(double[] u) {
        return Relativity.gammaFromU2(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
    }

    /**
     * Runs a stepper and returns the largest relative change of an invariant in the first and in
     * the last tenth of the run: {first, last}.
     */
    public static double[] invariantDriftByTenths(FullOrbitStepper s, Species sp, Field f, Invariant inv,
                                            double[] x0, double[] u0, long steps) {
        s.start(0, x0, u0);
        double[] x = new double[3], u = new double[3];
        double i0 = inv.value(sp, 0, x0, u0);
        double scale = inv.scale(sp, 0, x0, u0);
        double first = 0, last = 0;
        long tenth = steps / 10;
        for (long k = 1; k <= steps; k++) {
            if (!s.step()) {
                throw new AssertionError(s.status() + " after " + k + " steps");
            }
            if (k <= tenth || k > steps - tenth) {
                s.position(x);
                s.velocity(u);
                double d = Math.abs(inv.value(sp, s.time(), x, u) - i0) / scale;
                if (k <= tenth) {
                    first = Math.max(first, d);
                } else {
                    last = Math.max(last, d);
                }
            }
        }
        return new double[] {first, last};
    }

    /** The invariant of that name declared by the field. */
    public static Invariant invariant(Field f, String name) {
        return f.invariants().stream().filter(i -> i.name().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("field " + f.name() + " declares no " + name
                        + "; it has " + f.invariants()));
    }
}
