package org.twinorbit.harness;

import java.util.Locale;

/** Number formatting shared by tables and listings. */
public final class Format {

    private Format() {}

    /** Four significant digits, plain for moderate magnitudes and scientific otherwise. */
    public static String number(double v) {
        if (Double.isNaN(v)) {
            return "—";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "inf" : "-inf";
        }
        double a = Math.abs(v);
        if (v == Math.rint(v) && a < 1e6) {
            return Long.toString((long) v);
        }
        if (a >= 1e-3 && a < 1e5) {
            return String.format(Locale.ROOT, "%.4g", v);
        }
        return String.format(Locale.ROOT, "%.3e", v);
    }

    /** An energy for people: three significant digits in eV, keV, MeV or GeV ("34.6 keV"). */
    public static String energy(double eV) {
        if (!Double.isFinite(eV)) {
            return number(eV);
        }
        String[] units = {"eV", "keV", "MeV", "GeV", "TeV"};
        double v = eV;
        int u = 0;
        while (Math.abs(v) >= 1000 && u < units.length - 1) {
            v /= 1000;
            u++;
        }
        return String.format(Locale.ROOT, Math.abs(v) >= 100 ? "%.0f %s" : Math.abs(v) >= 10 ? "%.1f %s" : "%.2f %s", v,
                units[u]);
    }

    /**
     * The largest kinetic energy any option or case file accepts (eV): above the most energetic
     * cosmic rays observed, about 3e20 eV (from memory), and far below where p and mu overflow.
     */
    public static final double MAX_ENERGY_EV = 1e21;
    /** {@link #MAX_ENERGY_EV} as messages print it. */
    public static final String MAX_ENERGY_TEXT = "1e+21 eV";

    /**
     * An energy as typed: a number in eV, or with a unit eV, keV, MeV or GeV (case-insensitive,
     * with or without a space: "30keV", "1.5 MeV").
     *
     * @throws IllegalArgumentException naming {@code option} and the accepted forms
     */
    public static double parseEnergy(String text, String option) {
        String t = text.trim();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("(?i)^([-+0-9.eE]+)\\s*(ev|kev|mev|gev)?$").matcher(t);
        if (m.matches()) {
            try {
                double v = Double.parseDouble(m.group(1));
                String unit = m.group(2) == null ? "ev" : m.group(2).toLowerCase(Locale.ROOT);
                return v * switch (unit) {
                    case "kev" -> 1e3;
                    case "mev" -> 1e6;
                    case "gev" -> 1e9;
                    default -> 1.0;
                };
            } catch (NumberFormatException e) {
                // falls through to the message
            }
        }
        throw new IllegalArgumentException(option + ": '" + text + "' is not an energy; give eV as a number or with a "
                + "unit: 2e4, 20keV, 1.5MeV, 3GeV");
    }
}
