package org.twinorbit.harness.baseline;

import java.util.Map;

/**
 * A finished check with what its reports say about it.
 *
 * @param baselineFile the baseline as the user named it
 * @param baseline     the baseline read
 * @param result       the comparison
 * @param tolerances   the tolerances applied
 */
public record CheckReport(String baselineFile, Baseline baseline, CheckResult result, Tolerances tolerances) {

    /** "twinorbit 0.1.0 (abc1234)" of the baseline's build. */
    public String baselineBuild() {
        return build(baseline.tool());
    }

    static String build(Map<String, ?> tool) {
        return tool.get("name") + " " + tool.get("version") + " (" + tool.get("git_commit") + ")";
    }

    /** How changes were judged, for the report header. */
    public String mode() {
        return (tolerances.twoSided() ? "two-sided: any change beyond the tolerance fails"
                : "worse only: a change for the better beyond the tolerance is an improvement")
                + "; default tolerance relative 1e-9 with absolute floors per metric"
                + (tolerances.compared(Metric.FIELD_EVALUATIONS) ? "; cost (field evaluations per orbit) compared" : "");
    }
}
