package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.TestField;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.Species;

/**
 * Vay's force-free test (J.-L. Vay, Phys. Plasmas 15, 056701, 2008): a particle moving
 * exactly at v = E×B/B² with E &lt; cB feels E + v×B = 0 and must go straight. Vay's and
 * Higuera–Cary's pushers keep it straight to round-off; relativistic Boris computes γ after a
 * half kick, which no longer matches v, and deflects it.
 */
class VayForceFreeTest {

    private static final Species P = Species.PROTON;

    /** Largest distance (m) from the straight line, relative to the distance travelled. */
    private static double deviation(FullOrbitPusher pusher) {
        double b = 1.0, e = 0.9 * Constants.C * b; // v_E = 0.9 c, γ_E = 2.29
        Field f = TestField.constant(0, 0, b, e, 0, 0);
        double vE = -e / b; // E x̂ × B ẑ / B² = −(E/B) ŷ
        double gE = 1 / Math.sqrt(1 - (vE / Constants.C) * (vE / Constants.C));
        double dt = 0.2 * P.mass() / (P.charge() * b); // Ω Δt = 0.2 for γ = 1
        FullOrbitStepper s = pusher.stepper(f, P, dt);
        s.start(0, new double[3], new double[] {0, gE * vE, 0}); // the synchronisation keeps u_E: no offset
        double[] x = new double[3];
        double worst = 0;
        for (int k = 0; k < 2000; k++) {
            s.step();
            s.position(x);
            worst = Math.max(worst, Math.hypot(x[0], x[2]) / Math.abs(x[1]));
        }
        return worst;
    }

    @Test
    void vayGoesStraight() {
        double d = deviation(new VayPusher());
        // round-off only: ~1e-16 per step, far below any force
        assertTrue(d < 1e-12, "Vay deviation " + d);
    }

    @Test
    void higueraCaryGoesStraight() {
        double d = deviation(new HigueraCaryPusher());
        assertTrue(d < 1e-12, "Higuera-Cary deviation " + d);
    }

    @Test
    void borisIsDeflected() {
        double d = deviation(new BorisPusher());
        // the spurious force is of order one in γ_E at this Ω Δt (Vay 2008)
        assertTrue(d > 1e-4, "Boris deviation " + d);
    }
}
