package org.ventcase.audit;

/**
 * Why a row could not be computed.
 *
 * @param field  the register column (or, for a case file, the JSON path; "calculation" when the
 *               numerical method had no answer) the problem is in
 * @param value  the value as given, or empty when it was missing
 * @param reason what is wrong and what would be accepted, in words
 */
public record AuditError(String field, String value, String reason) {
    public AuditError {
        field = field == null ? "" : field;
        value = value == null ? "" : value;
        reason = reason == null ? "" : reason;
    }

    /** One line: field, value and reason. */
    public String message() {
        return field + (value.isEmpty() ? "" : " '" + value + "'") + ": " + reason;
    }
}
