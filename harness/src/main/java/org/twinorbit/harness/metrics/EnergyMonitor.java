package org.twinorbit.harness.metrics;

import org.twinorbit.integrators.reference.FullOrbitObserver;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/**
 * The energy error of a full orbit: max over samples of |W − W0| / K0 with W = kinetic + qΦ
 * and K0 the initial kinetic energy (docs/design.md "What is measured"). Defined only in static fields
 * with a potential; elsewhere the error reads NaN. An error above {@link #BLOW_UP} marks the run
 * as blown up, which the runner reports as unstable.
 */
public final class EnergyMonitor implements FullOrbitObserver {

    /**
     * Relative energy change (of the initial kinetic energy) taken as a blow-up: no scheme that
     * is still tracking the orbit gains or loses all of its kinetic energy.
     */
    public static final double BLOW_UP = 1.0;

    private final Field field;
    private final Species species;
    private final boolean defined;
    private final Series series;
    private boolean started;
    private double w0;
    private double k0;
    private double maxError;
    private double blowUpTime = Double.NaN;
    /** Time (s) dividing the run into the halves whose largest errors are compared; NaN: no split. */
    private double split = Double.NaN;
    private double maxFirstHalf;
    private double maxSecondHalf;

    /** @param stride keep one point in this many for the plotted series */
    public EnergyMonitor(Field field, Species species, int stride) {
        this.field = field;
        this.species = species;
        this.defined = field.isStatic() && field.hasPotential();
        this.series = new Series(stride);
    }

    @Override
    public void observe(double t, double[] x, double[] u) {
        if (!defined) {
            return;
        }
        double k = Relativity.kineticJoules(species, u[0], u[1], u[2]);
        double w = k + (field.hasElectricField() ? species.charge() * field.potential(t, x[0], x[1], x[2]) : 0.0);
        if (!started) {
            started = true;
            w0 = w;
            k0 = k;
        }
        double err = Math.abs(w - w0) / k0;
        series.offer(t, (w - w0) / k0);
        if (err > maxError || Double.isNaN(err)) {
            maxError = err;
        }
        if (t <= split) {
            maxFirstHalf = Math.max(maxFirstHalf, err);
        } else if (t > split) {
            maxSecondHalf = Math.max(maxSecondHalf, err);
        }
        if (!(err <= BLOW_UP) && Double.isNaN(blowUpTime)) {
            blowUpTime = t;
        }
    }

    /** max |W − W0|/K0, NaN where energy is not conserved by the field. */
    public double maxError() {
        return defined && started ? maxError : Double.NaN;
    }

    /** Splits the run at time t (s), the middle of the planned run, for {@link #halves()}. */
    public void splitAt(double t) {
        split = t;
    }

    /**
     * The largest |W − W0|/K0 before and after the split time: a bounded error has about the same
     * in both halves, a secular one (linear growth) about twice as much in the second. NaN where
     * the energy is not conserved by the field or no split was set.
     */
    public double[] halves() {
        return defined && started && !Double.isNaN(split) ? new double[] {maxFirstHalf, maxSecondHalf}
                : new double[] {Double.NaN, Double.NaN};
    }

    /** True once the energy error passed {@link #BLOW_UP} (or became NaN). */
    public boolean blownUp() {
        return !Double.isNaN(blowUpTime);
    }

    /** Time (s) the energy blew up; NaN if it did not. */
    public double blowUpTime() {
        return blowUpTime;
    }

    /** Signed (W − W0)/K0 against time, thinned, for plots. */
    public Series series() {
        return series;
    }
}
