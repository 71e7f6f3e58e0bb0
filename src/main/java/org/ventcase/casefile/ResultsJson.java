package org.ventcase.casefile;

import java.io.IOException;
import java.io.InputStream;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Properties;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.ObjectWriter;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import org.ventcase.calc.CaseResult;
import org.ventcase.common.TraceStep;
import org.ventcase.device.OrificeSelection;
import org.ventcase.inventory.Inventory;
import org.ventcase.relief.RelievedFluid;
import org.ventcase.vessel.LevelState;

/**
 * The results JSON of {@code ventcase calc} (documented in the README, "Results JSON").
 *
 * <p>Deterministic: fields in a fixed order (written in code, never from a hash map), no time
 * stamps, components in the fluid's order, and every number rounded to
 * {@link #SIGNIFICANT_DIGITS} significant digits and printed in plain decimal notation, so the same
 * case gives the same bytes on every run (and the last digits of an iterative solution, which can
 * differ between platforms, do not reach the file). Lines end with "\n". A value the scenario type
 * does not have, or that could not be computed, is {@code null}; a value that could not be computed
 * always has a warning saying why.
 */
public final class ResultsJson {

    /** Significant digits of every number written. */
    public static final int SIGNIFICANT_DIGITS = 6;

    /** The tool's name as written in {@code tool.name}. */
    public static final String TOOL_NAME = "ventcase";

    private static final MathContext ROUND = new MathContext(SIGNIFICANT_DIGITS);
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN).build();
    private static final ObjectWriter WRITER = MAPPER.writer(new DefaultPrettyPrinter()
            .withObjectIndenter(new DefaultIndenter("  ", "\n")).withArrayIndenter(new DefaultIndenter("  ", "\n")));

    private ResultsJson() {
    }

    /** This build's version (from the packaged version.properties), "unknown" when absent. */
    public static String toolVersion() {
        try (InputStream in = ResultsJson.class.getResourceAsStream("/org/ventcase/version.properties")) {
            Properties p = new Properties();
            if (in != null) {
                p.load(in);
            }
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            return "unknown";
        }
    }

    /** The results JSON text, final newline included. */
    public static String write(CaseResult r, String toolVersion) {
        try {
            return WRITER.writeValueAsString(tree(r, toolVersion)) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("JSON serialisation failed", e);
        }
    }

    /** The results as a JSON tree. */
    public static ObjectNode tree(CaseResult r, String toolVersion) {
        ObjectNode n = MAPPER.createObjectNode();
        ObjectNode tool = n.putObject("tool");
        tool.put("name", TOOL_NAME);
        tool.put("version", toolVersion);
        n.put("inputHash", r.inputHash());
        n.put("title", r.title());
        n.put("tag", r.tag());
        if (r.governing().isPresent()) {
            n.put("governingScenario", r.governing().get().label());
        } else {
            n.putNull("governingScenario");
        }
        n.put("governingRule", r.governingRule());
        n.set("vessel", vessel(r.vessel()));
        n.set("inventory", inventory(r.inventory()));
        n.set("model", model(r.inventory().fluid()));
        ArrayNode sc = n.putArray("scenarios");
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            sc.add(scenario(s));
        }
        ArrayNode w = n.putArray("warnings");
        for (CaseResult.CaseWarning cw : r.warnings()) {
            ObjectNode o = w.addObject();
            o.put("message", cw.message());
            ArrayNode tags = o.putArray("scenarios");
            cw.scenarios().forEach(tags::add);
        }
        n.set("inventoryTrace", trace(r.inventory().trace()));
        return n;
    }

    static BigDecimal round(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("a result number is not finite (" + v + "); it must be absent with a "
                    + "warning instead");
        }
        BigDecimal b = new BigDecimal(v).round(ROUND).stripTrailingZeros();
        return b.signum() == 0 ? BigDecimal.ZERO : b;
    }

    private static void num(ObjectNode n, String key, double v) {
        n.put(key, round(v));
    }

    private static void num(ObjectNode n, String key, OptionalDouble v, double scale) {
        if (v.isPresent()) {
            num(n, key, v.getAsDouble() * scale);
        } else {
            n.putNull(key);
        }
    }

    private static ObjectNode vessel(LevelState v) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("description", v.vessel().describe());
        num(n, "totalVolume_m3", v.totalVolume());
        num(n, "liquidVolume_m3", v.liquidVolume());
        num(n, "vaporVolume_m3", v.vapourVolume());
        num(n, "level_m", v.levelM());
        num(n, "levelPercentOfHeight", v.levelPercentHeight());
        num(n, "levelPercentOfVolume", v.levelPercentVolume());
        num(n, "totalInsideArea_m2", v.totalInsideArea());
        num(n, "wettedArea_m2", v.wettedArea());
        num(n, "fireWettedArea_m2", v.fire().area());
        n.put("fireAreaRule", v.fire().ruleApplied());
        return n;
    }

    /**
     * The equation of state as used: {@code eos} (id), {@code name}, {@code reference}, and per
     * component the model's constants, alpha and translation with sources (JsonReports.componentModel).
     */
    private static ObjectNode model(org.ventcase.inventory.Fluid f) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("eos", f.variant().name());
        n.put("name", f.variant().displayName());
        n.put("reference", f.variant().citation());
        ObjectNode comps = n.putObject("components");
        for (org.ventcase.thermo.Component c : f.components()) {
            ObjectNode m = JsonReports.componentModel(c, f.variant());
            // numbers rounded like every other number of this contract
            ObjectNode r = comps.putObject(c.name());
            r.put("Tc_K", round(m.get("Tc_K").asDouble()));
            r.put("Pc_Pa", round(m.get("Pc_Pa").asDouble()));
            r.put("omega", round(m.get("omega").asDouble()));
            r.set("alpha", m.get("alpha"));
            r.set("translation", m.get("translation"));
            r.set("source", m.get("source"));
            r.set("notes", m.get("notes"));
        }
        return n;
    }

    private static ObjectNode inventory(Inventory inv) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("mode", inv.mode().name().toLowerCase(java.util.Locale.ROOT));
        n.put("eos", inv.fluid().variant().displayName());
        n.put("densityBasis", inv.fluid().densityBasis().label());
        num(n, "temperature_K", inv.temperatureK());
        num(n, "pressure_Pa", inv.pressurePa());
        num(n, "liquidMass_kg", inv.liquidMassKg());
        num(n, "vaporMass_kg", inv.vapourMassKg());
        num(n, "totalMass_kg", inv.totalMassKg());
        if (inv.liquid().isPresent()) {
            num(n, "liquidDensity_kg_m3", inv.liquid().get().densityKgM3());
        } else {
            n.putNull("liquidDensity_kg_m3");
        }
        num(n, "vaporDensity_kg_m3", inv.vapour().densityKgM3());
        ObjectNode per = n.putObject("massPerComponent_kg");
        for (Map.Entry<String, Double> e : inv.massPerComponentKg().entrySet()) {
            num(per, e.getKey(), e.getValue());
        }
        if (inv.liquidFull().isPresent()) {
            var lf = inv.liquidFull().get();
            ObjectNode f = n.putObject("liquidFull");
            num(f, "relievingPressure_Pa", lf.relievingPressurePa());
            f.put("fillsBeforeRelief", lf.fillsBeforeRelief());
            num(f, "liquidVolumeAtRelief_m3", lf.liquidVolumeAtReliefM3());
        } else {
            n.putNull("liquidFull");
        }
        return n;
    }

    private static ObjectNode scenario(CaseResult.ScenarioResult s) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("scenario", s.index() + 1);
        n.put("label", s.label());
        n.put("type", s.type().key());
        n.put("governing", s.governing());
        n.put("method", Templates.text("method-" + s.type().key()).map(t -> t.trim().replaceAll("\\s+", " "))
                .orElse(""));
        num(n, "relievingPressure_Pa", s.relievingPressurePa(), 1);
        num(n, "relievingTemperature_K", s.relievingTemperatureK(), 1);
        num(n, "heatInput_W", s.heatInputW(), 1);
        num(n, "latentHeat_J_kg", s.latentHeatJPerKg(), 1);
        num(n, "reliefLoad_kg_h", s.reliefLoadKgPerS(), 3600);
        num(n, "requiredArea_mm2", s.requiredAreaM2(), 1e6);
        n.put("sizingEquation", s.sizingEquation());
        if (s.orifice().isPresent()) {
            OrificeSelection o = s.orifice().get();
            ObjectNode on = n.putObject("orifice");
            on.put("letter", o.orifice().letter());
            num(on, "area_mm2", o.selectedAreaMm2() / o.count());
            on.put("count", o.count());
            num(on, "totalArea_mm2", o.selectedAreaMm2());
            num(on, "margin_percent", o.marginPercent());
        } else {
            n.putNull("orifice");
        }
        if (s.relievedFluid().isPresent()) {
            n.set("relievedFluid", fluid(s.relievedFluid().get()));
        } else {
            n.putNull("relievedFluid");
        }
        ArrayNode curve = n.putArray("loadCurve");
        for (CaseResult.LoadPoint p : s.loadCurve()) {
            ObjectNode o = curve.addObject();
            num(o, "time_s", p.timeS());
            num(o, "temperature_K", p.temperatureK());
            num(o, "reliefLoad_kg_h", p.massFlowKgPerS() * 3600);
            num(o, "requiredArea_mm2", p.requiredAreaM2() * 1e6);
        }
        if (s.failure().isPresent()) {
            n.put("failure", s.failure().get());
        } else {
            n.putNull("failure");
        }
        ArrayNode w = n.putArray("warnings");
        s.warnings().forEach(w::add);
        n.set("trace", trace(s.trace()));
        return n;
    }

    private static ObjectNode fluid(RelievedFluid f) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("phase", f.phase().label());
        num(n, "temperature_K", f.temperatureK());
        num(n, "pressure_Pa", f.pressurePa());
        num(n, "molarMass_kg_kmol", f.molarMass());
        num(n, "Z", f.z());
        num(n, "k", f.kIdeal());
        num(n, "isentropicExponent", f.isentropicExponent());
        num(n, "density_kg_m3", f.density());
        n.put("densityBasis", f.densityBasis().label());
        ObjectNode c = n.putObject("composition");
        double[] x = f.composition();
        List<String> names = f.componentNames();
        for (int i = 0; i < x.length; i++) {
            num(c, names.get(i), x[i]);
        }
        n.put("eos", f.eos().displayName());
        return n;
    }

    private static ArrayNode trace(List<TraceStep> steps) {
        ArrayNode a = MAPPER.createArrayNode();
        for (TraceStep s : steps) {
            ObjectNode o = a.addObject();
            o.put("title", s.title());
            o.put("equation", s.equation());
            o.put("source", s.source());
            ObjectNode in = o.putObject("inputs");
            s.inputs().forEach(in::put);
            ObjectNode out = o.putObject("outputs");
            s.outputs().forEach(out::put);
            ArrayNode notes = o.putArray("notes");
            s.notes().forEach(notes::add);
        }
        return a;
    }
}
