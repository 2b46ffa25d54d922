package org.twinorbit.shared;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Gyrofrequency, gyroperiod and gyroradius against hand values computed from the CODATA 2018
 * charge-to-mass quotients (e/m_e = 1.75882001076e11 C/kg, e/m_p = 9.5788331560e7 C/kg; NIST,
 * from memory) and Ω = |q|B/(γm), ρ = p⊥/(|q|B) (Jackson, Classical Electrodynamics, 3rd ed., §12.2).
 */
class GyrationTest {

    private static final double REL = 1e-10;   // the CODATA quotients are given to 11-12 digits

    @Test
    void frequencies() {
        assertEquals(1.75882001076e11, Gyration.frequency(Species.ELECTRON, 1.0, 1.0), REL * 1.76e11);
        assertEquals(9.5788331560e7 * 2.5, Gyration.frequency(Species.PROTON, 2.5, 1.0), REL * 2.4e8);
        // an alpha has twice the charge and ~3.97 proton masses: 2 e/m_alpha = 4.8224e7 C/kg at 1 T
        assertEquals(2 * 1.602176634e-19 / 6.6446573357e-27, Gyration.frequency(Species.ALPHA, 1.0, 1.0), REL * 4.8e7);
        assertEquals(1.75882001076e11 / 3.0, Gyration.frequency(Species.ELECTRON, 1.0, 3.0), REL * 6e10);
    }

    @Test
    void periods() {
        // γ = 2 for W = m_e c²: T = 2π · 2 / (e/m_e) at 1 T = 7.14477350575e-11 s (hand value)
        double w = Species.ELECTRON.restEnergy() / Constants.E;
        assertEquals(7.14477350575e-11, Gyration.periodAtEnergy(Species.ELECTRON, 1.0, w), REL * 7.1e-11);
        assertEquals(2 * Math.PI / 9.5788331560e7, Gyration.period(Species.PROTON, 1.0, 1.0), REL * 6.6e-8);
    }

    @Test
    void radius() {
        // electron, u⊥ = 1e7 m/s in 0.1 T: ρ = 1e7/(0.1 · 1.75882001076e11) = 5.6856301036e-4 m (hand value)
        assertEquals(5.6856301036e-4, Gyration.radius(Species.ELECTRON, 1e7, 0.1), REL * 5.7e-4);
        // the sign of the charge does not make a radius negative
        assertEquals(Gyration.radius(Species.POSITRON, 1e7, 0.1), Gyration.radius(Species.ELECTRON, 1e7, 0.1), 0);
    }
}
