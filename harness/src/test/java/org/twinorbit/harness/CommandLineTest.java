package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line run in-process: exit codes, messages, and that bad input runs nothing.
 * Software behaviour only, no physics values (in-process command tests asserting code, message
 * and that no work ran are common practice, as in picocli's own examples).
 */
class CommandLineTest {

    @TempDir
    Path tmp;

    private TestCommandLine.Outcome badRun(String... options) {
        Path dir = tmp.resolve("out");
        String[] args = new String[options.length + 4];
        args[0] = "run";
        args[1] = "--quiet";
        args[2] = "--out";
        args[3] = dir.toString();
        System.arraycopy(options, 0, args, 4, options.length);
        TestCommandLine.Outcome o = TestCommandLine.exec(args);
        assertEquals(2, o.code(), () -> "exit code; stderr: " + o.err());
        assertEquals("", o.out(), "no table is printed");
        assertFalse(Files.exists(dir), "no output directory is created: no work ran");
        assertFalse(o.err().contains("\tat "), "no stack trace");
        return o;
    }

    @Test
    void unknownFieldListsTheFields() {
        TestCommandLine.Outcome o = badRun("--field", "bottle");
        assertTrue(o.err().contains("field: unknown field 'bottle'; allowed: uniform, crossed, gradient"), o.err());
    }

    @Test
    void unknownIntegratorListsTheIntegrators() {
        TestCommandLine.Outcome o = badRun("--pushers", "boris,leapfrog9");
        assertTrue(o.err().contains("pushers: unknown integrator 'leapfrog9'; allowed: boris, boris-newtonian, vay"), o.err());
        TestCommandLine.Outcome g = badRun("--gc-integrators", "gc-euler");
        assertTrue(g.err().contains("gc-integrators: unknown integrator 'gc-euler'; allowed: gc-rk4"), g.err());
    }

    @Test
    void unknownSpeciesListsTheSpecies() {
        TestCommandLine.Outcome o = badRun("--species", "muon");
        assertTrue(o.err().contains("species: unknown species 'muon'; allowed: electron, positron, proton"), o.err());
    }

    @Test
    void negativeEnergyIsRefused() {
        TestCommandLine.Outcome o = badRun("--energy", "-5");
        assertTrue(o.err().contains("energy: the kinetic energy must be > 0 eV, got -5.0"), o.err());
    }

    @Test
    void pitchOutsideZeroTo180IsRefused() {
        TestCommandLine.Outcome o = badRun("--pitch", "200");
        assertTrue(o.err().contains("pitch: the pitch angle must lie in [0, 180] degrees, got 200.0"), o.err());
    }

    @Test
    void startOutsideTheDomainIsRefused() {
        TestCommandLine.Outcome o = badRun("--field", "mirror", "--start", "0,0,1.5");
        assertTrue(o.err().contains("start: the guiding center (0.0, 0.0, 1.5) m lies outside the domain of field 'mirror'"),
                o.err());
    }

    /** ε = ρ0/L ≥ 1 from an energy is refused like --eps ≥ 1 (docs/design.md bad-input rules). */
    @Test
    void energyGivingEpsAboveOneIsRefused() {
        // a 1 GeV proton in the 0.5 T, 1 m mirror has rho0 = 11.3 m, eps = 11
        TestCommandLine.Outcome o = badRun("--field", "mirror", "--energy", "1e9");
        assertTrue(o.err().contains("energy: 1.000e+09 eV gives eps = rho0/L = 11.31"), o.err());
        assertTrue(o.err().contains("must be < 1"), o.err());
    }

    @Test
    void tooFewStepsAndBadDurationUnitAreRefused() {
        TestCommandLine.Outcome o = badRun("--steps-per-gyro", "3");
        assertTrue(o.err().contains("steps-per-gyro: must lie in [4, 1000000], got 3"), o.err());
        TestCommandLine.Outcome u = badRun("--duration-unit", "fortnights");
        assertTrue(u.err().contains("duration-unit: unknown duration unit 'fortnights'; allowed: gyroperiods, bounces, crossings"), u.err());
    }

    @Test
    void malformedYamlNamesLineAndColumn() throws IOException {
        Path f = tmp.resolve("case.yaml");
        Files.writeString(f, "field: mirror\npitch: [60\nenergy: 1000\n");
        TestCommandLine.Outcome o = badRun("--case", f.toString());
        assertTrue(o.err().matches("(?s).*case\\.yaml: line \\d+, column \\d+: .*"), o.err());
    }

    @Test
    void unknownYamlKeyListsTheKeys() throws IOException {
        Path f = tmp.resolve("case.yaml");
        Files.writeString(f, "field: mirror\npitch: 60\nenergie: 1000\n");
        TestCommandLine.Outcome o = badRun("--case", f.toString());
        assertTrue(o.err().contains("case.yaml: line 3, column 1: unknown key 'energie'; allowed keys: name, field,"),
                o.err());
    }

    @Test
    void yamlCaseRunsAndOptionsOverrideIt() throws IOException {
        Path f = tmp.resolve("case.yaml");
        Files.writeString(f, "field: mirror\nspecies: proton\neps: 0.02\npitch: 70\nphases: 2\nduration: 6\n"
                + "pushers: [boris]\ngc-integrators: [gc-rk4]\n");
        TestCommandLine.Outcome o = TestCommandLine.exec("run", "--quiet", "--case", f.toString(), "--pitch", "80");
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("field mirror, proton") && o.out().contains("pitch 80 deg"), o.out());
        assertTrue(o.out().contains("boris") && o.out().contains("gc-reference"), o.out());
    }

    @Test
    void unusableOutputDirectoryIsRefusedBeforeAnyWork() throws IOException {
        Path file = tmp.resolve("a-file");
        Files.writeString(file, "not a directory");
        TestCommandLine.Outcome o = TestCommandLine.exec("suite", "--quick", "--quiet", "--out", file.resolve("sub").toString());
        assertEquals(2, o.code(), o.err());
        assertTrue(o.err().startsWith("twinorbit: --out: cannot create directory"), o.err());
        assertEquals("", o.out());
    }

    @Test
    void integratorsListsEveryIntegrator() {
        TestCommandLine.Outcome o = TestCommandLine.exec("integrators", "--json");
        assertEquals(0, o.code());
        for (String name : new String[] {"\"boris\"", "\"boris-newtonian\"", "\"vay\"", "\"higuera-cary\"", "\"rk4\"", "\"gc-rk4\""}) {
            assertTrue(o.out().contains("\"name\" : " + name), name);
        }
        assertTrue(o.out().contains("\"model\" : \"guiding-center\""));
    }

    /** The name of release 0.1 still works for one release, with a warning naming the new one. */
    @Test
    void deprecatedPusherNameStillRunsWithAWarning() {
        TestCommandLine.Outcome o = TestCommandLine.exec("run", "--field", "uniform", "--phases", "1", "--duration", "2",
                "--pushers", "boris-nr", "--gc-integrators", "none", "--quiet");
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("boris-newtonian "), o.out());
    }
}
