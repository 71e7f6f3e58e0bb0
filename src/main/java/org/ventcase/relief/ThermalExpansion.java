package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;

/**
 * Relief rate of a blocked-in liquid heated by an outside source (hydraulic or thermal expansion).
 *
 * <p>Equation (SI): q = alpha_v phi / (1000 d c), with q the volumetric relief rate (m3/s),
 * alpha_v the cubical expansion coefficient of the liquid at the expected temperature (1/C or 1/K),
 * phi the total heat transfer rate (W), d the relative density of the liquid referred to water
 * (dimensionless; 1000 d is the density in kg/m3) and c the specific heat capacity of the trapped
 * liquid (J/(kg K)). US form: q = alpha_v phi / (500 d c) with q in gpm, alpha_v 1/F, phi Btu/h,
 * c Btu/(lb F) (500 = 8.33 lb/gal x 60 min/h, the standard's rounding).
 *
 * <p>If the liquid's vapour pressure at the heated temperature exceeds the relief design pressure,
 * size for vapour generation instead (this class does not check that).
 *
 * <p>Source: API Std 521 5th ed. 2007 / ISO 23251:2006, 5.14 hydraulic expansion, Equations (1)
 * and (2) (numbers from memory); REFERENCES.md section 7 [S].
 */
public final class ThermalExpansion {

    private ThermalExpansion() {
    }

    /**
     * Volumetric relief rate, m3/s.
     *
     * @param expansionCoefficientPerK alpha_v, 1/K
     * @param heatW                    phi, W
     * @param relativeDensity          d, referred to water
     * @param specificHeatJPerKgK      c, J/(kg K)
     */
    public static double reliefRateM3PerS(double expansionCoefficientPerK, double heatW, double relativeDensity,
                                          double specificHeatJPerKgK) {
        InvalidInputException.requirePositive("thermal.expansionCoefficient", expansionCoefficientPerK, "1/K");
        InvalidInputException.requirePositive("thermal.heat", heatW, "W");
        InvalidInputException.requireInRange("thermal.relativeDensity", relativeDensity, 0.05, 25, "");
        InvalidInputException.requirePositive("thermal.specificHeat", specificHeatJPerKgK, "J/(kg K)");
        return expansionCoefficientPerK * heatW / (1000.0 * relativeDensity * specificHeatJPerKgK);
    }

    /**
     * US customary form, gpm.
     *
     * @param expansionCoefficientPerF alpha_v, 1/F
     * @param heatBtuPerH              phi, Btu/h
     * @param relativeDensity          d
     * @param specificHeatBtuPerLbF    c, Btu/(lb F)
     */
    public static double reliefRateUsGpm(double expansionCoefficientPerF, double heatBtuPerH, double relativeDensity,
                                         double specificHeatBtuPerLbF) {
        InvalidInputException.requirePositive("thermal.expansionCoefficient", expansionCoefficientPerF, "1/F");
        InvalidInputException.requirePositive("thermal.heat", heatBtuPerH, "Btu/h");
        InvalidInputException.requireInRange("thermal.relativeDensity", relativeDensity, 0.05, 25, "");
        InvalidInputException.requirePositive("thermal.specificHeat", specificHeatBtuPerLbF, "Btu/(lb F)");
        return expansionCoefficientPerF * heatBtuPerH / (500.0 * relativeDensity * specificHeatBtuPerLbF);
    }
}
