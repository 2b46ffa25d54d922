package org.twinorbit.harness;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.twinorbit.harness.baseline.Baseline;
import org.twinorbit.harness.baseline.BaselineFile;
import org.twinorbit.harness.baseline.CheckJson;
import org.twinorbit.harness.baseline.CheckJunit;
import org.twinorbit.harness.baseline.CheckMarkdown;
import org.twinorbit.harness.baseline.CheckReport;
import org.twinorbit.harness.baseline.CheckResult;
import org.twinorbit.harness.baseline.Comparison;
import org.twinorbit.harness.baseline.MeasuredRow;
import org.twinorbit.harness.baseline.Metric;
import org.twinorbit.harness.baseline.Runs;
import org.twinorbit.harness.baseline.Tolerance;
import org.twinorbit.harness.baseline.ToleranceFile;
import org.twinorbit.harness.baseline.Tolerances;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code twinorbit check BASELINE}: reruns the baseline's cases with this build and compares
 * every number with its tolerance. Exit 0 when nothing got worse, 1 on a regression or a
 * missing row, 2 on bad input (a missing, corrupt or other-schema baseline, an unknown metric,
 * an output that cannot be written).
 */
@Command(name = "check", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Rerun exactly the cases of a baseline (written by 'twinorbit baseline') and compare every "
                + "metric with a tolerance: relative, with an absolute floor for round-off-level values, worse-only "
                + "by default. Reports regressions, improvements, new and missing rows, status, class and verdict "
                + "changes as Markdown on stdout, and optionally as a Markdown file, JUnit XML and JSON. Wall-clock "
                + "times are never compared. Exit codes: 0 pass, 1 regression, 2 bad input.",
        footer = {"", "Tolerance file (YAML):", "  metrics:", "    drift_error: {relative: 1.0e-6, absolute: 1.0e-12}",
            "  cases:", "    mirror-proton-eps0.05:", "      bounce_period_error: {relative: 1.0e-3}",
            "A case's entry beats a metric's; an option beats the file."})
public final class CheckCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "BASELINE", description = "The baseline file.")
    Path baselineFile;

    @Option(names = "--tolerances", paramLabel = "FILE", description = "YAML file of tolerances per metric and per case.")
    Path toleranceFile;

    @Option(names = "--tolerance", paramLabel = "[CASE:]METRIC=REL[,ABS]",
            description = "Tolerance of a metric, for every case or for one (repeatable): relative, and optionally "
                    + "the absolute floor (default: the metric's). Metrics: mu_change, reference_mu_change, mu_jump, "
                    + "energy_error, phase_error, drift_error, position_error_rho, particle_position_error_rho, "
                    + "bounce_period_s, bounce_period_error, "
                    + "mirror_field_t, mirror_field_error, invariant_error, order, class_agreement, and for scans "
                    + "class_change, eps_star, energy_ev_star, ... (an unknown name lists them all).")
    Map<String, String> tolerance = new LinkedHashMap<>();

    @Option(names = "--two-sided", description = "Fail on any change beyond the tolerance, improvements included "
            + "(default: worse only).")
    boolean twoSided;

    @Option(names = "--cost-tolerance", paramLabel = "REL", description = "Also compare the cost, field evaluations "
            + "per orbit (not wall time): fail when it rises by more than REL (e.g. 0.25). Off by default.")
    Double costTolerance;

    @Option(names = "--markdown", paramLabel = "FILE", description = "Also write the Markdown summary to FILE.")
    Path markdown;

    @Option(names = "--junit", paramLabel = "FILE", description = "Write JUnit XML to FILE: a test suite per case, "
            + "a test case per case and integrator.")
    Path junit;

    @Option(names = "--json", paramLabel = "FILE", description = "Write the check as JSON to FILE.")
    Path json;

    @Mixin
    ExecutionOptions execution;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        int threads = execution.threads();
        Map<String, Path> outputs = new LinkedHashMap<>();
        outputs.put("--markdown", markdown);
        outputs.put("--junit", junit);
        outputs.put("--json", json);
        outputs.forEach((option, p) -> {
            if (p != null) {
                OutputFile.check(p, option);
            }
        });
        Baseline b = BaselineFile.read(baselineFile);
        Tolerances tol = tolerances(b);
        List<MeasuredRow> now = Runs.again(b, threads, execution.quiet());
        CheckResult result = Comparison.compare(b.rows(), now, tol);
        CheckReport report = new CheckReport(baselineFile.toString(), b, result, tol);
        String md = CheckMarkdown.of(report);
        if (markdown != null) {
            OutputFile.write(markdown, md, "--markdown");
        }
        if (junit != null) {
            OutputFile.write(junit, CheckJunit.of(report), "--junit");
        }
        if (json != null) {
            OutputFile.write(json, CheckJson.of(report), "--json");
        }
        PrintWriter pw = spec.commandLine().getOut();
        pw.print(md);
        pw.flush();
        return result.exitCode();
    }

    /** The tolerances: defaults, then the file, then the options. */
    private Tolerances tolerances(Baseline b) {
        Tolerances t = new Tolerances().twoSided(twoSided).cost(costTolerance);
        if (toleranceFile != null) {
            ToleranceFile.read(toleranceFile, t);
        }
        for (Map.Entry<String, String> e : tolerance.entrySet()) {
            String key = e.getKey();
            int colon = key.lastIndexOf(':');
            Metric m = Metric.ofKey(key.substring(colon + 1), "--tolerance");
            Tolerance value = parse(e.getValue(), m, key);
            if (colon < 0) {
                t.metric(m, value);
            } else {
                t.forCase(key.substring(0, colon), m, value);
            }
        }
        t.checkCases(b.rows().stream().map(MeasuredRow::caseName).distinct().toList(), "--tolerance, --tolerances");
        return t;
    }

    private static Tolerance parse(String text, Metric m, String key) {
        String[] parts = text.split(",");
        try {
            double rel = Double.parseDouble(parts[0].trim());
            double abs = parts.length > 1 ? Double.parseDouble(parts[1].trim()) : m.defaultTolerance().absolute();
            if (parts.length > 2) {
                throw new NumberFormatException();
            }
            return new Tolerance(rel, abs);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("--tolerance " + key + ": give REL or REL,ABS (numbers), got '" + text + "'");
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--tolerance " + key + ": " + e.getMessage());
        }
    }
}
