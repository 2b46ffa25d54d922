package org.twinorbit.shared;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The constants against CODATA 2018 (E. Tiesinga et al., Rev. Mod. Phys. 93, 025010, 2021; NIST,
 * physics.nist.gov/constants; values recalled from memory). Besides the masses in kg, the energy
 * equivalents in MeV and two ratios are checked: they are separate entries of the CODATA table,
 * so a mistyped digit in a mass shows up as a disagreement between two published numbers.
 */
class ConstantsTest {

    /** CODATA's relative standard uncertainties of these masses are below 3e-10. */
    private static final double CODATA_REL = 1e-9;

    private static double mev(double massKg) {
        return massKg * Constants.C * Constants.C / Constants.E / 1e6;
    }

    @Test
    void exactDefiningConstants() {
        assertEquals(299_792_458.0, Constants.C, 0.0);        // SI 2019, exact
        assertEquals(1.602176634e-19, Constants.E, 0.0);      // SI 2019, exact
    }

    @Test
    void massesInKilograms() {
        assertEquals(9.1093837015e-31, Constants.ELECTRON_MASS, 1e-40);
        assertEquals(1.67262192369e-27, Constants.PROTON_MASS, 1e-37);
        assertEquals(3.3435837724e-27, Constants.DEUTERON_MASS, 1e-37);
        assertEquals(5.0073567446e-27, Constants.TRITON_MASS, 1e-37);
        assertEquals(5.0064127796e-27, Constants.HELION_MASS, 1e-37);
        assertEquals(6.6446573357e-27, Constants.ALPHA_MASS, 1e-37);
        assertEquals(1.66053906660e-27, Constants.ATOMIC_MASS_UNIT, 1e-37);
    }

    @Test
    void energyEquivalentsInMeV() {
        assertEquals(0.51099895000, mev(Constants.ELECTRON_MASS), CODATA_REL * 0.511);
        assertEquals(938.27208816, mev(Constants.PROTON_MASS), CODATA_REL * 938.3);
        assertEquals(1875.61294257, mev(Constants.DEUTERON_MASS), CODATA_REL * 1875.6);
        assertEquals(2808.92113298, mev(Constants.TRITON_MASS), CODATA_REL * 2808.9);
        assertEquals(2808.39160743, mev(Constants.HELION_MASS), CODATA_REL * 2808.4);
        assertEquals(3727.3794066, mev(Constants.ALPHA_MASS), CODATA_REL * 3727.4);
        assertEquals(931.49410242, mev(Constants.ATOMIC_MASS_UNIT), CODATA_REL * 931.5);
    }

    @Test
    void ratios() {
        assertEquals(1836.15267343, Constants.PROTON_MASS / Constants.ELECTRON_MASS, CODATA_REL * 1836.2);
        // electron and proton charge-to-mass quotients (C/kg)
        assertEquals(1.75882001076e11, Constants.E / Constants.ELECTRON_MASS, CODATA_REL * 1.76e11);
        assertEquals(9.5788331560e7, Constants.E / Constants.PROTON_MASS, CODATA_REL * 9.58e7);
    }
}
