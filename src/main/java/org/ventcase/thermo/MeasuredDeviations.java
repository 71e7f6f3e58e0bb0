package org.ventcase.thermo;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.CsvTable;

/**
 * Where the default model (PR-Twu) is known to miss its saturation accuracy targets for a built-in
 * fluid, measured against published reference equations of state (measured-deviations.csv; the
 * figures are held to the measurement by ReferenceSaturationTest, docs/accuracy.md). The program
 * says so at every saturation state inside a listed range instead of refitting the published
 * parameters to the reference data, which would be fitting to the test.
 */
public final class MeasuredDeviations {

    static final String RESOURCE = "measured-deviations.csv";

    /** The saturation quantities of the table, with their words on a warning. */
    public enum Quantity {
        PSAT("Psat", "vapour pressure"),
        RHO_L("rhoL", "saturated-liquid density"),
        RHO_V("rhoV", "saturated-vapour density"),
        L("L", "latent heat");

        private final String key;
        private final String words;

        Quantity(String key, String words) {
            this.key = key;
            this.words = words;
        }

        public String key() {
            return key;
        }

        static Quantity of(String key) {
            for (Quantity q : values()) {
                if (q.key.equals(key)) {
                    return q;
                }
            }
            throw new IllegalStateException(RESOURCE + ": unknown quantity " + key);
        }
    }

    /** One row: for {@code trFrom <= Tr < trTo} the model is up to {@code largestPct} off (signed). */
    public record Entry(String name, String cas, Quantity quantity, double trFrom, double trTo, double largestPct,
                        String why) {
        public boolean covers(double tr) {
            return tr >= trFrom && tr < trTo;
        }

        String range() {
            if (trFrom <= 0) {
                return String.format(Locale.US, "below Tr %s", trim(trTo));
            }
            if (trTo >= 0.96) {
                return String.format(Locale.US, "above Tr %s", trim(trFrom));
            }
            return String.format(Locale.US, "Tr %s-%s", trim(trFrom), trim(trTo));
        }

        String consequence() {
            boolean high = largestPct > 0;
            return switch (quantity) {
                case PSAT -> "";
                case RHO_L -> high ? "; the liquid inventory as much too high" : "; the liquid inventory as much too low";
                case RHO_V -> high ? "; the vapour's Z as much too low, a smaller required area"
                        : "; the vapour's Z as much too high, a larger required area";
                case L -> high ? "; a fire relief load W = Q/L as much too low" : "; a fire relief load as much too high";
            };
        }

        private static String trim(double x) {
            String s = String.format(Locale.US, "%.3f", x);
            return s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
    }

    private static final List<Entry> ENTRIES = load();

    private MeasuredDeviations() {
    }

    /** Every row of the table, in file order. */
    public static List<Entry> entries() {
        return ENTRIES;
    }

    /** The warning for a saturation state of {@code c} at reduced temperature tr (model Tc), or "". */
    public static String note(Component c, double tr) {
        List<String> parts = new ArrayList<>();
        for (Entry e : ENTRIES) {
            if (e.cas().equals(c.cas()) && e.covers(tr)) {
                parts.add(String.format(Locale.US, "%s up to %.1f %% %s %s (%s%s)", e.quantity().words,
                        Math.abs(e.largestPct()), e.largestPct() > 0 ? "high" : "low", e.range(), e.why(),
                        e.consequence()));
            }
        }
        if (parts.isEmpty()) {
            return "";
        }
        return String.format(Locale.US, "%s at Tr = %.4f, the default model against the reference equation of state "
                + "(docs/accuracy.md): %s.", c.name(), tr, String.join("; ", parts));
    }

    private static List<Entry> load() {
        List<Entry> out = new ArrayList<>();
        for (CsvTable.Row row : CsvTable.resource(MeasuredDeviations.class, RESOURCE, CsvTable.LastColumn.REST_OF_LINE)
                .rows()) {
            double from = row.number("tr_from");
            double to = row.number("tr_to");
            if (!(from >= 0 && to > from)) {
                throw new IllegalStateException(row.where() + ": expected 0 <= tr_from < tr_to");
            }
            out.add(new Entry(row.text("name"), row.text("cas"), Quantity.of(row.text("quantity")), from, to,
                    row.number("largest_pct"), row.text("why")));
        }
        return List.copyOf(out);
    }
}
