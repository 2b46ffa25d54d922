package org.twinorbit.harness.gridstudy;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ResultTables;
import org.twinorbit.harness.report.TextTable;
import org.twinorbit.harness.report.ToolInfo;

/** The grid study as tables: on the terminal, and as gridstudy.md, .csv and .json written atomically. */
public final class GridStudyTables {

    /** The per-grid table's heading. */
    public static final List<String> HEADER = List.of("metric", "h (m)", "nodes", "on the grid", "analytic",
            "rel. difference", "max div B L/|B|");
    /** The answer table's heading. */
    public static final List<String> ANSWER_HEADER = List.of("metric", "tolerance", "fitted order", "h needed (m)", "how");

    /** The ε* table's heading (with a scan range). */
    public static final List<String> EPS_HEADER = List.of("metric", "scan tolerance", "h (m)", "nodes", "eps* on the grid",
            "eps* analytic", "rel. difference", "fitted order");

    private GridStudyTables() {}

    public static TextTable epsStars(GridStudy.Result r) {
        TextTable t = new TextTable(EPS_HEADER);
        for (GridStudy.EpsStarRow e : r.epsStars()) {
            for (GridStudy.EpsLevel l : e.levels()) {
                t.add(List.of(e.metric(), Format.number(e.scanTolerance()), Format.number(l.spacing()), l.nodes(),
                        Double.isNaN(l.epsStar()) ? "not crossed" : Format.number(l.epsStar()), Format.number(e.analytic()),
                        Double.isNaN(l.relativeDifference()) ? "—" : Format.number(l.relativeDifference()),
                        Double.isNaN(e.order()) ? "—" : Format.number(e.order())));
            }
        }
        return t;
    }

    public static TextTable levels(GridStudy.Result r) {
        TextTable t = new TextTable(HEADER);
        for (GridStudy.MetricRow m : r.rows()) {
            for (GridStudy.Level l : m.levels()) {
                t.add(List.of(m.metric(), Format.number(l.spacing()), l.nodes(), Format.number(l.value()),
                        Format.number(m.analytic()), Format.number(l.relativeDifference()), Format.number(l.divergence())));
            }
        }
        return t;
    }

    public static TextTable answers(GridStudy.Result r) {
        TextTable t = new TextTable(ANSWER_HEADER);
        for (GridStudy.MetricRow m : r.rows()) {
            t.add(List.of(m.metric(), Format.number(r.tolerance()), Double.isNaN(m.order()) ? "—" : Format.number(m.order()),
                    Double.isNaN(m.needed()) ? "—" : Format.number(m.needed()), how(m)));
        }
        return t;
    }

    private static String how(GridStudy.MetricRow m) {
        return switch (m.how()) {
            case "met" -> "met on the grids from there down";
            case "fitted" -> "extrapolated with the fitted order";
            default -> "differences do not shrink with h";
        };
    }

    /** The lines above the tables: the case and what is compared. */
    public static List<String> describe(GridStudy.Result r) {
        List<String> l = new ArrayList<>(ResultTables.describe(r.analytic()));
        l.add(String.format(Locale.ROOT, "grids: %s and %d finer (every cell halved each time); h is the largest node "
                + "spacing (along phi the arc at the largest R)", r.coarsest(), r.rows().isEmpty() ? 0
                : r.rows().get(0).levels().size() - 1));
        if (r.analytic().resolved().spec().gcStart() == org.twinorbit.harness.cases.GuidingCenterStart.MATCHED
                && r.analytic().resolved().field().invariants().size() > 1) {
            l.add("note: gc-start matched takes p_par from the analytic field's canonical momenta, which the grids do not "
                    + "carry; the differences include that (gc-start shared compares like with like)");
        }
        l.add("compared: the model row's metrics (worst phase) on each grid against the analytic field's, at the same "
                + "start and energy; rel. difference = |grid - analytic| / |analytic|");
        return l;
    }

    /** Writes gridstudy.md, gridstudy.csv and gridstudy.json into dir. */
    public static void write(GridStudy.Result r, Path dir) {
        StringBuilder md = new StringBuilder("# Grid study\n\n");
        for (String line : describe(r)) {
            md.append("- ").append(line).append('\n');
        }
        md.append("\n## Metrics against the grid spacing\n\n").append(levels(r).markdown());
        md.append("\n## Grid spacing needed\n\n").append(answers(r).markdown());
        if (r.range() != null) {
            md.append("\n## eps* against the grid spacing\n\n").append(r.epsStars().isEmpty()
                    ? "No metric crossed its tolerance on the analytic field in the scanned range.\n"
                    : epsStars(r).markdown());
        }
        AtomicFiles.write(dir.resolve("gridstudy.md"), md.toString());
        StringBuilder csv = new StringBuilder("metric,spacing_m,nodes,grid_value,analytic_value,relative_difference,"
                + "max_div_b,tolerance,fitted_order,spacing_needed_m,how\n");
        for (GridStudy.MetricRow m : r.rows()) {
            for (GridStudy.Level l : m.levels()) {
                csv.append(String.join(",", m.metric(), num(l.spacing()), l.nodes().replace(" ", ""), num(l.value()),
                        num(m.analytic()), num(l.relativeDifference()), num(l.divergence()), num(r.tolerance()),
                        num(m.order()), num(m.needed()), m.how())).append('\n');
            }
        }
        AtomicFiles.write(dir.resolve("gridstudy.csv"), csv.toString());
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("case", ResultJson.caseObject(r.analytic()));
        doc.put("geometry", r.coarsest().geometry().key());
        doc.put("tolerance", r.tolerance());
        List<Map<String, Object>> metrics = new ArrayList<>();
        for (GridStudy.MetricRow m : r.rows()) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("metric", m.metric());
            o.put("analytic", ResultJson.num(m.analytic()));
            List<Map<String, Object>> levels = new ArrayList<>();
            for (GridStudy.Level l : m.levels()) {
                Map<String, Object> lv = new LinkedHashMap<>();
                lv.put("spacing_m", l.spacing());
                lv.put("nodes", l.nodes());
                lv.put("value", ResultJson.num(l.value()));
                lv.put("relative_difference", ResultJson.num(l.relativeDifference()));
                lv.put("max_div_b", ResultJson.num(l.divergence()));
                levels.add(lv);
            }
            o.put("grids", levels);
            o.put("fitted_order", ResultJson.num(m.order()));
            o.put("spacing_needed_m", ResultJson.num(m.needed()));
            o.put("how", m.how());
            metrics.add(o);
        }
        doc.put("metrics", metrics);
        if (r.range() != null) {
            Map<String, Object> range = new LinkedHashMap<>();
            range.put("eps_min", r.range().min());
            range.put("eps_max", r.range().max());
            range.put("points", r.range().points());
            doc.put("scan_range", range);
            List<Map<String, Object>> eps = new ArrayList<>();
            for (GridStudy.EpsStarRow e : r.epsStars()) {
                Map<String, Object> o = new LinkedHashMap<>();
                o.put("metric", e.metric());
                o.put("scan_tolerance", e.scanTolerance());
                o.put("eps_star_analytic", e.analytic());
                List<Map<String, Object>> levels = new ArrayList<>();
                for (GridStudy.EpsLevel l : e.levels()) {
                    Map<String, Object> lv = new LinkedHashMap<>();
                    lv.put("spacing_m", l.spacing());
                    lv.put("nodes", l.nodes());
                    lv.put("eps_star", ResultJson.num(l.epsStar()));
                    lv.put("relative_difference", ResultJson.num(l.relativeDifference()));
                    levels.add(lv);
                }
                o.put("grids", levels);
                o.put("fitted_order", ResultJson.num(e.order()));
                eps.add(o);
            }
            doc.put("eps_star", eps);
        }
        AtomicFiles.write(dir.resolve("gridstudy.json"), ResultJson.write(ToolInfo.stamped(doc)));
    }

    private static String num(double v) {
        return Double.isNaN(v) ? "" : Double.toString(v);
    }
}
