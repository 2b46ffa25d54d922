package org.twinorbit.integrators;

import org.twinorbit.integrators.guidingcenter.GuidingCenterState;
import org.twinorbit.integrators.maps.GyroMaps;
import org.twinorbit.integrators.maps.GyroParticle;
import org.twinorbit.integrators.maps.GyroPlacement;
import org.twinorbit.integrators.maps.InitialCondition;
import org.twinorbit.integrators.reference.GuidingCenterReference;
import org.twinorbit.integrators.reference.GuidingCenterResult;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.twinorbit.fields.CrossedField;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/** E×B drift in B = B0 ẑ, E = E0 x̂: v_E = E×B/B² exactly (Jackson ch. 12). */
class GuidingCenterCrossedFieldTest {

    private static final double B0 = 1.0, E0 = 1e4;

    @Test
    void guidingCenterDriftsAtExactlyEcrossBOverB2() {
        for (Species s : new Species[] {Species.PROTON, Species.ELECTRON}) {
            CrossedField f = new CrossedField(B0, E0);
            InitialCondition ic = InitialCondition.ofEnergy(f, s, 1e4, 70, new Vec3(0.1, 0.2, 0.3));
            double tEnd = 30 * ic.gyroperiod();
            GuidingCenterReference ref = new GuidingCenterReference(f, s, ic.mu());
            GuidingCenterResult r = ref.run(0, ic.position().toArray(), ic.parallelMomentum(), tEnd, 0, null);
            double vE = -E0 / B0; // (E0 x̂ × B0 ẑ)/B0² = −(E0/B0) ŷ
            double vPar = ic.parallelMomentum() / (ic.gamma() * s.mass());
            assertEquals(0.1, r.position().x(), 1e-15);
            // rtol 1e-11 of the reference: 1e-10 relative margin
            assertEquals(0.2 + vE * tEnd, r.position().y(), 1e-10 * Math.abs(vE * tEnd));
            assertEquals(0.3 + vPar * tEnd, r.position().z(), 1e-10 * Math.abs(vPar * tEnd));
        }
    }

    @Test
    void defaultPlacementStartsTheExactOrbitWhoseCentreDriftsAtEcrossB() {
        // The exact Lorentz orbit (Commons Math DP853 at rtol 1e-12) from the default placement
        // (ring in the E×B frame) must keep its mapped guiding center on X0 + v_E t at every
        // time, for every gyrophase. Tolerance (1e-7 + 3 v_E v/c²) ρ: the map places the
        // drift-frame ring at equal laboratory time, so relativity of simultaneity moves it by
        // ~(v_E v/c²) ρ (6e-6 ρ for the electron here) — documented in GyroMaps; the
        // reference's own error is ~1e-10 ρ.
        CrossedField f = new CrossedField(B0, E0);
        for (Species s : new Species[] {Species.PROTON, Species.ELECTRON}) {
            InitialCondition ic = InitialCondition.ofEnergy(f, s, 1e4, 50, Vec3.ZERO);
            double rho = ic.gyroradius();
            double v = ic.momentum() / (ic.gamma() * s.mass());
            double tol = (1e-7 + 3 * (E0 / B0) * v / (299792458.0 * 299792458.0)) * rho;
            double tc = ic.gyroperiod();
            for (GyroParticle p : ic.particles(4, GyroPlacement.ZEROTH_EXB)) {
                double[] y = {p.position().x(), p.position().y(), p.position().z(), p.u().x(), p.u().y(), p.u().z()};
                double t = 0;
                for (double tNext : new double[] {0.37 * tc, 1.9 * tc, 3.25 * tc}) {
                    GcLorentzTestOrbit.advance(f, s, t, tNext, y, 1e-12, rho);
                    t = tNext;
                    GuidingCenterState gc = GyroMaps.toGuidingCenter(f, s, t,
                            new double[] {y[0], y[1], y[2]}, new double[] {y[3], y[4], y[5]}, true);
                    assertEquals(0, gc.position().x(), tol);
                    assertEquals(-E0 / B0 * t, gc.position().y(), tol);
                    assertEquals(ic.parallelMomentum() / (ic.gamma() * s.mass()) * t, gc.position().z(), tol);
                    assertEquals(ic.mu(), gc.mu(), 1e-8 * ic.mu());
                }
            }
        }
    }
}
