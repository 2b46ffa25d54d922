package org.twinorbit.harness.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.metrics.Track;

/**
 * PNG plots of a case (XChart): μ change and energy error against time per integrator beside
 * the reference's own; the orbit overlay, every integrator (phase 0) against both references, in a
 * projection chosen per field (1:1 where both axes are lengths); and the convergence of every
 * integrator on a log-log scale with slope guides and the references' own error.
 *
 * <p>Integrators that coincide (Boris, Vay and Higuera–Cary often do) stay apart: each has its
 * own colour, dash pattern and marker, the markers of successive series are shifted against each
 * other, and earlier series are drawn wider, so a later one lies on top of an earlier one as a
 * thinner stripe instead of hiding it.
 */
public final class Plots {

    private static final int WIDTH = 1000;
    private static final int HEIGHT = 560;
    /** Magnitudes below this are drawn at it on log axes (round-off of a double). */
    private static final double LOG_FLOOR = 1e-17;
    /** Points drawn per curve at most: more cannot be told apart at this size and only cost time. */
    private static final int MAX_POINTS = 800;
    /** Markers per time curve: enough to tell the series apart, few enough to leave the line readable. */
    private static final int MARKERS_PER_CURVE = 14;
    /** Smallest span of an orbit panel's length axes, in ρ0: a steady center is not blown up to round-off. */
    private static final double MIN_SPAN_RHO = 4;
    /** The references: a wide light band under everything, and a thin dark dashed line. */
    private static final java.awt.Color REFERENCE_BAND = new java.awt.Color(0xc8c8c8);
    private static final java.awt.Color REFERENCE_LINE = new java.awt.Color(0x222222);
    private static final java.awt.Color GUIDE = new java.awt.Color(0x888888);

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

    /** Legend name of the reference's μ curve. */
    static final String MU_REFERENCE = "full-orbit reference (physical ripple, to its tolerance)";
    /** Legend name of the reference's energy curve. */
    static final String ENERGY_REFERENCE = "full-orbit reference (its own error)";

    static XYChart mu(CaseResult r) {
        // the formula is the axis title; the title stays short enough not to be clipped
        XYChart c = chart("change of the gyro-averaged \u03bc along the orbit, " + r.resolved().spec().name() + " (phase 0)",
                "t / Tc", "|\u27e8\u03bc\u27e9k / \u27e8\u03bc\u27e90 \u2212 1|");
        timeCurves(c, r.muCurves(), MU_REFERENCE, r.resolved().gyroPeriod(), 1);
        return c;
    }

    static XYChart energy(CaseResult r) {
        XYChart c = chart("energy error |W \u2212 W0| / K0 along the orbit, " + r.resolved().spec().name() + " (phase 0)",
                "t / Tc", "|W \u2212 W0| / K0");
        timeCurves(c, r.energyCurves(), ENERGY_REFERENCE, r.resolved().gyroPeriod(), 0);
        return c;
    }

    /**
     * Log-magnitude curves against t/Tc: the first curve (the reference) as a wide light band,
     * the integrators in their own styles over it. @param skip leading samples left out (μ at
     * gyration 0 is the reference value itself: its change is zero by definition)
     */
    private static void timeCurves(XYChart c, List<CaseResult.Curve> curves, String referenceName, double tc, int skip) {
        LogAxes.y(c.getStyler());
        formatLinear(c, true, Unit.NONE);
        int i = 0;
        int count = curves.size() - 1;
        for (CaseResult.Curve k : curves) {
            int n = k.t().length;
            if (n <= skip + 1) {
                i++;
                continue;
            }
            double[] t = scale(java.util.Arrays.copyOfRange(k.t(), skip, n), 1 / tc);
            double[] y = abs(java.util.Arrays.copyOfRange(k.y(), skip, n));
            if (i == 0) {
                XYSeries s = line(c, referenceName, t, y);
                s.setLineColor(REFERENCE_BAND);
                s.setLineWidth(6f);
            } else {
                styled(c, i - 1, count, k.label(), t, y, true);
            }
            i++;
        }
        LogAxes.range(c, false);
    }

    static XYChart orbit(CaseResult r) {
        String proj = PROJECTION.getOrDefault(r.resolved().spec().field(), "x-y");
        String[] ax = proj.split("-");
        double tc = r.resolved().gyroPeriod();
        boolean spatial = !ax[0].equals("t");
        List<Track> tracks = new ArrayList<>(List.of(r.fullOrbitCenters(), r.gcTrack()));
        r.orbits().forEach(o -> tracks.add(o.track()));
        Unit ux = ax[0].equals("t") ? Unit.NONE : Unit.of(tracks, ax[0]);
        Unit uy = Unit.of(tracks, ax[1]);
        if (spatial) {
            // one unit for both axes of a plane, or the 1:1 aspect would mislead
            ux = uy = ux.scale >= uy.scale ? ux : uy;
        }
        XYChart c = chart("orbit of phase 0, each integrator against the references, " + r.resolved().spec().name(),
                label(ax[0], ux), label(ax[1], uy));
        // the references under everything: the full orbit's gyration centers as a wide light
        // band, the guiding-center reference thin and dark on it; each integrator in its style
        XYSeries fo = addTrack(c, "full-orbit reference, gyro-averaged", r.fullOrbitCenters(), ax, tc, ux, uy);
        if (fo != null) {
            fo.setLineColor(REFERENCE_BAND);
            fo.setLineWidth(7f);
        }
        XYSeries gc = addTrack(c, "guiding-center reference", r.gcTrack(), ax, tc, ux, uy);
        if (gc != null) {
            gc.setLineColor(REFERENCE_LINE);
            gc.setLineStyle(dashes(1.2f, 6f, 4f));
        }
        int n = r.orbits().size();
        for (int i = 0; i < n; i++) {
            CaseResult.Orbit o = r.orbits().get(i);
            double[][] xy = sample(o.track(), ax, tc, ux, uy);
            if (xy[0].length >= 2) {
                styled(c, i, n, o.integrator() + (o.model().equals("full-orbit") ? ", gyro-averaged" : ""),
                        xy[0], xy[1], true);
            }
        }
        formatLinear(c, true, ux);
        formatLinear(c, false, uy);
        if (spatial) {
            equalAspect(c, r.resolved().rho0() / ux.scale * MIN_SPAN_RHO);
        }
        return c;
    }

    static XYChart convergence(CaseResult r) {
        CaseResult.Sweeps sw = r.convergence();
        double tc = r.resolved().gyroPeriod();
        List<String> spans = new ArrayList<>();
        if (Double.isFinite(sw.fullOrbitSpan())) {
            spans.add(Format.number(sw.fullOrbitSpan() / tc) + " Tc (full orbit)");
        }
        if (r.rows().stream().anyMatch(x -> x.model().equals("guiding-center") && x.convergenceDt().length > 0)) {
            spans.add(Format.number(sw.guidingCenterSpan() / tc) + " Tc (guiding center)");
        }
        // the title names the span measured; it stays short enough not to be clipped over the plot
        XYChart c = chart(r.resolved().spec().name() + ": end error after " + String.join(", ", spans),
                "dt / Tc  (each integrator at dt, dt/2, dt/4, dt/8)", "phase 0: |x(end) \u2212 x_ref(end)| / \u03c10");
        LogAxes.x(c.getStyler());
        LogAxes.y(c.getStyler());
        List<ResultRow> shown = new ArrayList<>();
        for (ResultRow row : r.rows()) {
            double[] e = row.convergenceError();
            boolean ok = row.convergenceDt().length > 0;
            for (double v : e) {
                ok &= v > 0 && Double.isFinite(v);
            }
            if (ok) {
                shown.add(row);
            }
        }
        for (int i = 0; i < shown.size(); i++) {
            ResultRow row = shown.get(i);
            String order = Double.isNaN(row.order()) ? "order not measurable"
                    : String.format(Locale.ROOT, "order %.2f", row.order());
            sweep(c, i, shown.size(), row.integrator() + " (" + order + ")", scale(row.convergenceDt(), 1 / tc),
                    row.convergenceError());
        }
        if (shown.isEmpty()) {
            c.addSeries("no integrator converged measurably", new double[] {1}, new double[] {1});
            return c;
        }
        for (String model : new String[] {"full-orbit", "guiding-center"}) {
            List<ResultRow> family = shown.stream().filter(x -> x.model().equals(model)).toList();
            if (!family.isEmpty()) {
                double floor = model.equals("full-orbit") ? sw.fullOrbitReferenceError() : sw.guidingCenterReferenceError();
                // a slope guide beside errors at round-off (order not measurable) would only
                // stretch the axis decades below them
                List<ResultRow> measured = family.stream().filter(x -> !Double.isNaN(x.order())).toList();
                if (!measured.isEmpty()) {
                    guides(c, measured, model, tc);
                }
                floorLine(c, family, model, floor, tc);
            }
        }
        LogAxes.range(c, false);
        LogAxes.range(c, true);
        return c;
    }

    /**
     * Series i of n of a sweep (a few points, each marked): in its own colour, dash, width and
     * marker, so that integrators whose points coincide stay distinguishable.
     */
    public static XYSeries sweep(XYChart c, int i, int n, String name, double[] x, double[] y) {
        XYSeries s = styled(c, i, n, name, x, y, false);
        // earlier series get larger markers: coinciding points show as nested shapes
        s.setMarker(new Scaled(MARKERS[i % MARKERS.length], 1 + 0.9 * (n - 1 - i) / Math.max(1, n - 1)));
        return s;
    }

    /** A marker drawn at a multiple of the chart's marker size (XChart has one size per chart). */
    static final class Scaled extends org.knowm.xchart.style.markers.Marker {
        final org.knowm.xchart.style.markers.Marker shape;
        private final double factor;

        Scaled(org.knowm.xchart.style.markers.Marker shape, double factor) {
            this.shape = shape;
            this.factor = factor;
        }

        @Override
        public void paint(java.awt.Graphics2D g, double x, double y, int size) {
            shape.paint(g, x, y, (int) Math.round(size * factor));
        }
    }

    /** Legend name of a model's reference-error line on the convergence plot. */
    static String floorName(String model) {
        return model + " reference's own error";
    }

    /** Name of a slope guide on the convergence plot. */
    static String guideName(String model, int order) {
        return "slope " + order + " guide, " + model;
    }

    /**
     * Slope guides of order 2 and 4 over a sweep's dt range (Tc units), starting a factor 3 below
     * its smallest error at the coarsest step.
     */
    private static void guides(XYChart c, List<ResultRow> family, String model, double tc) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        double start = Double.POSITIVE_INFINITY;
        for (ResultRow row : family) {
            double[] dt = row.convergenceDt();
            for (int l = 0; l < dt.length; l++) {
                lo = Math.min(lo, dt[l] / tc);
                hi = Math.max(hi, dt[l] / tc);
            }
            start = Math.min(start, row.convergenceError()[0]);
        }
        double y0 = start / 3;
        for (int order : new int[] {2, 4}) {
            double y1 = y0 * Math.pow(lo / hi, order);
            XYSeries g = c.addSeries(guideName(model, order), new double[] {hi, lo}, new double[] {y0, Math.max(y1, LOG_FLOOR)});
            g.setMarker(SeriesMarkers.NONE);
            g.setLineColor(GUIDE);
            g.setLineStyle(dashes(1f, order == 2 ? 10f : 3f, 4f));
            g.setShowInLegend(false);
            // the guide says its order where it ends, on the fine side
            c.addAnnotation(new org.knowm.xchart.AnnotationText("\u221d dt" + (order == 2 ? "\u00b2" : "\u2074"),
                    lo, Math.max(y1, LOG_FLOOR), false));
        }
    }

    /**
     * The reference's own error as a horizontal line over the family's dt range (Tc units): points
     * near it measure the reference, not the integrator.
     */
    private static void floorLine(XYChart c, List<ResultRow> family, String model, double floor, double tc) {
        double lo = family.stream().flatMapToDouble(r -> java.util.Arrays.stream(r.convergenceDt())).min().orElse(Double.NaN) / tc;
        double hi = family.stream().flatMapToDouble(r -> java.util.Arrays.stream(r.convergenceDt())).max().orElse(Double.NaN) / tc;
        if (floor > LOG_FLOOR && Double.isFinite(floor) && Double.isFinite(lo)) {
            XYSeries f = c.addSeries(floorName(model), new double[] {lo, hi}, new double[] {floor, floor});
            f.setMarker(SeriesMarkers.NONE);
            f.setLineColor(model.equals("full-orbit") ? REFERENCE_LINE : GUIDE);
            f.setLineStyle(dashes(1.5f, 2f, 2f));
        }
    }

    /** Dash pattern per series (solid, dashed, dotted, dash-dot), cycled. */
    private static final java.awt.BasicStroke[] DASHES = {
        new java.awt.BasicStroke(1f), dashes(1f, 9f, 4f), dashes(1f, 2f, 3f), dashes(1f, 9f, 3f, 2f, 3f)};
    /** Marker per series, cycled. */
    static final org.knowm.xchart.style.markers.Marker[] MARKERS = {SeriesMarkers.CIRCLE, SeriesMarkers.SQUARE,
        SeriesMarkers.DIAMOND, SeriesMarkers.TRIANGLE_UP, SeriesMarkers.TRIANGLE_DOWN, SeriesMarkers.CROSS};

    /**
     * Series i of n in its own colour, dash and width (earlier ones wider, so a later one that
     * coincides with it shows on top of it), with a few markers of its own shape at positions
     * shifted by i/n of the marker spacing (a separate series, not in the legend).
     *
     * @param sparseMarkers true for long curves (markers at a few points), false for short
     *                      sweeps (the caller sets a marker at every point)
     */
    private static XYSeries styled(XYChart c, int i, int n, String name, double[] x, double[] y, boolean sparseMarkers) {
        java.awt.Color colour = PALETTE[i % PALETTE.length];
        float width = 1.4f + 2.2f * (n - 1 - i) / Math.max(1, n - 1);
        XYSeries s = line(c, name, x, y);
        s.setLineColor(colour);
        s.setMarkerColor(colour);
        float[] dash = DASHES[i % DASHES.length].getDashArray();
        s.setLineStyle(dash == null ? new java.awt.BasicStroke(width)
                : new java.awt.BasicStroke(width, java.awt.BasicStroke.CAP_BUTT, java.awt.BasicStroke.JOIN_ROUND, 10f,
                        scaleDash(dash, width), 0f));
        s.setLineWidth(width); // XChart draws the style's pattern at the series' width
        if (sparseMarkers && x.length >= 2) {
            // at least n apart, so that the shifted markers of n coinciding series never overlap
            int every = Math.max(n, x.length / MARKERS_PER_CURVE);
            int offset = (int) ((long) every * i / Math.max(1, n));
            List<Double> mx = new ArrayList<>();
            List<Double> my = new ArrayList<>();
            for (int k = offset; k < x.length; k += every) {
                mx.add(x[k]);
                my.add(y[k]);
            }
            if (!mx.isEmpty()) {
                XYSeries m = c.addSeries(name + " markers", mx, my);
                m.setLineStyle(org.knowm.xchart.style.lines.SeriesLines.NONE);
                m.setMarker(MARKERS[i % MARKERS.length]);
                m.setMarkerColor(colour);
                m.setShowInLegend(false);
            }
        }
        return s;
    }

    private static float[] scaleDash(float[] dash, float width) {
        float[] d = dash.clone();
        for (int k = 0; k < d.length; k++) {
            d[k] *= Math.max(1f, 0.7f * width);
        }
        return d;
    }

    private static java.awt.BasicStroke dashes(float width, float... pattern) {
        return new java.awt.BasicStroke(width, java.awt.BasicStroke.CAP_BUTT, java.awt.BasicStroke.JOIN_ROUND, 10f,
                pattern, 0f);
    }

    /**
     * A length unit for an axis: the largest of Mm, km, m and mm in which the largest value is
     * at least 0.1 (no "1E7 m", no ".005 m"); a small span far from 0 gets more digits instead.
     */
    record Unit(String name, double scale) {
        static final Unit NONE = new Unit("", 1);

        static Unit of(List<Track> tracks, String axis) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (Track t : tracks) {
                for (int i = 0; i < t.size(); i++) {
                    double v = coord(t, i, axis, 1);
                    if (Double.isFinite(v)) {
                        lo = Math.min(lo, v);
                        hi = Math.max(hi, v);
                    }
                }
            }
            if (!(hi >= lo)) {
                return new Unit("m", 1);
            }
            double ref = Math.max(hi - lo, Math.max(Math.abs(lo), Math.abs(hi)));
            return ref >= 1e6 ? new Unit("Mm", 1e6) : ref >= 1e3 ? new Unit("km", 1e3)
                    : ref >= 0.1 ? new Unit("m", 1) : new Unit("mm", 1e-3);
        }
    }

    private static XYSeries addTrack(XYChart c, String name, Track t, String[] ax, double tc, Unit ux, Unit uy) {
        double[][] xy = sample(t, ax, tc, ux, uy);
        return xy[0].length < 2 ? null : line(c, name, xy[0], xy[1]);
    }

    /** At most {@link #MAX_POINTS} points of a track in the plot's coordinates, always with its last sample. */
    private static double[][] sample(Track t, String[] ax, double tc, Unit ux, Unit uy) {
        int n = t.size();
        if (n < 2) {
            return new double[2][0];
        }
        int stride = Math.max(1, (n + MAX_POINTS - 1) / MAX_POINTS);
        int m = (n - 1) / stride + 2;
        double[] a = new double[m];
        double[] b = new double[m];
        int j = 0;
        for (int i = 0; i < n; i += stride) {
            a[j] = coord(t, i, ax[0], tc) / ux.scale;
            b[j] = coord(t, i, ax[1], tc) / uy.scale;
            j++;
        }
        if ((n - 1) % stride != 0) {
            a[j] = coord(t, n - 1, ax[0], tc) / ux.scale;
            b[j] = coord(t, n - 1, ax[1], tc) / uy.scale;
            j++;
        }
        return new double[][] {java.util.Arrays.copyOf(a, j), java.util.Arrays.copyOf(b, j)};
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

    private static String label(String axis, Unit u) {
        return axis.equals("t") ? "t / Tc" : axis + " (" + u.name() + ")";
    }

    /** Distinct colours, so that no two series of a plot share one. */
    private static final java.awt.Color[] PALETTE = {
        new java.awt.Color(0x1f77b4), new java.awt.Color(0xd62728), new java.awt.Color(0x2ca02c),
        new java.awt.Color(0xff7f0e), new java.awt.Color(0x9467bd), new java.awt.Color(0x8c564b),
        new java.awt.Color(0xe377c2), new java.awt.Color(0x17becf), new java.awt.Color(0x7f7f7f),
        new java.awt.Color(0xbcbd22)};

    /**
     * A chart in the project's style: white, thin grid, legend outside the plot on the right,
     * decades labelled on log axes. (Linear axes get their tick labels from {@link #plain}; log
     * axes, made by {@link LogAxes}, from XChart's log formatter with the project's pattern.)
     */
    public static XYChart chart(String title, String x, String y) {
        XYChart c = new XYChartBuilder().width(WIDTH).height(HEIGHT).title(title).xAxisTitle(x).yAxisTitle(y).build();
        c.getStyler().setMarkerSize(7);
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideE);
        c.getStyler().setChartBackgroundColor(java.awt.Color.WHITE);
        c.getStyler().setPlotBackgroundColor(java.awt.Color.WHITE);
        c.getStyler().setLegendBorderColor(new java.awt.Color(0xbbbbbb));
        c.getStyler().setSeriesColors(PALETTE);
        // solid thin grid lines: easier to read, and dashed strokes
        // across the whole plot cost more time than the curves themselves
        c.getStyler().setPlotGridLinesStroke(new java.awt.BasicStroke(0.6f));
        c.getStyler().setPlotGridLinesColor(new java.awt.Color(0xdddddd));
        return c;
    }

    /** A linear tick without exponent or a bare leading point: 0.05, 12.5, 31890. */
    static String plain(double v) {
        if (Math.abs(v) < 1e-12 * Math.max(1, Math.abs(v)) || v == 0) {
            return "0";
        }
        java.math.BigDecimal b = new java.math.BigDecimal(v).round(new java.math.MathContext(10));
        String s = b.stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    /** Linear tick labels with as many decimals as the tick spacing needs (none beyond it). */
    private static void formatLinear(XYChart c, boolean xAxis, Unit u) {
        java.util.function.Function<Double, String> f = v -> plain(Math.abs(v) < 1e-9 * u.scale ? 0 : v);
        if (xAxis) {
            c.setCustomXAxisTickLabelsFormatter(f);
        } else {
            c.setCustomYAxisTickLabelsFormatter(f);
        }
    }

    /** Smallest and largest data value on an axis (positive ones only when {@code positive}); null without any. */
    private static double[] range(XYChart c, boolean xAxis, boolean positive) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (XYSeries s : c.getSeriesMap().values()) {
            for (double v : xAxis ? s.getXData() : s.getYData()) {
                if (Double.isFinite(v) && (!positive || v > 0)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        return hi >= lo ? new double[] {lo, hi} : null;
    }

    /**
     * Sets the axis ranges so that one unit is as long on both axes (1:1), widening the axis that
     * has more pixels per unit. The pixel scale is read from a scratch rendering, since the plot
     * area depends on the legend and the tick labels.
     *
     * @param minSpan smallest span of either axis, in the axes' unit
     */
    private static void equalAspect(XYChart c, double minSpan) {
        double[] x = range(c, true, false);
        double[] y = range(c, false, false);
        if (x == null || y == null) {
            return;
        }
        double pad = 0.05;
        double sx = Math.max(x[1] - x[0], minSpan) * (1 + 2 * pad);
        double sy = Math.max(y[1] - y[0], minSpan) * (1 + 2 * pad);
        double cx = 0.5 * (x[0] + x[1]);
        double cy = 0.5 * (y[0] + y[1]);
        for (int pass = 0; pass < 3; pass++) {
            setRange(c, cx, sx, cy, sy);
            java.awt.image.BufferedImage img = new java.awt.image.BufferedImage(WIDTH, HEIGHT,
                    java.awt.image.BufferedImage.TYPE_INT_RGB);
            java.awt.Graphics2D g = img.createGraphics();
            c.paint(g, WIDTH, HEIGHT);
            g.dispose();
            double px = Math.abs(c.getScreenXFromChart(cx + 0.5 * sx) - c.getScreenXFromChart(cx - 0.5 * sx)) / sx;
            double py = Math.abs(c.getScreenYFromChart(cy + 0.5 * sy) - c.getScreenYFromChart(cy - 0.5 * sy)) / sy;
            if (!(px > 0 && py > 0) || Math.abs(px / py - 1) < 0.01) {
                break;
            }
            if (px > py) {
                sx *= px / py;
            } else {
                sy *= py / px;
            }
        }
        setRange(c, cx, sx, cy, sy);
    }

    private static void setRange(XYChart c, double cx, double sx, double cy, double sy) {
        c.getStyler().setXAxisMin(cx - 0.5 * sx).setXAxisMax(cx + 0.5 * sx);
        c.getStyler().setYAxisMin(cy - 0.5 * sy).setYAxisMax(cy + 0.5 * sy);
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
