package org.twinorbit.harness.scan;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * How long every orbit of a scan point runs.
 *
 * @param value how many units, &gt; 0
 * @param unit  what is counted
 */
public record ScanDuration(double value, Unit unit) {

    /** What a duration counts. */
    public enum Unit {
        /** Initial gyroperiods T_c = 2πγm/(|q|B) at the starting guiding center. */
        GYROPERIODS("gyroperiods"),
        /** Bounce periods, measured first on the guiding-center reference (trapped orbits). */
        BOUNCES("bounces"),
        /**
         * Crossings of a current sheet: until the guiding center has crossed it that many times and
         * is back at its starting distance from it (the start must lie off the sheet).
         */
        CROSSINGS("crossings"),
        /** The time scale of a time-dependent field: τ for {@code ramp}, one wave period 2π/ω for {@code wave}. */
        FIELD_PERIODS("field-periods");

        private final String label;

        Unit(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }

        /** @throws IllegalArgumentException naming --duration-unit and the allowed words */
        public static Unit parse(String text) {
            for (Unit u : values()) {
                if (u.label.equals(text.trim().toLowerCase(Locale.ROOT))) {
                    return u;
                }
            }
            throw new IllegalArgumentException("--duration-unit: unknown unit '" + text + "'; allowed: "
                    + Arrays.stream(values()).map(Unit::label).collect(Collectors.joining(", ")));
        }
    }

    public ScanDuration {
        if (!(value > 0 && value <= 1e6)) {
            throw new IllegalArgumentException("--duration must lie in (0, 1e6] " + unit.label + ", got " + value);
        }
    }
}
