package org.twinorbit.shared;

/**
 * Physical constants in SI units.
 *
 * <p>Source: CODATA 2018 recommended values (E. Tiesinga et al., Rev. Mod. Phys. 93, 025010,
 * 2021; NIST, physics.nist.gov/constants). c and e are exact by the 2019 SI definition.
 */
public final class Constants {

    /** Speed of light in vacuum (m/s), exact. */
    public static final double C = 299_792_458.0;
    /** Elementary charge (C), exact. */
    public static final double E = 1.602176634e-19;
    /** Electron mass (kg), CODATA 2018. */
    public static final double ELECTRON_MASS = 9.1093837015e-31;
    /** Proton mass (kg), CODATA 2018. */
    public static final double PROTON_MASS = 1.67262192369e-27;
    /** Deuteron mass (kg), CODATA 2018. */
    public static final double DEUTERON_MASS = 3.3435837724e-27;
    /** Triton mass (kg), CODATA 2018. */
    public static final double TRITON_MASS = 5.0073567446e-27;
    /** Helion (helium-3 nucleus) mass (kg), CODATA 2018. */
    public static final double HELION_MASS = 5.0064127796e-27;
    /** Alpha particle mass (kg), CODATA 2018. */
    public static final double ALPHA_MASS = 6.6446573357e-27;
    /** Atomic mass constant (kg), CODATA 2018. */
    public static final double ATOMIC_MASS_UNIT = 1.66053906660e-27;

    private Constants() {}
}
