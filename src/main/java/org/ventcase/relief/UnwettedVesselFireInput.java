package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;

/**
 * A gas-filled (unwetted) vessel exposed to fire.
 *
 * @param exposedAreaM2      A', exposed surface area of the vessel, m2
 * @param molarMass          M, molar mass of the gas, kg/kmol
 * @param relievingPressurePa P1, relieving pressure, Pa absolute
 * @param normalPressurePa   Pn, normal operating pressure, Pa absolute
 * @param normalTemperatureK Tn, normal operating temperature, K
 * @param wallTemperatureK   Tw, recommended maximum wall temperature, K
 *                           (see {@link UnwettedVesselFire#CARBON_STEEL_WALL_K})
 */
public record UnwettedVesselFireInput(double exposedAreaM2, double molarMass, double relievingPressurePa,
                                      double normalPressurePa, double normalTemperatureK, double wallTemperatureK) {
    public UnwettedVesselFireInput {
        InvalidInputException.requirePositive("fire.exposedArea", exposedAreaM2, "m2");
        InvalidInputException.requireInRange("fluid.molarMass", molarMass, 1, 2000, "kg/kmol");
        InvalidInputException.requirePositive("relief.relievingPressure", relievingPressurePa, "Pa abs");
        InvalidInputException.requireInRange("process.normalPressure", normalPressurePa, 1, relievingPressurePa,
                "Pa abs (at most the relieving pressure)");
        InvalidInputException.requirePositive("process.normalTemperature", normalTemperatureK, "K");
        InvalidInputException.requirePositive("fire.wallTemperature", wallTemperatureK, "K");
    }

    /** Input with the default carbon-steel wall temperature of 593 C. */
    public static UnwettedVesselFireInput carbonSteel(double exposedAreaM2, double molarMass,
                                                      double relievingPressurePa, double normalPressurePa,
                                                      double normalTemperatureK) {
        return new UnwettedVesselFireInput(exposedAreaM2, molarMass, relievingPressurePa, normalPressurePa,
                normalTemperatureK, UnwettedVesselFire.CARBON_STEEL_WALL_K);
    }
}
