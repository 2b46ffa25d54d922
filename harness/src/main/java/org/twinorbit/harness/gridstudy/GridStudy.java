package org.twinorbit.harness.gridstudy;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.GridFile;
import org.twinorbit.fields.GriddedField;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.ResolvedCase;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.run.ResultRow;

/**
 * The grid study: one case on an analytic field of the library and on its grids at spacing h,
 * h/2, h/4, ..., and how the model-error metrics (the guiding-center reference against the
 * gyro-averaged full-orbit reference, worst phase) move away from their analytic values. For each
 * metric the relative difference |m_h − m| / |m| is fitted to C h^p over the grids, and the
 * spacing at which it equals the tolerance is read off: the finest grid's spacing scaled by
 * (tolerance / difference)^(1/p), or the coarsest spacing that already meets it. The grid runs
 * take the analytic run's start and energy, so that the field alone differs.
 */
public final class GridStudy {

    /** One metric on one grid. */
    public record Level(double spacing, String nodes, double value, double relativeDifference, double divergence) {}

    /**
     * One metric over the grids.
     *
     * @param needed spacing (m) at which the relative difference reaches the tolerance; NaN when
     *               it cannot be read off (differences that do not shrink)
     * @param how    {@code met}: the coarsest grid that meets it; {@code fitted}: from the fitted
     *               order; {@code not converging}
     */
    public record MetricRow(String metric, double analytic, List<Level> levels, double order, double needed, String how) {}

    /**
     * An ε range to scan on the analytic field and on every grid (log-spaced points), for ε*.
     *
     * @param min    smallest ε
     * @param max    largest ε
     * @param points number of ε values
     */
    public record EpsRange(double min, double max, int points) {}

    /** ε* of one metric and scan tolerance on one grid. */
    public record EpsLevel(double spacing, String nodes, double epsStar, double relativeDifference) {}

    /**
     * ε* of one metric at one scan tolerance, analytic and on each grid; NaN where the scan does
     * not cross the tolerance.
     */
    public record EpsStarRow(String metric, double scanTolerance, double analytic, List<EpsLevel> levels, double order) {}

    /** The whole study; {@code epsStars} is empty without an ε range. */
    public record Result(CaseResult analytic, GridSpec coarsest, double tolerance, List<MetricRow> rows,
                         List<Double> divergences, EpsRange range, List<EpsStarRow> epsStars) {}

    private GridStudy() {}

    /**
     * @param c         the case on the analytic field (pushers and guiding-center integrators are not run)
     * @param coarsest  the coarsest grid
     * @param levels    grids h, h/2, ... (at least 2)
     * @param tolerance the relative difference from the analytic value a metric may reach
     */
    public static Result run(Case c, GridSpec coarsest, int levels, double tolerance, CaseRunner runner) {
        return run(c, coarsest, levels, tolerance, runner, null, 1);
    }

    /**
     * As {@link #run(Case, GridSpec, int, double, CaseRunner)}, and with a range, a breakdown scan
     * of the same case (its pitch, start, ensemble, duration and guiding-center start; the scan's
     * default tolerances) on the analytic field and on every grid, for ε*.
     *
     * @param range   the ε range, or null for no scans
     * @param threads worker threads of each scan point
     */
    public static Result run(Case c, GridSpec coarsest, int levels, double tolerance, CaseRunner runner,
                             EpsRange range, int threads) {
        Case a = new Case(c.name(), c.field(), c.fieldParameters(), c.species(), c.start(), c.energyEv(), c.eps(),
                c.pitchDeg(), c.phases(), c.duration(), c.durationUnit(), List.of(), c.stepsPerGyro(), List.of(),
                c.gcStepGyro(), c.referenceRtol(), c.gcStart());
        ResolvedCase ra = new ResolvedCase(a);
        Field field = ra.field();
        CaseResult analytic = runner.run(a);
        ResultRow model = model(analytic);
        Map<String, Double> epsAnalytic = range == null ? Map.of()
                : epsStars(scanOf(a, c.field(), c.fieldParameters(), ra, range, threads), threads);
        List<Map<String, Double>> epsGrids = new ArrayList<>();
        List<String> metrics = new ArrayList<>();
        for (String m : ResultRow.METRICS) {
            double v = model.metric(m).worst();
            if (Double.isFinite(v) && v != 0) {
                metrics.add(m);
            }
        }
        Path dir;
        try {
            dir = Files.createTempDirectory("twinorbit-gridstudy");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create a temporary folder for the grids", e);
        }
        List<GridSpec> grids = new ArrayList<>();
        List<ResultRow> rows = new ArrayList<>();
        List<Double> div = new ArrayList<>();
        try {
            for (int l = 0; l < levels; l++) {
                GridSpec g = coarsest.refined(1 << l);
                Path file = dir.resolve("level-" + l + "-" + System.nanoTime() + ".h5");
                g.write(field, file);
                GriddedField gf = GridFile.read(file);
                div.add(gf.maxDivergence());
                Case gc = new Case(c.name(), GridFile.PREFIX + file, Map.of(), c.species(), ra.start(), ra.energyEv(),
                        null, c.pitchDeg(), c.phases(), c.duration(), c.durationUnit(), List.of(), c.stepsPerGyro(),
                        List.of(), c.gcStepGyro(), c.referenceRtol(), c.gcStart());
                grids.add(g);
                rows.add(model(runner.run(gc)));
                if (range != null) {
                    epsGrids.add(epsStars(scanOf(a, GridFile.PREFIX + file, Map.of(), ra, range, threads), threads));
                }
            }
        } finally {
            deleteTree(dir);
        }
        List<MetricRow> out = new ArrayList<>();
        for (String m : metrics) {
            double exact = model.metric(m).worst();
            List<Level> ls = new ArrayList<>();
            for (int l = 0; l < levels; l++) {
                double v = rows.get(l).metric(m).worst();
                ls.add(new Level(grids.get(l).spacing(), grids.get(l).nodesText(), v, Math.abs(v - exact) / Math.abs(exact),
                        div.get(l)));
            }
            out.add(row(m, exact, ls, tolerance));
        }
        List<EpsStarRow> eps = new ArrayList<>();
        for (Map.Entry<String, Double> e : epsAnalytic.entrySet()) {
            String[] key = e.getKey().split("@");
            List<EpsLevel> ls = new ArrayList<>();
            List<Level> forFit = new ArrayList<>();
            for (int l = 0; l < epsGrids.size(); l++) {
                double g = epsGrids.get(l).getOrDefault(e.getKey(), Double.NaN);
                double rel = Math.abs(g - e.getValue()) / e.getValue();
                ls.add(new EpsLevel(grids.get(l).spacing(), grids.get(l).nodesText(), g, rel));
                forFit.add(new Level(grids.get(l).spacing(), grids.get(l).nodesText(), g, rel, div.get(l)));
            }
            eps.add(new EpsStarRow(key[0], Double.parseDouble(key[1]), e.getValue(), ls, fittedOrder(forFit)));
        }
        return new Result(analytic, coarsest, tolerance, out, div, range, eps);
    }

    /** The breakdown scan of the study's case on one field (the ε range replaces its energy). */
    private static org.twinorbit.harness.scan.ScanRequest.Built scanOf(Case c, String field, Map<String, Double> params,
                                                                      ResolvedCase ra, EpsRange range, int threads) {
        org.twinorbit.harness.scan.ScanRequest q = new org.twinorbit.harness.scan.ScanRequest();
        q.field = field;
        q.parameters = new java.util.LinkedHashMap<>(params);
        q.species = c.species();
        q.pitches = List.of(c.pitchDeg());
        q.epsMin = range.min();
        q.epsMax = range.max();
        q.points = range.points();
        q.start = List.of(ra.start().x(), ra.start().y(), ra.start().z());
        q.phases = c.phases();
        q.duration = c.duration();
        q.durationUnit = org.twinorbit.harness.scan.ScanDuration.Unit.parse(c.durationUnit().label());
        q.referenceRtol = c.referenceRtol();
        q.gcStart = c.gcStart();
        q.threads = threads;
        return q.build();
    }

    /** ε* by "metric@tolerance" for every threshold the scan crossed. */
    private static Map<String, Double> epsStars(org.twinorbit.harness.scan.ScanRequest.Built b, int threads) {
        Path dir;
        try {
            dir = Files.createTempDirectory("twinorbit-gridstudy-scan");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create a temporary folder for a scan", e);
        }
        org.twinorbit.harness.scan.ScanResult r;
        try {
            r = b.scan().run(b.evaluator(), dir, false, threads, org.twinorbit.harness.scan.ScanProgress.NONE);
        } finally {
            deleteTree(dir);
        }
        Map<String, Double> out = new java.util.LinkedHashMap<>();
        for (org.twinorbit.harness.scan.Threshold t : r.thresholds()) {
            if (t.outcome() == org.twinorbit.harness.scan.ThresholdOutcome.CROSSED && Double.isFinite(t.epsStar())) {
                out.put(t.metric().key() + "@" + t.tolerance(), t.epsStar());
            }
        }
        return out;
    }

    private static void deleteTree(Path dir) {
        try (java.util.stream.Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot remove the temporary scan folder " + dir, e);
        }
    }

    private static MetricRow row(String metric, double exact, List<Level> ls, double tolerance) {
        double order = fittedOrder(ls);
        Level finest = ls.get(ls.size() - 1);
        double needed = Double.NaN;
        String how = "not converging";
        for (Level l : ls) {
            boolean metFromHereOn = ls.subList(ls.indexOf(l), ls.size()).stream()
                    .allMatch(x -> x.relativeDifference() <= tolerance);
            if (metFromHereOn) {
                needed = l.spacing();
                how = "met";
                break;
            }
        }
        if (Double.isNaN(needed) && order > 0.5) {
            needed = finest.spacing() * Math.pow(tolerance / finest.relativeDifference(), 1 / order);
            how = "fitted";
        }
        return new MetricRow(metric, exact, List.copyOf(ls), order, needed, how);
    }

    /** Least-squares slope of log(difference) against log(spacing); NaN when a difference is 0. */
    static double fittedOrder(List<Level> ls) {
        int n = ls.size();
        double sx = 0, sy = 0, sxx = 0, sxy = 0;
        for (Level l : ls) {
            if (!(l.relativeDifference() > 0) || !Double.isFinite(l.relativeDifference())) {
                return Double.NaN;
            }
            double x = Math.log(l.spacing());
            double y = Math.log(l.relativeDifference());
            sx += x;
            sy += y;
            sxx += x * x;
            sxy += x * y;
        }
        return (n * sxy - sx * sy) / (n * sxx - sx * sx);
    }

    private static ResultRow model(CaseResult r) {
        for (ResultRow row : r.rows()) {
            if (row.errorKind().equals("model")) {
                return row;
            }
        }
        throw new IllegalStateException("no model row in " + r.resolved().spec().name());
    }
}
