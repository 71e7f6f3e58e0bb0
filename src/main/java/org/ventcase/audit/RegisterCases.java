package org.ventcase.audit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.ventcase.calc.CaseInput;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.VentcaseException;
import org.ventcase.device.OrificeTable;
import org.ventcase.inventory.Fluid;
import org.ventcase.inventory.Storage;
import org.ventcase.relief.RelievingPressureInput;
import org.ventcase.thermo.Composition;
import org.ventcase.thermo.Compositions;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.units.Dimension;
import org.ventcase.units.Units;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Specs;
import org.ventcase.vessel.Vessel;

/**
 * Turns register rows into screening cases ({@link ScreeningCase}). Every problem with a row
 * becomes an {@link AuditError} naming the register column; nothing is guessed. Fluids are built
 * once per distinct (fluid, vapour, EOS) and shared between rows (a {@link Fluid} is immutable).
 */
public final class RegisterCases {

    /** Default equation of state when the register has no eos column or the cell is blank. */
    public static final EosVariant DEFAULT_EOS = EosVariant.DEFAULT;

    /**
     * Relative difference between a saturated row's stated pressure and the computed bubble pressure
     * above which the row gets a warning (common practice for a screening check, no source).
     */
    public static final double STATED_PRESSURE_TOLERANCE = 0.10;

    private static final Pattern ORIFICE = Pattern.compile("^\\s*(?:(\\d+)\\s*[x×*]\\s*)?([A-Za-z])\\s*$");

    private final Map<String, Fluid> fluids = new ConcurrentHashMap<>();
    private final String origin;

    /** @param origin the register's file name, carried into every item */
    public RegisterCases(String origin) {
        this.origin = origin == null ? "" : origin;
    }

    /**
     * Every row of a register, in order. Rows are read in parallel (common fork-join pool); the list
     * is in row order and each item depends only on its row, so the result does not depend on the
     * scheduling.
     */
    public static List<AuditItem> items(Register register) {
        RegisterCases rc = new RegisterCases(register.origin());
        List<RegisterRow> rows = register.rows();
        return java.util.stream.IntStream.range(0, rows.size()).parallel().mapToObj(i -> rc.item(rows.get(i)))
                .toList();
    }

    /** Checks a header unit by parsing "1 UNIT" for the column's dimension. */
    static void checkHeaderUnit(String where, RegisterColumn c, String unit) {
        try {
            switch (c) {
                case LEVEL -> Specs.level(c.header(), "50 " + unit);
                case PRESSURE, SET_PRESSURE, MAWP -> Units.parsePressure(c.header(), "1 " + unit,
                        ScreeningCase.ATMOSPHERIC_PA);
                case TEMPERATURE -> Units.parse(c.header(), "300 " + unit, Dimension.TEMPERATURE);
                default -> Units.parse(c.header(), "1 " + unit, Dimension.LENGTH);
            }
        } catch (InvalidInputException e) {
            throw InvalidInputException.invalid(where, "[" + unit + "]", "not a unit for column '" + c.header()
                    + "': " + e.accepted());
        }
    }

    /** One row as an audit item: its case, or the first problem found in it. */
    public AuditItem item(RegisterRow row) {
        String tag = row.get(RegisterColumn.TAG);
        String area = row.get(RegisterColumn.AREA);
        String fluid = row.get(RegisterColumn.FLUID);
        for (RegisterColumn c : RegisterColumn.values()) {
            String v = row.get(c);
            if (v.length() > c.maxLength()) {
                // a refused row still lists its tag, area and fluid: never carry an overlong cell on
                return AuditItem.failed(row.line(), origin, shortened(tag, RegisterColumn.TAG),
                        shortened(area, RegisterColumn.AREA), shortened(fluid, RegisterColumn.FLUID),
                        new AuditError(c.header(), shortened(v, c), "expected at most " + c.maxLength()
                                + " characters"));
            }
        }
        if (row.firstMissing().isPresent()) {
            RegisterColumn c = row.firstMissing().get();
            return AuditItem.failed(row.line(), origin, tag, area, fluid, new AuditError(c.header(), "",
                    String.format(Locale.ROOT, "missing: the row has %d fields, the header %d (a comma too few?)",
                            row.fieldCount(), row.headerCount())));
        }
        if (row.fieldCount() > row.headerCount()) {
            return AuditItem.failed(row.line(), origin, tag, area, fluid, new AuditError("(row)", "",
                    String.format(Locale.ROOT, "the row has %d fields, the header %d (an unquoted comma in a "
                            + "cell?)", row.fieldCount(), row.headerCount())));
        }
        try {
            return build(row, tag, area, fluid);
        } catch (InvalidInputException e) {
            return AuditItem.failed(row.line(), origin, tag, area, fluid,
                    new AuditError(e.field(), e.value(), e.accepted()));
        } catch (VentcaseException e) {
            return AuditItem.failed(row.line(), origin, tag, area, fluid,
                    new AuditError("calculation", "", e.getMessage()));
        }
    }

    /** A cell longer than its column takes, cut to its first 40 characters and its length. */
    static String shortened(String v, RegisterColumn c) {
        if (v.length() <= c.maxLength()) {
            return v;
        }
        int end = Character.isHighSurrogate(v.charAt(39)) ? 39 : 40;
        return v.substring(0, end) + "... (" + v.length() + " characters)";
    }

    /**
     * Highest set pressure or MAWP taken, gauge (common practice, no source): well above any pressure
     * vessel a relief valve protects, and low enough that the relieving pressure stays inside the
     * property models' range (1 GPa).
     */
    static final double MAX_GAUGE_PA = 400e6;
    private static final String MAX_GAUGE_TEXT = "4000 barg (400 MPa gauge)";

    /**
     * A parsed quantity checked against the range the calculation takes, reported against its register
     * column with the cell as written (not the derived SI value of the domain's own check).
     */
    private static double inRange(RegisterRow row, RegisterColumn c, double v, double lo, double hi, String range) {
        if (!(v >= lo && v <= hi)) {
            throw InvalidInputException.invalid(c.header(), row.get(c), "expected " + range);
        }
        return v;
    }

    private static String required(RegisterRow row, RegisterColumn c, String accepted) {
        String v = row.get(c);
        if (v.isBlank()) {
            throw InvalidInputException.missing(c.header(), accepted);
        }
        return v;
    }

    private static final Pattern BARE_NUMBER = Pattern.compile("^[-+]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][-+]?\\d+)?$");

    /**
     * The cell of a quantity column; a number that has no unit in the cell nor in the header is refused
     * (the header unit was already added to bare numbers by {@link Register}).
     */
    static String quantity(RegisterRow row, RegisterColumn c) {
        String v = row.get(c);
        if (BARE_NUMBER.matcher(v.strip()).matches()) {
            throw InvalidInputException.invalid(c.header(), v, "a bare number is refused: give the unit in the cell "
                    + "('" + v.strip() + " " + example(c) + "') or in the header ('" + c.header() + " [" + example(c)
                    + "]')");
        }
        return v;
    }

    private static String example(RegisterColumn c) {
        return switch (c) {
            case PRESSURE, SET_PRESSURE, MAWP -> "barg";
            case TEMPERATURE -> "C";
            case LEVEL -> "%v";
            default -> "m";
        };
    }

    private static double length(RegisterRow row, RegisterColumn c) {
        required(row, c, "expected a length with its unit, e.g. '3.2 m'");
        return Units.parse(c.header(), quantity(row, c), Dimension.LENGTH);
    }

    private AuditItem build(RegisterRow row, String tag, String area, String fluidText) {
        required(row, RegisterColumn.TAG, "expected the vessel's tag");
        required(row, RegisterColumn.AREA, "expected the area or unit the vessel belongs to");
        required(row, RegisterColumn.FLUID, "expected a fluid name ('propane') or mole fractions "
                + "('propane:0.95,n-butane:0.05')");
        List<String> notes = new ArrayList<>();
        String eosText = row.get(RegisterColumn.EOS);
        EosVariant eos = eosText.isBlank() ? DEFAULT_EOS : EosVariant.parse(RegisterColumn.EOS.header(), eosText);
        String mode = required(row, RegisterColumn.MODE, "expected saturated, specified or gas-filled")
                .strip().toLowerCase(Locale.ROOT);
        String vapourText = row.get(RegisterColumn.VAPOUR);
        Fluid fluid = fluid(fluidText, mode.equals("specified") ? vapourText : "", eos);
        if (!vapourText.isBlank() && !mode.equals("specified")) {
            throw InvalidInputException.invalid(RegisterColumn.VAPOUR.header(), vapourText,
                    "a vapour-space composition is taken only with mode 'specified' (e.g. a nitrogen blanket); "
                            + "leave it blank for " + mode + " storage");
        }
        Vessel vessel = vessel(row);
        double elevation = inRange(row, RegisterColumn.ELEVATION, length(row, RegisterColumn.ELEVATION),
                Vessel.PLAUSIBLE_ELEVATION_M[0], Vessel.PLAUSIBLE_ELEVATION_M[1],
                String.format(Locale.ROOT, "an elevation from %.0f m to %.0f m above grade",
                        Vessel.PLAUSIBLE_ELEVATION_M[0], Vessel.PLAUSIBLE_ELEVATION_M[1]));
        FireExposure exposure;
        try {
            exposure = FireExposure.atElevation(elevation);
        } catch (InvalidInputException e) {
            throw e.withField(RegisterColumn.ELEVATION.header());
        }
        required(row, RegisterColumn.TEMPERATURE, "expected the storage temperature with its unit, e.g. '38 C'");
        double t = inRange(row, RegisterColumn.TEMPERATURE, Units.temperatureK(RegisterColumn.TEMPERATURE.header(),
                quantity(row, RegisterColumn.TEMPERATURE)), Storage.MIN_T_K, Storage.MAX_T_K,
                String.format(Locale.ROOT, "a temperature from %.2f C to %.2f C (%.0f K to %.0f K)",
                        Storage.MIN_T_K - 273.15, Storage.MAX_T_K - 273.15, Storage.MIN_T_K, Storage.MAX_T_K));
        String pText = quantity(row, RegisterColumn.PRESSURE);
        OptionalDouble p = pText.isBlank() ? OptionalDouble.empty()
                : OptionalDouble.of(inRange(row, RegisterColumn.PRESSURE, Units.parsePressure(
                        RegisterColumn.PRESSURE.header(), pText, ScreeningCase.ATMOSPHERIC_PA), Storage.MIN_P_PA,
                        Storage.MAX_P_PA, "an absolute pressure from 1 Pa to 1000 MPa (up to 9999 barg)"));
        Storage storage;
        Level level;
        switch (mode) {
            case "saturated" -> {
                storage = Storage.Saturated.at(t);
                level = level(row, vessel);
            }
            case "specified" -> {
                if (p.isEmpty()) {
                    throw InvalidInputException.missing(RegisterColumn.PRESSURE.header(),
                            "specified storage needs the storage pressure, gauge or absolute, e.g. '2 barg'");
                }
                Composition vap = vapourText.isBlank() ? fluid.composition()
                        : Compositions.parse(RegisterColumn.VAPOUR.header(), vapourText, false)
                        .over(RegisterColumn.VAPOUR.header(), fluid.components());
                if (vapourText.isBlank()) {
                    notes.add("Specified storage without a vapour composition: the vapour space is taken to hold "
                            + "the liquid's composition.");
                }
                storage = new Storage.Specified(t, p.getAsDouble(), vap);
                level = level(row, vessel);
            }
            case "gas-filled", "gas" -> {
                if (p.isEmpty()) {
                    throw InvalidInputException.missing(RegisterColumn.PRESSURE.header(),
                            "a gas-filled vessel needs the storage pressure, gauge or absolute, e.g. '8 barg'");
                }
                String lv = row.get(RegisterColumn.LEVEL).isBlank() ? "" : quantity(row, RegisterColumn.LEVEL);
                if (!lv.isBlank()) {
                    Level l = Specs.level(RegisterColumn.LEVEL.header(), lv);
                    if (l.value() != 0) {
                        throw InvalidInputException.invalid(RegisterColumn.LEVEL.header(), lv,
                                "a gas-filled vessel holds no liquid: leave the level blank or 0");
                    }
                }
                storage = new Storage.GasFilled(t, p.getAsDouble());
                level = Level.ofHeight(0);
            }
            default -> throw InvalidInputException.invalid(RegisterColumn.MODE.header(), row.get(RegisterColumn.MODE),
                    "expected saturated, specified or gas-filled");
        }
        double set = Units.parsePressure(RegisterColumn.SET_PRESSURE.header(),
                quantity(row, RegisterColumn.SET_PRESSURE), ScreeningCase.ATMOSPHERIC_PA) - ScreeningCase.ATMOSPHERIC_PA;
        String mawpText = quantity(row, RegisterColumn.MAWP);
        double mawp = mawpText.isBlank() ? set : Units.parsePressure(RegisterColumn.MAWP.header(), mawpText,
                ScreeningCase.ATMOSPHERIC_PA) - ScreeningCase.ATMOSPHERIC_PA;
        if (!(set > 0 && set <= MAX_GAUGE_PA)) {
            throw InvalidInputException.invalid(RegisterColumn.SET_PRESSURE.header(),
                    row.get(RegisterColumn.SET_PRESSURE), "expected a set pressure above atmospheric, at most "
                            + MAX_GAUGE_TEXT);
        }
        if (!(mawp > 0 && mawp <= MAX_GAUGE_PA)) {
            throw InvalidInputException.invalid(RegisterColumn.MAWP.header(), mawpText,
                    "expected an MAWP above atmospheric, at most " + MAX_GAUGE_TEXT);
        }
        // a set pressure above the MAWP is found by the calculation (RelievingPressure) and reported
        // against the set pressure column by Audit.audit, so it is not computed twice here
        RelievingPressureInput rel;
        try {
            rel = ScreeningCase.relieving(set, mawp, ScreeningCase.ATMOSPHERIC_PA);
        } catch (InvalidInputException e) {
            throw e.withField(column(e.field()));
        }
        Optional<InstalledOrifice> installed = installed(row);
        CaseInput in = ScreeningCase.of("Register line " + row.line() + ": " + tag, tag, fluid, storage, vessel, level,
                exposure, rel, ScreeningCase.ATMOSPHERIC_PA);
        OptionalDouble stated = mode.equals("saturated") ? p : OptionalDouble.empty();
        return AuditItem.of(row.line(), origin, tag, area, fluidText, in, installed, stated, notes);
    }

    private Fluid fluid(String fluidText, String vapourText, EosVariant eos) {
        String key = eos.name() + "\u0000" + fluidText.strip() + "\u0000" + vapourText.strip();
        Fluid f = fluids.get(key);
        if (f != null) {
            return f;
        }
        Composition liquid = Compositions.parse(RegisterColumn.FLUID.header(), fluidText, false);
        if (!vapourText.isBlank()) {
            Composition vap = Compositions.parse(RegisterColumn.VAPOUR.header(), vapourText, false);
            f = Fluid.withVapourSpace(liquid, vap, eos, DensityBasis.TRANSLATED);
        } else {
            f = Fluid.of(liquid, eos, DensityBasis.TRANSLATED);
        }
        Fluid prev = fluids.putIfAbsent(key, f);
        return prev == null ? f : prev;
    }

    private static Vessel vessel(RegisterRow row) {
        String shape = required(row, RegisterColumn.SHAPE, "expected horizontal, vertical or sphere")
                .strip().toLowerCase(Locale.ROOT);
        double d = length(row, RegisterColumn.DIAMETER);
        // range first, so that a bad diameter is reported under its own column, not under heads
        InvalidInputException.requireInRange(RegisterColumn.DIAMETER.header(), d, Vessel.PLAUSIBLE_DIAMETER_M[0],
                Vessel.PLAUSIBLE_DIAMETER_M[1], "m");
        try {
            if (shape.equals("sphere")) {
                for (RegisterColumn c : List.of(RegisterColumn.LENGTH, RegisterColumn.HEADS)) {
                    if (!row.get(c).isBlank()) {
                        throw InvalidInputException.invalid(c.header(), row.get(c), "a sphere has no " + c.header()
                                + "; leave the cell blank");
                    }
                }
                return Vessel.sphere(d);
            }
            if (!shape.equals("horizontal") && !shape.equals("vertical")) {
                throw InvalidInputException.invalid(RegisterColumn.SHAPE.header(), row.get(RegisterColumn.SHAPE),
                        "expected horizontal, vertical or sphere");
            }
            double l = length(row, RegisterColumn.LENGTH);
            InvalidInputException.requireInRange(RegisterColumn.LENGTH.header(), l, Vessel.PLAUSIBLE_LENGTH_M[0],
                    Vessel.PLAUSIBLE_LENGTH_M[1], "m");
            Head h = Specs.head(RegisterColumn.HEADS.header(), required(row, RegisterColumn.HEADS,
                    "expected one of " + Specs.HEAD_FORMS), d);
            return shape.equals("horizontal") ? Vessel.horizontal(d, l, h, h) : Vessel.vertical(d, l, h, h);
        } catch (InvalidInputException e) {
            throw e.withField(column(e.field()));
        }
    }

    /** The register column of a domain field path (the path itself when it has none). */
    static String column(String domainField) {
        if (domainField.startsWith("relief.setPressure")) {
            return RegisterColumn.SET_PRESSURE.header();
        }
        if (domainField.startsWith("relief.mawp")) {
            return RegisterColumn.MAWP.header();
        }
        if (domainField.startsWith("level.")) {
            return RegisterColumn.LEVEL.header();
        }
        if (domainField.startsWith("storage.temperature")) {
            return RegisterColumn.TEMPERATURE.header();
        }
        if (domainField.startsWith("storage.pressure")) {
            return RegisterColumn.PRESSURE.header();
        }
        if (domainField.startsWith("vessel.diameter")) {
            return RegisterColumn.DIAMETER.header();
        }
        if (domainField.startsWith("vessel.tangentLength")) {
            return RegisterColumn.LENGTH.header();
        }
        if (domainField.startsWith("vessel.") && domainField.endsWith("Head")) {
            return RegisterColumn.HEADS.header();
        }
        return domainField;
    }

    private static Level level(RegisterRow row, Vessel vessel) {
        required(row, RegisterColumn.LEVEL,
                "expected a height ('2.1 m'), a percentage of height ('65 %') or of volume ('70 %v')");
        String text = quantity(row, RegisterColumn.LEVEL);
        Level l = Specs.level(RegisterColumn.LEVEL.header(), text);
        if (l.basis() == Level.Basis.HEIGHT_M && l.value() > vessel.totalHeight()) {
            throw InvalidInputException.invalid(RegisterColumn.LEVEL.header(), text, String.format(Locale.ROOT,
                    "the level is above the top of the vessel (inside height %.3f m): expected 0 to %.3f m",
                    vessel.totalHeight(), vessel.totalHeight()));
        }
        try {
            l.heightIn(vessel);
        } catch (InvalidInputException e) {
            throw e.withField(RegisterColumn.LEVEL.header());
        }
        return l;
    }

    private static Optional<InstalledOrifice> installed(RegisterRow row) {
        String o = row.get(RegisterColumn.ORIFICE);
        String n = row.get(RegisterColumn.ORIFICE_COUNT);
        if (o.isBlank()) {
            if (!n.isBlank()) {
                throw InvalidInputException.invalid(RegisterColumn.ORIFICE_COUNT.header(), n,
                        "a count needs the orifice letter in the orifice column");
            }
            return Optional.empty();
        }
        Matcher m = ORIFICE.matcher(o);
        if (!m.matches()) {
            throw InvalidInputException.invalid(RegisterColumn.ORIFICE.header(), o,
                    "expected an API 526 letter D to T, or 'N x LETTER' (e.g. '2 x J')");
        }
        int count = 1;
        if (m.group(1) != null) {
            count = Integer.parseInt(m.group(1));
            if (!n.isBlank()) {
                throw InvalidInputException.invalid(RegisterColumn.ORIFICE_COUNT.header(), n,
                        "the orifice cell already gives the count ('" + o + "'); leave the count blank");
            }
        } else if (!n.isBlank()) {
            try {
                count = Integer.parseInt(n.strip());
            } catch (NumberFormatException e) {
                throw InvalidInputException.invalid(RegisterColumn.ORIFICE_COUNT.header(), n,
                        "expected a whole number of valves, at least 1");
            }
        }
        try {
            return Optional.of(new InstalledOrifice(OrificeTable.byLetter(m.group(2)), count));
        } catch (InvalidInputException e) {
            throw e.field().startsWith("device.orifice") && !e.field().contains("Count")
                    ? InvalidInputException.invalid(RegisterColumn.ORIFICE.header(), o, e.accepted())
                    : e;
        }
    }
}
