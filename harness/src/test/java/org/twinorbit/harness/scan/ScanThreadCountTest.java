package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A real scan gives byte-identical JSON on one thread and on two (two points at once, each on two threads). */
class ScanThreadCountTest {

    @Test
    void sameJsonForAnyThreadCount(@TempDir Path dir) throws IOException {
        String[] args = {"--field", "gradient", "--points", "3", "--phases", "3", "--eps-min", "0.01", "--eps-max", "0.1"};
        for (int threads : new int[] {1, 2}) {
            ScanRequest.Built b = ScanTestSupport.setup(concat(args, "--threads", Integer.toString(threads)));
            b.scan().run(b.evaluator(), dir.resolve("t" + threads), false, threads, ScanProgress.NONE);
        }
        assertEquals(Files.readString(dir.resolve("t1/scan.json")), Files.readString(dir.resolve("t2/scan.json")));
    }

    private static String[] concat(String[] a, String... b) {
        String[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }
}
