package org.ventcase.relief;

import java.util.List;

/**
 * Relief load of a gas-filled vessel in fire.
 *
 * @param massFlowKgPerS      W, relief rate, kg/s
 * @param relievingTemperatureK T1 = (P1/Pn) Tn, K
 * @param equation            the equation with the numbers substituted
 * @param source              standard and clause
 * @param warnings            cautions to print (always includes the wall-rupture caution)
 */
public record UnwettedVesselFireResult(double massFlowKgPerS, double relievingTemperatureK, String equation,
                                       String source, List<String> warnings) {
    public UnwettedVesselFireResult {
        warnings = List.copyOf(warnings);
    }

    /** W in kg/h, the unit of the standard's equation. */
    public double massFlowKgPerH() {
        return massFlowKgPerS * 3600.0;
    }
}
