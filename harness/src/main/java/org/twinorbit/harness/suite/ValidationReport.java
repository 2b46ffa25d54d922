package org.twinorbit.harness.suite;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.report.Plots;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ResultTables;
import org.twinorbit.harness.report.TextTable;
import org.twinorbit.harness.report.ToolInfo;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.Parallel;
import org.twinorbit.harness.verdict.RowVerdict;

/**
 * The files of {@code twinorbit suite}: validation.md (a one-page overview, then a summary table
 * per field with plots of its first case), validation.csv (one line per case and integrator),
 * validation.json ({@code tool}: {@link ToolInfo}, {@code suite}: full or quick, {@code cases}: one
 * {@link ResultJson#caseDocument} per case) and the PNG plots under {@code plots/}. None of them
 * has a wall-clock time: for the same tool they are the same bytes on every run, whatever the
 * machine or the thread count ({@code timings.md} has the times, see
 * {@link org.twinorbit.harness.report.Timings}).
 */
public final class ValidationReport {

    private ValidationReport() {}

    /** Headings of the overview table. */
    /**
     * Writes every file into dir, rendering plots on {@code threads} threads.
     *
     * @return each case's share of the tables, in the order of the results
     */
    public static List<CaseReport> write(List<CaseResult> results, boolean quick, Path dir, int threads) {
        List<CaseReport> reports = reports(results, quick);
        // the tables and the plots are independent: written on the pool together
        List<Parallel.Job> jobs = new ArrayList<>();
        jobs.add(new Parallel.Job(2, () -> writeTables(reports, quick, dir)));
        Set<String> plotted = plotted(results.stream().map(r -> r.resolved().spec()).toList());
        for (CaseResult r : results) {
            if (plotted.contains(r.resolved().spec().name())) {
                jobs.add(new Parallel.Job(1, () -> writePlots(r, dir)));
            }
        }
        new Parallel(threads, true, "report").run(jobs);
        return reports;
    }

    /** Each case's share of the tables, in the order of the results. */
    public static List<CaseReport> reports(List<CaseResult> results, boolean quick) {
        return results.stream().map(r -> CaseReport.of(r, quick)).toList();
    }

    /**
     * Writes validation.json, validation.csv and validation.md (not the plots) from the cases' shares,
     * in report order: what a single run and a merge of shards both call.
     */
    public static void writeTables(List<CaseReport> reports, boolean quick, Path dir) {
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("suite", quick ? "quick" : "full");
        doc.put("cases", reports.stream().map(CaseReport::document).toList());
        AtomicFiles.write(dir.resolve("validation.json"), ResultJson.write(ToolInfo.stamped(doc)));
        StringBuilder csv = new StringBuilder(ResultTables.csvHeader());
        for (CaseReport r : reports) {
            csv.append(r.csvRows());
        }
        AtomicFiles.write(dir.resolve("validation.csv"), csv.toString());
        AtomicFiles.write(dir.resolve("validation.md"), markdown(reports, quick));
    }

    /** Writes the case's plots into {@code dir}/plots (those of the cases {@link #plotted} names). */
    public static void writePlots(CaseResult r, Path dir) {
        Plots.writeAll(r, dir.resolve(PLOTS), r.resolved().spec().name() + "-");
    }

    /** The folder of the plots under the report's directory. */
    public static final String PLOTS = "plots";
    /** The plots of a plotted case: {@code plots/<case>-<kind>.png} ({@link Plots#writeAll}). */
    public static final List<String> PLOT_KINDS = List.of("mu", "energy", "orbit", "convergence");

    /** The names of the first case of each field: those whose plots the report shows. */
    public static Set<String> plotted(List<Case> cases) {
        Set<String> seen = new LinkedHashSet<>();
        Set<String> out = new LinkedHashSet<>();
        for (Case c : cases) {
            if (seen.add(c.field())) {
                out.add(c.name());
            }
        }
        return out;
    }

    /**
     * The overview's headings. "center pos/rho" is the error of the gyro-averaged center (the
     * guiding center), as `center pos err/rho` in the run table.
     */
    public static final List<String> OVERVIEW_HEADER = List.of("case", "species", "eps", "pitch", "class",
            "boris energy", "boris phase", "boris order", "rk4 energy", "gc-rk4 center pos/rho", "model mu change",
            "model mu jump", "model drift", "model center pos/rho", "model bounce", "verdict");

    /** The one-page overview: one line per case with the numbers that matter most. */
    public static TextTable overview(List<CaseReport> reports) {
        TextTable t = new TextTable(OVERVIEW_HEADER);
        for (CaseReport r : reports) {
            t.add(r.overview());
        }
        return t;
    }

    /** The verdicts of every case, in report order. */
    public static List<RowVerdict> verdicts(List<CaseReport> reports) {
        return reports.stream().flatMap(r -> r.verdicts().stream()).toList();
    }

    static String markdown(List<CaseReport> reports, boolean quick) {
        StringBuilder sb = new StringBuilder();
        sb.append("# twinorbit validation suite").append(quick ? " (quick)" : "").append("\n\n");
        sb.append("Generated by `twinorbit suite").append(quick ? " --quick" : "").append("`. Every case runs each ")
                .append("full-orbit pusher and guiding-center integrator on a gyrophase ensemble against the two ")
                .append("references (Dormand-Prince 8(5,3), rtol 1e-10, error self-estimated at rtol/100). ")
                .append("Values are the worst phase of the ensemble, signed; validation.json and validation.csv also ")
                .append("have the phase mean and the rms over phases.\n\n");
        sb.append("## Overview\n\n");
        sb.append("Discretisation columns (boris, rk4, gc-rk4) compare an integrator with the reference of its own ")
                .append("model; model columns compare the guiding-center reference with the gyro-averaged ")
                .append("full-orbit reference. Each gyrophase is compared with a guiding center of its own, started ")
                .append("at its reference orbit's first gyration with that orbit's exact invariants (gc-start matched); the ")
                .append("cases named `-shared` compare the same orbits with the one zeroth-order guiding center the ring ")
                .append("shares, whose O(eps) start-up offset per phase shows in the drift, position and bounce ")
                .append("columns.\n\n");
        sb.append(overview(reports).markdown()).append('\n');
        Set<String> fields = new LinkedHashSet<>();
        for (CaseReport r : reports) {
            fields.add(r.field());
        }
        Set<String> seen = new LinkedHashSet<>();
        for (String f : fields) {
            sb.append("## Field `").append(f).append("`\n\n");
            for (CaseReport r : reports) {
                if (!r.field().equals(f)) {
                    continue;
                }
                sb.append(r.section());
                if (seen.add(r.field())) {
                    String n = r.name();
                    for (String p : PLOT_KINDS) {
                        sb.append("![").append(n).append(' ').append(p).append("](plots/").append(n).append('-')
                                .append(p).append(".png)\n");
                    }
                    sb.append('\n');
                }
            }
        }
        sb.append("## Columns\n\n").append(org.twinorbit.harness.report.RunReport.legend()).append('\n');
        return sb.toString();
    }
}
