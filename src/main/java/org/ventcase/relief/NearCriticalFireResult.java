package org.ventcase.relief;

import java.util.List;

import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;

/**
 * Result of the near-critical / supercritical fire case.
 *
 * @param input                what was asked
 * @param openingTemperatureK  temperature at which the contents, heated at constant volume, reach P1
 * @param initialMassKg        contents' mass, kg
 * @param curve                the load curve at P1, one point per temperature step
 * @param governingIndex       index of the largest required area (the sizing point)
 * @param maxFlowIndex         index of the largest mass rate (for comparison; not the sizing point
 *                             unless the two coincide)
 * @param governingFluid       relieved fluid at the governing point
 * @param governingSizing      API 520 sizing at the governing point
 * @param trace                the calculation steps in order
 * @param warnings             what the user must know
 */
public record NearCriticalFireResult(NearCriticalFireInput input, double openingTemperatureK, double initialMassKg,
                                     List<Point> curve, int governingIndex, int maxFlowIndex,
                                     RelievedFluid governingFluid, GasSizingResult governingSizing,
                                     List<TraceStep> trace, List<String> warnings) {

    /**
     * One step of the heat-up at P1.
     *
     * @param temperatureK       T, K
     * @param timeS              time since the device opened, s
     * @param massKg             contents left, V / v, kg
     * @param specificVolume     v, m3/kg (density basis of the fluid)
     * @param specificEnthalpy   h, J/kg (same basis)
     * @param dvdh               (dv/dh)_P, m3/J
     * @param outflowEnthalpyExcess h_out - h, J/kg (0 for single-phase contents)
     * @param massFlowKgPerS     W = Q (dv/dh) / (v + (dv/dh)(h_out - h)), kg/s
     * @param twoPhase           whether the contents are two-phase at this step
     * @param z                  Z of what leaves
     * @param molarMass          M of what leaves, kg/kmol
     * @param kIdeal             ideal-gas k of what leaves
     * @param requiredAreaM2     API 520 required area at this step, m2
     */
    public record Point(double temperatureK, double timeS, double massKg, double specificVolume,
                        double specificEnthalpy, double dvdh, double outflowEnthalpyExcess, double massFlowKgPerS,
                        boolean twoPhase, double z, double molarMass, double kIdeal, double requiredAreaM2) {
    }

    public NearCriticalFireResult {
        curve = List.copyOf(curve);
        trace = List.copyOf(trace);
        warnings = List.copyOf(warnings);
    }

    /** The sizing point. */
    public Point governing() {
        return curve.get(governingIndex);
    }
}
