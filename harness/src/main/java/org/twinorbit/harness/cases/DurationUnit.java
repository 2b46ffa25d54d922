package org.twinorbit.harness.cases;

/** What a case's duration counts. */
public enum DurationUnit {
    /** Initial gyroperiods T_c = 2πγm/(|q|B) at the starting guiding center. */
    GYROPERIODS("gyroperiods"),
    /** Bounce periods of a trapped orbit, measured first on the guiding-center reference. */
    BOUNCES("bounces"),
    /**
     * Crossings of a field's current sheet ({@code Field.sheetNormal()}): the run lasts until the
     * guiding-center reference has crossed the sheet that many times and come back to its starting
     * distance from it, plus two gyroperiods so that a whole gyration after the exit is seen.
     */
    CROSSINGS("crossings");

    private final String label;

    DurationUnit(String label) {
        this.label = label;
    }

    /** The word used in options, YAML and reports. */
    public String label() {
        return label;
    }

    /** The unit named by {@code text} (case-insensitive). @throws IllegalArgumentException naming the allowed words */
    public static DurationUnit parse(String text, String option) {
        for (DurationUnit u : values()) {
            if (u.label.equalsIgnoreCase(text.trim()) || u.name().equalsIgnoreCase(text.trim())) {
                return u;
            }
        }
        throw new IllegalArgumentException(option + ": unknown duration unit '" + text
                + "'; allowed: gyroperiods, bounces, crossings");
    }
}
