package org.ventcase.relief;

import java.util.List;

import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;

/**
 * Result of the boil-off simulation.
 *
 * @param input                 what was asked
 * @param curve                 the load curve, point 0 at the opening
 * @param peakIndex             index in {@code curve} of the largest required area (the sizing point)
 * @param initialLoadKgPerS     load at the initial bubble point, Q/L (1 - rho_V/rho_L), kg/s
 * @param initialAreaM2         required area at the initial bubble point, m2
 * @param peakLoadKgPerS        load at the peak, kg/s
 * @param peakAreaM2            required area at the peak, m2
 * @param peakMinusInitialAreaPercent 100 (A_peak - A_initial) / A_initial
 * @param peakMinusInitialLoadPercent 100 (W_peak - W_initial) / W_initial
 * @param peakVapour            relieved vapour at the peak
 * @param peakSizing            API 520 sizing at the peak
 * @param stopReason            why the simulation ended
 * @param balance               mass and energy balance over the run
 * @param trace                 the calculation steps in order
 * @param warnings              what the user must know
 */
public record BoilOffResult(BoilOffInput input, List<BoilOffPoint> curve, int peakIndex, double initialLoadKgPerS,
                            double initialAreaM2, double peakLoadKgPerS, double peakAreaM2,
                            double peakMinusInitialAreaPercent, double peakMinusInitialLoadPercent,
                            RelievedFluid peakVapour, GasSizingResult peakSizing, StopReason stopReason,
                            Balance balance, List<TraceStep> trace, List<String> warnings) {

    /** Why the run ended. */
    public enum StopReason {
        LIQUID_EXHAUSTED, LIQUID_FRACTION_REACHED, TIME_LIMIT, VESSEL_LIQUID_FULL
    }

    /**
     * Balances over the run (all from the simulated states).
     *
     * @param initialMassKg      contents at the opening, kg
     * @param finalMassKg        contents at the end, kg
     * @param ventedMassKg       sum of vented mass, kg
     * @param heatInJ            Q x elapsed time, J
     * @param initialInternalEnergyJ U at the opening (H - P1 V), J
     * @param finalInternalEnergyJ   U at the end, J
     * @param ventedEnthalpyJ    sum of enthalpy carried out, J
     * @param massResidualKg     initial - final - vented, kg
     * @param energyResidualJ    heat in - (U_final - U_initial) - vented enthalpy, J
     */
    public record Balance(double initialMassKg, double finalMassKg, double ventedMassKg, double heatInJ,
                          double initialInternalEnergyJ, double finalInternalEnergyJ, double ventedEnthalpyJ,
                          double massResidualKg, double energyResidualJ) {
    }

    public BoilOffResult {
        curve = List.copyOf(curve);
        trace = List.copyOf(trace);
        warnings = List.copyOf(warnings);
    }

    /** The governing point. */
    public BoilOffPoint peak() {
        return curve.get(peakIndex);
    }
}
