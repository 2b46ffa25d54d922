package org.twinorbit.harness.baseline;

import java.util.List;

/**
 * What a check found.
 *
 * @param rows        every row compared or found, the baseline's order then new rows
 * @param differences every difference, in row order
 */
public record CheckResult(List<MeasuredRow> rows, List<Difference> differences) {

    /** Exit code of a check with a regression or a missing row (0 pass, 2 bad input). */
    public static final int REGRESSION = 1;

    public CheckResult {
        rows = List.copyOf(rows);
        differences = List.copyOf(differences);
    }

    public boolean passed() {
        return differences.stream().noneMatch(d -> d.kind().fails());
    }

    public long count(Difference.Kind k) {
        return differences.stream().filter(d -> d.kind() == k).count();
    }

    /** The differences of one row. */
    public List<Difference> of(MeasuredRow r) {
        return differences.stream().filter(d -> d.caseName().equals(r.caseName()) && d.row().equals(r.row())).toList();
    }

    /** Rows with at least one failing difference. */
    public long failedRows() {
        return rows.stream().filter(r -> of(r).stream().anyMatch(d -> d.kind().fails())).count();
    }

    public int exitCode() {
        return passed() ? 0 : REGRESSION;
    }
}
