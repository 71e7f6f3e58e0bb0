package org.ventcase.relief;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;
import org.ventcase.device.LiquidSizingResult;

/**
 * Result of the blocked-outlet case.
 *
 * @param input                what was asked
 * @param massFlowKgPerS       relief load W, kg/s
 * @param inflowBasis          how the inflow was converted (reference conditions for a standard volume)
 * @param relieved             the relieved fluid at relieving conditions
 * @param gasSizing            API 520 gas sizing (gas or vapour relief)
 * @param liquidSizing         API 520 liquid sizing (liquid relief)
 * @param volumetricFlowM3PerS liquid volumetric flow at relieving conditions (liquid relief)
 * @param relativeDensity      G = rho / 999.0 kg/m3 (liquid relief)
 * @param expansion            the relieved fluid after isenthalpic expansion to the back pressure
 * @param trace                the calculation steps in order
 * @param warnings             what the user must know
 */
public record BlockedOutletResult(BlockedOutletInput input, double massFlowKgPerS, String inflowBasis,
                                  RelievedFluid relieved, Optional<GasSizingResult> gasSizing,
                                  Optional<LiquidSizingResult> liquidSizing, OptionalDouble volumetricFlowM3PerS,
                                  OptionalDouble relativeDensity, IsenthalpicExpansion.Result expansion,
                                  List<TraceStep> trace, List<String> warnings) {
    public BlockedOutletResult {
        trace = List.copyOf(trace);
        warnings = List.copyOf(warnings);
    }
}
