package org.twinorbit.integrators;

import org.twinorbit.integrators.guidingcenter.GcRk4;
import org.twinorbit.integrators.guidingcenter.GuidingCenterStepper;
import org.twinorbit.integrators.maps.InitialCondition;
import org.twinorbit.integrators.reference.GuidingCenterReference;
import org.twinorbit.integrators.reference.GuidingCenterResult;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.twinorbit.fields.MirrorField;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * The `mirror` field on its axis, B = B0 [1 + (Rm−1) z²/Lm²]. There ∇×b = 0 and ∇|B| = B' ẑ, so
 * the guiding-center equations reduce to dz/dt = p∥/(γm), dp∥/dt = −(μ/γ) dB/dz with γ
 * constant (energy): z'' = −(2μB0(Rm−1)/(γ²m Lm²)) z, a harmonic oscillator. With
 * μB0 = p⊥0²/(2m) = γ²m v⊥0²/2 its angular frequency is ω_b = v⊥0 sqrt(Rm−1)/Lm, relativistic
 * or not, and the bounce period is T_b = 2π Lm/(v⊥0 sqrt(Rm−1)) (derived here from the
 * equations; the harmonic mirror is a textbook case, common practice).
 */
class GuidingCenterMirrorTest {

    private static final double B0 = 0.5, RM = 4, LM = 1;
    private static final MirrorField FIELD = new MirrorField(B0, RM, LM);

    private static double bouncePeriod(InitialCondition ic) {
        double vPerp = ic.momentum() * Math.sin(Math.toRadians(ic.pitchDeg())) / (ic.gamma() * ic.species().mass());
        return 2 * Math.PI * LM / (vPerp * Math.sqrt(RM - 1));
    }

    @Test
    void onAxisBouncePeriodIsTheHarmonicOne() {
        for (Species s : new Species[] {Species.PROTON, Species.ELECTRON}) {
            // 1 MeV: relativistic for the electron (γ ≈ 2.96)
            InitialCondition ic = InitialCondition.ofEnergy(FIELD, s, 1e6, 60, Vec3.ZERO);
            double tb = bouncePeriod(ic);
            GuidingCenterResult r = new GuidingCenterReference(FIELD, s, ic.mu()).stopAfterMirrorPoints(4)
                    .run(0, new double[3], ic.parallelMomentum(), 10 * tb, 0, null);
            List<GuidingCenterResult.MirrorPoint> mp = r.mirrorPoints();
            assertEquals(4, mp.size());
            // mirror points at T_b/4, 3T_b/4, ...: period from the 1st and 4th (1.5 periods)
            double measured = (mp.get(3).time() - mp.get(0).time()) / 1.5;
            System.out.printf("mirror on-axis bounce period (%s, 1 MeV, 60 deg): relative error %.2e%n",
                    s.name(), measured / tb - 1);
            assertEquals(tb, measured, 1e-6 * tb); // the 1e-6
            assertEquals(tb / 4, mp.get(0).time(), 1e-6 * tb);
            assertEquals(tb, r.bouncePeriod(), 1e-6 * tb);
            // mirror point where μB = W (non-relativistic form) i.e. p⊥² = p² there:
            // B_m = B0/sin²α (common practice)
            double bm = B0 / Math.pow(Math.sin(Math.toRadians(60)), 2);
            for (GuidingCenterResult.MirrorPoint p : mp) {
                assertEquals(bm, p.fieldStrength(), 1e-9 * bm);
                assertEquals(LM / Math.tan(Math.toRadians(60)) / Math.sqrt(RM - 1), Math.abs(p.position().z()), 1e-9 * LM);
                assertEquals(0, Math.hypot(p.position().x(), p.position().y()), 0);
            }
        }
    }

    @Test
    void lossConeSeparatesEscapingFromTrappedParticles() {
        // loss cone sin²α = 1/Rm (common practice): α_lc = 30° for Rm = 4
        double alphaLc = Math.toDegrees(Math.asin(Math.sqrt(1 / RM)));
        Species s = Species.PROTON;
        for (double offset : new double[] {-1.0, 1.0}) {
            InitialCondition ic = InitialCondition.ofEnergy(FIELD, s, 1e4, alphaLc + offset, Vec3.ZERO);
            double tb = bouncePeriod(ic);
            GuidingCenterResult r = new GuidingCenterReference(FIELD, s, ic.mu())
                    .run(0, new double[3], ic.parallelMomentum(), 3 * tb, 0, null);
            if (offset < 0) {
                assertEquals(OrbitStatus.LOST, r.status(), "inside the loss cone must escape");
                assertEquals(LM, r.position().z(), 1e-9 * LM);
                assertTrue(r.mirrorPoints().isEmpty());
            } else {
                assertEquals(OrbitStatus.OK, r.status(), "outside the loss cone must stay trapped");
                assertTrue(r.mirrorPoints().size() >= 5);
            }
        }
    }

    @Test
    void rk4ConvergesAtOrderFour() {
        // against the analytic harmonic solution p∥(t) = p∥0 cos(ω_b t) (derived above)
        Species s = Species.PROTON;
        InitialCondition ic = InitialCondition.ofEnergy(FIELD, s, 1e4, 50, Vec3.ZERO);
        double tb = bouncePeriod(ic);
        double w = 2 * Math.PI / tb;
        double tEnd = 0.9 * tb;
        double p0 = ic.parallelMomentum();
        double[] err = new double[3];
        int[] steps = {20, 40, 80};
        for (int k = 0; k < 3; k++) {
            GuidingCenterStepper st = new GcRk4().stepper(FIELD, s, ic.mu(), tEnd / steps[k]);
            st.start(0, new double[3], p0);
            for (int i = 0; i < steps[k]; i++) {
                assertTrue(st.step());
            }
            double[] x = new double[3];
            st.position(x);
            double zExact = p0 / (ic.gamma() * s.mass() * w) * Math.sin(w * tEnd);
            err[k] = Math.abs(x[2] - zExact) / LM + Math.abs(st.parallelMomentum() - p0 * Math.cos(w * tEnd)) / p0;
        }
        double order1 = Math.log(err[0] / err[1]) / Math.log(2);
        double order2 = Math.log(err[1] / err[2]) / Math.log(2);
        System.out.printf("gc-rk4 order on the harmonic mirror: %.3f %.3f (errors %.2e %.2e %.2e)%n",
                order1, order2, err[0], err[1], err[2]);
        // classical RK4 is fourth order (Kutta 1901); 3.8..4.2 allows for the asymptotic range
        assertEquals(4, order2, 0.2);
        assertEquals(4, order1, 0.3);
        assertTrue(err[0] > 1e-8, "a coarse step must show error: " + err[0]);
    }
}
