package org.twinorbit.harness.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.UUID;

/**
 * Writes result files atomically: the bytes go to a temporary file in the same directory, which
 * is then moved over the target in one step, so an interrupted run never leaves a half-written
 * table (docs/design.md "Bad input").
 */
public final class AtomicFiles {

    private AtomicFiles() {}

    /** Writes {@code text} as UTF-8 to {@code target}, creating parent directories. */
    public static void write(Path target, String text) {
        write(target, text.getBytes(StandardCharsets.UTF_8));
    }

    /** Writes {@code bytes} to {@code target}, creating parent directories. */
    public static void write(Path target, byte[] bytes) {
        Path dir = target.toAbsolutePath().getParent();
        Path tmp = null;
        try {
            Files.createDirectories(dir);
            // a plain name, not createTempFile, so that the file gets the usual permissions (not 0600)
            tmp = dir.resolve("." + target.getFileName() + "." + UUID.randomUUID() + ".tmp");
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
