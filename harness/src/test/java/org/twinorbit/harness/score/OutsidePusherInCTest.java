package org.twinorbit.harness.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;

/**
 * The C example (examples/c-boris) as a real outside code: built with the machine's C compiler,
 * fed an exported case, its trajectories scored. It performs the same IEEE 754 operations in the
 * same order as the built-in relativistic Boris, compiled without contraction into fused
 * multiply-adds (Java's arithmetic is strict IEEE 754 since Java 17, JEP 306; sqrt is correctly
 * rounded in both), so its scores must equal {@code run --pushers boris} on the same case to
 * round-off: 1e-12 relative, and 1e-14 absolute for quantities that are themselves round-off
 * (an energy error of 1e-15).
 */
class OutsidePusherInCTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path tmp;

    private static String compiler() {
        for (String cc : List.of("cc", "gcc")) {
            try {
                Process p = new ProcessBuilder(cc, "--version").redirectErrorStream(true).start();
                p.getInputStream().readAllBytes();
                if (p.waitFor(30, TimeUnit.SECONDS) && p.exitValue() == 0) {
                    return cc;
                }
            } catch (IOException | InterruptedException e) {
                // try the next name
            }
        }
        return null;
    }

    private static void exec(Path dir, String... cmd) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(cmd).directory(dir.toFile()).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes());
        assertEquals(0, p.waitFor(), String.join(" ", cmd) + ": " + out);
    }

    @Test
    void theCBorisScoresLikeTheBuiltInBoris() throws IOException, InterruptedException {
        String cc = compiler();
        assumeTrue(cc != null, "no C compiler on this machine");
        Path source = Path.of("..", "examples", "c-boris", "boris_gradient.c").toAbsolutePath();
        Path binary = tmp.resolve("boris_gradient");
        exec(tmp, cc, "-O2", "-ffp-contract=off", "-o", binary.toString(), source.toString(), "-lm");
        String[] options = {"--field", "gradient", "--eps", "0.05", "--pitch", "60", "--phases", "4", "--duration", "20"};
        String[] export = new String[options.length + 3];
        export[0] = "export";
        System.arraycopy(options, 0, export, 1, options.length);
        export[options.length + 1] = "--out";
        export[options.length + 2] = tmp.toString();
        TestCommandLine.succeeded(export);
        Path dir = tmp.resolve("gradient-proton");
        exec(tmp, binary.toString(), dir.toString());
        JsonNode scored = JSON.readTree(TestCommandLine.succeeded("score", "--export", dir.toString(), "--name", "c-boris",
                "--order", "2", "--property", "relativistic", "--property", "time-reversible", "--property",
                "volume-preserving", "--quiet", "--json"));
        String[] run = new String[options.length + 7];
        run[0] = "run";
        System.arraycopy(options, 0, run, 1, options.length);
        System.arraycopy(new String[] {"--pushers", "boris", "--gc-integrators", "gc-rk4", "--quiet", "--json"}, 0, run,
                options.length + 1, 6);
        JsonNode builtIn = JSON.readTree(TestCommandLine.succeeded(run));
        JsonNode a = null;
        JsonNode b = null;
        for (JsonNode r : scored.get("results")) {
            a = r.get("integrator").asText().equals("c-boris") ? r : a;
        }
        for (JsonNode r : builtIn.get("results")) {
            b = r.get("integrator").asText().equals("boris") ? r : b;
        }
        for (String metric : List.of("mu_change", "mu_jump", "energy_error", "phase_error", "drift_error",
                "position_error_rho")) {
            for (String st : List.of("mean", "rms", "worst")) {
                double x = a.get(metric).get(st).asDouble();
                double y = b.get(metric).get(st).asDouble();
                assertEquals(y, x, 1e-12 * Math.abs(y) + 1e-14, metric + " " + st);
            }
        }
        assertEquals(b.get("order").asDouble(), a.get("order").asDouble(), 1e-9);
        assertEquals("pass", a.get("verdict").get("result").asText());
        assertEquals(Files.readAllLines(dir.resolve("runs.csv")).size() - 1, 4);
    }
}
