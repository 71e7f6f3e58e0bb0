package org.ventcase.thermo;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The published Twu alpha parameters of the translated-consistent Peng-Robinson model (set tcPR),
 * each with the critical constants it was fitted with, from {@code twu-tcpr.csv} (sources in its
 * header). A set is looked up by the component's CAS number, so a case's own component (no CAS
 * number) never borrows a built-in fluid's parameters.
 *
 * <p>Source: M. Pina-Martinez, R. Privat, J.-N. Jaubert, AIChE J. 68(2) (2022) e17518,
 * DOI 10.1002/aic.17518.
 */
public final class TwuParameters {

    /** Resource path of the table. */
    public static final String RESOURCE = "/org/ventcase/thermo/twu-tcpr.csv";

    /** Citation printed beside the parameters. */
    public static final String CITATION = "tc-PR set of Pina-Martinez, Privat, Jaubert, AIChE J. 68 (2022) e17518, "
            + "as tabulated in the open-source Clapeyron.jl database";

    /**
     * One published set.
     *
     * @param tcK   the set's own critical temperature, K
     * @param pcPa  the set's own critical pressure, Pa
     * @param omega the set's acentric factor (used only for initial estimates)
     * @param c     the set's constant volume translation, m3/mol (v = v_PR - c)
     */
    public record Set(String component, double tcK, double pcPa, double omega, double l, double m, double n,
                      double c) {
        /** The alpha function of this set. */
        public AlphaFunction.Twu alpha() {
            return new AlphaFunction.Twu(l, m, n, CITATION);
        }
    }

    private static final class Holder {
        static final Map<String, Set> BY_CAS = load();
    }

    private TwuParameters() {
    }

    /** The published set for a component, matched by CAS number; empty where none is published. */
    public static Optional<Set> find(Component c) {
        if (c.cas().isEmpty()) {
            return Optional.empty();
        }
        return Optional.ofNullable(Holder.BY_CAS.get(c.cas()));
    }

    private static Map<String, Set> load() {
        ComponentLibrary lib = ComponentLibrary.builtIn();
        Map<String, Set> out = new HashMap<>();
        for (Map<String, String> row : readTable(RESOURCE)) {
            String name = row.get("component");
            if (row.getOrDefault("L", "").isBlank()) {
                continue; // listed without parameters (hydrogen): the model's fallback applies
            }
            Component c = lib.find(name).orElseThrow(() -> new IllegalStateException(
                    RESOURCE + ": '" + name + "' is not a built-in component"));
            Set s = new Set(c.name(), num(row, "Tc_K"), num(row, "Pc_Pa"), num(row, "omega"), num(row, "L"),
                    num(row, "M"), num(row, "N"), num(row, "c_m3_mol"));
            if (out.put(c.cas(), s) != null) {
                throw new IllegalStateException(RESOURCE + ": two rows for " + name);
            }
        }
        return Map.copyOf(out);
    }

    static double num(Map<String, String> row, String col) {
        String v = row.get(col);
        if (v == null || v.isBlank()) {
            throw new IllegalStateException("missing " + col + " in " + row);
        }
        return Double.parseDouble(v.trim());
    }

    /** Reads a packaged CSV table ('#' comment lines, one header line) into rows keyed by column. */
    static List<Map<String, String>> readTable(String resource) {
        try (InputStream in = TwuParameters.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("resource missing: " + resource);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<String> header = null;
            List<Map<String, String>> rows = new java.util.ArrayList<>();
            String line;
            int no = 0;
            while ((line = r.readLine()) != null) {
                no++;
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                List<String> f = ComponentLibrary.splitCsv(line, resource + ":" + no);
                if (header == null) {
                    header = f;
                    continue;
                }
                Map<String, String> row = new HashMap<>();
                for (int i = 0; i < header.size() && i < f.size(); i++) {
                    row.put(header.get(i).trim(), f.get(i));
                }
                rows.add(row);
            }
            return rows;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
