package org.twinorbit.harness.bench;

import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
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

/**
 * Nanoseconds per push of one particle: each invocation takes {@link #STEPS} steps of the
 * stepper (field evaluation, push, domain and finiteness checks included), so the JMH call
 * overhead is spread over many pushes. {@link #baseline} is the same loop doing nothing but
 * reading the state.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class PushBenchmark {

    static final int STEPS = 1000;

    @Param({"boris", "boris-newtonian", "vay", "higuera-cary", "rk4"})
    public String pusher;

    @Param({"uniform", "dipole"})
    public String field;

    private FullOrbitStepper stepper;
    private double[] position;
    private long stepsAtStart;

    @Setup(Level.Trial)
    public void setUp() {
        BenchmarkParticles p = new BenchmarkParticles(field);
        stepper = Pushers.byName(pusher).stepper(p.field, BenchmarkParticles.PROTON, p.dt);
        stepper.start(0, p.x0, p.u0);
        position = new double[3];
        stepsAtStart = stepper.steps();
    }

    @Benchmark
    @OperationsPerInvocation(STEPS)
    public void push(Blackhole bh) {
        FullOrbitStepper s = stepper;
        boolean ok = true;
        for (int k = 0; k < STEPS; k++) {
            ok &= s.step();
        }
        bh.consume(ok);
    }

    @Benchmark
    @OperationsPerInvocation(STEPS)
    public void baseline(Blackhole bh) {
        FullOrbitStepper s = stepper;
        long sum = 0;
        for (int k = 0; k < STEPS; k++) {
            sum += s.steps();
        }
        bh.consume(sum);
    }

    /** The work really happened: the particle is still running and has moved on. */
    @TearDown(Level.Trial)
    public void check() {
        stepper.position(position);
        if (stepper.status() != OrbitStatus.OK || !Double.isFinite(position[0])) {
            throw new IllegalStateException(pusher + " in " + field + " stopped: " + stepper.status().label());
        }
        if (stepper.steps() == stepsAtStart && stepper.fieldEvaluations() == 0) {
            throw new IllegalStateException("no steps were taken");
        }
    }
}
