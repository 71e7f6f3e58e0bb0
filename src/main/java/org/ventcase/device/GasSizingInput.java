package org.ventcase.device;

import java.util.OptionalDouble;

import org.ventcase.common.InvalidInputException;

/**
 * Conditions for sizing a pressure-relief valve in gas or vapour service (SI).
 *
 * @param massFlowKgPerS required relief rate W, kg/s
 * @param p1Pa           relieving pressure P1 (set + overpressure + atmospheric), Pa absolute
 * @param p2Pa           total back pressure P2, Pa absolute; must be below P1
 * @param temperatureK   relieving temperature T, K
 * @param z              compressibility factor Z at relieving conditions
 * @param molarMass      molar mass M, kg/kmol
 * @param k              ideal-gas heat capacity ratio (isentropic exponent) at relieving
 *                       temperature; empty when unknown (then C = 0.0239 is used)
 * @param kd             effective coefficient of discharge (0.975 for a valve, 0.62 rupture disk alone)
 * @param kb             back-pressure correction for balanced-bellows valves (1 for conventional
 *                       and pilot valves; a value below 1 marks a balanced-bellows valve)
 * @param kc             combination correction (1, or 0.9 for a rupture disk ahead of the valve
 *                       without a certified value)
 */
public record GasSizingInput(double massFlowKgPerS, double p1Pa, double p2Pa, double temperatureK, double z,
                             double molarMass, OptionalDouble k, double kd, double kb, double kc) {

    /** Default Kd for a valve (API Std 520 Part I, preliminary sizing). */
    public static final double DEFAULT_KD = 0.975;

    public GasSizingInput {
        InvalidInputException.requirePositive("device.massFlow", massFlowKgPerS, "kg/s");
        InvalidInputException.requirePositive("relief.relievingPressure", p1Pa, "Pa abs");
        if (!(p2Pa >= 0 && p2Pa < p1Pa)) {
            throw InvalidInputException.outOfRange("device.backPressure", p2Pa, 0, p1Pa, "Pa abs (below P1)");
        }
        InvalidInputException.requirePositive("device.temperature", temperatureK, "K");
        InvalidInputException.requireInRange("device.z", z, 0.05, 2.0, "");
        InvalidInputException.requireInRange("device.molarMass", molarMass, 1, 2000, "kg/kmol");
        if (k == null) {
            k = OptionalDouble.empty();
        }
        if (k.isPresent()) {
            InvalidInputException.requireInRange("device.k", k.getAsDouble(), 1.0, 3.0, "");
        }
        InvalidInputException.requireInRange("device.kd", kd, Double.MIN_NORMAL, 1.0, "(0 < Kd <= 1)");
        InvalidInputException.requireInRange("device.kb", kb, Double.MIN_NORMAL, 1.0, "(0 < Kb <= 1)");
        InvalidInputException.requireInRange("device.kc", kc, Double.MIN_NORMAL, 1.0, "(0 < Kc <= 1)");
    }

    /** Conventional or pilot valve, no rupture disk: Kd 0.975, Kb 1, Kc 1. */
    public static GasSizingInput of(double massFlowKgPerS, double p1Pa, double p2Pa, double temperatureK, double z,
                                    double molarMass, double k) {
        return new GasSizingInput(massFlowKgPerS, p1Pa, p2Pa, temperatureK, z, molarMass, OptionalDouble.of(k),
                DEFAULT_KD, 1.0, 1.0);
    }
}
