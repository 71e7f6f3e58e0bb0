package org.ventcase.thermo;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.ventcase.common.InvalidInputException;

/**
 * Reads a composition as a person types it: {@code "propane:0.95,n-butane:0.05"} (name, colon,
 * mole fraction; entries separated by commas), or a bare name ({@code "propane"},
 * {@code "1,3-butadiene"}) for a pure fluid. Names are looked up in the built-in
 * {@link ComponentLibrary} (name, alias, CAS number or unambiguous formula). A name may itself
 * contain commas: an entry ends at the comma that follows its fraction.
 */
public final class Compositions {

    private static final Pattern ENTRY = Pattern.compile("\\s*([^:]+?)\\s*:\\s*([^,:]*?)\\s*(?:,|$)");
    private static final String FORM = "expected 'name:fraction,name:fraction,...' (e.g. 'propane:0.95,n-butane:0.05') "
            + "or a single component name";

    private Compositions() {
    }

    /**
     * Parses with the built-in library.
     *
     * @param field     field path for messages (e.g. {@code fluid.composition} or {@code --fluid});
     *                  an entry's path is {@code field[i]}
     * @param normalize when true, any positive numbers are accepted and divided by their sum;
     *                  when false, the fractions must lie in (0, 1] and sum to 1 within 1e-6,
     *                  and a sum outside that is refused with the sum in the message
     */
    public static Composition parse(String field, String text, boolean normalize) {
        return parse(field, text, normalize, ComponentLibrary.builtIn());
    }

    /** Parses with the given library; see {@link #parse(String, String, boolean)}. */
    public static Composition parse(String field, String text, boolean normalize, ComponentLibrary library) {
        if (text == null || text.isBlank()) {
            throw InvalidInputException.missing(field, FORM);
        }
        String t = text.trim();
        if (t.indexOf(':') < 0) {
            return Composition.pure(library.get(field, t));
        }
        List<Component> comps = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        Matcher m = ENTRY.matcher(t);
        int pos = 0;
        while (pos < t.length()) {
            if (!m.find(pos) || m.start() != pos || m.end() == m.start()) {
                throw InvalidInputException.invalid(field, text, FORM);
            }
            int i = comps.size();
            String entryField = field + "[" + i + "]";
            Component c = library.get(entryField, m.group(1));
            for (Component prev : comps) {
                if (prev.name().equals(c.name())) {
                    throw InvalidInputException.invalid(entryField, m.group(1), c.name() + " is listed twice");
                }
            }
            double v;
            try {
                v = Double.parseDouble(m.group(2));
            } catch (NumberFormatException e) {
                throw InvalidInputException.invalid(entryField, m.group(1) + ":" + m.group(2),
                        "expected a mole fraction after the colon, e.g. 'propane:0.95'");
            }
            if (normalize) {
                InvalidInputException.requirePositive(entryField, v, "");
            } else if (!(v > 0 && v <= 1)) {
                throw InvalidInputException.invalid(entryField, m.group(1) + ":" + m.group(2),
                        "expected a mole fraction greater than 0 and at most 1");
            }
            comps.add(c);
            values.add(v);
            pos = m.end();
        }
        double sum = 0;
        for (double v : values) {
            sum += v;
        }
        if (!Double.isFinite(sum)) {
            throw InvalidInputException.invalid(field, text, "the fractions' sum is not finite");
        }
        if (!normalize && !(Math.abs(sum - 1.0) <= Composition.SUM_TOLERANCE)) {
            throw InvalidInputException.invalid(field, text, String.format(Locale.US,
                    "the mole fractions sum to %.9g; they must sum to 1 within 1e-6 (or ask for normalisation)", sum));
        }
        double[] x = new double[values.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = values.get(i) / sum;
        }
        return new Composition(comps, x);
    }
}
