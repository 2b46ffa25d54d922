package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** Bad input is refused before any orbit runs, with a message naming the option and what is allowed. */
class ScanCommandInputTest {

    private static String refused(String... args) {
        return assertThrows(IllegalArgumentException.class, () -> ScanTestSupport.setup(args)).getMessage();
    }

    /** Any reported metric can be thresholded when asked for, mu_change (ripple included) too. */
    @Test
    void muChangeCanBeThresholdedWhenNamed() {
        ScanRequest.Built b = ScanTestSupport.setup("--field", "mirror", "--tolerance", "mu_change=0.1,0.2");
        assertEquals(java.util.List.of(0.1, 0.2), b.scan().tolerances().get(ScanMetric.MU_CHANGE));
        ScanRequest.Built d = ScanTestSupport.setup("--field", "mirror");
        assertFalse(d.scan().tolerances().containsKey(ScanMetric.MU_CHANGE), "not thresholded by default");
    }

    @Test
    void messagesNameTheOptionAndTheAllowedValues() {
        assertTrue(refused("--field", "nowhere").contains("allowed: uniform, crossed, gradient"));
        assertTrue(refused("--field", "mirror", "--species", "muon").contains("allowed: electron, positron, proton"));
        assertTrue(refused("--field", "mirror", "--pitch", "200").contains("--pitch must lie in [0, 180]"));
        assertTrue(refused("--field", "mirror", "--eps-max", "1.5").contains("below 1"));
        assertTrue(refused("--field", "mirror", "--eps-min", "0").contains("--eps-min must be in (0, 1)"));
        assertTrue(refused("--field", "mirror", "--points", "1").contains("--points must be at least 2"));
        assertTrue(refused("--field", "mirror", "--phases", "0").contains("--phases must lie in [1, 1024]"));
        assertTrue(refused("--field", "mirror", "--tolerance", "speed=1")
                .contains("--tolerance: unknown metric 'speed'; allowed: mu_jump, mu_change, drift_error"));
        assertTrue(refused("--field", "mirror", "--tolerance", "mu_jump=-1").contains("must be a finite number >= 0"));
        assertTrue(refused("--field", "uniform").contains("has no length L"));
        assertTrue(refused("--field", "mirror", "--energy", "1000").contains("--energy applies to ramp and wave only"));
        assertTrue(refused("--field", "mirror", "--duration-unit", "furlongs")
                .contains("allowed: gyroperiods, bounces, crossings, field-periods"));
        assertTrue(refused("--field", "mirror", "--duration-unit", "crossings").contains("needs a field with a current sheet"));
        assertTrue(refused("--field", "current-sheet", "--duration-unit", "crossings").contains("the start lies on the sheet"));
        assertTrue(refused("--field", "current-sheet", "--duration-unit", "crossings", "--start", "0,0,1e7",
                "--duration", "1.5").contains("whole numbers"));
        assertTrue(refused("--field", "mirror", "--statistic", "median")
                .contains("--statistic: unknown statistic 'median'; allowed: worst, mean, rms"));
        assertTrue(refused("--field", "gradient", "--duration-unit", "field-periods").contains("needs a time-dependent field"));
        assertTrue(refused("--field", "mirror", "--field-param", "Rm=0.5").contains("'Rm'"));
        assertTrue(refused("--field", "mirror", "--integrators", "euler").contains("--pushers/--gc-integrators: unknown integrator 'euler'; allowed: "));
        assertTrue(refused("--field", "mirror", "--pushers", "euler").contains("unknown integrator 'euler'"));
        assertTrue(refused("--field", "mirror", "--start", "0,0,2").contains("outside the domain"));
        assertTrue(refused("--field", "ramp", "--field-param", "tau_periods=5").contains("the scan sets it from eps"));
        assertTrue(refused("--field", "wave", "--eps-max", "0.9995").contains("cyclotron resonance"));
        assertTrue(refused("--field", "mirror", "--reference-rtol", "1e-3").contains("--reference-rtol"));
        assertTrue(refused("--field", "mirror", "--threads", "0").contains("--threads"));
    }

    @Test
    void twinorbitScanMapsBadInputToExitTwo(@TempDir Path dir) {
        Path out = dir.resolve("never");
        StringWriter err = new StringWriter();
        CommandLine cl = org.twinorbit.harness.TwinorbitCommand.commandLine();
        cl.setErr(new PrintWriter(err));
        assertEquals(2, cl.execute("scan", "--field", "uniform", "--out", out.toString()));
        assertTrue(err.toString().contains("has no length L"), err.toString());
        assertFalse(Files.exists(out), "no output may be written for bad input");
        StringWriter help = new StringWriter();
        cl.setOut(new PrintWriter(help));
        assertEquals(0, cl.execute("scan", "--help"));
        assertTrue(help.toString().contains("--tolerance"), help.toString());
    }

    @Test
    void exitCodeTwoAndNothingWritten(@TempDir Path dir) throws java.io.IOException {
        Path out = dir.resolve("never");
        StringWriter err = new StringWriter();
        CommandLine cl = new CommandLine(new ScanCommand());
        cl.setErr(new PrintWriter(err));
        // the policy of the twinorbit command line (UserErrorHandler): a user mistake is exit code 2
        cl.setExecutionExceptionHandler((ex, c, parsed) -> {
            c.getErr().println(ex.getMessage());
            return ex instanceof IllegalArgumentException ? 2 : 1;
        });
        assertEquals(2, cl.execute("--field", "mirror", "--pitch", "-5", "--out", out.toString()));
        assertTrue(err.toString().contains("--pitch"), err.toString());
        assertEquals(2, cl.execute("--field", "mirror", "--points", "many", "--out", out.toString()));
        assertEquals(2, cl.execute("--safe-use", "--field", "mirror", "--out", out.toString()));
        assertFalse(Files.exists(out), "no output may be written for bad input");
        Path file = dir.resolve("a-file");
        Files.writeString(file, "not a directory");
        assertEquals(2, cl.execute("--field", "mirror", "--out", file.resolve("sub").toString()));
        assertTrue(err.toString().contains("--out: cannot create directory"), err.toString());
    }
}
