package org.twinorbit.harness.baseline;

import java.util.List;
import org.twinorbit.harness.report.ToolInfo;

/** The Markdown summary of a check, short enough for a pull-request comment. */
public final class CheckMarkdown {

    /** Rows listed at most; the JSON and JUnit files have every difference. */
    static final int MAX_LISTED = 50;

    private CheckMarkdown() {}

    public static String of(CheckReport c) {
        CheckResult r = c.result();
        StringBuilder sb = new StringBuilder();
        long regressions = r.count(Difference.Kind.REGRESSION) + r.count(Difference.Kind.MISSING);
        sb.append("## twinorbit check: ").append(r.passed() ? "PASS" : "FAIL").append("\n\n");
        sb.append(r.rows().size()).append(" rows compared, ")
                .append(r.passed() ? "none failed" : r.failedRows() + " failed").append(": ")
                .append(regressions).append(" regressions (").append(r.count(Difference.Kind.MISSING))
                .append(" of them missing), ").append(r.count(Difference.Kind.IMPROVEMENT)).append(" improvements, ")
                .append(r.count(Difference.Kind.NEW)).append(" new.\n\n");
        sb.append("- baseline: `").append(c.baselineFile()).append("` (").append(c.baseline().kind().label())
                .append(", written by ").append(c.baselineBuild()).append(")\n");
        sb.append("- checked with: ").append(CheckReport.build(ToolInfo.json())).append('\n');
        sb.append("- ").append(c.mode()).append("\n\n");
        List<Difference> d = r.differences();
        if (d.isEmpty()) {
            sb.append("No differences.\n");
            return sb.toString();
        }
        // one line per row, failed rows first, its most telling difference shown: a metric with values
        List<MeasuredRow> rows = r.rows().stream().filter(x -> !r.of(x).isEmpty())
                .sorted((a, b) -> Boolean.compare(fails(r, b), fails(r, a))).toList();
        sb.append("| case | row | result | first difference | baseline | new | tolerance | more |\n");
        sb.append("|---|---|---|---|---|---|---|---|\n");
        for (MeasuredRow row : rows.subList(0, Math.min(MAX_LISTED, rows.size()))) {
            List<Difference> all = r.of(row);
            List<Difference> shown = fails(r, row) ? all.stream().filter(x -> x.kind().fails()).toList() : all;
            Difference x = shown.stream().filter(y -> y.tolerance() != null).findFirst().orElse(shown.get(0));
            sb.append("| ").append(row.caseName()).append(" | ").append(row.row()).append(" | ")
                    .append(fails(r, row) ? "FAIL" : "pass").append(" | ").append(x.kind().label()).append(' ')
                    .append(x.what()).append(" | ").append(cell(x.baseline())).append(" | ").append(cell(x.current()))
                    .append(" | ").append(x.tolerance() == null ? "" : x.tolerance().describe()).append(" | ")
                    .append(summary(all, x)).append(" |\n");
        }
        if (rows.size() > MAX_LISTED) {
            sb.append("\n… and ").append(rows.size() - MAX_LISTED).append(" more rows (see the JSON or JUnit output).\n");
        }
        return sb.toString();
    }

    private static boolean fails(CheckResult r, MeasuredRow row) {
        return r.of(row).stream().anyMatch(d -> d.kind().fails());
    }

    /** The row's other differences by kind, e.g. "22 regressions, 3 improvements". */
    private static String summary(List<Difference> all, Difference shown) {
        List<String> parts = new java.util.ArrayList<>();
        for (Difference.Kind k : Difference.Kind.values()) {
            long n = all.stream().filter(d -> d != shown && d.kind() == k).count();
            if (n > 0) {
                boolean noun = k == Difference.Kind.REGRESSION || k == Difference.Kind.IMPROVEMENT;
                parts.add(n + " " + k.label() + (noun && n > 1 ? "s" : ""));
            }
        }
        return String.join(", ", parts);
    }

    private static String cell(String s) {
        return s.isEmpty() ? "—" : s.replace("|", "\\|");
    }
}
