package org.ventcase.vessel;

import java.util.Locale;

/** Number formatting for descriptions and rule texts (six significant digits, no trailing zeros). */
final class Fmt {
    private static final java.util.regex.Pattern TRAILING_ZEROS = java.util.regex.Pattern.compile("(\\.\\d*?)0+(e|$)");
    private static final java.util.regex.Pattern BARE_POINT = java.util.regex.Pattern.compile("\\.(e|$)");

    private Fmt() {
    }

    static String g(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return String.valueOf(v);
        }
        // patterns compiled once: this runs for every vessel description and rule text
        String s = TRAILING_ZEROS.matcher(String.format(Locale.US, "%.6g", v)).replaceAll("$1$2");
        return BARE_POINT.matcher(s).replaceAll("$1");
    }
}
