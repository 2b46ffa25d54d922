package org.twinorbit.harness.scan;

import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.report.LogAxes;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.lines.SeriesLines;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.twinorbit.harness.Format;

/**
 * The scan plot (PNG): one log-log panel per thresholded metric, the worst case over the
 * gyrophase ensemble against ε for every pitch angle (the μ panel shows mu_change beside
 * mu_jump; with --integrators, their own discretisation errors of μ and position beside the model
 * error), the tolerance as a dashed line, errors more than eight decades below it left out, ε* as a marker whose legend entry gives ε* and the
 * energy there, and the energy range of the scan in the axis title.
 */
public final class ScanPlot {

    private static final int WIDTH = 640;
    private static final int HEIGHT = 600;
    /** Legend rows that leave the plot of a 600-pixel panel its room; each further row adds LEGEND_ROW_PX. */
    private static final int LEGEND_ROWS_FITTING = 8;
    private static final int LEGEND_ROW_PX = 20;
    /** One colour per pitch angle, the same in every panel (lines, markers and ε* alike). */
    private static final java.awt.Color[] PITCH_COLOURS = {new java.awt.Color(0x1f77b4), new java.awt.Color(0xd62728),
        new java.awt.Color(0x2ca02c), new java.awt.Color(0x9467bd), new java.awt.Color(0xff7f0e),
        new java.awt.Color(0x8c564b), new java.awt.Color(0xe377c2), new java.awt.Color(0x17becf)};

    /** The y-axis title of a metric's panel, in words and symbols rather than its key. */
    static String axisTitle(ScanMetric m) {
        return switch (m) {
            case MU_JUMP -> "\u03bc jump |\u0394\u27e8\u03bc\u27e9| / \u27e8\u03bc\u27e9";
            case MU_CHANGE -> "\u03bc change |\u27e8\u03bc\u27e9k \u2212 \u27e8\u03bc\u27e90| / \u27e8\u03bc\u27e90";
            case DRIFT_ERROR -> "drift error (v_GC \u2212 v_FO)\u00b7v_FO / |v_FO|\u00b2";
            case POSITION_ERROR -> "position error per bounce / \u03c10";
            case BOUNCE_ERROR -> "bounce period error T_GC / T_FO \u2212 1";
            case MIRROR_FIELD_ERROR -> "mirror-point field error B_GC / B_FO \u2212 1";
            case CLASS_CHANGE -> "class change";
        };
    }

    private ScanPlot() {}

    /** Writes the plot atomically to {@code file}; writes nothing when no metric has a positive value. */
    public static void write(ScanResult r, Path file) {
        List<XYChart> charts = charts(r);
        if (charts.isEmpty()) {
            return; // nothing was measured that a log-log panel could show
        }
        // XChart fills every cell of the grid, so the grid must hold exactly the panels: up to
        // three in a row, four as 2 x 2.
        int cols = charts.size() == 4 ? 2 : charts.size();
        int rows = charts.size() / cols;
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try {
            BitmapEncoder.saveBitmap(charts, rows, cols, bytes, BitmapEncoder.BitmapFormat.PNG);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        AtomicFiles.write(file, bytes.toByteArray());
    }

    /** The panels of the plot, one per thresholded metric with something measured. */
    static List<XYChart> charts(ScanResult r) {
        System.setProperty("java.awt.headless", "true");
        List<XYChart> charts = charts(r, HEIGHT);
        // the legend sits below the plot: with many pitches and signs it would squeeze the plot
        // away, so every panel grows by the rows of the longest legend beyond what fits
        int rows = charts.stream().mapToInt(c -> c.getSeriesMap().size()).max().orElse(0);
        return rows > LEGEND_ROWS_FITTING ? charts(r, HEIGHT + (rows - LEGEND_ROWS_FITTING) * LEGEND_ROW_PX) : charts;
    }

    private static List<XYChart> charts(ScanResult r, int height) {
        List<XYChart> charts = new ArrayList<>();
        for (ScanMetric m : ScanMetric.values()) {
            if (m.thresholded() && m != ScanMetric.CLASS_CHANGE) {
                XYChart c = chart(r, m, height);
                if (c != null) {
                    charts.add(c);
                }
            }
        }
        return charts;
    }

    /** The panel of one metric, or null when nothing of it was measured. */
    private static XYChart chart(ScanResult r, ScanMetric m, int height) {
        List<ScanPoint> pts = r.points();
        double epsMin = pts.stream().mapToDouble(ScanPoint::eps).min().orElse(Double.NaN);
        double epsMax = pts.stream().mapToDouble(ScanPoint::eps).max().orElse(Double.NaN);
        String xTitle = "\u03b5 = " + r.axis().meaning().replace("rho0", "\u03c10")
                + (r.axis().derivedName() != null ? ", " + r.axis().derivedName() + " = \u03b5^-1/2" : "");
        if (r.axis().variesEnergy()) {
            xTitle += "   (energy " + Format.energy(r.axis().energyEv().applyAsDouble(epsMin)) + " to "
                    + Format.energy(r.axis().energyEv().applyAsDouble(epsMax)) + ")";
        }
        Object statistic = r.settings().getOrDefault("statistic", "worst");
        XYChart c = new XYChartBuilder().width(WIDTH).height(height).title(m.description())
                .xAxisTitle(xTitle).yAxisTitle(axisTitle(m) + " (" + statistic + " phase)").build();
        c.getStyler().setChartBackgroundColor(java.awt.Color.WHITE);
        // solid thin light grid as in the case plots: the dashed default at every minor tick
        // of several decades greys the panel
        c.getStyler().setPlotGridLinesStroke(new java.awt.BasicStroke(0.6f));
        c.getStyler().setPlotGridLinesColor(new java.awt.Color(0xdddddd));
        LogAxes.x(c.getStyler());
        LogAxes.y(c.getStyler());
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideS)
                .setLegendLayout(Styler.LegendLayout.Vertical);
        double floor = floor(r, m);
        boolean any = false;
        // one line per pitch angle and charge sign (the sign only with --charge-signs both)
        List<Line> lines = pts.stream().map(p -> new Line(p.chargeSign(), p.pitchDeg())).distinct().toList();
        for (int pi = 0; pi < lines.size(); pi++) {
            Line pitch = lines.get(pi);
            java.awt.Color colour = PITCH_COLOURS[pi % PITCH_COLOURS.length];
            String at = pitch.at();
            any |= curve(c, pts, pitch, m.worstKey(), floor, m.key() + at, SeriesLines.SOLID, colour);
            if (m == ScanMetric.MU_JUMP) {
                any |= curve(c, pts, pitch, ScanMetric.MU_CHANGE.worstKey(), floor, "mu_change (ripple included)" + at,
                        SeriesLines.DOT_DOT, colour);
            }
            // discretisation errors of the integrators scanned with --integrators, beside the model error
            String own = m == ScanMetric.MU_JUMP ? "mu_change" : m == ScanMetric.POSITION_ERROR ? m.key() : null;
            if (own != null && r.settings().get("integrators") instanceof List<?> names) {
                for (Object name : names) {
                    curve(c, pts, pitch, ModelErrorEvaluator.integratorKey(name.toString(), own), floor, name + " " + own + " (discretisation)" + at,
                            SeriesLines.DASH_DOT, colour);
                }
            }
        }
        if (!any) {
            return null;
        }
        for (Threshold t : r.thresholds()) {
            if (t.metric() != m || !(t.tolerance() > 0)) {
                continue;
            }
            String tolName = "tolerance " + Format.number(t.tolerance());
            if (!c.getSeriesMap().containsKey(tolName)) {
                XYSeries s = c.addSeries(tolName, new double[] {epsMin, epsMax},
                        new double[] {t.tolerance(), t.tolerance()});
                s.setMarker(SeriesMarkers.NONE);
                s.setLineStyle(SeriesLines.DASH_DASH);
                s.setLineColor(java.awt.Color.GRAY);
            }
            Line line = new Line(t.chargeSign(), t.pitchDeg());
            java.awt.Color colour = PITCH_COLOURS[Math.max(0, lines.indexOf(line)) % PITCH_COLOURS.length];
            if (t.outcome().hasEpsStar()) {
                String label = "\u03b5* = " + Format.number(t.epsStar()) + line.at()
                        + (r.axis().variesEnergy() && !Double.isNaN(t.energyEvStar()) ? " (" + Format.energy(t.energyEvStar()) + ")" : "")
                        + (t.outcome() == ThresholdOutcome.LOST_ABOVE ? ", lost above" : "");
                if (!c.getSeriesMap().containsKey(label)) {
                    XYSeries s = c.addSeries(label, new double[] {t.epsStar()}, new double[] {t.tolerance()});
                    s.setMarker(SeriesMarkers.DIAMOND);
                    s.setMarkerColor(colour);
                    s.setLineStyle(SeriesLines.NONE);
                }
            } else if (t.outcome() != ThresholdOutcome.NO_DATA) {
                // not-reached, exceeded-at-start, lost: said in the legend, with the pitch's colour
                String label = t.outcome().label() + line.at();
                if (!c.getSeriesMap().containsKey(label)) {
                    double x = t.outcome() == ThresholdOutcome.NOT_REACHED ? epsMax : epsMin;
                    XYSeries s = c.addSeries(label, new double[] {x}, new double[] {t.tolerance()});
                    s.setMarker(t.outcome() == ThresholdOutcome.NOT_REACHED ? SeriesMarkers.TRIANGLE_UP
                            : SeriesMarkers.TRIANGLE_DOWN);
                    s.setMarkerColor(colour);
                    s.setLineStyle(SeriesLines.NONE);
                }
            }
        }
        classChange(c, r, lines, epsMin, epsMax);
        LogAxes.range(c, true);
        LogAxes.range(c, false);
        return c;
    }

    /**
     * The class_change threshold in a panel of another metric: a fraction that is 0 wherever
     * both models agree on the orbit class has no place on a log axis, so every panel carries it
     * instead, as a dotted vertical line at its ε* in the pitch's colour, or as a legend entry
     * naming its outcome (not-reached, lost, ...).
     */
    private static void classChange(XYChart c, ScanResult r, List<Line> lines, double epsMin, double epsMax) {
        double yLo = Double.POSITIVE_INFINITY;
        double yHi = Double.NEGATIVE_INFINITY;
        for (XYSeries s : c.getSeriesMap().values()) {
            for (double y : s.getYData()) {
                if (y > 0 && Double.isFinite(y)) {
                    yLo = Math.min(yLo, y);
                    yHi = Math.max(yHi, y);
                }
            }
        }
        // outcomes without an eps* (not-reached, lost, ...) share one legend row per outcome
        java.util.Map<String, List<String>> open = new java.util.LinkedHashMap<>();
        for (Threshold t : r.thresholds()) {
            if (t.metric() != ScanMetric.CLASS_CHANGE || t.outcome() == ThresholdOutcome.NO_DATA) {
                continue;
            }
            Line line = new Line(t.chargeSign(), t.pitchDeg());
            if (!t.outcome().hasEpsStar()) {
                open.computeIfAbsent(t.outcome().label(), k -> new ArrayList<>()).add(line.at().substring(3));
                continue;
            }
            java.awt.Color colour = PITCH_COLOURS[Math.max(0, lines.indexOf(line)) % PITCH_COLOURS.length];
            String label = "orbit class change from \u03b5 = " + Format.number(t.epsStar())
                    + (r.axis().variesEnergy() && !Double.isNaN(t.energyEvStar()) ? " (" + Format.energy(t.energyEvStar()) + ")" : "")
                    + line.at();
            if (!c.getSeriesMap().containsKey(label)) {
                XYSeries s = c.addSeries(label, new double[] {t.epsStar(), t.epsStar()}, new double[] {yLo, yHi});
                s.setMarker(SeriesMarkers.NONE);
                s.setLineStyle(SeriesLines.DOT_DOT);
                s.setLineColor(colour);
            }
        }
        boolean all = open.size() == 1 && open.values().iterator().next().size() == lines.size();
        for (java.util.Map.Entry<String, List<String>> e : open.entrySet()) {
            // a legend-only entry sits on a point already inside the axis ranges, drawn as nothing
            String label = "orbit class change: " + e.getKey() + (all ? "" : " @ " + String.join("; ", e.getValue()));
            XYSeries s = c.addSeries(label, new double[] {Math.sqrt(epsMin * epsMax)}, new double[] {Math.sqrt(yLo * yHi)});
            s.setMarker(SeriesMarkers.NONE);
            s.setLineStyle(SeriesLines.NONE);
        }
    }

    /**
     * The smallest error drawn: eight decades below the smallest tolerance. Exponentially small
     * errors (μ jumps at small ε) would otherwise stretch the axis over tens of decades.
     */
    private static double floor(ScanResult r, ScanMetric m) {
        double tol = r.thresholds().stream().filter(t -> t.metric() == m && t.tolerance() > 0)
                .mapToDouble(Threshold::tolerance).min().orElse(Double.NaN);
        return Double.isNaN(tol) ? 0 : tol * 1e-8;
    }

    /** A curve of the plot: one pitch angle (degrees) of one charge sign ({@link ChargeSigns}). */
    private record Line(int sign, double pitchDeg) {
        /** The legend's suffix: " @ 60 deg", with both signs " @ 60 deg, +q" or " @ 60 deg, -q". */
        String at() {
            return " @ " + Format.number(pitchDeg) + " deg"
                    + (sign == ChargeSigns.GIVEN ? "" : sign > 0 ? ", +q" : ", -q");
        }
    }

    /** Adds the finite values above {@code floor} under {@code key} on one line; false if none. */
    private static boolean curve(XYChart c, List<ScanPoint> pts, Line pitch, String key, double floor,
                                 String name, java.awt.BasicStroke line, java.awt.Color colour) {
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        for (ScanPoint p : pts) {
            double v = p.value(key);
            if (p.pitchDeg() == pitch.pitchDeg() && p.chargeSign() == pitch.sign() && v > floor && v > 0 && Double.isFinite(v)) {
                xs.add(p.eps());
                ys.add(v);
            }
        }
        if (xs.isEmpty()) {
            return false;
        }
        XYSeries s = c.addSeries(name, xs, ys);
        s.setMarker(line == SeriesLines.SOLID ? SeriesMarkers.CIRCLE : SeriesMarkers.NONE);
        s.setLineStyle(line);
        s.setLineColor(colour);
        s.setMarkerColor(colour);
        return true;
    }
}
