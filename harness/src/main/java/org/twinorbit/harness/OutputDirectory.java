package org.twinorbit.harness;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** The directory a command writes into, made (and checked) before any work runs. */
final class OutputDirectory {

    private OutputDirectory() {}

    /** @throws BadInputException naming the option when the directory cannot be made or written */
    public static Path prepare(Path dir) {
        if (dir.toString().isBlank()) {
            throw new BadInputException("--out: give a directory (an empty --out= would write into the current one)");
        }
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new BadInputException("--out: cannot create directory " + dir + " (" + e.getMessage() + ")", e);
        }
        if (!Files.isWritable(dir)) {
            throw new BadInputException("--out: directory " + dir + " is not writable");
        }
        return dir;
    }
}
