package org.ventcase.relief;

import java.util.List;
import java.util.Locale;

import org.ventcase.common.InvalidInputException;
import org.ventcase.units.CustomaryUnits;

/**
 * Heat absorbed by a liquid-wetted vessel exposed to an open pool fire.
 *
 * <p>Equation (SI): Q = C1 F A^0.82, where Q is the heat input (W), F the environment factor
 * (dimensionless, see {@link EnvironmentFactors}), A the wetted area within 7.6 m above the base
 * of the fire (m2), and C1 = 43,200 with adequate drainage and prompt fire-fighting, 70,900
 * without. US customary form: Q = C1' F A^0.82 with Q in Btu/h, A in ft2, C1' = 21,000 or 34,500.
 * The SI constants are the published roundings of the US ones: exact conversion gives 43,192
 * and 70,959 (difference under 0.1 %).
 *
 * <p>Source: API Std 521, 5th ed. 2007 (identical to ISO 23251:2006), 5.15.2.2.1, Equations (3)
 * and (4) for SI, with the US forms in the same clause (clause and equation numbers from memory;
 * they move between the 5th, 6th and 7th editions). Project REFERENCES.md section 1: US [S], SI [D].
 *
 * <p>Low-pressure storage: {@link #lowPressureStorage} follows the NFPA 30 / API Std 2000 table
 * (REFERENCES.md section 8, [D], table reproduced).
 */
public final class FireHeatInput {

    /** SI constant, adequate drainage and fire-fighting, W/m^1.64. */
    public static final double C_SI_ADEQUATE = 43_200.0;
    /** SI constant, without adequate drainage and fire-fighting, W/m^1.64. */
    public static final double C_SI_INADEQUATE = 70_900.0;
    /** US constant, adequate drainage and fire-fighting, Btu/h/ft^1.64. */
    public static final double C_US_ADEQUATE = 21_000.0;
    /** US constant, without adequate drainage and fire-fighting, Btu/h/ft^1.64. */
    public static final double C_US_INADEQUATE = 34_500.0;
    /** Exponent on the wetted area. */
    public static final double AREA_EXPONENT = 0.82;

    // Printed on the sheet: the standard and the method, no clause number. The clause (5.15.2.2.1,
    // Eq. (3)/(4) of the 5th ed. 2007 / ISO 23251:2006) is from memory and could not be verified
    // against the current edition (API Std 521 7th ed. 2020); the constants are the project's
    // REFERENCES.md section 1 [D]/[S].
    static final String SOURCE_521 = "API Std 521 / ISO 23251: heat absorbed by a liquid-wetted vessel in an open pool "
            + "fire, Q = C F A^0.82";
    // REFERENCES.md section 8 [D, table reproduced].
    static final String SOURCE_2000 = "NFPA 30 / API Std 2000 heat input table for atmospheric and low-pressure "
            + "storage";

    private FireHeatInput() {
    }

    /**
     * Wetted-vessel heat input, SI form.
     *
     * @param wettedAreaM2      wetted area exposed to fire, m2
     * @param environmentFactor F, 0..1
     * @param fireFighting      drainage and fire-fighting condition
     * @return Q in W
     */
    public static HeatInputResult wettedVessel(double wettedAreaM2, double environmentFactor,
                                               FireFighting fireFighting) {
        check(wettedAreaM2, environmentFactor, fireFighting);
        double c = fireFighting == FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING ? C_SI_ADEQUATE : C_SI_INADEQUATE;
        double q = c * environmentFactor * Math.pow(wettedAreaM2, AREA_EXPONENT);
        String eq = String.format(Locale.US, "Q = %.0f F A^0.82 = %.0f x %.4g x %.6g^0.82 = %.6g W",
                c, c, environmentFactor, wettedAreaM2, q);
        return new HeatInputResult(q, eq, SOURCE_521, List.of());
    }

    /**
     * Wetted-vessel heat input, US customary form, in US units (for cross-checks and for sheets
     * printed in US units).
     *
     * @param wettedAreaFt2     wetted area, ft2
     * @param environmentFactor F, 0..1
     * @param fireFighting      drainage and fire-fighting condition
     * @return Q in Btu/h
     */
    public static double wettedVesselUsBtuPerHour(double wettedAreaFt2, double environmentFactor,
                                                  FireFighting fireFighting) {
        check(wettedAreaFt2, environmentFactor, fireFighting);
        double c = fireFighting == FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING ? C_US_ADEQUATE : C_US_INADEQUATE;
        return c * environmentFactor * Math.pow(wettedAreaFt2, AREA_EXPONENT);
    }

    /**
     * Heat input to an atmospheric or low-pressure storage tank (NFPA 30 / API Std 2000 table).
     *
     * <pre>
     *   A (ft2)             Q (Btu/h)
     *   A &lt; 200            20,000 A
     *   200 &lt;= A &lt; 1000    199,300 A^0.566
     *   1000 &lt;= A &lt; 2800   963,400 A^0.338
     *   A &gt;= 2800          21,000 A^0.82 when the design pressure exceeds 1 psig (6.895 kPa gauge),
     *                     else 14,090,000 (the table's cap)
     * </pre>
     * Evaluated in US units with exact conversion: A ft2 = A m2 / 0.09290304; Q W = Q Btu/h x
     * 1055.05585262 / 3600. The environment factor multiplies Q.
     *
     * @param wettedAreaM2        wetted area, m2 (first 9 m of a vertical shell; see REFERENCES.md 8)
     * @param designPressureGaugePa tank design pressure, Pa gauge (may be 0 for atmospheric tanks)
     * @param environmentFactor   F, 0..1
     */
    public static HeatInputResult lowPressureStorage(double wettedAreaM2, double designPressureGaugePa,
                                                     double environmentFactor) {
        InvalidInputException.requirePositive("fire.wettedArea", wettedAreaM2, "m2");
        InvalidInputException.requireInRange("fire.designPressure", designPressureGaugePa, 0, 1e9, "Pa gauge");
        InvalidInputException.requireInRange("fire.environmentFactor", environmentFactor, 0, 1, "");
        double a = wettedAreaM2 / CustomaryUnits.M2_PER_FT2;
        double qBtu;
        String row;
        if (a < 200) {
            qBtu = 20_000 * a;
            row = "20,000 A (A < 200 ft2)";
        } else if (a < 1000) {
            qBtu = 199_300 * Math.pow(a, 0.566);
            row = "199,300 A^0.566 (200 <= A < 1000 ft2)";
        } else if (a < 2800) {
            qBtu = 963_400 * Math.pow(a, 0.338);
            row = "963,400 A^0.338 (1000 <= A < 2800 ft2)";
        } else if (designPressureGaugePa > CustomaryUnits.PA_PER_PSI) {
            qBtu = 21_000 * Math.pow(a, 0.82);
            row = "21,000 A^0.82 (A >= 2800 ft2, design pressure > 1 psig)";
        } else {
            qBtu = 14_090_000;
            row = "14,090,000 (A >= 2800 ft2, design pressure <= 1 psig)";
        }
        double q = qBtu * environmentFactor * CustomaryUnits.W_PER_BTU_PER_H;
        String eq = String.format(Locale.US, "A = %.6g ft2; Q = F x %s = %.4g x %.6g Btu/h = %.6g W",
                a, row, environmentFactor, qBtu, q);
        return new HeatInputResult(q, eq, SOURCE_2000, List.of());
    }

    private static void check(double area, double f, FireFighting ff) {
        if (area == 0) {
            // a vessel whose liquid lies wholly above the fire zone (or holds none): not an input error
            throw new org.ventcase.common.NoSolutionException("fire.wettedArea", "no wetted surface lies within the "
                    + "fire zone (the liquid is above the fire height, or there is none), so the wetted-vessel pool-fire "
                    + "heat input is zero; screen this vessel with the unwetted-vessel method or another scenario");
        }
        InvalidInputException.requirePositive("fire.wettedArea", area, "");
        InvalidInputException.requireInRange("fire.environmentFactor", f, 0, 1, "");
        if (ff == null) {
            throw InvalidInputException.missing("fire.fireFighting",
                    "expected ADEQUATE_DRAINAGE_AND_FIREFIGHTING or INADEQUATE");
        }
    }
}
