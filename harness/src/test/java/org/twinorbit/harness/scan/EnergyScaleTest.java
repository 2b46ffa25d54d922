package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.fields.UniformField;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

class EnergyScaleTest {

    @Test
    void nonRelativisticProton() {
        // rho = m v/(e B) and W = m v^2/2 (Jackson, Classical Electrodynamics, §12.2), so at
        // B = 1 T, L = 1 m, eps = 1e-3: W = (e B rho)^2 / (2 m) ≈ 47.9 eV; relativistic
        // correction W/(m c^2) ~ 5e-8, below the 1e-6 tolerance.
        EnergyScale s = new EnergyScale(new ConstantFieldWithLength(1.0, 1.0), Species.PROTON, Vec3.ZERO);
        double p = Constants.E * 1.0 * 1e-3;
        double expected = p * p / (2 * Constants.PROTON_MASS) / Constants.E;
        assertEquals(expected, s.energyEv(1e-3), 1e-6 * expected);
    }

    @Test
    void relativisticElectronAtMomentumMc() {
        // p = m c  <=>  gamma = sqrt 2, W = (sqrt 2 - 1) m c^2 (special relativity, exact).
        double b = 0.1;
        double length = 2.0;
        EnergyScale s = new EnergyScale(new ConstantFieldWithLength(b, length), Species.ELECTRON, Vec3.ZERO);
        double eps = Constants.ELECTRON_MASS * Constants.C / (Constants.E * b * length);
        double expected = (Math.sqrt(2) - 1) * Species.ELECTRON.restEnergy() / Constants.E;
        assertEquals(expected, s.energyEv(eps), 1e-12 * expected);
        assertEquals(eps, s.eps(expected), 1e-12 * eps);
    }

    @Test
    void roundTripOverManyDecades() {
        EnergyScale s = new EnergyScale(new ConstantFieldWithLength(3e-5, 2.1e6), Species.ELECTRON, Vec3.ZERO);
        for (double eps : EpsilonGrid.logSpaced(1e-6, 0.5, 12)) {
            assertEquals(eps, s.eps(s.energyEv(eps)), 1e-12 * eps);
        }
    }

    @Test
    void fieldWithoutLengthIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new EnergyScale(new UniformField(1.0), Species.PROTON, Vec3.ZERO));
        assertTrue(e.getMessage().contains("no length"), e.getMessage());
    }
}
