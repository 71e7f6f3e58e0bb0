package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

/**
 * Inputs of the pool-fire case for a liquid-wetted vessel holding a liquid mixture (or a pure
 * fluid: one component).
 *
 * @param fluid                   the liquid: components, EOS, k_ij, liquid composition, density basis
 * @param vessel                  vessel geometry
 * @param level                   liquid level used for the fire case
 * @param exposure                elevation above grade and effective fire height
 * @param relieving               set pressure, MAWP, atmosphere, device count (scenario FIRE)
 * @param fireFighting            drainage and fire-fighting credit
 * @param environment             environment factor F
 * @param device                  back pressure, Kd, Kb, Kc, optional MDMT of the outlet
 * @param subtractDisplacedVapour whether to use W = Q/L (1 - rho_V/rho_L) instead of Q/L
 */
public record MixtureFireInput(MixtureSpec fluid, Vessel vessel, Level level, FireExposure exposure,
                               RelievingPressureInput relieving, FireFighting fireFighting,
                               EnvironmentFactor environment, DeviceSpec device, boolean subtractDisplacedVapour) {

    public MixtureFireInput {
        if (fluid == null) {
            throw InvalidInputException.missing("fluid", "expected the liquid's components and composition");
        }
        if (vessel == null) {
            throw InvalidInputException.missing("vessel", "expected the vessel geometry");
        }
        if (level == null) {
            throw InvalidInputException.missing("level", "expected the liquid level for the fire case");
        }
        if (exposure == null) {
            throw InvalidInputException.missing("fire.exposure", "expected the elevation and fire height");
        }
        if (relieving == null) {
            throw InvalidInputException.missing("relief", "expected set pressure, MAWP and device count");
        }
        if (relieving.scenario() != ScenarioKind.FIRE) {
            throw InvalidInputException.invalid("relief.scenario", relieving.scenario(), "expected FIRE for a fire case");
        }
        if (fireFighting == null) {
            throw InvalidInputException.missing("fire.fireFighting", "expected ADEQUATE_DRAINAGE_AND_FIREFIGHTING or "
                    + "INADEQUATE");
        }
        if (environment == null) {
            throw InvalidInputException.missing("fire.environmentFactor", "expected an environment factor");
        }
        if (device == null) {
            throw InvalidInputException.missing("device", "expected the back pressure and coefficients");
        }
    }
}
