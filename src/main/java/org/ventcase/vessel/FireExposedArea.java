package org.ventcase.vessel;

import java.util.Objects;

/**
 * The wetted area to use in the fire heat-input equation, with how it was obtained.
 *
 * @param area           fire-exposed wetted inside area, m2 (&gt;= 0)
 * @param effectiveLevel level above the vessel's lowest inside point up to which wetted area
 *                       was counted, m (&gt;= 0)
 * @param rule           the rule in words, for the calculation sheet (written when read)
 */
public record FireExposedArea(double area, double effectiveLevel, Rule rule) {
    public FireExposedArea {
        if (!(area >= 0) || Double.isInfinite(area)) {
            throw new IllegalArgumentException("area must be finite and >= 0: " + area);
        }
        if (!(effectiveLevel >= 0) || Double.isInfinite(effectiveLevel)) {
            throw new IllegalArgumentException("effectiveLevel must be finite and >= 0: " + effectiveLevel);
        }
        Objects.requireNonNull(rule, "rule");
    }

    /** The rule in words, SI. */
    public String ruleApplied() {
        return rule.text(Words.SI);
    }

    /** The rule in words, with lengths and areas written as {@code w} writes them. */
    public String ruleApplied(Words w) {
        return rule.text(w);
    }

    /**
     * The rule's words as a function of how lengths are written; made when read (the SI text is kept
     * once made). Equal when the SI texts are equal.
     */
    public static final class Rule {
        private final java.util.function.Function<Words, String> words;
        private volatile String si;

        public Rule(java.util.function.Function<Words, String> words) {
            this.words = Objects.requireNonNull(words, "words");
        }

        String text(Words w) {
            if (w == Words.SI) {
                String t = si;
                if (t == null) {
                    t = words.apply(Words.SI);
                    si = t;
                }
                return t;
            }
            return words.apply(w);
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Rule r && text(Words.SI).equals(r.text(Words.SI));
        }

        @Override
        public int hashCode() {
            return text(Words.SI).hashCode();
        }

        @Override
        public String toString() {
            return text(Words.SI);
        }
    }
}
