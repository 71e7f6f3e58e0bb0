package org.ventcase.thermo;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.ventcase.common.InvalidInputException;

/**
 * Parses a fluid typed as text: a single component ("propane") or mole fractions
 * ("propane:0.7, n-butane:0.3"). A composition whose fractions do not sum to 1 within 1e-6 is
 * refused with its sum, unless normalising was asked for.
 */
public final class Compositions {

    /** Tolerance on the sum of mole fractions. */
    public static final double SUM_TOLERANCE = 1e-6;

    private Compositions() {
    }

    /**
     * A parsed composition.
     *
     * @param components the components in the order given
     * @param fractions  mole fractions, summing to 1 (copied)
     */
    public record Parsed(List<Component> components, double[] fractions) {
        public Parsed {
            components = List.copyOf(components);
            fractions = fractions.clone();
        }

        @Override
        public double[] fractions() {
            return fractions.clone();
        }

        /** Whether this is one component. */
        public boolean isPure() {
            return components.size() == 1;
        }
    }

    /** Parses with the built-in component library. */
    public static Parsed parse(String field, String text, boolean normalize) {
        return parse(field, text, normalize, ComponentLibrary.builtIn());
    }

    /** Parses with a given library. */
    public static Parsed parse(String field, String text, boolean normalize, ComponentLibrary lib) {
        if (text == null || text.isBlank()) {
            throw InvalidInputException.missing(field, "expected a component name or 'name:fraction,...'");
        }
        if (!text.contains(":")) {
            return new Parsed(List.of(lib.get(field, text.trim())), new double[] {1.0});
        }
        List<Component> comps = new ArrayList<>();
        List<Double> fr = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (String part : text.split(",")) {
            String p = part.trim();
            int c = p.lastIndexOf(':');
            if (c <= 0 || c == p.length() - 1) {
                throw InvalidInputException.invalid(field, text,
                        "expected 'name:fraction' pairs separated by commas, e.g. 'propane:0.7,n-butane:0.3'");
            }
            Component comp = lib.get(field, p.substring(0, c).trim());
            if (!seen.add(comp.name())) {
                throw InvalidInputException.invalid(field, text, comp.name() + " is listed twice");
            }
            double x;
            try {
                x = Double.parseDouble(p.substring(c + 1).trim());
            } catch (NumberFormatException e) {
                throw InvalidInputException.invalid(field, p, "expected a mole fraction between 0 and 1");
            }
            if (!(x > 0 && x <= 1)) {
                throw InvalidInputException.invalid(field, p, "expected a mole fraction above 0 and at most 1");
            }
            comps.add(comp);
            fr.add(x);
        }
        double sum = 0;
        for (double x : fr) {
            sum += x;
        }
        if (!normalize && !(Math.abs(sum - 1.0) <= SUM_TOLERANCE)) {
            throw InvalidInputException.invalid(field, text, String.format(Locale.ROOT,
                    "mole fractions sum to %.9g, not 1 within %.0e; correct them or ask to normalise", sum,
                    SUM_TOLERANCE));
        }
        double[] x = new double[fr.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = fr.get(i) / sum;
        }
        return new Parsed(comps, x);
    }
}
