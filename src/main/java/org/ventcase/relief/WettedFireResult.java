package org.ventcase.relief;

import java.util.List;

import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;
import org.ventcase.device.OrificeSelection;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.SaturationResult;
import org.ventcase.vessel.LevelState;

/**
 * Result of the pool-fire case for a liquid-wetted vessel holding a pure fluid.
 *
 * @param input              what was asked
 * @param relieving          relieving pressure and the rule applied
 * @param vessel             volumes and areas at the level, with the fire-exposed area
 * @param heat               fire heat input
 * @param storage            saturation at storage temperature (inventory)
 * @param relief             saturation at relieving pressure
 * @param latentHeat         latent heat as computed and as used (minimum applied or not)
 * @param reliefLoadKgPerS   required relieving rate, kg/s
 * @param relievedVapor      properties of the relieved vapour at relieving conditions
 * @param sizing             API 520 gas sizing
 * @param orifice            API 526 orifice selection
 * @param liquidMassKg       liquid inventory at storage conditions, kg
 * @param vaporMassKg        vapour inventory at storage conditions, kg
 * @param trace              the calculation steps in order
 * @param warnings           everything the user must see
 */
public record WettedFireResult(WettedFireInput input, RelievingPressureResult relieving, LevelState vessel,
                               HeatInputResult heat, SaturationResult storage, SaturationResult relief,
                               LatentHeatGuard.Result latentHeat, double reliefLoadKgPerS,
                               FluidProperties relievedVapor, GasSizingResult sizing, OrificeSelection orifice,
                               double liquidMassKg, double vaporMassKg, List<TraceStep> trace,
                               List<String> warnings) {

    public WettedFireResult {
        trace = List.copyOf(trace);
        warnings = List.copyOf(warnings);
    }
}
