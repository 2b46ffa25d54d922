package org.twinorbit.harness.cases;

import java.util.Locale;

/**
 * Where the guiding center that a model-error row compares with each full orbit starts.
 *
 * <p>The particles of the gyrophase ensemble are placed at zeroth order around one guiding
 * center. Each particle's true guiding center then differs from that shared one by O(ε) — in
 * position, p∥ and μ, with a sign that depends on the gyrophase — so comparing every full orbit
 * with the one shared guiding center measures that start-up offset, not the guiding-center
 * model, in the drift, bounce period and position.
 */
public enum GuidingCenterStart {
    /**
     * The default: each phase gets a guiding center of its own, started at the mid-time of the
     * full-orbit reference's first whole gyration from that gyration's averages of X, v∥ and μ.
     * A gyration average centred on a time differs from the true guiding center at that time by
     * O(ε²) in any field (common practice; Northrop, The Adiabatic Motion of Charged Particles,
     * 1963), so the comparison measures the model to second order.
     */
    MATCHED("matched"),
    /** One guiding center at t = 0 for the whole zeroth-order ring: offsets of O(ε) per phase. */
    SHARED("shared");

    private final String label;

    GuidingCenterStart(String label) {
        this.label = label;
    }

    /** The word used in options, YAML, tables and JSON. */
    public String label() {
        return label;
    }

    /** @throws IllegalArgumentException naming the option and the allowed values */
    public static GuidingCenterStart parse(String s, String option) {
        String k = s.trim().toLowerCase(Locale.ROOT);
        for (GuidingCenterStart g : values()) {
            if (g.label.equals(k)) {
                return g;
            }
        }
        throw new IllegalArgumentException(option + ": unknown guiding-center start '" + s + "'; allowed: matched, shared");
    }
}
