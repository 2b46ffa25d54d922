package org.twinorbit.harness.report;

import org.twinorbit.harness.TestCommandLine;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Writing the reports twice with the same tool gives the same bytes, plots included: no file
 * but timings.md has a wall-clock time, so committed results stay put when regenerated.
 */
class ReproducibleReportsTest {

    @TempDir
    Path tmp;

    private static String exec(String... args) {
        return TestCommandLine.succeeded(args);
    }

    /** Runs {@code args --out DIR} into two directories and compares every file but timings.md. */
    private void assertSameBytesTwice(String... args) throws IOException {
        Path a = tmp.resolve("a");
        Path b = tmp.resolve("b");
        for (Path dir : List.of(a, b)) {
            String[] full = java.util.Arrays.copyOf(args, args.length + 2);
            full[args.length] = "--out";
            full[args.length + 1] = dir.toString();
            exec(full);
        }
        List<Path> files = files(a);
        assertEquals(files, files(b), "the same files");
        assertTrue(files.contains(Path.of(Timings.FILE_NAME)), "timings.md is written: " + files);
        for (Path f : files) {
            if (f.getFileName().toString().equals(Timings.FILE_NAME)) {
                continue;
            }
            assertArrayEquals(Files.readAllBytes(a.resolve(f)), Files.readAllBytes(b.resolve(f)), f + " differs");
            if (!f.toString().endsWith(".png")) {
                String text = Files.readString(a.resolve(f));
                assertFalse(text.contains("wall"), f + " mentions a wall time");
            }
        }
        String timings = Files.readString(a.resolve(Timings.FILE_NAME));
        assertTrue(java.util.regex.Pattern.compile("[0-9]+\\.[0-9]+ s").matcher(timings).find(),
                "timings.md has the times: " + timings);
    }

    private static List<Path> files(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.filter(Files::isRegularFile).map(dir::relativize).sorted().toList();
        }
    }

    @Test
    void runReportsAreTheSameBytesTwice() throws IOException {
        assertSameBytesTwice("run", "--quiet", "--field", "mirror", "--eps", "0.03", "--pitch", "60", "--phases", "3",
                "--duration", "1", "--duration-unit", "bounces", "--pushers", "boris,rk4");
    }

    @Test
    void scanReportsAreTheSameBytesTwice() throws IOException {
        assertSameBytesTwice("scan", "--quiet", "--field", "gradient", "--points", "2", "--phases", "2");
    }

    @Test
    void theTerminalTableOfRunStillShowsTheWallTime() {
        String out = exec("run", "--quiet", "--field", "uniform", "--energy", "1e4", "--phases", "2", "--duration", "2",
                "--pushers", "boris");
        assertTrue(out.lines().anyMatch(l -> l.startsWith("integrator") && l.endsWith("wall s")), out);
    }
}
