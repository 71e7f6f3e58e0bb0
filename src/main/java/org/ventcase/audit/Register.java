package org.ventcase.audit;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.ventcase.common.InvalidInputException;

/**
 * A vessel register read from CSV: the header (columns and their header units) and one
 * {@link RegisterRow} per data record, in file order. The file as a whole is refused only when no
 * row could be read from it: no header, a required column missing from the header, a column named
 * twice, a unit in the header that is not a unit, or a quote left open. Everything wrong with a
 * single row is reported against that row.
 *
 * @param origin         the file name, for messages
 * @param columns        the header's columns, in order (empty for a column the register does not know)
 * @param headerUnits    the unit in square brackets per column position, or empty
 * @param ignoredColumns header names that are not register columns (kept out of the calculation)
 * @param rows           the data rows in file order
 */
public record Register(String origin, List<Optional<RegisterColumn>> columns, List<String> headerUnits,
                       List<String> ignoredColumns, List<RegisterRow> rows) {

    /** Largest register accepted, bytes (a register of 100,000 vessels is about 20 MB). */
    public static final long MAX_BYTES = 64L * 1024 * 1024;

    private static final Pattern HEADER = Pattern.compile("^([^\\[]*?)\\s*(?:\\[([^\\]]*)\\])?\\s*$");
    private static final Pattern BARE_NUMBER = Pattern.compile(
            "^[-+]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][-+]?\\d+)?$");

    public Register {
        columns = List.copyOf(columns);
        headerUnits = List.copyOf(headerUnits);
        ignoredColumns = List.copyOf(ignoredColumns);
        rows = List.copyOf(rows);
    }

    /** Reads a register file (UTF-8). */
    public static Register read(Path file) throws IOException {
        byte[] b = org.ventcase.common.BoundedRead.bytes(file, MAX_BYTES).orElseThrow(() ->
                InvalidInputException.invalid(file.toString(), "more than " + MAX_BYTES + " bytes",
                        "expected a register of at most " + MAX_BYTES + " bytes"));
        return parse(org.ventcase.common.Utf8.decode(b, file.getFileName().toString()), file.getFileName().toString());
    }

    /** Parses register text. */
    public static Register parse(String text, String origin) {
        Stream st = stream(text, origin);
        List<RegisterRow> rows = new ArrayList<>();
        for (List<RegisterRow> chunk = st.next(Integer.MAX_VALUE); !chunk.isEmpty(); chunk = st.next(Integer.MAX_VALUE)) {
            rows.addAll(chunk);
        }
        return new Register(origin, st.columns(), st.headerUnits(), st.ignoredColumns(), rows);
    }

    /**
     * Opens register text for reading in chunks: the header is read and checked now, the vessel
     * rows by {@link Stream#next}. The same rules and messages as {@link #parse}.
     */
    public static Stream stream(String text, String origin) {
        Csv.Reader reader = new Csv.Reader(text, origin);
        Csv.Record head = reader.next();
        if (head == null) {
            throw InvalidInputException.missing(origin, "expected a header line naming the columns, then one vessel a "
                    + "line (docs/audit.md)");
        }
        List<Optional<RegisterColumn>> cols = new ArrayList<>();
        List<String> units = new ArrayList<>();
        List<String> ignored = new ArrayList<>();
        Map<RegisterColumn, Integer> seen = new EnumMap<>(RegisterColumn.class);
        for (int i = 0; i < head.fields().size(); i++) {
            String cell = head.fields().get(i);
            Matcher m = HEADER.matcher(cell);
            String name = m.matches() ? m.group(1) : cell;
            String unit = m.matches() && m.group(2) != null ? m.group(2).strip() : "";
            Optional<RegisterColumn> col = RegisterColumn.byName(name);
            String where = origin + " line " + head.line() + ", column " + (i + 1);
            if (col.isEmpty()) {
                if (!name.isBlank()) {
                    Optional<RegisterColumn> near = nearest(name);
                    if (near.isPresent()) {
                        // a misspelt column would silently drop its data (e.g. 'orifise': no orifice check)
                        throw InvalidInputException.invalid(where, cell, "not a register column; did you mean '"
                                + near.get().header() + "'? (the columns: docs/audit.md)");
                    }
                    ignored.add(cell);
                }
            } else {
                RegisterColumn c = col.get();
                if (seen.containsKey(c)) {
                    throw InvalidInputException.invalid(where, cell, "column '" + c.header() + "' is already column "
                            + (seen.get(c) + 1) + "; name each column once");
                }
                seen.put(c, i);
                if (!unit.isEmpty() && !c.takesUnit()) {
                    throw InvalidInputException.invalid(where, cell, "column '" + c.header() + "' holds text, not a "
                            + "quantity: leave out the unit in brackets");
                }
                if (!unit.isEmpty()) {
                    RegisterCases.checkHeaderUnit(where, c, unit);
                }
            }
            cols.add(col);
            units.add(unit);
        }
        for (RegisterColumn c : RegisterColumn.values()) {
            if (c.requiredInHeader() && !seen.containsKey(c)) {
                throw InvalidInputException.missing(origin + " line " + head.line() + ": column '" + c.header() + "'",
                        "expected a header with at least the columns " + requiredList() + " (docs/audit.md)");
            }
        }
        Csv.Record first = reader.next();
        if (first == null) {
            // a header alone would give an audit of nothing with exit 0: an empty export, or the wrong file
            throw InvalidInputException.missing(origin + ": vessel rows", "the register holds a header (line "
                    + head.line() + ") but no vessel rows; expected one vessel a line after the header (docs/audit.md)");
        }
        return new Stream(origin, List.copyOf(cols), List.copyOf(units), List.copyOf(ignored), reader, first);
    }

    /** The number of vessel rows of register text (records after the header), for progress reports. */
    public static int countRows(String text, String origin) {
        Csv.Reader r = new Csv.Reader(text, origin);
        int n = -1;
        while (r.next() != null) {
            n++;
        }
        return Math.max(n, 0);
    }

    /** A register being read in chunks (see {@link #stream}). Not thread-safe: one reader. */
    public static final class Stream {
        private final String origin;
        private final List<Optional<RegisterColumn>> columns;
        private final List<String> headerUnits;
        private final List<String> ignoredColumns;
        private final Csv.Reader reader;
        private Csv.Record pending;

        private Stream(String origin, List<Optional<RegisterColumn>> columns, List<String> headerUnits,
                       List<String> ignoredColumns, Csv.Reader reader, Csv.Record first) {
            this.pending = first;
            this.origin = origin;
            this.columns = columns;
            this.headerUnits = headerUnits;
            this.ignoredColumns = ignoredColumns;
            this.reader = reader;
        }

        public String origin() {
            return origin;
        }

        public List<Optional<RegisterColumn>> columns() {
            return columns;
        }

        public List<String> headerUnits() {
            return headerUnits;
        }

        public List<String> ignoredColumns() {
            return ignoredColumns;
        }

        /** Up to {@code max} more vessel rows, in file order; empty at the end. */
        public List<RegisterRow> next(int max) {
            List<RegisterRow> rows = new ArrayList<>();
            while (rows.size() < max) {
                Csv.Record rec = pending != null ? pending : reader.next();
                pending = null;
                if (rec == null) {
                    break;
                }
                rows.add(row(rec, columns, headerUnits));
            }
            return rows;
        }
    }

    private static RegisterRow row(Csv.Record rec, List<Optional<RegisterColumn>> cols, List<String> units) {
        Map<RegisterColumn, String> cells = new EnumMap<>(RegisterColumn.class);
        for (int i = 0; i < Math.min(rec.fields().size(), cols.size()); i++) {
            if (cols.get(i).isPresent()) {
                cells.put(cols.get(i).get(), withUnit(rec.fields().get(i), units.get(i)));
            }
        }
        Optional<RegisterColumn> firstMissing = Optional.empty();
        for (int i = rec.fields().size(); i < cols.size() && firstMissing.isEmpty(); i++) {
            firstMissing = cols.get(i);
        }
        return new RegisterRow(rec.line(), cells, rec.fields().size(), cols.size(), firstMissing);
    }

    /** A register column whose name is within two edits of {@code name}, if any. */
    static Optional<RegisterColumn> nearest(String name) {
        String n = name.strip().toLowerCase(java.util.Locale.ROOT);
        RegisterColumn best = null;
        int bestD = 3;
        for (RegisterColumn c : RegisterColumn.values()) {
            int d = org.ventcase.common.Strings.editDistance(n, c.header().toLowerCase(java.util.Locale.ROOT));
            if (d < bestD) {
                bestD = d;
                best = c;
            }
        }
        return Optional.ofNullable(best);
    }

    private static String requiredList() {
        List<String> out = new ArrayList<>();
        for (RegisterColumn c : RegisterColumn.values()) {
            if (c.requiredInHeader()) {
                out.add(c.header());
            }
        }
        return String.join(", ", out);
    }

    /** A bare number takes the header's unit; a cell with its own unit keeps it; text is left alone. */
    static String withUnit(String cell, String headerUnit) {
        String v = cell == null ? "" : cell.strip();
        if (!headerUnit.isEmpty() && BARE_NUMBER.matcher(v).matches()) {
            return v + " " + headerUnit;
        }
        return v;
    }
}
