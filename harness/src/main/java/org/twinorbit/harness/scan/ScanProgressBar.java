package org.twinorbit.harness.scan;

import java.time.Duration;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.LongSupplier;
import me.tongfei.progressbar.ProgressBar;
import org.twinorbit.harness.progress.ProgressBars;
import org.twinorbit.harness.progress.TimeLeft;

/**
 * A progress bar on stderr with the time left, estimated from the points computed in this run
 * only (points resumed from disk took no time now, so they do not enter the rate).
 *
 * <p>The counts are atomics, not guarded by this object: the bar redraws from its own thread and
 * reads them, and {@link #close} waits for that thread.
 */
public final class ScanProgressBar implements ScanProgress, AutoCloseable {

    private final String label;
    private final TimeLeft time;
    private final AtomicInteger total = new AtomicInteger();
    private final AtomicInteger done = new AtomicInteger();
    private volatile ProgressBar bar;

    /** @param label shown beside the bar */
    public ScanProgressBar(String label) {
        this(label, System::nanoTime);
    }

    /** @param nanoClock monotonic clock in nanoseconds (tests) */
    ScanProgressBar(String label, LongSupplier nanoClock) {
        this.label = label;
        this.time = new TimeLeft(nanoClock);
    }

    @Override
    public void start(int total, int alreadyDone) {
        this.total.set(total);
        done.set(alreadyDone);
        time.start(total, alreadyDone);
        bar = ProgressBars.onStderr(label, total, alreadyDone,
                () -> ProgressBars.count(done.get(), this.total.get(), "points"), time);
    }

    @Override
    public void resumed(int points) {
        time.resumed(points);
        done.addAndGet(points);
        bar.stepBy(points);
    }

    @Override
    public void pointDone() {
        time.done(1);
        done.incrementAndGet();
        bar.step();
    }

    /** The estimated time left (empty before the first point of this run). */
    Optional<Duration> remaining() {
        return time.remaining();
    }

    @Override
    public void close() {
        if (bar != null) {
            bar.close();
        }
    }
}
