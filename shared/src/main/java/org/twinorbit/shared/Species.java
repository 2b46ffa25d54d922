package org.twinorbit.shared;

import java.util.List;
import java.util.Locale;

/**
 * A charged particle species.
 *
 * @param name  display name
 * @param mass  rest mass (kg), positive
 * @param charge charge (C), non-zero; its sign matters
 */
public record Species(String name, double mass, double charge) {

    public static final Species ELECTRON = new Species("electron", Constants.ELECTRON_MASS, -Constants.E);
    public static final Species POSITRON = new Species("positron", Constants.ELECTRON_MASS, Constants.E);
    public static final Species PROTON = new Species("proton", Constants.PROTON_MASS, Constants.E);
    public static final Species DEUTERON = new Species("deuteron", Constants.DEUTERON_MASS, Constants.E);
    public static final Species TRITON = new Species("triton", Constants.TRITON_MASS, Constants.E);
    public static final Species HELIUM3 = new Species("helium-3", Constants.HELION_MASS, 2 * Constants.E);
    public static final Species ALPHA = new Species("alpha", Constants.ALPHA_MASS, 2 * Constants.E);

    /** The named species, in the order they are listed to users. */
    public static final List<Species> NAMED =
            List.of(ELECTRON, POSITRON, PROTON, DEUTERON, TRITON, HELIUM3, ALPHA);

    public Species {
        if (!(mass > 0) || !Double.isFinite(mass)) {
            throw new IllegalArgumentException("species mass must be a positive number of kg, got " + mass);
        }
        if (charge == 0 || !Double.isFinite(charge)) {
            throw new IllegalArgumentException("species charge must be a non-zero number of C, got " + charge);
        }
    }

    /** Rest energy m c² (J). */
    public double restEnergy() {
        return mass * Constants.C * Constants.C;
    }

    /** Charge-to-mass ratio q/m (C/kg). */
    public double chargeToMass() {
        return charge / mass;
    }

    /**
     * Parses a species: one of the names in {@link #NAMED}, or {@code mass,charge} with the mass
     * in kg and the charge in C (e.g. {@code 6.64e-27,3.2e-19}).
     *
     * @throws IllegalArgumentException naming the allowed values
     */
    public static Species parse(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        for (Species s : NAMED) {
            if (s.name.equals(t)) {
                return s;
            }
        }
        if (t.equals("he3") || t.equals("helium3") || t.equals("helion")) {
            return HELIUM3;
        }
        String[] parts = t.split(",");
        if (parts.length == 2) {
            try {
                double m = Double.parseDouble(parts[0].trim());
                double q = Double.parseDouble(parts[1].trim());
                return new Species("custom(" + parts[0].trim() + " kg," + parts[1].trim() + " C)", m, q);
            } catch (NumberFormatException e) {
                // fall through to the message below
            }
        }
        throw new IllegalArgumentException("unknown species '" + text + "'; allowed: "
                + String.join(", ", NAMED.stream().map(Species::name).toList())
                + ", or 'mass,charge' in kg and C (e.g. 6.6446573357e-27,3.204e-19)");
    }

    @Override
    public String toString() {
        return name;
    }
}
