package org.twinorbit.harness.suite;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.report.Plots;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ResultTables;
import org.twinorbit.harness.report.TextTable;
import org.twinorbit.harness.report.ToolInfo;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.Parallel;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.VerdictReport;
import org.twinorbit.harness.run.ResultRow;

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

    /** Writes every file into dir, rendering plots on {@code threads} threads. */
    public static void write(List<CaseResult> results, boolean quick, Path dir, int threads) {
        // the files are independent: written on the pool together with the plots
        List<Parallel.Job> jobs = new ArrayList<>();
        jobs.add(new Parallel.Job(2, () -> {
            Map<String, Object> doc = new LinkedHashMap<>();
            doc.put("suite", quick ? "quick" : "full");
            List<Object> cases = new ArrayList<>();
            for (CaseResult r : results) {
                cases.add(ResultJson.caseDocument(r, ValidationSuite.verdicts(List.of(r), quick)));
            }
            doc.put("cases", cases);
            AtomicFiles.write(dir.resolve("validation.json"), ResultJson.write(ToolInfo.stamped(doc)));
        }));
        jobs.add(new Parallel.Job(1, () -> {
            StringBuilder csv = new StringBuilder(ResultTables.csvHeader());
            for (CaseResult r : results) {
                csv.append(ResultTables.csvRows(r));
            }
            AtomicFiles.write(dir.resolve("validation.csv"), csv.toString());
        }));
        for (CaseResult r : plotted(results)) {
            jobs.add(new Parallel.Job(1, () -> Plots.writeAll(r, dir.resolve("plots"), r.resolved().spec().name() + "-")));
        }
        new Parallel(threads, true, "report").run(jobs);
        AtomicFiles.write(dir.resolve("validation.md"), markdown(results, quick));
    }

    /** The first case of each field: the one whose plots the report shows. */
    static List<CaseResult> plotted(List<CaseResult> results) {
        Set<String> seen = new LinkedHashSet<>();
        List<CaseResult> out = new ArrayList<>();
        for (CaseResult r : results) {
            if (seen.add(r.resolved().spec().field())) {
                out.add(r);
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
    public static TextTable overview(List<CaseResult> results, boolean quick) {
        TextTable t = new TextTable(OVERVIEW_HEADER);
        for (CaseResult r : results) {
            ResultRow boris = find(r, "boris", "discretisation");
            ResultRow rk4 = find(r, "rk4", "discretisation");
            ResultRow gc = find(r, "gc-rk4", "discretisation");
            ResultRow model = find(r, "gc-reference", "model");
            List<String> bad = new ArrayList<>();
            for (RowVerdict v : ValidationSuite.verdicts(List.of(r), quick)) {
                String cell = VerdictReport.cell(v);
                if (!cell.isEmpty()) {
                    bad.add(v.integrator() + ": " + cell);
                }
            }
            t.add(List.of(r.resolved().spec().name(), r.resolved().species().name(), Format.number(r.resolved().eps()),
                    Format.number(r.resolved().spec().pitchDeg()), model == null ? "—" : model.orbitClass(),
                    worst(boris, "energy_error"), worst(boris, "phase_error"),
                    boris == null || Double.isNaN(boris.order()) ? "—" : String.format(Locale.ROOT, "%.2f", boris.order()),
                    worst(rk4, "energy_error"), worst(gc, "position_error_rho"), worst(model, "mu_change"),
                    worst(model, "mu_jump"), worst(model, "drift_error"), worst(model, "position_error_rho"),
                    worst(model, "bounce_period_error"), bad.isEmpty() ? "" : String.join("; ", bad)));
        }
        return t;
    }

    private static ResultRow find(CaseResult r, String name, String kind) {
        return r.rows().stream().filter(x -> x.integrator().equals(name) && x.errorKind().equals(kind))
                .findFirst().orElse(null);
    }

    private static String worst(ResultRow row, String metric) {
        return row == null ? "—" : Format.number(row.metric(metric).worst());
    }

    static String markdown(List<CaseResult> results, boolean quick) {
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
        sb.append(overview(results, quick).markdown()).append('\n');
        Set<String> fields = new LinkedHashSet<>();
        for (CaseResult r : results) {
            fields.add(r.resolved().spec().field());
        }
        List<CaseResult> plotted = plotted(results);
        for (String f : fields) {
            sb.append("## Field `").append(f).append("`\n\n");
            for (CaseResult r : results) {
                if (!r.resolved().spec().field().equals(f)) {
                    continue;
                }
                sb.append("### ").append(r.resolved().spec().name()).append("\n\n");
                for (String line : ResultTables.describe(r)) {
                    sb.append("- ").append(line).append('\n');
                }
                sb.append('\n').append(ResultTables.table(r, null).markdown()).append('\n');
                if (plotted.contains(r)) {
                    String n = r.resolved().spec().name();
                    for (String p : new String[] {"mu", "energy", "orbit", "convergence"}) {
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
