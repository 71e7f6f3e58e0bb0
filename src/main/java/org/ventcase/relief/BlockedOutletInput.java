package org.ventcase.relief;

import java.util.OptionalDouble;

import org.ventcase.common.InvalidInputException;
import org.ventcase.device.ViscosityCorrection;

/**
 * Inputs of the blocked-outlet case: the maximum inflow continues while the outlet is closed, and
 * the device relieves it at relieving conditions.
 *
 * @param fluid               the inflow (components, EOS, k_ij, composition, density basis)
 * @param inflow              maximum inflow, mass or standard volume (gas only)
 * @param phase               relieved phase: VAPOUR or GAS (gas sizing), LIQUID (liquid sizing)
 * @param vapourTemperature   for gas/vapour: where T comes from
 * @param inflowTemperatureK  inflow temperature, K (gas with INFLOW_TEMPERATURE, and liquid)
 * @param relievingPressurePa P1, Pa absolute
 * @param device              back pressure and coefficients (Kd 0.65 for a liquid valve)
 * @param liquidViscosityPaS  liquid viscosity at flowing temperature, Pa s; empty for Kv = 1 (with a warning)
 * @param kvForm              which edition's Kv (liquid only)
 */
public record BlockedOutletInput(MixtureSpec fluid, InflowRate inflow, RelievedFluid.Phase phase,
                                 VapourTemperature vapourTemperature, double inflowTemperatureK,
                                 double relievingPressurePa, DeviceSpec device, OptionalDouble liquidViscosityPaS,
                                 ViscosityCorrection kvForm) {

    /** Temperature of the relieved gas or vapour. */
    public enum VapourTemperature {
        /** The inflow temperature (gas relieved as it arrives). */
        INFLOW_TEMPERATURE,
        /**
         * Saturated vapour at P1: the inflow composition at its dew point at P1 (Tsat for a pure
         * fluid). At steady state the relieved vapour has the inflow composition.
         */
        SATURATION_AT_P1
    }

    public BlockedOutletInput {
        if (fluid == null) {
            throw InvalidInputException.missing("blockedOutlet.fluid", "expected the inflow's components and composition");
        }
        if (inflow == null) {
            throw InvalidInputException.missing("blockedOutlet.inflow", "expected the maximum inflow (mass or standard "
                    + "volume)");
        }
        if (phase == null) {
            throw InvalidInputException.missing("blockedOutlet.phase", "expected VAPOUR, GAS or LIQUID");
        }
        if (device == null) {
            throw InvalidInputException.missing("blockedOutlet.device", "expected the back pressure and coefficients");
        }
        if (phase == RelievedFluid.Phase.LIQUID && inflow.kind() == InflowRate.Kind.STANDARD_VOLUME) {
            throw InvalidInputException.invalid("blockedOutlet.inflow.kind", inflow.kind(),
                    "a standard volume is for gas; give a liquid inflow as a mass flow");
        }
        if (phase != RelievedFluid.Phase.LIQUID && vapourTemperature == null) {
            throw InvalidInputException.missing("blockedOutlet.vapourTemperature",
                    "expected INFLOW_TEMPERATURE or SATURATION_AT_P1");
        }
        boolean needsT = phase == RelievedFluid.Phase.LIQUID
                || vapourTemperature == VapourTemperature.INFLOW_TEMPERATURE;
        if (needsT) {
            InvalidInputException.requireInRange("blockedOutlet.inflowTemperature", inflowTemperatureK, 20, 2000, "K");
        }
        InvalidInputException.requirePositive("blockedOutlet.relievingPressure", relievingPressurePa, "Pa abs");
        liquidViscosityPaS = liquidViscosityPaS == null ? OptionalDouble.empty() : liquidViscosityPaS;
        if (liquidViscosityPaS.isPresent()) {
            InvalidInputException.requirePositive("blockedOutlet.liquidViscosity", liquidViscosityPaS.getAsDouble(),
                    "Pa s");
        }
        if (phase == RelievedFluid.Phase.LIQUID && kvForm == null) {
            throw InvalidInputException.missing("blockedOutlet.kvForm", "expected API520_7TH_TO_9TH or API520_10TH");
        }
    }
}
