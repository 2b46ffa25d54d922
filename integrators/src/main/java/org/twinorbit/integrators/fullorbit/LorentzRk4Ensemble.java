package org.twinorbit.integrators.fullorbit;

import org.twinorbit.fields.Field;
import org.twinorbit.shared.Species;

/** n particles in flat arrays, each advanced by {@link LorentzRk4Step}. */
final class LorentzRk4Ensemble extends FullOrbitEnsemble {

    private final LorentzRk4Step rk4;
    private final double[] work = new double[6];

    /** @param dt time step (s) */
    LorentzRk4Ensemble(Field field, Species species, double dt, int n) {
        super(field, species, dt, n);
        this.rk4 = new LorentzRk4Step(new LorentzEquations(field, species));
    }

    @Override
    public void start(double t0) {
        begin(t0);
        rk4.equations().resetCount();
        for (int i = 0; i < n; i++) {
            checkStart(i);
        }
    }

    @Override
    public void step() {
        double t = time();
        double[] s = work;
        for (int i = 0; i < n; i++) {
            if (state[i] != RUNNING) {
                continue;
            }
            s[0] = x[i];
            s[1] = y[i];
            s[2] = z[i];
            s[3] = ux[i];
            s[4] = uy[i];
            s[5] = uz[i];
            rk4.advance(t, dt, s);
            if (!field.inDomain(s[0], s[1], s[2])) {
                freeze(i, LOST, t);
                continue;
            }
            if (!Double.isFinite(s[0] + s[1] + s[2] + s[3] + s[4] + s[5])) {
                freeze(i, UNSTABLE, t);
                continue;
            }
            x[i] = s[0];
            y[i] = s[1];
            z[i] = s[2];
            ux[i] = s[3];
            uy[i] = s[4];
            uz[i] = s[5];
        }
        evaluations = rk4.equations().evaluations();
        steps++;
    }

    @Override
    public void velocity(int i, double[] out) {
        out[0] = ux[i];
        out[1] = uy[i];
        out[2] = uz[i];
    }
}
