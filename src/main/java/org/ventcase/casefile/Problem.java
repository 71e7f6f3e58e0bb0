package org.ventcase.casefile;

import org.ventcase.common.InvalidInputException;

/**
 * One thing wrong with a case file.
 *
 * @param path        JSON path of the offending value, e.g. {@code $.vessel.insideDiameter} or
 *                    {@code $.scenarios[1].inflow}; {@code $} for the file as a whole
 * @param value       the value as written, or {@code null} when it was missing
 * @param accepted    what would have been accepted, in words
 * @param domainField the field path the domain check used (e.g. {@code vessel.diameter}), or ""
 *                    when the check was the case file's own
 */
public record Problem(String path, String value, String accepted, String domainField) {

    public Problem {
        if (path == null || path.isBlank()) {
            throw new IllegalArgumentException("a problem needs a path");
        }
        accepted = accepted == null ? "" : accepted;
        domainField = domainField == null ? "" : domainField;
    }

    /** A problem found by the case file's own checks. */
    public static Problem of(String path, String value, String accepted) {
        return new Problem(path, value, accepted, "");
    }

    /** A missing value. */
    public static Problem missing(String path, String accepted) {
        return new Problem(path, null, accepted, "");
    }

    /** A domain check's refusal, placed at a JSON path. */
    public static Problem from(String path, InvalidInputException e) {
        return new Problem(path, e.value(), e.accepted(), e.field());
    }

    /** One line: path, value and what is accepted. */
    public String message() {
        return path + ": " + (value == null ? "missing; " : "'" + value + "' is not accepted; ") + accepted;
    }

    @Override
    public String toString() {
        return message();
    }
}
