package org.twinorbit.harness.metrics;

import org.twinorbit.integrators.reference.FullOrbitObserver;
import java.util.ArrayList;
import java.util.List;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Invariant;
import org.twinorbit.shared.Species;

/**
 * The drift of every exact invariant of the field other than the energy (which
 * {@link EnergyMonitor} measures): max over samples of |I − I0| / S0, where S0 is
 * {@link Invariant#scale} at the first sample — m|u| for a linear momentum, m|u|R for an
 * angular momentum. Only static fields are watched: a time-dependent field keeps none of them.
 */
public final class InvariantMonitor implements FullOrbitObserver {

    private final Species species;
    private final List<Invariant> watched = new ArrayList<>();
    private final double[] initial;
    private final double[] scale;
    private final double[] maxError;
    private boolean started;

    public InvariantMonitor(Field field, Species species) {
        this.species = species;
        if (field.isStatic()) {
            for (Invariant inv : field.invariants()) {
                if (inv.exact() && !inv.name().equals("energy")) {
                    watched.add(inv);
                }
            }
        }
        initial = new double[watched.size()];
        scale = new double[watched.size()];
        maxError = new double[watched.size()];
    }

    @Override
    public void observe(double t, double[] x, double[] u) {
        for (int i = 0; i < initial.length; i++) {
            double v = watched.get(i).value(species, t, x, u);
            if (!started) {
                initial[i] = v;
                scale[i] = watched.get(i).scale(species, t, x, u);
            }
            double e = Math.abs(v - initial[i]) / scale[i];
            if (e > maxError[i] || Double.isNaN(e)) {
                maxError[i] = e;
            }
        }
        started = true;
    }

    /** Names of the watched invariants, in the field's order. */
    public List<String> names() {
        return watched.stream().map(Invariant::name).toList();
    }

    /** max |I − I0|/S0 of invariant i. */
    public double maxError(int i) {
        return maxError[i];
    }
}
