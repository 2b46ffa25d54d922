package org.twinorbit.harness.metrics;

import org.twinorbit.integrators.reference.GuidingCenterObserver;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * Records a guiding-center run as a {@link Track} (X and v∥ = p∥/(γm)) and measures its energy
 * error: max |W − W0| / K0 with W = (γ − 1)mc² + qΦ(X), γ = sqrt(1 + (p∥² + 2mμB)/(m²c²))
 * (docs/design.md "Integrators"), defined in static fields with a potential.
 */
public final class GuidingCenterRecorder implements GuidingCenterObserver {

    private final Field field;
    private final Species species;
    private final double mu;
    private final boolean energyDefined;
    private final FieldSample fs = new FieldSample();
    private final Track track;
    private final Series energy;
    private boolean started;
    private double w0;
    private double k0;
    private double maxError;

    /**
     * @param mu magnetic moment (J/T) @param stride keep one point in this many for plots
     * @param deadband |v∥| (m/s) treated as zero when looking for mirror points
     */
    public GuidingCenterRecorder(Field field, Species species, double mu, int stride, double deadband) {
        this.track = new Track(deadband);
        this.field = field;
        this.species = species;
        this.mu = mu;
        this.energyDefined = field.isStatic() && field.hasPotential();
        this.energy = new Series(stride);
    }

    @Override
    public void observe(double t, double[] gc, double pPar) {
        field.evaluate(t, gc[0], gc[1], gc[2], fs);
        double m = species.mass();
        double mc = m * Constants.C;
        double b = fs.bMag();
        double gamma = Math.sqrt(1.0 + (pPar * pPar + 2 * m * mu * b) / (mc * mc));
        track.add(t, gc[0], gc[1], gc[2], pPar / (gamma * m));
        if (!energyDefined) {
            return;
        }
        // (γ − 1) m c² written as (p∥² + 2mμB)/((γ + 1) m) to keep precision when γ → 1
        double k = (pPar * pPar + 2 * m * mu * b) / ((gamma + 1) * m);
        double w = k + (field.hasElectricField() ? species.charge() * field.potential(t, gc[0], gc[1], gc[2]) : 0.0);
        if (!started) {
            started = true;
            w0 = w;
            k0 = k;
        }
        double err = Math.abs(w - w0) / k0;
        energy.offer(t, (w - w0) / k0);
        if (err > maxError || Double.isNaN(err)) {
            maxError = err;
        }
    }

    /** True once the energy error passed {@link EnergyMonitor#BLOW_UP} or became NaN. */
    public boolean blownUp() {
        return energyDefined && started && !(maxError <= EnergyMonitor.BLOW_UP);
    }

    public Track track() {
        return track;
    }

    /** max |W − W0|/K0; NaN where the field does not conserve energy. */
    public double maxEnergyError() {
        return energyDefined && started ? maxError : Double.NaN;
    }

    /** Signed (W − W0)/K0 against time, thinned, for plots. */
    public Series energySeries() {
        return energy;
    }
}
