package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.twinorbit.harness.cases.CaseSpec;

/**
 * The guiding-center model's error is second order in ε: its drift velocity and bounce period
 * differ from the gyro-averaged exact orbit's by O(ε²) (Northrop, The Adiabatic Motion of
 * Charged Particles, 1963; Littlejohn, J. Plasma Phys. 29, 1983). Compared with a guiding
 * center of its own (the matched start), the model row must show that: a log-log slope of at
 * least 1.8 over ε = 0.005–0.05 for the worst phase, and the spread over phases (standard
 * deviation of the signed per-phase errors) must shrink at least as fast. The zeroth-order ring
 * around one shared guiding center gives each phase an O(ε) offset in p∥ and position (in the
 * toroidal field m R u_φ is exact, so a particle at R0 + ρ cos θ has v∥ (1 + (ρ/R0) cos θ)), and
 * the same fit then has slope ≈ 1.
 *
 * <p>Every fit is appended to {@code target/matched-start-scaling.md}, the table quoted in
 * results/README.md.
 */
class MatchedStartScalingTest {

    private static final double[] EPS = {0.005, 0.01, 0.02, 0.05};
    private static final Path TABLE = Path.of("target", "matched-start-scaling.md");

    @org.junit.jupiter.api.BeforeAll
    static void freshTable() throws IOException {
        Files.deleteIfExists(TABLE);
        Files.createDirectories(TABLE.getParent());
        Files.writeString(TABLE, "| field | pitch | start | metric | matched worst at eps 0.005 0.01 0.02 (0.05) | "
                + "matched slope | matched spread slope | shared slope | shared spread slope |\n|---|---|---|---|---|---|---|---|---|\n");
    }

    /** Slopes of log |worst| and log spread against log ε. */
    private record Fit(double worst, double spread, double[] worstValues) {}

    private static Fit fit(String field, double pitch, String start, String metric, String gcStart, boolean bounces) {
        return fits(EPS, field, pitch, start, gcStart, bounces, metric).get(metric);
    }

    /** One run per ε, every named metric fitted from the same runs. */
    private static Map<String, Fit> fits(double[] eps, String field, double pitch, String start, String gcStart,
                                         boolean bounces, String... metrics) {
        Map<String, SimpleRegression> w = new LinkedHashMap<>();
        Map<String, SimpleRegression> sd = new LinkedHashMap<>();
        Map<String, double[]> values = new LinkedHashMap<>();
        for (String metric : metrics) {
            w.put(metric, new SimpleRegression());
            sd.put(metric, new SimpleRegression());
            values.put(metric, new double[eps.length]);
        }
        for (int i = 0; i < eps.length; i++) {
            CaseSpec s = TestCases.spec(field, "none", "none");
            s.eps = eps[i];
            s.pitch = pitch;
            s.phases = 8;
            s.duration = bounces ? 2.0 : 20.0;
            s.durationUnit = bounces ? "bounces" : "gyroperiods";
            s.gcStart = gcStart;
            if (!start.isEmpty()) {
                s.start = Arrays.stream(start.split(";")).map(Double::valueOf).toList();
            }
            ResultRow row = TestCases.row(TestCases.run(s), "gc-reference");
            for (String metric : metrics) {
                Stat st = row.metric(metric);
                values.get(metric)[i] = st.worst();
                w.get(metric).addData(Math.log(eps[i]), Math.log(Math.abs(st.worst())));
                sd.get(metric).addData(Math.log(eps[i]),
                        Math.log(Math.sqrt(Math.max(0, st.rms() * st.rms() - st.mean() * st.mean()))));
            }
        }
        Map<String, Fit> out = new LinkedHashMap<>();
        for (String metric : metrics) {
            out.put(metric, new Fit(w.get(metric).getSlope(), sd.get(metric).getSlope(), values.get(metric)));
        }
        return out;
    }

    private static void record(String field, double pitch, String start, String metric, Fit matched, Fit shared)
            throws IOException {
        List<String> cells = new ArrayList<>();
        for (double v : matched.worstValues()) {
            cells.add(String.format(Locale.ROOT, "%.2e", v));
        }
        String line = String.format(Locale.ROOT, "| %s | %s | %s | %s | %s | %.2f | %.2f | %s | %s |%n", field,
                Math.round(pitch), start.isEmpty() ? "default" : start.replace(';', ','), metric,
                String.join(" ", cells), matched.worst(), matched.spread(), slope(shared == null ? null : shared.worst()),
                slope(shared == null ? null : shared.spread()));
        Files.createDirectories(TABLE.getParent());
        Files.writeString(TABLE, line, StandardOpenOption.CREATE, StandardOpenOption.APPEND);
    }

    private static String slope(Double s) {
        return s == null ? "—" : String.format(Locale.ROOT, "%.2f", s);
    }

    @ParameterizedTest(name = "{0} pitch {1} {3}")
    @CsvSource({
            "toroidal,      60, '',        drift_error,         false",
            "toroidal,      30, '',        drift_error,         false",
            "dipole,        60, '',        drift_error,         true",
            "dipole,        60, '',        bounce_period_error, true",
            "dipole,        40, '',        drift_error,         true",
            "dipole,        40, '',        bounce_period_error, true",
            "mirror,        60, 0.1;0;0,   drift_error,         true",
            "mirror,        60, 0.1;0;0,   bounce_period_error, true",
            "mirror,        40, 0.1;0;0,   drift_error,         true",
            "mirror,        40, 0.1;0;0,   bounce_period_error, true",
            "current-sheet, 60, '',        bounce_period_error, true",
            "current-sheet, 30, '',        bounce_period_error, true"})
    void modelErrorIsSecondOrderWithTheMatchedStartAndFirstOrderWithTheShared(String field, double pitch, String start,
                                                                              String metric, boolean bounces)
            throws IOException {
        Fit matched = fit(field, pitch, start, metric, "matched", bounces);
        Fit shared = fit(field, pitch, start, metric, "shared", bounces);
        record(field, pitch, start, metric, matched, shared);
        assertTrue(matched.worst() >= 1.8, field + " " + metric + " matched-start slope " + matched.worst());
        assertTrue(matched.spread() >= 1.8, field + " " + metric + " matched-start spread slope " + matched.spread());
        // first order: the start-up offset, not the model
        assertTrue(shared.worst() > 0.7 && shared.worst() < 1.3, field + " " + metric + " shared-start slope "
                + shared.worst());
        assertTrue(shared.spread() > 0.7 && shared.spread() < 1.3, field + " " + metric + " shared-start spread slope "
                + shared.spread());
    }

    /** In the gradient field the drift is second order either way; the matched start must keep it so. */
    @ParameterizedTest(name = "gradient pitch {0}")
    @CsvSource({"90", "60"})
    void gradientDriftStaysSecondOrder(double pitch) throws IOException {
        Fit matched = fit("gradient", pitch, "", "drift_error", "matched", false);
        record("gradient", pitch, "", "drift_error", matched, null);
        assertTrue(matched.worst() >= 1.8, "gradient drift matched-start slope " + matched.worst());
    }

    /**
     * In the tokamak a 80° or 75° proton is trapped (a banana) only up to ε ≈ 0.02 at the default
     * start. Field lines twist there (b·∇×b ≠ 0) and ψ curves across b, which is where the
     * particle's exact p_φ differs from its guiding center's at first order (the μ terms of
     * {@link MatchedStart#gyroCorrection}); without them the drift error kept an O(ε) part (at 75°
     * 4.5e-5, 7.6e-5, 1.1e-4 at ε = 0.00125, 0.0025, 0.005: slope 0.6) and so did the mirror
     * field, which tests μ directly (B at the mirror point = energy/μ; slope 1.0).
     *
     * <p>The drift and mirror field are fitted over ε = 0.00125–0.005: the tokamak's expansion
     * parameter for the orbit's shape is the poloidal gyroradius over the minor radius,
     * ρ_θ/r = ρ q R/r² ≈ 70 ε at this start, so above ε ≈ 0.005 terms of higher order in it bend
     * the fit (measured: the drift slope over 0.005–0.02 is 1.1 at 75° and 1.5 at 80° with the
     * default q, 1.7 at 75° with q halved; the bend moves with q as ρ_θ does). The drift over
     * 0.005–0.02 is recorded, not asserted. The bounce period is fitted over 0.005–0.02. The
     * shared start is reported, not asserted.
     */
    @ParameterizedTest(name = "tokamak pitch {0}")
    @CsvSource({"80", "75"})
    void tokamakModelErrorIsSecondOrder(double pitch) throws IOException {
        double[] small = {0.00125, 0.0025, 0.005};
        double[] banana = {0.005, 0.01, 0.02};
        String[] smallMetrics = {"drift_error", "mirror_field_error"};
        String[] bananaMetrics = {"bounce_period_error", "drift_error"};
        Map<String, Fit> matchedSmall = fits(small, "tokamak", pitch, "", "matched", true, smallMetrics);
        Map<String, Fit> sharedSmall = fits(small, "tokamak", pitch, "", "shared", true, smallMetrics);
        Map<String, Fit> matchedBanana = fits(banana, "tokamak", pitch, "", "matched", true, bananaMetrics);
        Map<String, Fit> sharedBanana = fits(banana, "tokamak", pitch, "", "shared", true, bananaMetrics);
        for (String metric : smallMetrics) {
            record("tokamak", pitch, "", metric + ", eps 0.00125 0.0025 0.005", matchedSmall.get(metric),
                    sharedSmall.get(metric));
        }
        for (String metric : bananaMetrics) {
            String label = metric.equals("drift_error") ? metric + " (not asserted)" : metric;
            record("tokamak", pitch, "", label + ", eps 0.005 0.01 0.02", matchedBanana.get(metric),
                    sharedBanana.get(metric));
        }
        for (String metric : smallMetrics) {
            assertSecondOrder("tokamak " + metric, matchedSmall.get(metric));
        }
        assertSecondOrder("tokamak bounce_period_error", matchedBanana.get("bounce_period_error"));
    }

    private static void assertSecondOrder(String what, Fit matched) {
        assertTrue(matched.worst() >= 1.8, what + " matched-start slope " + matched.worst());
        assertTrue(matched.spread() >= 1.8, what + " matched-start spread slope " + matched.spread());
    }
}
