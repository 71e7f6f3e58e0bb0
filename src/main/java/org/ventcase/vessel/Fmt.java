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
        // trailing zeros of the mantissa and a bare point are cut by hand: this runs for every vessel
        // description and rule text (same result as the patterns (\.\d*?)0+(e|$) -> $1$2, \.(e|$) -> $1)
        String s = String.format(Locale.US, "%.6g", v);
        int e = s.indexOf('e');
        String mant = e < 0 ? s : s.substring(0, e);
        String exp = e < 0 ? "" : s.substring(e);
        if (mant.indexOf('.') >= 0) {
            int end = mant.length();
            while (mant.charAt(end - 1) == '0') {
                end--;
            }
            if (mant.charAt(end - 1) == '.') {
                end--;
            }
            mant = mant.substring(0, end);
        }
        return mant + exp;
    }
}
