package org.ventcase.casefile;

import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import org.ventcase.units.Dimension;
import org.ventcase.units.Units;

/**
 * The structural pass over a parsed case file, before binding to the {@link Case} records: every
 * field name is checked against the record it belongs to (an unknown one is reported with the
 * nearest known name) and every value against the JSON type its record component expects (text,
 * number, integer, true/false, list, object). All problems are collected; each offending field
 * is removed from the tree so that binding can go on and the later checks can still report
 * problems elsewhere in the file.
 */
final class Structure {

    private Structure() {
    }

    /** Checks {@code root} as a {@link Case}; returns the problems found and prunes the tree. */
    static List<Problem> check(ObjectNode root) {
        List<Problem> out = new ArrayList<>();
        object(root, Case.class, "$", out);
        return out;
    }

    /** The field names of a record class, in declaration order. */
    static List<String> fieldNames(Class<?> record) {
        List<String> names = new ArrayList<>();
        for (RecordComponent rc : record.getRecordComponents()) {
            names.add(rc.getName());
        }
        return names;
    }

    private static void object(ObjectNode node, Class<?> record, String path, List<Problem> out) {
        RecordComponent[] comps = record.getRecordComponents();
        Set<String> known = new LinkedHashSet<>(fieldNames(record));
        List<String> names = new ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        for (String name : names) {
            String p = Names.child(path, name);
            if (!known.contains(name)) {
                String hint = Names.nearest(name, known).map(n -> "did you mean '" + n + "'? ").orElse("");
                JsonNode given = node.get(name);
                out.add(Problem.of(p, Names.shorten(given.isTextual() ? given.textValue() : given.toString()),
                        "unknown field; " + hint + "fields here: " + String.join(", ", known)));
                node.remove(name);
                continue;
            }
            RecordComponent rc = null;
            for (RecordComponent c : comps) {
                if (c.getName().equals(name)) {
                    rc = c;
                }
            }
            if (!value(node.get(name), rc.getGenericType(), rc.getAnnotation(Quantity.class), p, out)) {
                node.remove(name);
            }
        }
    }

    /** Returns false when the value is unusable (the caller removes it). */
    private static boolean value(JsonNode v, Type type, Quantity q, String path, List<Problem> out) {
        if (v.isNull()) {
            out.add(Problem.of(path, "null", "null is not accepted; leave the field out or give a value"));
            return false;
        }
        if (type == String.class) {
            if (v.isTextual()) {
                return true;
            }
            if (q != null && v.isNumber()) {
                out.add(Problem.of(path, v.asText(), "a bare number is refused: write the " + what(q)
                        + " as text with its unit, e.g. " + example(q.value())));
            } else {
                out.add(Problem.of(path, Names.shorten(v.toString()), "expected text"
                        + (q != null ? ": the " + what(q) + " with its unit, e.g. " + example(q.value()) : "")));
            }
            return false;
        }
        if (type == Integer.class) {
            if (v.isIntegralNumber() && v.canConvertToInt()) {
                return true;
            }
            out.add(Problem.of(path, Names.shorten(v.toString()), "expected a whole number, e.g. 1"));
            return false;
        }
        if (type == Double.class) {
            if (v.isNumber()) {
                return true;
            }
            out.add(Problem.of(path, Names.shorten(v.toString()),
                    "expected a number (dimensionless), written without quotes, e.g. 0.975"));
            return false;
        }
        if (type == Boolean.class) {
            if (v.isBoolean()) {
                return true;
            }
            out.add(Problem.of(path, Names.shorten(v.toString()), "expected true or false, without quotes"));
            return false;
        }
        if (type instanceof ParameterizedType pt && pt.getRawType() == List.class) {
            if (!v.isArray()) {
                out.add(Problem.of(path, Names.shorten(v.toString()), "expected a list [ ... ]"));
                return false;
            }
            Type element = pt.getActualTypeArguments()[0];
            boolean ok = true;
            ArrayNode a = (ArrayNode) v;
            for (int i = 0; i < a.size(); i++) {
                ok &= value(a.get(i), element, null, Names.index(path, i), out);
            }
            return ok;
        }
        if (type instanceof Class<?> c && c.isRecord()) {
            if (!v.isObject()) {
                out.add(Problem.of(path, Names.shorten(v.toString()), "expected an object { ... } with the fields "
                        + String.join(", ", fieldNames(c))));
                return false;
            }
            object((ObjectNode) v, c, path, out);
            return true;
        }
        throw new IllegalStateException("case-file record component of unsupported type " + type);
    }

    private static String what(Quantity q) {
        return q.value().word() + (q.alsoAccepts().isEmpty() ? "" : " (or " + q.alsoAccepts() + ")");
    }

    static String example(Dimension d) {
        return Units.example(d);
    }
}
