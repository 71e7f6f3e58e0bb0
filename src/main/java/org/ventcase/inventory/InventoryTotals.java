package org.ventcase.inventory;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.ventcase.common.InvalidInputException;

/**
 * Contents of several vessels added up, per component and overall, with the rows that were
 * summed (so that a reviewer can check the addition).
 *
 * @param rows               one row per vessel, in the order given
 * @param liquidMassKg       kg
 * @param vapourMassKg       kg
 * @param totalMassKg        kg
 * @param totalMoles         mol
 * @param massPerComponentKg component name -> kg, names in order of first appearance
 */
public record InventoryTotals(List<Row> rows, double liquidMassKg, double vapourMassKg, double totalMassKg,
                              double totalMoles, Map<String, Double> massPerComponentKg) {

    public InventoryTotals {
        rows = List.copyOf(rows);
        massPerComponentKg = Collections.unmodifiableMap(new LinkedHashMap<>(massPerComponentKg));
    }

    /**
     * One summed vessel.
     *
     * @param label              "vessel 1", ... or the caller's label
     * @param mode               its storage mode
     * @param liquidMassKg       kg
     * @param vapourMassKg       kg
     * @param totalMassKg        kg
     * @param totalMoles         mol
     * @param massPerComponentKg component name -> kg
     * @param warningCount       number of warnings on that vessel's result
     */
    public record Row(String label, StorageMode mode, double liquidMassKg, double vapourMassKg, double totalMassKg,
                      double totalMoles, Map<String, Double> massPerComponentKg, int warningCount) {
        public Row {
            massPerComponentKg = Collections.unmodifiableMap(new LinkedHashMap<>(massPerComponentKg));
        }
    }

    /** Sums vessels labelled "vessel 1", "vessel 2", ... */
    public static InventoryTotals sum(List<Inventory> inventories) {
        if (inventories == null) {
            throw InvalidInputException.missing("vessels", "expected a list of vessel inventories");
        }
        List<String> labels = new ArrayList<>();
        for (int i = 0; i < inventories.size(); i++) {
            labels.add("vessel " + (i + 1));
        }
        return sum(labels, inventories);
    }

    /** Sums vessels with the caller's labels (same length as the list). */
    public static InventoryTotals sum(List<String> labels, List<Inventory> inventories) {
        if (inventories == null || labels == null || labels.size() != inventories.size()) {
            throw InvalidInputException.invalid("vessels", labels == null || inventories == null ? "missing"
                    : labels.size() + " labels for " + inventories.size() + " vessels", "expected one label per vessel");
        }
        List<Row> rows = new ArrayList<>();
        Map<String, Double> per = new LinkedHashMap<>();
        double ml = 0;
        double mv = 0;
        double n = 0;
        for (int i = 0; i < inventories.size(); i++) {
            Inventory inv = inventories.get(i);
            if (inv == null) {
                throw InvalidInputException.missing("vessels[" + i + "]", "expected a vessel inventory");
            }
            rows.add(new Row(labels.get(i), inv.mode(), inv.liquidMassKg(), inv.vapourMassKg(), inv.totalMassKg(),
                    inv.totalMoles(), inv.massPerComponentKg(), inv.warnings().size()));
            ml += inv.liquidMassKg();
            mv += inv.vapourMassKg();
            n += inv.totalMoles();
            inv.massPerComponentKg().forEach((k, v) -> per.merge(k, v, Double::sum));
        }
        return new InventoryTotals(rows, ml, mv, ml + mv, n, per);
    }
}
