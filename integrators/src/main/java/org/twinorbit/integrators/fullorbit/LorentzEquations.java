package org.twinorbit.integrators.fullorbit;

import org.twinorbit.fields.Field;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * The Lorentz equations in the state y = (x, y, z, u_x, u_y, u_z) with u = γv:
 * dx/dt = u/γ, du/dt = (q/m)(E + u×B/γ), γ = sqrt(1 + u²/c²) (Jackson, Classical
 * Electrodynamics, 3rd ed., §12.1, section from memory). One instance per thread: it owns the field sample it reuses.
 */
public final class LorentzEquations {

    private static final double INV_C2 = 1.0 / (Constants.C * Constants.C);

    private final Field field;
    private final double qm;
    private final FieldSample sample = new FieldSample();
    private long evaluations;

    public LorentzEquations(Field field, Species species) {
        this.field = field;
        this.qm = species.chargeToMass();
    }

    /** Fills yDot with dy/dt at time t (s) and state y (m, m/s); one field evaluation. */
    public void derivatives(double t, double[] y, double[] yDot) {
        field.evaluateForce(t, y[0], y[1], y[2], sample);
        evaluations++;
        FieldSample f = sample;
        double ux = y[3], uy = y[4], uz = y[5];
        double ig = 1.0 / Math.sqrt(1.0 + (ux * ux + uy * uy + uz * uz) * INV_C2);
        yDot[0] = ux * ig;
        yDot[1] = uy * ig;
        yDot[2] = uz * ig;
        yDot[3] = qm * (f.ex + ig * (uy * f.bz - uz * f.by));
        yDot[4] = qm * (f.ey + ig * (uz * f.bx - ux * f.bz));
        yDot[5] = qm * (f.ez + ig * (ux * f.by - uy * f.bx));
    }

    /** Field evaluations since construction or the last {@link #resetCount()}. */
    public long evaluations() {
        return evaluations;
    }

    public void resetCount() {
        evaluations = 0;
    }

    Field field() {
        return field;
    }
}
