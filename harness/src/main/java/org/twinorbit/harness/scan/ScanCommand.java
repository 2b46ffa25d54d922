package org.twinorbit.harness.scan;

import org.twinorbit.integrators.fullorbit.Pushers;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.report.Timings;
import org.twinorbit.harness.cases.GuidingCenterStart;
import org.twinorbit.harness.run.PhaseStatistic;
import org.twinorbit.shared.Species;
import org.twinorbit.harness.ExecutionOptions;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code twinorbit scan}: the breakdown scan of docs/design.md — the guiding-center model error
 * against ε over a log-spaced range, ε* per metric and tolerance, and the energy it reads as.
 * Wall-clock times go to the terminal and to {@link Timings#FILE_NAME} in {@code --out}, never
 * into scan.* or safe-use.*.
 */
@Command(name = "scan", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Breakdown scan: the model error of the guiding-center approximation (guiding-center "
                + "reference against the gyro-averaged full-orbit reference, worst case over a gyrophase ensemble) "
                + "against eps = rho0/L, varied through the energy at a fixed field (ramp and wave scan "
                + "1/(Omega tau) and omega/Omega at a fixed energy). For each metric and tolerance, eps* is the "
                + "first eps whose error exceeds it, refined by log-log interpolation. Writes scan.md, scan.csv, "
                + "scan.json and scan.png into --out; saves every finished point so that --resume can go on "
                + "after an interruption.")
public final class ScanCommand implements Runnable {

    @Option(names = "--field", paramLabel = "NAME",
            description = "Field of the library (see 'twinorbit fields'); required unless --safe-use.")
    String field;

    @Option(names = "--safe-use",
            description = "Scan every field of the library for protons and electrons at the default tolerances "
                    + "and write the safe-use map (safe-use.md, .csv, .json, .png) into --out; --points and "
                    + "--phases set the resolution.")
    boolean safeUse;

    @Option(names = {"-P", "--field-param"}, paramLabel = "NAME=VALUE",
            description = "Field parameter override, repeatable, each name once (e.g. -P Rm=8).")
    List<String> params = new java.util.ArrayList<>();

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

    @Option(names = "--energy", paramLabel = "E", converter = org.twinorbit.harness.EnergyConverter.class,
            description = "Fixed kinetic energy of a ramp or wave scan: eV, or with a unit (default: per field).")
    Double energy;

    @Option(names = "--allow-long", description = "Run a scan of more than 1000 points per pitch (refused otherwise).")
    boolean allowLong;

    @Option(names = "--energy-min", paramLabel = "E", converter = org.twinorbit.harness.EnergyConverter.class,
            description = "Smallest kinetic energy (eV, or 20keV, 1.5MeV): the range in energy instead of --eps-min.")
    Double energyMin;

    @Option(names = "--energy-max", paramLabel = "E", converter = org.twinorbit.harness.EnergyConverter.class,
            description = "Largest kinetic energy (eV, or with a unit) instead of --eps-max.")
    Double energyMax;

    @Option(names = "--charge-signs", paramLabel = "SIGNS", description = "given (the species as given) or both: "
            + "also its twin of the same mass and charge -q, at the same pitches and energies, with answers per sign "
            + "and pitch; the two differ where the grad-B and curvature drifts' reversal moves the orbit to the other "
            + "side of its flux surface (tokamaks) (default: ${DEFAULT-VALUE}).")
    String chargeSigns = "given";

    @Option(names = "--start", split = ",", paramLabel = "X,Y,Z", hideParamSyntax = true,
            description = "Initial guiding center in m (default: the field's; r = 0.2 Lm in the mirror's midplane; r = 3 rho0 in the ramp).")
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
            description = "Tolerance(s) of a metric at which eps* is found, repeatable; metrics: mu_jump (1%%), "
                    + "drift_error (5%%), position_error_rho (1 rho0), bounce_period_error (1%%), class_change (0), "
                    + "mu_change, mirror_field_error (none by default). Metrics not named keep their default.")
    List<String> tolerances = new java.util.ArrayList<>();

    @Option(names = "--statistic", paramLabel = "STAT", description = "Summary over the gyrophase ensemble that a "
            + "tolerance is compared with: worst (largest magnitude over the phases), mean (phase mean of the signed "
            + "error) or rms (over the phases) (default: ${DEFAULT-VALUE}).")
    String statistic = "worst";

    @Option(names = "--gc-start", paramLabel = "START", description = "Start of the model's guiding centers: "
            + "matched (one per gyrophase, at its reference orbit's first gyration, on its exact invariants) or shared (one "
            + "zeroth-order guiding center for the whole ring) (default: ${DEFAULT-VALUE}).")
    String gcStart = "matched";

    @Option(names = "--reference-rtol", paramLabel = "RTOL",
            description = "Relative tolerance of both references (default: ${DEFAULT-VALUE}).")
    double referenceRtol = CaseSpec.DEFAULT_RTOL;

    @Option(names = "--pushers", split = ",", paramLabel = "NAMES",
            description = "Full-orbit pushers (see 'twinorbit integrators') to run at their default step beside the "
                    + "references, so that each point shows their discretisation error next to the model error "
                    + "(default: none).")
    List<String> pushers = new ArrayList<>();

    @Option(names = "--gc-integrators", split = ",", paramLabel = "NAMES",
            description = "Guiding-center integrators to run the same way (default: none).")
    List<String> gcIntegrators = new ArrayList<>();

    @Option(names = "--integrators", split = ",", paramLabel = "NAMES",
            description = "The 0.1 spelling: pushers and guiding-center integrators in one list (as --pushers and "
                    + "--gc-integrators).")
    List<String> integrators = new ArrayList<>();

    @Option(names = "--out", defaultValue = "scan-results", paramLabel = "DIR",
            description = "Output directory (default: ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--resume", description = "Take up the points saved by an interrupted scan with the same options in --out.")
    boolean resume;

    @Option(names = "--shard", paramLabel = "I/K",
            description = "Compute only part I (counted from 0) of K parts of nearly equal estimated cost, as one task "
                    + "of a job array, into --out/shard-I-of-K; 'twinorbit merge --out DIR' joins the K parts into the "
                    + "files a single run writes. With --resume a shard takes up its own saved points.")
    String shard;

    @Mixin
    ExecutionOptions execution;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        if (safeUse) {
            runSafeUse();
            return;
        }
        ScanRequest.Built setup = setup();
        Shard part = shard == null ? null : Shard.parse(shard);
        prepareOut();
        if (part != null) {
            runShard(part, () -> ShardRuns.scan(setup, recordedOptions(), part, out, resume, threads(), ScanProgress.NONE),
                    bar -> ShardRuns.scan(setup, recordedOptions(), part, out, resume, threads(), bar), "scan " + field);
            return;
        }
        if (resume && setup.scan().finishedIn(out)) {
            PrintWriter w = spec.commandLine().getOut();
            w.printf("--resume: %s holds this scan finished (%s) and no partial results: nothing to resume; "
                    + "drop --resume to compute it again%n", out, BreakdownScan.FINISHED_FILES);
            w.flush();
            return;
        }
        long t0 = System.nanoTime();
        ScanResult r;
        if (execution.quiet()) {
            r = setup.scan().run(setup.evaluator(), out, resume, execution.threads(), ScanProgress.NONE);
        } else {
            try (ScanProgressBar bar = new ScanProgressBar("scan " + field)) {
                r = setup.scan().run(setup.evaluator(), out, resume, execution.threads(), bar);
            }
        }
        PrintWriter w = spec.commandLine().getOut();
        printSummary(w, r);
        Timings timings = new Timings("twinorbit scan --field " + field);
        if (setup.evaluator() instanceof ModelErrorEvaluator m) {
            double[] s = m.referenceSeconds();
            timings.total(String.format(java.util.Locale.ROOT, "time in the references (summed over threads): "
                    + "full orbit %.1f s, guiding center %.1f s", s[0], s[1]));
        }
        String total = String.format(java.util.Locale.ROOT, "%d points in %.1f s", r.points().size(),
                (System.nanoTime() - t0) * 1e-9);
        timings.total(total).write(out);
        w.printf("wrote %s/scan.md, scan.csv, scan.json, scan.png; %s (%s)%n", out, total, Timings.FILE_NAME);
        w.flush();
    }

    private void runSafeUse() {
        if (field != null) {
            throw new IllegalArgumentException("--safe-use scans every field of the library; drop --field " + field);
        }
        int threads = execution.threads();
        if (points < 2 || phases < 1 || phases > 1024) {
            throw new IllegalArgumentException("--safe-use needs --points >= 2 and --phases in [1, 1024], got "
                    + points + " and " + phases);
        }
        Shard part = shard == null ? null : Shard.parse(shard);
        prepareOut();
        if (part != null) {
            SafeUseMap.Plan plan = SafeUseMap.plan(new SafeUseMap.Resolution(points, phases), threads);
            runShard(part, () -> ShardRuns.safeUse(plan, recordedOptions(), part, out, resume, threads, ScanProgress.NONE),
                    bar -> ShardRuns.safeUse(plan, recordedOptions(), part, out, resume, threads, bar), "safe-use map");
            return;
        }
        if (resume && SafeUseMap.finishedIn(out)) {
            PrintWriter w = spec.commandLine().getOut();
            w.printf("--resume: %s holds a finished safe-use map (%s) and no partial scans: nothing to resume; "
                    + "drop --resume to compute it again%n", out, SafeUseMap.FINISHED_FILES);
            w.flush();
            return;
        }
        long t0 = System.nanoTime();
        SafeUseMap.Resolution res = new SafeUseMap.Resolution(points, phases);
        SafeUseMap.Result r;
        if (execution.quiet()) {
            r = SafeUseMap.run(out, res, resume, threads, ScanProgress.NONE);
        } else {
            try (ScanProgressBar bar = new ScanProgressBar("safe-use map")) {
                r = SafeUseMap.run(out, res, resume, threads, bar);
            }
        }
        PrintWriter w = spec.commandLine().getOut();
        String total = String.format(java.util.Locale.ROOT, "safe-use map: %d rows in %.1f s", r.rows().size(),
                (System.nanoTime() - t0) * 1e-9);
        new Timings("twinorbit scan --safe-use").total(total).write(out);
        w.printf("wrote %s/safe-use.md, safe-use.csv, safe-use.json, safe-use.png; %s (%s)%n", out, total,
                Timings.FILE_NAME);
        w.flush();
    }

    /**
     * Runs one shard, quietly or with a progress bar; a finished shard under --resume is left as it is.
     *
     * @return nothing; prints where the shard's results are
     */
    private void runShard(Shard part, java.util.function.Supplier<Path> quiet,
                          java.util.function.Function<ScanProgress, Path> shown, String label) {
        PrintWriter w = spec.commandLine().getOut();
        if (resume && ShardRuns.finished(out, part)) {
            w.printf("--resume: shard %d/%d in %s is finished (%s): nothing to resume%n", part.index(), part.count(),
                    out.resolve(part.folder()), ShardFile.FILE_NAME);
            w.flush();
            return;
        }
        long t0 = System.nanoTime();
        Path folder;
        if (execution.quiet()) {
            folder = quiet.get();
        } else {
            try (ScanProgressBar bar = new ScanProgressBar(label + ", shard " + part.index() + "/" + part.count())) {
                folder = shown.apply(bar);
            }
        }
        String total = String.format(java.util.Locale.ROOT, "shard %d/%d in %.1f s", part.index(), part.count(),
                (System.nanoTime() - t0) * 1e-9);
        new Timings("twinorbit scan --shard " + part.index() + "/" + part.count()).total(total).write(folder);
        w.printf("wrote %s/%s; %s (%s); when every shard is done: twinorbit merge --out %s%n", folder,
                ShardFile.FILE_NAME, total, Timings.FILE_NAME, out);
        w.flush();
    }

    /** The options as given that can change a result ({@link RecordedOptions}). */
    List<String> recordedOptions() {
        return RecordedOptions.of(spec);
    }

    /** Makes --out, after every other option has been checked and before any orbit runs. */
    private void prepareOut() {
        if (out.toString().isBlank()) {
            throw new IllegalArgumentException("--out: give a directory (an empty --out= would write into the current one)");
        }
        try {
            java.nio.file.Files.createDirectories(out);
        } catch (java.io.IOException e) {
            throw new IllegalArgumentException("--out: cannot create directory " + out + " (" + e.getMessage() + ")", e);
        }
        if (!java.nio.file.Files.isWritable(out)) {
            throw new IllegalArgumentException("--out: directory " + out + " is not writable");
        }
    }

    /** The particle of {@code --species}. @throws IllegalArgumentException listing the allowed names */
    public Species species() {
        try {
            return Species.parse(species);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--species: " + e.getMessage(), e);
        }
    }

    /** The worker threads of {@code --threads}. */
    public int threads() {
        return execution.threads();
    }

    /** Checks every option and builds the scan; no orbit is computed here. */
    public ScanRequest.Built setup() {
        ScanRequest q = new ScanRequest();
        q.field = field;
        q.parameters = org.twinorbit.harness.OptionPairs.numbers(params, "--field-param");
        q.species = species();
        q.pitches = pitches;
        q.chargeSigns = ChargeSigns.parse(chargeSigns);
        q.epsMin = epsMin;
        q.epsMax = epsMax;
        q.allowLong = allowLong;
        q.energyMin = energyMin;
        q.energyMax = energyMax;
        q.points = points;
        q.energyEv = energy;
        q.start = start;
        q.phases = phases;
        q.duration = duration;
        q.durationUnit = durationUnit == null ? null : ScanDuration.Unit.parse(durationUnit);
        q.tolerances = tolerances();
        q.statistic = statistic();
        q.referenceRtol = referenceRtol;
        q.gcStart = GuidingCenterStart.parse(gcStart, "--gc-start");
        List<String> all = new ArrayList<>(pushers);
        all.addAll(gcIntegrators);
        all.addAll(integrators);
        q.integrators = all;
        q.threads = execution.threads();
        return q.build();
    }

    private PhaseStatistic statistic() {
        try {
            return PhaseStatistic.ofKey(statistic);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--statistic: " + e.getMessage());
        }
    }

    /** The --tolerance options parsed; the request checks their values. */
    private Map<ScanMetric, List<Double>> tolerances() {
        Map<ScanMetric, List<Double>> tol = new LinkedHashMap<>();
        for (Map.Entry<String, String> e : org.twinorbit.harness.OptionPairs.of(tolerances, "--tolerance").entrySet()) {
            ScanMetric m;
            try {
                m = ScanMetric.ofKey(e.getKey());
            } catch (IllegalArgumentException ex) {
                throw new IllegalArgumentException("--tolerance: " + ex.getMessage());
            }
            List<Double> values = new ArrayList<>();
            for (String v : e.getValue().split(",")) {
                try {
                    values.add(Double.parseDouble(v.trim()));
                } catch (NumberFormatException ex) {
                    throw new IllegalArgumentException("--tolerance " + m.key() + ": '" + v + "' is not a number");
                }
            }
            tol.put(m, values);
        }
        return tol;
    }

    public static void printSummary(PrintWriter w, ScanResult r) {
        for (Threshold t : r.thresholds()) {
            String at = t.outcome().hasEpsStar()
                    ? (t.outcome() == ThresholdOutcome.CROSSED ? "" : t.outcome().label() + ", ") + "eps* = " + Format.number(t.epsStar())
                    + (Double.isNaN(t.energyEvStar()) ? "" : ", " + Format.energy(t.energyEvStar()))
                    : t.outcome().label();
            w.printf("%-20s tol %-8s pitch %-5s %s%s%n", t.metric().key(), Format.number(t.tolerance()),
                    Format.number(t.pitchDeg()), t.chargeSign() == ChargeSigns.GIVEN ? "" : t.chargeSign() > 0 ? "+q  " : "-q  ",
                    at);
        }
        for (String line : ScanAnswer.lines(r)) {
            w.println(line);
        }
    }
}
