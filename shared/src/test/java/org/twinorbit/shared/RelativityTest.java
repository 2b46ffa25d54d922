package org.twinorbit.shared;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Relativistic kinematics (Jackson, Classical Electrodynamics, 3rd ed., 1999, ch. 11–12:
 * W = (γ − 1) mc², p = γ m v, E² = (pc)² + (mc²)²).
 */
class RelativityTest {

    private static final Species[] SPECIES = {Species.ELECTRON, Species.PROTON, Species.ALPHA};

    /** eV -> u -> eV over 18 decades, to a few ulps (both directions avoid cancellation). */
    @Test
    void kineticEnergyRoundTripsThroughU() {
        for (Species s : SPECIES) {
            for (double w = 1e-6; w <= 1e12; w *= 10) {
                double back = Relativity.kineticFromU(s, Relativity.uFromKinetic(s, w));
                assertEquals(w, back, 1e-14 * w, s + " at " + w + " eV");
                double gamma = Relativity.gammaFromU2(Math.pow(Relativity.uFromKinetic(s, w), 2));
                assertEquals(Relativity.gammaFromKinetic(s, w), gamma, 1e-15 * gamma, s + " gamma at " + w + " eV");
            }
        }
    }

    /**
     * eV -> speed -> eV while γ &lt; 10. Going back from a speed loses digits as v -> c (1 − β² is
     * formed), by a factor ~ γ², so the bound is 1e-13 γ².
     */
    @Test
    void kineticEnergyRoundTripsThroughSpeed() {
        for (Species s : SPECIES) {
            for (double w = 1e-6; Relativity.gammaFromKinetic(s, w) < 10; w *= 10) {
                double g = Relativity.gammaFromKinetic(s, w);
                double back = Relativity.kineticFromSpeed(s, Relativity.speedFromKinetic(s, w));
                assertEquals(w, back, 1e-13 * g * g * w, s + " at " + w + " eV");
            }
        }
    }

    /** Hand values: W = mc² gives γ = 2, β = √3/2, u = √3 c. */
    @Test
    void restEnergyKineticEnergyGivesGammaTwo() {
        Species e = Species.ELECTRON;
        double w = e.restEnergy() / Constants.E;
        assertEquals(2.0, Relativity.gammaFromKinetic(e, w), 1e-15);
        assertEquals(Math.sqrt(3) / 2 * Constants.C, Relativity.speedFromKinetic(e, w), 1e-15 * Constants.C);
        assertEquals(Math.sqrt(3) * Constants.C, Relativity.uFromKinetic(e, w), 1e-15 * Constants.C);
        assertEquals(Math.sqrt(3) * Constants.C * e.mass(), Relativity.momentumFromKinetic(e, w), 1e-15 * Constants.C * e.mass());
    }

    /**
     * Non-relativistic limit: ½ m v² = W (1 − 3k/2 + O(k²)) with k = W/(mc²) (expansion of
     * (γ+1)/(2γ²); common practice). At 1 eV for a proton k = 1.07e-9 and O(k²) ~ 1e-18, so the
     * check holds to 1e-12 only if no digit of k is lost.
     */
    @Test
    void nonRelativisticLimit() {
        Species p = Species.PROTON;
        for (double w : new double[] {1e-3, 1.0, 100.0}) {
            double k = w * Constants.E / p.restEnergy();
            double v = Relativity.speedFromKinetic(p, w);
            double ratio = 0.5 * p.mass() * v * v / (w * Constants.E);
            assertEquals(1.0 - 1.5 * k, ratio, 1e-12, "1/2 m v^2 / W at " + w + " eV");
            double u = Relativity.uFromKinetic(p, w);
            // ½ m u² = W (1 + k/2) exactly (u² = c² k (2 + k))
            assertEquals(1.0 + 0.5 * k, 0.5 * p.mass() * u * u / (w * Constants.E), 1e-12);
        }
        // and from a speed: W = ½ m v² (1 + 3β²/4 + O(β⁴))
        double v = 1e4;
        double beta2 = v * v / (Constants.C * Constants.C);
        double w = Relativity.kineticFromSpeed(p, v) * Constants.E;
        assertEquals(1.0 + 0.75 * beta2, w / (0.5 * p.mass() * v * v), 1e-12);
    }

    /** Ultra-relativistic: pc -> W + mc² from E² = (pc)² + (mc²)², v -> c, for a 1 TeV electron. */
    @Test
    void ultraRelativisticLimit() {
        Species e = Species.ELECTRON;
        double w = 1e12;
        double mc2 = e.restEnergy() / Constants.E;
        double pc = Relativity.momentumFromKinetic(e, w) * Constants.C / Constants.E;
        double total = w + mc2;
        assertEquals(Math.sqrt(total * total - mc2 * mc2), pc, 1e-14 * pc);
        double v = Relativity.speedFromKinetic(e, w);
        double gamma = Relativity.gammaFromKinetic(e, w);
        assertTrue(v < Constants.C);
        // 1 − β = 1/(2γ²) to leading order: 1.3e-13 here, resolved to a few per cent by the doubles
        assertEquals(1.0 / (2 * gamma * gamma), 1.0 - v / Constants.C, 0.05 / (2 * gamma * gamma));
    }

    /** Pitch-angle split: cos and sin of the angle in degrees (hand values at 0°, 30°, 60°, 90°). */
    @Test
    void pitchAngleSplit() {
        assertEquals(5.0, Relativity.parallel(5.0, 0), 0);
        assertEquals(2.5, Relativity.parallel(5.0, 60), 1e-15);
        assertEquals(2.5, Relativity.perpendicular(5.0, 30), 1e-15);
        assertEquals(0.0, Relativity.parallel(5.0, 90), 1e-15);
        assertEquals(-5.0, Relativity.parallel(5.0, 180), 1e-15);
        assertEquals(5.0, Relativity.perpendicular(5.0, 90), 0);
    }
}
