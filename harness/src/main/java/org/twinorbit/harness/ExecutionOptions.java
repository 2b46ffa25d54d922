package org.twinorbit.harness;

import picocli.CommandLine.Option;

/** How work runs, shared by run, suite and scan: threads and the progress bar. */
public final class ExecutionOptions {

    @Option(names = "--threads", paramLabel = "N",
            description = "Worker threads (default: all available cores); the results do not depend on it.")
    Integer threads;

    @Option(names = {"-q", "--quiet"}, description = "No progress bar on stderr (there is none anyway when stderr "
            + "is not a terminal).")
    boolean quiet;

    /** The thread count, all cores by default. @throws IllegalArgumentException below 1 */
    public int threads() {
        int t = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        if (t < 1 || t > 1024) {
            throw new IllegalArgumentException("--threads: must lie in [1, 1024], got " + t);
        }
        return t;
    }

    /**
     * True for {@code --quiet}, and whenever stderr is not a terminal: the progress bars redraw
     * with escape sequences, which must not end up in a redirected file ({@link Terminal}).
     */
    public boolean quiet() {
        return quiet || !Terminal.isTerminal(Terminal.STDERR);
    }
}
