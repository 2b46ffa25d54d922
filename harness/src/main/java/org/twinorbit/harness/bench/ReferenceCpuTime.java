package org.twinorbit.harness.bench;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.harness.run.References;
import org.twinorbit.shared.Species;

/**
 * The full-orbit reference's throughput on the runs of a scan, as listed by {@link ScanOrbits}:
 * each run exactly as a scan point makes it (dense output sampled at the interval, with the
 * run's metric observers), timed by the CPU time of this thread like the C comparison program in
 * {@code bench/c}, warm: the list runs {@code reps} times and the median is reported.
 *
 * <pre>java -cp harness/target/twinorbit.jar org.twinorbit.harness.bench.ReferenceCpuTime orbits.txt [reps]</pre>
 */
public final class ReferenceCpuTime {

    private ReferenceCpuTime() {}

    public static void main(String[] args) throws IOException {
        List<String[]> rows = new ArrayList<>();
        for (String line : Files.readAllLines(Path.of(args[0]))) {
            if (!line.isBlank()) {
                rows.add(line.trim().split("\\s+"));
            }
        }
        int reps = args.length > 1 ? Integer.parseInt(args[1]) : 5;
        Map<String, Field> fields = new HashMap<>();
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        double[] cpu = new double[reps];
        long evaluations = 0;
        long steps = 0;
        for (int r = 0; r < reps; r++) {
            evaluations = 0;
            long c0 = mx.getCurrentThreadCpuTime();
            for (String[] q : rows) {
                Field f = fields.computeIfAbsent(q[0], n -> Fields.create(n, Species.PROTON));
                double rtol = Double.parseDouble(q[1]);
                double tEnd = Double.parseDouble(q[2]);
                long samples = Math.round(tEnd / Double.parseDouble(q[3]));
                double[] x = {Double.parseDouble(q[4]), Double.parseDouble(q[5]), Double.parseDouble(q[6])};
                double[] u = {Double.parseDouble(q[7]), Double.parseDouble(q[8]), Double.parseDouble(q[9])};
                double speed = Math.sqrt(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
                var rec = References.fullOrbit(f, Species.PROTON, x, u, tEnd, samples, rtol,
                        (int) Math.max(1, samples / 600), 1e-6 * speed);
                evaluations += rec.outcome().fieldEvaluations();
            }
            cpu[r] = (mx.getCurrentThreadCpuTime() - c0) * 1e-9;
            System.out.printf(Locale.ROOT, "rep %d: orbits=%d fevals=%d cpu_s=%.4f ns_per_feval=%.3f%n", r,
                    rows.size(), evaluations, cpu[r], 1e9 * cpu[r] / evaluations);
        }
        double[] sorted = cpu.clone();
        Arrays.sort(sorted);
        double med = sorted[reps / 2];
        System.out.printf(Locale.ROOT, "median: orbits=%d fevals=%d cpu_s=%.4f ns_per_feval=%.3f%n", rows.size(),
                evaluations, med, 1e9 * med / evaluations);
    }
}
