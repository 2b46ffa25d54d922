package org.twinorbit.harness.scan;

import org.twinorbit.harness.report.AtomicFiles;
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

    private ScanPlot() {}

    /** Writes the plot atomically to {@code file}; writes nothing when no metric has a positive value. */
    public static void write(ScanResult r, Path file) {
        System.setProperty("java.awt.headless", "true");
        List<XYChart> charts = new ArrayList<>();
        for (ScanMetric m : ScanMetric.values()) {
            if (m.thresholded() && m != ScanMetric.CLASS_CHANGE) {
                XYChart c = chart(r, m);
                if (c != null) {
                    charts.add(c);
                }
            }
        }
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

    /** The panel of one metric, or null when nothing of it was measured. */
    private static XYChart chart(ScanResult r, ScanMetric m) {
        List<ScanPoint> pts = r.points();
        double epsMin = pts.stream().mapToDouble(ScanPoint::eps).min().orElse(Double.NaN);
        double epsMax = pts.stream().mapToDouble(ScanPoint::eps).max().orElse(Double.NaN);
        String xTitle = "eps = " + r.axis().meaning()
                + (r.axis().derivedName() != null ? ", " + r.axis().derivedName() + " = eps^-1/2" : "");
        if (r.axis().variesEnergy()) {
            xTitle += "   (" + Format.number(r.axis().energyEv().applyAsDouble(epsMin)) + " to "
                    + Format.number(r.axis().energyEv().applyAsDouble(epsMax)) + " eV)";
        }
        XYChart c = new XYChartBuilder().width(WIDTH).height(HEIGHT).title(m.description())
                .xAxisTitle(xTitle).yAxisTitle(m.key() + " (worst over gyrophases)").build();
        c.getStyler().setXAxisLogarithmic(true).setYAxisLogarithmic(true)
                .setLegendPosition(Styler.LegendPosition.OutsideS)
                .setLegendLayout(Styler.LegendLayout.Vertical);
        double floor = floor(r, m);
        boolean any = false;
        List<Double> pitches = pts.stream().map(ScanPoint::pitchDeg).distinct().toList();
        for (double pitch : pitches) {
            String at = " @ " + Format.number(pitch) + " deg";
            any |= curve(c, pts, pitch, m.worstKey(), floor, m.key() + at, SeriesLines.SOLID);
            if (m == ScanMetric.MU_JUMP) {
                any |= curve(c, pts, pitch, ScanMetric.MU_CHANGE.worstKey(), floor, "mu_change" + at, SeriesLines.DOT_DOT);
            }
            // discretisation errors of the integrators scanned with --integrators, beside the model error
            String own = m == ScanMetric.MU_JUMP ? "mu_change" : m == ScanMetric.POSITION_ERROR ? m.key() : null;
            if (own != null && r.settings().get("integrators") instanceof List<?> names) {
                for (Object name : names) {
                    curve(c, pts, pitch, ModelErrorEvaluator.integratorKey(name.toString(), own), floor, name + " " + own + " (discretisation)" + at,
                            SeriesLines.DASH_DOT);
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
            }
            if (t.outcome() == ThresholdOutcome.CROSSED) {
                String label = "eps* = " + Format.number(t.epsStar()) + " @ " + Format.number(t.pitchDeg()) + " deg"
                        + (r.axis().variesEnergy() ? " (" + Format.number(t.energyEvStar()) + " eV)" : "");
                if (!c.getSeriesMap().containsKey(label)) {
                    XYSeries s = c.addSeries(label, new double[] {t.epsStar()}, new double[] {t.tolerance()});
                    s.setMarker(SeriesMarkers.DIAMOND);
                    s.setLineStyle(SeriesLines.NONE);
                }
            }
        }
        // within two decades XChart would label no tick at all unless every tick is labelled
        double lo = c.getSeriesMap().values().stream().flatMapToDouble(x -> java.util.Arrays.stream(x.getYData()))
                .filter(v -> v > 0).min().orElse(1);
        double hi = c.getSeriesMap().values().stream().flatMapToDouble(x -> java.util.Arrays.stream(x.getYData()))
                .max().orElse(1);
        c.getStyler().setYAxisLogarithmicDecadeOnly(hi / lo > 100);
        return c;
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

    /** Adds the finite values above {@code floor} under {@code key} at one pitch; false if none. */
    private static boolean curve(XYChart c, List<ScanPoint> pts, double pitch, String key, double floor,
                                 String name, java.awt.BasicStroke line) {
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        for (ScanPoint p : pts) {
            double v = p.value(key);
            if (p.pitchDeg() == pitch && v > floor && v > 0 && Double.isFinite(v)) {
                xs.add(p.eps());
                ys.add(v);
            }
        }
        if (xs.isEmpty()) {
            return false;
        }
        XYSeries s = c.addSeries(name, xs, ys);
        s.setMarker(SeriesMarkers.CIRCLE);
        s.setLineStyle(line);
        return true;
    }
}
