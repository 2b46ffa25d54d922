package org.twinorbit.harness.scan;

import java.time.Duration;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;

/**
 * A progress bar on stderr with the time left, estimated from the points computed in this run
 * only (points resumed from disk took no time now, so they do not enter the rate).
 */
public final class ScanProgressBar implements ScanProgress, AutoCloseable {

    private final String label;
    private ProgressBar bar;

    /** @param label shown beside the bar */
    public ScanProgressBar(String label) {
        this.label = label;
    }

    @Override
    public synchronized void start(int total, int alreadyDone) {
        bar = new ProgressBarBuilder().setTaskName(label).setInitialMax(total)
                .setConsumer(new ConsoleProgressBarConsumer(System.err)).setUpdateIntervalMillis(250)
                .startsFrom(alreadyDone, Duration.ZERO).build();
    }

    @Override
    public synchronized void pointDone() {
        bar.step();
    }

    @Override
    public synchronized void close() {
        if (bar != null) {
            bar.close();
        }
    }
}
