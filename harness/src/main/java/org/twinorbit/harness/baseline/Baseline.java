package org.twinorbit.harness.baseline;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.cases.Case;

/**
 * A stored baseline: what was run, by which build, and every number it measured.
 *
 * @param kind    what was run
 * @param tool    the {@code tool} object of the build that wrote it (name, version, git_commit)
 * @param cases   the fully resolved cases of a run or a suite, in report order; empty for a scan
 * @param scan    the resolved scan definition (JSON tree, see {@link ScanDefinition}); null unless a scan
 * @param rows    every measured row, in report order
 */
public record Baseline(Kind kind, Map<String, Object> tool, List<Case> cases, JsonNode scan, List<MeasuredRow> rows) {

    /** Version of the file layout this build writes and reads; raised on any incompatible change. */
    public static final int SCHEMA_VERSION = 1;
    /** The value of the {@code schema} member, telling a baseline from other JSON files. */
    public static final String SCHEMA = "twinorbit-baseline";

    public Baseline {
        tool = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(tool));
        cases = List.copyOf(cases);
        rows = List.copyOf(rows);
    }

    /** What a baseline was made of; the label is the command that reruns it. */
    public enum Kind {
        RUN("run"), SUITE_QUICK("suite --quick"), SUITE("suite"), SCAN("scan");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }

        /** The kind written as {@code label}. @throws IllegalArgumentException listing the allowed labels */
        public static Kind parse(String label) {
            for (Kind k : values()) {
                if (k.label.equals(label)) {
                    return k;
                }
            }
            throw new IllegalArgumentException("unknown kind '" + label + "'; allowed: run, suite --quick, suite, scan");
        }
    }
}
