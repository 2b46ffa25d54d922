package org.twinorbit.fields;

import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/** Building blocks for the invariants fields declare. */
public final class Invariants {

    private Invariants() {}

    /** The interface written as a lambda-friendly function of the state. */
    @FunctionalInterface
    public interface StateFunction {
        double apply(Species s, double t, double[] x, double[] u);
    }

    /** An invariant from its parts. */
    public static Invariant of(String name, String description, String unit, boolean exact,
                               StateFunction value, StateFunction scale) {
        return new Invariant() {
            @Override public String name() { return name; }
            @Override public String description() { return description; }
            @Override public String unit() { return unit; }
            @Override public boolean exact() { return exact; }
            @Override public double value(Species s, double t, double[] x, double[] u) {
                return value.apply(s, t, x, u);
            }
            @Override public double scale(Species s, double t, double[] x, double[] u) {
                return scale.apply(s, t, x, u);
            }
            @Override public String toString() { return name; }
        };
    }

    /** W = kinetic + qΦ (J), scaled by the kinetic energy; Φ from {@link Field#potential}. */
    public static Invariant energy(Field f) {
        String d = f.hasElectricField() ? "W = kinetic + q Phi" : "kinetic energy";
        return of("energy", d, "J", true,
                (s, t, x, u) -> Relativity.kineticJoules(s, u[0], u[1], u[2])
                        + s.charge() * f.potential(t, x[0], x[1], x[2]),
                (s, t, x, u) -> Relativity.kineticJoules(s, u[0], u[1], u[2]));
    }

    /** m|u| (kg m/s), the scale of a linear momentum. */
    public static double momentumScale(Species s, double t, double[] x, double[] u) {
        return s.mass() * Math.sqrt(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
    }

    /** m|u|R (kg m²/s), the scale of an angular momentum about the z axis. */
    public static double angularScale(Species s, double t, double[] x, double[] u) {
        return momentumScale(s, t, x, u) * Math.hypot(x[0], x[1]);
    }

    /** Canonical momentum component P_k = m u_k + q A_k (kg m/s) with A from the field. */
    public static Invariant canonical(Field f, int k, String name, String description) {
        return of(name, description, "kg m/s", true, (s, t, x, u) -> {
            double[] a = new double[3];
            f.vectorPotential(t, x[0], x[1], x[2], a);
            return s.mass() * u[k] + s.charge() * a[k];
        }, Invariants::momentumScale);
    }

    /**
     * Canonical toroidal angular momentum R (m u_φ + q A_φ) (kg m²/s) about the z axis, with
     * A from the field: R A_φ = x A_y − y A_x and R u_φ = x u_y − y u_x.
     */
    public static Invariant canonicalAngular(Field f, String name, String description) {
        return of(name, description, "kg m^2/s", true, (s, t, x, u) -> {
            double[] a = new double[3];
            f.vectorPotential(t, x[0], x[1], x[2], a);
            return s.mass() * (x[0] * u[1] - x[1] * u[0]) + s.charge() * (x[0] * a[1] - x[1] * a[0]);
        }, Invariants::angularScale);
    }
}
