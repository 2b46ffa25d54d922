package org.twinorbit.harness.bench;

import org.twinorbit.integrators.fullorbit.EnsembleStepper;
import org.twinorbit.integrators.fullorbit.Pushers;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/** Nanoseconds per particle-push for {@link #PARTICLES} particles in flat arrays, one step per invocation. */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class EnsemblePushBenchmark {

    static final int PARTICLES = 4096;

    @Param({"boris", "boris-newtonian", "vay", "higuera-cary", "rk4"})
    public String pusher;

    @Param({"uniform", "dipole"})
    public String field;

    private EnsembleStepper ensemble;

    @Setup(Level.Trial)
    public void setUp() {
        BenchmarkParticles p = new BenchmarkParticles(field);
        ensemble = Pushers.byName(pusher).ensemble(p.field, BenchmarkParticles.PROTON, p.dt, PARTICLES);
        p.fill(ensemble);
        ensemble.start(0);
    }

    @Benchmark
    @OperationsPerInvocation(PARTICLES)
    public void push(Blackhole bh) {
        ensemble.step();
        bh.consume(ensemble.x[PARTICLES - 1]);
    }

    /** The work really happened: time advanced and the positions are finite. */
    @TearDown(Level.Trial)
    public void check() {
        if (!(ensemble.time() > 0) || !Double.isFinite(ensemble.x[0] + ensemble.y[PARTICLES / 2])) {
            throw new IllegalStateException(pusher + " in " + field + ": ensemble did not advance");
        }
    }
}
