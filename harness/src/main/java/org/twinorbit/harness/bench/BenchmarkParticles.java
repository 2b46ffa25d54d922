package org.twinorbit.harness.bench;

import org.twinorbit.integrators.fullorbit.EnsembleStepper;
import java.util.Map;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/**
 * The particles the push benchmarks use, chosen to match the plain-C anchor
 * (shared/anchors/boris_c) so that the ns per push compare: a proton, Δt = T_c/50; in
 * {@code uniform} (1 T) u0 = (1e6, 0, 1e5) m/s from the origin; in {@code dipole} (default
 * parameters) 100 keV at 45° pitch from the equator at L = 4.
 */
final class BenchmarkParticles {

    static final Species PROTON = Species.PROTON;
    static final int STEPS_PER_GYRATION = 50;

    final Field field;
    final double[] x0;
    final double[] u0;
    final double dt;

    BenchmarkParticles(String fieldName) {
        field = Fields.create(fieldName, Map.of(), PROTON);
        x0 = field.defaultStart().toArray();
        FieldSample s = new FieldSample();
        field.evaluate(0, x0[0], x0[1], x0[2], s);
        if (fieldName.equals("uniform")) {
            u0 = new double[] {1e6, 0, 1e5};
        } else {
            double u = Relativity.uFromKinetic(PROTON, 1e5);
            double a = Math.toRadians(45);
            u0 = new double[] {0, u * Math.sin(a), u * Math.cos(a)}; // B is along +z at the start
        }
        double tc = 2 * Math.PI * PROTON.mass() / (PROTON.charge() * s.bMag());
        dt = tc / STEPS_PER_GYRATION;
    }

    /** Fills an ensemble with particles spread around the benchmark particle (as the C anchor's SoA set). */
    void fill(EnsembleStepper e) {
        for (int i = 0; i < e.n; i++) {
            double f = 1.0 + 0.5 * i / e.n;
            double ph = 2 * Math.PI * i / e.n;
            double up = f * Math.hypot(u0[0], u0[1]);
            e.x[i] = x0[0] + 1e-3 * (i % 64);
            e.y[i] = x0[1] + 1e-3 * (i / 64);
            e.z[i] = x0[2];
            e.ux[i] = up * Math.cos(ph);
            e.uy[i] = up * Math.sin(ph);
            e.uz[i] = u0[2] * ((i % 7) - 3) / 3.0;
        }
    }
}
