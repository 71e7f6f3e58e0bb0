package org.ventcase.casefile;

import java.util.OptionalDouble;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.ObjectWriter;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import org.ventcase.review.ReviewQuantity;
import org.ventcase.review.ReviewResult;
import org.ventcase.review.Verdict;

/**
 * The review JSON of {@code ventcase review --json} (documented in docs/review.md and the README).
 * Deterministic like the results JSON: fields in a fixed order, numbers rounded to 6 significant
 * digits in plain notation, SI units in the field names (pressures absolute Pa), "\n" line ends.
 */
public final class ReviewJson {

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN).build();
    private static final ObjectWriter WRITER = MAPPER.writer(new DefaultPrettyPrinter()
            .withObjectIndenter(new DefaultIndenter("  ", "\n")).withArrayIndenter(new DefaultIndenter("  ", "\n")));

    private ReviewJson() {
    }

    /** The review JSON text, final newline included. */
    public static String write(ReviewResult r, String toolVersion) {
        try {
            return WRITER.writeValueAsString(tree(r, toolVersion)) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("JSON serialisation failed", e);
        }
    }

    /** The review as a JSON tree. */
    public static ObjectNode tree(ReviewResult r, String toolVersion) {
        ObjectNode n = MAPPER.createObjectNode();
        ObjectNode tool = n.putObject("tool");
        tool.put("name", ResultsJson.TOOL_NAME);
        tool.put("version", toolVersion);
        n.put("inputHash", r.inputHash());
        n.put("title", r.title());
        n.put("tag", r.tag());
        n.put("source", r.source());
        ObjectNode sc = n.putObject("scenario");
        sc.put("scenario", r.scenarioIndex() + 1);
        sc.put("label", r.scenarioLabel());
        sc.put("type", r.scenarioType());
        sc.put("chosen", r.scenarioChoice());
        ObjectNode counts = n.putObject("summary");
        for (Verdict v : Verdict.values()) {
            counts.put(v.label().replace(' ', '_'), r.count(v));
        }
        ArrayNode rows = n.putArray("rows");
        for (ReviewResult.Row row : r.rows()) {
            rows.add(row(row));
        }
        ArrayNode runs = n.putArray("modelRuns");
        for (ReviewResult.ModelRun m : r.runs()) {
            ObjectNode o = runs.addObject();
            o.put("label", m.label());
            o.put("eos", m.eos().name());
            o.put("densityBasis", m.basis().label());
            o.put("case", m.ofCase());
            ObjectNode vals = o.putObject("values");
            for (ReviewQuantity q : ReviewQuantity.values()) {
                if (q == ReviewQuantity.ORIFICE) {
                    continue;
                }
                Double v = m.values().get(q);
                if (v == null) {
                    vals.putNull(siKey(q));
                } else {
                    vals.put(siKey(q), ResultsJson.round(v));
                }
            }
            if (m.orifice().isPresent()) {
                o.put("orifice", m.orifice().get());
            } else {
                o.putNull("orifice");
            }
            if (m.failure().isPresent()) {
                o.put("failure", m.failure().get());
            } else {
                o.putNull("failure");
            }
        }
        ObjectNode tol = n.putObject("tolerances");
        for (ReviewQuantity q : ReviewQuantity.values()) {
            ObjectNode t = tol.putObject(q.key());
            t.put("kind", q.kind().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
            t.put("value", ResultsJson.round(r.tolerances().of(q)));
            t.put("default", ResultsJson.round(q.defaultTolerance()));
            t.put("reason", q.reason());
        }
        ArrayNode w = n.putArray("warnings");
        r.warnings().forEach(w::add);
        return n;
    }

    /** The SI field name of a quantity's values, e.g. {@code relievingPressure_Pa}. */
    public static String siKey(ReviewQuantity q) {
        return q.key() + switch (q) {
            case RELIEVING_PRESSURE -> "_Pa";
            case RELIEVING_TEMPERATURE -> "_K";
            case MOLAR_MASS -> "_kg_kmol";
            case Z, K, ORIFICE -> "";
            case LATENT_HEAT -> "_J_kg";
            case LIQUID_DENSITY, VAPOUR_DENSITY -> "_kg_m3";
            case HEAT_INPUT -> "_W";
            case WETTED_AREA -> "_m2";
            case RELIEF_LOAD -> "_kg_s";
            case REQUIRED_AREA -> "_m2";
        };
    }

    private static ObjectNode row(ReviewResult.Row row) {
        ReviewQuantity q = row.quantity();
        ObjectNode o = MAPPER.createObjectNode();
        o.put("quantity", q.key());
        o.put("label", q.label());
        o.put("unit", siUnit(q));
        o.put("claimedAsWritten", row.claimedText());
        if (q == ReviewQuantity.ORIFICE) {
            o.put("claimed", row.claimedOrifice().orElse(""));
            if (row.computedOrifice().isPresent()) {
                o.put("computed", row.computedOrifice().get());
            } else {
                o.putNull("computed");
            }
            o.putNull("difference");
            o.putNull("relativeDifference");
        } else {
            num(o, "claimed", row.claimed());
            num(o, "computed", row.computed());
            num(o, "difference", row.difference());
            num(o, "relativeDifference", row.relativeDifference());
        }
        o.put("toleranceKind", q.kind().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        o.put("tolerance", ResultsJson.round(row.tolerance()));
        o.put("verdict", row.verdict().label());
        ObjectNode range = o.putObject("modelRange");
        if (q == ReviewQuantity.ORIFICE) {
            ArrayNode a = range.putArray("orifices");
            row.modelOrifices().forEach(a::add);
        } else {
            num(range, "min", row.modelMin());
            num(range, "max", row.modelMax());
        }
        o.put("withinModelUncertainty", row.withinModelUncertainty());
        ArrayNode hints = o.putArray("hints");
        for (ReviewResult.Hint h : row.hints()) {
            ObjectNode ho = hints.addObject();
            ho.put("code", h.code());
            ho.put("text", h.text());
        }
        if (row.note().isEmpty()) {
            o.putNull("note");
        } else {
            o.put("note", row.note());
        }
        return o;
    }

    private static String siUnit(ReviewQuantity q) {
        return switch (q) {
            case RELIEVING_PRESSURE -> "Pa abs";
            case RELIEVING_TEMPERATURE -> "K";
            case MOLAR_MASS -> "kg/kmol";
            case Z, K -> "1";
            case ORIFICE -> "letter";
            case LATENT_HEAT -> "J/kg";
            case LIQUID_DENSITY, VAPOUR_DENSITY -> "kg/m3";
            case HEAT_INPUT -> "W";
            case WETTED_AREA, REQUIRED_AREA -> "m2";
            case RELIEF_LOAD -> "kg/s";
        };
    }

    private static void num(ObjectNode n, String key, OptionalDouble v) {
        if (v.isPresent()) {
            n.put(key, ResultsJson.round(v.getAsDouble()));
        } else {
            n.putNull(key);
        }
    }
}
