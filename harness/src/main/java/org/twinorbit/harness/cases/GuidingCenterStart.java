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
     * full-orbit reference's first whole gyration at that gyration's mean X, with p∥ from the
     * particle's exact canonical momentum where the field has a symmetry along b (else the
     * gyration mean of v·b with the Baños correction) and μ from its exact energy in static
     * magnetic fields (else the gyration mean): within O(ε²) of the particle's true guiding
     * center, so the comparison measures the model to second order (see the harness's
     * {@code run.MatchedStart} for the sources).
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
