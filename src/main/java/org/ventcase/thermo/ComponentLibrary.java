package org.ventcase.thermo;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.ventcase.common.CsvTable;
import org.ventcase.common.InvalidInputException;

/**
 * The built-in pure-component library: an immutable list of {@link Component}s read from the
 * resource {@code org/ventcase/thermo/components.csv}, with lookup by name, alias, formula or CAS
 * number.
 *
 * <h2>Lookup</h2>
 * A query is normalised before matching: lower case, and spaces, hyphens, underscores, commas and
 * dots removed, so "N-Butane", "n butane" and "nbutane" all find n-butane, and "106-97-8" and
 * "106978" both find it by CAS number. A name, alias or CAS number names exactly one component. A
 * formula may be shared by isomers (C4H10 is n-butane and isobutane); such a query is refused with
 * the candidates listed, never resolved silently. An unknown query is refused with the nearest
 * names (edit distance, and names containing the query) in the message.
 *
 * <h2>CSV format</h2>
 * UTF-8 text. Lines starting with {@code #} are comments (use them for provenance notes) and blank
 * lines are ignored. The first other line is the header and must contain these columns (order is
 * free, extra columns are an error):
 * <pre>
 * name, formula, cas, aliases, Tc_K, Pc_Pa, omega, M_kg_kmol, Tb_K, critical_source,
 * cp_a0, cp_a1, cp_a2, cp_a3, cp_a4, cp_Tmin_K, cp_Tmax_K, cp_source, Z_RA, Z_RA_source
 * </pre>
 * <ul>
 * <li>{@code name}: preferred name, lower case, unique (e.g. {@code n-butane}).</li>
 * <li>{@code formula}: molecular formula in Hill order (C first, then H, then the rest
 *     alphabetically; without carbon all elements alphabetically, e.g. {@code H3N}, {@code O2S}).</li>
 * <li>{@code cas}: CAS registry number; the check digit is verified on load.</li>
 * <li>{@code aliases}: other accepted names, lower case, separated by {@code ;} (may be empty).</li>
 * <li>{@code Tc_K} critical temperature in K; {@code Pc_Pa} critical pressure in Pa;
 *     {@code omega} Pitzer acentric factor; {@code M_kg_kmol} molar mass in kg/kmol;
 *     {@code Tb_K} normal boiling point at 101.325 kPa in K; {@code critical_source} where these
 *     five came from.</li>
 * <li>{@code cp_a0..cp_a4}: ideal-gas Cp/R = a0 + a1 T + a2 T^2 + a3 T^3 + a4 T^4, T in K
 *     (note: Poling's Appendix A prints a1 x 10^3 ... a4 x 10^11; the CSV holds the unscaled
 *     values); {@code cp_Tmin_K}, {@code cp_Tmax_K} the fitted range; {@code cp_source}.</li>
 * <li>{@code Z_RA}: Rackett compressibility of the Spencer and Danner (1972) form
 *     V_sat = (R Tc / Pc) Z_RA^(1 + (1 - Tr)^(2/7)); {@code Z_RA_source}.</li>
 * </ul>
 * A field containing a comma is written in double quotes. Every source column must be non-blank:
 * a row without a source is rejected, as is a non-numeric or out-of-range number, a bad CAS check
 * digit, or a duplicate name, alias or CAS number. Each error names the resource, the row (line
 * number in the file) and the column.
 *
 * <h2>Adding a component</h2>
 * <ol>
 * <li>Take Tc, Pc, omega, M and Tb from one published table (preferably Poling, Prausnitz and
 *     O'Connell, The Properties of Gases and Liquids, 5th ed., 2001, Appendix A) and name it in
 *     {@code critical_source}. If a value is recalled rather than read, say "from memory".</li>
 * <li>Take the Cp polynomial from a published source in exactly this form, or convert it
 *     (J/(mol K) coefficients divided by R); state the range and the source.</li>
 * <li>Use a tabulated Z_RA where one is published; otherwise the Yamada and Gunn (1973)
 *     correlation Z_RA = 0.29056 - 0.08775 omega, named as the source.</li>
 * <li>Add the row (the project keeps the rows in {@code tools/make_components_csv.py}, which writes
 *     the CSV and checks CAS digits), describe any new source key in the comment block, and extend
 *     {@code ComponentLibraryTest} with an independent check where one is available.</li>
 * </ol>
 *
 * <h2>Custom components</h2>
 * A case may define its own component with the {@link Component} record constructor, which checks
 * the ranges; it is not added to the built-in library. See {@link #custom}.
 */
public final class ComponentLibrary {

    /** Classpath location of the built-in data. */
    public static final String RESOURCE = "/org/ventcase/thermo/components.csv";

    static final List<String> COLUMNS = List.of("name", "formula", "cas", "aliases", "Tc_K", "Pc_Pa", "omega",
            "M_kg_kmol", "Tb_K", "critical_source", "cp_a0", "cp_a1", "cp_a2", "cp_a3", "cp_a4", "cp_Tmin_K",
            "cp_Tmax_K", "cp_source", "Z_RA", "Z_RA_source");

    private final List<Component> components;
    /** Normalised name, alias or CAS -> the one component it names. */
    private final Map<String, Component> byKey;
    /** Normalised formula -> all components with that formula. */
    private final Map<String, List<Component>> byFormula;

    private ComponentLibrary(List<Component> components, String origin) {
        this.components = List.copyOf(components);
        Map<String, Component> keys = new HashMap<>();
        Map<String, List<Component>> formulas = new HashMap<>();
        for (Component c : this.components) {
            List<String> names = new ArrayList<>();
            names.add(c.name());
            names.addAll(c.aliases());
            if (!c.cas().isEmpty()) {
                names.add(c.cas());
            }
            for (String n : names) {
                Component previous = keys.putIfAbsent(normalise(n), c);
                if (previous != null && previous != c) {
                    throw new InvalidInputException(origin + ".name", n,
                            "names, aliases and CAS numbers must be unique; also used by '" + previous.name() + "'");
                }
            }
            if (!c.formula().isEmpty()) {
                formulas.computeIfAbsent(normalise(c.formula()), k -> new ArrayList<>()).add(c);
            }
        }
        this.byKey = Map.copyOf(keys);
        Map<String, List<Component>> f = new HashMap<>();
        formulas.forEach((k, v) -> f.put(k, List.copyOf(v)));
        this.byFormula = Map.copyOf(f);
    }

    /** Lazily loaded, once, on first use (class-holder idiom; thread-safe by class initialisation). */
    private static final class Holder {
        static final ComponentLibrary BUILT_IN = loadResource();
    }

    /** The built-in library read from {@link #RESOURCE}. */
    public static ComponentLibrary builtIn() {
        return Holder.BUILT_IN;
    }

    private static ComponentLibrary loadResource() {
        try (InputStream in = ComponentLibrary.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + RESOURCE);
            }
            return parse(new InputStreamReader(in, StandardCharsets.UTF_8), "components.csv");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + RESOURCE, e);
        }
    }

    /**
     * Reads a library in the CSV format described above (used for the built-in data and by tests).
     *
     * @param origin name used in error messages (e.g. the file name)
     * @throws InvalidInputException naming {@code origin}, the line number and the column of the
     *                               first bad value
     */
    public static ComponentLibrary parse(Reader reader, String origin) throws IOException {
        CsvTable table = CsvTable.read(reader, origin, CsvTable.LastColumn.FIELD);
        List<String> columns = table.columns();
        for (String col : columns) {
            if (!COLUMNS.contains(col)) {
                throw InvalidInputException.invalid(table.headerWhere(), col,
                        "expected each of these columns exactly once: " + COLUMNS);
            }
        }
        for (String col : COLUMNS) {
            if (!columns.contains(col)) {
                throw InvalidInputException.missing(table.headerWhere() + "." + col, "expected columns " + COLUMNS);
            }
        }
        List<Component> list = new ArrayList<>();
        for (CsvTable.Row row : table.rows()) {
            list.add(row(row));
        }
        return new ComponentLibrary(list, origin);
    }

    private static Component row(CsvTable.Row cell) {
        String where = cell.where();
        String name = cell.required("name");
        if (!name.equals(name.toLowerCase(Locale.ROOT))) {
            throw InvalidInputException.invalid(where + ".name", name, "expected a lower-case name");
        }
        String formula = cell.required("formula");
        String cas = cell.required("cas");
        if (!casValid(cas)) {
            throw InvalidInputException.invalid(where + ".cas", cas,
                    "expected a CAS registry number NNNNNNN-NN-N with a valid check digit");
        }
        List<String> aliases = new ArrayList<>();
        for (String a : cell.text("aliases").split(";")) {
            String s = a.strip();
            if (!s.isEmpty()) {
                if (!s.equals(s.toLowerCase(Locale.ROOT))) {
                    throw InvalidInputException.invalid(where + ".aliases", s, "expected lower-case aliases");
                }
                aliases.add(s);
            }
        }
        double tc = cell.number("Tc_K");
        double pc = cell.number("Pc_Pa");
        double omega = cell.number("omega");
        double m = cell.number("M_kg_kmol");
        double tb = cell.number("Tb_K");
        String critSrc = cell.required("critical_source");
        double[] a = new double[5];
        for (int i = 0; i < 5; i++) {
            a[i] = cell.number("cp_a" + i);
        }
        double tMin = cell.number("cp_Tmin_K");
        double tMax = cell.number("cp_Tmax_K");
        String cpSrc = cell.required("cp_source");
        double zra = cell.number("Z_RA");
        String zSrc = cell.required("Z_RA_source");
        IdealGasCp cp;
        try {
            cp = new IdealGasCp(a, tMin, tMax, cpSrc);
        } catch (IllegalArgumentException e) {
            throw InvalidInputException.invalid(where + ".cp", Arrays.toString(a) + " [" + tMin + ", " + tMax + "]",
                    e.getMessage());
        }
        try {
            return new Component(name, formula, cas, aliases, tc, pc, omega, m, tb, critSrc, cp, zra, zSrc);
        } catch (InvalidInputException e) {
            throw e.withField(where + "." + e.field());
        }
    }
    /**
     * Whether a CAS registry number is well formed and its check digit right. The check digit is
     * the sum of the other digits, each times its position counted from the right starting at 1,
     * modulo 10 (rule published by Chemical Abstracts Service).
     */
    public static boolean casValid(String cas) {
        if (cas == null || !cas.matches("\\d{2,7}-\\d{2}-\\d")) {
            return false;
        }
        String digits = cas.substring(0, cas.lastIndexOf('-')).replace("-", "");
        int sum = 0;
        for (int i = 0; i < digits.length(); i++) {
            sum += (i + 1) * (digits.charAt(digits.length() - 1 - i) - '0');
        }
        return sum % 10 == cas.charAt(cas.length() - 1) - '0';
    }

    /** Lower case with spaces, hyphens, underscores, commas and dots removed. */
    static String normalise(String s) {
        StringBuilder out = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            boolean space = ch == ' ' || ch == '\t' || ch == '\n' || ch == '\u000B' || ch == '\f' || ch == '\r';
            if (!(space || ch == '-' || ch == '_' || ch == ',' || ch == '.')) {
                out.append(ch);
            }
        }
        return out.toString().toLowerCase(Locale.ROOT);
    }

    /** All components, in file order. */
    public List<Component> all() {
        return components;
    }

    /** The component named by {@code query}; see {@link #get(String, String)}. Field path "fluid". */
    public Component get(String query) {
        return get("fluid", query);
    }

    /**
     * The component named by {@code query} (name, alias, CAS number, or a formula that only one
     * component has).
     *
     * @param field field path used in the error (e.g. {@code fluid.components[2].name})
     * @throws InvalidInputException if the query is blank, unknown (the message lists the nearest
     *                               names) or a formula shared by several components (the message
     *                               lists them)
     */
    public Component get(String field, String query) {
        if (query == null || query.isBlank()) {
            throw InvalidInputException.missing(field, "expected a component name, formula or CAS number");
        }
        String key = normalise(query);
        Component c = byKey.get(key);
        if (c != null) {
            return c;
        }
        List<Component> byF = byFormula.getOrDefault(key, List.of());
        if (byF.size() == 1) {
            return byF.get(0);
        }
        if (byF.size() > 1) {
            List<String> names = byF.stream().map(Component::name).sorted().toList();
            throw InvalidInputException.invalid(field, query,
                    "the formula matches several components: " + String.join(", ", names) + "; give the name");
        }
        List<String> near = suggestions(query, 3);
        throw InvalidInputException.invalid(field, query, "unknown component"
                + (near.isEmpty() ? "" : "; did you mean: " + String.join(", ", near) + "?"));
    }

    /** The component named by {@code query}, or empty if it is unknown, blank or an ambiguous formula. */
    public Optional<Component> find(String query) {
        if (query == null || query.isBlank()) {
            return Optional.empty();
        }
        String key = normalise(query);
        Component c = byKey.get(key);
        if (c != null) {
            return Optional.of(c);
        }
        List<Component> byF = byFormula.getOrDefault(key, List.of());
        return byF.size() == 1 ? Optional.of(byF.get(0)) : Optional.empty();
    }

    /**
     * Up to {@code max} component names nearest to {@code query}: names whose name or alias
     * contains the query (or is contained in it) come first, then by Levenshtein distance between
     * the normalised query and the nearest normalised name or alias. Only candidates within a
     * distance of max(2, length/3) are offered, besides substring matches.
     */
    public List<String> suggestions(String query, int max) {
        if (query == null || query.isBlank() || max <= 0) {
            return List.of();
        }
        String q = normalise(query);
        record Scored(String name, boolean substring, int distance) { }
        List<Scored> scored = new ArrayList<>();
        for (Component c : components) {
            boolean sub = false;
            int best = Integer.MAX_VALUE;
            List<String> names = new ArrayList<>(c.aliases());
            names.add(0, c.name());
            for (String n : names) {
                String k = normalise(n);
                if (q.length() >= 3 && (k.contains(q) || q.contains(k) && k.length() >= 3)) {
                    sub = true;
                }
                best = Math.min(best, levenshtein(q, k));
            }
            int limit = Math.max(2, q.length() / 3);
            if (sub || best <= limit) {
                scored.add(new Scored(c.name(), sub, best));
            }
        }
        scored.sort(Comparator.comparing((Scored s) -> !s.substring()).thenComparingInt(Scored::distance)
                .thenComparing(Scored::name));
        Set<String> out = new LinkedHashSet<>();
        for (Scored s : scored) {
            if (out.size() >= max) {
                break;
            }
            out.add(s.name());
        }
        return Collections.unmodifiableList(new ArrayList<>(out));
    }

    static int levenshtein(String a, String b) {
        return org.ventcase.common.Strings.editDistance(a, b);
    }

    /**
     * A user-defined component, checked like a built-in one (ranges in the {@link Component}
     * constructor, a non-blank source for each group). It is not added to any library.
     */
    public static Component custom(String name, String formula, double tcK, double pcPa, double omega,
                                   double molarMass, double normalBoilingK, IdealGasCp cp, double rackettZ,
                                   String source) {
        return new Component(name, formula, "", List.of(), tcK, pcPa, omega, molarMass, normalBoilingK, source, cp,
                rackettZ, source);
    }
}
