package org.twinorbit.integrators;

import org.twinorbit.integrators.guidingcenter.GuidingCenterEquations;
import org.twinorbit.integrators.maps.InitialCondition;
import org.twinorbit.integrators.reference.GuidingCenterReference;
import org.twinorbit.integrators.reference.GuidingCenterResult;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.fields.TokamakField;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * The `tokamak` field (circular flux surfaces, R0 = 1.5 m, a = 0.5 m, B0 = 2 T).
 * <ul>
 *   <li>The guiding-center toroidal canonical momentum p_φ = p∥ R b_φ + qψ, ψ = R A_φ, is exact
 *       for the GC equations, whose phase-space Lagrangian is axisymmetric (Littlejohn, J. Plasma
 *       Phys. 29, 111, 1983), and so is the energy; the reference keeps both to ~1e-9 over many
 *       bounces.</li>
 *   <li>At the outboard midplane a particle is trapped when sin²α &gt; B_min/B_max on its flux
 *       surface (common practice), and here |B| ∝ 1/R on a surface, so B_min/B_max =
 *       (R0 − r)/(R0 + r) exactly.</li>
 * </ul>
 */
class GuidingCenterTokamakTest {

    private static final double R0 = 1.5, A = 0.5;
    private static final TokamakField FIELD = new TokamakField(R0, A, 2.0, 1.1, 3.5);
    private static final double R_MINOR = 0.25;
    private static final Species S = Species.PROTON;
    /**
     * p_φ ≈ qψ is sensitive to radial position error, which the reference accumulates along the
     * ~10² m path of 20 bounces: with the position held to rtol·ρ0, p_φ drifts by ~1e-10 p R at
     * the default rtol 1e-11 and ~1e-12 p R at 1e-13 (measured; ~1e-7 and ~7e-10 while the
     * tolerance followed |X|) — integration error, not a defect of the invariant.
     */
    private static final double RTOL = 1e-13;
    private static final double ALPHA_CRIT =
            Math.toDegrees(Math.asin(Math.sqrt((R0 - R_MINOR) / (R0 + R_MINOR))));

    private static double pPhi(double[] x, double pPar, FieldSample f, double[] a) {
        FIELD.evaluate(0, x[0], x[1], x[2], f);
        FIELD.vectorPotential(0, x[0], x[1], x[2], a);
        double bMag = f.bMag();
        double rbPhi = (x[0] * f.by - x[1] * f.bx) / bMag; // R b_φ
        return pPar * rbPhi + S.charge() * (x[0] * a[1] - x[1] * a[0]);
    }

    @Test
    void canonicalMomentumAndEnergyAreKeptOverManyBounces() {
        InitialCondition ic = InitialCondition.ofEpsilon(FIELD, S, 0.002, ALPHA_CRIT + 8, new Vec3(R0 + R_MINOR, 0, 0));
        GuidingCenterReference ref = new GuidingCenterReference(FIELD, S, ic.mu()).relativeTolerance(RTOL).stopAfterMirrorPoints(40);
        GuidingCenterEquations eq = new GuidingCenterEquations(FIELD, S, ic.mu());
        FieldSample f = new FieldSample();
        double[] a = new double[3];
        double[] y0 = {R0 + R_MINOR, 0, 0, ic.parallelMomentum()};
        double p0 = pPhi(y0, y0[3], f, a);
        double w0 = eq.energy(0, y0);
        double scale = ic.momentum() * (R0 + R_MINOR); // p R, the scale of p_φ changes
        double[] worst = new double[2];
        double[] y = new double[4];
        GuidingCenterResult r = ref.run(0, y0, ic.parallelMomentum(), 1.0, 1e-7, (t, x, pPar) -> {
            y[0] = x[0];
            y[1] = x[1];
            y[2] = x[2];
            y[3] = pPar;
            worst[0] = Math.max(worst[0], Math.abs(pPhi(x, pPar, f, a) - p0) / scale);
            worst[1] = Math.max(worst[1], Math.abs(eq.energy(t, y) - w0) / w0);
        });
        System.out.printf("tokamak: %d mirror points, max |d p_phi|/(p R) %.2e, max |dW|/W %.2e%n",
                r.mirrorPoints().size(), worst[0], worst[1]);
        assertEquals(OrbitStatus.OK, r.status());
        assertEquals(40, r.mirrorPoints().size()); // 20 bounces
        // rtol 1e-11 accumulated over ~10⁴ steps: 1e-9 (the level)
        assertTrue(worst[0] < 1e-9, "p_phi drift " + worst[0]);
        assertTrue(worst[1] < 1e-9, "energy drift " + worst[1]);
    }

    @Test
    void trappedPassingBoundaryIsTheMirrorRatioOfTheFluxSurface() {
        // ε = 5e-4: the banana width (~qρ sqrt(R0/r)) is ~1% of r, far inside the ±3° margin
        for (double offset : new double[] {-3, 3}) {
            InitialCondition ic = InitialCondition.ofEpsilon(FIELD, S, 5e-4, ALPHA_CRIT + offset,
                    new Vec3(R0 + R_MINOR, 0, 0));
            double v = ic.momentum() / (ic.gamma() * S.mass());
            double transit = 2 * Math.PI * 3 * R0 / v * 3; // several poloidal transits (q ≤ 3 here)
            boolean[] inboard = {false};
            GuidingCenterResult r = new GuidingCenterReference(FIELD, S, ic.mu())
                    .run(0, ic.position().toArray(), ic.parallelMomentum(), transit, transit / 2000,
                            (t, x, p) -> inboard[0] |= Math.hypot(x[0], x[1]) < R0 - 0.95 * R_MINOR);
            assertEquals(OrbitStatus.OK, r.status());
            if (offset > 0) {
                assertTrue(r.mirrorPoints().size() >= 2, "trapped particle must bounce");
                assertTrue(!inboard[0], "a trapped particle never reaches the inboard midplane");
            } else {
                assertTrue(r.mirrorPoints().isEmpty(), "passing particle must not mirror");
                assertTrue(inboard[0], "a passing particle goes round to the inboard midplane");
            }
        }
    }
}
