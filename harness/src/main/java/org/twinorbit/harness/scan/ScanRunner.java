package org.twinorbit.harness.scan;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.Future;

/**
 * Runs the points of a scan in parallel, saving each to the checkpoint as it completes.
 *
 * <p>Points run as tasks of one {@link ForkJoinPool} with the requested number of threads; an
 * evaluator that splits its own work with parallel streams (e.g. over the gyrophase ensemble)
 * runs that work in the same pool, so idle threads help with whichever point is still going.
 * Every result is stored by its index, never in completion order, so the output does not depend
 * on the thread count.
 */
public final class ScanRunner {

    private ScanRunner() {}

    /**
     * @param scan        the ε grid, pitch angles, charge signs and axis (how ε reads as an energy)
     * @param evaluator   measures one point
     * @param checkpoint  where finished points are saved and resumed from
     * @param threads     worker threads, ≥ 1
     * @param progress    told of every finished point
     * @return the points, sign-major, then pitch, then increasing ε
     */
    public static List<ScanPoint> run(BreakdownScan scan, PointEvaluator evaluator, ScanCheckpoint checkpoint,
                                      int threads, ScanProgress progress) {
        return List.of(run(scan, evaluator, checkpoint, threads, progress, k -> true));
    }

    /**
     * Runs only the points {@code mine} selects (a shard's part of the scan).
     *
     * @param mine selects points by their index, sign-major, then pitch, then increasing ε
     * @return the points by index, null where not selected
     */
    static ScanPoint[] run(BreakdownScan scan, PointEvaluator evaluator, ScanCheckpoint checkpoint, int threads,
                           ScanProgress progress, java.util.function.IntPredicate mine) {
        if (threads < 1) {
            throw new IllegalArgumentException("--threads must be at least 1, got " + threads);
        }
        double[] eps = scan.eps();
        List<Double> pitches = scan.pitches();
        ScanAxis axis = scan.axis();
        int total = scan.size();
        ScanPoint[] out = new ScanPoint[total];
        List<Integer> pending = new ArrayList<>();
        int selected = 0;
        for (int k = 0; k < total; k++) {
            if (!mine.test(k)) {
                continue;
            }
            selected++;
            ScanPoint saved = checkpoint.get(pitchOf(scan, k), eps[k % eps.length], signOf(scan, k));
            if (saved != null) {
                out[k] = saved;
            } else {
                pending.add(k);
            }
        }
        progress.start(selected, selected - pending.size());
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
            List<Future<?>> futures = new ArrayList<>();
            for (int k : pending) {
                double e = eps[k % eps.length];
                double pitch = pitchOf(scan, k);
                int sign = signOf(scan, k);
                futures.add(pool.submit(() -> {
                    ScanPoint p = measure(e, pitch, sign, axis, evaluator);
                    checkpoint.add(p);
                    out[k] = p;
                    progress.pointDone();
                }));
            }
            for (Future<?> f : futures) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("scan interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
        return out;
    }

    /** The pitch angle (degrees) of point {@code k}, sign-major, then pitch, then ε. */
    static double pitchOf(BreakdownScan scan, int k) {
        return scan.pitches().get(k / scan.eps().length % scan.pitches().size());
    }

    /** The charge sign of point {@code k}. */
    static int signOf(BreakdownScan scan, int k) {
        return scan.chargeSigns().get(k / (scan.eps().length * scan.pitches().size()));
    }

    private static ScanPoint measure(double eps, double pitch, int sign, ScanAxis axis, PointEvaluator evaluator) {
        double energy = axis.energyEv().applyAsDouble(eps);
        Map<String, Double> values = new LinkedHashMap<>();
        if (axis.derivedName() != null) {
            values.put(axis.derivedName(), axis.derived().applyAsDouble(eps));
        }
        values.putAll(evaluator.measure(eps, energy, pitch, sign));
        return new ScanPoint(eps, energy, pitch, values, sign);
    }
}
