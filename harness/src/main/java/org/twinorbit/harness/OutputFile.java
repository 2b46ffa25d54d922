package org.twinorbit.harness;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.twinorbit.harness.report.AtomicFiles;

/** A file a command writes, checked before any work runs and written atomically. */
final class OutputFile {

    private OutputFile() {}

    /** @throws BadInputException naming the option when the file cannot be written */
    static void check(Path file, String option) {
        if (Files.isDirectory(file)) {
            throw new BadInputException(option + ": " + file + " is a directory; give a file name");
        }
        Path dir = file.toAbsolutePath().getParent();
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new BadInputException(option + ": cannot create directory " + dir + " (" + e.getMessage() + ")", e);
        }
        if (!Files.isWritable(dir) || (Files.exists(file) && !Files.isWritable(file))) {
            throw new BadInputException(option + ": cannot write " + file + " (not writable)");
        }
    }

    /** @throws BadInputException naming the option when writing fails after all */
    static void write(Path file, String text, String option) {
        try {
            AtomicFiles.write(file, text);
        } catch (UncheckedIOException e) {
            throw new BadInputException(option + ": " + e.getMessage(), e);
        }
    }
}
