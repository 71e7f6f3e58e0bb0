package org.ventcase.common;

/**
 * Physical constants used everywhere, in SI.
 *
 * <p>Source: CODATA 2018 recommended values (E. Tiesinga et al., Rev. Mod. Phys. 93, 025010,
 * 2021); the molar gas constant is exact since the 2019 SI redefinition (R = N_A k_B).
 */
public final class PhysicalConstants {
    /** Molar gas constant, J/(mol K), exact. */
    public static final double R = 8.314462618;
    /** Standard atmosphere, Pa (exact by definition). */
    public static final double ATM_PA = 101_325.0;
    /** Standard reference temperature for ideal-gas properties, K. */
    public static final double T_REF_K = 298.15;
    /** Zero Celsius, K (exact). */
    public static final double ZERO_CELSIUS_K = 273.15;
    /** Standard acceleration of gravity, m/s2 (exact by definition). */
    public static final double G_N = 9.80665;

    private PhysicalConstants() {
    }
}
