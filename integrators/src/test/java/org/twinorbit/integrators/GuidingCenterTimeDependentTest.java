package org.twinorbit.integrators;

import org.twinorbit.integrators.maps.InitialCondition;
import org.twinorbit.integrators.reference.GuidingCenterReference;
import org.twinorbit.integrators.reference.GuidingCenterResult;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.twinorbit.fields.RampField;
import org.twinorbit.fields.WaveField;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/** The first-order equations in the time-dependent fields `ramp` and `wave`. */
class GuidingCenterTimeDependentTest {

    @Test
    void rampPinchKeepsTheMagneticFluxThroughTheOrbit() {
        // In B = B0(1 + t/τ) ẑ with the inductive E = (B0/2τ)(y, −x, 0), the E×B drift moves the
        // guiding center inward so that B r² stays constant (flux freezing; common practice).
        Species s = Species.PROTON;
        double b0 = 1.0, tau = 1e-5;
        RampField f = new RampField(b0, tau);
        double r0 = 0.3;
        InitialCondition ic = InitialCondition.ofEnergy(f, s, 1e3, 90, new Vec3(r0, 0, 0));
        double tEnd = 3 * tau;
        GuidingCenterResult r = new GuidingCenterReference(f, s, ic.mu())
                .run(0, ic.position().toArray(), 0.0, tEnd, 0, null);
        double rEnd = Math.hypot(r.position().x(), r.position().y());
        // B(tEnd) = 4 B0 -> r = r0/2; rtol 1e-11 -> 1e-9 margin
        assertEquals(r0 / 2, rEnd, 1e-9 * r0);
    }

    @Test
    void waveGivesTheInstantaneousExBDrift() {
        // E = E0 sin(ωt) x̂: the first-order GC moves at v_E = −(E0/B0) sin(ωt) ŷ, so
        // Y(t) = −(E0/(B0 ω))(1 − cos ωt) (integrated by hand); the polarization drift
        // (E0 ω/(Ω B0)) cos(ωt) x̂ of the exact driven orbit is omitted by these equations
        Species s = Species.PROTON;
        double b0 = 1.0, e0 = 1e3;
        double omegaC = s.charge() * b0 / s.mass();
        double w = 0.05 * omegaC;
        WaveField f = new WaveField(b0, e0, w, s);
        InitialCondition ic = InitialCondition.ofEnergy(f, s, 1e3, 90, Vec3.ZERO);
        double tEnd = 2.7 * 2 * Math.PI / w;
        GuidingCenterResult r = new GuidingCenterReference(f, s, ic.mu()).run(0, new double[3], 0.0, tEnd, 0, null);
        double expected = -(e0 / (b0 * w)) * (1 - Math.cos(w * tEnd));
        assertEquals(expected, r.position().y(), 1e-9 * e0 / (b0 * w));
        assertEquals(0, r.position().x(), 0);
    }
}
