package org.ventcase.relief;

import java.util.List;

import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;

/**
 * Result of the gas-filled vessel fire case.
 *
 * @param input              what was asked
 * @param exposedAreaM2      A', m2
 * @param areaRule           how A' was found
 * @param load               the API 521 relief rate (with T1 and the substituted equation)
 * @param relievedGas        the gas at (T1, P1) from the EOS
 * @param sizing             API 520 sizing with the EOS Z, M and k
 * @param fPrime             F' of the area form (SI)
 * @param areaFromFPrimeM2   A = F' A' / sqrt(P1), m2 (ideal gas, Z = 1, critical flow)
 * @param fPrimeRatio        areaFromFPrime / sizing area (equals 1/sqrt(Z) in critical flow with Kb = Kc = 1)
 * @param expansion          the gas after isenthalpic expansion to the back pressure; empty in a screening run
 * @param trace              the calculation steps in order
 * @param warnings           what the user must know (always the wall-rupture caution)
 */
public record GasFilledFireResult(GasFilledFireInput input, double exposedAreaM2, String areaRule,
                                  UnwettedVesselFireResult load, RelievedFluid relievedGas, GasSizingResult sizing,
                                  double fPrime, double areaFromFPrimeM2, double fPrimeRatio,
                                  java.util.Optional<IsenthalpicExpansion.Result> expansion, List<TraceStep> trace,
                                  List<String> warnings) {
    public GasFilledFireResult {
        trace = List.copyOf(trace);
        warnings = List.copyOf(warnings);
    }
}
