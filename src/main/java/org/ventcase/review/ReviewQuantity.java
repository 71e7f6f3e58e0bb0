package org.ventcase.review;

import java.util.Locale;
import java.util.Optional;

import org.ventcase.units.CustomaryUnits;
import org.ventcase.units.Dimension;

/**
 * A quantity a relief basis states and a reviewer checks, with its default tolerance and the reason
 * for it. Tolerances are relative (a fraction of Ventcase's value) except the relieving temperature
 * (kelvin) and the orifice (exact).
 */
public enum ReviewQuantity {
    RELIEVING_PRESSURE("relievingPressure", "Relieving pressure P1", Dimension.PRESSURE, Kind.RELATIVE, 0.01,
            "P1 is set pressure plus accumulation plus atmospheric pressure, arithmetic on stated numbers: "
                    + "1 % covers rounding; an atmosphere (about 5 % at 20 bar) is far outside it"),
    RELIEVING_TEMPERATURE("relievingTemperature", "Relieving temperature T1", Dimension.TEMPERATURE,
            Kind.ABSOLUTE_KELVIN, 1.0,
            "saturation or bubble temperature at P1: cubic equations and correlations fitted to vapour pressure "
                    + "agree within about 1 K away from the critical point"),
    MOLAR_MASS("molarMass", "Molar mass M", Dimension.MOLAR_MASS, Kind.RELATIVE, 0.005,
            "from the composition and tabulated molar masses: 0.5 % covers rounding and the incipient-vapour "
                    + "composition of a mixture"),
    Z("Z", "Compressibility Z", null, Kind.RELATIVE, 0.03,
            "vapour Z from a cubic equation: about 2 to 3 % between equations and generalised charts at "
                    + "reduced temperatures near 0.9"),
    K("k", "k = Cp/Cv (ideal gas, API 520)", null, Kind.RELATIVE, 0.03,
            "ideal-gas Cp/Cv from Cp polynomials: different data sources differ by 1 to 2 %; 3 % leaves room"),
    LATENT_HEAT("latentHeat", "Latent heat L", Dimension.SPECIFIC_ENERGY, Kind.RELATIVE, 0.05,
            "enthalpy of vaporisation from a cubic equation: about 3 to 5 % from measured values at reduced "
                    + "temperatures of 0.8 to 0.9"),
    LIQUID_DENSITY("liquidDensity", "Liquid density at T1, P1", Dimension.DENSITY, Kind.RELATIVE, 0.08,
            "cubic-equation liquid densities are several percent off even with a volume translation (the PR "
                    + "shift is about 5 % low for propane near 50 C): 8 %"),
    VAPOUR_DENSITY("vaporDensity", "Vapour density at T1, P1", Dimension.DENSITY, Kind.RELATIVE, 0.05,
            "follows Z: 5 % allows for Z and for the relieving temperature"),
    HEAT_INPUT("heatInput", "Fire heat input Q", Dimension.POWER, Kind.RELATIVE, 0.02,
            "Q = C F A^0.82 on a stated area and factor: 2 % covers rounding of the area and of C"),
    WETTED_AREA("wettedArea", "Fire-exposed wetted area", Dimension.AREA, Kind.RELATIVE, 0.03,
            "geometry of heads and level: 3 % covers approximate head formulas"),
    RELIEF_LOAD("reliefLoad", "Relief load W", Dimension.MASS_FLOW, Kind.RELATIVE, 0.05,
            "W = Q / L: follows Q (2 %) and L (5 %)"),
    REQUIRED_AREA("requiredArea", "Required effective area", Dimension.AREA, Kind.RELATIVE, 0.05,
            "follows W, Z, T, M and k through the API 520 gas equation: 5 %"),
    ORIFICE("orifice", "API 526 orifice", null, Kind.EXACT, 0.0,
            "a designation: the same letter (and count) or not");

    /** How the tolerance is measured. */
    public enum Kind {
        /** |claimed - computed| / computed, a fraction. */
        RELATIVE,
        /** |claimed - computed| in K. */
        ABSOLUTE_KELVIN,
        /** The same text. */
        EXACT
    }

    private final String key;
    private final String label;
    private final Dimension dimension;
    private final Kind kind;
    private final double defaultTolerance;
    private final String reason;

    ReviewQuantity(String key, String label, Dimension dimension, Kind kind, double defaultTolerance, String reason) {
        this.key = key;
        this.label = label;
        this.dimension = dimension;
        this.kind = kind;
        this.defaultTolerance = defaultTolerance;
        this.reason = reason;
    }

    /** The name in claimed-value files, in {@code --tolerance} and in the review JSON. */
    public String key() {
        return key;
    }

    /** Printed name. */
    public String label() {
        return label;
    }

    /** The dimension of a value with a unit; empty for dimensionless numbers (Z, k) and the orifice. */
    public Optional<Dimension> dimension() {
        return Optional.ofNullable(dimension);
    }

    /** How the tolerance is measured. */
    public Kind kind() {
        return kind;
    }

    /** The default tolerance: a fraction (relative), K (temperature) or 0 (exact). */
    public double defaultTolerance() {
        return defaultTolerance;
    }

    /** Why the default tolerance is what it is. */
    public String reason() {
        return reason;
    }

    /** The display unit of the console table, the JSON's {@code display} block and the PDF (SI). */
    public String displayUnit() {
        return displayUnit(false);
    }

    /**
     * The display unit in SI or, with {@code us}, in US customary units (psia, F, lb/lbmol, Btu/lb,
     * lb/ft3, Btu/h, ft2, lb/h, in2).
     */
    public String displayUnit(boolean us) {
        return switch (this) {
            case RELIEVING_PRESSURE -> us ? "psia" : "bar abs";
            case RELIEVING_TEMPERATURE -> us ? "\u00b0F" : "C";
            case MOLAR_MASS -> us ? "lb/lbmol" : "kg/kmol";
            case Z, K, ORIFICE -> "";
            case LATENT_HEAT -> us ? "Btu/lb" : "kJ/kg";
            case LIQUID_DENSITY, VAPOUR_DENSITY -> us ? "lb/ft3" : "kg/m3";
            case HEAT_INPUT -> us ? "Btu/h" : "kW";
            case WETTED_AREA -> us ? "ft2" : "m2";
            case RELIEF_LOAD -> us ? "lb/h" : "kg/h";
            case REQUIRED_AREA -> us ? "in2" : "mm2";
        };
    }

    /** An SI value (Pa abs, K, kg/kmol, J/kg, kg/m3, W, m2, kg/s) in the SI display unit. */
    public double toDisplay(double si) {
        return toDisplay(si, false);
    }

    /**
     * An SI value in the display unit of the system. US factors: CustomaryUnits (exact, NIST SP
     * 811).
     */
    public double toDisplay(double si, boolean us) {
        if (!us) {
            return switch (this) {
                case RELIEVING_PRESSURE -> si / 1e5;
                case RELIEVING_TEMPERATURE -> si - 273.15;
                case LATENT_HEAT, HEAT_INPUT -> si / 1e3;
                case RELIEF_LOAD -> si * 3600;
                case REQUIRED_AREA -> si * 1e6;
                default -> si;
            };
        }
        return switch (this) {
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

    /** A difference of SI values in the display unit (temperature differences in K). */
    public double differenceToDisplay(double si) {
        return differenceToDisplay(si, false);
    }

    /** A difference of SI values in the system's display unit (temperature differences in K or F). */
    public double differenceToDisplay(double si, boolean us) {
        if (this == RELIEVING_TEMPERATURE) {
            return us ? CustomaryUnits.kDiffToF(si) : si;
        }
        if (us) {
            // every other US display unit is a pure factor of the SI one (no offset)
            return toDisplay(si, true);
        }
        return toDisplay(si);
    }

    /** The unit of a difference: K for temperatures, else the display unit. */
    public String differenceUnit() {
        return differenceUnit(false);
    }

    /** The unit of a difference in the system: K or F for temperatures, else the display unit. */
    public String differenceUnit(boolean us) {
        return this == RELIEVING_TEMPERATURE ? (us ? "\u00b0F" : "K") : displayUnit(us);
    }

    /** An SI value formatted in the display unit with 4 significant digits (3 decimals for Z and k). */
    public String format(double si) {
        return format(si, false);
    }

    /** As {@link #format(double)} in SI or US customary display units. */
    public String format(double si, boolean us) {
        double d = toDisplay(si, us);
        String u = displayUnit(us);
        String num = switch (this) {
            case Z, K -> String.format(Locale.US, "%.3f", d);
            case RELIEVING_TEMPERATURE -> String.format(Locale.US, "%.1f", d);
            case MOLAR_MASS -> String.format(Locale.US, "%.2f", d);
            default -> significant(d, 4);
        };
        return u.isEmpty() ? num : num + " " + u;
    }

    /**
     * A difference of SI values in the display unit with its sign, 3 significant digits in plain
     * notation (Z and k: 3 decimals; temperatures: 0.1 K), e.g. "+1250 kW", "-1.02 bar abs".
     */
    public String formatDifference(double si) {
        return formatDifference(si, false);
    }

    /** As {@link #formatDifference(double)} in SI or US customary display units. */
    public String formatDifference(double si, boolean us) {
        double d = differenceToDisplay(si, us);
        String sign = d < 0 ? "-" : "+";
        String num = switch (this) {
            case Z, K -> String.format(Locale.US, "%.3f", Math.abs(d));
            case RELIEVING_TEMPERATURE -> String.format(Locale.US, "%.1f", Math.abs(d));
            default -> significant(Math.abs(d), 3);
        };
        String u = differenceUnit(us);
        return sign + num + (u.isEmpty() ? "" : " " + u);
    }

    /** A tolerance in words: "3 %", "1 K", "exact". */
    public String formatTolerance(double tolerance) {
        return formatTolerance(tolerance, false);
    }

    /** A tolerance in words in the system: "3 %", "1 K" or "1.8 F", "exact". */
    public String formatTolerance(double tolerance, boolean us) {
        return switch (kind) {
            case RELATIVE -> significant(tolerance * 100, 3) + " %";
            case ABSOLUTE_KELVIN -> us ? significant(CustomaryUnits.kDiffToF(tolerance), 3) + " \u00b0F"
                    : significant(tolerance, 3) + " K";
            case EXACT -> "exact";
        };
    }

    static String significant(double v, int digits) {
        if (v == 0) {
            return "0";
        }
        int mag = (int) Math.floor(Math.log10(Math.abs(v)));
        int decimals = Math.max(0, digits - 1 - mag);
        return String.format(Locale.US, "%." + decimals + "f", v);
    }

    /** The quantity with this key (case-insensitive; "vapourDensity" is accepted for "vaporDensity"). */
    public static Optional<ReviewQuantity> byKey(String key) {
        if (key == null) {
            return Optional.empty();
        }
        String k = key.strip();
        if (k.equalsIgnoreCase("vapourDensity")) {
            return Optional.of(VAPOUR_DENSITY);
        }
        for (ReviewQuantity q : values()) {
            if (q.key.equalsIgnoreCase(k)) {
                return Optional.of(q);
            }
        }
        return Optional.empty();
    }

    /** All keys, in table order, for messages. */
    public static String keys() {
        StringBuilder sb = new StringBuilder();
        for (ReviewQuantity q : values()) {
            sb.append(sb.length() == 0 ? "" : ", ").append(q.key);
        }
        return sb.toString();
    }
}
