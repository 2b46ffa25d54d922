package org.twinorbit.harness.report;

import java.nio.file.Path;
import org.twinorbit.harness.run.CaseResult;

/** The files of {@code twinorbit run --out DIR}: run.md, run.csv, run.json and the PNG plots. */
public final class RunReport {

    private RunReport() {}

    public static void write(CaseResult r, Path dir) {
        AtomicFiles.write(dir.resolve("run.json"), ResultJson.write(ResultJson.document(r)));
        AtomicFiles.write(dir.resolve("run.csv"), ResultTables.csvHeader() + ResultTables.csvRows(r));
        AtomicFiles.write(dir.resolve("run.md"), markdown(r, "run-"));
        Plots.writeAll(r, dir, "run-");
    }

    /** What the table columns mean. */
    public static String legend() {
        return Legend.TEXT;
    }

    /** The Markdown page of one case. @param plotPrefix file-name prefix of its plots */
    public static String markdown(CaseResult r, String plotPrefix) {
        StringBuilder sb = new StringBuilder();
        sb.append("# twinorbit run: ").append(r.resolved().spec().name()).append("\n\n");
        for (String line : ResultTables.describe(r)) {
            sb.append("- ").append(line).append('\n');
        }
        sb.append('\n');
        sb.append("## Discretisation error (each integrator against the reference of its own model)\n\n");
        sb.append(ResultTables.table(r, "discretisation").markdown()).append('\n');
        sb.append("## Model error (guiding-center reference against the gyro-averaged full-orbit reference)\n\n");
        sb.append(ResultTables.table(r, "model").markdown()).append('\n');
        sb.append("### What the columns mean\n\n").append(Legend.TEXT).append('\n');
        sb.append("## Plots\n\n");
        for (String p : new String[] {"mu", "energy", "orbit", "convergence"}) {
            sb.append("![").append(p).append("](").append(plotPrefix).append(p).append(".png)\n");
        }
        return sb.toString();
    }
}
