package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;
import org.twinorbit.harness.TwinorbitCommand;
import picocli.CommandLine;

/** scan's refusals name the option and what is allowed, as run's do; --resume compares resolved settings. */
class ScanOptionMessagesTest {

    @TempDir
    Path tmp;

    private void refused(String expected, String... args) {
        TestCommandLine.Outcome o = TestCommandLine.exec(args);
        assertEquals(2, o.code(), String.join(" ", args) + ": " + o.out() + o.err());
        assertTrue(o.err().contains(expected), "expected '" + expected + "' in: " + o.err());
        assertFalse(o.err().contains("Exception"), o.err());
    }

    @Test
    void aBadFieldParameterOrSpeciesIsNamed() {
        String out = tmp.toString();
        refused("--field: unknown field 'bottle'; allowed: uniform", "scan", "--field", "bottle", "--out", out);
        refused("--field-param: unknown parameter 'Xx' for field 'mirror'; valid parameters: B0", "scan", "--field",
                "mirror", "-P", "Xx=3", "--out", out);
        refused("--species: unknown species 'muon'; allowed: electron", "scan", "--field", "mirror", "--species", "muon",
                "--out", out);
    }

    /** 1e300 eV used to reach the kinematics and come back as "mu must be finite". */
    @Test
    void anAbsurdEnergyIsRefusedWithTheAllowedRange() {
        refused("--energy", "scan", "--field", "ramp", "--energy", "1e300", "--out", tmp.toString());
        refused("at most 1e+21 eV", "scan", "--field", "ramp", "--energy", "1e300", "--out", tmp.toString());
        refused("--energy-min", "scan", "--field", "mirror", "--energy-min", "1e300", "--out", tmp.toString());
        refused("--energy", "run", "--field", "uniform", "--energy", "1e300", "--out", tmp.toString());
        refused("at most 1e+21 eV", "run", "--field", "uniform", "--energy", "1e300", "--out", tmp.toString());
    }

    /** -P Lg=1 gives the gradient length its default: the same scan as without it. */
    @Test
    void resumeComparesResolvedParametersNotWhichOptionsWereGiven() {
        Path same = interrupted("same");
        TestCommandLine.Outcome o = TestCommandLine.exec("scan", "--field", "gradient", "--points", "2", "--phases", "2",
                "--quiet", "--out", same.toString(), "--resume", "-P", "Lg=1");
        assertEquals(0, o.code(), o.err());
        refused("different settings", "scan", "--field", "gradient", "--points", "2", "--phases", "2", "--quiet",
                "--out", interrupted("other").toString(), "--resume", "-P", "Lg=2");
    }

    /** The partial results of a scan without -P, interrupted after one point. */
    private Path interrupted(String name) {
        Path out = tmp.resolve(name);
        String[] plain = {"scan", "--field", "gradient", "--points", "2", "--phases", "2", "--quiet", "--out", out.toString()};
        CommandLine.ParseResult parsed = TwinorbitCommand.commandLine().parseArgs(plain);
        BreakdownScan s = ((ScanCommand) parsed.subcommand().commandSpec().userObject()).setup().scan();
        Map<String, Double> metrics = new java.util.TreeMap<>();
        for (ScanMetric m : ScanMetric.values()) {
            for (String summary : new String[] {"_mean", "_rms", "_worst"}) {
                metrics.put(m.key() + summary, 0.0);
            }
        }
        ScanCheckpoint.open(out, s, false).add(new ScanPoint(s.eps()[0], 1e3, s.pitches().get(0), metrics));
        return out;
    }
}
