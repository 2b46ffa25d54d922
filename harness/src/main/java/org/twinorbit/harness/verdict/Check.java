package org.twinorbit.harness.verdict;

/** The facts every correct integrator shows, whatever the field; each names a verdict. */
public enum Check {
    /** The run finished: no state became unbounded or not-a-number, no model failure. */
    STABLE("stable"),
    /** Every phase has the reference's orbit class (trapped, passing, lost). */
    CLASS("class"),
    /** The orbit stays with the reference's along the run (μ and v∥ within half of their scale). */
    RUNAWAY("runaway"),
    /** The measured convergence order agrees with the declared one, in the asymptotic regime. */
    ORDER("order"),
    /** A scheme declared time-reversible or volume-preserving keeps its energy error bounded. */
    ENERGY_TREND("energy-trend"),
    /** The reference is at least ten times more accurate than the integrator it judges. */
    REFERENCE_MARGIN("reference-margin");

    private final String label;

    Check(String label) {
        this.label = label;
    }

    /** The word used in reports, JSON and expectation lists. */
    public String label() {
        return label;
    }
}
