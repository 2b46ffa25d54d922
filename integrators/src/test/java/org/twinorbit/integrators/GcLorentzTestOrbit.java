package org.twinorbit.integrators;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * Test-only full-orbit reference: the exact Lorentz equations dx/dt = u/γ,
 * du/dt = (q/m)(E + u×B/γ) integrated by Commons Math's Dormand–Prince 8(5,3) at a tight
 * tolerance (a general-purpose library integrator, independent of the code under test).
 */
final class GcLorentzTestOrbit {

    private GcLorentzTestOrbit() {}

    /**
     * Advances y = (x (m), u = γv (m/s)) in place from t0 to t1 (s).
     *
     * @param rtol relative tolerance; absolute ones are rtol × (lengthScale, |u0|)
     */
    static void advance(Field field, Species s, double t0, double t1, double[] y, double rtol, double lengthScale) {
        double qm = s.charge() / s.mass();
        FieldSample f = new FieldSample();
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override public int getDimension() { return 6; }
            @Override public void computeDerivatives(double t, double[] z, double[] d) {
                field.evaluate(t, z[0], z[1], z[2], f);
                double ig = 1.0 / Math.sqrt(1 + (z[3] * z[3] + z[4] * z[4] + z[5] * z[5]) / (Constants.C * Constants.C));
                d[0] = z[3] * ig;
                d[1] = z[4] * ig;
                d[2] = z[5] * ig;
                d[3] = qm * (f.ex + (z[4] * f.bz - z[5] * f.by) * ig);
                d[4] = qm * (f.ey + (z[5] * f.bx - z[3] * f.bz) * ig);
                d[5] = qm * (f.ez + (z[3] * f.by - z[4] * f.bx) * ig);
            }
        };
        double u0 = Math.sqrt(y[3] * y[3] + y[4] * y[4] + y[5] * y[5]);
        double[] atol = new double[6];
        double[] rt = new double[6];
        for (int i = 0; i < 6; i++) {
            atol[i] = rtol * (i < 3 ? lengthScale : u0);
            rt[i] = rtol;
        }
        new DormandPrince853Integrator(0, Math.abs(t1 - t0), atol, rt).integrate(ode, t0, y.clone(), t1, y);
    }
}
