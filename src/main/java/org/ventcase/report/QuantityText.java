package org.ventcase.report;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.ventcase.common.PhysicalConstants;
import org.ventcase.report.DisplayUnits.Kind;
import org.ventcase.units.CustomaryUnits;

/**
 * US customary equivalents for the SI quantities written inside free text: the warnings and the
 * method steps, which the calculation writes as sentences and substituted equations in SI. A
 * quantity is a number followed by one of the SI units the calculation writes ("1916.33 kPa abs",
 * "298.15 K (25.00 C)", "6751.8 kg/h"); anything else (percentages, ratios, Tr, Z) is left as it
 * is. Two forms:
 * <ul>
 * <li>{@link #usFirst}: the US value first and the SI text in brackets, for warnings on a sheet or
 * screen in US units;</li>
 * <li>{@link #usBracketed}: the SI text kept first and the US value bracketed after it, for the
 * method steps, whose equations are written for SI values (the sheet says so).</li>
 * </ul>
 * A temperature written as a difference ("within 0.5 K of") converts by 1.8 to a difference in
 * degrees Fahrenheit. Factors from {@link CustomaryUnits} (exact, NIST SP 811). Text already
 * carrying a bracket right after a quantity ("... kPa abs [277.94 psia]") is left alone.
 */
public final class QuantityText {

    private static final String NUMBER = "(-?\\d+(?:\\.\\d+)?(?:[eE][-+]?\\d+)?)";
    // Longest units first, so that "kPa abs" wins over "kPa" and "kg/m3" over "kg".
    private static final Pattern QUANTITY = Pattern.compile("(?<![\\w.-])" + NUMBER + "(?:-(\\d+(?:\\.\\d+)?))?"
            + "[ \u00A0](K \\((-?\\d+(?:\\.\\d+)?) C\\)|kPa abs|kPa gauge|kPa|Pa abs|Pa gauge|Pa|bar abs|bar gauge|barg|bara|bar|K|C|kg/kmol|kmol"
            + "|kg/m3|kg/h|kg/s|kg|kJ/kg|kW|mm2|m3/kmol|m3/h|m3/s|m3|m2|mol|m|L/min)(?![\\w/\\[])(?! \\[)");

    private QuantityText() {
    }

    /** The text with each SI quantity written in US customary units, the SI text bracketed after it. */
    public static String usFirst(String text) {
        return rewrite(text, true);
    }

    /** The text with each SI quantity kept, its US customary value bracketed after it. */
    public static String usBracketed(String text) {
        return rewrite(text, false);
    }

    private static String rewrite(String text, boolean usFirst) {
        if (text == null || text.isEmpty()) {
            return text;
        }
        Matcher m = QUANTITY.matcher(text);
        StringBuilder out = new StringBuilder(text.length() + 32);
        while (m.find()) {
            double v;
            try {
                v = Double.parseDouble(m.group(1));
            } catch (NumberFormatException e) {
                continue;
            }
            String unit = m.group(3);
            String us;
            if (m.group(2) != null) {
                // a range "lo-hi unit": both ends converted, the unit once
                String lo = us(v, unit, false);
                String hi = us(Double.parseDouble(m.group(2)), unit, false);
                us = lo.substring(0, lo.indexOf(' ')) + " to " + hi;
            } else {
                us = us(v, unit, difference(text, m.start()));
            }
            String si = m.group();
            m.appendReplacement(out, Matcher.quoteReplacement(usFirst ? us + " [" + si + "]" : si + " [" + us + "]"));
        }
        m.appendTail(out);
        return out.toString();
    }

    /** A temperature after "within" or "by" is a difference, not a temperature. */
    private static boolean difference(String text, int start) {
        String before = text.substring(Math.max(0, start - 7), start).toLowerCase(Locale.ROOT);
        return before.endsWith("within ") || before.endsWith("by ");
    }

    // The factors are DisplayUnits' (one place): each SI text unit is read as its SI value first.
    private static String us(double v, String unit, boolean difference) {
        if (unit.startsWith("K (")) {
            unit = "K";
        }
        switch (unit) {
            case "kPa abs":
                return f(usValue(Kind.PRESSURE_ABS, v * 1e3), 2) + " psia";
            case "kPa gauge":
                return f(usValue(Kind.PRESSURE_GAUGE, v * 1e3), 2) + " psig";
            case "kPa":
                return f(usValue(Kind.PRESSURE_DIFFERENCE, v * 1e3), 2) + " psi";
            case "bar abs":
            case "bara":
                return f(usValue(Kind.PRESSURE_ABS, v * 1e5), 2) + " psia";
            case "bar gauge":
            case "barg":
                return f(usValue(Kind.PRESSURE_GAUGE, v * 1e5), 2) + " psig";
            case "bar":
                return f(usValue(Kind.PRESSURE_DIFFERENCE, v * 1e5), 2) + " psi";
            case "Pa abs":
                return g(usValue(Kind.PRESSURE_ABS, v)) + " psia";
            case "Pa gauge":
                return g(usValue(Kind.PRESSURE_GAUGE, v)) + " psig";
            case "Pa":
                return g(usValue(Kind.PRESSURE_DIFFERENCE, v)) + " psi";
            case "K":
                return difference ? g(CustomaryUnits.kDiffToF(v)) + " °F" : f(usValue(Kind.TEMPERATURE, v), 2) + " °F";
            case "C":
                return f(usValue(Kind.TEMPERATURE, v + PhysicalConstants.ZERO_CELSIUS_K), 2) + " °F";
            case "kg/kmol":
                return g(usValue(Kind.MOLAR_MASS, v)) + " lb/lbmol";
            case "kmol":
                return g(usValue(Kind.AMOUNT, v * 1e3)) + " lbmol";
            case "mol":
                return g(usValue(Kind.AMOUNT, v)) + " lbmol";
            case "kg/m3":
                return g(usValue(Kind.DENSITY, v)) + " lb/ft3";
            case "kg/h":
                return g(usValue(Kind.MASS_FLOW, v / 3600)) + " lb/h";
            case "kg/s":
                return g(usValue(Kind.MASS_FLOW, v) / 3600) + " lb/s";
            case "kg":
                return g(usValue(Kind.MASS, v)) + " lb";
            case "kJ/kg":
                return g(usValue(Kind.SPECIFIC_ENERGY, v * 1e3)) + " Btu/lb";
            case "kW":
                return g(usValue(Kind.POWER, v * 1e3)) + " Btu/h";
            case "mm2":
                return g(usValue(Kind.ORIFICE_AREA, v * 1e-6)) + " in2";
            case "m3/kmol":
                return g(CustomaryUnits.m3PerMolToFt3PerLbmol(v / 1e3)) + " ft3/lbmol";
            case "m3/h":
                return g(usValue(Kind.VOLUME, v)) + " ft3/h";
            case "m3/s":
                return g(v / CustomaryUnits.M3_PER_US_GAL * 60) + " US gal/min";
            case "m3":
                return g(usValue(Kind.VOLUME, v)) + " ft3";
            case "m2":
                return g(usValue(Kind.AREA, v)) + " ft2";
            case "m":
                return g(usValue(Kind.LENGTH, v)) + " ft";
            case "L/min":
                return g(v * 1e-3 / CustomaryUnits.M3_PER_US_GAL) + " US gal/min";
            default:
                throw new IllegalStateException(unit);
        }
    }

    private static double usValue(Kind k, double si) {
        return DisplayUnits.convert(k, si, UnitSystem.US);
    }

    private static String f(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    /** Five significant digits, without an exponent in the usual range. */
    private static String g(double v) {
        double a = Math.abs(v);
        if (a != 0 && (a < 1e-3 || a >= 1e7)) {
            return String.format(Locale.ROOT, "%.5g", v);
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(5)).stripTrailingZeros().toPlainString();
    }
}
