package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.Orbits;
import org.twinorbit.integrators.TestField;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.twinorbit.shared.Species;

class PushersTest {

    @Test
    void listsTheBuiltInPushersFirstInTheirOrderThenOthers() {
        assertEquals(List.of("boris", "boris-newtonian", "vay", "higuera-cary", "rk4", "test-explicit-euler"),
                Pushers.names());
        for (FullOrbitPusher p : Pushers.all()) {
            assertTrue(!p.description().isBlank() && p.order() >= 1, p.name());
        }
    }

    @Test
    void refusesAnUnknownNameListingTheValidOnes() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Pushers.byName("borris"));
        assertTrue(e.getMessage().contains("'borris'"), e.getMessage());
        assertTrue(e.getMessage().contains("boris, boris-newtonian, vay, higuera-cary, rk4"), e.getMessage());
    }

    /**
     * The pusher found on the test class path runs: explicit Euler in a uniform B multiplies
     * |u| by sqrt(1 + (Ω Δt)²) every step (its stability function |1 + iΩΔt|; Hairer, Nørsett
     * &amp; Wanner, Solving ODEs I, 1993, §IV.2, section from memory). At u = 1 km/s relativistic terms are 1e-11.
     */
    @Test
    void runsAPusherRegisteredFromTheTestClassPath() {
        FullOrbitPusher p = Pushers.byName("test-explicit-euler");
        Species s = Species.PROTON;
        double omegaDt = 0.1;
        FullOrbitStepper st = p.stepper(TestField.constant(0, 0, 1.0, 0, 0, 0), s, omegaDt * s.mass() / s.charge());
        st.start(0, new double[3], new double[] {1e3, 0, 0});
        for (int k = 0; k < 100; k++) {
            st.step();
        }
        double[] u = new double[3];
        st.velocity(u);
        assertEquals(Math.pow(1 + omegaDt * omegaDt, 50), Orbits.norm(u) / 1e3, 1e-9);
    }
}
