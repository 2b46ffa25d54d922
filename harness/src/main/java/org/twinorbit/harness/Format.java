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
}
