package org.ventcase.audit;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.units.Dimension;
import org.ventcase.units.Units;

/**
 * Threshold quantities per substance, entered by the user (a CSV with the columns
 * {@code substance}, {@code threshold} (a mass with its unit, or a bare number with the unit in the
 * header, {@code threshold [t]}) and {@code label} (where the figure comes from, in the user's
 * words)). Ventcase ships no thresholds: what applies to a site is for its owner to determine.
 * The file is refused as a whole, with the line, when any entry is wrong: a threshold that is
 * silently dropped would hide an exceedance.
 *
 * @param origin  file name
 * @param entries in file order
 */
public record Thresholds(String origin, List<Entry> entries) {

    private static final Pattern HEADER = Pattern.compile("^([^\\[]*?)\\s*(?:\\[([^\\]]*)\\])?\\s*$");

    public Thresholds {
        entries = List.copyOf(entries);
    }

    /** No thresholds. */
    public static Thresholds none() {
        return new Thresholds("", List.of());
    }

    /**
     * One threshold.
     *
     * @param line       line in the file
     * @param substance  as written
     * @param component  the component it names (matched by name, alias, formula or CAS number)
     * @param thresholdKg kg
     * @param label      the user's label or source
     */
    public record Entry(int line, String substance, Component component, double thresholdKg, String label) {
    }

    /** Reads a thresholds file (UTF-8). */
    public static Thresholds read(Path file) throws IOException {
        return parse(Files.readString(file, StandardCharsets.UTF_8), file.getFileName().toString());
    }

    /** Parses thresholds text. */
    public static Thresholds parse(String text, String origin) {
        List<Csv.Record> recs = Csv.parse(text, origin);
        if (recs.isEmpty()) {
            throw InvalidInputException.missing(origin, "expected a header 'substance,threshold,label' and one "
                    + "substance a line");
        }
        List<String> head = recs.get(0).fields();
        int s = -1;
        int t = -1;
        int l = -1;
        String unit = "";
        for (int i = 0; i < head.size(); i++) {
            Matcher m = HEADER.matcher(head.get(i));
            String name = (m.matches() ? m.group(1) : head.get(i)).strip().toLowerCase(Locale.ROOT);
            switch (name) {
                case "substance" -> s = i;
                case "threshold" -> {
                    t = i;
                    unit = m.matches() && m.group(2) != null ? m.group(2).strip() : "";
                }
                case "label", "source" -> l = i;
                default -> {
                }
            }
        }
        if (s < 0 || t < 0) {
            throw InvalidInputException.invalid(origin + " line " + recs.get(0).line(), String.join(",", head),
                    "expected a header with the columns substance, threshold and (optional) label");
        }
        if (!unit.isEmpty()) {
            try {
                Units.parse("threshold", "1 " + unit, Dimension.MASS);
            } catch (InvalidInputException e) {
                throw InvalidInputException.invalid(origin + " line " + recs.get(0).line(), "[" + unit + "]",
                        "not a mass unit: " + e.accepted());
            }
        }
        List<Entry> out = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (int r = 1; r < recs.size(); r++) {
            Csv.Record rec = recs.get(r);
            String where = origin + " line " + rec.line();
            List<String> f = rec.fields();
            if (f.size() <= Math.max(s, t)) {
                throw InvalidInputException.invalid(where, String.join(",", f), "expected a substance and a threshold");
            }
            Component c;
            try {
                c = ComponentLibrary.builtIn().get("substance", f.get(s));
            } catch (InvalidInputException e) {
                throw InvalidInputException.invalid(where + ", substance", f.get(s), e.accepted());
            }
            if (!seen.add(c.name())) {
                throw InvalidInputException.invalid(where + ", substance", f.get(s), "'" + c.name()
                        + "' already has a threshold; give one per substance");
            }
            double kg;
            try {
                kg = Units.parse("threshold", Register.withUnit(f.get(t), unit), Dimension.MASS);
            } catch (InvalidInputException e) {
                throw InvalidInputException.invalid(where + ", threshold", f.get(t), e.accepted());
            }
            if (!(kg > 0)) {
                throw InvalidInputException.invalid(where + ", threshold", f.get(t), "expected a mass above 0");
            }
            out.add(new Entry(rec.line(), f.get(s), c, kg, l >= 0 && l < f.size() ? f.get(l) : ""));
        }
        return new Thresholds(origin, out);
    }
}
