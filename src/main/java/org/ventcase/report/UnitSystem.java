package org.ventcase.report;

import java.util.Locale;

import org.ventcase.common.InvalidInputException;

/** The unit system a sheet prints its inputs and results in; the other system is bracketed where useful. */
public enum UnitSystem {
    /** SI (kPa, C, m, kg, kg/h, mm2), with US customary in brackets for the key values. */
    SI,
    /** US customary (psi, F, ft, lb, lb/h, in2), with SI in brackets for the key values. */
    US;

    /** Parses {@code si} or {@code us} (any case); the field names the option for the message. */
    public static UnitSystem parse(String field, String text) {
        String t = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        switch (t) {
            case "si":
            case "metric":
                return SI;
            case "us":
            case "customary":
                return US;
            default:
                throw InvalidInputException.invalid(field, text, "expected si or us");
        }
    }
}
