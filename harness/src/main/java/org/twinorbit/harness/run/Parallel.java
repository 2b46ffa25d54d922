package org.twinorbit.harness.run;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import me.tongfei.progressbar.ProgressBar;
import org.twinorbit.harness.progress.ProgressBars;
import org.twinorbit.harness.progress.TimeLeft;

/**
 * Runs independent jobs on a fixed number of threads. Jobs start in order of decreasing
 * estimated cost, so that the long ones do not end up last on one thread; each job writes only
 * its own result slot, so what the caller assembles afterwards, in its own fixed order, does not
 * depend on the number of threads or on which thread ran what. A progress bar appears on
 * stderr once the work has taken longer than a second, unless {@code quiet}.
 */
public final class Parallel {

    /** Work that has lasted this long gets a progress bar (ms). */
    private static final long BAR_AFTER_MS = 1000;
    /** Resolution of the progress bar (tenths of a percent). */
    private static final long BAR_UNITS = 1000;

    /** One job and its estimated cost (any unit, compared only with other jobs). */
    public record Job(double cost, Runnable work) {}

    private final int threads;
    private final boolean quiet;
    private final String label;

    /** @param threads number of worker threads (≥ 1) @param quiet no progress bar @param label shown beside the bar */
    public Parallel(int threads, boolean quiet, String label) {
        if (threads < 1) {
            throw new IllegalArgumentException("--threads: must be at least 1, got " + threads);
        }
        this.threads = threads;
        this.quiet = quiet;
        this.label = label;
    }

    /** Runs every job and returns when all are done; a job's exception is rethrown. */
    public void run(List<Job> jobs) {
        List<Job> order = new ArrayList<>(jobs);
        order.sort(Comparator.comparingDouble(Job::cost).reversed());
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "twinorbit-worker");
            t.setDaemon(true);
            return t;
        });
        ProgressBar bar = null;
        try {
            CompletionService<Job> done = new ExecutorCompletionService<>(pool);
            double total = 0;
            for (Job j : order) {
                done.submit(j.work(), j);
                total += Math.max(j.cost(), 0);
            }
            // the bar and the time left follow estimated cost, not jobs, so that the time left means
            // something; the count beside the bar is in jobs
            double perUnit = total > 0 ? BAR_UNITS / total : 0;
            TimeLeft time = TimeLeft.ofSystemClock();
            time.start(total, 0);
            AtomicInteger finished = new AtomicInteger();
            double costDone = 0;
            while (finished.get() < order.size()) {
                Future<Job> f = done.poll(200, TimeUnit.MILLISECONDS);
                if (f != null) {
                    double cost = Math.max(f.get().cost(), 0);
                    costDone += cost;
                    time.done(cost);
                    finished.incrementAndGet();
                    if (bar != null) {
                        bar.stepTo(Math.round(costDone * perUnit));
                    }
                }
                if (bar == null && !quiet && finished.get() < order.size()
                        && time.elapsed().toMillis() > BAR_AFTER_MS) {
                    bar = ProgressBars.onStderr(label, BAR_UNITS, Math.round(costDone * perUnit),
                            () -> ProgressBars.count(finished.get(), order.size(), "jobs"), time);
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof RuntimeException r) {
                throw r;
            }
            if (c instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(c);
        } finally {
            if (bar != null) {
                bar.close();
            }
            pool.shutdownNow();
        }
    }
}
