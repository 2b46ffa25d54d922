package org.twinorbit.harness.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.shared.Gyration;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/**
 * The gyration averages on the exact orbit in a uniform field, sampled as a pusher would:
 * a helix x(t) = X + ρ(cos Ωt, −sin Ωt) for a proton (it gyrates clockwise about B = B0 ẑ;
 * Jackson, Classical Electrodynamics, 3rd ed., §12.2), u∥ along z.
 */
class GyroAveragerTest {

    @Test
    void exactHelixGivesExactAverages() {
        Species p = Species.PROTON;
        Field f = Fields.create("uniform", p);
        double ev = 1e4;
        double u = Relativity.uFromKinetic(p, ev);
        double gamma = Relativity.gammaFromKinetic(p, ev);
        double uPerp = 0.8 * u;
        double uPar = 0.6 * u;
        double omega = Gyration.frequency(p, 1.0, gamma);
        double rho = Gyration.radius(p, uPerp, 1.0);
        double[] center = {0.3, -0.2, 0.1};
        GyroAverager g = new GyroAverager(f, p, 1e-6 * u);
        int perGyration = 13; // not a power of two: crossings fall inside steps
        int n = 10 * perGyration + 5;
        double dt = 2 * Math.PI / omega / perGyration;
        for (int i = 0; i <= n; i++) {
            double t = i * dt;
            double ph = omega * t;
            double[] x = {center[0] + rho * Math.cos(ph), center[1] - rho * Math.sin(ph), center[2] + uPar / gamma * t};
            double[] v = {-uPerp * Math.sin(ph), -uPerp * Math.cos(ph), uPar};
            g.observe(t, x, v);
        }
        assertEquals(10, g.gyrations());
        double mu = p.mass() * uPerp * uPerp / 2; // μ = p⊥²/(2mB), B = 1 T
        for (int k = 0; k < g.gyrations(); k++) {
            assertEquals(mu, g.mu(k), 1e-12 * mu);
            // X = x − m(b × w)/(qB) is the center at every sample, so its average is too;
            // the mean parallel position is that at the mid-time of the gyration
            Track c = g.centers();
            assertEquals(center[0], c.coord(k, 0), 1e-12);
            assertEquals(center[1], c.coord(k, 1), 1e-12);
            assertEquals(center[2] + uPar / gamma * c.time(k), c.coord(k, 2), 1e-9 * rho);
            assertEquals(uPar / gamma, c.vParallel(k), 1e-9 * u);
            // gyration k ends after k + 1 periods
            assertEquals((k + 1) * 2 * Math.PI / omega, g.end(k), 1e-9 / omega);
        }
        assertEquals(omega, g.frequency(), 1e-9 * omega);
        assertEquals(0.0, OrbitMetrics.muChange(g), 1e-12);
    }

    @Test
    void mirrorPointsIgnoreNoiseAroundZero() {
        Track t = new Track(1.0);
        // v∥ = 10 cos(t): sign changes at π/2 (down), 3π/2 (up), 5π/2 (down), 7π/2 (up);
        // noise of ±0.5 around zero inside the dead band must not add crossings
        for (int i = 0; i <= 1200; i++) {
            double time = i * 0.01;
            double v = 10 * Math.cos(time) + ((i % 2 == 0) ? 0.5 : -0.5) * (Math.abs(Math.cos(time)) < 0.05 ? 1 : 0);
            t.add(time, 0, 0, 0, v);
        }
        double[] up = t.upwardMirrorTimes();
        assertEquals(2, up.length);
        // the crossing is placed at the first sign change inside the noisy band, which is
        // 0.05 wide on either side of the true zero
        assertEquals(1.5 * Math.PI, up[0], 0.05);
        assertEquals(3.5 * Math.PI, up[1], 0.05);
        assertEquals(4, t.allMirrorTimes().length);
        assertEquals(2 * Math.PI, OrbitMetrics.bouncePeriod(t), 0.1);
        // without noise the linear interpolation of the cosine's zero is exact to O(dt³)
        Track clean = new Track(1e-9);
        for (int i = 0; i <= 1200; i++) {
            clean.add(i * 0.01, 0, 0, 0, 10 * Math.cos(i * 0.01));
        }
        assertEquals(1.5 * Math.PI, clean.upwardMirrorTimes()[0], 1e-6);
    }
}
