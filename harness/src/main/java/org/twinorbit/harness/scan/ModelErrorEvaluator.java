package org.twinorbit.harness.scan;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.fields.Field;
import org.twinorbit.harness.BadInputException;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.cases.DurationUnit;
import org.twinorbit.harness.cases.GuidingCenterStart;
import org.twinorbit.harness.metrics.Track;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.run.PhaseStatistic;
import org.twinorbit.harness.run.ReferenceSummary;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.run.RunSchedule;
import org.twinorbit.harness.run.Stat;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * The model error of the guiding-center approximation at one scan point (docs/design.md "What is
 * measured"): one case of the harness's {@link CaseRunner} — the guiding-center reference
 * against the gyro-averaged full-orbit reference, both at the same tight tolerance, over a
 * gyrophase ensemble, each phase compared with its own guiding center unless the shared
 * zeroth-order start is asked for ({@link GuidingCenterStart}), with the references'
 * self-estimated errors — read off its {@code model} row. The metrics are those of {@code run},
 * so a scan point and a {@code run} at the same energy give the same numbers. Each metric is kept
 * as its phase mean (signed), rms and worst-case magnitude; thresholds read the one the scan's
 * {@link PhaseStatistic} names; {@code class_change} is 1 for a phase whose orbit class (trapped,
 * passing, lost) differs between the models. In a time-dependent field the drifts oscillate and
 * their means over whole wave periods vanish, so there {@code drift_error} is the RMS over
 * gyrations of the difference of the perpendicular displacements over the RMS of the full
 * orbit's, measured on phase 0 (the wave and the ramp are the same for every phase up to a
 * rotation). A guiding center that fails (B*∥ ≤ 0, or an integration failure) makes every error of
 * the point infinite: the model broke down.
 *
 * <p>With {@code --integrators}, the chosen pushers and guiding-center integrators run at their
 * step beside the references, and each point also carries their discretisation errors.
 */
public final class ModelErrorEvaluator implements PointEvaluator {

    /** Duration (gyroperiods) of an orbit that should bounce but does not. */
    static final double NO_BOUNCE_GYRO = 50;
    /** A time-scale scan runs at least this many gyroperiods, so that μ is averaged over whole gyrations. */
    static final double MIN_GYRO = 4;
    /** The discretisation errors carried per point for every integrator scanned. */
    static final List<String> INTEGRATOR_METRICS = List.of("mu_change", "energy_error", "position_error_rho");

    private final String field;
    private final Map<String, Double> parameters;
    private final Species species;
    private final Vec3 start;
    private final int phases;
    private final ScanDuration duration;
    private final ScanField recipe;
    private final double rtol;
    private final List<String> pushers;
    private final List<String> gcIntegrators;
    private final int threads;
    private final GuidingCenterStart gcStart;
    /** The same scan of the twin of charge -q ({@code --charge-signs both}); null in the twin itself. */
    private final ModelErrorEvaluator opposite;
    /** Wall time (ns) spent in the full-orbit and guiding-center references, summed over threads. */
    private final java.util.concurrent.atomic.LongAdder fullOrbitNanos = new java.util.concurrent.atomic.LongAdder();
    private final java.util.concurrent.atomic.LongAdder guidingCenterNanos = new java.util.concurrent.atomic.LongAdder();

    /**
     * @param parameters    field parameter overrides (a time-scale scan sets its parameter per point)
     * @param start         initial guiding center (m)
     * @param phases        gyrophase ensemble size
     * @param rtol          relative tolerance of both references
     * @param pushers       full-orbit pushers to run beside the references (may be empty)
     * @param gcIntegrators guiding-center integrators to run beside the references (may be empty)
     * @param threads       worker threads of each point's runs
     * @param gcStart       where the model's guiding centers start
     */
    public ModelErrorEvaluator(String field, Map<String, Double> parameters, Species species, Vec3 start,
                               int phases, ScanDuration duration, ScanField recipe, double rtol,
                               List<String> pushers, List<String> gcIntegrators, int threads,
                               GuidingCenterStart gcStart) {
        this(field, parameters, species, start, phases, duration, recipe, rtol, pushers, gcIntegrators, threads, gcStart,
                true);
    }

    private ModelErrorEvaluator(String field, Map<String, Double> parameters, Species species, Vec3 start,
                                int phases, ScanDuration duration, ScanField recipe, double rtol,
                                List<String> pushers, List<String> gcIntegrators, int threads,
                                GuidingCenterStart gcStart, boolean withTwin) {
        this.opposite = withTwin ? new ModelErrorEvaluator(field, parameters, ChargeSigns.species(species, -1), start,
                phases, duration, recipe, rtol, pushers, gcIntegrators, threads, gcStart, false) : null;
        this.gcStart = gcStart;
        this.field = field;
        this.parameters = new LinkedHashMap<>(parameters);
        this.species = species;
        this.start = start;
        this.phases = phases;
        this.duration = duration;
        this.recipe = recipe;
        this.rtol = rtol;
        this.pushers = List.copyOf(pushers);
        this.gcIntegrators = List.copyOf(gcIntegrators);
        this.threads = threads;
    }

    /** The case of one point, with its duration in the harness's units. */
    Case caseAt(double eps, double energyEv, double pitchDeg, double value, DurationUnit unit) {
        return new Case("scan", field, recipe.parametersAt(parameters, eps), species, start, energyEv, null,
                pitchDeg, phases, value, unit, pushers, CaseSpec.DEFAULT_STEPS_PER_GYRO, gcIntegrators,
                CaseSpec.DEFAULT_GC_STEP, rtol, gcStart);
    }

    /**
     * {@inheritDoc}
     *
     * <p>A point whose particles cannot be placed (a ring reaching outside the domain, an E×B
     * drift faster than light) has every error infinite, class change unknown, and
     * {@code point_failed} = 1: the comparison itself breaks down there.
     */
    @Override
    public Map<String, Double> measure(double eps, double energyEv, double pitchDeg, int chargeSign) {
        return chargeSign < 0 && opposite != null ? opposite.measure(eps, energyEv, pitchDeg)
                : measure(eps, energyEv, pitchDeg);
    }

    @Override
    public Map<String, Double> measure(double eps, double energyEv, double pitchDeg) {
        try {
            Run run = run(eps, energyEv, pitchDeg);
            Map<String, Double> out = values(run.result());
            out.put("no_bounce", run.noBounce() ? 1.0 : 0.0);
            return out;
        } catch (IllegalArgumentException cannotPlace) {
            Map<String, Double> out = new LinkedHashMap<>();
            for (ScanMetric m : ScanMetric.values()) {
                double v = m == ScanMetric.CLASS_CHANGE ? Double.NaN : Double.POSITIVE_INFINITY;
                out.put(m.meanKey(), v);
                out.put(m.rmsKey(), v);
                out.put(m.worstKey(), v);
            }
            out.put("point_failed", 1.0);
            out.put("lost", 0.0);
            out.put("no_bounce", 0.0);
            return out;
        }
    }

    /**
     * Runs one point. A bounce-counted point whose guiding center does not bounce (it passes or
     * is lost) runs instead until it has crossed the field's current sheet once and come back to
     * its starting distance, where the field has a sheet and the start lies off it, else for
     * {@link #NO_BOUNCE_GYRO} gyroperiods; either way the point records {@code no_bounce} = 1.
     */
    private Run run(double eps, double energyEv, double pitchDeg) {
        CaseRunner runner = new CaseRunner(threads, true);
        return switch (duration.unit()) {
            case GYROPERIODS -> new Run(runner.run(caseAt(eps, energyEv, pitchDeg, duration.value(),
                    DurationUnit.GYROPERIODS)), false);
            case FIELD_PERIODS -> new Run(runner.run(caseAt(eps, energyEv, pitchDeg,
                    Math.max(duration.value() * recipe.periodInGyroperiods(eps), MIN_GYRO), DurationUnit.GYROPERIODS)),
                    false);
            case CROSSINGS -> new Run(runner.run(caseAt(eps, energyEv, pitchDeg, duration.value(),
                    DurationUnit.CROSSINGS)), false);
            case BOUNCES -> {
                try {
                    yield new Run(runner.run(caseAt(eps, energyEv, pitchDeg, duration.value(), DurationUnit.BOUNCES)),
                            false);
                } catch (BadInputException noBounce) {
                    yield new Run(runner.run(offSheet(eps)
                            ? caseAt(eps, energyEv, pitchDeg, 1, DurationUnit.CROSSINGS)
                            : caseAt(eps, energyEv, pitchDeg, NO_BOUNCE_GYRO, DurationUnit.GYROPERIODS)), true);
                }
            }
        };
    }

    /**
     * What one point integrates, without integrating it (the guiding-center reference still runs
     * to measure a bounce period): the same case {@link #measure} runs, for the C comparison in
     * {@code bench/c}.
     */
    public RunSchedule schedule(double eps, double energyEv, double pitchDeg) {
        return switch (duration.unit()) {
            case GYROPERIODS -> CaseRunner.schedule(caseAt(eps, energyEv, pitchDeg, duration.value(),
                    DurationUnit.GYROPERIODS));
            case FIELD_PERIODS -> CaseRunner.schedule(caseAt(eps, energyEv, pitchDeg,
                    Math.max(duration.value() * recipe.periodInGyroperiods(eps), MIN_GYRO), DurationUnit.GYROPERIODS));
            case CROSSINGS -> CaseRunner.schedule(caseAt(eps, energyEv, pitchDeg, duration.value(),
                    DurationUnit.CROSSINGS));
            case BOUNCES -> {
                try {
                    yield CaseRunner.schedule(caseAt(eps, energyEv, pitchDeg, duration.value(), DurationUnit.BOUNCES));
                } catch (BadInputException noBounce) {
                    yield CaseRunner.schedule(offSheet(eps)
                            ? caseAt(eps, energyEv, pitchDeg, 1, DurationUnit.CROSSINGS)
                            : caseAt(eps, energyEv, pitchDeg, NO_BOUNCE_GYRO, DurationUnit.GYROPERIODS));
                }
            }
        };
    }

    /** True where the field has a current sheet and the scan's start lies off it. */
    private boolean offSheet(double eps) {
        double[] n = org.twinorbit.fields.Fields.create(field, recipe.parametersAt(parameters, eps), species)
                .sheetNormal();
        return n != null && n[0] * start.x() + n[1] * start.y() + n[2] * start.z() != 0;
    }

    /** One point's result, and whether its bounce count fell back to another span. */
    private record Run(CaseResult result, boolean noBounce) {}

    private Map<String, Double> values(CaseResult r) {
        ResultRow model = r.rows().stream().filter(x -> x.errorKind().equals("model")).findFirst().orElseThrow();
        boolean failed = model.status().equals("model-failure") || model.status().startsWith("unstable");
        Map<String, Double> out = new LinkedHashMap<>();
        out.put("point_failed", 0.0);
        // both models lost the particle in every phase: escaped through a loss cone, not a
        // breakdown; a point where only some phases escape keeps its errors
        boolean allLost = model.status().equals("lost") && model.orbitClass().equals("lost")
                && model.classAgreement() == 1.0;
        out.put("lost", allLost ? 1.0 : 0.0);
        for (ScanMetric m : ScanMetric.values()) {
            Stat s = switch (m) {
                // per phase 1 where the class differs, else 0
                case CLASS_CHANGE -> new Stat(1 - model.classAgreement(), Math.sqrt(1 - model.classAgreement()),
                        model.classAgreement() < 1 ? 1 : 0);
                case DRIFT_ERROR -> r.resolved().field().isStatic() ? model.metric(m.key())
                        : Stat.single(displacementError(r.resolved().field(), r.fullOrbitCenters(), r.gcTrack()));
                default -> model.metric(m.key());
            };
            boolean infinite = failed && m != ScanMetric.CLASS_CHANGE;
            out.put(m.meanKey(), infinite ? Double.POSITIVE_INFINITY : s.mean());
            out.put(m.rmsKey(), infinite ? Double.POSITIVE_INFINITY : s.rms());
            out.put(m.worstKey(), infinite ? Double.POSITIVE_INFINITY : Math.abs(s.worst()));
        }
        for (ReferenceSummary ref : r.references()) {
            boolean fullOrbit = ref.model().equals("full-orbit");
            (fullOrbit ? fullOrbitNanos : guidingCenterNanos).add((long) (ref.wallSeconds() * 1e9));
            String prefix = fullOrbit ? "full_orbit" : "guiding_center";
            out.put(prefix + "_reference_error_rho", ref.selfErrorRho());
            out.put(prefix + "_evaluations", ref.fieldEvaluations());
        }
        for (ResultRow row : r.rows()) {
            if (row.errorKind().equals("discretisation")) {
                for (String k : INTEGRATOR_METRICS) {
                    out.put(integratorKey(row.integrator(), k), Math.abs(row.metric(k).worst()));
                }
            }
        }
        return out;
    }

    /**
     * Wall time (s) spent so far in the full-orbit references and in the guiding-center
     * references, each summed over threads: where a scan's time goes. Never written to the
     * result files, which must not depend on the machine.
     */
    public double[] referenceSeconds() {
        double[] twin = opposite == null ? new double[2] : opposite.referenceSeconds();
        return new double[] {fullOrbitNanos.sum() * 1e-9 + twin[0], guidingCenterNanos.sum() * 1e-9 + twin[1]};
    }

    /**
     * The snake_case key of an integrator's worst discretisation error, e.g.
     * {@code gc_rk4_position_error_rho_worst} for {@code gc-rk4}.
     */
    static String integratorKey(String integrator, String metric) {
        return integrator.replace('-', '_') + "_" + metric + "_worst";
    }


    /**
     * RMS over successive gyrations of |ΔX⊥,gc − ΔX⊥,fo| over RMS |ΔX⊥,fo|, ΔX the displacement
     * between the mid-times of successive gyrations of the full orbit, ⊥ taken to b at the
     * midpoint: the drift error of a time-dependent field, where drifts oscillate.
     */
    static double displacementError(Field f, Track centers, Track gcTrack) {
        if (centers.size() < 3 || gcTrack.size() < 2) {
            return Double.NaN;
        }
        FieldSample fs = new FieldSample();
        double[] b = new double[3];
        double[] g0 = gcTrack.positionAt(centers.time(0), new double[3]);
        double[] g1 = new double[3];
        double num = 0;
        double den = 0;
        for (int i = 1; i < centers.size(); i++) {
            gcTrack.positionAt(centers.time(i), g1);
            double[] mid = new double[3];
            for (int k = 0; k < 3; k++) {
                mid[k] = 0.5 * (centers.coord(i, k) + centers.coord(i - 1, k));
            }
            f.evaluate(0.5 * (centers.time(i) + centers.time(i - 1)), mid[0], mid[1], mid[2], fs);
            fs.unitB(b);
            double pf = 0;
            double pg = 0;
            for (int k = 0; k < 3; k++) {
                pf += (centers.coord(i, k) - centers.coord(i - 1, k)) * b[k];
                pg += (g1[k] - g0[k]) * b[k];
            }
            for (int k = 0; k < 3; k++) {
                double fo = centers.coord(i, k) - centers.coord(i - 1, k) - pf * b[k];
                double e = g1[k] - g0[k] - pg * b[k] - fo;
                num += e * e;
                den += fo * fo;
            }
            System.arraycopy(g1, 0, g0, 0, 3);
        }
        return den > 0 ? Math.sqrt(num / den) : Double.NaN;
    }
}
