package org.twinorbit.harness.scan;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.UUID;

/**
 * Writes a file so that readers see either the old content or the new one, never half of it
 * (DESIGN.md "Bad input": an interrupted run never leaves a half-written table): the bytes go to a
 * temporary file in the same directory, which is then moved over the target.
 */
final class AtomicFiles {

    private AtomicFiles() {}

    /** Writes {@code text} as UTF-8 to {@code target}, creating parent directories. */
    static void writeString(Path target, String text) {
        write(target, text.getBytes(StandardCharsets.UTF_8));
    }

    /** Writes {@code bytes} to {@code target}, creating parent directories. */
    static void write(Path target, byte[] bytes) {
        try {
            Path dir = target.toAbsolutePath().getParent();
            Files.createDirectories(dir);
            // a plain name, not createTempFile, so that the file gets the usual permissions
            Path tmp = dir.resolve("." + target.getFileName() + "." + UUID.randomUUID() + ".tmp");
            try {
                Files.write(tmp, bytes);
                try {
                    Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
                } catch (AtomicMoveNotSupportedException e) {
                    Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
                }
            } finally {
                Files.deleteIfExists(tmp);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + target + ": " + e.getMessage(), e);
        }
    }
}
