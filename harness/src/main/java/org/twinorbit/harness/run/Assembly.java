package org.twinorbit.harness.run;

import org.twinorbit.integrators.OrbitStatus;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.twinorbit.fields.Field;
import org.twinorbit.harness.metrics.GyroAverager;
import org.twinorbit.harness.metrics.MuJump;
import org.twinorbit.harness.metrics.OrbitMetrics;
import org.twinorbit.harness.metrics.OrbitMetrics.OrbitClass;
import org.twinorbit.harness.metrics.Runaway;
import org.twinorbit.harness.metrics.Track;

/** Turns the records of a finished {@link CaseRunner.Plan} into rows, in a fixed order. */
final class Assembly {

    /**
     * A reference drift that moves the guiding center by less than this many ρ0 over the whole
     * averaging window is taken as no drift at all, where a relative drift error means nothing
     * (uniform field, an orbit on a symmetry axis, a drift that reverses every half bounce).
     */
    static final double DRIFT_FLOOR_RHO = 0.005;

    /**
     * A track with this many times more samples per second than the other is fine enough to be
     * read, by linear interpolation, at the other's sample times: the gyro-averaged full orbit
     * has one point per gyration, the guiding-center reference 32 per initial gyroperiod (at
     * least 8 per gyration where B ≤ 4 B0) and a fixed-step guiding center about one.
     */
    static final double FINER_SAMPLING = 4;

    /**
     * Convergence errors closer than this factor to the reference's own error are limited by the
     * reference, not by the integrator, and give no order.
     */
    static final double REFERENCE_MARGIN = 10;

    /**
     * End-position errors below this many ρ0 are round-off (positions far from the origin in
     * units of ρ0 times 1e-16), not truncation error, and give no order.
     */
    static final double ROUND_OFF_FLOOR = 1e-9;

    private Assembly() {}

    static CaseResult assemble(CaseRunner.Plan p) {
        Field f = p.rc.field();
        double rho = p.rc.rho0();
        int nph = p.x0.length;
        List<ResultRow> rows = new ArrayList<>();
        double foSelf = distance(p.foRef[0].finalX(), p.foTight.finalX()) / rho;
        double convSelf = p.convRef == null ? Double.NaN : distance(p.convRef.finalX(), p.convTight.finalX()) / rho;
        double gcSelf = distance(p.gcRef.finalX(), p.gcTight.finalX()) / rho;

        for (int i = 0; i < p.pushers.size(); i++) {
            Map<String, double[]> m = newMetrics(nph);
            Map<String, double[]> inv = new LinkedHashMap<>();
            List<String> invNames = p.fo[i][0].invariants().names();
            for (String name : invNames) {
                inv.put(name, new double[nph]);
            }
            OrbitClass[] cls = new OrbitClass[nph];
            OrbitClass[] refCls = new OrbitClass[nph];
            OrbitStatus[] st = new OrbitStatus[nph];
            double[] ends = new double[nph];
            MuJump.From[] muFrom = new MuJump.From[nph];
            double runaway = Double.NaN;
            double[] halves = {Double.NaN, Double.NaN};
            double steps = 0, evals = 0, wall = 0;
            for (int k = 0; k < nph; k++) {
                FullOrbitRecord r = p.fo[i][k];
                FullOrbitRecord ref = p.foRef[k];
                GyroAverager g = r.gyro();
                Track tr = g.centers();
                Track refTr = ref.gyro().centers();
                m.get("mu_change")[k] = OrbitMetrics.muChange(g);
                MuJump jump = MuJump.of(g, p.sheetExit);
                m.get("mu_jump")[k] = jump.value();
                muFrom[k] = jump.from();
                m.get("energy_error")[k] = r.energy().maxError();
                runaway = worse(runaway, Runaway.fullOrbit(g, ref.gyro(), p.speed));
                double[] h = r.energy().halves();
                if (h[1] / Math.max(h[0], Double.MIN_NORMAL) > halves[1] / Math.max(halves[0], Double.MIN_NORMAL)
                        || Double.isNaN(halves[1])) {
                    halves = h;
                }
                m.get("phase_error")[k] = OrbitMetrics.phaseError(g, ref.gyro());
                double[] w = OrbitMetrics.window(refTr);
                m.get("drift_error")[k] = drift(f, tr, refTr, w, rho);
                m.get("position_error_rho")[k] = OrbitMetrics.positionError(tr, refTr, rho);
                m.get("particle_position_error_rho")[k] = OrbitMetrics.particlePositionError(r.finalX(),
                        r.finalTime(), ref.finalX(), ref.finalU(), ref.finalTime(), rho);
                // the exact orbit's own μ change beside the pusher's: the physical ripple
                m.get("reference_mu_change")[k] = OrbitMetrics.muChange(ref.gyro());
                bounce(m, k, f, tr, refTr);
                for (int j = 0; j < invNames.size(); j++) {
                    inv.get(invNames.get(j))[k] = r.invariants().maxError(j);
                }
                st[k] = r.outcome().status();
                ends[k] = r.outcome().endTime();
                cls[k] = OrbitMetrics.classify(st[k], tr);
                refCls[k] = OrbitMetrics.classify(ref.outcome().status(), refTr);
                steps += r.outcome().steps();
                evals += r.outcome().fieldEvaluations();
                wall += r.outcome().wallNanos();
            }
            int levels = CaseRunner.CONVERGENCE_LEVELS;
            double[] dts = new double[levels];
            double[] errs = new double[levels];
            FullOrbitRecord[] runs = p.foConv[i];
            for (int l = 0; l < levels; l++) {
                dts[l] = p.dt / (1 << l);
                errs[l] = runs[l].outcome().status() == OrbitStatus.OK && p.convRef.outcome().status() == OrbitStatus.OK
                        ? distance(runs[l].finalX(), p.convRef.finalX()) / rho : Double.NaN;
                wall += runs[l].outcome().wallNanos();
            }
            rows.add(row(p.pushers.get(i).name(), "full-orbit", "discretisation", st, ends, m, muFrom, inv, cls, refCls,
                    order(dts, errs, convSelf), dts, errs, steps / nph, evals / nph, wall,
                    new Diagnostics(runaway, halves[0], halves[1], localOrders(dts, errs, convSelf),
                            p.pushers.get(i).order(), p.pushers.get(i).properties(), failure(p.fo[i], p.foConv[i]))));
        }

        // guiding-center rows: the ensemble shares one guiding center, so one run stands for all phases
        for (int gi = 0; gi < p.gcs.size(); gi++) {
            Map<String, double[]> m = newMetrics(1);
            GuidingCenterRecord r = p.gc[gi];
            GuidingCenterRecord ref = p.gcRef;
            Track tr = r.recorder().track();
            Track refTr = ref.recorder().track();
            m.get("energy_error")[0] = r.recorder().maxEnergyError();
            double[] w = OrbitMetrics.window(refTr);
            m.get("drift_error")[0] = drift(f, tr, refTr, w, rho);
            m.get("position_error_rho")[0] = OrbitMetrics.positionError(tr, refTr, rho);
            bounce(m, 0, f, tr, refTr);
            OrbitStatus[] st = {r.outcome().status()};
            double[] ends = {r.outcome().endTime()};
            OrbitClass[] cls = {OrbitMetrics.classify(st[0], tr)};
            OrbitClass[] refCls = {OrbitMetrics.classify(ref.outcome().status(), refTr)};
            double wall = r.outcome().wallNanos();
            int levels = CaseRunner.CONVERGENCE_LEVELS;
            double[] dts = new double[levels];
            double[] errs = new double[levels];
            GuidingCenterRecord[] runs = new GuidingCenterRecord[levels];
            runs[0] = r;
            System.arraycopy(p.gcConv[gi], 0, runs, 1, levels - 1);
            for (int l = 0; l < levels; l++) {
                dts[l] = p.gcDt / (1 << l);
                errs[l] = runs[l].outcome().status() == OrbitStatus.OK && ref.outcome().status() == OrbitStatus.OK
                        ? distance(runs[l].finalX(), ref.finalX()) / rho : Double.NaN;
                wall += l > 0 ? runs[l].outcome().wallNanos() : 0;
            }
            rows.add(row(p.gcs.get(gi).name(), "guiding-center", "discretisation", st, ends, m, new MuJump.From[0],
                    new LinkedHashMap<>(),
                    cls, refCls, order(dts, errs, gcSelf), dts, errs, r.outcome().steps(),
                    r.outcome().fieldEvaluations(), wall, new Diagnostics(Runaway.guidingCenter(tr, refTr, p.speed),
                            Double.NaN, Double.NaN, localOrders(dts, errs, gcSelf), p.gcs.get(gi).order(),
                            p.gcs.get(gi).properties(), gcFailure(runs))));
        }

        // model error: guiding-center reference against the gyro-averaged full-orbit reference
        {
            Map<String, double[]> m = newMetrics(nph);
            OrbitClass[] cls = new OrbitClass[nph];
            OrbitClass[] refCls = new OrbitClass[nph];
            OrbitStatus[] st = new OrbitStatus[nph];
            String[] labels = new String[nph];
            double[] ends = new double[nph];
            MuJump.From[] muFrom = new MuJump.From[nph];
            for (int k = 0; k < nph; k++) {
                // each phase's own guiding center where the start is matched, else the shared one
                GuidingCenterRecord r = p.gcMatched[k] != null ? p.gcMatched[k] : p.gcRef;
                FullOrbitRecord ref = p.foRef[k];
                Track tr = r.recorder().track();
                Track refTr = ref.gyro().centers();
                m.get("mu_change")[k] = OrbitMetrics.muChange(ref.gyro());
                MuJump jump = MuJump.of(ref.gyro(), p.sheetExit);
                m.get("mu_jump")[k] = jump.value();
                muFrom[k] = jump.from();
                double[] w = OrbitMetrics.window(refTr);
                m.get("drift_error")[k] = drift(f, tr, refTr, w, rho);
                m.get("position_error_rho")[k] = OrbitMetrics.positionError(tr, refTr, rho);
                bounce(m, k, f, tr, refTr);
                st[k] = r.outcome().status();
                ends[k] = r.outcome().endTime();
                cls[k] = OrbitMetrics.classify(st[k], tr);
                refCls[k] = OrbitMetrics.classify(ref.outcome().status(), refTr);
                labels[k] = modelStatus(st[k], ref.outcome().status());
                if (ref.outcome().status() != OrbitStatus.OK && labels[k].endsWith("full-orbit")) {
                    ends[k] = ref.outcome().endTime();
                }
            }
            GuidingCenterRecord r = p.gcRef;
            ResultRow model = row("gc-reference", "guiding-center", "model", st, ends, m, muFrom, new LinkedHashMap<>(), cls,
                    refCls, Double.NaN, new double[0], new double[0], r.outcome().steps(),
                    r.outcome().fieldEvaluations(), r.outcome().wallNanos(), Diagnostics.NONE);
            rows.add(withModelStatus(model, labels, ends));
        }

        List<ReferenceSummary> refs = List.of(
                summary("full-orbit", References.fullOrbitMethod(), p.c.referenceRtol(), foSelf,
                        java.util.Arrays.stream(p.foRef).map(FullOrbitRecord::outcome).toList(),
                        java.util.Arrays.stream(p.foRef).mapToDouble(r -> r.energy().maxError()).toArray(),
                        p.foTight.outcome()),
                summary("guiding-center", References.guidingCenterMethod(), p.c.referenceRtol(), gcSelf,
                        List.of(p.gcRef.outcome()), new double[] {p.gcRef.recorder().maxEnergyError()},
                        p.gcTight.outcome()));

        List<CaseResult.Curve> mu = new ArrayList<>();
        List<CaseResult.Curve> energy = new ArrayList<>();
        mu.add(muCurve("reference", p.foRef[0].gyro()));
        energy.add(new CaseResult.Curve("full-orbit reference", p.foRef[0].energy().series().times(),
                p.foRef[0].energy().series().values()));
        for (int i = 0; i < p.pushers.size(); i++) {
            FullOrbitRecord r = p.fo[i][0];
            mu.add(muCurve(p.pushers.get(i).name(), r.gyro()));
            energy.add(new CaseResult.Curve(p.pushers.get(i).name(), r.energy().series().times(),
                    r.energy().series().values()));
        }
        for (int g = 0; g < p.gcs.size(); g++) {
            GuidingCenterRecord r = p.gc[g];
            energy.add(new CaseResult.Curve(p.gcs.get(g).name(), r.recorder().energySeries().times(),
                    r.recorder().energySeries().values()));
        }
        List<CaseResult.Orbit> orbits = new ArrayList<>();
        for (int i = 0; i < p.pushers.size(); i++) {
            orbits.add(new CaseResult.Orbit(p.pushers.get(i).name(), "full-orbit", p.fo[i][0].gyro().centers()));
        }
        for (int g = 0; g < p.gcs.size(); g++) {
            orbits.add(new CaseResult.Orbit(p.gcs.get(g).name(), "guiding-center", p.gc[g].recorder().track()));
        }
        CaseResult.Sweeps sweeps = new CaseResult.Sweeps(p.convRef == null ? Double.NaN : p.convN * p.dt, convSelf,
                p.tEnd, gcSelf);
        return new CaseResult(p.rc, p.tEnd, p.bounce, p.n, p.gcDt, rows, refs, mu, energy,
                p.foRef[0].gyro().centers(),
                (p.gcMatched[0] != null ? p.gcMatched[0] : p.gcRef).recorder().track(), orbits, sweeps);
    }

    /**
     * Drift error over the reference's whole-period window w, cut to the time both tracks
     * cover (a pusher with a phase lag finishes its last whole gyration a little earlier); both
     * tracks are averaged over the same span. A track sampled {@link #FINER_SAMPLING} times more
     * often than the other is read at the other's times, so that both have the same chords (the
     * parallel part removed from a chord leaves a residue that grows with its length); tracks of
     * similar sampling keep their own samples, since reading one at the other's times would put
     * its points on its chords. NaN below {@link #DRIFT_FLOOR_RHO}.
     */
    static double drift(Field f, Track tr, Track refTr, double[] w, double rho) {
        double ta = Math.max(w[0], Math.max(tr.firstTime(), refTr.firstTime()));
        double tb = Math.min(w[1], Math.min(tr.lastTime(), refTr.lastTime()));
        double floor = DRIFT_FLOOR_RHO * rho / (tb - ta);
        double rate = tr.size() / (tr.lastTime() - tr.firstTime());
        double refRate = refTr.size() / (refTr.lastTime() - refTr.firstTime());
        Track coarse = rate <= refRate ? tr : refTr;
        if (Math.max(rate, refRate) < FINER_SAMPLING * Math.min(rate, refRate)) {
            // similar sampling (a pusher's gyration centers against the reference's): own chords
            return OrbitMetrics.driftError(OrbitMetrics.meanPerpendicularVelocity(f, tr, ta, tb),
                    OrbitMetrics.meanPerpendicularVelocity(f, refTr, ta, tb), floor);
        }
        return OrbitMetrics.driftError(OrbitMetrics.meanPerpendicularVelocity(f, tr, ta, tb, coarse),
                OrbitMetrics.meanPerpendicularVelocity(f, refTr, ta, tb, coarse), floor);
    }

    /** What the first failed run of a pusher threw; null when none failed. */
    private static String failure(FullOrbitRecord[] main, FullOrbitRecord[] sweep) {
        for (FullOrbitRecord[] set : new FullOrbitRecord[][] {main, sweep}) {
            for (FullOrbitRecord r : set) {
                if (r != null && r.outcome().failure() != null) {
                    return r.outcome().failure();
                }
            }
        }
        return null;
    }

    private static String gcFailure(GuidingCenterRecord[] runs) {
        for (GuidingCenterRecord r : runs) {
            if (r != null && r.outcome().failure() != null) {
                return r.outcome().failure();
            }
        }
        return null;
    }

    /** The larger of two strays; NaN (not measured) counts as none. */
    private static double worse(double a, double b) {
        return Double.isNaN(b) ? a : Double.isNaN(a) ? b : Math.max(a, b);
    }

    private static Map<String, double[]> newMetrics(int nph) {
        Map<String, double[]> m = new LinkedHashMap<>();
        for (String name : ResultRow.METRICS) {
            double[] v = new double[nph];
            java.util.Arrays.fill(v, Double.NaN);
            m.put(name, v);
        }
        return m;
    }

    private static void bounce(Map<String, double[]> m, int k, Field f, Track tr, Track refTr) {
        double tb = OrbitMetrics.bouncePeriod(tr);
        double bm = OrbitMetrics.mirrorField(f, tr);
        m.get("bounce_period_s")[k] = tb;
        m.get("bounce_period_error")[k] = OrbitMetrics.relative(tb, OrbitMetrics.bouncePeriod(refTr));
        m.get("mirror_field_t")[k] = bm;
        m.get("mirror_field_error")[k] = OrbitMetrics.relative(bm, OrbitMetrics.mirrorField(f, refTr));
    }

    private static ResultRow row(String name, String model, String kind, OrbitStatus[] st, double[] ends,
                                 Map<String, double[]> m, MuJump.From[] muFrom, Map<String, double[]> inv,
                                 OrbitClass[] cls,
                                 OrbitClass[] refCls, double order, double[] dts, double[] errs,
                                 double steps, double evals, double wallNanos, Diagnostics diagnostics) {
        OrbitStatus worst = OrbitStatus.OK;
        for (OrbitStatus s : st) {
            if (severity(s) > severity(worst)) {
                worst = s;
            }
        }
        double when = Double.NaN;
        if (worst != OrbitStatus.OK) {
            for (int k = 0; k < st.length; k++) {
                if (st[k] == worst && !(ends[k] >= when)) {
                    when = ends[k];
                }
            }
        }
        Map<String, Stat> metrics = new LinkedHashMap<>();
        m.forEach((key, v) -> metrics.put(key, Stat.of(v)));
        Map<String, Stat> invariants = new LinkedHashMap<>();
        inv.forEach((key, v) -> invariants.put(key, Stat.of(v)));
        TreeSet<OrbitClass> seen = new TreeSet<>();
        int agree = 0;
        for (int k = 0; k < cls.length; k++) {
            seen.add(cls[k]);
            agree += cls[k] == refCls[k] ? 1 : 0;
        }
        String classes = String.join("/", seen.stream().map(OrbitClass::label).toList());
        TreeSet<MuJump.From> from = new TreeSet<>();
        for (MuJump.From f : muFrom) {
            if (f != null) {
                from.add(f);
            }
        }
        return new ResultRow(name, model, kind, worst.label(), when, metrics, invariants, classes,
                (double) agree / cls.length, order, dts, errs, steps < 0 ? Double.NaN : steps, evals, wallNanos * 1e-9,
                from.isEmpty() ? null : String.join("/", from.stream().map(MuJump.From::label).toList()), diagnostics);
    }

    /** Model-row statuses from the least to the most severe. */
    private static final List<String> MODEL_STATUSES = List.of("ok", "lost", "lost-guiding-center",
            "lost-full-orbit", "model-failure", "unstable-full-orbit", "unstable");

    /**
     * The model row's status in one phase, from both models: plain {@code lost} only when both
     * lost the particle (a loss cone), {@code lost-full-orbit} / {@code lost-guiding-center} when
     * one model kept what the other lost, and the failure of either model.
     */
    static String modelStatus(OrbitStatus guidingCenter, OrbitStatus fullOrbit) {
        if (guidingCenter == OrbitStatus.UNSTABLE || guidingCenter == OrbitStatus.MODEL_FAILURE) {
            return guidingCenter.label();
        }
        if (fullOrbit == OrbitStatus.UNSTABLE || fullOrbit == OrbitStatus.MODEL_FAILURE) {
            return "unstable-full-orbit";
        }
        boolean gcLost = guidingCenter == OrbitStatus.LOST;
        boolean foLost = fullOrbit == OrbitStatus.LOST;
        if (gcLost && foLost) {
            return "lost";
        }
        return foLost ? "lost-full-orbit" : gcLost ? "lost-guiding-center" : "ok";
    }

    /** The row with the most severe of the per-phase model statuses and its earliest time (s). */
    private static ResultRow withModelStatus(ResultRow r, String[] labels, double[] ends) {
        String worst = "ok";
        for (String l : labels) {
            if (MODEL_STATUSES.indexOf(l) > MODEL_STATUSES.indexOf(worst)) {
                worst = l;
            }
        }
        double when = Double.NaN;
        for (int k = 0; k < labels.length; k++) {
            if (!worst.equals("ok") && labels[k].equals(worst) && !(ends[k] >= when)) {
                when = ends[k];
            }
        }
        return new ResultRow(r.integrator(), r.model(), r.errorKind(), worst, when, r.metrics(), r.invariants(),
                r.orbitClass(), r.classAgreement(), r.order(), r.convergenceDt(), r.convergenceError(), r.steps(),
                r.fieldEvaluations(), r.wallSeconds(), r.muJumpFrom(), r.diagnostics());
    }

    private static int severity(OrbitStatus s) {
        return switch (s) {
            case OK -> 0;
            case LOST -> 1;
            case MODEL_FAILURE -> 2;
            case UNSTABLE -> 3;
            case FAILED -> 4;
        };
    }

    /** Fewest convergence points that give an order: three, so that two local orders can agree. */
    static final int MIN_ORDER_POINTS = 3;

    /**
     * The indices of the convergence points that measure truncation error: from the first valid
     * point on, while the runs succeeded and the errors stay above {@link #REFERENCE_MARGIN}
     * times the reference's own error and above {@link #ROUND_OFF_FLOOR}.
     */
    static int[] usable(double[] errs, double referenceError) {
        int[] idx = new int[errs.length];
        int n = 0;
        for (int l = 0; l < errs.length; l++) {
            boolean ok = Double.isFinite(errs[l]) && errs[l] > Math.max(REFERENCE_MARGIN * referenceError, ROUND_OFF_FLOOR);
            if (ok) {
                idx[n++] = l;
            } else if (n > 0) {
                break;
            }
        }
        return java.util.Arrays.copyOf(idx, n);
    }

    /**
     * Least-squares slope of log(error) against log(dt) over the {@link #usable} points; NaN
     * with fewer than {@link #MIN_ORDER_POINTS}.
     */
    static double order(double[] dts, double[] errs, double referenceError) {
        int[] use = usable(errs, referenceError);
        if (use.length < MIN_ORDER_POINTS) {
            return Double.NaN;
        }
        SimpleRegression reg = new SimpleRegression();
        for (int l : use) {
            reg.addData(Math.log(dts[l]), Math.log(errs[l]));
        }
        return reg.getSlope();
    }

    /** Orders between successive usable points, empty with fewer than {@link #MIN_ORDER_POINTS}. */
    static double[] localOrders(double[] dts, double[] errs, double referenceError) {
        int[] use = usable(errs, referenceError);
        if (use.length < MIN_ORDER_POINTS) {
            return new double[0];
        }
        double[] out = new double[use.length - 1];
        for (int i = 0; i + 1 < use.length; i++) {
            int a = use[i];
            int b = use[i + 1];
            out[i] = Math.log(errs[a] / errs[b]) / Math.log(dts[a] / dts[b]);
        }
        return out;
    }

    /**
     * A reference over the ensemble. @param outcomes one per phase @param energyErrors its own
     * energy error per phase @param tight the self-estimate run (its time counts as cost)
     */
    private static ReferenceSummary summary(String model, String method, double rtol, double self,
                                            List<Outcome> outcomes, double[] energyErrors, Outcome tight) {
        double steps = 0;
        double evals = 0;
        double wall = tight.wallNanos();
        OrbitStatus worst = OrbitStatus.OK;
        for (Outcome o : outcomes) {
            steps += o.steps();
            evals += o.fieldEvaluations();
            wall += o.wallNanos();
            if (severity(o.status()) > severity(worst)) {
                worst = o.status();
            }
        }
        int n = outcomes.size();
        return new ReferenceSummary(model, method, rtol, self, Stat.of(energyErrors).mean(), worst.label(),
                steps < 0 ? Double.NaN : steps / n, evals / n, wall * 1e-9);
    }

    private static CaseResult.Curve muCurve(String label, GyroAverager g) {
        int n = g.gyrations();
        double[] t = new double[n];
        double[] y = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = g.centers().time(k);
            y[k] = g.mu(k) / g.mu(0) - 1.0;
        }
        return new CaseResult.Curve(label, t, y);
    }

    static double distance(double[] a, double[] b) {
        double dx = a[0] - b[0], dy = a[1] - b[1], dz = a[2] - b[2];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }
}
