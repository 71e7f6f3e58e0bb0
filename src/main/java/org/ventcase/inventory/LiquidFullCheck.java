package org.ventcase.inventory;

import java.util.OptionalDouble;

import org.ventcase.thermo.DensityBasis;

/**
 * Whether the stored liquid, heated along its saturation (bubble) curve, fills the vessel before
 * the relieving pressure is reached.
 *
 * <p>Method: the liquid mass m_L at storage is held constant (vapour mass neglected, no
 * evaporation or condensation, composition unchanged). Its volume at the bubble temperature T1
 * at the relieving pressure P1 is m_L / rho_L,sat(T1), rho_L,sat on the stated density basis. If
 * that is at least the vessel volume V, the vessel goes liquid-full first; the liquid-full
 * temperature solves m_L / rho_L,sat(T) = V by bisection between the storage temperature and T1.
 *
 * @param relievingPressurePa    P1, Pa absolute
 * @param relievingTemperatureK  T1 = bubble temperature of the stored liquid at P1, K
 * @param liquidDensityAtReliefKgM3 rho_L,sat(T1), kg/m3
 * @param densityBasis           basis of that density
 * @param liquidVolumeAtReliefM3 m_L / rho_L,sat(T1), m3
 * @param vesselVolumeM3         V, m3
 * @param fillsBeforeRelief      whether m_L / rho_L,sat(T1) &gt;= V
 * @param liquidFullTemperatureK the liquid-full temperature where {@code fillsBeforeRelief}
 * @param method                 the method in words
 */
public record LiquidFullCheck(double relievingPressurePa, double relievingTemperatureK,
                              double liquidDensityAtReliefKgM3, DensityBasis densityBasis,
                              double liquidVolumeAtReliefM3, double vesselVolumeM3, boolean fillsBeforeRelief,
                              OptionalDouble liquidFullTemperatureK, String method) {
}
