package org.ventcase.relief;

import java.util.OptionalDouble;

import org.ventcase.common.InvalidInputException;
import org.ventcase.device.GasSizingInput;

/**
 * The relief device and its outlet as the scenarios need them.
 *
 * @param backPressurePa                total back pressure P2 while relieving, Pa absolute
 * @param kd                            effective coefficient of discharge (0.975 gas/vapour valve,
 *                                      0.65 liquid valve, 0.62 rupture disk alone)
 * @param kb                            gas: back-pressure correction (balanced bellows; else 1);
 *                                      liquid: Kw (1 for conventional and pilot valves)
 * @param kc                            combination correction (1, or 0.9 with an upstream rupture disk)
 * @param minimumDesignMetalTemperatureK the outlet's minimum design metal temperature, K, for the
 *                                      brittle-fracture check after expansion; empty to skip it
 */
public record DeviceSpec(double backPressurePa, double kd, double kb, double kc,
                         OptionalDouble minimumDesignMetalTemperatureK) {

    public DeviceSpec {
        InvalidInputException.requirePositive("device.backPressure", backPressurePa, "Pa abs");
        InvalidInputException.requireInRange("device.kd", kd, 1e-3, 1, "");
        InvalidInputException.requireInRange("device.kb", kb, 1e-3, 1, "");
        InvalidInputException.requireInRange("device.kc", kc, 1e-3, 1, "");
        if (minimumDesignMetalTemperatureK == null) {
            minimumDesignMetalTemperatureK = OptionalDouble.empty();
        }
        if (minimumDesignMetalTemperatureK.isPresent()) {
            InvalidInputException.requireInRange("device.minimumDesignMetalTemperature",
                    minimumDesignMetalTemperatureK.getAsDouble(), 1, 1000, "K");
        }
    }

    /** Conventional valve in gas or vapour service: Kd 0.975, Kb = Kc = 1, no MDMT check. */
    public static DeviceSpec gasValve(double backPressurePa) {
        return new DeviceSpec(backPressurePa, GasSizingInput.DEFAULT_KD, 1, 1, OptionalDouble.empty());
    }

    /** Conventional valve in liquid service: Kd 0.65, Kw = Kc = 1, no MDMT check. */
    public static DeviceSpec liquidValve(double backPressurePa) {
        return new DeviceSpec(backPressurePa, org.ventcase.device.LiquidSizingInput.DEFAULT_KD, 1, 1,
                OptionalDouble.empty());
    }

    /** The same device with a minimum design metal temperature for the outlet check. */
    public DeviceSpec withMinimumDesignMetalTemperature(double kelvin) {
        return new DeviceSpec(backPressurePa, kd, kb, kc, OptionalDouble.of(kelvin));
    }
}
