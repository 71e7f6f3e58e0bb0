package org.ventcase.device;

import java.util.OptionalDouble;

import org.ventcase.common.InvalidInputException;

/**
 * Conditions for sizing a capacity-certified pressure-relief valve in liquid service (SI).
 *
 * @param volumetricFlowM3PerS required relief rate Q at flowing conditions, m3/s
 * @param relativeDensity      G, density of the liquid at flowing temperature referred to water at
 *                             standard conditions
 * @param p1Pa                 relieving pressure P1, Pa absolute
 * @param p2Pa                 total back pressure P2, Pa absolute (the difference P1 - P2 is the
 *                             same whether both are gauge or both absolute)
 * @param viscosityPaS         dynamic viscosity at flowing temperature, Pa s; empty to skip the
 *                             viscosity correction (Kv = 1)
 * @param kd                   effective coefficient of discharge (0.65 for preliminary sizing)
 * @param kw                   back-pressure correction (1 for conventional and pilot valves)
 * @param kc                   combination correction (1, or 0.9 with an upstream rupture disk)
 * @param kvForm               which published Kv form to use
 */
public record LiquidSizingInput(double volumetricFlowM3PerS, double relativeDensity, double p1Pa, double p2Pa,
                                OptionalDouble viscosityPaS, double kd, double kw, double kc,
                                ViscosityCorrection kvForm) {

    /** Default Kd for liquid service, certified valves. */
    public static final double DEFAULT_KD = 0.65;

    public LiquidSizingInput {
        InvalidInputException.requirePositive("device.volumetricFlow", volumetricFlowM3PerS, "m3/s");
        InvalidInputException.requireInRange("device.relativeDensity", relativeDensity, 0.05, 25, "");
        InvalidInputException.requirePositive("relief.relievingPressure", p1Pa, "Pa abs");
        if (!(p2Pa >= 0 && p2Pa < p1Pa)) {
            throw InvalidInputException.outOfRange("device.backPressure", p2Pa, 0, p1Pa, "Pa abs (below P1)");
        }
        if (viscosityPaS == null) {
            viscosityPaS = OptionalDouble.empty();
        }
        if (viscosityPaS.isPresent()) {
            InvalidInputException.requirePositive("device.viscosity", viscosityPaS.getAsDouble(), "Pa s");
        }
        InvalidInputException.requireInRange("device.kd", kd, Double.MIN_NORMAL, 1.0, "(0 < Kd <= 1)");
        InvalidInputException.requireInRange("device.kw", kw, Double.MIN_NORMAL, 1.0, "(0 < Kw <= 1)");
        InvalidInputException.requireInRange("device.kc", kc, Double.MIN_NORMAL, 1.0, "(0 < Kc <= 1)");
        if (kvForm == null) {
            throw InvalidInputException.missing("device.kvForm", "expected API520_7TH_TO_9TH or API520_10TH");
        }
    }

    /** Conventional valve, Kd 0.65, Kw = Kc = 1, 10th-edition Kv. */
    public static LiquidSizingInput of(double volumetricFlowM3PerS, double relativeDensity, double p1Pa, double p2Pa,
                                       double viscosityPaS) {
        return new LiquidSizingInput(volumetricFlowM3PerS, relativeDensity, p1Pa, p2Pa,
                OptionalDouble.of(viscosityPaS), DEFAULT_KD, 1.0, 1.0, ViscosityCorrection.API520_10TH);
    }
}
