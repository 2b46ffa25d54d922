package org.twinorbit.harness.precision;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.report.LogAxes;
import org.twinorbit.harness.report.Plots;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.TextTable;
import org.twinorbit.harness.report.ToolInfo;

/**
 * The work–precision files: precision.md (table), precision.csv, precision.json and
 * precision.png (position error against field evaluations per orbit, one line per pusher,
 * slope guides for orders 1, 2 and 4 and the reference's own error as the floor). Wall times
 * are printed on the terminal only, so the files stay the same for the same tool.
 */
public final class WorkPrecisionReport {

    static final List<String> HEADER = List.of("pusher", "steps/Tc", "steps", "field evals", "phase err",
            "center pos err/rho", "energy err", "mu change");

    private WorkPrecisionReport() {}

    /** The table; with {@code wall} a last column of wall time per orbit (ms), for the terminal. */
    public static TextTable table(WorkPrecision.Result r, boolean wall) {
        List<String> h = new ArrayList<>(HEADER);
        if (wall) {
            h.add("wall ms/orbit");
        }
        TextTable t = new TextTable(h);
        for (WorkPrecision.Point p : r.points()) {
            List<String> row = new ArrayList<>(List.of(p.pusher(), Integer.toString(p.stepsPerGyro()),
                    Long.toString(p.steps()), Format.number(Math.rint(p.fieldEvaluations())), Format.number(p.phaseError()),
                    Format.number(p.positionError()), Format.number(p.energyError()), Format.number(p.muChange())));
            if (wall) {
                row.add(String.format(Locale.ROOT, "%.3f", 1e3 * p.wallSecondsPerOrbit()));
            }
            t.add(row);
        }
        return t;
    }

    public static void write(WorkPrecision.Result r, Path dir) {
        StringBuilder md = new StringBuilder("# Work and precision, " + r.caseName() + "\n\n");
        md.append("Every pusher at every step: errors (worst gyrophase, magnitude) against cost per orbit. ")
                .append("center pos err/rho is the position error of the gyro-averaged center (the guiding center) ")
                .append("per bounce period in rho0; the full-orbit ")
                .append("reference's own error is ").append(Format.number(r.referenceError()))
                .append(" rho0, the floor of what can be measured. Wall times are printed by the command, not kept ")
                .append("here.\n\n").append(table(r, false).markdown()).append("\n![work and precision](precision.png)\n");
        AtomicFiles.write(dir.resolve("precision.md"), md.toString());
        StringBuilder csv = new StringBuilder("pusher,steps_per_gyro,steps,field_evaluations,phase_error,"
                + "position_error_rho,energy_error,mu_change\n");
        List<Object> points = new ArrayList<>();
        for (WorkPrecision.Point p : r.points()) {
            csv.append(String.join(",", p.pusher(), Integer.toString(p.stepsPerGyro()), Long.toString(p.steps()),
                    Long.toString(Math.round(p.fieldEvaluations())), n(p.phaseError()), n(p.positionError()),
                    n(p.energyError()), n(p.muChange()))).append('\n');
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("pusher", p.pusher());
            o.put("steps_per_gyro", p.stepsPerGyro());
            o.put("steps", p.steps());
            o.put("field_evaluations", Math.round(p.fieldEvaluations()));
            o.put("phase_error", ResultJson.num(p.phaseError()));
            o.put("position_error_rho", ResultJson.num(p.positionError()));
            o.put("energy_error", ResultJson.num(p.energyError()));
            o.put("mu_change", ResultJson.num(p.muChange()));
            points.add(o);
        }
        AtomicFiles.write(dir.resolve("precision.csv"), csv.toString());
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("case", r.caseName());
        doc.put("reference_error_rho", ResultJson.num(r.referenceError()));
        doc.put("points", points);
        AtomicFiles.write(dir.resolve("precision.json"), ResultJson.write(ToolInfo.stamped(doc)));
        Plots.save(plot(r), dir.resolve("precision.png"));
    }

    static XYChart plot(WorkPrecision.Result r) {
        XYChart c = Plots.chart("work and precision, " + r.caseName(), "field evaluations per orbit",
                "guiding-center position error per bounce / \u03c10 (worst phase)");
        LogAxes.x(c.getStyler());
        LogAxes.y(c.getStyler());
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideE);
        Set<String> names = new LinkedHashSet<>();
        r.points().forEach(p -> names.add(p.pusher()));
        double xmin = Double.POSITIVE_INFINITY, xmax = 0, anchorX = 0, anchorY = 0;
        int index = 0;
        for (String name : names) {
            List<double[]> xy = new ArrayList<>();
            for (WorkPrecision.Point p : r.points()) {
                if (p.pusher().equals(name) && p.positionError() > 0 && Double.isFinite(p.positionError())) {
                    xy.add(new double[] {p.fieldEvaluations(), p.positionError()});
                }
            }
            if (xy.isEmpty()) {
                continue;
            }
            double[] x = xy.stream().mapToDouble(v -> v[0]).toArray();
            double[] y = xy.stream().mapToDouble(v -> v[1]).toArray();
            Plots.sweep(c, index++, names.size(), name, x, y);
            for (double v : x) {
                xmin = Math.min(xmin, v);
                xmax = Math.max(xmax, v);
            }
            if (anchorY == 0) {
                anchorX = x[0];
                anchorY = y[0];
            }
        }
        if (anchorY > 0) {
            for (int order : new int[] {1, 2, 4}) {
                double y1 = anchorY * Math.pow(xmax / anchorX, -order);
                XYSeries g = c.addSeries("order " + order + " guide", new double[] {anchorX, xmax}, new double[] {anchorY, y1});
                g.setMarker(SeriesMarkers.NONE);
                g.setLineColor(new java.awt.Color(0x999999));
                g.setLineStyle(new java.awt.BasicStroke(1f, java.awt.BasicStroke.CAP_BUTT, java.awt.BasicStroke.JOIN_ROUND,
                        10f, new float[] {2f + 3f * order, 4f}, 0f));
            }
            if (r.referenceError() > 0) {
                XYSeries f = c.addSeries("reference's own error", new double[] {xmin, xmax},
                        new double[] {r.referenceError(), r.referenceError()});
                f.setMarker(SeriesMarkers.NONE);
                f.setLineColor(java.awt.Color.BLACK);
                f.setLineWidth(1.5f);
            }
        } else {
            c.addSeries("no measurable error", new double[] {1}, new double[] {1});
        }
        LogAxes.range(c, true);
        LogAxes.range(c, false);
        return c;
    }

    private static String n(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }
}
