package org.twinorbit.integrators;

import org.twinorbit.integrators.maps.InitialCondition;
import org.twinorbit.integrators.reference.GuidingCenterReference;
import org.twinorbit.integrators.reference.GuidingCenterResult;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.twinorbit.fields.DipoleField;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * Bounce and drift periods in the `dipole` field, guiding center started on the equator at
 * L = 4 planet radii, against
 * <ul>
 *   <li>the exact zeroth-order bounce integral T_b = (4 L R_p/v) T(y), y = sin α_eq,
 *       T(y) = ∫₀^λm cos λ sqrt(1 + 3 sin²λ) / sqrt(1 − B(λ)/B_m) dλ, by quadrature (common
 *       practice; e.g. Schulz &amp; Lanzerotti, Particle Diffusion in the Radiation Belts, 1974);</li>
 *   <li>Hamlin et al. (J. Geophys. Res. 66, 1961): T(y) ≈ 1.30 − 0.56 y and, for the
 *       bounce-averaged drift, D(y)/T(y) ≈ 0.35 + 0.15 y (coefficients from memory);</li>
 *   <li>Schulz &amp; Lanzerotti (1974): T(y) ≈ 1.3802 − 0.3198 (y + y^½) and
 *       D(y) ≈ (5.520692 − 2.357194 y + 1.279385 y^¾)/12 (coefficients from memory);</li>
 * </ul>
 * with ⟨ω_d⟩ = (3 L γ m v²/(|q| B_s R_p²)) D(y)/T(y) (the same sources; equals the grad-B drift
 * of an equatorial particle at y = 1, where D/T = 1/2).
 */
class GuidingCenterDipoleTest {

    private static final double BS = 3.0e-5, RP = 6.4e6, L = 4;
    private static final DipoleField FIELD = new DipoleField(BS, RP, L);

    /** Exact T(y) by quadrature, with λ = λm sin φ removing the endpoint singularity. */
    static double exactT(double y) {
        double y2 = y * y;
        UnivariateFunction mirror = lam -> Math.pow(Math.cos(lam), 6) - y2 * Math.sqrt(1 + 3 * Math.pow(Math.sin(lam), 2));
        double lm = new BrentSolver(1e-15).solve(1000, mirror, 0, Math.PI / 2 - 1e-9);
        UnivariateFunction f = phi -> {
            double lam = lm * Math.sin(phi);
            double s2 = Math.pow(Math.sin(lam), 2);
            double ratio = y2 * Math.sqrt(1 + 3 * s2) / Math.pow(Math.cos(lam), 6); // B/B_m
            return Math.cos(lam) * Math.sqrt(1 + 3 * s2) / Math.sqrt(1 - ratio) * lm * Math.cos(phi);
        };
        // a fixed 100-point Gauss–Legendre rule: the integrand is smooth, and adaptive refinement
        // would only chase the rounding noise of 1 − B/B_m at nodes ever closer to λm
        return new GaussIntegratorFactory().legendre(100, 0, Math.PI / 2).integrate(f);
    }

    @Test
    void bounceIntegralHasItsEquatorialLimit() {
        // y -> 1: small harmonic bounce about the equator, T(1) = π√2/6 (B ≈ B_eq(1 + 9λ²/2);
        // Schulz & Lanzerotti 1974, from memory); checks the quadrature itself
        assertEquals(Math.PI * Math.sqrt(2) / 6, exactT(Math.sin(Math.toRadians(89.9))), 1e-5);
    }

    @ParameterizedTest
    @CsvSource({"electron, 1e6, 30", "electron, 1e6, 60", "proton, 1e4, 45", "proton, 1e4, 75"})
    void bounceAndDriftPeriods(String species, double ev, double pitch) {
        Species s = Species.parse(species);
        InitialCondition ic = InitialCondition.ofEnergy(FIELD, s, ev, pitch, new Vec3(L * RP, 0, 0));
        double v = ic.momentum() / (ic.gamma() * s.mass());
        double y = Math.sin(Math.toRadians(pitch));
        double tExact = exactT(y);
        double tbExact = 4 * L * RP / v * tExact;
        GuidingCenterResult r = new GuidingCenterReference(FIELD, s, ic.mu()).stopAfterMirrorPoints(3)
                .run(0, ic.position().toArray(), ic.parallelMomentum(), 10 * tbExact, 0, null);
        assertEquals(OrbitStatus.OK, r.status());
        var m1 = r.mirrorPoints().get(0);
        var m3 = r.mirrorPoints().get(2);
        double tb = m3.time() - m1.time();
        double dPhi = Math.atan2(m3.position().y(), m3.position().x()) - Math.atan2(m1.position().y(), m1.position().x());
        double omegaD = Math.abs(dPhi) / tb;
        double omegaScale = 3 * L * ic.gamma() * s.mass() * v * v / (Math.abs(s.charge()) * BS * RP * RP);
        double tHamlin = 1.30 - 0.56 * y;
        double tSchulz = 1.3802 - 0.3198 * (y + Math.sqrt(y));
        double dSchulz = (5.520692 - 2.357194 * y + 1.279385 * Math.pow(y, 0.75)) / 12;
        double wHamlin = omegaScale * (0.35 + 0.15 * y);
        double wSchulz = omegaScale * dSchulz / tSchulz;
        System.out.printf("dipole %s %.0f eV pitch %.0f eps %.2e: T_b/exact-1 %.2e, vs Hamlin %.2e, vs Schulz %.2e;"
                        + " omega_d vs Hamlin %.2e, vs Schulz %.2e; Hamlin T(y) own error %.2e%n",
                species, ev, pitch, ic.epsilon(), tb / tbExact - 1, tb / (4 * L * RP / v * tHamlin) - 1,
                tb / (4 * L * RP / v * tSchulz) - 1, omegaD / wHamlin - 1, omegaD / wSchulz - 1, tHamlin / tExact - 1);
        // In the dipole ∇×b is azimuthal and ∇|B| meridional, so B*·∇|B| = B·∇|B|: the GC parallel
        // motion is the zeroth-order one and T_b must equal the exact integral; 1e-8 covers the
        // quadrature (~1e-10) and the reference (rtol 1e-11).
        assertEquals(tbExact, tb, 1e-8 * tbExact);
        // Schulz & Lanzerotti's fit: within 1% (the accuracy the issue asks; measured ≤ 0.6%)
        assertEquals(4 * L * RP / v * tSchulz, tb, 0.01 * tb);
        // Hamlin's linear fit is itself 0.3–2% off the exact integral over 30°–75° (printed as
        // "own error"), so the guiding center can only match it to that: 2.5%
        assertEquals(4 * L * RP / v * tHamlin, tb, 0.025 * tb);
        // drift frequency: both approximations within 1% (measured ≤ 0.6%; the GC's own
        // correction is O(ε) ≤ 4e-3 here)
        assertEquals(wHamlin, omegaD, 0.01 * omegaD);
        assertEquals(wSchulz, omegaD, 0.01 * omegaD);
    }
}
