package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Vessel;

/**
 * Inputs of the fire case for a gas-filled (unwetted) vessel.
 *
 * @param fluid                the gas (components, EOS, k_ij, composition, density basis)
 * @param vessel               vessel geometry
 * @param exposure             elevation above grade and fire height
 * @param areaBasis            which surface is the exposed area A'
 * @param relievingPressurePa  P1, Pa absolute
 * @param normalPressurePa     normal operating pressure Pn, Pa absolute
 * @param normalTemperatureK   normal operating temperature Tn, K
 * @param wallTemperatureK     maximum wall temperature Tw, K (593 C for carbon steel:
 *                             {@link UnwettedVesselFire#CARBON_STEEL_WALL_K})
 * @param device               back pressure and coefficients
 */
public record GasFilledFireInput(MixtureSpec fluid, Vessel vessel, FireExposure exposure, AreaBasis areaBasis,
                                 double relievingPressurePa, double normalPressurePa, double normalTemperatureK,
                                 double wallTemperatureK, DeviceSpec device) {

    /** The exposed area A' of the gas-filled vessel method. */
    public enum AreaBasis {
        /**
         * Inside surface below the fire height (7.6 m above grade by default), the zone the wetted
         * case also counts (the reading used here by default; from memory).
         */
        BELOW_FIRE_HEIGHT,
        /** The whole inside surface of the vessel (the conservative reading). */
        WHOLE_SURFACE
    }

    public GasFilledFireInput {
        if (fluid == null) {
            throw InvalidInputException.missing("gasFire.fluid", "expected the gas");
        }
        if (vessel == null) {
            throw InvalidInputException.missing("gasFire.vessel", "expected the vessel geometry");
        }
        if (exposure == null) {
            throw InvalidInputException.missing("gasFire.exposure", "expected the elevation and fire height");
        }
        if (areaBasis == null) {
            throw InvalidInputException.missing("gasFire.areaBasis", "expected BELOW_FIRE_HEIGHT or WHOLE_SURFACE");
        }
        if (device == null) {
            throw InvalidInputException.missing("gasFire.device", "expected the back pressure and coefficients");
        }
        InvalidInputException.requirePositive("gasFire.relievingPressure", relievingPressurePa, "Pa abs");
        InvalidInputException.requireInRange("gasFire.normalPressure", normalPressurePa, 1, relievingPressurePa,
                "Pa abs (at most the relieving pressure)");
        InvalidInputException.requireInRange("gasFire.normalTemperature", normalTemperatureK, 20, 2000, "K");
        InvalidInputException.requireInRange("gasFire.wallTemperature", wallTemperatureK, 20, 2000, "K");
    }
}
