package org.ventcase.thermo.mix;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.ventcase.common.CsvTable;
import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.EosVariant;

/**
 * Binary interaction parameters k_ij for the van der Waals one-fluid mixing rule
 * a = sum_i sum_j x_i x_j (1 - k_ij) sqrt(a_i a_j), read from the resource
 * {@code org/ventcase/thermo/kij.csv}. Each row names two components (ComponentLibrary names), the
 * equation-of-state family (PR for PR76 and PR78, SRK for SRK), the value and its source; a row
 * without a source is rejected. Pairs that are not listed get k_ij = 0, and the matrix says so in
 * a warning, so that the sheet can print which values were assumed.
 *
 * <p>Immutable and thread-safe. Values listed in the built-in table are cited per row; see the
 * header of the resource for the full reference (Knapp et al., DECHEMA Chemistry Data Series VI,
 * 1982).
 */
public final class KijTable {

    /**
     * Source text of k_ij = 0 for a hydrocarbon pair under the Twu-alpha model. The PR table's
     * hydrocarbon-pair values were fitted with the Soave alpha and partly make up for its error
     * (above all for a supercritical light component); with the Twu alpha they overcorrect:
     * against the methane + propane bubble points of May et al. (2015) the table's 0.0119 gives
     * +3 to +6 % in bubble pressure, zero gives within 1.5 % below 90 % of the mixture's critical
     * pressure (MethanePropaneVleTest). Zero for hydrocarbon pairs is the usual default of
     * practice (common practice, no source). Pairs with a non-hydrocarbon keep the PR table's value.
     */
    public static final String TWU_HYDROCARBON_PAIR =
            "0 for a hydrocarbon pair with the Twu alpha (common practice; checked against May et al. 2015 methane + propane)";

    /** Resource path of the built-in table. */
    public static final String RESOURCE = "/org/ventcase/thermo/kij.csv";

    /** The equation-of-state family a k_ij was fitted for. */
    public enum Family {
        PR, SRK;

        /** The family of a variant, or empty for variants without a k_ij table (vdW, RK). */
        public static Optional<Family> of(EosVariant v) {
            switch (v) {
                case PR76:
                case PR78:
                case PRTWU:
                    // The PR k_ij were fitted with the Soave alpha; using them with the Twu alpha is
                    // the usual practice (common practice, no source) and is checked against
                    // experimental VLE in MixtureReferenceVleTest.
                    return Optional.of(PR);
                case SRK:
                    return Optional.of(SRK);
                default:
                    return Optional.empty();
            }
        }
    }

    /** An unordered pair of component names (normalised: lower case, trimmed). */
    public record Pair(String first, String second) {
        public Pair {
            String a = norm(first);
            String b = norm(second);
            if (a.compareTo(b) <= 0) {
                first = a;
                second = b;
            } else {
                first = b;
                second = a;
            }
        }

        public static Pair of(String a, String b) {
            return new Pair(a, b);
        }
    }

    /**
     * One table row.
     *
     * @param pair   the two components
     * @param family equation-of-state family
     * @param kij    k_ij (= k_ji)
     * @param source where the value comes from
     */
    public record Entry(Pair pair, Family family, double kij, String source) {
    }

    /**
     * A k_ij matrix for a component list, with the source of each off-diagonal entry and
     * warnings for the pairs defaulted to zero.
     *
     * @param kij      symmetric matrix, zero diagonal (copied)
     * @param sources  source of each entry ("" on the diagonal; copied)
     * @param warnings pairs defaulted to zero, overrides applied
     */
    public record Matrix(double[][] kij, String[][] sources, List<String> warnings) {
        public Matrix {
            kij = deepCopy(kij);
            String[][] s = new String[sources.length][];
            for (int i = 0; i < sources.length; i++) {
                s[i] = sources[i].clone();
            }
            sources = s;
            warnings = List.copyOf(warnings);
        }

        @Override
        public double[][] kij() {
            return deepCopy(kij);
        }

        @Override
        public String[][] sources() {
            String[][] s = new String[sources.length][];
            for (int i = 0; i < sources.length; i++) {
                s[i] = sources[i].clone();
            }
            return s;
        }

        private static double[][] deepCopy(double[][] m) {
            double[][] out = new double[m.length][];
            for (int i = 0; i < m.length; i++) {
                out[i] = m[i].clone();
            }
            return out;
        }
    }

    private final Map<Family, Map<Pair, Entry>> entries;
    private final String origin;

    private KijTable(Map<Family, Map<Pair, Entry>> entries, String origin) {
        this.entries = entries;
        this.origin = origin;
    }

    private static final class Holder {
        static final KijTable BUILT_IN = load();

        private static KijTable load() {
            InputStream in = KijTable.class.getResourceAsStream(RESOURCE);
            if (in == null) {
                throw new IllegalStateException("resource " + RESOURCE + " is missing from the build");
            }
            try (Reader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
                return parse(r, RESOURCE);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    /** The built-in table. */
    public static KijTable builtIn() {
        return Holder.BUILT_IN;
    }

    /** The columns of a k_ij table, in order; the last (source) may contain commas. */
    public static final List<String> COLUMNS = List.of("component_a", "component_b", "eos", "kij", "source");

    /**
     * Parses a table: lines starting with '#' are comments; the first other line is the header
     * {@code component_a,component_b,eos,kij,source}. The source column may contain commas.
     *
     * @throws InvalidInputException for a malformed row (field path {@code origin:line})
     */
    public static KijTable parse(Reader reader, String origin) throws IOException {
        Map<Family, Map<Pair, Entry>> map = new HashMap<>();
        for (Family f : Family.values()) {
            map.put(f, new HashMap<>());
        }
        CsvTable table = CsvTable.read(reader, origin, CsvTable.LastColumn.REST_OF_LINE);
        if (!table.columns().equals(COLUMNS)) {
            throw InvalidInputException.invalid(table.headerWhere(), String.join(",", table.columns()),
                    "expected header " + String.join(",", COLUMNS));
        }
        for (CsvTable.Row row : table.rows()) {
            String where = row.where();
            Family fam;
            try {
                fam = Family.valueOf(row.text("eos").toUpperCase(Locale.ROOT));
            } catch (IllegalArgumentException e) {
                throw InvalidInputException.invalid(where + ".eos", row.text("eos"), "expected PR or SRK");
            }
            double k = row.number("kij");
            InvalidInputException.requireInRange(where + ".kij", k, -0.99, 0.99, "");
            String src = row.required("source");
            Pair p = Pair.of(row.text("component_a"), row.text("component_b"));
            if (p.first().equals(p.second())) {
                throw InvalidInputException.invalid(where, p, "a k_ij row needs two different components");
            }
            if (map.get(fam).putIfAbsent(p, new Entry(p, fam, k, src)) != null) {
                throw InvalidInputException.invalid(where, p, "duplicate row for " + p + " " + fam);
            }
        }
        Map<Family, Map<Pair, Entry>> frozen = new HashMap<>();
        map.forEach((k, v) -> frozen.put(k, Collections.unmodifiableMap(v)));
        return new KijTable(Collections.unmodifiableMap(frozen), origin);
    }

    /** The row for a pair and family, if listed. */
    public Optional<Entry> find(String a, String b, Family family) {
        return Optional.ofNullable(entries.get(family).get(Pair.of(a, b)));
    }

    /** All rows of one family (unordered). */
    public List<Entry> entries(Family family) {
        return List.copyOf(entries.get(family).values());
    }

    /** Where the table was read from. */
    public String origin() {
        return origin;
    }

    /** The matrix for these components and variant, without overrides. */
    public Matrix matrix(List<Component> components, EosVariant variant) {
        return matrix(components, variant, Map.of());
    }

    /**
     * The k_ij matrix for a component list. Priority: an override for the pair (source
     * "case override"), then the table row for the variant's family, then zero with a warning.
     *
     * @param overrides per-case values keyed by unordered pair of component names
     * @throws InvalidInputException for an override naming a component not in the list, or
     *                               outside (-1, 1)
     */
    public Matrix matrix(List<Component> components, EosVariant variant, Map<Pair, Double> overrides) {
        int n = components.size();
        double[][] k = new double[n][n];
        String[][] src = new String[n][n];
        List<String> warnings = new ArrayList<>();
        Optional<Family> fam = Family.of(variant);
        Map<Pair, Double> unused = new HashMap<>(overrides);
        for (int i = 0; i < n; i++) {
            src[i][i] = "";
            for (int j = i + 1; j < n; j++) {
                String a = components.get(i).name();
                String b = components.get(j).name();
                Pair p = Pair.of(a, b);
                double v;
                String s;
                if (overrides.containsKey(p)) {
                    v = overrides.get(p);
                    unused.remove(p);
                    InvalidInputException.requireInRange("fluid.kij[" + a + "," + b + "]", v, -0.99, 0.99, "");
                    s = "case override";
                    warnings.add(String.format(Locale.US, "k_ij(%s, %s) = %.4f set by the case (override)", a, b, v));
                } else if (variant == EosVariant.PRTWU && components.get(i).isHydrocarbon()
                        && components.get(j).isHydrocarbon()) {
                    v = 0.0;
                    s = TWU_HYDROCARBON_PAIR;
                } else {
                    Optional<Entry> e = fam.flatMap(f -> find(a, b, f));
                    if (e.isPresent()) {
                        v = e.get().kij();
                        s = e.get().source();
                    } else {
                        v = 0.0;
                        s = "default zero (no table entry)";
                        warnings.add(String.format(Locale.US, "k_ij(%s, %s) = 0 assumed: no %s value in the table",
                                a, b, fam.map(Enum::name).orElse(variant.displayName())));
                    }
                }
                k[i][j] = v;
                k[j][i] = v;
                src[i][j] = s;
                src[j][i] = s;
            }
        }
        if (!unused.isEmpty()) {
            Pair p = unused.keySet().iterator().next();
            throw InvalidInputException.invalid("fluid.kij[" + p.first() + "," + p.second() + "]", unused.get(p),
                    "an override must name two components of the fluid");
        }
        return new Matrix(k, src, warnings);
    }

    private static String norm(String s) {
        if (s == null || s.isBlank()) {
            throw InvalidInputException.missing("fluid.kij.component", "expected a component name");
        }
        return s.trim().toLowerCase(Locale.ROOT);
    }
}
