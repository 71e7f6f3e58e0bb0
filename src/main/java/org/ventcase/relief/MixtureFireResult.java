package org.ventcase.relief;

import java.util.List;

import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;
import org.ventcase.device.OrificeSelection;
import org.ventcase.vessel.LevelState;

/**
 * Result of the pool-fire case for a liquid-wetted vessel holding a liquid mixture.
 *
 * @param input            what was asked
 * @param relieving        relieving pressure and the rule applied
 * @param vessel           volumes and areas at the level, with the fire-exposed area
 * @param heat             fire heat input
 * @param boiling          the liquid at its bubble point at P1 with its incipient vapour
 * @param latentHeat       latent heat as computed and as used (see {@link BoilingState} for the definition)
 * @param displacementFactor 1 - rho_V/rho_L at relieving conditions
 * @param reliefLoadKgPerS required relieving rate, kg/s
 * @param relievedVapour   the relieved (incipient) vapour's properties
 * @param sizing           API 520 gas sizing
 * @param orifice          API 526 orifice selection
 * @param liquidMassKg     liquid in the vessel at the level, at relieving conditions, kg
 * @param expansion        the relieved vapour after isenthalpic expansion to the back pressure; empty where the
 *                         caller did not ask for it (the load-against-level points, a screening run)
 * @param trace            the calculation steps in order
 * @param warnings         everything the user must see
 */
public record MixtureFireResult(MixtureFireInput input, RelievingPressureResult relieving, LevelState vessel,
                                HeatInputResult heat, BoilingState boiling, LatentHeatGuard.Result latentHeat,
                                double displacementFactor, double reliefLoadKgPerS, RelievedFluid relievedVapour,
                                GasSizingResult sizing, OrificeSelection orifice, double liquidMassKg,
                                java.util.Optional<IsenthalpicExpansion.Result> expansion, List<TraceStep> trace, List<String> warnings) {
    public MixtureFireResult {
        trace = List.copyOf(trace);
        warnings = List.copyOf(warnings);
    }
}
