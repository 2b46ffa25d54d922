package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The tool as a user runs it with {@code > out.txt 2> err.txt}: a separate process whose stdout
 * and stderr are files. Not one escape byte may reach either file, the first byte included, even
 * with a colour-capable TERM. Software behaviour only, no physics values (escape sequences only
 * for a terminal is common practice of command-line tools).
 */
class RedirectedOutputTest {

    private static final byte ESC = 0x1b;

    @TempDir
    Path tmp;

    @Test
    void noEscapeByteInRedirectedOutput() throws Exception {
        String out = tmp.resolve("results").toString();
        String[][] commands = {
            {"--help"},
            {"scan", "--help"},
            {"fields"},
            {"run", "--no-such-option"},
            {"run", "--field", "uniform", "--duration", "5", "--phases", "2", "--pushers", "boris", "--gc-integrators",
                "gc-rk4", "--out", out},
            {"scan", "--field", "gradient", "--points", "2", "--phases", "2", "--out", out},
        };
        int[] codes = {0, 0, 0, 2, 0, 0};
        for (int i = 0; i < commands.length; i++) {
            Path stdout = tmp.resolve("out" + i + ".txt");
            Path stderr = tmp.resolve("err" + i + ".txt");
            int code = run(commands[i], stdout, stderr);
            String what = String.join(" ", commands[i]);
            assertEquals(codes[i], code, what + ": " + Files.readString(stderr, StandardCharsets.UTF_8));
            assertTrue(Files.size(stdout) + Files.size(stderr) > 0, what + " printed something");
            assertNoEscape(stdout, what);
            assertNoEscape(stderr, what);
        }
    }

    private static int run(String[] args, Path stdout, Path stderr) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.add("-cp");
        cmd.add(System.getProperty("java.class.path"));
        cmd.add(Main.class.getName());
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectOutput(stdout.toFile()).redirectError(stderr.toFile())
                .redirectInput(ProcessBuilder.Redirect.INHERIT);
        pb.environment().put("TERM", "xterm-256color");
        Process p = pb.start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("timed out: " + String.join(" ", args));
        }
        return p.exitValue();
    }

    private static void assertNoEscape(Path file, String what) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        for (int i = 0; i < bytes.length; i++) {
            if (bytes[i] == ESC) {
                throw new AssertionError(what + ": escape byte at offset " + i + " of " + file.getFileName() + ": "
                        + new String(bytes, StandardCharsets.UTF_8));
            }
        }
    }
}
