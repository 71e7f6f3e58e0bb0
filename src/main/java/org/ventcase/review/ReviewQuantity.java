package org.ventcase.review;

import java.util.Locale;
import java.util.Optional;

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

    /**
     * The largest claimed value taken, SI (common practice, no source): well above any relief case
     * (a fire on the largest storage sphere is tens of MW), so that a value beyond it is a typing
     * error in the claimed file, refused with the limit, not compared.
     */
    public double plausibleMaximum() {
        return switch (this) {
            case RELIEVING_PRESSURE -> 1e9;
            case RELIEVING_TEMPERATURE -> 2000;
            case MOLAR_MASS -> 1000;
            case Z -> 5;
            case K -> 3;
            case LATENT_HEAT -> 1e7;
            case LIQUID_DENSITY -> 5000;
            case VAPOUR_DENSITY -> 2000;
            case HEAT_INPUT -> 1e9;
            case WETTED_AREA -> 1e5;
            case RELIEF_LOAD -> 1e4;
            case REQUIRED_AREA -> 10;
            case ORIFICE -> Double.POSITIVE_INFINITY;
        };
    }

    /** The display unit of the console table, the JSON's {@code display} block and the PDF (SI). */
    public String displayUnit() {
        return switch (this) {
            case RELIEVING_PRESSURE -> "bar abs";
            case RELIEVING_TEMPERATURE -> "C";
            case MOLAR_MASS -> "kg/kmol";
            case Z, K, ORIFICE -> "";
            case LATENT_HEAT -> "kJ/kg";
            case LIQUID_DENSITY, VAPOUR_DENSITY -> "kg/m3";
            case HEAT_INPUT -> "kW";
            case WETTED_AREA -> "m2";
            case RELIEF_LOAD -> "kg/h";
            case REQUIRED_AREA -> "mm2";
        };
    }

    /**
     * An SI value (Pa abs, K, kg/kmol, J/kg, kg/m3, W, m2, kg/s) in the SI display unit. The review
     * writes its hints in SI, as every calculation writes its warnings; US customary display is the
     * edge's ({@code report.ReviewDisplay}).
     */
    public double toDisplay(double si) {
        return switch (this) {
            case RELIEVING_PRESSURE -> si / 1e5;
            case RELIEVING_TEMPERATURE -> si - 273.15;
            case LATENT_HEAT, HEAT_INPUT -> si / 1e3;
            case RELIEF_LOAD -> si * 3600;
            case REQUIRED_AREA -> si * 1e6;
            default -> si;
        };
    }

    /** A difference of SI values in the display unit (temperature differences in K). */
    public double differenceToDisplay(double si) {
        return this == RELIEVING_TEMPERATURE ? si : toDisplay(si);
    }

    /** The unit of a difference: K for temperatures, else the display unit. */
    public String differenceUnit() {
        return this == RELIEVING_TEMPERATURE ? "K" : displayUnit();
    }

    /** An SI value formatted in the display unit with 4 significant digits (3 decimals for Z and k). */
    public String format(double si) {
        return formatNumber(toDisplay(si), displayUnit());
    }

    /** A number already in a display unit, formatted as {@link #format(double)} does, with the unit. */
    public String formatNumber(double d, String unit) {
        String num = switch (this) {
            case Z, K -> String.format(Locale.US, "%.3f", d);
            case RELIEVING_TEMPERATURE -> String.format(Locale.US, "%.1f", d);
            case MOLAR_MASS -> String.format(Locale.US, "%.2f", d);
            default -> significant(d, 4);
        };
        return unit.isEmpty() ? num : num + " " + unit;
    }

    /**
     * A difference of SI values in the display unit with its sign, 3 significant digits in plain
     * notation (Z and k: 3 decimals; temperatures: 0.1 K), e.g. "+1250 kW", "-1.02 bar abs".
     */
    public String formatDifference(double si) {
        return formatDifferenceNumber(differenceToDisplay(si), differenceUnit());
    }

    /** A difference already in a display unit, formatted as {@link #formatDifference(double)} does. */
    public String formatDifferenceNumber(double d, String unit) {
        String sign = d < 0 ? "-" : "+";
        String num = switch (this) {
            case Z, K -> String.format(Locale.US, "%.3f", Math.abs(d));
            case RELIEVING_TEMPERATURE -> String.format(Locale.US, "%.1f", Math.abs(d));
            default -> significant(Math.abs(d), 3);
        };
        return sign + num + (unit.isEmpty() ? "" : " " + unit);
    }

    /** A tolerance in words: "3 %", "1 K", "exact". */
    public String formatTolerance(double tolerance) {
        return switch (kind) {
            case RELATIVE -> significant(tolerance * 100, 3) + " %";
            case ABSOLUTE_KELVIN -> significant(tolerance, 3) + " K";
            case EXACT -> "exact";
        };
    }

    /** v with the given number of significant digits in plain notation. */
    public static String significant(double v, int digits) {
        if (v == 0) {
            return "0";
        }
        if (!Double.isFinite(v) || Math.abs(v) >= 1e15 || Math.abs(v) < 1e-12) {
            return String.format(Locale.US, "%." + Math.max(1, digits) + "g", v);
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
