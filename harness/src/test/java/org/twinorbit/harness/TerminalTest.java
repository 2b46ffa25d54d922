package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * No escape sequence reaches a stream that is not a terminal. Under the test runner stdout and
 * stderr are pipes, as in {@code twinorbit suite 2>err.txt >out.txt}. Software behaviour only,
 * no physics values (escape sequences only for a terminal is common practice).
 */
class TerminalTest {

    private static final byte ESC = 0x1b;

    @TempDir
    Path tmp;

    @Test
    void devicesAreToldFromFilesAndPipes() {
        assertTrue(Terminal.isTerminalDevice("/dev/pts/3"));
        assertTrue(Terminal.isTerminalDevice("/dev/tty1"));
        assertFalse(Terminal.isTerminalDevice("pipe:[48213]"));
        assertFalse(Terminal.isTerminalDevice("/tmp/err.txt"));
        assertFalse(Terminal.isTerminalDevice("/dev/null"));
        assertFalse(Terminal.isTerminalDevice("socket:[1234]"));
    }

    @Test
    void theTestRunnersStreamsAreNoTerminal() {
        assertFalse(Terminal.isTerminal(Terminal.STDERR), "stderr of a forked test JVM is a pipe");
        assertFalse(Terminal.isTerminal(Terminal.STDOUT), "stdout of a forked test JVM is a pipe");
    }

    /** A scan without --quiet: its progress bar would draw on System.err, in colour. */
    @Test
    void noEscapeBytesWithoutQuietOnARedirectedStream() {
        ByteArrayOutputStream errBytes = new ByteArrayOutputStream();
        ByteArrayOutputStream outBytes = new ByteArrayOutputStream();
        PrintStream err = System.err;
        PrintStream out = System.out;
        StringWriter cliOut = new StringWriter();
        StringWriter cliErr = new StringWriter();
        int code;
        try {
            System.setErr(new PrintStream(errBytes, true, StandardCharsets.UTF_8));
            System.setOut(new PrintStream(outBytes, true, StandardCharsets.UTF_8));
            CommandLine cl = TwinorbitCommand.commandLine();
            cl.setOut(new PrintWriter(cliOut));
            cl.setErr(new PrintWriter(cliErr));
            code = cl.execute("scan", "--field", "gradient", "--points", "2", "--phases", "2", "--out",
                    tmp.toString());
            // a usage error prints the usage on stderr: plain as well
            cl.execute("run", "--no-such-option");
        } finally {
            System.setErr(err);
            System.setOut(out);
        }
        assertEquals(0, code, cliErr.toString());
        assertNoEscape(errBytes.toByteArray(), "System.err");
        assertNoEscape(outBytes.toByteArray(), "System.out");
        assertNoEscape(cliOut.toString().getBytes(StandardCharsets.UTF_8), "stdout");
        assertNoEscape(cliErr.toString().getBytes(StandardCharsets.UTF_8), "stderr");
        assertTrue(cliErr.toString().contains("Usage: twinorbit run"), cliErr.toString());
    }

    private static void assertNoEscape(byte[] bytes, String stream) {
        for (byte b : bytes) {
            assertFalse(b == ESC, stream + " has an escape sequence: " + new String(bytes, StandardCharsets.UTF_8));
        }
    }
}
