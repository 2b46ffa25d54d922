package org.twinorbit.integrators;

import org.twinorbit.integrators.guidingcenter.GuidingCenterState;
import org.twinorbit.integrators.maps.GyroMaps;
import org.twinorbit.integrators.maps.GyroParticle;
import org.twinorbit.integrators.maps.GyroPlacement;
import org.twinorbit.integrators.maps.InitialCondition;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.UniformField;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/** The particle <-> guiding-center maps of {@link GyroMaps} and {@link InitialCondition}. */
class GuidingCenterMapTest {

    /** A positive and a negative charge, one of them relativistic. */
    private static Species species(boolean positive) {
        return positive ? Species.PROTON : Species.ELECTRON;
    }

    @ParameterizedTest
    @ValueSource(booleans = {true, false})
    void guidingCenterIsTheCentreOfCurvatureOfTheExactCircle(boolean positive) {
        // exact circular orbit in uniform B: the centre lies at distance R = γ m v⊥/(|q|B) along
        // the acceleration a = (q/γm) v × B (Jackson, Classical Electrodynamics, 3rd ed., §12.2)
        Species s = species(positive);
        double b0 = 2.0;
        Field f = new UniformField(b0);
        double[] x = {0.3, -0.2, 0.1};
        double[] u = {2.0e7, -1.0e7, 5.0e6};
        GuidingCenterState gc = GyroMaps.toGuidingCenter(f, s, 0, x, u, false);
        double uPerp = Math.hypot(u[0], u[1]);
        double radius = s.mass() * uPerp / (Math.abs(s.charge()) * b0);
        // direction of q u × ẑ
        double ax = Math.signum(s.charge()) * u[1] / uPerp, ay = -Math.signum(s.charge()) * u[0] / uPerp;
        assertEquals(x[0] + radius * ax, gc.position().x(), 1e-15 * radius + 1e-16);
        assertEquals(x[1] + radius * ay, gc.position().y(), 1e-15 * radius + 1e-16);
        assertEquals(x[2], gc.position().z(), 0);
        // μ = p⊥²/(2mB) (definition, docs/design.md)
        assertEquals(s.mass() * uPerp * uPerp / (2 * b0), gc.mu(), 1e-15 * gc.mu());
        assertEquals(s.mass() * u[2], gc.parallelMomentum(), 1e-15 * s.mass() * u[2]);
    }

    @ParameterizedTest
    @ValueSource(booleans = {true, false})
    void zerothOrderRoundTripIsExactInANonUniformField(boolean positive) {
        // round trip particle -> GC -> particle and GC -> particle -> GC: exact up to rounding,
        // because both directions use the fields at X (the map's definition; no outside source)
        Species s = species(positive);
        // sheared field: b turns with x, so b at x and b at X differ at O(ε)
        Field f = new GcShearTestField(1.0, 0.05, 0.0);
        InitialCondition ic = InitialCondition.ofEpsilon(f, s, 0.05, 63, new Vec3(0.01, 0.02, 0.03));
        for (GyroParticle p : ic.particles(8, GyroPlacement.ZEROTH)) {
            GuidingCenterState back = GyroMaps.toGuidingCenter(f, s, 0, p.position().toArray(), p.u().toArray(), false);
            double rho = ic.gyroradius();
            assertEquals(0, back.position().minus(ic.position()).norm(), 1e-13 * rho);
            assertEquals(ic.parallelMomentum(), back.parallelMomentum(), 1e-13 * ic.momentum());
            assertEquals(ic.mu(), back.mu(), 1e-13 * ic.mu());
            assertEquals(0, Math.sin(back.gyrophase() - p.gyrophase()), 1e-12);
            GyroParticle again = GyroMaps.toParticle(f, s, 0, back, GyroPlacement.ZEROTH);
            assertEquals(0, again.position().minus(p.position()).norm(), 1e-13 * rho);
            assertEquals(0, again.u().minus(p.u()).norm(), 1e-13 * p.u().norm());
        }
    }

    @Test
    void ensembleHasEvenlySpacedPhasesAndTheRequestedEnergyAndPitch() {
        // definitions: kinetic energy (γ−1)mc², pitch from b (common practice)
        Species s = Species.ELECTRON;
        Field f = new UniformField(1.0);
        InitialCondition ic = InitialCondition.ofEnergy(f, s, 1e6, 40, new Vec3(1, 2, 3));
        List<GyroParticle> ps = ic.particles(8, GyroPlacement.ZEROTH_EXB);
        assertEquals(8, ps.size());
        Vec3 mean = Vec3.ZERO;
        for (int k = 0; k < 8; k++) {
            GyroParticle p = ps.get(k);
            assertEquals(2 * Math.PI * k / 8, p.gyrophase(), 1e-15);
            double ev = Relativity.kineticFromU(s, p.u().norm());
            assertEquals(1e6, ev, 1e-9);
            assertEquals(Math.cos(Math.toRadians(40)), p.u().z() / p.u().norm(), 1e-14);
            assertEquals(ic.gyroradius() * Math.sin(Math.toRadians(40)), p.position().minus(ic.position()).norm(), 1e-12);
            mean = mean.plus(p.position().times(1.0 / 8));
        }
        // the ring of an evenly spaced ensemble is centred on the guiding center
        assertEquals(0, mean.minus(ic.position()).norm(), 1e-14 * ic.position().norm());
    }

    @Test
    void epsilonGivesTheRequestedGyroradius() {
        // ε = ρ0/L with ρ0 = p/(|q|B) (docs/design.md, "What is measured")
        Field f = new GcShearTestField(0.7, 2.0, 0);
        InitialCondition ic = InitialCondition.ofEpsilon(f, Species.ALPHA, 0.03, 10, Vec3.ZERO);
        assertEquals(0.03, ic.gyroradius() / 2.0, 1e-13);
        assertEquals(0.03, ic.epsilon(), 1e-13);
    }

    @Test
    void badInputNamesTheOptionAndRange() {
        Field f = new UniformField(1.0);
        Species s = Species.PROTON;
        assertMessage(() -> InitialCondition.ofEnergy(f, s, -1, 10, Vec3.ZERO), "energy", "> 0");
        assertMessage(() -> InitialCondition.ofEnergy(f, s, 1e3, 181, Vec3.ZERO), "pitch", "[0, 180]");
        assertMessage(() -> InitialCondition.ofEpsilon(f, s, 0.1, 10, Vec3.ZERO), "eps", "length");
        Field g = new GcShearTestField(1, 1, 0);
        assertMessage(() -> InitialCondition.ofEpsilon(g, s, 1.2, 10, Vec3.ZERO), "eps", "< 1");
        assertMessage(() -> InitialCondition.ofEpsilon(g, s, 0.1, 10, new Vec3(Double.NaN, 0, 0)), "start", "domain");
    }

    @ParameterizedTest
    @ValueSource(booleans = {true, false})
    void driftFrameRoundTripIsExactEvenForRelativisticExB(boolean positive) {
        // E0 = 0.6 c B0: v_E = 0.6 c, the boost is far from Galilean; round trip exact by construction
        Species s = species(positive);
        Field f = new org.twinorbit.fields.CrossedField(1.0, 0.6 * 299792458.0);
        InitialCondition ic = InitialCondition.ofEnergy(f, s, 2e5, 70, new Vec3(0.1, 0, 0));
        for (GyroParticle p : ic.particles(6, GyroPlacement.ZEROTH_EXB)) {
            GuidingCenterState back = GyroMaps.toGuidingCenter(f, s, 0, p.position().toArray(), p.u().toArray(), true);
            assertEquals(0, back.position().minus(ic.position()).norm(), 1e-13 * ic.gyroradius());
            assertEquals(ic.mu(), back.mu(), 1e-12 * ic.mu());
            assertEquals(ic.parallelMomentum(), back.parallelMomentum(), 1e-12 * ic.momentum());
        }
    }

    @Test
    void particleAtRestInTheDriftFrameMovesStraightAtExB() {
        // a particle moving exactly at v_E = E×B/B² (E < cB) feels no force and goes straight
        // (Vay, Phys. Plasmas 15, 056701, 2008); checked with the exact Lorentz equations
        // (Commons Math DP853) at v_E = 0.6 c, where a Galilean placement would visibly curve
        Species s = Species.ELECTRON;
        double e0 = 0.6 * 299792458.0;
        Field f = new org.twinorbit.fields.CrossedField(1.0, e0);
        GyroParticle p = GyroMaps.toParticle(f, s, 0, new GuidingCenterState(Vec3.ZERO, 0, 0, 0), GyroPlacement.ZEROTH_EXB);
        double g = 1 / Math.sqrt(1 - 0.36);
        assertEquals(-g * 0.6 * 299792458.0, p.u().y(), 1e-9 * 299792458.0);
        double[] y = {0, 0, 0, p.u().x(), p.u().y(), p.u().z()};
        double t = 1e-9;
        GcLorentzTestOrbit.advance(f, s, 0, t, y, 1e-12, 1.0);
        assertEquals(-0.6 * 299792458.0 * t, y[1], 1e-9 * 0.6 * 299792458.0 * t);
        assertEquals(0, y[0], 1e-9 * 0.6 * 299792458.0 * t);
    }

    @Test
    void firstOrderPlacementKeepsTheKineticEnergy() {
        // docs/design.md: adding drifts at fixed μ, p∥ changes the energy at O(ε); the first-order
        // placement rescales the gyration so the drift-frame kinetic energy is the requested one
        Species s = Species.PROTON;
        Field f = new org.twinorbit.fields.GradientField(1.0, 1.0);
        InitialCondition ic = InitialCondition.ofEpsilon(f, s, 0.05, 60, Vec3.ZERO);
        double vD = ic.mu() / (s.charge() * ic.gamma() * 1.0); // grad-B drift μ B0/(qγ B Lg), B = B0
        double meanUy = 0;
        for (GyroParticle p : ic.particles(8, GyroPlacement.FIRST_ORDER_ENERGY_KEPT)) {
            assertEquals(ic.kineticEv(), Relativity.kineticFromU(s, p.u().norm()), 1e-12 * ic.kineticEv());
            meanUy += p.u().y() / 8;
        }
        for (GyroParticle p : ic.particles(8, GyroPlacement.ZEROTH)) {
            assertEquals(ic.kineticEv(), Relativity.kineticFromU(s, p.u().norm()), 1e-12 * ic.kineticEv());
        }
        // u = u∥ b + a(θ) ê + d with a = −ê·d + sqrt((ê·d)² + u⊥² − d²); averaged over evenly
        // spaced θ, ⟨a ê⟩ = −d/2 + O(d²/u⊥), so the ensemble carries half the drift (derived here)
        assertEquals(ic.gamma() * vD / 2, meanUy, 0.05 * vD);
    }

    private static void assertMessage(org.junit.jupiter.api.function.Executable e, String... words) {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class, e);
        for (String w : words) {
            assertTrue(ex.getMessage().contains(w), ex.getMessage());
        }
    }
}
