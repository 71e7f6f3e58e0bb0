package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

/**
 * Inputs of the pool-fire case for a liquid-wetted vessel holding a pure fluid in saturated
 * storage.
 *
 * @param component             the stored fluid
 * @param eos                   equation of state
 * @param densityBasis          liquid-density basis for the inventory
 * @param vessel                vessel geometry
 * @param level                 liquid level used for the fire case
 * @param exposure              elevation above grade and effective fire height
 * @param storageTemperatureK   storage temperature (saturated storage), K
 * @param relieving             set pressure, MAWP, atmosphere, device count (scenario FIRE)
 * @param fireFighting          drainage and fire-fighting credit
 * @param environment           environment factor F
 * @param backPressurePa        total back pressure at the valve outlet while relieving, Pa abs
 * @param kd                    effective coefficient of discharge (0.975 for a valve)
 * @param kb                    back-pressure correction (balanced bellows only; 1 otherwise)
 * @param kc                    combination correction (1, or 0.9 with an upstream rupture disk)
 * @param subtractDisplacedVapour whether to use W = Q/L (1 - rho_V/rho_L) instead of Q/L
 */
public record WettedFireInput(Component component, EosVariant eos, DensityBasis densityBasis, Vessel vessel,
                              Level level, FireExposure exposure, double storageTemperatureK,
                              RelievingPressureInput relieving, FireFighting fireFighting,
                              EnvironmentFactor environment, double backPressurePa, double kd, double kb, double kc,
                              boolean subtractDisplacedVapour) {

    public WettedFireInput {
        if (component == null || eos == null || densityBasis == null || vessel == null || level == null
                || exposure == null || relieving == null || fireFighting == null || environment == null) {
            throw InvalidInputException.missing("scenario", "every part of the fire case is required");
        }
        if (relieving.scenario() != ScenarioKind.FIRE) {
            throw InvalidInputException.invalid("relief.scenario", relieving.scenario(), "expected FIRE for a fire case");
        }
        InvalidInputException.requireInRange("storage.temperature", storageTemperatureK, 1, 2000, "K");
        InvalidInputException.requirePositive("device.backPressure", backPressurePa, "Pa abs");
        InvalidInputException.requireInRange("device.kd", kd, 1e-3, 1, "");
        InvalidInputException.requireInRange("device.kb", kb, 1e-3, 1, "");
        InvalidInputException.requireInRange("device.kc", kc, 1e-3, 1, "");
    }
}
