package org.ventcase.units;

/**
 * Exact conversion factors between SI and the US customary units in which the API relief
 * standards state their equations. Formula classes use these to state a customary-unit equation
 * in SI without rounding the published constants a second time.
 *
 * <p>Source: NIST SP 811 (2008 edition), Appendix B; every factor is exact by definition
 * (international yard and pound agreement of 1959; International Table Btu, 1956).
 */
public final class CustomaryUnits {
    /** Metres per inch (exact). */
    public static final double M_PER_IN = 0.0254;
    /** Square millimetres per square inch (exact: 25.4 squared). */
    public static final double MM2_PER_IN2 = 645.16;
    /** Metres per foot (exact). */
    public static final double M_PER_FT = 0.3048;
    /** Square metres per square foot (exact: 0.3048 squared). */
    public static final double M2_PER_FT2 = 0.09290304;
    /** Kilograms per avoirdupois pound (exact). */
    public static final double KG_PER_LB = 0.45359237;
    /** Pascals per pound-force per square inch (exact to double precision: lbf g_n / in2). */
    public static final double PA_PER_PSI = 4.4482216152605 / (0.0254 * 0.0254);
    /** Joules per International Table Btu (exact). */
    public static final double J_PER_BTU = 1055.05585262;
    /** Joules per kilogram per Btu per pound (exact: 2326 by definition of the IT Btu). */
    public static final double J_PER_KG_PER_BTU_PER_LB = 2326.0;
    /** Kelvin per Rankine degree (exact). */
    public static final double K_PER_R = 5.0 / 9.0;
    /** Cubic metres per US gallon (exact). */
    public static final double M3_PER_US_GAL = 3.785411784e-3;
    /** Watts per Btu per hour. */
    public static final double W_PER_BTU_PER_H = J_PER_BTU / 3600.0;
    /** Moles per pound-mole (exact: 1000 x the pound in kg). */
    public static final double MOL_PER_LBMOL = 1000.0 * KG_PER_LB;

    private CustomaryUnits() {
    }

    /** Molar energy in J/mol to Btu/lbmol. */
    public static double jPerMolToBtuPerLbmol(double jPerMol) {
        return jPerMol * MOL_PER_LBMOL / J_PER_BTU;
    }

    /** Molar heat capacity or entropy in J/(mol K) to Btu/(lbmol R). */
    public static double jPerMolKToBtuPerLbmolR(double jPerMolK) {
        return jPerMolToBtuPerLbmol(jPerMolK) * K_PER_R;
    }

    /** Molar volume in m3/mol to ft3/lbmol. */
    public static double m3PerMolToFt3PerLbmol(double m3PerMol) {
        return m3PerMol * MOL_PER_LBMOL / (M_PER_FT * M_PER_FT * M_PER_FT);
    }

    /** Pressure in Pa to psi (same base, gauge or absolute). */
    public static double paToPsi(double pa) {
        return pa / PA_PER_PSI;
    }

    /** Temperature in K to degrees Rankine. */
    public static double kToRankine(double k) {
        return k / K_PER_R;
    }

    /** Temperature difference in K to a difference in Fahrenheit (or Rankine) degrees. */
    public static double kDiffToF(double dk) {
        return dk / K_PER_R;
    }
}
