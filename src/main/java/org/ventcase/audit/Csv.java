package org.ventcase.audit;

import java.util.ArrayList;
import java.util.List;

import org.ventcase.common.InvalidInputException;

/**
 * Plain CSV (RFC 4180: comma separated, double quotes around a field that holds a comma, a quote
 * or a line break, a quote inside doubled) with two additions for registers kept by hand: a line
 * whose first character is {@code #} (outside quotes) is a comment, and blank lines are skipped.
 * Each record keeps the line number it starts on, so messages can point at the line in the file.
 */
public final class Csv {

    private Csv() {
    }

    /**
     * One record.
     *
     * @param line   1-based line number of the file where the record starts
     * @param fields the fields, unquoted
     */
    public record Record(int line, List<String> fields) {
        public Record {
            fields = List.copyOf(fields);
        }
    }

    /**
     * Parses CSV text into records (comments and blank lines left out).
     *
     * @param origin file name for messages
     * @throws InvalidInputException for a quote left open at the end of the text
     */
    public static List<Record> parse(String text, String origin) {
        List<Record> out = new ArrayList<>();
        Reader r = new Reader(text, origin);
        for (Record rec = r.next(); rec != null; rec = r.next()) {
            out.add(rec);
        }
        return out;
    }

    /**
     * Reads records one at a time from CSV text (comments and blank lines left out), so that a long
     * file can be processed in chunks without holding every record.
     */
    public static final class Reader {
        private final String s;
        private final String origin;
        private final int n;
        private int i;
        private int line = 1;

        public Reader(String text, String origin) {
            this.s = text.startsWith("\uFEFF") ? text.substring(1) : text;
            this.origin = origin;
            this.n = s.length();
        }

        /**
         * The next record, or {@code null} at the end of the text.
         *
         * @throws InvalidInputException for a quote left open at the end of the text
         */
        public Record next() {
            while (i < n) {
                char c = s.charAt(i);
                if (c == '#') {
                    while (i < n && s.charAt(i) != '\n') {
                        i++;
                    }
                    i++;
                    line++;
                    continue;
                }
                if (c == '\n' || c == '\r' && i + 1 < n && s.charAt(i + 1) == '\n') {
                    i += c == '\r' ? 2 : 1;
                    line++;
                    continue;
                }
                return record();
            }
            return null;
        }

        private Record record() {
            char c;
            int start = line;
            List<String> fields = new ArrayList<>();
            StringBuilder f = new StringBuilder();
            boolean quoted = false;
            boolean wasQuoted = false;
            while (i < n) {
                c = s.charAt(i);
                if (quoted) {
                    if (c == '"') {
                        if (i + 1 < n && s.charAt(i + 1) == '"') {
                            f.append('"');
                            i += 2;
                            continue;
                        }
                        quoted = false;
                        i++;
                        continue;
                    }
                    if (c == '\n') {
                        line++;
                    }
                    f.append(c);
                    i++;
                    continue;
                }
                if (c == '"' && f.toString().isBlank() && !wasQuoted) {
                    quoted = true;
                    wasQuoted = true;
                    f.setLength(0);
                    i++;
                    continue;
                }
                if (c == ',') {
                    fields.add(wasQuoted ? f.toString() : f.toString().strip());
                    f.setLength(0);
                    wasQuoted = false;
                    i++;
                    continue;
                }
                if (c == '\r' && i + 1 < n && s.charAt(i + 1) == '\n' || c == '\n') {
                    i += c == '\r' ? 2 : 1;
                    line++;
                    break;
                }
                f.append(c);
                i++;
            }
            if (quoted) {
                throw InvalidInputException.invalid(origin + " line " + start, "(quote left open)",
                        "expected every opening double quote of a field to be closed");
            }
            fields.add(wasQuoted ? f.toString() : f.toString().strip());
            return new Record(start, fields);
        }
    }

    /**
     * A text cell as it is written: neutralised against spreadsheet formula injection, then quoted
     * where needed. A cell starting with {@code =}, {@code +}, {@code -}, {@code @}, a tab or a
     * carriage return gets a leading apostrophe, so a spreadsheet shows it as text instead of
     * evaluating it. Numbers are not text cells: write them with {@link #number}.
     */
    public static String text(String value) {
        String v = value == null ? "" : value;
        if (!v.isEmpty()) {
            char c = v.charAt(0);
            String t = v.strip();
            char d = t.isEmpty() ? ' ' : t.charAt(0);
            if (c == '\t' || c == '\r' || isFormulaStart(c) || isFormulaStart(d)) {
                v = "'" + v;
            }
        }
        if (v.indexOf(',') >= 0 || v.indexOf('"') >= 0 || v.indexOf('\n') >= 0 || v.indexOf('\r') >= 0
                || !v.equals(v.strip())) {
            return '"' + v.replace("\"", "\"\"") + '"';
        }
        return v;
    }

    private static boolean isFormulaStart(char c) {
        return c == '=' || c == '+' || c == '-' || c == '@';
    }

    /**
     * A number cell: plain decimal, unquoted, so a spreadsheet reads it as a number (a negative
     * number keeps its minus sign; it is not text and is not neutralised). Rounded to
     * {@code significant} significant digits.
     *
     * @throws IllegalArgumentException for NaN or an infinity, which must never reach an output
     */
    public static String number(double v, int significant) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("not a finite number: " + v);
        }
        if (v == 0) {
            return "0";
        }
        java.math.BigDecimal b = new java.math.BigDecimal(v).round(new java.math.MathContext(significant,
                java.math.RoundingMode.HALF_EVEN)).stripTrailingZeros();
        if (b.scale() < 0) {
            b = b.setScale(0);
        }
        return b.toPlainString();
    }
}
