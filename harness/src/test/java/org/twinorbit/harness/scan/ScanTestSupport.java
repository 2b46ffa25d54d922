package org.twinorbit.harness.scan;

import java.nio.file.Path;
import picocli.CommandLine;

/** Builds scans from command-line arguments, in-process, for the physics tests. */
final class ScanTestSupport {

    private ScanTestSupport() {}

    /** The checked setup of {@code twinorbit scan ARGS}, nothing computed. */
    static ScanCommand.ScanSetup setup(String... args) {
        ScanCommand cmd = new ScanCommand();
        new CommandLine(cmd).parseArgs(args);
        return cmd.setup();
    }

    /** Runs the scan of {@code ARGS} on 2 threads into {@code out}. */
    static ScanResult run(Path out, String... args) {
        ScanCommand.ScanSetup s = setup(args);
        return s.scan().run(s.evaluator(), out, false, 2, ScanProgress.NONE);
    }

    /** The point of a result at ε (exact match). */
    static ScanPoint point(ScanResult r, double eps) {
        return r.points().stream().filter(p -> p.eps() == eps).findFirst().orElseThrow();
    }
}
