package org.twinorbit.harness.suite;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.DurationUnit;
import org.twinorbit.harness.cases.GuidingCenterStart;
import org.twinorbit.harness.run.Registry;
import org.twinorbit.harness.verdict.Check;
import org.twinorbit.harness.verdict.Expectation;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.Verdicts;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * The built-in validation suite: every field of the library with cases chosen to exercise it —
 * several pitch angles, a small and a moderate ε, protons and electrons — and every integrator.
 * Durations and ensembles are sized so that the full suite stays under a minute and the quick
 * one under ten seconds on two cores (docs/design.md "Performance targets").
 */
public final class ValidationSuite {

    /** Gyrophases of the full suite (the docs/design.md default). */
    static final int PHASES = 8;
    /** Gyrophases of the quick suite: enough for a mean and a worst case, half the cost. */
    static final int QUICK_PHASES = 4;

    private ValidationSuite() {}

    /** The cases with every registered pusher, in report order (grouped by field, in library order). */
    public static List<Case> cases(boolean quick) {
        return cases(quick, Registry.pusherNames());
    }

    /** The cases with the given full-orbit pushers. */
    public static List<Case> cases(boolean quick, List<String> pushers) {
        return all(quick).stream().map(c -> c.withPushers(pushers)).toList();
    }

    /** The verdicts of suite cases, the expectations of the full suite applied ({@code quick} has none). */
    public static List<RowVerdict> verdicts(List<CaseResult> results, boolean quick) {
        List<RowVerdict> v = new ArrayList<>();
        for (CaseResult r : results) {
            v.addAll(Verdicts.judge(r));
        }
        return Expectation.apply(v, quick ? List.of() : EXPECTED);
    }

    private static final String RK4_DIPOLE = "RK4 is not time-reversible: over two bounces at 30 degrees in the "
            + "dipole its energy error grows until the orbit leaves the reference's";
    /**
     * The failures that are the point of a case of the full suite: reported as expected, and
     * reported as failures when they stop happening.
     */
    private static final List<Expectation> EXPECTED = List.of(
            new Expectation("dipole-proton-eps0.05", "rk4", Check.STABLE, RK4_DIPOLE),
            new Expectation("dipole-proton-eps0.05", "rk4", Check.RUNAWAY, RK4_DIPOLE),
            new Expectation("dipole-proton-eps0.05-shared", "rk4", Check.STABLE, RK4_DIPOLE),
            new Expectation("dipole-proton-eps0.05-shared", "rk4", Check.RUNAWAY, RK4_DIPOLE));

    private static List<Case> all(boolean quick) {
        List<Case> l = new ArrayList<>();
        Species p = Species.PROTON;
        Species e = Species.ELECTRON;
        if (quick) {
            l.add(energy("uniform-proton-60", "uniform", p, 1e4, 60, 10));
            l.add(energy("crossed-proton-90", "crossed", p, 1e4, 90, 10));
            l.add(eps("gradient-proton-eps0.05", "gradient", p, 0.05, 90, 10));
            l.add(eps("toroidal-proton-eps0.05", "toroidal", p, 0.05, 60, 10));
            l.add(offAxis(bounces("mirror-proton-eps0.05", "mirror", p, 0.05, 60, 2)));
            l.add(bounces("dipole-proton-eps0.05", "dipole", p, 0.05, 45, 2));
            l.add(bounces("tokamak-proton-eps0.02-trapped", "tokamak", p, 0.02, 80, 2));
        l.add(eps("tokamak-electron-eps0.01-passing", "tokamak", e, 0.01, 40, 150));
            l.add(bounces("solovev-deuteron-eps0.02-trapped", "solovev", Species.DEUTERON, 0.02, 80, 1));
            l.add(bounces("current-sheet-proton-eps0.05", "current-sheet", p, 0.05, 60, 2));
            l.add(eps("shear-electron-eps0.05", "shear", e, 0.05, 45, 10));
            l.add(energy("ramp-proton-90", "ramp", p, 1e4, 90, 20));
            l.add(energy("wave-proton-90", "wave", p, 1e4, 90, 20));
            return l.stream().map(c -> c.withPhases(QUICK_PHASES)).toList();
        }
        l.add(energy("uniform-proton-60", "uniform", p, 1e4, 60, 20));
        l.add(energy("uniform-electron-90", "uniform", e, 1e3, 90, 20));
        // a long run: the symplectic pushers' bounded energy error against RK4's secular loss
        l.add(energy("uniform-proton-60-long", "uniform", p, 1e4, 60, 1000));
        l.add(energy("crossed-proton-90", "crossed", p, 1e4, 90, 20));
        l.add(energy("crossed-electron-45", "crossed", e, 1e3, 45, 20));
        l.add(eps("gradient-proton-eps0.01", "gradient", p, 0.01, 90, 20));
        l.add(eps("gradient-proton-eps0.05", "gradient", p, 0.05, 90, 20));
        l.add(eps("gradient-electron-eps0.01", "gradient", e, 0.01, 45, 20));
        l.add(eps("toroidal-proton-eps0.01", "toroidal", p, 0.01, 60, 20));
        l.add(eps("toroidal-proton-eps0.05", "toroidal", p, 0.05, 30, 20));
        // the same orbits against one shared zeroth-order guiding center: the start-up offset
        // the matched start removes, side by side in the report
        l.add(shared(eps("toroidal-proton-eps0.01", "toroidal", p, 0.01, 60, 20)));
        l.add(shared(eps("toroidal-proton-eps0.05", "toroidal", p, 0.05, 30, 20)));
        l.add(offAxis(bounces("mirror-proton-eps0.01", "mirror", p, 0.01, 60, 2)));
        l.add(offAxis(bounces("mirror-proton-eps0.05", "mirror", p, 0.05, 75, 2)));
        l.add(offAxis(eps("mirror-electron-eps0.01-losscone", "mirror", e, 0.01, 20, 100)));
        l.add(bounces("dipole-proton-eps0.01", "dipole", p, 0.01, 45, 2));
        l.add(bounces("dipole-electron-eps0.02", "dipole", e, 0.02, 70, 2));
        l.add(bounces("dipole-proton-eps0.05", "dipole", p, 0.05, 30, 2));
        l.add(shared(bounces("dipole-proton-eps0.01", "dipole", p, 0.01, 45, 2)));
        l.add(shared(bounces("dipole-proton-eps0.05", "dipole", p, 0.05, 30, 2)));
        l.add(eps("tokamak-proton-eps0.02-passing", "tokamak", p, 0.02, 20, 150));
        l.add(bounces("tokamak-proton-eps0.02-trapped", "tokamak", p, 0.02, 80, 2));
        l.add(eps("tokamak-electron-eps0.01-passing", "tokamak", e, 0.01, 40, 150));
        // the shaped tokamak: a trapped deuteron's banana in the Solov'ev equilibrium
        l.add(bounces("solovev-deuteron-eps0.01-trapped", "solovev", Species.DEUTERON, 0.01, 80, 2));
        l.add(bounces("current-sheet-proton-eps0.02", "current-sheet", p, 0.02, 60, 2));
        l.add(bounces("current-sheet-proton-eps0.1", "current-sheet", p, 0.1, 60, 2));
        l.add(eps("shear-proton-eps0.01", "shear", p, 0.01, 60, 20));
        l.add(eps("shear-electron-eps0.05", "shear", e, 0.05, 45, 20));
        l.add(energy("ramp-proton-90", "ramp", p, 1e4, 90, 100));
        l.add(energy("ramp-electron-60", "ramp", e, 1e3, 60, 100));
        l.add(energy("wave-proton-90", "wave", p, 1e4, 90, 40));
        l.add(energy("wave-electron-45", "wave", e, 1e3, 45, 40));
        return l;
    }

    /**
     * The mirror cases start 0.1 Lm off the axis: there the guiding center has a grad-B and
     * curvature drift (an azimuthal precession) to compare; on the axis it has none.
     */
    private static Case offAxis(Case c) {
        return new Case(c.name(), c.field(), c.fieldParameters(), c.species(), new Vec3(0.1, 0, 0), c.energyEv(),
                c.eps(), c.pitchDeg(), c.phases(), c.duration(), c.durationUnit(), c.pushers(), c.stepsPerGyro(),
                c.gcIntegrators(), c.gcStepGyro(), c.referenceRtol(), c.gcStart());
    }

    /** The case with the shared zeroth-order guiding-center start, "-shared" in its name. */
    private static Case shared(Case c) {
        return new Case(c.name() + "-shared", c.field(), c.fieldParameters(), c.species(), c.start(), c.energyEv(),
                c.eps(), c.pitchDeg(), c.phases(), c.duration(), c.durationUnit(), c.pushers(), c.stepsPerGyro(),
                c.gcIntegrators(), c.gcStepGyro(), c.referenceRtol(), GuidingCenterStart.SHARED);
    }

    private static Case energy(String name, String field, Species s, double ev, double pitch, double gyro) {
        return make(name, field, s, ev, null, pitch, gyro, DurationUnit.GYROPERIODS);
    }

    private static Case eps(String name, String field, Species s, double eps, double pitch, double gyro) {
        return make(name, field, s, null, eps, pitch, gyro, DurationUnit.GYROPERIODS);
    }

    private static Case bounces(String name, String field, Species s, double eps, double pitch, double n) {
        return make(name, field, s, null, eps, pitch, n, DurationUnit.BOUNCES);
    }

    private static Case make(String name, String field, Species s, Double ev, Double eps, double pitch,
                             double duration, DurationUnit unit) {
        return new Case(name, field, Map.of(), s, null, ev, eps, pitch, PHASES, duration, unit,
                Registry.pusherNames(), 32, Registry.guidingCenterNames(), 1.0, 1e-10, GuidingCenterStart.MATCHED);
    }
}
