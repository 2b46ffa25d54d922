package org.twinorbit.harness.baseline;

/**
 * One thing a check found different from the baseline.
 *
 * @param caseName  the case
 * @param row       the row (integrator, scan point or threshold)
 * @param kind      how it changed
 * @param what      the metric value ({@code energy_error.worst}), label ({@code status}), or
 *                  {@code row} for a whole row
 * @param baseline  the baseline's value or label, as text ("" for a new row)
 * @param current   the value or label measured now ("" for a missing row)
 * @param tolerance the tolerance applied to a metric value; null for labels and rows
 */
public record Difference(String caseName, String row, Kind kind, String what, String baseline, String current,
                         Tolerance tolerance) {

    /** How a row, a label or a value changed. */
    public enum Kind {
        /** Worse beyond the tolerance (or, with --two-sided, any change beyond it); fails the check. */
        REGRESSION("regression", true),
        /** Better beyond the tolerance; reported, passes (one-sided checks only). */
        IMPROVEMENT("improvement", false),
        /** In the new run but not in the baseline; reported, passes. */
        NEW("new", false),
        /** In the baseline but not measured now; fails the check. */
        MISSING("missing", true);

        private final String label;
        private final boolean fails;

        Kind(String label, boolean fails) {
            this.label = label;
            this.fails = fails;
        }

        public String label() {
            return label;
        }

        public boolean fails() {
            return fails;
        }
    }

    /** One line for people: "energy_error.worst: 3.7e-15 -> 4.2e-12 (tolerance rel 1e-09, abs 1e-13)". */
    public String describe() {
        String t = tolerance == null ? "" : " (tolerance " + tolerance.describe() + ")";
        if (what.equals("row")) {
            return kind == Kind.NEW ? "new row" : "row missing from the new run";
        }
        return what + ": " + (baseline.isEmpty() ? "—" : baseline) + " -> " + (current.isEmpty() ? "—" : current) + t;
    }
}
