package org.ventcase.device;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.CsvTable;
import org.ventcase.common.InvalidInputException;

/**
 * The standard effective orifice areas D..T of API Std 526 (resource {@code api526_orifices.csv},
 * each row with its source) and the selection of a standard orifice for a required area.
 *
 * <p>Selection rule: the smallest standard orifice whose effective area is at least the required
 * area (equality accepted). When even T is too small, n = ceil(A_required / A_T) valves are used,
 * all of one designation: the smallest letter X with n x A_X &gt;= A_required. This multiple-valve
 * rule is a documented choice of this program (common practice, no source): a person may prefer
 * unequal valves or staggered set pressures, which changes the relieving pressure and is outside
 * this formula.
 *
 * <p>Rated capacity at the selected area: W_rated = W x A_selected / A_required. The sizing
 * equations are linear in area at fixed relieving conditions, so this is exact for gas and for
 * liquid at a fixed Kv (Kv changes slightly with the orifice through Re; not re-evaluated here).
 *
 * <p>Source: API Std 526 (2009), table of effective orifice areas; valid only with the API 520
 * Part I equations (REFERENCES.md section 5 [S]).
 */
public final class OrificeTable {

    private static final String RESOURCE = "api526_orifices.csv";
    private static final List<Orifice> ORIFICES = load();

    private OrificeTable() {
    }

    /** All orifices, smallest first. */
    public static List<Orifice> all() {
        return ORIFICES;
    }

    /** The orifice with the given letter (case-insensitive). */
    public static Orifice byLetter(String letter) {
        for (Orifice o : ORIFICES) {
            if (o.letter().equalsIgnoreCase(letter == null ? "" : letter.trim())) {
                return o;
            }
        }
        throw InvalidInputException.invalid("device.orifice", letter, "expected one of D E F G H J K L M N P Q R T");
    }

    /** The largest standard orifice (T). */
    public static Orifice largest() {
        return ORIFICES.get(ORIFICES.size() - 1);
    }

    /**
     * Selects the standard orifice (or several equal ones) for a required area.
     *
     * @param requiredAreaM2 required effective area, m2
     * @param requiredFlowKgPerS relief load W the area was sized for, kg/s (0 if only areas are wanted)
     */
    public static OrificeSelection select(double requiredAreaM2, double requiredFlowKgPerS) {
        InvalidInputException.requirePositive("device.requiredArea", requiredAreaM2, "m2");
        InvalidInputException.requireInRange("device.requiredFlow", requiredFlowKgPerS, 0, Double.MAX_VALUE, "kg/s");
        // Compare in mm2: the published in2 values x 645.16; a relative tolerance of 1e-12 keeps an
        // area typed exactly equal to a table value on that orifice.
        double reqMm2 = requiredAreaM2 * 1e6;
        for (Orifice o : ORIFICES) {
            if (o.areaMm2() >= reqMm2 * (1 - 1e-12)) {
                return selection(requiredAreaM2, requiredFlowKgPerS, o, 1, String.format(Locale.US,
                        "smallest standard orifice with effective area >= %.6g mm2: %s (%.6g mm2)", reqMm2,
                        o.letter(), o.areaMm2()));
            }
        }
        Orifice t = largest();
        int n = (int) Math.ceil(reqMm2 / t.areaMm2() * (1 - 1e-12));
        for (Orifice o : ORIFICES) {
            if (n * o.areaMm2() >= reqMm2 * (1 - 1e-12)) {
                return selection(requiredAreaM2, requiredFlowKgPerS, o, n, String.format(Locale.US,
                        "required %.6g mm2 exceeds the largest standard orifice %s (%.6g mm2); n = ceil(A/A_%s) = %d "
                                + "equal valves of the smallest orifice with n x A >= required: %d x %s "
                                + "(program's rule, common practice, no source)",
                        reqMm2, t.letter(), t.areaMm2(), t.letter(), n, n, o.letter()));
            }
        }
        throw new IllegalStateException("unreachable: n x T covers the required area");
    }

    /**
     * Rates a given orifice (or {@code count} equal ones) against a required area: selected area,
     * rated capacity W x A_selected / A_required and margin.
     */
    public static OrificeSelection rate(double requiredAreaM2, double requiredFlowKgPerS, Orifice orifice, int count,
                                        String rule) {
        InvalidInputException.requirePositive("device.requiredArea", requiredAreaM2, "m2");
        InvalidInputException.requireInRange("device.requiredFlow", requiredFlowKgPerS, 0, Double.MAX_VALUE, "kg/s");
        if (orifice == null) {
            throw InvalidInputException.missing("device.orifice", "expected a standard orifice");
        }
        if (count < 1) {
            throw InvalidInputException.invalid("device.orificeCount", count, "expected at least 1");
        }
        return selection(requiredAreaM2, requiredFlowKgPerS, orifice, count, rule);
    }

    private static OrificeSelection selection(double reqM2, double w, Orifice o, int n, String rule) {
        double sel = n * o.areaM2();
        return new OrificeSelection(reqM2, o, n, sel, w * sel / reqM2, 100 * (sel / reqM2 - 1), rule);
    }

    private static List<Orifice> load() {
        List<Orifice> list = new ArrayList<>();
        for (CsvTable.Row row : CsvTable.resource(OrificeTable.class, RESOURCE, CsvTable.LastColumn.REST_OF_LINE).rows()) {
            Orifice o;
            try {
                o = new Orifice(row.required("letter"), row.number("effective_area_in2"), row.required("source"));
            } catch (InvalidInputException e) {
                throw new IllegalStateException(RESOURCE + ": " + e.getMessage(), e);
            }
            if (!list.isEmpty() && !(o.areaIn2() > list.get(list.size() - 1).areaIn2())) {
                throw new IllegalStateException(row.where() + ": areas must increase");
            }
            list.add(o);
        }
        return List.copyOf(list);
    }
}
