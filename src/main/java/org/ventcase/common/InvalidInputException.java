package org.ventcase.common;

import java.util.Locale;

/**
 * An input that is missing, malformed or outside the accepted range. Carries the field path
 * (the same path the case file, the wizard field and the command-line option use), the value
 * as given and what would have been accepted, so every front end can say exactly what to fix.
 * The command line maps it to exit code 2.
 */
public final class InvalidInputException extends VentcaseException {
    private static final long serialVersionUID = 1L;

    private final String field;
    private final String value;
    private final String accepted;

    public InvalidInputException(String field, String value, String accepted) {
        super(format(field, value, accepted));
        this.field = field;
        this.value = value;
        this.accepted = accepted;
    }

    private static String format(String field, String value, String accepted) {
        // a missing value reads as the case checker's "missing; expected ..." (nothing was written to refuse)
        return field + ": " + (value == null ? "missing" : "'" + value + "' is not accepted") + "; " + accepted;
    }

    /** The field path, e.g. {@code fluid.components[2].name} or {@code --temperature}. */
    public String field() {
        return field;
    }

    /** The offending value as text, or {@code null} when the value was missing. */
    public String value() {
        return value;
    }

    /** What would have been accepted, in words. */
    public String accepted() {
        return accepted;
    }

    /** Same message with another field path (used where a core check is re-labelled at an edge). */
    public InvalidInputException withField(String newField) {
        return new InvalidInputException(newField, value, accepted);
    }

    public static InvalidInputException missing(String field, String accepted) {
        return new InvalidInputException(field, null, accepted);
    }

    public static InvalidInputException invalid(String field, Object value, String accepted) {
        return new InvalidInputException(field, String.valueOf(value), accepted);
    }

    /** A value that must be finite and strictly positive. */
    public static InvalidInputException notPositive(String field, double value, String unit) {
        return new InvalidInputException(field, num(value, unit), "expected a finite value greater than 0"
                + (unit.isEmpty() ? "" : " " + unit));
    }

    /** A value outside a closed range. */
    public static InvalidInputException outOfRange(String field, double value, double lo, double hi, String unit) {
        return new InvalidInputException(field, num(value, unit),
                "expected a value from " + g(lo) + " to " + g(hi) + (unit.isEmpty() ? "" : " " + unit));
    }

    /** Throws {@link #notPositive} unless {@code value} is finite and > 0 (NaN fails). */
    public static double requirePositive(String field, double value, String unit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw notPositive(field, value, unit);
        }
        return value;
    }

    /** Throws {@link #outOfRange} unless lo <= value <= hi (NaN fails). */
    public static double requireInRange(String field, double value, double lo, double hi, String unit) {
        if (!(value >= lo && value <= hi)) {
            throw outOfRange(field, value, lo, hi, unit);
        }
        return value;
    }

    private static String num(double v, String unit) {
        return g(v) + (unit.isEmpty() ? "" : " " + unit);
    }

    static String g(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return String.valueOf(v);
        }
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("(\\.\\d*?)0+(e|$)", "$1$2")
                .replaceAll("\\.(e|$)", "$1");
    }
}
