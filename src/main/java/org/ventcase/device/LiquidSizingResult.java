package org.ventcase.device;

import java.util.List;
import java.util.OptionalDouble;

/**
 * Required effective area for liquid service, with the orifice the iteration settled on.
 *
 * @param areaM2          required effective area including the viscosity correction, m2
 * @param areaWithoutKvM2 required area with Kv = 1 (the first pass), m2
 * @param kv              viscosity correction used (1 when no viscosity was given)
 * @param reynolds        Re at the selected orifice, when a viscosity was given
 * @param kvForm          the Kv form used
 * @param selection       standard orifice selected for {@code areaM2}
 * @param iterations      number of Re/Kv evaluations
 * @param trace           each step with the substituted values
 * @param warnings        validity notes to print
 * @param source          standard, edition and equation
 */
public record LiquidSizingResult(double areaM2, double areaWithoutKvM2, double kv, OptionalDouble reynolds,
                                 ViscosityCorrection kvForm, OrificeSelection selection, int iterations,
                                 List<String> trace, List<String> warnings, String source) {
    public LiquidSizingResult {
        trace = List.copyOf(trace);
        warnings = List.copyOf(warnings);
    }

    /** Required area, mm2. */
    public double areaMm2() {
        return areaM2 * 1e6;
    }
}
