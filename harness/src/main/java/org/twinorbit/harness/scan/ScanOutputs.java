package org.twinorbit.harness.scan;

import org.twinorbit.harness.report.AtomicFiles;
import java.nio.file.Path;

/** Writes a scan's files into an output directory, each atomically. */
public final class ScanOutputs {

    private ScanOutputs() {}

    /** Writes scan.md, scan.csv, scan.json and scan.png into {@code dir}. */
    public static void write(ScanResult r, Path dir) {
        AtomicFiles.write(dir.resolve("scan.json"), ScanJson.toJson(r));
        AtomicFiles.write(dir.resolve("scan.csv"), ScanTables.csv(r));
        AtomicFiles.write(dir.resolve("scan.md"), ScanTables.markdown(r));
        ScanPlot.write(r, dir.resolve("scan.png"));
    }
}
