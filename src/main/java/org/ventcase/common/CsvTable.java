package org.ventcase.common;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * A comma-separated table as the program's data files (and a person's own component or k_ij
 * table) are written: lines starting with '#' and blank lines are skipped, the first other line
 * names the columns, and a field may be enclosed in double quotes (a doubled quote inside is one
 * quote). A table whose last column is free text (a source, a description) may let that column take
 * the rest of the line, commas included.
 *
 * <p>Every row knows where it came from ({@code origin:row N}, N the line number in the file), and
 * every refused value is an {@link InvalidInputException} naming that place and the column. The
 * register of the audit is read elsewhere: it is a person's spreadsheet export, with its own rules
 * for formulas and cell errors.
 */
public final class CsvTable {

    /** How the last column is split. */
    public enum LastColumn {
        /** The last column is one field like the others. */
        FIELD,
        /** The last column is free text and takes the rest of the line, commas included. */
        REST_OF_LINE
    }

    private final String origin;
    private final int headerLine;
    private final Map<String, Integer> index;
    private final List<Row> rows;

    private CsvTable(String origin, int headerLine, Map<String, Integer> index, List<Row> rows) {
        this.origin = origin;
        this.headerLine = headerLine;
        this.index = index;
        this.rows = rows;
    }

    /**
     * Reads a table.
     *
     * @param origin the name used in messages (a file name)
     * @throws InvalidInputException for a missing header, a column named twice, an unbalanced quote
     *                               or a row with a different number of fields from the header
     */
    public static CsvTable read(Reader reader, String origin, LastColumn last) throws IOException {
        BufferedReader br = reader instanceof BufferedReader b ? b : new BufferedReader(reader);
        Map<String, Integer> index = null;
        int headerLine = 0;
        List<Row> rows = new ArrayList<>();
        String line;
        int no = 0;
        while ((line = br.readLine()) != null) {
            no++;
            String trimmed = line.strip();
            if (trimmed.isEmpty() || trimmed.startsWith("#")) {
                continue;
            }
            String where = origin + ":row " + no;
            if (index == null) {
                index = header(split(line, where, 0), where);
                headerLine = no;
                continue;
            }
            List<String> fields = split(line, where, last == LastColumn.REST_OF_LINE ? index.size() : 0);
            if (fields.size() != index.size()) {
                throw InvalidInputException.invalid(where, fields.size() + " fields",
                        "expected " + index.size() + " fields as in the header " + index.keySet());
            }
            rows.add(new Row(where, no, index, fields));
        }
        if (index == null) {
            throw InvalidInputException.missing(origin, "expected a header row naming the columns");
        }
        return new CsvTable(origin, headerLine, index, Collections.unmodifiableList(rows));
    }

    /**
     * Reads a table packaged with the program (UTF-8, beside {@code anchor}). A fault in it is a fault
     * of the build, not of anybody's input, so it is reported as an {@link IllegalStateException}.
     */
    public static CsvTable resource(Class<?> anchor, String name, LastColumn last) {
        try (InputStream in = anchor.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + name + " beside " + anchor.getName());
            }
            String shortName = name.substring(name.lastIndexOf('/') + 1);
            return read(new InputStreamReader(in, StandardCharsets.UTF_8), shortName, last);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + name, e);
        } catch (InvalidInputException e) {
            throw new IllegalStateException("packaged table " + e.getMessage(), e);
        }
    }

    /** The name used in messages. */
    public String origin() {
        return origin;
    }

    /** Where the header is, for messages about the columns: {@code origin:row N.header}. */
    public String headerWhere() {
        return origin + ":row " + headerLine + ".header";
    }

    /** The column names, in file order. */
    public List<String> columns() {
        return List.copyOf(index.keySet());
    }

    /** The data rows, in file order. */
    public List<Row> rows() {
        return rows;
    }

    /** Splits one line; with {@code limit > 0} the last of {@code limit} fields takes the rest of the line. */
    public static List<String> split(String line, String where, int limit) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char ch = line.charAt(i);
            if (quoted) {
                if (ch != '"') {
                    cur.append(ch);
                } else if (i + 1 < line.length() && line.charAt(i + 1) == '"') {
                    cur.append('"');
                    i++;
                } else {
                    quoted = false;
                }
            } else if (limit > 0 && out.size() == limit - 1) {
                out.add(unquote(line.substring(i)));
                return out;
            } else if (ch == '"') {
                quoted = true;
            } else if (ch == ',') {
                out.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(ch);
            }
        }
        if (quoted) {
            throw InvalidInputException.invalid(where, line, "unbalanced double quote");
        }
        out.add(cur.toString());
        return out;
    }

    private static String unquote(String rest) {
        String t = rest.strip();
        if (t.length() >= 2 && t.startsWith("\"") && t.endsWith("\"")) {
            return t.substring(1, t.length() - 1).replace("\"\"", "\"");
        }
        return rest;
    }

    private static Map<String, Integer> header(List<String> names, String where) {
        Map<String, Integer> index = new LinkedHashMap<>();
        for (int i = 0; i < names.size(); i++) {
            String col = names.get(i).strip();
            if (col.isEmpty() || index.putIfAbsent(col, i) != null) {
                throw InvalidInputException.invalid(where + ".header", col.isEmpty() ? "(empty)" : col,
                        "expected each column named once");
            }
        }
        return Collections.unmodifiableMap(index);
    }

    /** One data row, read by column name. */
    public static final class Row {
        private final String where;
        private final int line;
        private final Map<String, Integer> index;
        private final List<String> fields;

        Row(String where, int line, Map<String, Integer> index, List<String> fields) {
            this.where = where;
            this.line = line;
            this.index = index;
            this.fields = List.copyOf(fields);
        }

        /** {@code origin:row N}. */
        public String where() {
            return where;
        }

        /** The line number in the file, from 1. */
        public int line() {
            return line;
        }

        /** The field of a column, stripped; "" when empty. */
        public String text(String column) {
            Integer i = index.get(column);
            if (i == null) {
                throw InvalidInputException.missing(where + "." + column, "expected a column '" + column + "'");
            }
            return fields.get(i).strip();
        }

        /** The field of a column, which must not be empty (a source column: every datum needs a source). */
        public String required(String column) {
            String v = text(column);
            if (v.isEmpty()) {
                throw InvalidInputException.missing(where + "." + column,
                        column.endsWith("source") ? "every datum needs a source" : "expected a value");
            }
            return v;
        }

        /** The finite number in a column, which must not be empty. */
        public double number(String column) {
            String v = required(column);
            double x;
            try {
                x = Double.parseDouble(v);
            } catch (NumberFormatException e) {
                throw InvalidInputException.invalid(where + "." + column, v, "expected a number");
            }
            if (!Double.isFinite(x)) {
                throw InvalidInputException.invalid(where + "." + column, v, "expected a finite number");
            }
            return x;
        }

        /** The number in a column, or empty where the field is empty. */
        public OptionalDouble optionalNumber(String column) {
            return text(column).isEmpty() ? OptionalDouble.empty() : OptionalDouble.of(number(column));
        }

        @Override
        public String toString() {
            return where + " " + fields;
        }
    }
}
