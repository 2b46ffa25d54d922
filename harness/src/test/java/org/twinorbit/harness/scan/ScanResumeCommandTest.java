package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;

/** {@code scan --resume} at the command line: a finished directory, a damaged or empty partial file. */
class ScanResumeCommandTest {

    private static String[] scan(Path out, String... more) {
        String[] base = {"scan", "--field", "gradient", "--points", "3", "--phases", "2", "--duration", "5", "-q",
                "--out", out.toString()};
        String[] all = new String[base.length + more.length];
        System.arraycopy(base, 0, all, 0, base.length);
        System.arraycopy(more, 0, all, base.length, more.length);
        return all;
    }

    @Test
    void resumeOnAFinishedDirectoryDoesNothing(@TempDir Path dir) throws IOException {
        TestCommandLine.succeeded(scan(dir));
        byte[] json = Files.readAllBytes(dir.resolve("scan.json"));
        long modified = Files.getLastModifiedTime(dir.resolve("scan.json")).toMillis();
        TestCommandLine.Outcome o = TestCommandLine.exec(scan(dir, "--resume"));
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("holds this scan finished (scan.json, scan.csv, scan.md, scan.png)"), o.out());
        assertTrue(o.out().contains("nothing to resume"), o.out());
        assertArrayEquals(json, Files.readAllBytes(dir.resolve("scan.json")));
        assertEquals(modified, Files.getLastModifiedTime(dir.resolve("scan.json")).toMillis(), "rewritten");

        // other settings: refused rather than replaced under --resume
        TestCommandLine.Outcome other = TestCommandLine.exec(scan(dir, "--resume", "--pitch", "80"));
        assertEquals(2, other.code(), other.out());
        assertTrue(other.err().contains("holds a finished scan made with different settings"), other.err());
    }

    @Test
    void damagedPartialResultsAreRefusedWithExitTwo(@TempDir Path dir) throws IOException {
        TestCommandLine.succeeded(scan(dir));
        // scan.json holds the settings and points the partial file holds: make it a partial file
        ObjectNode root = (ObjectNode) ScanJson.MAPPER.readTree(dir.resolve("scan.json").toFile());
        ((ObjectNode) root.get("points").get(1)).remove(ScanMetric.DRIFT_ERROR.worstKey());
        Path partial = dir.resolve(ScanCheckpoint.FILE_NAME);
        Files.writeString(partial, ScanJson.write(root));
        Files.delete(dir.resolve("scan.json"));
        TestCommandLine.Outcome o = TestCommandLine.exec(scan(dir, "--resume"));
        assertEquals(2, o.code(), o.err());
        assertTrue(o.err().startsWith("twinorbit: --resume: the partial results " + partial + " are damaged: point 2 of 3"),
                o.err());
        assertTrue(o.err().contains("has no 'drift_error_worst'"), o.err());
        assertFalse(o.err().contains("Exception"), o.err());
        assertFalse(Files.exists(dir.resolve("scan.json")), "nothing computed");
    }

    @Test
    void emptyPartialResultsGetTheirOwnMessage(@TempDir Path dir) throws IOException {
        Files.createDirectories(dir);
        Path partial = dir.resolve(ScanCheckpoint.FILE_NAME);
        Files.writeString(partial, "");
        TestCommandLine.Outcome o = TestCommandLine.exec(scan(dir, "--resume"));
        assertEquals(2, o.code(), o.err());
        assertTrue(o.err().contains(partial + " are an empty file"), o.err());
        assertFalse(o.err().contains("saved: null"), o.err());
    }
}
