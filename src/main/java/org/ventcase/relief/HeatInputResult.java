package org.ventcase.relief;

import java.util.List;

/**
 * A fire heat input with the equation and source that produced it.
 *
 * @param heatW        heat input Q, W
 * @param equation     the equation with the numbers substituted
 * @param source       standard, edition and equation
 * @param warnings     validity notes to print
 */
public record HeatInputResult(double heatW, String equation, String source, List<String> warnings) {
    public HeatInputResult {
        warnings = List.copyOf(warnings);
    }
}
