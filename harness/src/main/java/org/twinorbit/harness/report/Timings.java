package org.twinorbit.harness.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.ReferenceSummary;
import org.twinorbit.harness.run.ResultRow;

/**
 * {@value #FILE_NAME}: the wall-clock times of the last command that wrote a directory. They
 * depend on the machine and its load, so no other result file (run.*, validation.*, scan.*,
 * safe-use.*) has any, and regenerating the reports with an unchanged tool leaves them
 * byte-identical; this file is not committed ({@code .gitignore}). The terminal shows the same
 * times: {@code run}'s table has a wall-time column, and every command ends with its total.
 */
public final class Timings {

    /** The file beside the reports. */
    public static final String FILE_NAME = "timings.md";

    private final String command;
    private final List<String> totals = new ArrayList<>();
    private final TextTable rows = new TextTable(List.of("case", "integrator", "error kind", "wall s"));
    private boolean anyRow;

    /** @param command the command line that ran, shown in the title */
    public Timings(String command) {
        this.command = command;
    }

    /** A line of totals, e.g. "31 cases in 12.4 s on 2 threads". */
    public Timings total(String line) {
        totals.add(line);
        return this;
    }

    /** The wall time of every row and reference of each case, summed over its gyrophase ensemble. */
    public Timings cases(List<CaseResult> results) {
        for (CaseResult r : results) {
            String name = r.resolved().spec().name();
            for (ResultRow row : r.rows()) {
                rows.add(List.of(name, row.integrator(), row.errorKind(), seconds(row.wallSeconds())));
            }
            for (ReferenceSummary s : r.references()) {
                rows.add(List.of(name, s.model() + " reference", "reference (with its rtol/100 check)",
                        seconds(s.wallSeconds())));
            }
            anyRow = true;
        }
        return this;
    }

    /** Wall seconds as the tables show them. */
    public static String seconds(double s) {
        return String.format(Locale.ROOT, "%.2f", s);
    }

    public String markdown() {
        StringBuilder sb = new StringBuilder("# Timings of `").append(command).append("`\n\n");
        sb.append("Wall-clock times on the machine that wrote this directory; they change from run to run, ")
                .append("which is why the other files here have none. Not committed.\n\n");
        for (String t : totals) {
            sb.append("- ").append(t).append('\n');
        }
        if (anyRow) {
            sb.append("\n## Per integrator (summed over the gyrophase ensemble)\n\n").append(rows.markdown());
        }
        return sb.toString();
    }

    /** Writes {@value #FILE_NAME} into {@code dir}, atomically. */
    public void write(Path dir) {
        AtomicFiles.write(dir.resolve(FILE_NAME), markdown());
    }
}
