package org.ventcase.review;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;

import org.ventcase.common.InvalidInputException;

/**
 * The tolerance of each quantity for one review: the defaults of {@link ReviewQuantity}, any of
 * them changed per run. Relative tolerances are fractions (0 &lt; t &lt;= 0.5); the temperature
 * tolerance is in K (0 &lt; t &lt;= 20); the orifice is always exact.
 */
public final class Tolerances {

    /** Largest relative tolerance accepted. */
    public static final double MAX_RELATIVE = 0.5;
    /** Largest temperature tolerance accepted, K. */
    public static final double MAX_KELVIN = 20.0;

    private final Map<ReviewQuantity, Double> values;

    private Tolerances(Map<ReviewQuantity, Double> values) {
        this.values = Collections.unmodifiableMap(new EnumMap<>(values));
    }

    /** The defaults. */
    public static Tolerances defaults() {
        Map<ReviewQuantity, Double> m = new EnumMap<>(ReviewQuantity.class);
        for (ReviewQuantity q : ReviewQuantity.values()) {
            m.put(q, q.defaultTolerance());
        }
        return new Tolerances(m);
    }

    /** The tolerance of a quantity. */
    public double of(ReviewQuantity q) {
        return values.get(q);
    }

    /** Whether the tolerance of q differs from its default. */
    public boolean changed(ReviewQuantity q) {
        return values.get(q) != q.defaultTolerance();
    }

    /** A copy with one tolerance changed; refuses values outside the accepted range. */
    public Tolerances with(ReviewQuantity q, double tolerance) {
        String field = "--tolerance " + q.key();
        switch (q.kind()) {
            case EXACT -> throw InvalidInputException.invalid(field, tolerance,
                    "the orifice is compared exactly; its tolerance cannot be changed");
            case RELATIVE -> InvalidInputException.requireInRange(field, tolerance, 1e-6, MAX_RELATIVE, "");
            case ABSOLUTE_KELVIN -> InvalidInputException.requireInRange(field, tolerance, 1e-6, MAX_KELVIN, "K");
            default -> throw new IllegalStateException(q.kind().name());
        }
        Map<ReviewQuantity, Double> m = new EnumMap<>(values);
        m.put(q, tolerance);
        return new Tolerances(m);
    }

    /**
     * A copy with {@code name=value} applied: value a fraction ({@code 0.05}), a percentage
     * ({@code 5 %} or {@code 5%}) for relative tolerances, or kelvin ({@code 2} or {@code 2 K}) for
     * the relieving temperature.
     */
    public Tolerances with(String assignment) {
        String field = "--tolerance";
        int eq = assignment == null ? -1 : assignment.indexOf('=');
        if (eq <= 0) {
            throw InvalidInputException.invalid(field, assignment, "expected name=value, e.g. k=0.05, with name one of "
                    + ReviewQuantity.keys());
        }
        String name = assignment.substring(0, eq).strip();
        ReviewQuantity q = ReviewQuantity.byKey(name).orElseThrow(() -> InvalidInputException.invalid(field, assignment,
                "expected name=value with name one of " + ReviewQuantity.keys()));
        String v = assignment.substring(eq + 1).strip().toLowerCase(Locale.ROOT);
        double scale = 1.0;
        if (q.kind() == ReviewQuantity.Kind.RELATIVE && v.endsWith("%")) {
            v = v.substring(0, v.length() - 1).strip();
            scale = 0.01;
        } else if (q.kind() == ReviewQuantity.Kind.ABSOLUTE_KELVIN && v.endsWith("k")) {
            v = v.substring(0, v.length() - 1).strip();
        }
        double t;
        try {
            t = Double.parseDouble(v) * scale;
        } catch (NumberFormatException e) {
            throw InvalidInputException.invalid(field + " " + q.key(), assignment.substring(eq + 1),
                    q.kind() == ReviewQuantity.Kind.ABSOLUTE_KELVIN ? "expected kelvin, e.g. 2 or '2 K'"
                            : "expected a fraction, e.g. 0.05, or a percentage, e.g. '5 %'");
        }
        if (!Double.isFinite(t)) {
            throw InvalidInputException.invalid(field + " " + q.key(), assignment.substring(eq + 1),
                    "expected a finite number");
        }
        return with(q, t);
    }

    /** All tolerances in table order. */
    public Map<ReviewQuantity, Double> all() {
        return values;
    }
}
