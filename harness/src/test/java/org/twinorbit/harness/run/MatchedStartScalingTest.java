package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
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
        return fit(EPS, field, pitch, start, metric, gcStart, bounces);
    }

    private static Fit fit(double[] eps, String field, double pitch, String start, String metric, String gcStart,
                           boolean bounces) {
        SimpleRegression w = new SimpleRegression();
        SimpleRegression sd = new SimpleRegression();
        double[] values = new double[eps.length];
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
            Stat st = TestCases.row(TestCases.run(s), "gc-reference").metric(metric);
            values[i] = st.worst();
            w.addData(Math.log(eps[i]), Math.log(Math.abs(st.worst())));
            sd.addData(Math.log(eps[i]), Math.log(Math.sqrt(Math.max(0, st.rms() * st.rms() - st.mean() * st.mean()))));
        }
        return new Fit(w.getSlope(), sd.getSlope(), values);
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
     * In the tokamak a 80° proton is trapped (a banana) only up to ε ≈ 0.02 at the default start,
     * so the fit runs over ε = 0.005–0.02. Field lines twist there (b·∇×b ≠ 0), which is where a
     * plain gyration average of v·b and μ is off by O(ε) (the Baños term; Baños, J. Plasma Phys.
     * 1, 1967): this case fails (slope 1.1) unless p∥ comes from the exact p_φ and μ from the
     * exact energy, as {@link MatchedStart} does. The shared start is reported, not asserted: in
     * this short range its slopes lie between 1.2 and 1.8. At 75° the drift error is not asserted
     * either: it has a floor of ~1e-4 at the smallest ε (fit slope 1.33; see results/README.md).
     */
    @ParameterizedTest(name = "tokamak pitch {0} {1}")
    @CsvSource({"80, drift_error", "80, bounce_period_error", "75, bounce_period_error"})
    void tokamakModelErrorIsSecondOrder(double pitch, String metric) throws IOException {
        double[] eps = {0.005, 0.01, 0.02};
        Fit matched = fit(eps, "tokamak", pitch, "", metric, "matched", true);
        Fit shared = fit(eps, "tokamak", pitch, "", metric, "shared", true);
        record("tokamak", pitch, "", metric, matched, shared);
        assertTrue(matched.worst() >= 1.8, "tokamak " + metric + " matched-start slope " + matched.worst());
        assertTrue(matched.spread() >= 1.8, "tokamak " + metric + " matched-start spread slope " + matched.spread());
    }
}
