package org.twinorbit.harness.scan;

import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.report.LogAxes;
import org.twinorbit.harness.report.ToolInfo;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.CategoryChartBuilder;
import org.knowm.xchart.CategorySeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.FieldProvider;
import org.twinorbit.fields.Fields;
import org.twinorbit.harness.Format;
import org.twinorbit.shared.Species;

/**
 * The safe-use map: for every field of the library, protons and electrons, and each metric at
 * its default tolerance, ε* and the kinetic energy it corresponds to — where the guiding-center
 * model stops being safe. One breakdown scan per field and species with the field's recipe
 * ({@link ScanField}); fields without a length (uniform, crossed) have no ε and are listed as
 * such. Writes safe-use.md, safe-use.csv, safe-use.json and safe-use.png.
 */
public final class SafeUseMap {

    /** The species of the map. */
    public static final List<Species> SPECIES = List.of(Species.PROTON, Species.ELECTRON);

    /** Directory (inside the output directory) holding the partial scans until the map is written. */
    static final String WORK_DIR = ".safe-use-partial";

    /**
     * How finely each scan samples.
     *
     * @param points ε values per scan
     * @param phases gyrophase ensemble size
     */
    public record Resolution(int points, int phases) {
        /** The committed map: the scan defaults. */
        public static final Resolution FULL = new Resolution(16, 8);
        /**
         * A smoke test of the map in about a third of the time: 8 points, 4 phases. Coarser ε*, and
         * worst cases over fewer phases: with 2 phases the gyrophase-dependent errors (bounce
         * period, position) were missed by up to a factor 4 in ε*, so fewer than 4 are not offered.
         */
        public static final Resolution QUICK = new Resolution(8, 4);
    }

    /**
     * One line of the map.
     *
     * @param field      field name
     * @param species    species name
     * @param epsMeaning what ε is for this field
     * @param pitchDeg   pitch angle scanned (degrees)
     * @param epsMin     smallest ε scanned
     * @param epsMax     largest ε scanned
     * @param threshold  ε* of one metric at its default tolerance
     */
    public record Row(String field, String species, String epsMeaning, double pitchDeg, double epsMin,
                      double epsMax, Threshold threshold) {}

    /**
     * The computed map.
     *
     * @param rows    one per field, species and metric
     * @param skipped field name -> why it has no row
     */
    public record Result(List<Row> rows, Map<String, String> skipped) {}

    private SafeUseMap() {}

    /**
     * Runs every scan and writes the map into {@code out}.
     *
     * @param resume take up the scans an interrupted run left in {@code out}
     */
    public static Result run(Path out, Resolution res, boolean resume, int threads, ScanProgress progress) {
        Plan plan = plan(res, threads);
        Map<String, String> skipped = new LinkedHashMap<>(plan.skipped());
        Overall overall = new Overall(progress, plan.totalPoints());
        Path work = out.resolve(WORK_DIR);
        List<Row> rows = new ArrayList<>();
        for (int i = 0; i < plan.scans().size(); i++) {
            ScanRequest.Built b = plan.scans().get(i);
            ScanResult r;
            try {
                r = b.scan().run(b.evaluator(), work.resolve(plan.names().get(i)), resume, threads, overall);
            } catch (IllegalArgumentException e) {
                // one scan that cannot run does not sink the map; it is listed with the reason
                skipped.put(plan.names().get(i), failure(e));
                continue;
            }
            rows.addAll(rows(b, r));
        }
        Result result = new Result(rows, skipped);
        write(result, out);
        deleteTree(work);
        return result;
    }

    /**
     * The scans of the map, built and checked, nothing computed.
     *
     * @param scans   one per field and species, in the map's order
     * @param names   each scan's name ({@code <field>-<species>}), also its work folder
     * @param skipped fields without a scan, and why
     */
    public record Plan(List<ScanRequest.Built> scans, List<String> names, Map<String, String> skipped) {
        int totalPoints() {
            return scans.stream().mapToInt(b -> b.scan().size()).sum();
        }
    }

    public static Plan plan(Resolution res, int threads) {
        List<ScanRequest.Built> scans = new ArrayList<>();
        List<String> names = new ArrayList<>();
        Map<String, String> skipped = new LinkedHashMap<>();
        for (FieldProvider p : Fields.all()) {
            Field f = Fields.create(p.name(), Species.PROTON);
            ScanField recipe = ScanField.of(p.name());
            if (!recipe.timeScale() && !(Double.isFinite(f.length()) && f.isStatic())) {
                skipped.put(p.name(), f.isStatic() ? "no length L: the guiding-center model has no eps to break down in"
                        : "time-dependent without a scan recipe");
                continue;
            }
            for (Species s : SPECIES) {
                ScanRequest q = new ScanRequest();
                q.field = p.name();
                q.species = s;
                q.points = res.points();
                q.phases = res.phases();
                q.threads = threads;
                scans.add(q.build());
                names.add(p.name() + "-" + s.name());
            }
        }
        return new Plan(scans, names, skipped);
    }

    /** How a scan that could not run is listed among the fields not scanned. */
    static String failure(IllegalArgumentException e) {
        return "scan failed: " + e.getMessage();
    }

    /** The map's rows of one finished scan. */
    static List<Row> rows(ScanRequest.Built b, ScanResult r) {
        List<Row> rows = new ArrayList<>();
        double[] eps = b.scan().eps();
        for (Threshold t : r.thresholds()) {
            rows.add(new Row((String) r.settings().get("field"), (String) r.settings().get("species"),
                    r.axis().meaning(), t.pitchDeg(), eps[0], eps[eps.length - 1], t));
        }
        return rows;
    }

    /** The files of a finished map, as the messages about them name them. */
    public static final String FINISHED_FILES = "safe-use.json, safe-use.csv, safe-use.md, safe-use.png";

    /** True when {@code out} holds a finished map (safe-use.json) and no partial scans. */
    public static boolean finishedIn(Path out) {
        return Files.exists(out.resolve("safe-use.json")) && !Files.exists(out.resolve(WORK_DIR));
    }

    /** Writes safe-use.md, .csv, .json and .png into {@code out}, each atomically. */
    public static void write(Result r, Path out) {
        AtomicFiles.write(out.resolve("safe-use.md"), markdown(r));
        AtomicFiles.write(out.resolve("safe-use.csv"), csv(r));
        AtomicFiles.write(out.resolve("safe-use.json"), json(r));
        plot(r, out.resolve("safe-use.png"));
    }

    static String markdown(Result r) {
        StringBuilder sb = new StringBuilder("# Safe-use map of the guiding-center model\n\n");
        sb.append("eps* is the first eps at which the model error (guiding-center reference against the ")
                .append("gyro-averaged full-orbit reference, each gyrophase against a guiding center started from ")
                .append("its own orbit's first gyration on that orbit's exact invariants (the matched start), worst phase of ")
                .append("the ensemble) exceeds the ")
                .append("default tolerance; below it, and below the energy beside it, guiding centers are safe for ")
                .append("that metric. `not-reached`: safe over the whole range scanned; `exceeded-at-start`: not safe ")
                .append("even at the smallest eps scanned; `exceeded-once-measured`: not measurable at the smallest ")
                .append("eps (a net drift below the measurement floor) and beyond tolerance where first measured; `no-data`: the metric does not apply (no bounce, no drift); ")
                .append("`lost-above`: within tolerance wherever the particle stays, and lost by both models (a wall, ")
                .append("the edge of the field) from the eps given on. ")
                .append("Tolerances: mu_jump 1 %, drift_error 5 %, position_error_rho 1 rho0, ")
                .append("bounce_period_error 1 %, class_change 0 (any orbit trapped in one model and lost in the other). ")
                .append("drift_error is the mean guiding-center velocity across the field along the reference drift, ")
                .append("relative; position_error_rho is the distance to the reference guiding center in rho0 divided ")
                .append("by the whole bounce periods run, so along-field timing errors on long bounces count (in the ")
                .append("current sheet one bounce is ~1e4 rho0 long).\n\n")
                .append("In a static magnetic field the shape of an orbit depends on p/(qB) alone, relativistic or ")
                .append("not, so eps* depends on the species only through the sign of its charge: protons and electrons ")
                .append("agree wherever the field looks the same to both signs, and only the energy at eps* differs. ")
                .append("The tokamak, where the drift direction relative to the poloidal field matters, is the exception.\n\n");
        sb.append("| field | species | metric | eps | pitch (deg) | range scanned | outcome | eps* | energy at eps* (eV) |\n");
        sb.append("|---|---|---|---|---|---|---|---|---|\n");
        for (Row row : r.rows()) {
            Threshold t = row.threshold();
            boolean crossed = t.outcome().hasEpsStar();
            sb.append("| ").append(row.field()).append(" | ").append(row.species()).append(" | ")
                    .append(t.metric().key()).append(" | ").append(row.epsMeaning()).append(" | ")
                    .append(Format.number(row.pitchDeg())).append(" | ").append(Format.number(row.epsMin()))
                    .append(" – ").append(Format.number(row.epsMax())).append(" | ").append(t.outcome().label())
                    .append(" | ").append(crossed ? Format.number(t.epsStar()) : "—").append(" | ")
                    .append(crossed && !Double.isNaN(t.energyEvStar()) ? Format.number(t.energyEvStar()) : "—")
                    .append(" |\n");
        }
        if (!r.skipped().isEmpty()) {
            sb.append("\nNot scanned:\n\n");
            r.skipped().forEach((f, why) -> sb.append("- ").append(f).append(": ").append(why).append('\n'));
        }
        return sb.toString();
    }

    static String csv(Result r) {
        StringBuilder sb = new StringBuilder(
                "field,species,metric,tolerance,eps_meaning,pitch_deg,eps_min,eps_max,outcome,eps_star,energy_ev_star\n");
        for (Row row : r.rows()) {
            Threshold t = row.threshold();
            sb.append(String.join(",", row.field(), row.species(), t.metric().key(), Double.toString(t.tolerance()),
                    row.epsMeaning(), Double.toString(row.pitchDeg()), Double.toString(row.epsMin()),
                    Double.toString(row.epsMax()), t.outcome().label(), cell(t.epsStar()), cell(t.energyEvStar())))
                    .append('\n');
        }
        return sb.toString();
    }

    private static String cell(double v) {
        return Double.isNaN(v) ? "" : Double.toString(v);
    }

    /**
     * JSON: {@code tool} ({@link ToolInfo}: name, version, git commit); {@code rows}, one per field, species and metric with {@code field}, {@code species},
     * {@code metric}, {@code tolerance}, {@code eps_meaning}, {@code pitch_deg}, {@code eps_min},
     * {@code eps_max}, {@code outcome}, {@code eps_star}, {@code energy_ev_star} (null unless
     * crossed); {@code not_scanned}: field (or field-species) -> reason, keyed by those names.
     */
    static String json(Result r) {
        List<Object> rows = new ArrayList<>();
        for (Row row : r.rows()) {
            Threshold t = row.threshold();
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("field", row.field());
            m.put("species", row.species());
            m.put("metric", t.metric().key());
            m.put("tolerance", t.tolerance());
            m.put("eps_meaning", row.epsMeaning());
            m.put("pitch_deg", row.pitchDeg());
            m.put("eps_min", row.epsMin());
            m.put("eps_max", row.epsMax());
            m.put("outcome", t.outcome().label());
            m.put("eps_star", ScanJson.number(t.epsStar()));
            m.put("energy_ev_star", ScanJson.number(t.energyEvStar()));
            rows.add(m);
        }
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("tool", ToolInfo.json());
        root.put("rows", rows);
        root.put("not_scanned", r.skipped());
        return ScanJson.write(root);
    }

    /** One panel per species: ε* by field, one series per metric; outcomes without ε* are not drawn. */
    static void plot(Result r, Path file) {
        List<CategoryChart> charts = charts(r);
        if (charts.isEmpty()) {
            return;
        }
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try {
            BitmapEncoder.saveBitmap(charts, charts.size() / 2, 2, bytes, BitmapEncoder.BitmapFormat.PNG);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        AtomicFiles.write(file, bytes.toByteArray());
    }

    /** The panels of the figure: per species with a threshold, ε* and the energy there. */
    static List<CategoryChart> charts(Result r) {
        System.setProperty("java.awt.headless", "true");
        List<CategoryChart> charts = new ArrayList<>();
        List<String> fields = r.rows().stream().map(Row::field).distinct().toList();
        for (Species s : SPECIES) {
            // two panels per species: eps* (comparable across fields) and the energy there (the answer)
            CategoryChart eps = panel("\u03b5* of the guiding-center model, " + s.name() + "s", "\u03b5* at the default tolerance");
            CategoryChart energy = panel("energy at \u03b5*, " + s.name() + "s (time-scale fields have none)",
                    "kinetic energy at \u03b5* (eV)");
            boolean any = false;
            for (ScanMetric m : ScanMetric.values()) {
                any |= addSeries(eps, r, fields, s, m.key(), row -> row.threshold().metric() == m
                        && row.threshold().outcome().hasEpsStar(), row -> row.threshold().epsStar(), null);
                addSeries(energy, r, fields, s, m.key(), row -> row.threshold().metric() == m
                        && row.threshold().outcome().hasEpsStar(), row -> row.threshold().energyEvStar(), null);
            }
            // outcomes without an eps*: at the edge of the range scanned, in grey, so they are seen
            addSeries(eps, r, fields, s, "not reached",
                    row -> row.threshold().outcome() == ThresholdOutcome.NOT_REACHED, Row::epsMax, SeriesMarkers.TRIANGLE_UP);
            addSeries(eps, r, fields, s, "exceeded at start",
                    row -> row.threshold().outcome() == ThresholdOutcome.EXCEEDED_AT_START
                            || row.threshold().outcome() == ThresholdOutcome.EXCEEDED_ONCE_MEASURED,
                    Row::epsMin, SeriesMarkers.TRIANGLE_DOWN);
            if (any) {
                charts.add(decades(eps));
                charts.add(decades(energy));
            }
        }
        return charts;
    }

    /** The panel with its log axis on the whole decades around its values. */
    private static CategoryChart decades(CategoryChart c) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (CategorySeries s : c.getSeriesMap().values()) {
            for (Number v : s.getYData()) {
                if (v != null && v.doubleValue() > 0 && Double.isFinite(v.doubleValue())) {
                    lo = Math.min(lo, v.doubleValue());
                    hi = Math.max(hi, v.doubleValue());
                }
            }
        }
        LogAxes.range(c.getStyler(), false, lo, hi);
        return c;
    }

    private static CategoryChart panel(String title, String yTitle) {
        CategoryChart c = new CategoryChartBuilder().width(1000).height(560).title(title).xAxisTitle("field")
                .yAxisTitle(yTitle).build();
        c.getStyler().setDefaultSeriesRenderStyle(CategorySeries.CategorySeriesRenderStyle.Scatter);
        LogAxes.y(c.getStyler());
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideS)
                .setLegendLayout(Styler.LegendLayout.Horizontal);
        c.getStyler().setChartBackgroundColor(java.awt.Color.WHITE);
        c.getStyler().setPlotGridLinesStroke(new java.awt.BasicStroke(0.6f));
        c.getStyler().setPlotGridLinesColor(new java.awt.Color(0xdddddd));
        c.getStyler().setXAxisLabelRotation(30);
        c.getStyler().setMarkerSize(9);
        return c;
    }

    /**
     * One series: per field, the value of the first row of species s that {@code which} selects
     * (null where none); a grey series with the given marker when {@code marker} is set. False
     * when no field has a value.
     */
    private static boolean addSeries(CategoryChart c, Result r, List<String> fields, Species s, String name,
                                     java.util.function.Predicate<Row> which, java.util.function.ToDoubleFunction<Row> value,
                                     org.knowm.xchart.style.markers.Marker marker) {
        List<Double> ys = new ArrayList<>();
        boolean some = false;
        for (String f : fields) {
            Double y = r.rows().stream().filter(row -> row.field().equals(f) && row.species().equals(s.name())
                            && which.test(row)).map(value::applyAsDouble).filter(v -> v > 0 && Double.isFinite(v))
                    .findFirst().orElse(null);
            ys.add(y);
            some |= y != null;
        }
        if (some) {
            CategorySeries series = c.addSeries(name, fields, ys);
            if (marker != null) {
                series.setMarker(marker);
                series.setMarkerColor(new java.awt.Color(0x888888));
            }
        }
        return some;
    }

    public static void deleteTree(Path dir) {
        if (!Files.exists(dir)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot remove " + dir + ": " + e.getMessage(), e);
        }
    }

    /**
     * Folds the progress of the successive scans into one count over the whole map; the points a
     * later scan takes up from disk are passed on as resumed, not as computed.
     */
    static final class Overall implements ScanProgress {
        private final ScanProgress target;
        private final int total;
        private boolean started;

        Overall(ScanProgress target, int total) {
            this.target = target;
            this.total = total;
        }

        @Override
        public synchronized void start(int scanTotal, int alreadyDone) {
            if (!started) {
                target.start(total, alreadyDone);
                started = true;
            } else if (alreadyDone > 0) {
                target.resumed(alreadyDone);
            }
        }

        @Override
        public void resumed(int points) {
            target.resumed(points);
        }

        @Override
        public void pointDone() {
            target.pointDone();
        }
    }
}
