package org.ventcase.report;

import org.ventcase.review.ReviewQuantity;
import org.ventcase.units.CustomaryUnits;

/**
 * The review's quantities in the display units of a unit system: SI as the review writes them
 * ({@link ReviewQuantity#format(double)}), or US customary (psia, F, lb/lbmol, Btu/lb, lb/ft3,
 * Btu/h, ft2, lb/h, in2). Display is the edge's business; the review itself works in SI. Factors:
 * {@link CustomaryUnits} (exact, NIST SP 811).
 */
public final class ReviewDisplay {

    private ReviewDisplay() {
    }

    /** The display unit. */
    public static String unit(ReviewQuantity q, boolean us) {
        if (!us) {
            return q.displayUnit();
        }
        return switch (q) {
            case RELIEVING_PRESSURE -> "psia";
            case RELIEVING_TEMPERATURE -> "\u00b0F";
            case MOLAR_MASS -> "lb/lbmol";
            case Z, K, ORIFICE -> "";
            case LATENT_HEAT -> "Btu/lb";
            case LIQUID_DENSITY, VAPOUR_DENSITY -> "lb/ft3";
            case HEAT_INPUT -> "Btu/h";
            case WETTED_AREA -> "ft2";
            case RELIEF_LOAD -> "lb/h";
            case REQUIRED_AREA -> "in2";
        };
    }

    /** An SI value in the display unit. */
    public static double value(ReviewQuantity q, double si, boolean us) {
        if (!us) {
            return q.toDisplay(si);
        }
        return switch (q) {
            case RELIEVING_PRESSURE -> CustomaryUnits.paToPsi(si);
            case RELIEVING_TEMPERATURE -> CustomaryUnits.kToRankine(si) - 459.67;
            case LATENT_HEAT -> si / CustomaryUnits.J_PER_KG_PER_BTU_PER_LB;
            case LIQUID_DENSITY, VAPOUR_DENSITY -> si * Math.pow(CustomaryUnits.M_PER_FT, 3) / CustomaryUnits.KG_PER_LB;
            case HEAT_INPUT -> si / CustomaryUnits.W_PER_BTU_PER_H;
            case WETTED_AREA -> si / CustomaryUnits.M2_PER_FT2;
            case RELIEF_LOAD -> si * 3600 / CustomaryUnits.KG_PER_LB;
            case REQUIRED_AREA -> si * 1e6 / CustomaryUnits.MM2_PER_IN2;
            default -> si;
        };
    }

    /** A difference of SI values in the display unit (temperature differences in K or F). */
    public static double difference(ReviewQuantity q, double si, boolean us) {
        if (!us) {
            return q.differenceToDisplay(si);
        }
        // every US display unit but the temperature's is a pure factor of the SI one (no offset)
        return q == ReviewQuantity.RELIEVING_TEMPERATURE ? CustomaryUnits.kDiffToF(si) : value(q, si, true);
    }

    /** The unit of a difference: K or F for temperatures, else the display unit. */
    public static String differenceUnit(ReviewQuantity q, boolean us) {
        return q == ReviewQuantity.RELIEVING_TEMPERATURE ? (us ? "\u00b0F" : "K") : unit(q, us);
    }

    /** An SI value formatted in the display unit. */
    public static String format(ReviewQuantity q, double si, boolean us) {
        return us ? q.formatNumber(value(q, si, true), unit(q, true)) : q.format(si);
    }

    /** A signed difference of SI values formatted in the display unit. */
    public static String formatDifference(ReviewQuantity q, double si, boolean us) {
        return us ? q.formatDifferenceNumber(difference(q, si, true), differenceUnit(q, true))
                : q.formatDifference(si);
    }

    /** A tolerance in words: "3 %", "1 K" or "1.8 F", "exact". */
    public static String formatTolerance(ReviewQuantity q, double tolerance, boolean us) {
        if (us && q.kind() == ReviewQuantity.Kind.ABSOLUTE_KELVIN) {
            return ReviewQuantity.significant(CustomaryUnits.kDiffToF(tolerance), 3) + " \u00b0F";
        }
        return q.formatTolerance(tolerance);
    }
}
