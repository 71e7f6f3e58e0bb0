package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;

/**
 * Inputs of the fire case for near-critical or supercritical contents (no distinct liquid to boil).
 *
 * @param fluid                the contents (components, EOS, k_ij, composition, density basis)
 * @param vesselVolumeM3       fixed vessel volume V, m3
 * @param heatW                heat input Q, W (constant over the heat-up)
 * @param relievingPressurePa  P1, Pa absolute, held while the device relieves
 * @param initialTemperatureK  contents' temperature before the fire, K
 * @param initialPressurePa    contents' pressure before the fire, Pa absolute (at most P1)
 * @param finalTemperatureK    end of the heat-up considered, K (above the opening temperature)
 * @param steps                number of equal temperature steps from opening to the end
 * @param device               back pressure and coefficients
 * @param initialSpecificVolumeM3Kg the contents' specific volume before the fire, m3/kg, when known
 *                             (a saturated liquid-vapour inventory: V / m); empty to take v(T0, P0)
 *                             from a flash, which is only defined away from saturation
 */
public record NearCriticalFireInput(MixtureSpec fluid, double vesselVolumeM3, double heatW, double relievingPressurePa,
                                    double initialTemperatureK, double initialPressurePa, double finalTemperatureK,
                                    int steps, DeviceSpec device, java.util.OptionalDouble initialSpecificVolumeM3Kg) {

    /** Without a given initial specific volume: v0 = v(T0, P0) from a flash. */
    public NearCriticalFireInput(MixtureSpec fluid, double vesselVolumeM3, double heatW, double relievingPressurePa,
                                 double initialTemperatureK, double initialPressurePa, double finalTemperatureK,
                                 int steps, DeviceSpec device) {
        this(fluid, vesselVolumeM3, heatW, relievingPressurePa, initialTemperatureK, initialPressurePa,
                finalTemperatureK, steps, device, java.util.OptionalDouble.empty());
    }

    public NearCriticalFireInput {
        if (initialSpecificVolumeM3Kg == null) {
            initialSpecificVolumeM3Kg = java.util.OptionalDouble.empty();
        }
        if (initialSpecificVolumeM3Kg.isPresent()) {
            InvalidInputException.requirePositive("nearCritical.initialSpecificVolume", initialSpecificVolumeM3Kg.getAsDouble(),
                    "m3/kg");
        }
        if (fluid == null) {
            throw InvalidInputException.missing("nearCritical.fluid", "expected the contents");
        }
        if (device == null) {
            throw InvalidInputException.missing("nearCritical.device", "expected the back pressure and coefficients");
        }
        InvalidInputException.requirePositive("nearCritical.vesselVolume", vesselVolumeM3, "m3");
        InvalidInputException.requirePositive("nearCritical.heat", heatW, "W");
        InvalidInputException.requirePositive("nearCritical.relievingPressure", relievingPressurePa, "Pa abs");
        InvalidInputException.requireInRange("nearCritical.initialTemperature", initialTemperatureK, 20, 2000, "K");
        InvalidInputException.requireInRange("nearCritical.initialPressure", initialPressurePa, 1, relievingPressurePa,
                "Pa abs (at most the relieving pressure)");
        InvalidInputException.requireInRange("nearCritical.finalTemperature", finalTemperatureK,
                initialTemperatureK + 1e-6, 2000, "K (above the initial temperature)");
        if (steps < 2 || steps > 100_000) {
            throw InvalidInputException.outOfRange("nearCritical.steps", steps, 2, 100_000, "");
        }
    }
}
