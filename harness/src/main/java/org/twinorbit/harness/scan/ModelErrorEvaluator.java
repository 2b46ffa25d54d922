package org.twinorbit.harness.scan;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.IntStream;
import org.twinorbit.fields.Field;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.DurationUnit;
import org.twinorbit.harness.cases.Placement;
import org.twinorbit.harness.cases.ResolvedCase;
import org.twinorbit.harness.metrics.GuidingCenterRecorder;
import org.twinorbit.harness.metrics.GyroAverager;
import org.twinorbit.harness.metrics.OrbitMetrics;
import org.twinorbit.harness.metrics.Track;
import org.twinorbit.integrators.FullOrbitReference;
import org.twinorbit.integrators.GuidingCenterReference;
import org.twinorbit.integrators.GuidingCenterResult;
import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * The model error of the guiding-center approximation at one scan point (DESIGN.md "What is
 * measured"): the guiding-center reference (Dormand–Prince on the first-order equations) against
 * the gyro-averaged full-orbit reference (Dormand–Prince on the Lorentz equations), both at the
 * same tight tolerance, for every particle of a gyrophase ensemble placed at zeroth order around
 * one guiding center. The guiding center is the same for every phase, so its orbit is computed
 * once; the full orbits run in parallel.
 *
 * <p>Per phase: {@code mu_jump} and {@code mu_change} of the full orbit's gyro-averaged μ (the
 * guiding center keeps μ exactly, so these are its model error); {@code drift_error} of the
 * mean perpendicular velocity over whole bounce periods of each model (over the whole run
 * without a bounce), or, in a time-dependent field, the RMS over gyrations of the difference of
 * the perpendicular displacements (their means vanish over whole wave periods);
 * {@code position_error_rho}; {@code bounce_period_error}; {@code class_change} (1 when one model
 * leaves the domain and the other does not). Beside them, the cost: field evaluations of the
 * full-orbit references (all phases) and of the guiding-center reference. A guiding center that fails (B*∥ ≤ 0, or
 * integration failure) makes every error of the point infinite: the model broke down.
 */
public final class ModelErrorEvaluator implements PointEvaluator {

    /** Full-orbit samples per initial gyroperiod for the gyro-averager; it needs ≥ 4 per local gyration. */
    static final int FULL_ORBIT_SAMPLES_PER_GYRO = 32;
    /** Guiding-center samples per initial gyroperiod: linear interpolation between them errs by ~0.02 ε ρ0. */
    static final int GC_SAMPLES_PER_GYRO = 16;
    /** Longest search for three mirror points when the duration is in bounces (gyroperiods). */
    static final double BOUNCE_SEARCH_GYRO = 1e5;
    /** Duration (gyroperiods) of an orbit that should bounce but does not. */
    static final double NO_BOUNCE_GYRO = 50;
    /** A time-scale scan runs at least this many gyroperiods, so that μ is averaged over whole gyrations. */
    static final double MIN_GYRO = 4;

    private final String field;
    private final Map<String, Double> parameters;
    private final Species species;
    private final Vec3 start;
    private final int phases;
    private final ScanDuration duration;
    private final ScanField recipe;
    private final double rtol;

    /**
     * @param field      library name
     * @param parameters field parameter overrides (the scanned parameter of a time-scale scan is set per point)
     * @param start      initial guiding center (m), or null for the field's default
     * @param phases     gyrophase ensemble size, ≥ 1
     * @param rtol       relative tolerance of both references
     */
    public ModelErrorEvaluator(String field, Map<String, Double> parameters, Species species, Vec3 start,
                               int phases, ScanDuration duration, ScanField recipe, double rtol) {
        if (phases < 1 || phases > 1024) {
            throw new IllegalArgumentException("--phases must lie in [1, 1024], got " + phases);
        }
        this.field = field;
        this.parameters = new LinkedHashMap<>(parameters);
        this.species = species;
        this.start = start;
        this.phases = phases;
        this.duration = duration;
        this.recipe = recipe;
        this.rtol = rtol;
    }

    /** The checked case of one point: field, start, energy, scales. */
    ResolvedCase resolve(double eps, double energyEv, double pitchDeg) {
        Case c = new Case("scan", field, recipe.parametersAt(parameters, eps), species, start, energyEv, null,
                pitchDeg, phases, duration.value(), DurationUnit.GYROPERIODS, List.of(), 32, List.of(), 1.0, rtol);
        return new ResolvedCase(c);
    }

    @Override
    public Map<String, Double> measure(double eps, double energyEv, double pitchDeg) {
        ResolvedCase rc = resolve(eps, energyEv, pitchDeg);
        Field f = rc.field();
        double tc = rc.gyroPeriod();
        double u = rc.momentum() / species.mass();
        Placement p0 = Placement.of(f, species, rc.start(), u, pitchDeg, 0.0);
        double deadband = 1e-7 * u;
        double tEnd = endTime(rc, eps, p0);

        GuidingCenterRecorder gcRec = new GuidingCenterRecorder(f, species, p0.mu(), 1 << 30, deadband);
        GuidingCenterResult gc = new GuidingCenterReference(f, species, p0.mu()).relativeTolerance(rtol)
                .run(0, p0.gc(), p0.pPar(), tEnd, tc / GC_SAMPLES_PER_GYRO, gcRec);
        boolean gcFailed = gc.status() == OrbitStatus.MODEL_FAILURE || gc.status() == OrbitStatus.UNSTABLE;

        double[][] perPhase = new double[phases][];
        long[] foEvaluations = new long[phases];
        IntStream.range(0, phases).parallel().forEach(k -> {
            Placement pk = Placement.of(f, species, rc.start(), u, pitchDeg, 2 * Math.PI * k / phases);
            GyroAverager gyro = new GyroAverager(f, species, deadband);
            FullOrbitReference.Result fo = new FullOrbitReference(f, species, rtol)
                    .run(0, pk.x(), pk.u(), tEnd, tc / FULL_ORBIT_SAMPLES_PER_GYRO, gyro);
            perPhase[k] = compare(rc, fo, gyro, gc, gcRec.track(), gcFailed, u);
            foEvaluations[k] = fo.evaluations();
        });

        Map<String, Double> out = new LinkedHashMap<>();
        ScanMetric[] metrics = ScanMetric.values();
        for (int m = 0; m < metrics.length; m++) {
            double[] values = new double[phases];
            for (int k = 0; k < phases; k++) {
                values[k] = perPhase[k][m];
            }
            EnsembleStat s = EnsembleStat.of(values);
            out.put(metrics[m].meanKey(), s.mean());
            out.put(metrics[m].worstKey(), s.worst());
        }
        // the cost, counted rather than timed so that the output stays reproducible
        out.put("full_orbit_evaluations", (double) Arrays.stream(foEvaluations).sum());
        out.put("guiding_center_evaluations", (double) gc.fieldEvaluations());
        return out;
    }

    /** End time (s) of every orbit of the point. */
    private double endTime(ResolvedCase rc, double eps, Placement p0) {
        double tc = rc.gyroPeriod();
        switch (duration.unit()) {
            case GYROPERIODS:
                return duration.value() * tc;
            case FIELD_PERIODS: {
                double periods = recipe.periodInGyroperiods(eps);
                if (Double.isNaN(periods)) {
                    throw new IllegalArgumentException("--duration-unit field-periods needs a time-dependent field "
                            + "(ramp, wave); field '" + field + "' is static: use gyroperiods or bounces");
                }
                return Math.max(duration.value() * periods, MIN_GYRO) * tc;
            }
            default: {
                GuidingCenterResult probe = new GuidingCenterReference(rc.field(), species, p0.mu())
                        .relativeTolerance(rtol).stopAfterMirrorPoints(3)
                        .run(0, p0.gc(), p0.pPar(), BOUNCE_SEARCH_GYRO * tc, 0, null);
                List<GuidingCenterResult.MirrorPoint> mp = probe.mirrorPoints();
                if (mp.size() < 3) {
                    return NO_BOUNCE_GYRO * tc;
                }
                // half a bounce more than asked, so that the full orbit, whose bounce may be a
                // little longer, also completes the requested number of bounces
                return (duration.value() + 0.5) * (mp.get(2).time() - mp.get(0).time());
            }
        }
    }

    /** The metrics of one phase, in {@link ScanMetric} order. */
    private double[] compare(ResolvedCase rc, FullOrbitReference.Result fo, GyroAverager gyro,
                             GuidingCenterResult gc, Track gcTrack, boolean gcFailed, double u) {
        double[] m = new double[ScanMetric.values().length];
        boolean foLost = fo.status() == OrbitStatus.LOST;
        boolean gcLost = gc.status() == OrbitStatus.LOST;
        m[ScanMetric.CLASS_CHANGE.ordinal()] = foLost != gcLost ? 1.0 : 0.0;
        if (gcFailed) {
            for (ScanMetric s : ScanMetric.values()) {
                if (s != ScanMetric.CLASS_CHANGE) {
                    m[s.ordinal()] = Double.POSITIVE_INFINITY;
                }
            }
            return m;
        }
        if (fo.status() == OrbitStatus.UNSTABLE) {
            Arrays.fill(m, Double.NaN);
            return m;
        }
        Track centers = gyro.centers();
        m[ScanMetric.MU_JUMP.ordinal()] = OrbitMetrics.muJump(gyro);
        m[ScanMetric.MU_CHANGE.ordinal()] = OrbitMetrics.muChange(gyro);
        m[ScanMetric.DRIFT_ERROR.ordinal()] = rc.field().isStatic()
                ? meanDriftError(rc, centers, gcTrack, u) : displacementError(rc.field(), centers, gcTrack);
        m[ScanMetric.POSITION_ERROR.ordinal()] = centers.size() == 0 ? Double.NaN
                : OrbitMetrics.positionError(gcTrack, centers, rc.rho0());
        double tbFo = OrbitMetrics.bouncePeriod(centers);
        double tbGc = OrbitMetrics.bouncePeriod(gcTrack);
        m[ScanMetric.BOUNCE_ERROR.ordinal()] = Math.abs(OrbitMetrics.relative(tbGc, tbFo));
        return m;
    }

    /**
     * Relative error of the guiding center's mean perpendicular velocity, each model averaged
     * over its own whole bounce periods (over the full orbit's span of gyrations without a
     * bounce). NaN when the drift is below 1e-5 ε v (a current sheet's bounce-averaged drift is
     * ~1e-3 ε v), where a relative error would measure only the noise of the mean.
     */
    private static double meanDriftError(ResolvedCase rc, Track centers, Track gcTrack, double u) {
        if (centers.size() < 2) {
            return Double.NaN;
        }
        double[] wFo = OrbitMetrics.window(centers);
        double[] wGc = gcTrack.upwardMirrorTimes().length >= 2 && centers.upwardMirrorTimes().length >= 2
                ? OrbitMetrics.window(gcTrack) : wFo;
        double[] vFo = OrbitMetrics.meanPerpendicularVelocity(rc.field(), centers, wFo[0], wFo[1]);
        double[] vGc = OrbitMetrics.meanPerpendicularVelocity(rc.field(), gcTrack, wGc[0], wGc[1]);
        double v = u / rc.gamma();
        return OrbitMetrics.driftError(vGc, vFo, 1e-5 * rc.eps() * v);
    }

    /**
     * RMS over successive gyrations of |ΔX⊥,gc − ΔX⊥,fo| over RMS |ΔX⊥,fo|, ΔX the displacement
     * between the mid-times of successive gyrations of the full orbit and ⊥ taken to b at the
     * midpoint: the drift error of a time-dependent field, where drifts oscillate.
     */
    static double displacementError(Field f, Track centers, Track gcTrack) {
        if (centers.size() < 3) {
            return Double.NaN;
        }
        FieldSample fs = new FieldSample();
        double[] b = new double[3];
        double[] g0 = new double[3];
        double[] g1 = new double[3];
        gcTrack.positionAt(centers.time(0), g0);
        double num = 0;
        double den = 0;
        for (int i = 1; i < centers.size(); i++) {
            gcTrack.positionAt(centers.time(i), g1);
            double[] dFo = new double[3];
            double[] dGc = new double[3];
            double[] mid = new double[3];
            for (int k = 0; k < 3; k++) {
                dFo[k] = centers.coord(i, k) - centers.coord(i - 1, k);
                dGc[k] = g1[k] - g0[k];
                mid[k] = 0.5 * (centers.coord(i, k) + centers.coord(i - 1, k));
            }
            f.evaluate(0.5 * (centers.time(i) + centers.time(i - 1)), mid[0], mid[1], mid[2], fs);
            fs.unitB(b);
            double pf = dFo[0] * b[0] + dFo[1] * b[1] + dFo[2] * b[2];
            double pg = dGc[0] * b[0] + dGc[1] * b[1] + dGc[2] * b[2];
            for (int k = 0; k < 3; k++) {
                double fo = dFo[k] - pf * b[k];
                double e = dGc[k] - pg * b[k] - fo;
                num += e * e;
                den += fo * fo;
            }
            System.arraycopy(g1, 0, g0, 0, 3);
        }
        return den > 0 ? Math.sqrt(num / den) : Double.NaN;
    }
}
