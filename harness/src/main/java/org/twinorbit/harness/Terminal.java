package org.twinorbit.harness;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Whether a standard stream reaches a terminal. Escape sequences — the progress bars' colours
 * and redraws, coloured help — go only to a terminal: redirected into a file or a pipe they are
 * noise ({@code suite 2>err.txt} must give a plain file).
 *
 * <p>Java 17 has no test for one stream ({@link System#console()} needs stdin and stdout both
 * interactive and says nothing of stderr), so on Linux the link {@code /proc/self/fd/N} is read:
 * a terminal is a {@code /dev/pts/*} or {@code /dev/tty*} device. Elsewhere the console test
 * stands in. {@code TERM=dumb} counts as no terminal.
 */
public final class Terminal {

    public static final int STDOUT = 1;
    public static final int STDERR = 2;

    private static final Path FDS = Path.of("/proc/self/fd");

    private Terminal() {}

    /** @param fd {@link #STDOUT} or {@link #STDERR} */
    public static boolean isTerminal(int fd) {
        if ("dumb".equals(System.getenv("TERM"))) {
            return false;
        }
        if (!Files.isDirectory(FDS)) {
            return System.console() != null;
        }
        try {
            return isTerminalDevice(Files.readSymbolicLink(FDS.resolve(Integer.toString(fd))).toString());
        } catch (IOException | UnsupportedOperationException | SecurityException e) {
            return false; // closed or unreadable: certainly nobody watching
        }
    }

    /** True for the path of a terminal device, false for a file, pipe, socket or /dev/null. */
    static boolean isTerminalDevice(String target) {
        return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty") || target.equals("/dev/console");
    }
}
