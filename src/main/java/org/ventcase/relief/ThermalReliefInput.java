package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;

/**
 * Inputs of the thermal (hydraulic) expansion case for a blocked-in liquid.
 *
 * @param fluid               the liquid (components, EOS, k_ij, composition, density basis)
 * @param temperatureK        temperature of the blocked-in liquid when the device relieves, K
 * @param relievingPressurePa relieving pressure P1, Pa absolute
 * @param heatW               heat transfer rate phi into the liquid, W
 */
public record ThermalReliefInput(MixtureSpec fluid, double temperatureK, double relievingPressurePa, double heatW) {
    public ThermalReliefInput {
        if (fluid == null) {
            throw InvalidInputException.missing("thermal.fluid", "expected the blocked-in liquid");
        }
        InvalidInputException.requireInRange("thermal.temperature", temperatureK, 20, 2000, "K");
        InvalidInputException.requirePositive("thermal.relievingPressure", relievingPressurePa, "Pa abs");
        InvalidInputException.requirePositive("thermal.heat", heatW, "W");
    }
}
