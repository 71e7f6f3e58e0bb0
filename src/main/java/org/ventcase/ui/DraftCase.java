package org.ventcase.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.ventcase.casefile.Case;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseValidationException;
import org.ventcase.casefile.ValidationReport;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * A case being edited, held as the case file's own JSON tree so that every field is addressed by
 * the same JSON path the validator uses in its problems ({@code $.vessel.insideDiameter},
 * {@code $.scenarios[1].inflow}). Text is stored exactly as typed; nothing is converted. A blank
 * value removes the field, as a case file would leave it out. Not thread-safe: the view-model owns
 * one and works on it on one thread. No JavaFX.
 */
public final class DraftCase {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private ObjectNode root;

    private DraftCase(ObjectNode root) {
        this.root = root;
    }

    /** An empty case of the current layout: only the schema version. */
    public static DraftCase empty() {
        ObjectNode n = JsonNodeFactory.instance.objectNode();
        n.put("schemaVersion", org.ventcase.casefile.Migrations.CURRENT);
        return new DraftCase(n);
    }

    /** A draft holding {@code kase}. */
    public static DraftCase of(Case kase) {
        return fromJson(CaseFiles.toJson(kase));
    }

    /** A draft from JSON text already in the current layout (e.g. a snapshot). */
    public static DraftCase fromJson(String json) {
        try {
            JsonNode n = MAPPER.readTree(json);
            if (!(n instanceof ObjectNode o)) {
                throw new IllegalArgumentException("a case is a JSON object");
            }
            return new DraftCase(o);
        } catch (JsonProcessingException e) {
            throw new IllegalArgumentException("not JSON: " + e.getOriginalMessage(), e);
        }
    }

    /** The draft as compact JSON text (a snapshot for undo and autosave). */
    public String json() {
        return root.toString();
    }

    /** Replaces the whole draft by a snapshot. */
    public void restore(String json) {
        root = fromJson(json).root;
    }

    /** The draft bound to case records; structural problems (e.g. a field a scenario does not use) throw. */
    public Case toCase() {
        return CaseFiles.read(json(), "wizard");
    }

    /** Every problem of structure and meaning, as {@code ventcase check} reports them. */
    public ValidationReport check(String origin) {
        return CaseFiles.check(json(), origin);
    }

    /** True when the draft binds to case records (only such a draft can be written as a case file). */
    public boolean bindable() {
        try {
            toCase();
            return true;
        } catch (CaseValidationException e) {
            return false;
        }
    }

    // ------------------------------------------------------------------------------ paths

    /** One step of a path: an object key or an array index. */
    record Step(String key, int index) {
        boolean isIndex() {
            return key == null;
        }
    }

    static List<Step> parse(String path) {
        if (path == null || !path.startsWith("$")) {
            throw new IllegalArgumentException("a path starts with $: " + path);
        }
        List<Step> out = new ArrayList<>();
        int i = 1;
        while (i < path.length()) {
            char c = path.charAt(i);
            if (c == '.') {
                int j = i + 1;
                while (j < path.length() && path.charAt(j) != '.' && path.charAt(j) != '[') {
                    j++;
                }
                out.add(new Step(path.substring(i + 1, j), -1));
                i = j;
            } else if (c == '[') {
                int j = path.indexOf(']', i);
                out.add(new Step(null, Integer.parseInt(path.substring(i + 1, j))));
                i = j + 1;
            } else {
                throw new IllegalArgumentException("bad path " + path);
            }
        }
        return out;
    }

    /** The node at {@code path}, or empty. */
    public Optional<JsonNode> node(String path) {
        JsonNode n = root;
        for (Step s : parse(path)) {
            n = s.isIndex() ? n.get(s.index()) : n.get(s.key());
            if (n == null || n.isNull()) {
                return Optional.empty();
            }
        }
        return Optional.of(n);
    }

    /** The text at {@code path} ("" when absent); numbers and booleans as JSON writes them. */
    public String text(String path) {
        return node(path).filter(JsonNode::isValueNode).map(JsonNode::asText).orElse("");
    }

    /** The boolean at {@code path}, or {@code dflt} when absent. */
    public boolean bool(String path, boolean dflt) {
        return node(path).filter(JsonNode::isBoolean).map(JsonNode::booleanValue).orElse(dflt);
    }

    /** Number of elements of the array at {@code path} (0 when absent). */
    public int size(String path) {
        return node(path).filter(JsonNode::isArray).map(JsonNode::size).orElse(0);
    }

    /** Sets text at {@code path}, creating parents; blank removes the field. */
    public void setText(String path, String value) {
        if (value == null || value.isBlank()) {
            remove(path);
            return;
        }
        put(path, JsonNodeFactory.instance.textNode(value));
    }

    /** Sets a number at {@code path}; {@code null} removes it. */
    public void setNumber(String path, Double value) {
        if (value == null) {
            remove(path);
            return;
        }
        put(path, JsonNodeFactory.instance.numberNode(value));
    }

    /** Sets a boolean at {@code path}; {@code null} removes it. */
    public void setBool(String path, Boolean value) {
        if (value == null) {
            remove(path);
            return;
        }
        put(path, JsonNodeFactory.instance.booleanNode(value));
    }

    /** Appends an empty object to the array at {@code path} (created when absent); returns its index. */
    public int append(String path) {
        ArrayNode a = array(path);
        a.addObject();
        return a.size() - 1;
    }

    /** Removes element {@code index} of the array at {@code path}. */
    public void removeAt(String path, int index) {
        node(path).filter(JsonNode::isArray).map(n -> (ArrayNode) n).ifPresent(a -> {
            if (index >= 0 && index < a.size()) {
                a.remove(index);
            }
        });
    }

    /** Removes the field at {@code path}; parents left empty are removed too. */
    public void remove(String path) {
        List<Step> steps = parse(path);
        if (steps.isEmpty()) {
            return;
        }
        List<JsonNode> chain = new ArrayList<>();
        JsonNode n = root;
        chain.add(n);
        for (int i = 0; i < steps.size() - 1; i++) {
            Step s = steps.get(i);
            n = s.isIndex() ? n.get(s.index()) : n.get(s.key());
            if (n == null) {
                return;
            }
            chain.add(n);
        }
        Step last = steps.get(steps.size() - 1);
        if (n instanceof ObjectNode o && !last.isIndex()) {
            o.remove(last.key());
        }
        // drop objects emptied by the removal (not arrays or array elements: a scenario or a component stays)
        for (int i = steps.size() - 1; i >= 1; i--) {
            JsonNode child = chain.get(i);
            Step s = steps.get(i - 1);
            if (child instanceof ObjectNode o && o.isEmpty() && !s.isIndex() && chain.get(i - 1) instanceof ObjectNode p
                    && (i < 2 || !steps.get(i - 2).isIndex())) {
                p.remove(s.key());
            } else {
                break;
            }
        }
    }

    private ArrayNode array(String path) {
        JsonNode existing = node(path).orElse(null);
        if (existing instanceof ArrayNode a) {
            return a;
        }
        ArrayNode a = JsonNodeFactory.instance.arrayNode();
        put(path, a);
        return a;
    }

    private void put(String path, JsonNode value) {
        List<Step> steps = parse(path);
        JsonNode n = root;
        for (int i = 0; i < steps.size() - 1; i++) {
            Step s = steps.get(i);
            Step next = steps.get(i + 1);
            JsonNode child = s.isIndex() ? n.get(s.index()) : n.get(s.key());
            if (child == null || child.isNull()) {
                if (s.isIndex()) {
                    throw new IllegalArgumentException("no element " + s.index() + " in " + path);
                }
                child = next.isIndex() ? ((ObjectNode) n).putArray(s.key()) : ((ObjectNode) n).putObject(s.key());
            }
            n = child;
        }
        Step last = steps.get(steps.size() - 1);
        if (last.isIndex()) {
            ((ArrayNode) n).set(last.index(), value);
        } else {
            ((ObjectNode) n).set(last.key(), value);
        }
    }
}
