package org.twinorbit.harness.scan;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code twinorbit scan}: the breakdown scan of DESIGN.md — the guiding-center model error
 * against ε over a log-spaced range, ε* per metric and tolerance, and the energy it reads as.
 */
@Command(name = "scan", mixinStandardHelpOptions = true, sortOptions = false,
        description = {
            "Breakdown scan: the model error of the guiding-center approximation (guiding-center",
            "reference against the gyro-averaged full-orbit reference, worst case over a gyrophase",
            "ensemble) against eps = rho0/L, varied through the energy at a fixed field (ramp and",
            "wave scan 1/(Omega tau) and omega/Omega at a fixed energy). For each metric and",
            "tolerance, eps* is the first eps whose error exceeds it, refined by log-log",
            "interpolation. Writes scan.md, scan.csv, scan.json and scan.png into --out."})
public final class ScanCommand implements Runnable {

    @Option(names = "--field", required = true, paramLabel = "NAME",
            description = "Field of the library (see 'twinorbit fields').")
    String field;

    @Option(names = "--param", paramLabel = "NAME=VALUE",
            description = "Field parameter override, repeatable (e.g. --param Rm=8).")
    Map<String, Double> params = new LinkedHashMap<>();

    @Option(names = "--species", defaultValue = "proton", paramLabel = "NAME",
            description = "Particle: electron, positron, proton, deuteron, triton, helium-3, alpha, or mass,charge "
                    + "in kg,C (default: ${DEFAULT-VALUE}).")
    String species;

    @Option(names = "--pitch", split = ",", paramLabel = "DEG",
            description = "Pitch angle(s) in degrees, comma-separated (default: per field, trapped where the field "
                    + "has a bounce motion).")
    List<Double> pitches;

    @Option(names = "--eps-min", paramLabel = "EPS", description = "Smallest eps (default: per field).")
    Double epsMin;

    @Option(names = "--eps-max", paramLabel = "EPS", description = "Largest eps, below 1 (default: per field).")
    Double epsMax;

    @Option(names = "--points", defaultValue = "16", paramLabel = "N",
            description = "Number of eps values, log-spaced (default: ${DEFAULT-VALUE}).")
    int points;

    @Option(names = "--energy", paramLabel = "EV",
            description = "Fixed kinetic energy in eV of a ramp or wave scan (default: per field).")
    Double energy;

    @Option(names = "--start", split = ",", paramLabel = "X,Y,Z",
            description = "Initial guiding center in m (default: the field's; r = 0.2 Lm in the mirror's midplane).")
    List<Double> start;

    @Option(names = "--phases", defaultValue = "8", paramLabel = "N",
            description = "Gyrophase ensemble size (default: ${DEFAULT-VALUE}).")
    int phases;

    @Option(names = "--duration", paramLabel = "D", description = "Run length of every orbit (default: per field).")
    Double duration;

    @Option(names = "--duration-unit", paramLabel = "UNIT",
            description = "gyroperiods, bounces, or field-periods (tau of ramp, wave period of wave) (default: per field).")
    String durationUnit;

    @Option(names = "--tolerance", paramLabel = "METRIC=TOL[,TOL...]",
            description = "Tolerance(s) of a metric at which eps* is found, repeatable; metrics: mu_jump (1%), "
                    + "drift_error (5%), position_error_rho (1 rho0), bounce_period_error (1%), class_change (0). "
                    + "Metrics not named keep their default.")
    Map<String, String> tolerances = new LinkedHashMap<>();

    @Option(names = "--reference-rtol", paramLabel = "RTOL",
            description = "Relative tolerance of both references (default: ${DEFAULT-VALUE}).")
    double referenceRtol = CaseSpec.DEFAULT_RTOL;

    @Option(names = "--out", defaultValue = "scan-results", paramLabel = "DIR",
            description = "Output directory (default: ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--resume", description = "Take up the points saved by an interrupted scan with the same options in --out.")
    boolean resume;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
    int threads = Runtime.getRuntime().availableProcessors();

    @Option(names = "--quiet", description = "No progress bar.")
    boolean quiet;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        ScanSetup setup = setup();
        long t0 = System.nanoTime();
        ScanResult r;
        if (quiet) {
            r = setup.scan().run(setup.evaluator(), out, resume, threads, ScanProgress.NONE);
        } else {
            try (ScanProgressBar bar = new ScanProgressBar("scan " + field)) {
                r = setup.scan().run(setup.evaluator(), out, resume, threads, bar);
            }
        }
        PrintWriter w = spec.commandLine().getOut();
        printSummary(w, r);
        w.printf("wrote %s/scan.md, scan.csv, scan.json, scan.png in %.1f s%n", out, (System.nanoTime() - t0) * 1e-9);
        w.flush();
    }

    /** Checks every option and builds the scan; no orbit is computed here. */
    ScanSetup setup() {
        if (threads < 1) {
            throw new IllegalArgumentException("--threads must be at least 1, got " + threads);
        }
        Species s = Species.parse(species);
        ScanField recipe = ScanField.of(field);
        if (recipe.timeScale() && params.containsKey(recipe.parameter())) {
            throw new IllegalArgumentException("--param " + recipe.parameter() + ": the scan sets it from eps; "
                    + "choose the range with --eps-min and --eps-max instead");
        }
        double lo = epsMin != null ? epsMin : recipe.epsMin();
        double hi = epsMax != null ? epsMax : recipe.epsMax();
        double[] eps = EpsilonGrid.logSpaced(lo, hi, points);
        Field f = Fields.create(field, recipe.parametersAt(params, lo), s);
        Vec3 x0 = start(f, recipe);
        List<Double> pitch = pitches != null ? pitches : List.of(recipe.pitchDeg());
        for (double p : pitch) {
            if (!(p >= 0 && p <= 180)) {
                throw new IllegalArgumentException("--pitch must lie in [0, 180] degrees, got " + p);
            }
        }
        ScanDuration d = new ScanDuration(duration != null ? duration : recipe.duration().value(),
                durationUnit != null ? ScanDuration.Unit.parse(durationUnit) : recipe.duration().unit());
        if (!(referenceRtol >= 1e-13 && referenceRtol <= 1e-6)) {
            throw new IllegalArgumentException("--reference-rtol must lie in [1e-13, 1e-6], got " + referenceRtol);
        }
        ScanAxis axis;
        if (recipe.timeScale()) {
            double w = energy != null ? energy : recipe.energyEv();
            if (!(w > 0 && Double.isFinite(w))) {
                throw new IllegalArgumentException("--energy must be a finite number > 0 eV, got " + w);
            }
            if (field.equals("wave") && hi >= 0.999) {
                throw new IllegalArgumentException("--eps-max must stay below 0.999 for the wave (cyclotron resonance at 1), got " + hi);
            }
            axis = ScanAxis.timeScale(recipe.meaning(field), w);
        } else {
            if (energy != null) {
                throw new IllegalArgumentException("--energy applies to ramp and wave only: field '" + field
                        + "' scans eps through the energy");
            }
            if (!f.isStatic()) {
                throw new IllegalArgumentException("--field: '" + field + "' depends on time but has no scan recipe;"
                        + " time-dependent fields that can be scanned: ramp, wave");
            }
            EnergyScale scale = new EnergyScale(f, s, x0);
            axis = field.equals("current-sheet") ? ScanAxis.currentSheet(scale) : ScanAxis.energy(scale);
        }
        Map<ScanMetric, List<Double>> tol = tolerances();
        Map<String, Object> settings = new LinkedHashMap<>();
        settings.put("field", field);
        settings.put("parameters", new LinkedHashMap<>(params));
        settings.put("species", s.name());
        settings.put("start_m", List.of(x0.x(), x0.y(), x0.z()));
        settings.put("eps_meaning", axis.meaning());
        if (!recipe.timeScale()) {
            settings.put("L_m", f.length());
        } else {
            settings.put("energy_ev", axis.energyEv().applyAsDouble(lo));
            settings.put("scanned_parameter", recipe.parameter());
        }
        settings.put("eps_min", lo);
        settings.put("eps_max", hi);
        settings.put("n_eps", points);
        settings.put("pitch_deg", pitch);
        settings.put("phases", phases);
        settings.put("duration", d.value());
        settings.put("duration_unit", d.unit().label());
        settings.put("reference_rtol", referenceRtol);
        ModelErrorEvaluator ev = new ModelErrorEvaluator(field, params, s, x0, phases, d,
                recipe, referenceRtol);
        return new ScanSetup(new BreakdownScan(settings, eps, pitch, axis, tol), ev);
    }

    /** The options' scan and the evaluator of its points. */
    record ScanSetup(BreakdownScan scan, PointEvaluator evaluator) {}

    private Vec3 start(Field f, ScanField recipe) {
        if (start == null) {
            return recipe.start(field, f);
        }
        if (start.size() != 3 || start.stream().anyMatch(v -> !Double.isFinite(v))) {
            throw new IllegalArgumentException("--start needs three finite coordinates x,y,z in m, got " + start);
        }
        Vec3 x0 = new Vec3(start.get(0), start.get(1), start.get(2));
        if (!f.inDomain(x0.x(), x0.y(), x0.z())) {
            throw new IllegalArgumentException("--start " + x0 + " lies outside the domain of field '" + field
                    + "': " + f.domainMeaning());
        }
        return x0;
    }

    /** Every thresholded metric at its default tolerance, replaced where --tolerance names it. */
    private Map<ScanMetric, List<Double>> tolerances() {
        Map<ScanMetric, List<Double>> tol = new LinkedHashMap<>();
        for (ScanMetric m : ScanMetric.values()) {
            if (m.thresholded()) {
                tol.put(m, List.of(m.defaultTolerance()));
            }
        }
        for (Map.Entry<String, String> e : tolerances.entrySet()) {
            ScanMetric m;
            try {
                m = ScanMetric.ofKey(e.getKey());
            } catch (IllegalArgumentException ex) {
                throw new IllegalArgumentException("--tolerance: " + ex.getMessage());
            }
            if (!m.thresholded()) {
                throw new IllegalArgumentException("--tolerance: " + m.key() + " is reported beside mu_jump and has no "
                        + "threshold; give mu_jump instead");
            }
            List<Double> values = new ArrayList<>();
            for (String v : e.getValue().split(",")) {
                double x;
                try {
                    x = Double.parseDouble(v.trim());
                } catch (NumberFormatException ex) {
                    throw new IllegalArgumentException("--tolerance " + m.key() + ": '" + v + "' is not a number");
                }
                if (!(x >= 0 && Double.isFinite(x))) {
                    throw new IllegalArgumentException("--tolerance " + m.key() + " must be a finite number >= 0, got " + v);
                }
                values.add(x);
            }
            tol.put(m, values);
        }
        return tol;
    }

    private static void printSummary(PrintWriter w, ScanResult r) {
        for (Threshold t : r.thresholds()) {
            String at = t.outcome() == ThresholdOutcome.CROSSED
                    ? "eps* = " + Format.number(t.epsStar())
                    + (Double.isNaN(t.energyEvStar()) ? "" : ", " + Format.number(t.energyEvStar()) + " eV")
                    : t.outcome().label();
            w.printf("%-20s tol %-8s pitch %-5s %s%n", t.metric().key(), Format.number(t.tolerance()),
                    Format.number(t.pitchDeg()), at);
        }
    }
}
