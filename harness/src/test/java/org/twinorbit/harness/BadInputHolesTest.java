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
 * Inputs that used to crash or pass silently (the project's bad-input rules, docs/design.md):
 * each is refused with exit 2 and a message naming the option, and nothing is written. Software
 * behaviour only, no physics values (exit code 2 for usage errors is common practice, as in
 * picocli's own examples).
 */
class BadInputHolesTest {

    @TempDir
    Path tmp;

    private static void refused(String expected, String... args) {
        TestCommandLine.Outcome o = TestCommandLine.exec(args);
        assertEquals(2, o.code(), String.join(" ", args) + ": " + o.out() + o.err());
        assertTrue(o.err().contains(expected), "expected '" + expected + "' in: " + o.err());
        assertFalse(o.err().contains("Exception"), o.err());
    }

    @Test
    void caseFilesThatAreNotSmallTextAreRefused() throws IOException {
        Path dir = tmp.resolve("dir");
        Files.createDirectories(dir);
        refused("is not a regular file", "run", "--case", dir.toString());
        Path big = tmp.resolve("big.yaml");
        Files.write(big, new byte[2 << 20]);
        refused("a case file is small YAML", "run", "--case", big.toString());
        Path binary = tmp.resolve("bin.yaml");
        Files.write(binary, new byte[] {(byte) 0xff, (byte) 0xfe, (byte) 0xc3, 0x28, 0x41});
        refused("is not UTF-8 text", "run", "--case", binary.toString());
    }

    @Test
    void aKeyOrANameGivenTwiceIsRefused() throws IOException {
        Path dup = tmp.resolve("dup.yaml");
        Files.writeString(dup, "field: mirror\neps: 0.05\nfield: dipole\n");
        refused("line 3, column 6: Duplicate field 'field'", "run", "--case", dup.toString());
        refused("--field-param: 'Rm' is given twice", "run", "--field", "mirror", "-P", "Rm=3", "-P", "Rm=5");
        refused("--field-param: 'Rm' is given twice", "scan", "--field", "mirror", "-P", "Rm=3", "-P", "Rm=5", "--out",
                tmp.toString());
        refused("--tolerance: 'drift_error' is given twice", "scan", "--field", "mirror", "--tolerance",
                "drift_error=0.1", "--tolerance", "drift_error=0.2", "--out", tmp.toString());
        refused("'Rm' is not NAME=VALUE", "probe", "--field", "mirror", "-P", "Rm", "--at", "0,0,0");
    }

    @Test
    void anEmptyOutIsRefusedAndWritesNothing() {
        refused("--out: give a directory", "run", "--field", "uniform", "--out=");
        refused("--out: give a directory", "scan", "--field", "mirror", "--out=");
        assertFalse(Files.exists(Path.of("scan.md")), "nothing written into the working directory");
    }

    /** Work far beyond anything intended is estimated and refused before it starts. */
    @Test
    void hugeWorkIsRefusedWithoutAllowLong() {
        long t0 = System.nanoTime();
        refused("--allow-long", "run", "--field", "uniform", "--duration", "1e7");
        refused("beyond the 1000 a scan runs without --allow-long", "scan", "--field", "mirror", "--points", "100000",
                "--out", tmp.toString());
        assertTrue((System.nanoTime() - t0) * 1e-9 < 30, "refused before any orbit ran");
    }

    /** A bounce count on a field whose orbits never mirror would silently run gyroperiods instead. */
    @Test
    void bouncesOnAFieldWithoutBouncesAreRefused() {
        refused("orbits in field 'gradient' do not bounce", "scan", "--field", "gradient", "--duration-unit", "bounces",
                "--out", tmp.toString());
    }
}
