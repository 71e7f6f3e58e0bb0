package org.ventcase.device;

import java.util.List;
import java.util.OptionalDouble;

/**
 * Required effective area for gas or vapour service and how it was obtained.
 *
 * @param areaM2                 required effective discharge area, m2
 * @param regime                 critical or subcritical, as used by the equation chosen
 * @param criticalPressureRatio  ratio P2/P1 at or below which the flow was taken as critical
 * @param coefficientC           C of the critical equation in the standard's SI units
 *                               (0.03948 x root; 0.0239 when k is unknown)
 * @param f2                     F2 of the subcritical equation, when that equation was used
 * @param equation               which equation, in words
 * @param lines                  each step with the substituted values, in order (formatted when read)
 * @param warnings               validity notes to print
 * @param source                 standard, edition and equation
 */
public record GasSizingResult(double areaM2, FlowRegime regime, double criticalPressureRatio, double coefficientC,
                              OptionalDouble f2, String equation, List<org.ventcase.common.LazyText> lines,
                              List<String> warnings, String source) {
    public GasSizingResult {
        lines = List.copyOf(lines);
        warnings = List.copyOf(warnings);
    }

    /** The substituted equations, as text. */
    public List<String> trace() {
        return lines.stream().map(org.ventcase.common.LazyText::get).toList();
    }

    /** Required area, mm2. */
    public double areaMm2() {
        return areaM2 * 1e6;
    }
}
