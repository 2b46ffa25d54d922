package org.twinorbit.harness.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.metrics.Track;

/**
 * PNG plots of a case (XChart): μ change and energy error against time per integrator, the
 * guiding-center orbit overlay (gyro-averaged full-orbit reference against the guiding-center
 * reference) in a projection chosen per field, and the convergence of every integrator on a
 * log-log scale with its measured order.
 */
public final class Plots {

    private static final int WIDTH = 900;
    private static final int HEIGHT = 560;
    /** Magnitudes below this are drawn at it on log axes (round-off of a double). */
    private static final double LOG_FLOOR = 1e-17;
    /** Points drawn per curve at most: more cannot be told apart at this size and only cost time. */
    private static final int MAX_POINTS = 800;

    /**
     * The projection of the orbit overlay per field: the plane where the guiding-center motion
     * that distinguishes the models shows (the drift, the bounce, the banana).
     */
    private static final Map<String, String> PROJECTION = Map.ofEntries(
            Map.entry("uniform", "x-y"), Map.entry("crossed", "t-y"), Map.entry("gradient", "t-y"),
            Map.entry("toroidal", "t-z"), Map.entry("mirror", "t-z"), Map.entry("dipole", "t-z"),
            Map.entry("tokamak", "R-z"), Map.entry("solovev", "R-z"), Map.entry("current-sheet", "t-z"), Map.entry("shear", "y-z"),
            Map.entry("ramp", "x-y"), Map.entry("wave", "t-y"));

    static {
        // render off-screen, and encode PNGs in memory: ImageIO's default disk cache only slows it down
        System.setProperty("java.awt.headless", "true");
        javax.imageio.ImageIO.setUseCache(false);
    }

    private Plots() {}

    /** Writes {prefix}mu.png, {prefix}energy.png, {prefix}orbit.png, {prefix}convergence.png into dir. */
    public static void writeAll(CaseResult r, Path dir, String prefix) {
        save(mu(r), dir.resolve(prefix + "mu.png"));
        save(energy(r), dir.resolve(prefix + "energy.png"));
        save(orbit(r), dir.resolve(prefix + "orbit.png"));
        save(convergence(r), dir.resolve(prefix + "convergence.png"));
    }

    static XYChart mu(CaseResult r) {
        XYChart c = chart("gyro-averaged mu: |<mu>_k/<mu>_0 - 1|, " + r.resolved().spec().name(),
                "t / Tc", "|<mu>_k/<mu>_0 - 1|");
        c.getStyler().setYAxisLogarithmic(true);
        double tc = r.resolved().gyroPeriod();
        for (CaseResult.Curve k : r.muCurves()) {
            int n = k.t().length;
            if (n > 2) {
                // gyration 0 is the reference value itself: its change is zero by definition
                double[] t = java.util.Arrays.copyOfRange(k.t(), 1, n);
                double[] y = java.util.Arrays.copyOfRange(k.y(), 1, n);
                line(c, k.label(), scale(t, 1 / tc), abs(y));
            }
        }
        return c;
    }

    static XYChart energy(CaseResult r) {
        XYChart c = chart("energy error |W - W0|/K0, " + r.resolved().spec().name(), "t / Tc", "|W - W0| / K0");
        c.getStyler().setYAxisLogarithmic(true);
        double tc = r.resolved().gyroPeriod();
        for (CaseResult.Curve k : r.energyCurves()) {
            if (k.t().length > 1) {
                line(c, k.label(), scale(k.t(), 1 / tc), abs(k.y()));
            }
        }
        return c;
    }

    static XYChart orbit(CaseResult r) {
        String proj = PROJECTION.getOrDefault(r.resolved().spec().field(), "x-y");
        String[] ax = proj.split("-");
        double tc = r.resolved().gyroPeriod();
        XYChart c = chart("guiding-center orbit, " + r.resolved().spec().name() + " (phase 0)",
                label(ax[0]), label(ax[1]));
        c.getStyler().setLegendPosition(Styler.LegendPosition.InsideNE);
        // the full orbit wide and solid, the guiding center dashed on top: both stay visible
        // where they agree
        XYSeries fo = addTrack(c, "full orbit, gyro-averaged (reference)", r.fullOrbitCenters(), ax, tc);
        XYSeries gc = addTrack(c, "guiding center (reference)", r.gcTrack(), ax, tc);
        if (fo != null) {
            fo.setLineWidth(3.5f);
        }
        if (gc != null) {
            gc.setLineStyle(new java.awt.BasicStroke(1.5f, java.awt.BasicStroke.CAP_BUTT,
                    java.awt.BasicStroke.JOIN_ROUND, 10f, new float[] {8f, 5f}, 0f));
        }
        return c;
    }

    static XYChart convergence(CaseResult r) {
        XYChart c = chart("convergence at the end time, " + r.resolved().spec().name(), "dt / Tc",
                "|x - x_ref| / rho0 (phase 0)");
        c.getStyler().setXAxisLogarithmic(true);
        c.getStyler().setYAxisLogarithmic(true);
        c.getStyler().setLegendPosition(Styler.LegendPosition.InsideSE);
        double tc = r.resolved().gyroPeriod();
        for (ResultRow row : r.rows()) {
            if (row.convergenceDt().length == 0) {
                continue;
            }
            double[] e = row.convergenceError();
            boolean ok = true;
            for (double v : e) {
                ok &= v > 0 && Double.isFinite(v);
            }
            if (!ok) {
                continue;
            }
            String order = Double.isNaN(row.order()) ? "order not measurable"
                    : String.format(Locale.ROOT, "order %.2f", row.order());
            XYSeries s = c.addSeries(row.integrator() + " (" + order + ")", scale(row.convergenceDt(), 1 / tc), e);
            s.setMarker(SeriesMarkers.CIRCLE);
        }
        if (c.getSeriesMap().isEmpty()) {
            c.addSeries("no integrator converged measurably", new double[] {1}, new double[] {1});
        }
        return c;
    }

    private static XYSeries addTrack(XYChart c, String name, Track t, String[] ax, double tc) {
        int n = t.size();
        if (n < 2) {
            return null;
        }
        int stride = Math.max(1, (n + MAX_POINTS - 1) / MAX_POINTS);
        int m = (n - 1) / stride + 2;
        double[] a = new double[m];
        double[] b = new double[m];
        int j = 0;
        for (int i = 0; i < n; i += stride) {
            a[j] = coord(t, i, ax[0], tc);
            b[j] = coord(t, i, ax[1], tc);
            j++;
        }
        a[j] = coord(t, n - 1, ax[0], tc); // always end at the last sample
        b[j] = coord(t, n - 1, ax[1], tc);
        return line(c, name, java.util.Arrays.copyOf(a, j + 1), java.util.Arrays.copyOf(b, j + 1));
    }

    private static double coord(Track t, int i, String axis, double tc) {
        return switch (axis) {
            case "t" -> t.time(i) / tc;
            case "x" -> t.coord(i, 0);
            case "y" -> t.coord(i, 1);
            case "z" -> t.coord(i, 2);
            case "R" -> Math.hypot(t.coord(i, 0), t.coord(i, 1));
            default -> throw new IllegalStateException(axis);
        };
    }

    private static String label(String axis) {
        return axis.equals("t") ? "t / Tc" : axis + " (m)";
    }

    /** Distinct colours, so that no two series of a plot share one. */
    private static final java.awt.Color[] PALETTE = {
        new java.awt.Color(0x1f77b4), new java.awt.Color(0xd62728), new java.awt.Color(0x2ca02c),
        new java.awt.Color(0xff7f0e), new java.awt.Color(0x9467bd), new java.awt.Color(0x8c564b),
        new java.awt.Color(0xe377c2), new java.awt.Color(0x17becf), new java.awt.Color(0x7f7f7f),
        new java.awt.Color(0xbcbd22)};

    /** A chart in the project's style: white, thin grid, decades only on log axes. */
    public static XYChart chart(String title, String x, String y) {
        XYChart c = new XYChartBuilder().width(WIDTH).height(HEIGHT).title(title).xAxisTitle(x).yAxisTitle(y).build();
        c.getStyler().setMarkerSize(5);
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideS);
        c.getStyler().setChartBackgroundColor(java.awt.Color.WHITE);
        c.getStyler().setPlotBackgroundColor(java.awt.Color.WHITE);
        c.getStyler().setSeriesColors(PALETTE);
        // solid thin grid lines, decades only on log axes: easier to read, and dashed strokes
        // across the whole plot cost more time than the curves themselves
        c.getStyler().setPlotGridLinesStroke(new java.awt.BasicStroke(0.6f));
        c.getStyler().setPlotGridLinesColor(new java.awt.Color(0xdddddd));
        c.getStyler().setXAxisLogarithmicDecadeOnly(true);
        c.getStyler().setYAxisLogarithmicDecadeOnly(true);
        return c;
    }

    private static XYSeries line(XYChart c, String name, double[] x, double[] y) {
        if (x.length > MAX_POINTS) {
            int stride = (x.length + MAX_POINTS - 1) / MAX_POINTS;
            int m = (x.length + stride - 1) / stride;
            double[] tx = new double[m];
            double[] ty = new double[m];
            for (int i = 0; i < m; i++) {
                tx[i] = x[i * stride];
                ty[i] = y[i * stride];
            }
            x = tx;
            y = ty;
        }
        XYSeries s = c.addSeries(name, x, y);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineWidth(1.2f);
        return s;
    }

    private static double[] scale(double[] v, double k) {
        double[] r = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            r[i] = v[i] * k;
        }
        return r;
    }

    private static double[] abs(double[] v) {
        double[] r = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            double a = Math.abs(v[i]);
            r[i] = a > LOG_FLOOR && Double.isFinite(a) ? a : LOG_FLOOR;
        }
        return r;
    }

    /** Renders a chart to PNG and writes it atomically. */
    public static void save(XYChart c, Path file) {
        try {
            AtomicFiles.write(file, png(BitmapEncoder.getBufferedImage(c)));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot render " + file + ": " + e.getMessage(), e);
        }
    }

    /**
     * PNG bytes at a fast deflate level: line plots on a white background compress well at any
     * level, and the default level costs as much time as drawing the chart.
     */
    static byte[] png(java.awt.image.BufferedImage img) throws IOException {
        javax.imageio.ImageWriter w = javax.imageio.ImageIO.getImageWritersByFormatName("png").next();
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        try (javax.imageio.stream.ImageOutputStream out = javax.imageio.ImageIO.createImageOutputStream(bytes)) {
            w.setOutput(out);
            javax.imageio.ImageWriteParam p = w.getDefaultWriteParam();
            p.setCompressionMode(javax.imageio.ImageWriteParam.MODE_EXPLICIT);
            p.setCompressionQuality(0.8f); // deflate level 9 − round(9 × 0.8) ≈ 2 (JDK PNG writer)
            w.write(null, new javax.imageio.IIOImage(img, null, null), p);
        } finally {
            w.dispose();
        }
        return bytes.toByteArray();
    }
}
