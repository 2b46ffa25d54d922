package org.twinorbit.harness.verdict;

import java.util.ArrayList;
import java.util.List;

/** Verdicts for people, and the exit code they give. */
public final class VerdictReport {

    /** Exit code of a run in which a check failed (2 is bad input, 0 success). */
    public static final int CHECK_FAILED = 1;

    private VerdictReport() {}

    /** 0 when every failure is declared expected, else {@link #CHECK_FAILED}. */
    public static int exitCode(List<RowVerdict> verdicts) {
        return verdicts.stream().anyMatch(RowVerdict::failed) ? CHECK_FAILED : 0;
    }

    /** "verdicts: all pass" or one line per row that did not pass cleanly. */
    public static List<String> lines(List<RowVerdict> verdicts) {
        List<String> out = new ArrayList<>();
        long failed = verdicts.stream().filter(RowVerdict::failed).count();
        for (RowVerdict v : verdicts) {
            for (Finding f : v.findings()) {
                out.add("  " + v.caseName() + " / " + v.integrator() + ": " + f.describe());
            }
        }
        out.add(0, failed == 0 ? "verdicts: " + verdicts.size() + " rows pass" + (out.isEmpty() ? "" : " (notes below)")
                : "verdicts: " + failed + " of " + verdicts.size() + " rows FAIL");
        return out;
    }

    /** One cell for a table: the failed checks of the row, expected ones marked. */
    public static String cell(RowVerdict v) {
        List<String> parts = new ArrayList<>();
        for (Finding f : v.findings()) {
            if (f.failure()) {
                parts.add(f.check().label() + (f.expected() ? " (expected)" : ""));
            }
        }
        return String.join(", ", parts);
    }
}
