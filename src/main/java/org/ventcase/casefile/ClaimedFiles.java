package org.ventcase.casefile;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;

import org.ventcase.common.InvalidInputException;
import org.ventcase.review.ClaimedValues;
import org.ventcase.review.ReviewQuantity;
import org.ventcase.units.Dimension;
import org.ventcase.units.Units;

/**
 * Reads a claimed-value file (format: {@code docs/review.md}; schema
 * {@code /org/ventcase/casefile/claimed.schema.json}): JSON
 * {@code {"case": "...", "scenario": "...", "source": "...", "claimed": {"k": 1.11, ...}}} or CSV
 * rows {@code quantity,value}. The case path is relative to the claimed file's folder. Values are
 * turned into SI only once the case is known ({@link Claimed#values(double)}), because a gauge
 * pressure needs the site's atmospheric pressure.
 */
public final class ClaimedFiles {

    /** Files larger than this are refused before parsing. */
    public static final long MAX_BYTES = 1024L * 1024;

    /** Top-level fields of the JSON form (and the non-quantity rows of the CSV form). */
    public static final List<String> FIELDS = List.of("case", "scenario", "source", "claimed");

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
            .disable(com.fasterxml.jackson.core.json.JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .enable(com.fasterxml.jackson.databind.DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .build();

    private ClaimedFiles() {
    }

    /**
     * A claimed-value file as read: the case it names (resolved against the file's folder), the
     * scenario, the source and each claimed value as written.
     *
     * @param origin   the file, for messages
     * @param casePath the case file it names, resolved; empty when it names none
     * @param scenario scenario label or 1-based position; empty: the governing scenario
     * @param source   who made the claim (free text)
     * @param raw      quantity -> value as written (text; numbers as their JSON text)
     * @param where    quantity -> where it was written, for messages ("claimed.k" in JSON,
     *                 "FILE line 7 (k)" in CSV); a quantity without an entry is named "claimed.KEY"
     */
    public record Claimed(String origin, Optional<Path> casePath, Optional<String> scenario, String source,
                          Map<ReviewQuantity, String> raw, Map<ReviewQuantity, String> where) {
        public Claimed {
            Map<ReviewQuantity, String> m = new EnumMap<>(ReviewQuantity.class);
            m.putAll(raw);
            raw = java.util.Collections.unmodifiableMap(m);
            Map<ReviewQuantity, String> w = new EnumMap<>(ReviewQuantity.class);
            w.putAll(where);
            where = java.util.Collections.unmodifiableMap(w);
        }

        /** A claim whose values are named by their JSON path ("claimed.k"). */
        public Claimed(String origin, Optional<Path> casePath, Optional<String> scenario, String source,
                       Map<ReviewQuantity, String> raw) {
            this(origin, casePath, scenario, source, raw, Map.of());
        }

        /** The values in SI; gauge pressures are made absolute with the site's atmospheric pressure. */
        public ClaimedValues values(double atmosphericPa) {
            Map<ReviewQuantity, Double> v = new EnumMap<>(ReviewQuantity.class);
            Optional<String> orifice = Optional.empty();
            for (Map.Entry<ReviewQuantity, String> e : raw.entrySet()) {
                ReviewQuantity q = e.getKey();
                String text = e.getValue();
                String field = where.getOrDefault(q, "claimed." + q.key());
                if (q == ReviewQuantity.ORIFICE) {
                    try {
                        orifice = Optional.of(ClaimedValues.designation(text));
                    } catch (InvalidInputException ex) {
                        throw ex.withField(field);
                    }
                    continue;
                }
                v.put(q, parse(field, q, text, atmosphericPa));
            }
            return new ClaimedValues(source, scenario, v, orifice, raw);
        }
    }

    static double parse(String field, ReviewQuantity q, String text, double atmosphericPa) {
        Optional<Dimension> d = q.dimension();
        double x;
        if (d.isEmpty()) {
            try {
                x = Double.parseDouble(text.strip());
            } catch (NumberFormatException e) {
                throw InvalidInputException.invalid(field, text, "expected a dimensionless number, e.g. "
                        + (q == ReviewQuantity.Z ? "0.67" : "1.11"));
            }
        } else if (d.get() == Dimension.PRESSURE) {
            x = Units.parsePressure(field, text, atmosphericPa);
        } else if (d.get() == Dimension.MOLAR_MASS && text.strip().matches("[-+]?[0-9.]+([eE][-+]?\\d+)?")) {
            x = Double.parseDouble(text.strip());
        } else {
            x = Units.parse(field, text, d.get());
        }
        if (!(x > 0) || Double.isInfinite(x)) {
            throw InvalidInputException.invalid(field, text, "expected a finite value above 0");
        }
        if (x > q.plausibleMaximum()) {
            // one limit per quantity (ReviewQuantity.plausibleMaximum); k and Z say what they are
            throw InvalidInputException.invalid(field, text, switch (q) {
                case K -> "expected k above 0 and at most 3 (Cp/Cv, or an isentropic exponent, which may be below 1)";
                case Z -> "expected a compressibility factor Z between 0 and 5";
                default -> "expected a value above 0 and at most " + q.format(q.plausibleMaximum())
                        + " (a larger value is taken as a typing error)";
            });
        }
        return x;
    }

    /** Reads a JSON ({@code .json}) or CSV (any other name) claimed-value file. */
    public static Claimed read(Path file) {
        String text = readText(file);
        Path dir = file.toAbsolutePath().getParent();
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".csv") || !name.endsWith(".json") && !text.stripLeading().startsWith("{")) {
            return csv(text, file.toString(), dir);
        }
        return json(text, file.toString(), dir);
    }

    static String readText(Path file) {
        try {
            byte[] b = org.ventcase.common.BoundedRead.bytes(file, MAX_BYTES).orElseThrow(() ->
                    InvalidInputException.invalid(file.toString(), "more than " + MAX_BYTES + " bytes",
                            "expected a claimed-value file of at most " + MAX_BYTES + " bytes"));
            return org.ventcase.common.Utf8.decode(b, file.toString());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + file + ": " + org.ventcase.common.FileErrors.reason(e), e);
        }
    }

    /** Parses the JSON form; {@code dir} resolves the case path (may be null: left as written). */
    public static Claimed json(String text, String origin, Path dir) {
        JsonNode root;
        try {
            root = MAPPER.readTree(text);
        } catch (JsonProcessingException e) {
            // the case file's wording: what was found, what was expected, line and column
            Problem p = CaseFiles.syntax(e);
            throw InvalidInputException.invalid(origin + (p.path().equals("$") ? "" : " " + p.path()), p.value(),
                    p.accepted());
        }
        if (root == null || !root.isObject()) {
            throw InvalidInputException.invalid(origin, "JSON", "expected a JSON object with \"claimed\"");
        }
        Optional<Path> casePath = Optional.empty();
        Optional<String> scenario = Optional.empty();
        String source = "";
        Map<ReviewQuantity, String> raw = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = root.fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            String k = e.getKey();
            JsonNode v = e.getValue();
            switch (k) {
                case "case" -> casePath = Optional.of(resolve(dir, text(k, v)));
                case "scenario" -> {
                    if (v.isInt()) {
                        scenario = Optional.of(Integer.toString(v.intValue()));
                    } else {
                        scenario = Optional.of(text(k, v));
                    }
                }
                case "source" -> source = text(k, v);
                case "claimed" -> {
                    if (!v.isObject()) {
                        throw InvalidInputException.invalid("claimed", v.toString(), "expected an object of "
                                + "quantity: value, with quantity one of " + ReviewQuantity.keys());
                    }
                    for (Iterator<Map.Entry<String, JsonNode>> c = v.fields(); c.hasNext();) {
                        Map.Entry<String, JsonNode> q = c.next();
                        ReviewQuantity rq = quantity("claimed." + q.getKey(), q.getKey());
                        JsonNode qv = q.getValue();
                        String field = "claimed." + rq.key();
                        if (raw.containsKey(rq)) {
                            throw InvalidInputException.invalid(field, q.getKey(), "each quantity may be claimed once");
                        }
                        if (qv.isNumber() && (rq.dimension().isEmpty() || rq == ReviewQuantity.MOLAR_MASS)
                                && rq != ReviewQuantity.ORIFICE) {
                            raw.put(rq, qv.asText());
                        } else if (qv.isTextual()) {
                            raw.put(rq, qv.textValue());
                        } else {
                            throw InvalidInputException.invalid(field, qv.toString(), rq.dimension().isPresent()
                                    && rq != ReviewQuantity.MOLAR_MASS ? "expected text with a unit, e.g. "
                                    + Units.example(rq.dimension().get()) : rq == ReviewQuantity.ORIFICE
                                    ? "expected an orifice letter as text, e.g. \"L\"" : "expected a number");
                        }
                    }
                }
                default -> throw InvalidInputException.invalid(k, k, "unknown field"
                        + Names.nearest(k, FIELDS).map(n -> " (did you mean '" + n + "'?)").orElse("")
                        + "; expected " + String.join(", ", FIELDS));
            }
        }
        if (!root.has("claimed")) {
            throw InvalidInputException.missing("claimed", "expected an object of quantity: value, with quantity one "
                    + "of " + ReviewQuantity.keys());
        }
        if (raw.isEmpty()) {
            throw InvalidInputException.missing("claimed", "expected at least one claimed value, of "
                    + ReviewQuantity.keys());
        }
        return new Claimed(origin, casePath, scenario, source, raw);
    }

    /** Parses the CSV form: rows {@code quantity,value}; an optional header row; '#' comments. */
    public static Claimed csv(String text, String origin, Path dir) {
        Optional<Path> casePath = Optional.empty();
        Optional<String> scenario = Optional.empty();
        String source = "";
        Map<ReviewQuantity, String> raw = new LinkedHashMap<>();
        Map<ReviewQuantity, String> at = new LinkedHashMap<>();
        String[] lines = text.split("\\r?\\n");
        for (int n = 0; n < lines.length; n++) {
            String line = lines[n].strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            int comma = line.indexOf(',');
            String where = origin + " line " + (n + 1);
            if (comma <= 0) {
                throw InvalidInputException.invalid(where, line, "expected a row 'quantity,value', e.g. "
                        + "'k,1.11' or 'latentHeat,252 kJ/kg'");
            }
            String k = unquote(line.substring(0, comma));
            String v = unquote(line.substring(comma + 1));
            if (k.equalsIgnoreCase("quantity") && v.equalsIgnoreCase("value")) {
                continue;
            }
            switch (k) {
                case "case" -> casePath = Optional.of(resolve(dir, v));
                case "scenario" -> scenario = Optional.of(v);
                case "source" -> source = v;
                default -> {
                    ReviewQuantity q = quantity(where, k);
                    if (raw.containsKey(q)) {
                        throw InvalidInputException.invalid(where, k, "each quantity may be claimed once");
                    }
                    raw.put(q, v);
                    at.put(q, where + " (" + q.key() + ")");
                }
            }
        }
        if (raw.isEmpty()) {
            throw InvalidInputException.missing(origin, "expected at least one row 'quantity,value' with quantity one "
                    + "of " + ReviewQuantity.keys());
        }
        return new Claimed(origin, casePath, scenario, source, raw, at);
    }

    private static String unquote(String s) {
        String t = s.strip();
        if (t.length() >= 2 && t.startsWith("\"") && t.endsWith("\"")) {
            t = t.substring(1, t.length() - 1).replace("\"\"", "\"").strip();
        }
        return t;
    }

    private static ReviewQuantity quantity(String field, String key) {
        return ReviewQuantity.byKey(key).orElseThrow(() -> {
            List<String> keys = new java.util.ArrayList<>();
            for (ReviewQuantity q : ReviewQuantity.values()) {
                keys.add(q.key());
            }
            return InvalidInputException.invalid(field, key, "unknown quantity"
                    + Names.nearest(key, keys).map(n -> " (did you mean '" + n + "'?)").orElse("")
                    + "; expected one of " + ReviewQuantity.keys());
        });
    }

    private static String text(String field, JsonNode v) {
        if (!v.isTextual() || v.textValue().isBlank()) {
            throw InvalidInputException.invalid(field, v.toString(), "expected non-empty text");
        }
        return v.textValue().strip();
    }

    private static Path resolve(Path dir, String p) {
        Path path = Path.of(p);
        return dir == null || path.isAbsolute() ? path : dir.resolve(path).normalize();
    }
}
