package org.ventcase.thermo;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

import org.ventcase.common.CsvTable;

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
        for (CsvTable.Row row : CsvTable.resource(TwuParameters.class, RESOURCE, CsvTable.LastColumn.FIELD).rows()) {
            String name = row.required("component");
            if (row.text("L").isEmpty()) {
                continue; // listed without parameters (hydrogen): the model's fallback applies
            }
            Component c = lib.find(name).orElseThrow(() -> new IllegalStateException(
                    RESOURCE + ": '" + name + "' is not a built-in component"));
            Set s = new Set(c.name(), row.number("Tc_K"), row.number("Pc_Pa"), row.number("omega"), row.number("L"),
                    row.number("M"), row.number("N"), row.number("c_m3_mol"));
            if (out.put(c.cas(), s) != null) {
                throw new IllegalStateException(RESOURCE + ": two rows for " + name);
            }
        }
        return Map.copyOf(out);
    }
}
