package org.twinorbit.harness.baseline;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The tolerance of every metric of every case, and how changes are judged. A tolerance is looked
 * up from the most specific source down: a case's entry given as an option, a case's entry in
 * the tolerance file, a metric's option, a metric's entry in the file, the metric's default
 * ({@link Metric#defaultTolerance}).
 */
public final class Tolerances {

    private final Map<Metric, Tolerance> perMetric = new LinkedHashMap<>();
    private final Map<String, Map<Metric, Tolerance>> perCase = new LinkedHashMap<>();
    private boolean twoSided;
    private Double costRelative;

    /** The defaults only, worse-only, no cost comparison. */
    public Tolerances() {}

    /** Sets a metric's tolerance for every case; later calls win. */
    public Tolerances metric(Metric m, Tolerance t) {
        perMetric.put(m, t);
        return this;
    }

    /** Sets a metric's tolerance for one case; beats every per-metric entry. */
    public Tolerances forCase(String caseName, Metric m, Tolerance t) {
        perCase.computeIfAbsent(caseName, k -> new LinkedHashMap<>()).put(m, t);
        return this;
    }

    /** Any change beyond the tolerance counts, better or worse. */
    public Tolerances twoSided(boolean b) {
        twoSided = b;
        return this;
    }

    /**
     * Compare field evaluations per orbit too: a cost that rises by more than {@code relative}
     * (e.g. 0.25 for 25 %) fails. Off (null) by default.
     */
    public Tolerances cost(Double relative) {
        if (relative != null && !(relative >= 0 && Double.isFinite(relative))) {
            throw new IllegalArgumentException("--cost-tolerance: must be a finite number >= 0, got " + relative);
        }
        costRelative = relative;
        return this;
    }

    public boolean twoSided() {
        return twoSided;
    }

    /** True when values of {@code m} are compared at all (cost metrics only on request). */
    public boolean compared(Metric m) {
        return !m.cost() || costRelative != null;
    }

    public Tolerance of(String caseName, Metric m) {
        Map<Metric, Tolerance> c = perCase.get(caseName);
        if (c != null && c.containsKey(m)) {
            return c.get(m);
        }
        if (perMetric.containsKey(m)) {
            return perMetric.get(m);
        }
        if (m.cost() && costRelative != null) {
            return new Tolerance(costRelative, 0);
        }
        return m.defaultTolerance();
    }

    /** @throws IllegalArgumentException naming {@code option} when a per-case entry names a case the baseline lacks */
    public void checkCases(List<String> known, String option) {
        for (String c : perCase.keySet()) {
            if (!known.contains(c)) {
                throw new IllegalArgumentException(option + ": the baseline has no case '" + c + "'; its cases: "
                        + String.join(", ", known));
            }
        }
    }
}
