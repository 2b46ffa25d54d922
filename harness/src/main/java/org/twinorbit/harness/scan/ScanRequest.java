package org.twinorbit.harness.scan;

import org.twinorbit.integrators.fullorbit.Pushers;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.cases.GuidingCenterStart;
import org.twinorbit.harness.run.PhaseStatistic;
import org.twinorbit.harness.run.Registry;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * What a user asks of a breakdown scan, every entry optional (null takes the field's recipe,
 * {@link ScanField}); {@link #build} checks it and turns it into a scan and the evaluator of its
 * points. Error messages name the command-line option.
 */
public final class ScanRequest {

    public String field;
    public Map<String, Double> parameters = new LinkedHashMap<>();
    public Species species = Species.PROTON;
    public List<Double> pitches;
    /** [{@link ChargeSigns#GIVEN}] or {@link ChargeSigns#BOTH} ({@code --charge-signs}). */
    public List<Integer> chargeSigns = List.of(ChargeSigns.GIVEN);
    public Double epsMin;
    public Double epsMax;
    /** Most ε points a scan runs without {@link #allowLong}. */
    public static final int MAX_POINTS = 1000;
    /** The user confirmed a scan beyond {@link #MAX_POINTS} points. */
    public boolean allowLong;
    /** The range in kinetic energy (eV) instead of ε, for fields scanned through the energy. */
    public Double energyMin;
    public Double energyMax;
    public int points = 16;
    public Double energyEv;
    public List<Double> start;
    public int phases = 8;
    public Double duration;
    public ScanDuration.Unit durationUnit;
    /** The summary over the gyrophase ensemble that thresholds compare with a tolerance. */
    public PhaseStatistic statistic = PhaseStatistic.WORST;

    /** Tolerances by metric; metrics not named keep their default. */
    public Map<ScanMetric, List<Double>> tolerances = new LinkedHashMap<>();
    public double referenceRtol = CaseSpec.DEFAULT_RTOL;
    /** Where the model's guiding centers start: one per gyrophase (default) or one shared. */
    public GuidingCenterStart gcStart = GuidingCenterStart.MATCHED;
    /** Pushers and guiding-center integrators to scan at their step beside the references. */
    public List<String> integrators = List.of();
    /** Worker threads of each point (the points themselves run one after the other). */
    public int threads = Runtime.getRuntime().availableProcessors();

    /** A scan and the evaluator of its points. */
    public record Built(BreakdownScan scan, PointEvaluator evaluator) {}

    /**
     * @throws IllegalArgumentException naming the option and the allowed values; no orbit is
     *         computed before every option has been checked
     */
    public Built build() {
        if (field == null) {
            throw new IllegalArgumentException("--field: name a field of the library (see 'twinorbit fields')");
        }
        ScanField recipe;
        try {
            if (!Fields.isFile(field)) {
                Fields.provider(field);
            }
            recipe = ScanField.of(field);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--field: " + e.getMessage(), e);
        }
        if (recipe.timeScale() && parameters.containsKey(recipe.parameter())) {
            throw new IllegalArgumentException("--field-param " + recipe.parameter() + ": the scan sets it from eps; "
                    + "choose the range with --eps-min and --eps-max instead");
        }
        if ((energyMin != null && epsMin != null) || (energyMax != null && epsMax != null)) {
            throw new IllegalArgumentException("--energy-min/--energy-max and --eps-min/--eps-max: give the range one way");
        }
        if ((energyMin != null || energyMax != null) && recipe.timeScale()) {
            throw new IllegalArgumentException("--energy-min/--energy-max: field '" + field + "' is scanned in its time "
                    + "scale at a fixed energy (--energy); give the range with --eps-min and --eps-max");
        }
        double lo = epsMin != null ? epsMin : recipe.epsMin();
        double hi = epsMax != null ? epsMax : recipe.epsMax();
        Field f;
        try {
            f = Fields.create(field, recipe.parametersAt(parameters, lo), species);
        } catch (IllegalArgumentException e) {
            // the field exists (checked above): what is wrong is a parameter, or the grid file
            throw new IllegalArgumentException((parameters.isEmpty() ? "--field: " : "--field-param: ") + e.getMessage(), e);
        }
        Vec3 x0 = start(f, recipe);
        if (energyMin != null || energyMax != null) {
            EnergyScale scale = new EnergyScale(f, species, x0);
            for (Double e : new Double[] {energyMin, energyMax}) {
                if (e != null && !(e > 0 && Double.isFinite(e))) {
                    throw new IllegalArgumentException("--energy-min/--energy-max must be finite energies > 0 eV, got " + e);
                }
            }
            lo = energyMin != null ? scale.eps(energyMin) : lo;
            hi = energyMax != null ? scale.eps(energyMax) : hi;
            if (!(hi < 1)) {
                throw new IllegalArgumentException("--energy-max: " + org.twinorbit.harness.Format.energy(energyMax)
                        + " gives eps = " + org.twinorbit.harness.Format.number(hi) + " >= 1 in field '" + field
                        + "'; the guiding-center model needs eps < 1, so the largest energy is "
                        + org.twinorbit.harness.Format.energy(scale.energyEv(0.99)));
            }
            if (!(lo < hi)) {
                throw new IllegalArgumentException("--energy-min must lie below --energy-max (as eps: " + lo + " >= " + hi + ")");
            }
        }
        double[] eps = EpsilonGrid.logSpaced(lo, hi, points);
        List<Double> pitch = pitches != null ? List.copyOf(pitches) : List.of(recipe.pitchDeg());
        if (pitch.isEmpty()) {
            throw new IllegalArgumentException("--pitch: give at least one pitch angle in [0, 180] degrees");
        }
        for (double p : pitch) {
            if (!(p >= 0 && p <= 180)) {
                throw new IllegalArgumentException("--pitch must lie in [0, 180] degrees, got " + p);
            }
        }
        if (phases < 1 || phases > 1024) {
            throw new IllegalArgumentException("--phases must lie in [1, 1024], got " + phases);
        }
        ScanDuration d = new ScanDuration(duration != null ? duration : recipe.duration().value(),
                durationUnit != null ? durationUnit : recipe.duration().unit());
        if (d.unit() == ScanDuration.Unit.BOUNCES && recipe.duration().unit() != ScanDuration.Unit.BOUNCES) {
            // the recipes count bounces exactly for the fields whose orbits mirror (mirror, dipole,
            // tokamak, current sheet); elsewhere every point would silently run gyroperiods instead
            throw new IllegalArgumentException("--duration-unit bounces: orbits in field '" + field + "' do not bounce; "
                    + "use gyroperiods" + (recipe.timeScale() ? " or field-periods" : ""));
        }
        if (points > MAX_POINTS && !allowLong) {
            throw new IllegalArgumentException("--points: " + points + " points (times " + (pitches == null ? 1
                    : pitches.size()) + " pitch(es)) is beyond the " + MAX_POINTS + " a scan runs without "
                    + "--allow-long; each point runs every gyrophase through both references");
        }
        if (d.unit() == ScanDuration.Unit.FIELD_PERIODS && !recipe.timeScale()) {
            throw new IllegalArgumentException("--duration-unit field-periods needs a time-dependent field (ramp, wave); "
                    + "field '" + field + "' is static: use gyroperiods or bounces");
        }
        if (d.unit() == ScanDuration.Unit.CROSSINGS) {
            double[] n = f.sheetNormal();
            if (n == null) {
                throw new IllegalArgumentException("--duration-unit crossings needs a field with a current sheet "
                        + "(current-sheet); field '" + field + "' has none");
            }
            if (n[0] * x0.x() + n[1] * x0.y() + n[2] * x0.z() == 0) {
                throw new IllegalArgumentException("--duration-unit crossings: the start lies on the sheet; "
                        + "give --start off it (e.g. 0,0,z with z != 0)");
            }
            if (d.value() != Math.rint(d.value())) {
                throw new IllegalArgumentException("--duration: crossings are counted in whole numbers, got " + d.value());
            }
        }
        if (!(referenceRtol >= 1e-13 && referenceRtol <= 1e-6)) {
            throw new IllegalArgumentException("--reference-rtol must lie in [1e-13, 1e-6], got " + referenceRtol);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("--threads must be at least 1, got " + threads);
        }
        List<String> pushers = new ArrayList<>();
        List<String> gcs = new ArrayList<>();
        for (String given : integrators) {
            String name = Registry.current(given);
            if (Registry.pusherNames().contains(name)) {
                pushers.add(name);
            } else if (Registry.guidingCenterNames().contains(name)) {
                gcs.add(name);
            } else {
                List<String> all = new ArrayList<>(Registry.pusherNames());
                all.addAll(Registry.guidingCenterNames());
                throw new IllegalArgumentException("--pushers/--gc-integrators: unknown integrator '" + name + "'; allowed: "
                        + String.join(", ", all));
            }
        }
        ScanAxis axis = axis(f, recipe, x0, hi);
        Map<String, Object> settings = new LinkedHashMap<>();
        settings.put("field", field);
        settings.put("parameters", new LinkedHashMap<>(parameters));
        settings.put("species", species.name());
        settings.put("start_m", List.of(x0.x(), x0.y(), x0.z()));
        settings.put("eps_meaning", axis.meaning());
        if (recipe.timeScale()) {
            settings.put("energy_ev", axis.energyEv().applyAsDouble(lo));
            settings.put("scanned_parameter", recipe.parameter());
        } else {
            settings.put("l_m", f.length());
        }
        settings.put("eps_min", lo);
        settings.put("eps_max", hi);
        settings.put("n_eps", points);
        settings.put("pitch_deg", pitch);
        if (!chargeSigns.equals(List.of(ChargeSigns.GIVEN))) {
            // only when asked, so that the settings (and outputs) of a scan of the species as given stay as they were
            settings.put("charge_signs", "both");
        }
        settings.put("phases", phases);
        settings.put("duration", d.value());
        settings.put("duration_unit", d.unit().label());
        settings.put("reference_rtol", referenceRtol);
        settings.put("integrators", integrators.stream().map(Registry::current).toList());
        settings.put("gc_start", gcStart.label());
        ModelErrorEvaluator ev = new ModelErrorEvaluator(field, parameters, species, x0, phases, d, recipe,
                referenceRtol, pushers, gcs, threads, gcStart);
        return new Built(new BreakdownScan(settings, eps, pitch, axis, tolerances(), statistic, chargeSigns), ev);
    }

    private ScanAxis axis(Field f, ScanField recipe, Vec3 x0, double hi) {
        if (recipe.timeScale()) {
            double w = energyEv != null ? energyEv : recipe.energyEv();
            if (!(w > 0 && Double.isFinite(w))) {
                throw new IllegalArgumentException("--energy must be a finite number > 0 eV, got " + w);
            }
            if (field.equals("wave") && hi >= 0.999) {
                throw new IllegalArgumentException("--eps-max must stay below 0.999 for the wave "
                        + "(cyclotron resonance at omega/Omega = 1), got " + hi);
            }
            return ScanAxis.timeScale(recipe.meaning(field), w);
        }
        if (energyEv != null) {
            throw new IllegalArgumentException("--energy applies to ramp and wave only: field '" + field
                    + "' scans eps through the energy");
        }
        if (!f.isStatic()) {
            throw new IllegalArgumentException("--field: '" + field + "' depends on time but has no scan recipe;"
                    + " time-dependent fields that can be scanned: ramp, wave");
        }
        EnergyScale scale = new EnergyScale(f, species, x0);
        return field.equals("current-sheet") ? ScanAxis.currentSheet(scale) : ScanAxis.energy(scale);
    }

    private Vec3 start(Field f, ScanField recipe) {
        if (start == null) {
            return recipe.start(field, f, species, energyEv != null ? energyEv : recipe.energyEv());
        }
        if (start.size() != 3 || start.stream().anyMatch(v -> v == null || !Double.isFinite(v))) {
            throw new IllegalArgumentException("--start needs three finite coordinates x,y,z in m, got " + start);
        }
        Vec3 x0 = new Vec3(start.get(0), start.get(1), start.get(2));
        if (!f.inDomain(x0.x(), x0.y(), x0.z())) {
            throw new IllegalArgumentException("--start " + x0 + " lies outside the domain of field '" + field
                    + "': " + f.domainMeaning());
        }
        return x0;
    }

    /**
     * Every metric thresholded by default at its default tolerance, replaced where
     * {@link #tolerances} names it; a metric without a default (mu_change) is thresholded when named.
     */
    private Map<ScanMetric, List<Double>> tolerances() {
        Map<ScanMetric, List<Double>> tol = new LinkedHashMap<>();
        for (ScanMetric m : ScanMetric.values()) {
            if (m.thresholded()) {
                tol.put(m, List.of(m.defaultTolerance()));
            }
        }
        for (Map.Entry<ScanMetric, List<Double>> e : tolerances.entrySet()) {
            for (double x : e.getValue()) {
                if (!(x >= 0 && Double.isFinite(x))) {
                    throw new IllegalArgumentException("--tolerance " + e.getKey().key()
                            + " must be a finite number >= 0, got " + x);
                }
            }
            tol.put(e.getKey(), new ArrayList<>(e.getValue()));
        }
        return tol;
    }
}
