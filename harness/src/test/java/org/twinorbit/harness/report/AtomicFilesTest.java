package org.twinorbit.harness.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Result files are replaced in one step and no temporary file is left behind. */
class AtomicFilesTest {

    @TempDir
    Path dir;

    @Test
    void replacesTheFileWholeAndLeavesNoTemporary() throws IOException {
        Path f = dir.resolve("validation.md");
        AtomicFiles.write(f, "first version\n");
        AtomicFiles.write(f, "second\n");
        assertEquals("second\n", Files.readString(f));
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(1, s.count(), "only the target remains");
        }
    }

    @Test
    void aFailedWriteLeavesTheOldFileIntact() throws IOException {
        Path f = dir.resolve("run.json");
        AtomicFiles.write(f, "{\"old\": true}\n");
        // a directory in the way of the move makes the write fail after the temporary was written
        Path blocked = dir.resolve("blocked");
        Files.createDirectories(blocked.resolve("child"));
        assertThrows(UncheckedIOException.class, () -> AtomicFiles.write(blocked, "new"));
        assertEquals("{\"old\": true}\n", Files.readString(f));
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(2, s.count(), "no temporary file left: " + dir);
        }
    }
}
