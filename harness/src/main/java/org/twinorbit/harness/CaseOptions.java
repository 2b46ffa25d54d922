package org.twinorbit.harness;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.CaseFile;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.run.Registry;
import picocli.CommandLine.Option;

/**
 * The options that define one case, shared by run and scan. A YAML file given with
 * {@code --case} supplies a base; any option given on the command line overrides its entry.
 */
public final class CaseOptions {

    @Option(names = "--case", paramLabel = "FILE", description = "Read the case from a YAML file (keys: "
            + "name, field, field-parameters, species, start, energy, eps, pitch, phases, duration, duration-unit, "
            + "pushers, steps-per-gyro, gc-integrators, gc-step, gc-start, reference-rtol); options override it.")
    Path caseFile;

    @Option(names = "--name", paramLabel = "TEXT", description = "Label of the case in reports.")
    String name;

    @Option(names = "--field", paramLabel = "NAME", description = "Field of the library (see 'twinorbit fields'; default uniform).")
    String field;

    @Option(names = {"-P", "--field-param"}, paramLabel = "NAME=VALUE",
            description = "Override a field parameter, in its unit (repeatable, each name once).")
    List<String> fieldParameters;

    @Option(names = "--species", paramLabel = "NAME",
            description = "electron, positron, proton, deuteron, triton, helium-3, alpha, or mass,charge in kg,C (default proton).")
    String species;

    @Option(names = "--start", split = ",", paramLabel = "X,Y,Z",
            description = "Initial guiding-center position (m); default: the field's.")
    List<Double> start;

    @Option(names = "--energy", paramLabel = "E", converter = EnergyConverter.class,
            description = "Kinetic energy: eV, or with a unit (20keV, 1.5MeV; default 1e4 eV unless --eps).")
    Double energy;

    @Option(names = "--eps", paramLabel = "EPS", description = "eps = rho0/L in (0, 1) instead of --energy.")
    Double eps;

    @Option(names = "--pitch", paramLabel = "DEG", description = "Pitch angle in [0, 180] degrees (default 60).")
    Double pitch;

    @Option(names = "--phases", paramLabel = "N", description = "Gyrophase ensemble size (default 8).")
    Integer phases;

    @Option(names = "--duration", paramLabel = "T", description = "Run length in --duration-unit (default 20).")
    Double duration;

    @Option(names = "--duration-unit", paramLabel = "UNIT",
            description = "What --duration counts: gyroperiods, bounces or crossings (default gyroperiods).")
    String durationUnit;

    @Option(names = "--pushers", split = ",", paramLabel = "NAMES",
            description = "Full-orbit pushers, comma-separated, 'all' or 'none' (default all; see 'twinorbit integrators').")
    List<String> pushers;

    @Option(names = "--steps-per-gyro", paramLabel = "N", description = "Full-orbit steps per gyroperiod, >= 4 (default 32).")
    Integer stepsPerGyro;

    @Option(names = "--gc-integrators", split = ",", paramLabel = "NAMES",
            description = "Guiding-center integrators, comma-separated, 'all' or 'none' (default all).")
    List<String> gcIntegrators;

    @Option(names = "--gc-step", paramLabel = "TC", description = "Guiding-center step in gyroperiods (default 1).")
    Double gcStep;

    @Option(names = "--gc-start", paramLabel = "START", description = "Start of the model row's guiding centers: "
            + "matched (default: one per gyrophase, at its reference orbit's first gyration, on its exact invariants) or shared "
            + "(one zeroth-order guiding center for the whole ring).")
    String gcStart;

    @Option(names = "--reference-rtol", paramLabel = "RTOL",
            description = "Relative tolerance of both references, in [1e-12, 1e-6] (default 1e-10).")
    Double referenceRtol;

    /** The options as a spec, entries not given left null. */
    CaseSpec spec() {
        CaseSpec s = new CaseSpec();
        s.name = name;
        s.field = field;
        s.fieldParameters = fieldParameters == null ? null : OptionPairs.numbers(fieldParameters, "--field-param");
        s.species = species;
        s.start = start;
        s.energy = energy;
        s.eps = eps;
        s.pitch = pitch;
        s.phases = phases;
        s.duration = duration;
        s.durationUnit = durationUnit;
        s.pushers = pushers;
        s.stepsPerGyro = stepsPerGyro;
        s.gcIntegrators = gcIntegrators;
        s.gcStep = gcStep;
        s.gcStart = gcStart;
        s.referenceRtol = referenceRtol;
        return s;
    }

    /** The case: the file (if any) overridden by the options, defaults filled in. */
    public Case toCase() {
        CaseSpec base = caseFile != null ? CaseFile.read(caseFile) : new CaseSpec();
        return base.overriddenBy(spec()).toCase(Registry.pusherNames(), Registry.guidingCenterNames());
    }
}
