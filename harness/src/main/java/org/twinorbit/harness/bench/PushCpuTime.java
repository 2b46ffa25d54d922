package org.twinorbit.harness.bench;

import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.integrators.fullorbit.Pushers;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A cross-check of {@link PushBenchmark} on a shared machine: ns per push in CPU time of the
 * timing thread, the measure the plain-C anchor (shared/anchors/boris_c) reports, so that
 * time-slicing by other processes does not enter the Java/C ratio. JMH measures wall time.
 *
 * <pre>java -cp harness/target/twinorbit.jar org.twinorbit.harness.bench.PushCpuTime [pusher ...]</pre>
 *
 * Each pusher and field: 3 s of warm-up, then the median of 5 runs of 2e7 steps (uniform) or
 * 5e6 steps (dipole).
 */
public final class PushCpuTime {

    private PushCpuTime() {}

    public static void main(String[] args) {
        List<String> pushers = args.length > 0 ? List.of(args) : List.of("boris-newtonian", "boris");
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        System.out.println("| pusher | field | cpu ns/push (median of 5) | wall ns/push (median of 5) |");
        System.out.println("|---|---|---|---|");
        for (String name : pushers) {
            for (String field : List.of("uniform", "dipole")) {
                BenchmarkParticles p = new BenchmarkParticles(field);
                FullOrbitStepper s = Pushers.byName(name).stepper(p.field, BenchmarkParticles.PROTON, p.dt);
                s.start(0, p.x0, p.u0);
                long n = field.equals("uniform") ? 20_000_000L : 5_000_000L;
                long warmEnd = System.nanoTime() + 3_000_000_000L;
                while (System.nanoTime() < warmEnd) {
                    run(s, 100_000);
                }
                List<Double> cpu = new ArrayList<>(), wall = new ArrayList<>();
                for (int r = 0; r < 5; r++) {
                    long c0 = mx.getCurrentThreadCpuTime(), w0 = System.nanoTime();
                    if (!run(s, n)) {
                        throw new IllegalStateException(name + " in " + field + " stopped: " + s.status().label());
                    }
                    cpu.add((mx.getCurrentThreadCpuTime() - c0) / (double) n);
                    wall.add((System.nanoTime() - w0) / (double) n);
                }
                cpu.sort(null);
                wall.sort(null);
                System.out.printf(Locale.ROOT, "| %s | %s | %.2f | %.2f |%n", name, field, cpu.get(2), wall.get(2));
            }
        }
    }

    private static boolean run(FullOrbitStepper s, long n) {
        boolean ok = true;
        for (long k = 0; k < n; k++) {
            ok &= s.step();
        }
        return ok;
    }
}
