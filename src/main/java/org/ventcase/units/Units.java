package org.ventcase.units;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.ventcase.common.InvalidInputException;
import org.ventcase.common.PhysicalConstants;

/**
 * Parsing of quantities typed by a person ("17.2 barg", "45 C", "3.2 m") into SI, and the
 * reverse for printing. Used only at the edges (command line, case file, wizard): everything
 * inside Ventcase is SI with absolute pressure.
 *
 * <p>Pressures must say gauge or absolute: {@code barg}/{@code bara}, {@code psig}/{@code psia},
 * {@code kPag}/{@code kPaa}, {@code MPag}/{@code MPaa}, {@code Pag}/{@code Paa}, also written
 * {@code bar(g)}, {@code bar g}, {@code bar abs} or {@code bar gauge}; {@code atm} is absolute by
 * nature. A bare {@code bar} or {@code kPa} is refused because the two readings differ by about
 * one atmosphere, an error that no reviewer can see on a sheet.
 *
 * <p>Conversion factors are exact by definition (NIST SP 811, 2008 edition, Appendix B) except
 * where noted.
 */
public final class Units {

    /** One unit: its factor to SI (and offset, for temperatures). */
    private record Unit(Dimension dim, double factor, double offset) {
    }

    private static final Map<String, Unit> UNITS = new LinkedHashMap<>();
    /** Each unit's names as written in messages and help (the keys are lower case: input ignores case). */
    private static final Map<String, String> SPELLING = new LinkedHashMap<>();
    private static final Map<String, Double> PRESSURE_BASES = new LinkedHashMap<>();

    private static final double INCH = 0.0254;
    private static final double FOOT = 0.3048;
    private static final double POUND = 0.45359237;
    private static final double US_GALLON = 3.785411784e-3;
    /** International Table Btu, J (NIST SP 811, B.8). */
    private static final double BTU = 1055.05585262;
    private static final double PSI = 6894.757293168361;

    static {
        PRESSURE_BASES.put("pa", 1.0);
        PRESSURE_BASES.put("kpa", 1e3);
        PRESSURE_BASES.put("mpa", 1e6);
        PRESSURE_BASES.put("bar", 1e5);
        PRESSURE_BASES.put("mbar", 1e2);
        PRESSURE_BASES.put("psi", PSI);

        put(Dimension.TEMPERATURE, 1, 0, "K", "kelvin");
        put(Dimension.TEMPERATURE, 1, PhysicalConstants.ZERO_CELSIUS_K, "C", "degC", "°C", "celsius");
        put(Dimension.TEMPERATURE, 5.0 / 9.0, 459.67 * 5.0 / 9.0, "F", "degF", "°F", "fahrenheit");
        put(Dimension.TEMPERATURE, 5.0 / 9.0, 0, "R", "degR", "°R", "rankine");

        put(Dimension.PRESSURE_DIFFERENCE, 1, 0, "Pa");
        put(Dimension.PRESSURE_DIFFERENCE, 1e3, 0, "kPa");
        put(Dimension.PRESSURE_DIFFERENCE, 1e6, 0, "MPa");
        put(Dimension.PRESSURE_DIFFERENCE, 1e5, 0, "bar");
        put(Dimension.PRESSURE_DIFFERENCE, 1e2, 0, "mbar");
        put(Dimension.PRESSURE_DIFFERENCE, PSI, 0, "psi");

        put(Dimension.LENGTH, 1, 0, "m");
        put(Dimension.LENGTH, 1e-3, 0, "mm");
        put(Dimension.LENGTH, 1e-2, 0, "cm");
        put(Dimension.LENGTH, FOOT, 0, "ft");
        put(Dimension.LENGTH, INCH, 0, "in");

        put(Dimension.AREA, 1, 0, "m2", "m^2", "m²");
        put(Dimension.AREA, 1e-6, 0, "mm2", "mm^2", "mm²");
        put(Dimension.AREA, 1e-4, 0, "cm2", "cm^2", "cm²");
        put(Dimension.AREA, FOOT * FOOT, 0, "ft2", "ft^2", "ft²");
        put(Dimension.AREA, INCH * INCH, 0, "in2", "in^2", "in²");

        put(Dimension.VOLUME, 1, 0, "m3", "m^3", "m³");
        put(Dimension.VOLUME, 1e-3, 0, "L", "litre", "liter");
        put(Dimension.VOLUME, FOOT * FOOT * FOOT, 0, "ft3", "ft^3", "ft³");
        put(Dimension.VOLUME, US_GALLON, 0, "gal", "usgal");
        put(Dimension.VOLUME, 42 * US_GALLON, 0, "bbl");

        put(Dimension.MASS, 1, 0, "kg");
        put(Dimension.MASS, 1e-3, 0, "g");
        put(Dimension.MASS, 1e3, 0, "t", "tonne");
        put(Dimension.MASS, POUND, 0, "lb", "lbm");

        put(Dimension.MASS_FLOW, 1, 0, "kg/s");
        put(Dimension.MASS_FLOW, 1.0 / 3600, 0, "kg/h", "kg/hr");
        put(Dimension.MASS_FLOW, 1000.0 / 3600, 0, "t/h", "t/hr");
        put(Dimension.MASS_FLOW, POUND / 3600, 0, "lb/h", "lb/hr");
        put(Dimension.MASS_FLOW, POUND, 0, "lb/s");

        put(Dimension.VOLUME_FLOW, 1, 0, "m3/s");
        put(Dimension.VOLUME_FLOW, 1.0 / 3600, 0, "m3/h", "m3/hr");
        put(Dimension.VOLUME_FLOW, 1e-3 / 60, 0, "L/min");
        put(Dimension.VOLUME_FLOW, US_GALLON / 60, 0, "gpm", "gal/min", "usgpm");

        put(Dimension.POWER, 1, 0, "W");
        put(Dimension.POWER, 1e3, 0, "kW");
        put(Dimension.POWER, 1e6, 0, "MW");
        put(Dimension.POWER, BTU / 3600, 0, "Btu/h", "Btu/hr");

        put(Dimension.DENSITY, 1, 0, "kg/m3", "kg/m^3", "kg/m³");
        put(Dimension.DENSITY, POUND / (FOOT * FOOT * FOOT), 0, "lb/ft3", "lb/ft^3");

        put(Dimension.SPECIFIC_ENERGY, 1, 0, "J/kg");
        put(Dimension.SPECIFIC_ENERGY, 1e3, 0, "kJ/kg");
        put(Dimension.SPECIFIC_ENERGY, BTU / POUND, 0, "Btu/lb");

        put(Dimension.VISCOSITY, 1, 0, "Pa.s", "Pa s", "Pas");
        put(Dimension.VISCOSITY, 1e-3, 0, "mPa.s", "mPa s", "cP");

        put(Dimension.THERMAL_CONDUCTIVITY, 1, 0, "W/mK", "W/(m K)", "W/m/K", "W/(m.K)");
        put(Dimension.THERMAL_CONDUCTIVITY, BTU / 3600 / (FOOT * 5.0 / 9.0), 0, "Btu/h/ft/F", "Btu/(h ft F)");

        put(Dimension.HEAT_TRANSFER_COEFFICIENT, 1, 0, "W/m2K", "W/(m2 K)", "W/m2/K", "W/(m2.K)");
        put(Dimension.HEAT_TRANSFER_COEFFICIENT, BTU / 3600 / (FOOT * FOOT * 5.0 / 9.0), 0,
                "Btu/h/ft2/F", "Btu/(h ft2 F)");

        put(Dimension.MOLAR_MASS, 1, 0, "kg/kmol", "g/mol");

        put(Dimension.ANGLE, 1, 0, "deg", "°");

        put(Dimension.TIME, 1, 0, "s", "sec");
        put(Dimension.TIME, 60, 0, "min");
        put(Dimension.TIME, 3600, 0, "h", "hr");
    }

    private static void put(Dimension d, double factor, double offset, String... names) {
        for (String n : names) {
            String k = key(d, n.toLowerCase(Locale.ROOT));
            UNITS.put(k, new Unit(d, factor, offset));
            SPELLING.put(k, n);
        }
    }

    private static String key(Dimension d, String n) {
        return d.name() + "|" + n;
    }

    private static final Pattern QUANTITY = Pattern.compile(
            "^\\s*([-+]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*$");

    private Units() {
    }

    /** The unit names accepted for a dimension, for messages and help. */
    public static List<String> acceptedUnits(Dimension d) {
        if (d == Dimension.PRESSURE) {
            List<String> out = new ArrayList<>();
            for (String b : List.of("Pa", "kPa", "MPa", "bar", "mbar", "psi")) {
                out.add(b + "a");
                out.add(b + "g");
            }
            out.add("atm");
            return out;
        }
        List<String> out = new ArrayList<>();
        String prefix = d.name() + "|";
        for (Map.Entry<String, String> e : SPELLING.entrySet()) {
            if (e.getKey().startsWith(prefix)) {
                out.add(e.getValue());
            }
        }
        return out;
    }

    /**
     * Parses a quantity of any dimension except {@link Dimension#PRESSURE} into SI.
     *
     * @param field the field path or option name, for the message
     * @param text  e.g. "3.2 m"
     */
    public static double parse(String field, String text, Dimension dim) {
        if (dim == Dimension.PRESSURE) {
            throw new IllegalArgumentException("use parsePressure for absolute/gauge pressures");
        }
        Parsed p = split(field, text, dim);
        Unit u = UNITS.get(key(dim, normalise(p.unit)));
        if (u == null) {
            throw InvalidInputException.invalid(field, text,
                    "expected a " + dim.word() + " with one of the units " + String.join(", ", acceptedUnits(dim))
                            + (p.unit.isEmpty() ? " (a bare number is refused: say the unit)" : ""));
        }
        double si = p.value * u.factor + u.offset;
        if (dim == Dimension.TEMPERATURE && !(si > 0)) {
            throw InvalidInputException.invalid(field, text, "expected a temperature above absolute zero");
        }
        return si;
    }

    /** Parses a temperature into kelvin. */
    public static double temperatureK(String field, String text) {
        return parse(field, text, Dimension.TEMPERATURE);
    }

    /**
     * Parses a pressure into Pa absolute. Gauge values are converted with the given atmospheric
     * pressure; a pressure that does not say gauge or absolute is refused.
     *
     * @param atmosphericPa the site's atmospheric pressure, Pa
     */
    public static double parsePressure(String field, String text, double atmosphericPa) {
        Parsed p = split(field, text, Dimension.PRESSURE);
        String u = normalise(p.unit).replace("(a)", "a").replace("(g)", "g").replace(" ", "")
                .replace("abs", "a").replace("gauge", "g");
        if (u.equals("atm") || u.equals("atma")) {
            return checkedAbs(field, text, p.value * PhysicalConstants.ATM_PA);
        }
        if (u.length() > 1) {
            char last = u.charAt(u.length() - 1);
            Double base = PRESSURE_BASES.get(u.substring(0, u.length() - 1));
            if (base != null && (last == 'a' || last == 'g')) {
                double v = p.value * base;
                return checkedAbs(field, text, last == 'a' ? v : v + atmosphericPa);
            }
        }
        String hint = PRESSURE_BASES.containsKey(u)
                ? "say gauge or absolute, e.g. '" + p.text + " " + p.unit + "g' or '" + p.text + " " + p.unit + "a'"
                : "expected a pressure with one of the units " + String.join(", ", acceptedUnits(Dimension.PRESSURE));
        throw InvalidInputException.invalid(field, text, hint);
    }

    private static double checkedAbs(String field, String text, double pa) {
        if (!(pa > 0)) {
            throw InvalidInputException.invalid(field, text, "expected an absolute pressure above 0 (vacuum limit)");
        }
        return pa;
    }

    private record Parsed(double value, String text, String unit) {
    }

    private static Parsed split(String field, String text, Dimension dim) {
        if (text == null || text.isBlank()) {
            throw InvalidInputException.missing(field, "expected a " + dim.word() + " with its unit, e.g. "
                    + example(dim));
        }
        Matcher m = QUANTITY.matcher(text);
        if (!m.matches()) {
            throw InvalidInputException.invalid(field, text, "expected a number followed by a unit, e.g. "
                    + example(dim));
        }
        double v = Double.parseDouble(m.group(1));
        if (!Double.isFinite(v)) {
            throw InvalidInputException.invalid(field, text, "expected a finite number");
        }
        return new Parsed(v, m.group(1), m.group(2));
    }

    private static final java.util.regex.Pattern SPACES = java.util.regex.Pattern.compile("\\s+");

    private static String normalise(String unit) {
        return SPACES.matcher(unit.trim().toLowerCase(Locale.ROOT)).replaceAll(" ");
    }

    /** An example of a valid input for messages. */
    public static String example(Dimension d) {
        return switch (d) {
            case TEMPERATURE -> "'45 C' or '318.15 K'";
            case PRESSURE -> "'17.2 barg' or '1.8 MPaa'";
            case PRESSURE_DIFFERENCE -> "'0.5 bar'";
            case LENGTH -> "'3.2 m'";
            case AREA -> "'12.5 m2'";
            case VOLUME -> "'25 m3'";
            case MASS -> "'1500 kg'";
            case MASS_FLOW -> "'12000 kg/h'";
            case VOLUME_FLOW -> "'30 m3/h'";
            case POWER -> "'250 kW'";
            case DENSITY -> "'520 kg/m3'";
            case SPECIFIC_ENERGY -> "'350 kJ/kg'";
            case VISCOSITY -> "'1.2 cP'";
            case THERMAL_CONDUCTIVITY -> "'0.05 W/mK'";
            case HEAT_TRANSFER_COEFFICIENT -> "'10 W/m2K'";
            case MOLAR_MASS -> "'44.1 kg/kmol'";
            case ANGLE -> "'30 deg'";
            case TIME -> "'2 h' or '90 min'";
        };
    }

    /** Converts an SI value to the named unit (for printing in the user's units). */
    public static double fromSi(double si, Dimension dim, String unit) {
        if (dim == Dimension.PRESSURE) {
            throw new IllegalArgumentException("use PressureFormat for pressures");
        }
        Unit u = UNITS.get(key(dim, normalise(unit)));
        if (u == null) {
            throw new IllegalArgumentException("unknown " + dim.word() + " unit " + unit);
        }
        return (si - u.offset) / u.factor;
    }

    /** Converts an absolute pressure in Pa to the named base unit (absolute or gauge). */
    public static double pressureFromPa(double pa, String baseUnit, boolean gauge, double atmosphericPa) {
        Double base = PRESSURE_BASES.get(normalise(baseUnit));
        if (base == null) {
            throw new IllegalArgumentException("unknown pressure unit " + baseUnit);
        }
        return (gauge ? pa - atmosphericPa : pa) / base;
    }
}
