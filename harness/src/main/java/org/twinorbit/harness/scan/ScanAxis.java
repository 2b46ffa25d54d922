package org.twinorbit.harness.scan;

import java.util.function.DoubleUnaryOperator;

/**
 * What ε means in a scan and how it reads as an energy: for a static field ε = ρ0/L, varied by
 * the kinetic energy; for a time-dependent field ε is the ratio of the gyroperiod to the field's
 * time scale, 1/(Ωτ) for {@code ramp} and ω/Ω for {@code wave} (docs/design.md "Breakdown scan"), at
 * a fixed energy.
 *
 * @param meaning       what ε is, in words for tables (e.g. "rho0/L")
 * @param variesEnergy  true when ε is varied through the kinetic energy
 * @param energyEv      ε -> kinetic energy (eV); a constant when {@code variesEnergy} is false
 * @param derivedName   name of a quantity derived from ε that readers of this field expect
 *                      (e.g. {@code kappa} for current sheets), or null
 * @param derived       ε -> that quantity, or null
 */
public record ScanAxis(String meaning, boolean variesEnergy, DoubleUnaryOperator energyEv,
                       String derivedName, DoubleUnaryOperator derived) {

    /** ε = ρ0/L varied through the energy. */
    public static ScanAxis energy(EnergyScale scale) {
        return new ScanAxis("rho0/L", true, scale::energyEv, null, null);
    }

    /**
     * ε = ρ0/R_c in a current sheet, with κ = sqrt(R_c/ρ0) = 1/sqrt(ε) beside it (Büchner &amp;
     * Zelenyi, J. Geophys. Res. 94, 1989).
     */
    public static ScanAxis currentSheet(EnergyScale scale) {
        return new ScanAxis("rho0/R_c", true, scale::energyEv, "kappa", e -> 1.0 / Math.sqrt(e));
    }

    /** A time-scale ratio at a fixed energy (eV). */
    public static ScanAxis timeScale(String meaning, double energyEv) {
        return new ScanAxis(meaning, false, e -> energyEv, null, null);
    }
}
