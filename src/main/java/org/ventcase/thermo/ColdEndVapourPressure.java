package org.ventcase.thermo;

import java.util.Locale;
import java.util.Map;

/**
 * Built-in fluids whose default-model vapour pressure misses the 2 % target at the cold end of the
 * range: the published tc-PR Twu parameters were fitted over the whole liquid range and leave more
 * there. The figures are measured by ReferenceSaturationTest against the reference equations of
 * state (docs/accuracy.md). Refitting the parameters to that data would be fitting to the test, so
 * the program says so instead.
 */
final class ColdEndVapourPressure {

    /** CAS -> {reduced temperature below which the note applies, largest deviation there, per cent}. */
    private static final Map<String, double[]> BY_CAS = Map.of(
            "7664-41-7", new double[] {0.6, 3.6},
            "110-54-3", new double[] {0.5, 3.0});

    private ColdEndVapourPressure() {
    }

    /** The warning for a saturation state at reduced temperature tr, or "". */
    static String note(Component c, double tr) {
        double[] f = BY_CAS.get(c.cas());
        if (f == null || tr >= f[0]) {
            return "";
        }
        return String.format(Locale.US, "%s at Tr = %.3f: below Tr %.1f the default model's vapour pressure is up to "
                + "%.1f %% high against the reference equation of state (published Twu parameters; docs/accuracy.md), "
                + "and the saturated-vapour density with it.", c.name(), tr, f[0], f[1]);
    }
}
