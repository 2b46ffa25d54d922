package org.twinorbit.harness.baseline;

import java.util.List;
import org.twinorbit.harness.report.ToolInfo;

/** The Markdown summary of a check, short enough for a pull-request comment. */
public final class CheckMarkdown {

    /** Differences listed at most; the JSON and JUnit files have all of them. */
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
        // failures first, so that a long list still shows them
        List<Difference> sorted = d.stream().sorted((a, b) -> Boolean.compare(b.kind().fails(), a.kind().fails())).toList();
        sb.append("| case | row | change | what | baseline | new | tolerance |\n");
        sb.append("|---|---|---|---|---|---|---|\n");
        for (Difference x : sorted.subList(0, Math.min(MAX_LISTED, sorted.size()))) {
            sb.append("| ").append(x.caseName()).append(" | ").append(x.row()).append(" | ").append(x.kind().label())
                    .append(" | ").append(x.what()).append(" | ").append(cell(x.baseline())).append(" | ")
                    .append(cell(x.current())).append(" | ")
                    .append(x.tolerance() == null ? "" : x.tolerance().describe()).append(" |\n");
        }
        if (sorted.size() > MAX_LISTED) {
            sb.append("\n… and ").append(sorted.size() - MAX_LISTED).append(" more (see the JSON or JUnit output).\n");
        }
        return sb.toString();
    }

    private static String cell(String s) {
        return s.isEmpty() ? "—" : s.replace("|", "\\|");
    }
}
