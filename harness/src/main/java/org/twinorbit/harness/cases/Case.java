package org.twinorbit.harness.cases;

import java.util.List;
import java.util.Map;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * One comparison case as the user gave it, every default filled in but not yet checked against
 * the field (see {@link ResolvedCase}).
 *
 * @param name             label used in reports
 * @param field            library name of the field
 * @param fieldParameters  parameter overrides, in each parameter's unit
 * @param species          the particle
 * @param start            initial guiding-center position (m); null for the field's default
 * @param energyEv         kinetic energy (eV); null when {@code eps} is given instead
 * @param eps              ε = ρ0/L; null when {@code energyEv} is given
 * @param pitchDeg         pitch angle between u and B at the start (degrees, 0–180)
 * @param phases           gyrophase ensemble size (evenly spaced phases)
 * @param duration         run length, in {@code durationUnit}
 * @param durationUnit     gyroperiods or bounce periods
 * @param pushers          full-orbit pusher names, in report order
 * @param stepsPerGyro     full-orbit steps per initial gyroperiod
 * @param gcIntegrators    guiding-center integrator names, in report order
 * @param gcStepGyro       guiding-center step, in initial gyroperiods
 * @param referenceRtol    relative tolerance of both references (their error is estimated at 1/100 of it)
 * @param gcStart          where the model row's guiding centers start (per phase, or one shared)
 */
public record Case(String name, String field, Map<String, Double> fieldParameters, Species species,
                   Vec3 start, Double energyEv, Double eps, double pitchDeg, int phases,
                   double duration, DurationUnit durationUnit, List<String> pushers, int stepsPerGyro,
                   List<String> gcIntegrators, double gcStepGyro, double referenceRtol,
                   GuidingCenterStart gcStart) {

    public Case {
        fieldParameters = java.util.Collections.unmodifiableMap(new java.util.TreeMap<>(fieldParameters));
        pushers = List.copyOf(pushers);
        gcIntegrators = List.copyOf(gcIntegrators);
    }

    /** Copy with another gyrophase ensemble size. */
    public Case withPhases(int n) {
        return new Case(name, field, fieldParameters, species, start, energyEv, eps, pitchDeg, n,
                duration, durationUnit, pushers, stepsPerGyro, gcIntegrators, gcStepGyro, referenceRtol, gcStart);
    }

    /** Copy with another full-orbit step: {@code n} steps per initial gyroperiod. */
    public Case withStepsPerGyro(int n) {
        return new Case(name, field, fieldParameters, species, start, energyEv, eps, pitchDeg, phases,
                duration, durationUnit, pushers, n, gcIntegrators, gcStepGyro, referenceRtol, gcStart);
    }

    /** Copy with other full-orbit pushers (names as in {@code --pushers}). */
    public Case withPushers(List<String> names) {
        return new Case(name, field, fieldParameters, species, start, energyEv, eps, pitchDeg, phases,
                duration, durationUnit, List.copyOf(names), stepsPerGyro, gcIntegrators, gcStepGyro, referenceRtol,
                gcStart);
    }

    /** Copy with another start of the model row's guiding centers. */
    public Case withGcStart(GuidingCenterStart g) {
        return new Case(name, field, fieldParameters, species, start, energyEv, eps, pitchDeg, phases,
                duration, durationUnit, pushers, stepsPerGyro, gcIntegrators, gcStepGyro, referenceRtol, g);
    }
}
