package org.ventcase.audit;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The columns of a vessel register (docs/audit.md). A header cell is the column's name, optionally
 * with a unit in square brackets ({@code diameter [m]}); names are matched ignoring case, spaces,
 * underscores and hyphens, and a few aliases are accepted.
 */
public enum RegisterColumn {
    TAG("tag", true, false, "vessel tag", "equipment tag"),
    AREA("area", true, false, "unit", "area/unit", "plant area"),
    FLUID("fluid", true, false, "composition"),
    EOS("eos", false, false, "equation of state"),
    SHAPE("shape", true, false),
    HEADS("heads", false, false, "head", "head type"),
    DIAMETER("diameter", true, true, "inside diameter", "id"),
    LENGTH("length", false, true, "tangent length", "t/t", "tangent to tangent"),
    ELEVATION("elevation", true, true, "bottom elevation"),
    LEVEL("level", false, true, "liquid level"),
    TEMPERATURE("temperature", true, true, "storage temperature"),
    PRESSURE("pressure", false, true, "storage pressure"),
    MODE("mode", true, false, "storage mode"),
    VAPOUR("vapour", false, false, "vapor", "vapour composition", "vapor composition", "blanket"),
    SET_PRESSURE("set pressure", true, true, "set"),
    MAWP("mawp", false, true),
    ORIFICE("orifice", false, false, "installed orifice"),
    ORIFICE_COUNT("orifice count", false, false, "count", "valves");

    private final String header;
    private final boolean requiredInHeader;
    private final boolean takesUnit;
    private final List<String> aliases;

    RegisterColumn(String header, boolean requiredInHeader, boolean takesUnit, String... aliases) {
        this.header = header;
        this.requiredInHeader = requiredInHeader;
        this.takesUnit = takesUnit;
        this.aliases = List.of(aliases);
    }

    /** The column's name as documented and used in messages. */
    public String header() {
        return header;
    }

    /** Whether every register must have this column. */
    public boolean requiredInHeader() {
        return requiredInHeader;
    }

    /** Whether the column holds a quantity (a unit may be given in the header). */
    public boolean takesUnit() {
        return takesUnit;
    }

    /**
     * Longest cell accepted, characters: the tag as in a case file (it is printed in the title block
     * and the tables), the area like a case file's preparer, the compositions like a case file's free
     * text, every other column a short entry (common practice, no source). A longer cell refuses the
     * row and is echoed shortened.
     */
    public int maxLength() {
        return switch (this) {
            case TAG -> 60;
            case AREA -> 100;
            case FLUID, VAPOUR -> 1000;
            default -> 100;
        };
    }

    static String normalise(String name) {
        return name.strip().toLowerCase(Locale.ROOT).replace('_', ' ').replace('-', ' ').replaceAll("\\s+", " ");
    }

    /** The column a header name (without its bracketed unit) stands for. */
    public static Optional<RegisterColumn> byName(String name) {
        String n = normalise(name);
        for (RegisterColumn c : values()) {
            if (c.header.equals(n) || c.aliases.contains(n)) {
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }
}
