package org.ventcase.relief;

import java.util.List;
import java.util.OptionalDouble;

import org.ventcase.common.TraceStep;

/**
 * Result of the thermal expansion case.
 *
 * @param input                   what was asked
 * @param expansionCoefficientPerK alpha_v = (1/v)(dv/dT)_P of the liquid root, 1/K
 * @param specificHeatJPerKgK     c = Cp of the liquid from the EOS, J/(kg K)
 * @param densityKgM3             liquid density rho, kg/m3 (density basis of the fluid)
 * @param volumetricRateM3PerS    q = alpha_v phi / (rho c), m3/s
 * @param massRateKgPerS          rho q, kg/s
 * @param formulaCheckM3PerS      q from {@link ThermalExpansion#reliefRateM3PerS} with d = rho/1000
 * @param bubblePressurePa        the liquid's bubble (vapour) pressure at T, Pa abs, when it has one
 * @param vapourGenerationGoverns true when the bubble pressure exceeds P1
 * @param relievedLiquid          the relieved liquid's properties
 * @param trace                   the calculation steps in order
 * @param warnings                what the user must know
 */
public record ThermalReliefResult(ThermalReliefInput input, double expansionCoefficientPerK,
                                  double specificHeatJPerKgK, double densityKgM3, double volumetricRateM3PerS,
                                  double massRateKgPerS, double formulaCheckM3PerS, OptionalDouble bubblePressurePa,
                                  boolean vapourGenerationGoverns, RelievedFluid relievedLiquid,
                                  List<TraceStep> trace, List<String> warnings) {
    public ThermalReliefResult {
        trace = List.copyOf(trace);
        warnings = List.copyOf(warnings);
    }
}
