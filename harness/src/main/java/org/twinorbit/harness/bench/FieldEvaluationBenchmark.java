package org.twinorbit.harness.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
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
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import org.twinorbit.fields.AxisymmetricEquilibrium;
import org.twinorbit.fields.Cocos;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.fields.GeqdskFile;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * Nanoseconds per evaluation of B and its Jacobian in the tokamaks: the circular {@code tokamak},
 * the analytic {@code solovev}, and the same Solov'ev equilibrium read from a G-EQDSK file of
 * 129 × 129 nodes ({@code geqdsk}: spline of ψ, spline of F). Each invocation evaluates
 * {@link #POINTS} points spread over the plasma, so that the spline's cells change as in an orbit.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class FieldEvaluationBenchmark {

    static final int POINTS = 256;

    @Param({"tokamak", "solovev", "geqdsk"})
    public String field;

    private Field f;
    private final double[] x = new double[POINTS];
    private final double[] z = new double[POINTS];
    private final FieldSample sample = new FieldSample();

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        if (field.equals("geqdsk")) {
            Path file = Files.createTempFile("twinorbit-bench", ".geqdsk");
            AxisymmetricEquilibrium eq = (AxisymmetricEquilibrium) Fields.create("solovev", Map.of(), Species.DEUTERON);
            GeqdskFile.write(eq, "bench", 1.025, 2.375, -1.025, 1.025, 129, 129, 0.05, 1.7, Cocos.of(1), file);
            f = GeqdskFile.read(file, 1);
            Files.delete(file);
        } else {
            f = Fields.create(field, Map.of(), Species.DEUTERON);
        }
        // points on rings of minor radius 0.06-0.3 m about the magnetic axis (1.5 m circular, 1.77 m shaped)
        double axis = field.equals("tokamak") ? 1.5 : 1.77;
        for (int k = 0; k < POINTS; k++) {
            double th = 2 * Math.PI * k / POINTS;
            double rho = 0.3 * (0.2 + 0.8 * ((k * 37) % POINTS) / (double) POINTS);
            x[k] = axis + rho * Math.cos(th);
            z[k] = rho * Math.sin(th);
        }
    }

    @Benchmark
    @OperationsPerInvocation(POINTS)
    public void evaluate(Blackhole bh) {
        double sum = 0;
        for (int k = 0; k < POINTS; k++) {
            f.evaluate(0, x[k], 0.01, z[k], sample);
            sum += sample.bx + sample.dB[4];
        }
        bh.consume(sum);
    }
}
