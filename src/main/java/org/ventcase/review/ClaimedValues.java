package org.ventcase.review;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Optional;

import org.ventcase.common.InvalidInputException;

/**
 * What a relief basis under review states for one scenario: values in SI (Pa absolute, K, kg/kmol,
 * J/kg, kg/m3, W, m2, kg/s; Z and k dimensionless) and the orifice designation, each with the text
 * as written. Parsed from a claimed-value file by {@code casefile.ClaimedFiles}.
 *
 * @param source   who made the claim and in which document (free text, may be empty)
 * @param scenario scenario label or 1-based position; empty for the governing scenario
 * @param values   quantity -> value (SI); never {@link ReviewQuantity#ORIFICE}
 * @param orifice  the claimed orifice, e.g. "L" or "2 x L"
 * @param written  quantity -> the text as written in the file
 */
public record ClaimedValues(String source, Optional<String> scenario, Map<ReviewQuantity, Double> values,
                            Optional<String> orifice, Map<ReviewQuantity, String> written) {

    public ClaimedValues {
        source = source == null ? "" : source.strip();
        scenario = scenario == null ? Optional.empty() : scenario.filter(s -> !s.isBlank()).map(String::strip);
        Map<ReviewQuantity, Double> v = new EnumMap<>(ReviewQuantity.class);
        v.putAll(values);
        for (Map.Entry<ReviewQuantity, Double> e : v.entrySet()) {
            if (e.getKey() == ReviewQuantity.ORIFICE) {
                throw new IllegalArgumentException("the orifice is a designation, not a number");
            }
            double x = e.getValue();
            if (!(x > 0) || Double.isInfinite(x)) {
                throw InvalidInputException.invalid("claimed." + e.getKey().key(), written.getOrDefault(e.getKey(),
                        String.valueOf(x)), "expected a finite value above 0");
            }
        }
        values = Collections.unmodifiableMap(v);
        orifice = orifice == null ? Optional.empty() : orifice.filter(s -> !s.isBlank()).map(ClaimedValues::designation);
        Map<ReviewQuantity, String> w = new EnumMap<>(ReviewQuantity.class);
        w.putAll(written);
        written = Collections.unmodifiableMap(w);
        if (values.isEmpty() && orifice.isEmpty()) {
            throw InvalidInputException.missing("claimed", "expected at least one claimed value, of "
                    + ReviewQuantity.keys());
        }
    }

    /** Whether q was claimed. */
    public boolean has(ReviewQuantity q) {
        return q == ReviewQuantity.ORIFICE ? orifice.isPresent() : values.containsKey(q);
    }

    /** The claimed value of q, SI. */
    public Optional<Double> value(ReviewQuantity q) {
        return Optional.ofNullable(values.get(q));
    }

    /**
     * An orifice designation in the form Ventcase prints: one letter ("L"), or "N x L" for N valves
     * ("2xL", "2 x l" and "2 * L" are read the same way).
     */
    public static String designation(String text) {
        String t = text.strip().toUpperCase(java.util.Locale.ROOT).replace('*', 'X');
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("^(?:(\\d{1,3})\\s*X\\s*)?([A-Z])$").matcher(t);
        if (!m.matches()) {
            throw InvalidInputException.invalid("claimed.orifice", text,
                    "expected an API 526 orifice letter (D to T), optionally with a count, e.g. 'L' or '2 x L'");
        }
        java.util.List<String> letters = org.ventcase.device.OrificeTable.all().stream()
                .map(o -> o.letter()).toList();
        if (!letters.contains(m.group(2))) {
            throw InvalidInputException.invalid("claimed.orifice", text, "'" + m.group(2) + "' is not an API 526 "
                    + "orifice letter: expected one of " + String.join(" ", letters) + ", optionally with a count, "
                    + "e.g. 'L' or '2 x L'");
        }
        int count = m.group(1) == null ? 1 : Integer.parseInt(m.group(1));
        if (count < 1 || count > 99) {
            throw InvalidInputException.invalid("claimed.orifice", text, "expected a count of 1 to 99 valves");
        }
        return count == 1 ? m.group(2) : count + " x " + m.group(2);
    }
}
