package org.twinorbit.harness.baseline;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One compared row: an integrator of a case (or a point or threshold of a scan) with its
 * labels and numbers, as stored in a baseline and as measured again by a check.
 *
 * @param caseName the case (for a scan: {@code scan-<field>-<species>})
 * @param row      the integrator's name (the model row: {@code gc-reference}), or the scan
 *                 point or threshold
 * @param labels   words compared for equality: {@code status}, {@code orbit_class},
 *                 {@code verdict}, {@code mu_jump_from}, a threshold's {@code outcome}
 * @param values   {@code metric} or {@code metric.summary} -> value in the metric's unit; NaN
 *                 where the metric is not defined for this row
 */
public record MeasuredRow(String caseName, String row, Map<String, String> labels, Map<String, Double> values) {

    public MeasuredRow {
        labels = Collections.unmodifiableMap(new LinkedHashMap<>(labels));
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    /** The key identifying the row within a baseline. */
    public String id() {
        return caseName + " / " + row;
    }
}
