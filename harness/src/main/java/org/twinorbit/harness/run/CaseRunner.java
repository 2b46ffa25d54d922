package org.twinorbit.harness.run;

import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.guidingcenter.GuidingCenterIntegrator;
import org.twinorbit.integrators.guidingcenter.GuidingCenterState;
import org.twinorbit.integrators.maps.GyroParticle;
import org.twinorbit.integrators.maps.GyroPlacement;
import org.twinorbit.integrators.reference.GuidingCenterResult;
import java.util.ArrayList;
import java.util.List;
import org.twinorbit.harness.BadInputException;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.DurationUnit;
import org.twinorbit.harness.cases.GuidingCenterStart;
import org.twinorbit.harness.metrics.GyroAverager;
import org.twinorbit.harness.metrics.Track;
import org.twinorbit.harness.cases.ResolvedCase;
import org.twinorbit.shared.Relativity;

/**
 * Runs cases: every chosen integrator and both references on the gyrophase ensemble, plus the
 * runs at dt/2 and dt/4 that measure the convergence order and the references at a 100× tighter
 * tolerance that estimate their own error. All orbits of all cases are independent jobs for one
 * {@link Parallel} pool; each writes its own slot, and the results are assembled afterwards in a
 * fixed order, so the numbers do not depend on the thread count.
 *
 * <p>Every case is resolved and checked before any orbit runs, so bad input costs nothing.
 */
public final class CaseRunner {

    /** Samples per initial gyroperiod taken from the references' dense output. */
    static final int REFERENCE_SAMPLES_PER_GYRO = 32;
    /** Points kept per plotted curve. */
    static final int PLOT_POINTS = 600;
    /** Factor by which the self-estimate runs tighten the reference tolerance (docs/design.md). */
    static final double TIGHTER = 100;
    /** Gyroperiods a crossing run goes on after the exit, so that a whole gyration lies beyond it. */
    static final double SHEET_EXIT_MARGIN_GYRO = 2;
    /** Longest guiding-center run that looks for a bounce period or a sheet exit (initial gyroperiods). */
    static final double BOUNCE_SEARCH_GYRO = 20000;
    /**
     * |v∥| below this fraction of the speed counts as zero when looking for mirror points: far
     * above round-off of a reference, far below the v∥ of any orbit that really mirrors in a run.
     */
    static final double DEADBAND = 1e-6;
    /**
     * Span of the full-orbit convergence runs (initial gyroperiods). Short, because the
     * end-position error of a pusher is dominated by its phase error, which grows linearly in
     * time until it saturates at ~2ρ0; within a few gyrations it stays in the asymptotic regime
     * where halving dt divides it by 2^order.
     */
    static final double CONVERGENCE_GYRO = 4;
    /**
     * Steps of every convergence sweep: dt, dt/2, dt/4, dt/8. Four points give three local
     * orders, whose agreement shows that the sweep lies in the asymptotic regime.
     */
    static final int CONVERGENCE_LEVELS = 4;
    /** Estimated cost of one full-orbit reference sample, in pusher steps (for job ordering only). */
    static final double FO_REFERENCE_SAMPLE = 11;
    /** Estimated cost of one guiding-center reference sample, in pusher steps. */
    static final double GC_REFERENCE_SAMPLE = 3;
    /** Estimated cost of one fixed guiding-center step, in pusher steps. */
    static final double GC_STEP = 6;

    private final int threads;
    private final boolean quiet;
    /** Pushers given as instances (not by name), run beside the case's named ones. */
    private final List<FullOrbitPusher> instances;
    /** Guiding-center integrators given as instances, run beside the case's named ones. */
    private final List<GuidingCenterIntegrator> gcInstances;
    /** Whether work beyond {@link #MAX_STEPS} may start. */
    private boolean allowLong;

    /**
     * Full-orbit steps (over every pusher, phase and reference) a set of cases may take without
     * {@link #allowingLong()}: about an hour on two cores; beyond it a typo (a duration of 1e9)
     * is likelier than intent.
     */
    public static final double MAX_STEPS = 5e9;

    /** @param threads worker threads (≥ 1) @param quiet no progress bar */
    public CaseRunner(int threads, boolean quiet) {
        this(threads, quiet, List.of(), List.of());
    }

    private CaseRunner(int threads, boolean quiet, List<FullOrbitPusher> instances,
                       List<GuidingCenterIntegrator> gcInstances) {
        if (threads < 1) {
            throw new IllegalArgumentException("--threads: must be at least 1, got " + threads);
        }
        this.threads = threads;
        this.quiet = quiet;
        this.instances = List.copyOf(instances);
        this.gcInstances = List.copyOf(gcInstances);
    }

    /**
     * A runner that also runs these pusher instances in every case, after the case's named
     * pushers: a pusher that is not registered (a test's, or one replaying a trajectory file).
     */
    public CaseRunner with(List<FullOrbitPusher> pushers) {
        return new CaseRunner(threads, quiet, pushers, gcInstances);
    }

    /** This runner, allowed to start work beyond {@link #MAX_STEPS}. */
    public CaseRunner allowingLong() {
        CaseRunner r = new CaseRunner(threads, quiet, instances, gcInstances);
        r.allowLong = true;
        return r;
    }

    /** A runner that also runs these guiding-center integrator instances in every case. */
    public CaseRunner withGuidingCenters(List<GuidingCenterIntegrator> integrators) {
        return new CaseRunner(threads, quiet, instances, integrators);
    }

    /** Runs one case. */
    public CaseResult run(Case c) {
        return run(List.of(c)).get(0);
    }

    /** Runs several cases on one pool; results in the order of the cases. */
    public List<CaseResult> run(List<Case> cases) {
        return run(cases, r -> { });
    }

    /**
     * Runs several cases on one pool; results in the order of the cases. {@code onCase} receives
     * each case's result as soon as all of its orbits are done (in completion order, from a
     * worker thread), so that a caller can save partial results of a long run.
     */
    public List<CaseResult> run(List<Case> cases, java.util.function.Consumer<CaseResult> onCase) {
        List<Plan> plans = new ArrayList<>();
        for (Case c : cases) {
            plans.add(new Plan(new ResolvedCase(c), instances, gcInstances));
        }
        List<Parallel.Job> pre = new ArrayList<>();
        for (Plan p : plans) {
            if (p.c.durationUnit() == DurationUnit.BOUNCES) {
                pre.add(new Parallel.Job(1, p::measureBounce));
            } else if (p.c.durationUnit() == DurationUnit.CROSSINGS) {
                p.checkSheet();
                pre.add(new Parallel.Job(1, p::measureSheetExit));
            }
        }
        if (!pre.isEmpty()) {
            new Parallel(threads, quiet, "bounce periods").run(pre);
        }
        List<Parallel.Job> jobs = new ArrayList<>();
        double total = 0;
        for (Plan p : plans) {
            p.schedule();
            // each reference sample costs about FO_REFERENCE_SAMPLE pusher steps
            total += (double) p.n * p.x0.length * (p.pushers.size() + 2)
                    + (double) p.samples * p.x0.length * FO_REFERENCE_SAMPLE * 2;
        }
        if (total > MAX_STEPS && !allowLong) {
            throw new BadInputException(String.format(java.util.Locale.ROOT, "duration: the run would take about %.1e "
                    + "full-orbit steps (all pushers, phases and references), beyond the %.0e that start without "
                    + "--allow-long; shorten --duration or --phases, or confirm with --allow-long", total, MAX_STEPS));
        }
        for (Plan p : plans) {
            List<Parallel.Job> own = new ArrayList<>();
            p.addJobs(own);
            // the job that finishes a case assembles it; the counter orders the slots' writes before it
            java.util.concurrent.atomic.AtomicInteger left = new java.util.concurrent.atomic.AtomicInteger(own.size());
            for (Parallel.Job j : own) {
                jobs.add(new Parallel.Job(j.cost(), () -> {
                    j.work().run();
                    if (left.decrementAndGet() == 0) {
                        p.result = Assembly.assemble(p);
                        onCase.accept(p.result);
                    }
                }));
            }
        }
        new Parallel(threads, quiet, cases.size() == 1 ? "orbits" : "cases").run(jobs);
        List<CaseResult> out = new ArrayList<>();
        for (Plan p : plans) {
            out.add(p.result);
        }
        return out;
    }

    /**
     * What a run of the case would integrate, without integrating it: the ensemble's initial
     * states, the full-orbit step and the step count, and the convergence sweep. A duration in
     * bounces or crossings is measured first on the guiding-center reference, as a run does.
     */
    public static RunSchedule schedule(Case c) {
        Plan p = new Plan(new ResolvedCase(c), List.of(), List.of());
        if (c.durationUnit() == DurationUnit.BOUNCES) {
            p.measureBounce();
        } else if (c.durationUnit() == DurationUnit.CROSSINGS) {
            p.checkSheet();
            p.measureSheetExit();
        }
        p.schedule();
        double[] dts = new double[CONVERGENCE_LEVELS];
        long[] steps = new long[CONVERGENCE_LEVELS];
        for (int l = 0; l < CONVERGENCE_LEVELS; l++) {
            dts[l] = p.dt / (1 << l);
            steps[l] = p.convN << l;
        }
        double[] gcDts = new double[CONVERGENCE_LEVELS];
        long[] gcSteps = new long[CONVERGENCE_LEVELS];
        for (int l = 0; l < CONVERGENCE_LEVELS; l++) {
            gcDts[l] = p.gcDt / (1 << l);
            gcSteps[l] = p.gcN << l;
        }
        return new RunSchedule(p.rc, p.x0, p.u0, p.dt, p.n, p.tEnd, p.bounce, dts, steps,
                new RunSchedule.GuidingCenterRuns(p.gc0.clone(), p.pPar0, p.mu, gcDts, gcSteps));
    }

    /**
     * Samples the references take from their dense output over [0, tEnd]:
     * {@link #REFERENCE_SAMPLES_PER_GYRO} per initial gyroperiod, evenly spaced.
     *
     * @param tEnd end time (s) @param gyroPeriod initial gyroperiod (s)
     */
    public static long referenceSamples(double tEnd, double gyroPeriod) {
        return Math.max(1, (long) Math.ceil(tEnd / gyroPeriod * REFERENCE_SAMPLES_PER_GYRO - 1e-9));
    }

    /** One case: its setup, its jobs and their result slots. */
    static final class Plan {
        final ResolvedCase rc;
        final Case c;
        /** Particles of the gyrophase ensemble: positions (m) and u = γv (m/s). */
        final double[][] x0;
        final double[][] u0;
        /** The guiding center they share: position (m), p∥ (kg m/s), μ (J/T). */
        final double[] gc0;
        final double pPar0;
        final double mu;
        final List<FullOrbitPusher> pushers = new ArrayList<>();
        final List<GuidingCenterIntegrator> gcs = new ArrayList<>();
        final double speed;
        final double deadband;
        double bounce = Double.NaN;
        /** When the guiding center has made its crossings and is back at its starting distance from the sheet (s); NaN unless the unit is crossings. */
        double sheetExit = Double.NaN;
        double tEnd;
        long n;
        double dt;
        long gcN;
        double gcDt;
        long samples;
        long convN;

        FullOrbitRecord[][] fo;
        FullOrbitRecord[][] foConv;
        FullOrbitRecord[] foRef;
        FullOrbitRecord foTight;
        CaseResult result;
        FullOrbitRecord convRef;
        FullOrbitRecord convTight;
        GuidingCenterRecord[] gc;
        GuidingCenterRecord[][] gcConv;
        GuidingCenterRecord gcRef;
        /** The model row's guiding center of each phase ({@link GuidingCenterStart#MATCHED}); null: shared. */
        GuidingCenterRecord[] gcMatched;
        GuidingCenterRecord gcTight;

        Plan(ResolvedCase rc, List<FullOrbitPusher> instances, List<GuidingCenterIntegrator> gcInstances) {
            this.rc = rc;
            this.c = rc.spec();
            for (String name : c.pushers()) {
                pushers.add(Registry.pusher(name));
            }
            pushers.addAll(instances);
            for (String name : c.gcIntegrators()) {
                gcs.add(Registry.guidingCenter(name));
            }
            gcs.addAll(gcInstances);
            double u = Relativity.uFromKinetic(rc.species(), rc.energyEv());
            this.speed = u / rc.gamma();
            this.deadband = DEADBAND * speed;
            GuidingCenterState g = rc.initial().guidingCenter();
            gc0 = g.position().toArray();
            pPar0 = g.parallelMomentum();
            mu = g.mu();
            List<GyroParticle> ring = rc.initial().particles(c.phases(), GyroPlacement.ZEROTH_EXB);
            x0 = new double[ring.size()][];
            u0 = new double[ring.size()][];
            for (int k = 0; k < ring.size(); k++) {
                x0[k] = ring.get(k).position().toArray();
                u0[k] = ring.get(k).u().toArray();
                double[] x = x0[k];
                if (!rc.field().inDomain(x[0], x[1], x[2])) {
                    throw new IllegalArgumentException("start: the particle of gyrophase " + k
                            + " lies outside the domain of field '" + c.field() + "' ("
                            + rc.field().domainMeaning() + "); move the start or lower the energy");
                }
            }
        }

        /** Runs the guiding-center reference until it has mirrored often enough to give T_b. */
        void measureBounce() {
            double span = BOUNCE_SEARCH_GYRO * rc.gyroPeriod();
            GuidingCenterRecord r = References.guidingCenter(rc.field(), rc.species(), mu, gc0, pPar0,
                    span, (long) BOUNCE_SEARCH_GYRO, c.referenceRtol(), 1, deadband, 3);
            List<GuidingCenterResult.MirrorPoint> mp = r.mirrorPoints();
            // the first and third mirror points are one bounce apart (same side, same direction)
            bounce = mp.size() >= 3 && r.outcome().status() == OrbitStatus.OK
                    ? mp.get(2).time() - mp.get(0).time() : Double.NaN;
        }

        /** Refuses the crossings unit where there is no sheet to cross or the start lies on it. */
        void checkSheet() {
            double[] nrm = rc.field().sheetNormal();
            if (nrm == null) {
                throw new BadInputException("duration-unit: crossings needs a field with a current sheet "
                        + "(current-sheet); field '" + c.field() + "' has none");
            }
            if (c.duration() != Math.rint(c.duration()) || c.duration() < 1) {
                throw new BadInputException("duration: crossings are counted in whole numbers >= 1, got "
                        + c.duration());
            }
            if (!(Math.abs(sheetDistance(gc0)) > 0)) {
                throw new BadInputException("start: a crossing run starts off the sheet; the guiding center of case '"
                        + c.name() + "' lies on it");
            }
        }

        /** Signed distance (m) of a point from the field's sheet plane. */
        private double sheetDistance(double[] x) {
            double[] nrm = rc.field().sheetNormal();
            return nrm[0] * x[0] + nrm[1] * x[1] + nrm[2] * x[2];
        }

        /**
         * Runs the guiding-center reference until it has crossed the sheet {@code duration} times
         * and is back at its starting distance from it, on whichever side: that time is the exit.
         */
        void measureSheetExit() {
            double span = BOUNCE_SEARCH_GYRO * rc.gyroPeriod();
            long samples = (long) (4 * BOUNCE_SEARCH_GYRO);
            GuidingCenterRecord r = References.guidingCenter(rc.field(), rc.species(), mu, gc0, pPar0,
                    span, samples, c.referenceRtol(), 1, deadband, 0);
            Track t = r.recorder().track();
            double d0 = Math.abs(sheetDistance(gc0));
            int crossings = 0;
            double side = Math.signum(sheetDistance(gc0));
            double[] x = new double[3];
            double[] prev = gc0.clone();
            double tPrev = 0;
            for (int i = 0; i < t.size(); i++) {
                x[0] = t.coord(i, 0);
                x[1] = t.coord(i, 1);
                x[2] = t.coord(i, 2);
                double d = sheetDistance(x);
                if (Math.signum(d) == -side) {
                    crossings++;
                    side = -side;
                }
                if (crossings >= c.duration() && Math.abs(d) >= d0) {
                    // linear between the samples around the return to |d0|
                    double dp = Math.abs(sheetDistance(prev));
                    double f = Math.abs(d) > dp ? (d0 - dp) / (Math.abs(d) - dp) : 1;
                    sheetExit = tPrev + Math.max(0, Math.min(1, f)) * (t.time(i) - tPrev);
                    return;
                }
                System.arraycopy(x, 0, prev, 0, 3);
                tPrev = t.time(i);
            }
        }

        /** Fixes the end time and the steps. */
        void schedule() {
            double unit = rc.gyroPeriod();
            double span = c.duration();
            if (c.durationUnit() == DurationUnit.BOUNCES) {
                if (!(bounce > 0)) {
                    throw new BadInputException("duration-unit: the orbit of case '" + c.name()
                            + "' does not bounce (it is passing or lost); give the duration in gyroperiods");
                }
                unit = bounce;
            } else if (c.durationUnit() == DurationUnit.CROSSINGS) {
                if (!(sheetExit > 0)) {
                    throw new BadInputException("duration-unit: the guiding center of case '" + c.name()
                            + "' does not cross the sheet " + Format.number(c.duration()) + " time(s) and come back to "
                            + "its starting distance within " + Format.number(BOUNCE_SEARCH_GYRO)
                            + " gyroperiods; give the duration in gyroperiods or bounces");
                }
                span = sheetExit / rc.gyroPeriod() + SHEET_EXIT_MARGIN_GYRO;
            }
            dt = rc.fullOrbitStep();
            n = Math.max(1, (long) Math.ceil(span * unit / dt - 1e-9));
            tEnd = n * dt;
            samples = referenceSamples(tEnd, rc.gyroPeriod());
            gcN = Math.max(1, (long) Math.ceil(tEnd / (c.gcStepGyro() * rc.gyroPeriod()) - 1e-9));
            gcDt = tEnd / gcN;
            convN = Math.min(n, Math.max(1, (long) Math.ceil(CONVERGENCE_GYRO * c.stepsPerGyro() - 1e-9)));
        }

        void addJobs(List<Parallel.Job> jobs) {
            int np = pushers.size();
            int ng = gcs.size();
            int nph = x0.length;
            fo = new FullOrbitRecord[np][nph];
            foConv = new FullOrbitRecord[np][CONVERGENCE_LEVELS];
            foRef = new FullOrbitRecord[nph];
            gcMatched = new GuidingCenterRecord[nph];
            boolean matched = c.gcStart() == GuidingCenterStart.MATCHED;
            gc = new GuidingCenterRecord[ng];
            gcConv = new GuidingCenterRecord[ng][CONVERGENCE_LEVELS - 1];
            int stride = (int) Math.max(1, n / PLOT_POINTS);
            int refStride = (int) Math.max(1, samples / PLOT_POINTS);
            int gcStride = (int) Math.max(1, gcN / PLOT_POINTS);
            // job costs in units of one full-orbit pusher step (with its observers), measured on
            // the dipole: a full-orbit reference sample ~11, a guiding-center reference sample ~3,
            // a guiding-center RK4 step ~6; the tighter self-estimate runs cost about twice as much
            double refCost = samples * FO_REFERENCE_SAMPLE;
            for (int k = 0; k < nph; k++) {
                int kk = k;
                jobs.add(new Parallel.Job(refCost + (matched ? samples * GC_REFERENCE_SAMPLE : 0), () -> {
                    foRef[kk] = References.fullOrbit(rc.field(), rc.species(), x0[kk], u0[kk], tEnd, samples,
                            c.referenceRtol(), refStride, deadband);
                    if (matched) {
                        gcMatched[kk] = matchedGuidingCenter(foRef[kk].gyro(), refStride, kk);
                    }
                }));
                for (int i = 0; i < np; i++) {
                    int ii = i;
                    jobs.add(new Parallel.Job(n, () -> fo[ii][kk] = Orbits.push(pushers.get(ii), rc.field(),
                            rc.species(), x0[kk], u0[kk], dt, n, stride, deadband)));
                }
            }
            // the zeroth-order ring shares one guiding center: its runs are done once
            jobs.add(new Parallel.Job(samples * GC_REFERENCE_SAMPLE, () -> gcRef = References.guidingCenter(rc.field(),
                    rc.species(), mu, gc0, pPar0, tEnd, samples, c.referenceRtol(), refStride, deadband, 0)));
            for (int g = 0; g < ng; g++) {
                int gg = g;
                jobs.add(new Parallel.Job(gcN * GC_STEP, () -> gc[gg] = Orbits.advance(gcs.get(gg), rc.field(),
                        rc.species(), mu, gc0, pPar0, gcDt, gcN, gcStride, deadband)));
            }
            jobs.add(new Parallel.Job(refCost * 2, () -> foTight = References.fullOrbit(rc.field(), rc.species(),
                    x0[0], u0[0], tEnd, samples, References.tighter(c.referenceRtol()), refStride, deadband)));
            jobs.add(new Parallel.Job(samples * GC_REFERENCE_SAMPLE * 2, () -> gcTight = References.guidingCenter(rc.field(), rc.species(),
                    mu, gc0, pPar0, tEnd, samples, References.tighter(c.referenceRtol()), refStride, deadband, 0)));
            long convSamples = Math.max(1, (long) Math.ceil(convN * dt / rc.gyroPeriod() * REFERENCE_SAMPLES_PER_GYRO));
            if (np == 0) {
                addGuidingCenterConvergence(jobs, ng);
                return;
            }
            jobs.add(new Parallel.Job(convSamples * FO_REFERENCE_SAMPLE, () -> convRef = References.fullOrbit(rc.field(), rc.species(),
                    x0[0], u0[0], convN * dt, convSamples, c.referenceRtol(), 1, deadband)));
            jobs.add(new Parallel.Job(convSamples * FO_REFERENCE_SAMPLE * 2, () -> convTight = References.fullOrbit(rc.field(),
                    rc.species(), x0[0], u0[0], convN * dt, convSamples, References.tighter(c.referenceRtol()), 1,
                    deadband)));
            for (int i = 0; i < np; i++) {
                for (int level = 0; level < CONVERGENCE_LEVELS; level++) {
                    int ii = i;
                    int ll = level;
                    long m = convN << level;
                    jobs.add(new Parallel.Job(m, () -> foConv[ii][ll] = Orbits.push(pushers.get(ii), rc.field(),
                            rc.species(), x0[0], u0[0], dt / (1 << ll), m, (int) Math.max(1, m / PLOT_POINTS),
                            deadband)));
                }
            }
            addGuidingCenterConvergence(jobs, ng);
        }

        /**
         * The guiding center of one phase's own orbit ({@link MatchedStart}), run from the mid-time
         * of the reference's first whole gyration to the end. Null when the orbit completed no
         * gyration (lost at once) or its guiding center lies outside the domain: the shared start
         * is used for that phase.
         */
        private GuidingCenterRecord matchedGuidingCenter(GyroAverager g, int stride, int phase) {
            MatchedStart.State st = MatchedStart.of(rc.field(), rc.species(), g, x0[phase], u0[phase], rc.gamma(),
                    rc.momentum());
            if (st == null || !(st.t0() < tEnd) || !rc.field().inDomain(st.x()[0], st.x()[1], st.x()[2])) {
                return null;
            }
            long m = Math.max(1, (long) Math.ceil(samples * (tEnd - st.t0()) / tEnd));
            return References.guidingCenter(rc.field(), rc.species(), st.t0(), st.mu(), st.x(), st.pPar(), tEnd, m,
                    c.referenceRtol(), stride, deadband, 0);
        }

        private void addGuidingCenterConvergence(List<Parallel.Job> jobs, int ng) {
            for (int g = 0; g < ng; g++) {
                for (int level = 0; level < CONVERGENCE_LEVELS - 1; level++) {
                    int gg = g;
                    int ll = level;
                    long m = gcN << (level + 1);
                    jobs.add(new Parallel.Job(m * GC_STEP, () -> gcConv[gg][ll] = Orbits.advance(gcs.get(gg), rc.field(),
                            rc.species(), mu, gc0, pPar0, gcDt / (1 << (ll + 1)), m,
                            (int) Math.max(1, m / PLOT_POINTS), deadband)));
                }
            }
        }
    }
}
