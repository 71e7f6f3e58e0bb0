package org.ventcase.vessel;

import java.util.Locale;

/** Number formatting for descriptions and rule texts (six significant digits, no trailing zeros). */
final class Fmt {
    private Fmt() {
    }

    static String g(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return String.valueOf(v);
        }
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("(\\.\\d*?)0+(e|$)", "$1$2")
                .replaceAll("\\.(e|$)", "$1");
    }
}
