package org.twinorbit.harness.scan;

import java.nio.file.Path;
import picocli.CommandLine;

/** Builds scans from command-line arguments, in-process, for the physics tests. */
final class ScanTestSupport {

    private ScanTestSupport() {}

    /** The checked setup of {@code twinorbit scan ARGS}, nothing computed. */
    static ScanRequest.Built setup(String... args) {
        ScanCommand cmd = new ScanCommand();
        new CommandLine(cmd).parseArgs(args);
        return cmd.setup();
    }

    /** Runs the scan of {@code ARGS} into {@code out}, each point on all cores. */
    static ScanResult run(Path out, String... args) {
        ScanRequest.Built s = setup(args);
        return s.scan().run(s.evaluator(), out, false, 1, ScanProgress.NONE);
    }

    /** The point of a result at ε (exact match). */
    static ScanPoint point(ScanResult r, double eps) {
        return r.points().stream().filter(p -> p.eps() == eps).findFirst().orElseThrow();
    }
}
