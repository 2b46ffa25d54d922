package org.twinorbit.harness.scan;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One part of a scan or safe-use map cut into {@code count} parts that run as independent
 * processes (a batch scheduler's job array, or {@code xargs -P}) and are joined by
 * {@code twinorbit merge}. Shard {@code index} writes only into its own folder
 * {@code shard-<index>-of-<count>} under the shared output directory.
 *
 * @param index which part, 0 ≤ index &lt; count (as a job array's task id counts from 0)
 * @param count how many parts, ≥ 1
 */
public record Shard(int index, int count) {

    /** Most parts a run is cut into. */
    public static final int MAX_COUNT = 100_000;

    private static final Pattern FOLDER = Pattern.compile("shard-(\\d{1,9})-of-(\\d{1,9})");

    public Shard {
        if (count < 1 || count > MAX_COUNT || index < 0 || index >= count) {
            throw new IllegalArgumentException("--shard: give I/K with 1 <= K <= " + MAX_COUNT + " and 0 <= I < K, got "
                    + index + "/" + count);
        }
    }

    /** Parses {@code I/K}. @throws IllegalArgumentException naming --shard and the form */
    public static Shard parse(String text) {
        Matcher m = Pattern.compile("\\s*(\\d{1,9})\\s*/\\s*(\\d{1,9})\\s*").matcher(text);
        if (!m.matches()) {
            throw new IllegalArgumentException("--shard: give I/K, this process's part I (counted from 0) of K parts, "
                    + "e.g. --shard 0/3 (with a job array: --shard $SLURM_ARRAY_TASK_ID/3); got '" + text + "'");
        }
        return new Shard(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)));
    }

    /** The shard's own folder under the shared output directory. */
    public String folder() {
        return "shard-" + index + "-of-" + count;
    }

    /** The shard a folder name stands for, or null when the name is not a shard folder's. */
    public static Shard ofFolder(String name) {
        Matcher m = FOLDER.matcher(name);
        if (!m.matches()) {
            return null;
        }
        try {
            return new Shard(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)));
        } catch (IllegalArgumentException e) {
            return null;
        }
    }

    /**
     * Cuts work units into {@code count} parts of nearly equal estimated cost, deterministically:
     * the units, largest estimated cost first (ties in their given order), each go to the part
     * with the least estimated cost so far (ties to the lowest index) — the longest-processing-
     * time-first rule (Graham, "Bounds on multiprocessing timing anomalies", 1969), whose largest
     * part is within 4/3 of the best possible. Every process computes the same cut from the same
     * options, so no process needs to talk to another.
     *
     * @param costs estimated cost of each unit (any unit of work, &gt; 0)
     * @param count how many parts
     * @return the part of each unit, 0 ≤ part &lt; count
     */
    public static int[] cut(double[] costs, int count) {
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < costs.length; i++) {
            order.add(i);
        }
        order.sort(Comparator.comparingDouble((Integer i) -> -costs[i]).thenComparingInt(i -> i));
        double[] load = new double[count];
        int[] part = new int[costs.length];
        for (int i : order) {
            int least = 0;
            for (int s = 1; s < count; s++) {
                if (load[s] < load[least]) {
                    least = s;
                }
            }
            part[i] = least;
            load[least] += costs[i];
        }
        return part;
    }
}
