package org.twinorbit.harness;

import java.io.PrintWriter;
import java.util.List;
import org.twinorbit.harness.report.ResultTables;
import org.twinorbit.harness.report.RunReport;
import org.twinorbit.harness.report.TextTable;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.VerdictReport;

/**
 * The terminal report of one case, the same for {@code run} and {@code score}: the case
 * description, the results table, the legend of its columns, the verdicts.
 */
final class ResultPrinter {

    private ResultPrinter() {}

    static void print(PrintWriter pw, CaseResult r, TextTable table, List<RowVerdict> verdicts) {
        for (String line : ResultTables.describe(r)) {
            pw.println(line);
        }
        pw.println();
        pw.print(table.aligned());
        pw.println();
        pw.print(RunReport.legend());
        pw.println();
        for (String line : VerdictReport.lines(verdicts)) {
            pw.println(line);
        }
    }
}
