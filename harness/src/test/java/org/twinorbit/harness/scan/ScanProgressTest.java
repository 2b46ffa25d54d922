package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

/** A resumed scan's time left comes from the points computed now, not from those on disk. */
class ScanProgressTest {

    private static final long SECOND = 1_000_000_000L;

    @Test
    void theBarsTimeLeftAfterAResumeUsesOnlyThisRunsPoints() {
        AtomicLong now = new AtomicLong();
        PrintStream err = System.err;
        System.setErr(new PrintStream(new ByteArrayOutputStream(), true)); // the bar draws on stderr
        try (ScanProgressBar bar = new ScanProgressBar("scan", now::get)) {
            bar.start(100, 80);
            now.addAndGet(10 * SECOND);
            for (int i = 0; i < 5; i++) {
                bar.pointDone();
            }
            // 2 s a point, 15 left; counting the 80 resumed points in the rate would say 3.5 s
            assertEquals(Duration.ofSeconds(30), bar.remaining().orElseThrow());
        } finally {
            System.setErr(err);
        }
    }

    /** The safe-use map's one bar over many scans: points found on disk are resumed, not computed. */
    @Test
    void theSafeUseMapPassesResumedPointsOnAsResumed() {
        List<String> calls = new ArrayList<>();
        ScanProgress target = new ScanProgress() {
            @Override
            public void start(int total, int alreadyDone) {
                calls.add("start " + total + " " + alreadyDone);
            }

            @Override
            public void resumed(int points) {
                calls.add("resumed " + points);
            }

            @Override
            public void pointDone() {
                calls.add("done");
            }
        };
        SafeUseMap.Overall overall = new SafeUseMap.Overall(target, 30);
        overall.start(10, 10); // first scan finished before the interruption
        overall.start(10, 4);  // second scan interrupted after 4 points
        overall.pointDone();
        overall.start(10, 0);  // third scan never started
        assertEquals(List.of("start 30 10", "resumed 4", "done"), calls);
    }
}
