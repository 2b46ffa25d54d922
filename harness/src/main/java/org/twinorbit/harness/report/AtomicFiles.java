package org.twinorbit.harness.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes result files atomically: the bytes go to a temporary file in the same directory, which
 * is then moved over the target in one step, so an interrupted run never leaves a half-written
 * table (DESIGN.md "Bad input").
 */
public final class AtomicFiles {

    private AtomicFiles() {}

    public static void write(Path target, String text) {
        write(target, text.getBytes(StandardCharsets.UTF_8));
    }

    public static void write(Path target, byte[] bytes) {
        Path dir = target.toAbsolutePath().getParent();
        Path tmp = null;
        try {
            Files.createDirectories(dir);
            tmp = Files.createTempFile(dir, "." + target.getFileName() + ".", ".tmp");
            Files.write(tmp, bytes);
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            tmp = null;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + target + ": " + e.getMessage(), e);
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // the original failure is the one worth reporting
                }
            }
        }
    }
}
