package org.twinorbit.harness.scan;

/** How a metric's worst-case error stands against a tolerance over the scanned range of ε. */
public enum ThresholdOutcome {
    /** The error first exceeds the tolerance inside the range; ε* is a number. */
    CROSSED("crossed"),
    /** The error stays within the tolerance up to the largest ε scanned; no ε* in range. */
    NOT_REACHED("not-reached"),
    /** The error already exceeds the tolerance at the smallest ε scanned; no ε* in range. */
    EXCEEDED_AT_START("exceeded-at-start"),
    /**
     * The metric is not measurable at the smallest ε (e.g. a net drift below the measurement
     * floor) and already exceeds the tolerance at the first ε where it is: no ε* in range, and no
     * claim about the smaller ε.
     */
    EXCEEDED_ONCE_MEASURED("exceeded-once-measured"),
    /** The metric was not measured at any point (it does not apply to these orbits). */
    NO_DATA("no-data"),
    /**
     * Both models lose the particle at every point (a pitch inside a loss cone): the orbit has
     * no breakdown threshold, it escapes.
     */
    LOST("lost"),
    /**
     * Within tolerance at every point where the particle stays, and lost by both models from
     * ε* on (it reaches a wall or leaves the field): safe up to ε*, where it is no longer confined.
     */
    LOST_ABOVE("lost-above");

    private final String label;

    ThresholdOutcome(String label) {
        this.label = label;
    }

    /** True when the outcome comes with an ε* (the crossing, or where the losses begin). */
    public boolean hasEpsStar() {
        return this == CROSSED || this == LOST_ABOVE;
    }

    /** The word used in tables and JSON. */
    public String label() {
        return label;
    }
}
