package org.ventcase.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.ventcase.units.Dimension;

/** case.schema.json: valid draft 2020-12, accepts every template and demo case, matches the records. */
class SchemaTest {

    static JsonNode schemaNode;
    static Schema schema;

    @BeforeAll
    static void load() throws IOException {
        try (InputStream in = SchemaTest.class.getResourceAsStream("/org/ventcase/casefile/case.schema.json")) {
            schemaNode = new ObjectMapper().readTree(in);
        }
        schema = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12).getSchema(schemaNode);
    }

    private static List<Error> errors(String json) {
        return schema.validate(json, InputFormat.JSON);
    }

    private static List<Path> caseFiles() throws IOException {
        List<Path> out = new ArrayList<>();
        for (Path d : List.of(Path.of("templates", "cases"), Path.of("demo-cases"))) {
            if (Files.isDirectory(d)) {
                try (Stream<Path> s = Files.list(d)) {
                    s.filter(p -> p.toString().endsWith(".json")).sorted().forEach(out::add);
                }
            }
        }
        return out;
    }

    @Test
    void everyTemplateAndDemoCaseValidatesAgainstTheSchema() throws IOException {
        List<Path> files = caseFiles();
        assertTrue(files.size() >= Templates.CASES.size(), files.toString());
        for (Path f : files) {
            List<Error> e = errors(Files.readString(f));
            assertTrue(e.isEmpty(), f + ": " + e);
        }
    }

    @Test
    void schemaRefusesWhatTheLoaderRefuses() {
        String ok = Fixtures.template("horizontal-bullet");
        assertTrue(errors(ok).isEmpty());
        assertFalse(errors(ok.replace("\"insideDiameter\": \"3.2 m\"", "\"insideDiameter\": 3.2")).isEmpty(), "bare number");
        assertFalse(errors(ok.replace("\"insideDiameter\": \"3.2 m\"", "\"insideDiameter\": \"3.2\"")).isEmpty(), "no unit");
        assertFalse(errors(ok.replace("\"17.2 barg\",\n    \"mawp\"", "\"17.2 bar\",\n    \"mawp\"")).isEmpty(),
                "pressure without gauge or absolute");
        assertFalse(errors(ok.replace("\"heads\": \"2:1\"", "\"heads\": \"2:1\", \"head\": \"flat\"")).isEmpty(), "unknown");
        assertFalse(errors(ok.replace("\"environmentFactor\": \"bare\"",
                "\"environmentFactor\": \"bare\", \"heatInput\": \"20 kW\"")).isEmpty(), "field of another scenario type");
        assertFalse(errors(ok.replace("\"inflow\": \"45000 kg/h\",", "")).isEmpty(), "scenario without its data");
        assertFalse(errors(ok.replace("\"schemaVersion\": 1", "\"schemaVersion\": 2")).isEmpty(), "newer version");
    }

    /** Resolves a local $ref. */
    private static JsonNode deref(JsonNode n) {
        while (n.has("$ref")) {
            String ref = n.get("$ref").asText();
            assertTrue(ref.startsWith("#/$defs/"), ref);
            n = schemaNode.get("$defs").get(ref.substring("#/$defs/".length()));
        }
        return n;
    }

    private static void compare(Class<?> record, JsonNode obj, String path) {
        obj = deref(obj);
        assertEquals("object", obj.get("type").asText(), path);
        assertFalse(obj.get("additionalProperties").asBoolean(true), path + " must refuse unknown fields");
        Set<String> schemaFields = new TreeSet<>();
        obj.get("properties").fieldNames().forEachRemaining(schemaFields::add);
        assertEquals(new TreeSet<>(Structure.fieldNames(record)), schemaFields, path);
        for (RecordComponent rc : record.getRecordComponents()) {
            JsonNode prop = deref(obj.get("properties").get(rc.getName()));
            String p = path + "." + rc.getName();
            Type t = rc.getGenericType();
            if (t == String.class) {
                assertEquals("string", prop.get("type").asText(), p);
                Quantity q = rc.getAnnotation(Quantity.class);
                if (q != null) {
                    Pattern pattern = Pattern.compile(prop.get("pattern").asText());
                    assertFalse(pattern.matcher("3.2").find(), p + ": a bare number must fail the pattern");
                    if (q.value() == Dimension.PRESSURE) {
                        assertFalse(pattern.matcher("17.2 bar").find(), p + ": a pressure must say gauge or absolute");
                        assertTrue(pattern.matcher("17.2 barg").find(), p);
                    }
                }
            } else if (t == Double.class) {
                assertEquals("number", prop.get("type").asText(), p);
            } else if (t == Integer.class) {
                assertEquals("integer", prop.get("type").asText(), p);
            } else if (t == Boolean.class) {
                assertEquals("boolean", prop.get("type").asText(), p);
            } else if (t instanceof ParameterizedType pt) {
                assertEquals("array", prop.get("type").asText(), p);
                Type el = pt.getActualTypeArguments()[0];
                if (el instanceof Class<?> c && c.isRecord()) {
                    compare(c, prop.get("items"), p + "[]");
                } else {
                    assertEquals("number", prop.get("items").get("type").asText(), p);
                }
            } else {
                compare((Class<?>) t, prop, p);
            }
        }
    }

    @Test
    void everyRecordFieldIsInTheSchemaAndNothingElse() {
        compare(Case.class, schemaNode, "$");
    }

    @Test
    void scenarioTypeFieldListsMatchTheSchema() {
        JsonNode all = schemaNode.get("$defs").get("scenario").get("allOf");
        assertEquals(ScenarioType.values().length, all.size());
        for (JsonNode branch : all) {
            ScenarioType t = ScenarioType.byKey(branch.get("if").get("properties").get("type").get("const").asText())
                    .orElseThrow();
            Set<String> allowed = new TreeSet<>();
            branch.get("then").get("propertyNames").get("enum").forEach(n -> allowed.add(n.asText()));
            Set<String> expected = new TreeSet<>(t.fields());
            expected.addAll(ScenarioType.COMMON_FIELDS);
            assertEquals(expected, allowed, t.key());
        }
    }
}
