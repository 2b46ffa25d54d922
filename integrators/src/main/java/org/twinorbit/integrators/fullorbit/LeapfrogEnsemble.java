package org.twinorbit.integrators.fullorbit;

import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * The leapfrog stepping loop of {@link LeapfrogStepper} over n particles in flat arrays. A
 * particle that leaves the domain or stops being finite keeps its last good state and is
 * skipped from then on; {@link #status(int)} says why.
 */
final class LeapfrogEnsemble extends FullOrbitEnsemble {

    private final LeapfrogUpdate update;
    private final FieldSample sample = new FieldSample();

    /** @param dt time step (s) */
    LeapfrogEnsemble(Field field, Species species, double dt, int n, LeapfrogUpdate update) {
        super(field, species, dt, n);
        this.update = update;
    }

    @Override
    public void start(double t0) {
        begin(t0);
        for (int i = 0; i < n; i++) {
            checkStart(i);
            load(i);
            update.undoFirstHalf(sample, h);
            storeVelocity(i);
        }
    }

    @Override
    public void step() {
        final double t = time();
        final LeapfrogUpdate up = update;
        final FieldSample f = sample;
        final double[] x = this.x, y = this.y, z = this.z, ux = this.ux, uy = this.uy, uz = this.uz;
        long evaluated = 0;
        for (int i = 0; i < n; i++) {
            if (state[i] != RUNNING) {
                continue;
            }
            double xi = x[i], yi = y[i], zi = z[i];
            field.evaluate(t, xi, yi, zi, f);
            evaluated++;
            up.ux = ux[i];
            up.uy = uy[i];
            up.uz = uz[i];
            double g = up.push(f, h) * dt;
            double nx = xi + up.ux * g, ny = yi + up.uy * g, nz = zi + up.uz * g;
            if (!field.inDomain(nx, ny, nz)) {
                freeze(i, LOST, t);
                continue;
            }
            if (!Double.isFinite(nx + ny + nz + up.ux + up.uy + up.uz)) {
                freeze(i, UNSTABLE, t);
                continue;
            }
            x[i] = nx;
            y[i] = ny;
            z[i] = nz;
            ux[i] = up.ux;
            uy[i] = up.uy;
            uz[i] = up.uz;
        }
        evaluations += evaluated;
        steps++;
    }

    @Override
    public void velocity(int i, double[] out) {
        load(i);
        update.firstHalf(sample, h);
        out[0] = update.ux;
        out[1] = update.uy;
        out[2] = update.uz;
    }

    /** Evaluates the field at particle i (at the current time) and loads its u into the update. */
    private void load(int i) {
        field.evaluate(time(i), x[i], y[i], z[i], sample);
        evaluations++;
        update.ux = ux[i];
        update.uy = uy[i];
        update.uz = uz[i];
    }

    private void storeVelocity(int i) {
        ux[i] = update.ux;
        uy[i] = update.uy;
        uz[i] = update.uz;
    }
}
