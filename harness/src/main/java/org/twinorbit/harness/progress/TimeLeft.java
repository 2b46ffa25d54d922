package org.twinorbit.harness.progress;

import java.time.Duration;
import java.util.Optional;
import java.util.function.LongSupplier;

/**
 * The time left of a piece of work, from the rate of the work done since it started in this
 * process. Work taken up from disk ({@code --resume}) took no time now: it shortens what is left
 * but does not enter the rate, else a resumed scan that is 80% done would look five times faster,
 * or (counted as time spent) slower, than it is. Thread-safe.
 */
public final class TimeLeft {

    private final LongSupplier nanoClock;
    private long startNanos;
    private double total;
    private double resumed;
    private double computed;

    /** @param nanoClock a monotonic clock in nanoseconds (tests inject their own; else {@link System#nanoTime}) */
    public TimeLeft(LongSupplier nanoClock) {
        this.nanoClock = nanoClock;
    }

    /** The system's monotonic clock. */
    public static TimeLeft ofSystemClock() {
        return new TimeLeft(System::nanoTime);
    }

    /**
     * Starts the clock.
     *
     * @param total   the whole work (any unit: points, estimated steps)
     * @param resumed how much of it was already done before this process
     */
    public synchronized void start(double total, double resumed) {
        this.startNanos = nanoClock.getAsLong();
        this.total = total;
        this.resumed = resumed;
        this.computed = 0;
    }

    /** More work taken up from disk after the start (a later scan of a resumed map). */
    public synchronized void resumed(double amount) {
        resumed += amount;
    }

    /** Work computed in this process. */
    public synchronized void done(double amount) {
        computed += amount;
    }

    /** Time since {@link #start}. */
    public synchronized Duration elapsed() {
        return Duration.ofNanos(nanoClock.getAsLong() - startNanos);
    }

    /** Empty until some work has been computed in this process. */
    public synchronized Optional<Duration> remaining() {
        if (computed <= 0) {
            return Optional.empty();
        }
        double left = Math.max(total - resumed - computed, 0);
        double nanos = (nanoClock.getAsLong() - startNanos) / computed * left;
        return Optional.of(Duration.ofNanos(Math.round(nanos)));
    }
}
