package org.ventcase.casefile;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * Reading, checking, writing and hashing case files.
 *
 * <p>Reading: the file is refused before parsing when larger than {@link #MAX_BYTES}; parsed with
 * duplicate keys refused; migrated to the current layout ({@link Migrations}); checked field by
 * field against the records (unknown fields with the nearest known name, wrong JSON types,
 * bare numbers where a unit is needed), all problems at once; then bound to {@link Case} by
 * Jackson with unknown properties failing. No polymorphic typing is enabled anywhere.
 *
 * <p>Writing is atomic: a temporary file in the target's folder, forced to disk, then moved over
 * the target; a failure leaves the old file as it was and no temporary file behind.
 */
public final class CaseFiles {

    /** Largest case file read, bytes (2 MiB): a hand-written case is a few kB. */
    public static final long MAX_BYTES = 2L * 1024 * 1024;

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .disable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
            .disable(MapperFeature.ALLOW_COERCION_OF_SCALARS)
            .enable(SerializationFeature.INDENT_OUTPUT)
            .serializationInclusion(JsonInclude.Include.NON_NULL)
            .build();

    private CaseFiles() {
    }

    /** A case bound from a file, with the problems of the structural pass (possibly none). */
    record Parsed(String origin, Case kase, List<Problem> problems, List<String> notes) {
    }

    // ------------------------------------------------------------------------------ reading

    /**
     * Reads a case file: size limit, parsing, migration, structure and binding.
     *
     * @throws CaseValidationException with every structural problem
     * @throws UncheckedIOException    when the file cannot be read
     */
    public static Case read(Path file) {
        return strict(parse(readText(file), file.toString()));
    }

    /** As {@link #read(Path)} for JSON text; {@code origin} names it in messages. */
    public static Case read(String json, String origin) {
        return strict(parse(json, origin));
    }

    /** Reads and fully checks a file; every problem, of structure or of meaning, in one report. */
    public static ValidationReport check(Path file) {
        return check(parse(readText(file), file.toString()));
    }

    /** As {@link #check(Path)} for JSON text. */
    public static ValidationReport check(String json, String origin) {
        return check(parse(json, origin));
    }

    /**
     * Reads and validates a file into the domain objects for calculation.
     *
     * @throws CaseValidationException with every problem found
     */
    public static ValidatedCase load(Path file) {
        return check(file).orThrow();
    }

    /** As {@link #load(Path)} for JSON text. */
    public static ValidatedCase load(String json, String origin) {
        return check(json, origin).orThrow();
    }

    private static Case strict(Parsed p) {
        if (!p.problems().isEmpty()) {
            throw new CaseValidationException(p.origin(), p.problems());
        }
        return p.kase();
    }

    private static ValidationReport check(Parsed p) {
        ValidationReport semantic = CaseValidator.check(p.kase(), p.origin());
        if (p.problems().isEmpty()) {
            List<String> warnings = new ArrayList<>(p.notes());
            warnings.addAll(semantic.warnings());
            return new ValidationReport(p.origin(), semantic.problems(), warnings, semantic.validated());
        }
        // A field removed by the structural pass would be reported again as missing: keep the first word.
        List<Problem> all = new ArrayList<>(p.problems());
        for (Problem s : semantic.problems()) {
            boolean covered = p.problems().stream().anyMatch(q -> s.path().equals(q.path())
                    || s.path().startsWith(q.path() + ".") || s.path().startsWith(q.path() + "[")
                    || q.path().startsWith(s.path() + ".") || q.path().startsWith(s.path() + "["));
            if (!covered) {
                all.add(s);
            }
        }
        List<String> warnings = new ArrayList<>(p.notes());
        warnings.addAll(semantic.warnings());
        return new ValidationReport(p.origin(), all, warnings, java.util.Optional.empty());
    }

    private static String readText(Path file) {
        try {
            byte[] b = org.ventcase.common.BoundedRead.bytes(file, MAX_BYTES)
                    .orElseThrow(() -> tooLarge(file.toString(), MAX_BYTES + 1));
            return org.ventcase.common.Utf8.decode(b, file.toString());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read case file " + file + ": " + org.ventcase.common.FileErrors.reason(e), e);
        }
    }

    private static CaseValidationException tooLarge(String origin, long size) {
        return new CaseValidationException(origin, List.of(Problem.of("$", (size > MAX_BYTES ? "more than " + MAX_BYTES
                : String.valueOf(size)) + " bytes",
                "a case file may be at most " + MAX_BYTES + " bytes (2 MiB); this does not look like a case file")));
    }

    static Parsed parse(String json, String origin) {
        if (json == null) {
            throw new CaseValidationException(origin, List.of(Problem.missing("$", "expected JSON text")));
        }
        long bytes = json.length() > MAX_BYTES / 4 ? json.getBytes(StandardCharsets.UTF_8).length : json.length();
        if (bytes > MAX_BYTES) {
            throw tooLarge(origin, bytes);
        }
        JsonNode root;
        try {
            root = MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            throw new CaseValidationException(origin, List.of(syntax(e)));
        }
        if (root == null || root.isMissingNode() || !root.isObject()) {
            throw new CaseValidationException(origin, List.of(Problem.of("$",
                    root == null || root.isMissingNode() ? "empty" : Names.shorten(root.toString()),
                    "expected a JSON object { ... } holding a case")));
        }
        Migrations.Migrated m = Migrations.migrate((ObjectNode) root, origin);
        ObjectNode tree = m.tree();
        List<Problem> problems = Structure.check(tree);
        Case kase;
        try {
            kase = MAPPER.treeToValue(tree, Case.class);
        } catch (JsonProcessingException e) {
            // The structural pass should leave nothing for Jackson to refuse; if it does, say where.
            problems.add(binding(e));
            throw new CaseValidationException(origin, problems);
        }
        return new Parsed(origin, kase, problems, m.notes());
    }

    static Problem syntax(JsonProcessingException e) {
        String path = "$";
        if (e instanceof JsonParseException jpe && jpe.getProcessor() != null) {
            path = jsonPath(jpe.getProcessor().getParsingContext());
        }
        String where = e.getLocation() == null ? ""
                : " (line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr() + ")";
        String msg = e.getOriginalMessage();
        if (msg != null && msg.startsWith("Duplicate field")) {
            return Problem.of(path, msg.replaceAll("^Duplicate field '(.*)'$", "$1"),
                    "each field may appear once in an object; this one is repeated" + where);
        }
        String[] fe = jsonSyntax(msg == null ? "" : msg);
        return Problem.of(path, fe[0], fe[1] + where);
    }

    private static final java.util.regex.Pattern UNEXPECTED_CHAR = java.util.regex.Pattern.compile(
            "(?s)Unexpected character \\('(.+?)' \\(code \\d+\\)\\)[^:]*: was expecting (.*)");
    private static final java.util.regex.Pattern NON_STANDARD = java.util.regex.Pattern.compile(
            "(?s)Non-standard token '(.*?)'.*");
    private static final java.util.regex.Pattern UNRECOGNIZED = java.util.regex.Pattern.compile(
            "(?s)Unrecognized token '(.*?)'.*");

    /**
     * The parser's complaint in the user's terms: what was found and what was expected (the parser's
     * own wording names its internals, e.g. character codes and limits by their setting names).
     */
    static String[] jsonSyntax(String msg) {
        String m = msg.strip();
        if (m.startsWith("Unexpected end-of-input")) {
            return new String[] {"end of file", "expected the JSON to go on: the file is cut short (a string, an "
                    + "object { } or an array [ ] is not closed)"};
        }
        if (m.contains("nesting depth")) {
            return new String[] {"nested more than 1000 levels deep", "expected a case nested at most 1000 levels"};
        }
        if (m.startsWith("Trailing token")) {
            return new String[] {"more text after the end", "expected nothing after the closing } of the object "
                    + "(two objects in one file, or a brace too many?)"};
        }
        java.util.regex.Matcher ns = NON_STANDARD.matcher(m);
        if (ns.matches()) {
            return new String[] {ns.group(1), "expected a finite number: JSON has no NaN or Infinity"};
        }
        java.util.regex.Matcher u = UNEXPECTED_CHAR.matcher(m);
        if (u.matches()) {
            String want = u.group(2).strip();
            String expected;
            if (want.startsWith("double-quote to start field name")) {
                expected = "expected a field name in double quotes (a comma too many before it?)";
            } else if (want.startsWith("comma to separate Object entries")) {
                expected = "expected a comma between two fields, or } to close the object";
            } else if (want.startsWith("comma to separate Array entries")) {
                expected = "expected a comma between two items, or ] to close the list";
            } else if (want.startsWith("a colon to separate field name and value")
                    || want.startsWith("colon to separate field name and value")) {
                expected = "expected a colon after the field name";
            } else {
                expected = "expected a JSON value: a number, \"text\" in double quotes, true, false, null, { } or [ ]";
            }
            return new String[] {u.group(1), expected};
        }
        java.util.regex.Matcher t = UNRECOGNIZED.matcher(m);
        if (t.matches()) {
            return new String[] {t.group(1), "expected a JSON value: a number, \"text\" in double quotes, "
                    + "true, false, null, { } or [ ] (text needs its double quotes)"};
        }
        String plain = m.replaceAll(" \\(code \\d+\\)", "").replaceAll("\\(.*?`.*?`.*?\\)", "")
                .replaceAll("\\s+", " ").strip();
        return new String[] {"not valid JSON", plain.isEmpty() ? "expected valid JSON" : plain};
    }

    private static String jsonPath(JsonStreamContext ctx) {
        List<String> parts = new ArrayList<>();
        for (JsonStreamContext c = ctx; c != null && !c.inRoot(); c = c.getParent()) {
            if (c.inArray()) {
                parts.add(0, "[" + Math.max(0, c.getCurrentIndex()) + "]");
            } else if (c.getCurrentName() != null) {
                parts.add(0, Names.child("", c.getCurrentName()));
            }
        }
        return "$" + String.join("", parts);
    }

    private static Problem binding(JsonProcessingException e) {
        String path = "$";
        if (e instanceof JsonMappingException jme) {
            StringBuilder sb = new StringBuilder("$");
            for (JsonMappingException.Reference r : jme.getPath()) {
                if (r.getFieldName() != null) {
                    sb.append(Names.child("", r.getFieldName()));
                } else if (r.getIndex() >= 0) {
                    sb.append('[').append(r.getIndex()).append(']');
                }
            }
            path = sb.toString();
        }
        if (e instanceof UnrecognizedPropertyException upe) {
            List<String> known = new ArrayList<>();
            if (upe.getKnownPropertyIds() != null) {
                upe.getKnownPropertyIds().forEach(o -> known.add(String.valueOf(o)));
            }
            String hint = Names.nearest(upe.getPropertyName(), known).map(n -> "did you mean '" + n + "'? ").orElse("");
            return Problem.of(path, upe.getPropertyName(), "unknown field; " + hint + "fields here: "
                    + String.join(", ", known));
        }
        return Problem.of(path, "?", e.getOriginalMessage());
    }

    // ------------------------------------------------------------------------------ writing

    /** The case as indented JSON text, fields in record order, absent fields left out, final newline. */
    public static String toJson(Case kase) {
        JsonNode tree = tree(kase);
        try {
            return MAPPER.writeValueAsString(tree) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("JSON serialisation failed", e);
        }
    }

    private static JsonNode tree(Case kase) {
        if (kase == null) {
            throw new IllegalArgumentException("no case to write");
        }
        JsonNode tree = MAPPER.valueToTree(kase);
        requireFinite(tree, "$");
        return tree;
    }

    /** Refuses NaN and infinities, which JSON cannot hold and which must never pass silently. */
    private static void requireFinite(JsonNode n, String path) {
        if (n.isNumber() && !Double.isFinite(n.doubleValue())) {
            throw new IllegalArgumentException(path + ": " + n.asText() + " cannot be written; numbers must be finite");
        }
        if (n.isObject()) {
            Iterator<Map.Entry<String, JsonNode>> it = n.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                requireFinite(e.getValue(), Names.child(path, e.getKey()));
            }
        } else if (n.isArray()) {
            for (int i = 0; i < n.size(); i++) {
                requireFinite(n.get(i), Names.index(path, i));
            }
        }
    }

    /**
     * Writes the case atomically: serialised first (a case that cannot be serialised touches no
     * file), written to a temporary file in the target's folder, forced to disk, then moved over
     * the target with {@link StandardCopyOption#ATOMIC_MOVE}, or with
     * {@link StandardCopyOption#REPLACE_EXISTING} where the file system cannot move atomically.
     *
     * @throws UncheckedIOException     when the file cannot be written (the old file is left as it was)
     * @throws IllegalArgumentException when the case holds a number JSON cannot represent
     */
    public static void write(Case kase, Path target) {
        writeText(toJson(kase), target);
    }

    /** Writes text atomically, as {@link #write(Case, Path)} does. */
    public static void writeText(String text, Path target) {
        try {
            org.ventcase.common.AtomicFiles.writeText(text, target);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + target + ": " + org.ventcase.common.FileErrors.reason(e), e);
        }
    }

    // ------------------------------------------------------------------------------ hashing

    /**
     * The canonical JSON of a case: object keys sorted (by UTF-16 code unit), no whitespace
     * outside strings, absent fields left out, strings escaped as Jackson writes them, numbers as
     * the shortest decimal that reads back to the same double, without exponent and without
     * trailing zeros ({@code 1.0} is {@code 1}, {@code 0.9750} is {@code 0.975}). Two files that
     * differ only in key order, whitespace or number spelling give the same text.
     */
    public static String normalise(Case kase) {
        StringBuilder sb = new StringBuilder();
        canonical(tree(kase), sb);
        return sb.toString();
    }

    /** SHA-256 of the UTF-8 bytes of {@link #normalise(Case)}, lower-case hex (64 characters). */
    public static String inputHash(Case kase) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            return HexFormat.of().formatHex(md.digest(normalise(kase).getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    private static void canonical(JsonNode n, StringBuilder sb) {
        if (n.isObject()) {
            Map<String, JsonNode> sorted = new TreeMap<>();
            n.fields().forEachRemaining(e -> sorted.put(e.getKey(), e.getValue()));
            sb.append('{');
            boolean first = true;
            for (Map.Entry<String, JsonNode> e : sorted.entrySet()) {
                if (!first) {
                    sb.append(',');
                }
                first = false;
                string(e.getKey(), sb);
                sb.append(':');
                canonical(e.getValue(), sb);
            }
            sb.append('}');
        } else if (n.isArray()) {
            sb.append('[');
            for (int i = 0; i < n.size(); i++) {
                if (i > 0) {
                    sb.append(',');
                }
                canonical(n.get(i), sb);
            }
            sb.append(']');
        } else if (n.isTextual()) {
            string(n.textValue(), sb);
        } else if (n.isIntegralNumber()) {
            sb.append(n.bigIntegerValue().toString());
        } else if (n.isNumber()) {
            sb.append(number(n.doubleValue()));
        } else if (n.isBoolean()) {
            sb.append(n.booleanValue());
        } else {
            sb.append("null");
        }
    }

    /** Shortest round-trip decimal, plain notation, no trailing zeros. */
    static String number(double d) {
        if (!Double.isFinite(d)) {
            throw new IllegalArgumentException("numbers must be finite: " + d);
        }
        BigDecimal b = new BigDecimal(Double.toString(d)).stripTrailingZeros();
        return b.signum() == 0 ? "0" : b.toPlainString();
    }

    private static void string(String s, StringBuilder sb) {
        try {
            sb.append(MAPPER.writeValueAsString(s));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("string serialisation failed", e);
        }
    }
}
