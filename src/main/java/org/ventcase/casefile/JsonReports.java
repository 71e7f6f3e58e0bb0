package org.ventcase.casefile;

import java.util.List;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import org.ventcase.common.TraceStep;
import org.ventcase.inventory.Inventory;
import org.ventcase.inventory.LiquidFullCheck;
import org.ventcase.inventory.PhaseInventory;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.SaturationResult;
import org.ventcase.vessel.LevelState;

/**
 * The JSON contracts of the headless commands (documented in the README under "JSON output").
 * Field names carry their SI unit ({@code temperature_K}, {@code pressure_Pa}); pressures are
 * absolute. Fields are only added between versions, never renamed or removed. A value that could
 * not be computed is written as {@code null} with a warning in {@code warnings} saying why.
 */
public final class JsonReports {

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT);

    private JsonReports() {
    }

    /** Pretty-printed JSON text of a tree, with a final newline. */
    public static String write(ObjectNode node) {
        try {
            return MAPPER.writeValueAsString(node) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("JSON serialisation failed", e);
        }
    }

    static ObjectNode component(Component c) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("name", c.name());
        n.put("formula", c.formula());
        n.put("cas", c.cas());
        n.put("Tc_K", c.tcK());
        n.put("Pc_Pa", c.pcPa());
        n.put("omega", c.omega());
        n.put("molarMass_kg_kmol", c.molarMass());
        n.put("rackettZ", c.rackettZ());
        n.put("source", c.criticalSource());
        n.put("cpSource", c.cp().source());
        n.put("rackettSource", c.rackettSource());
        return n;
    }

    /** The component block with what the model uses for it ({@code model}: constants, alpha, translation). */
    static ObjectNode component(Component c, EosVariant v) {
        ObjectNode n = component(c);
        n.set("model", componentModel(c, v));
        return n;
    }

    /**
     * What the equation of state uses for one component: {@code Tc_K}, {@code Pc_Pa},
     * {@code omega} (the model's own, which a published parameter set may bring), {@code alpha},
     * {@code translation} and {@code source} (of the constants), {@code notes} (fallbacks).
     */
    public static ObjectNode componentModel(Component c, EosVariant v) {
        EosVariant.ComponentModel d = v.describe(c);
        ObjectNode m = MAPPER.createObjectNode();
        m.put("Tc_K", d.constants().tcK());
        m.put("Pc_Pa", d.constants().pcPa());
        m.put("omega", d.constants().omega());
        m.put("alpha", d.alpha());
        m.put("translation", d.translation());
        m.put("source", d.constants().source());
        ArrayNode notes = m.putArray("notes");
        d.notes().forEach(notes::add);
        return m;
    }

    private static void number(ObjectNode n, String key, double v, List<String> warnings, String what) {
        if (Double.isFinite(v)) {
            n.put(key, v);
        } else {
            n.putNull(key);
            if (warnings.stream().noneMatch(w -> w.contains(what))) {
                warnings.add(what + " could not be computed at this state.");
            }
        }
    }

    private static ArrayNode array(double[] values) {
        ArrayNode a = MAPPER.createArrayNode();
        for (double v : values) {
            a.add(v);
        }
        return a;
    }

    private static ArrayNode strings(List<String> values) {
        ArrayNode a = MAPPER.createArrayNode();
        values.forEach(a::add);
        return a;
    }

    private static ObjectNode fill(ObjectNode n, FluidProperties p, Component c, List<String> warnings) {
        n.set("component", component(c, p.variant()));
        n.put("temperature_K", p.temperatureK());
        n.put("pressure_Pa", p.pressurePa());
        n.set("roots", array(p.roots().physical()));
        n.set("rootsBelowCovolume", array(p.roots().rejected()));
        n.put("rootCase", p.roots().rootCase().name());
        n.put("rootChoice", p.rootReason());
        n.put("phase", p.phase().label());
        n.put("phaseCriterion", p.phaseCriterion());
        n.put("Z", p.z());
        n.put("molarVolume_m3_mol", p.molarVolume());
        n.put("molarVolumeCubic_m3_mol", p.molarVolumeCubic());
        n.put("density_kg_m3", p.density());
        n.put("densityBasis", p.densityBasis().label());
        n.put("molarMass_kg_kmol", p.molarMass());
        n.put("fugacityCoefficient", p.fugacityCoefficient(0));
        n.put("residualEnthalpy_J_mol", p.residualEnthalpy());
        n.put("residualEntropy_J_molK", p.residualEntropy());
        n.put("residualGibbs_J_mol", p.residualGibbs());
        n.put("cpIdealGas_J_molK", p.cpIdeal());
        n.put("cp_J_molK", p.cp());
        n.put("cv_J_molK", p.cv());
        n.put("k", p.kReal());
        n.put("kIdealGas", p.kIdeal());
        n.put("isentropicExponent", p.isentropicExponent());
        number(n, "speedOfSound_m_s", p.speedOfSound(), warnings, "Speed of sound");
        n.put("jouleThomson_K_Pa", p.jouleThomson());
        n.set("warnings", strings(warnings));
        return n;
    }

    /** Contract of {@code ventcase props --json} for a pure component. */
    public static ObjectNode props(FluidProperties p, Component c) {
        List<String> warnings = new java.util.ArrayList<>(p.warnings());
        ObjectNode n = MAPPER.createObjectNode();
        n.put("eos", p.variant().name());
        n.put("eosName", p.variant().displayName());
        return fill(n, p, c, warnings);
    }

    /** Contract of {@code ventcase sat --json} for a pure component. */
    public static ObjectNode sat(SaturationResult s) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("eos", s.variant().name());
        n.put("eosName", s.variant().displayName());
        n.set("component", component(s.component(), s.variant()));
        n.put("temperature_K", s.temperatureK());
        n.put("pressure_Pa", s.pressurePa());
        n.set("liquid", phase(s.liquid()));
        n.set("vapor", phase(s.vapor()));
        n.put("latentHeat_J_kg", s.latentHeatJkg());
        n.put("latentHeat_J_mol", s.latentHeatJmol());
        n.put("latentHeatSource", s.latentHeatAnchored() ? s.latentHeatSource() : "equation of state, h_V - h_L");
        n.put("latentHeatCubic_J_mol", s.cubicLatentHeatJmol());
        n.put("rackettLiquidDensity_kg_m3", s.rackettLiquidDensity());
        n.put("iterations", s.iterations());
        n.set("warnings", strings(s.warnings()));
        return n;
    }

    private static ObjectNode phase(SaturationResult.PhaseState p) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("Z", p.z());
        n.put("density_kg_m3", p.density());
        n.put("densityBasis", p.densityBasis().label());
        n.put("molarVolume_m3_mol", p.molarVolume());
        n.put("molarVolumeCubic_m3_mol", p.molarVolumeCubic());
        n.put("fugacityCoefficient", Math.exp(p.lnPhi()));
        n.put("residualEnthalpy_J_mol", p.residualEnthalpy());
        return n;
    }

    /** Contract of {@code ventcase vessel --json}. */
    public static ObjectNode vessel(LevelState s, double bottomElevation, double fireHeight) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("description", s.vessel().describe());
        n.put("totalHeight_m", s.vessel().totalHeight());
        n.put("totalVolume_m3", s.totalVolume());
        n.put("totalInsideArea_m2", s.totalInsideArea());
        ObjectNode level = MAPPER.createObjectNode();
        level.put("height_m", s.levelM());
        level.put("percentOfHeight", s.levelPercentHeight());
        level.put("percentOfVolume", s.levelPercentVolume());
        n.set("level", level);
        n.put("liquidVolume_m3", s.liquidVolume());
        n.put("vaporVolume_m3", s.vapourVolume());
        n.put("wettedArea_m2", s.wettedArea());
        ObjectNode fire = MAPPER.createObjectNode();
        fire.put("bottomElevation_m", bottomElevation);
        fire.put("fireHeight_m", fireHeight);
        fire.put("fireWettedArea_m2", s.fire().area());
        fire.put("effectiveLevel_m", s.fire().effectiveLevel());
        fire.put("ruleApplied", s.fire().ruleApplied());
        n.set("fire", fire);
        n.put("fireWettedArea_m2", s.fire().area());
        s.vessel().outsideArea().ifPresent(a -> n.put("totalOutsideArea_m2", a));
        return n;
    }

    // ---------------------------------------------------------------- mixtures

    private static ObjectNode fractions(java.util.List<Component> comps, double[] x) {
        ObjectNode n = MAPPER.createObjectNode();
        for (int i = 0; i < x.length; i++) {
            n.put(comps.get(i).name(), x[i]);
        }
        return n;
    }

    private static void fluidBlock(ObjectNode n, org.ventcase.thermo.mix.MixtureModel mm, double[] feed) {
        n.put("eos", mm.model().variant().name());
        n.put("eosName", mm.model().variant().displayName());
        ArrayNode comps = MAPPER.createArrayNode();
        for (Component c : mm.model().components()) {
            comps.add(component(c, mm.model().variant()));
        }
        n.set("components", comps);
        n.set("feed", fractions(mm.model().components(), feed));
        ArrayNode k = MAPPER.createArrayNode();
        ArrayNode ks = MAPPER.createArrayNode();
        double[][] kij = mm.kij().kij();
        String[][] src = mm.kij().sources();
        for (int i = 0; i < kij.length; i++) {
            k.add(array(kij[i]));
            ArrayNode row = MAPPER.createArrayNode();
            for (String x : src[i]) {
                row.add(x == null ? "" : x);
            }
            ks.add(row);
        }
        n.set("kij", k);
        n.set("kijSources", ks);
    }

    /** Contract of {@code ventcase flash --json}. */
    public static ObjectNode flash(org.ventcase.thermo.mix.MixtureModel mm, org.ventcase.thermo.mix.FlashResult f) {
        ObjectNode n = MAPPER.createObjectNode();
        fluidBlock(n, mm, f.feed());
        n.put("temperature_K", f.temperatureK());
        n.put("pressure_Pa", f.pressurePa());
        n.put("vaporFraction", f.vaporFraction());
        n.put("stable", f.stability().stable());
        n.put("minimumTangentPlaneDistance", f.stability().minimumTpd());
        n.put("enthalpy_J_mol", f.enthalpyJmol());
        n.put("entropy_J_molK", f.entropyJmolK());
        n.put("molarMass_kg_kmol", f.molarMass());
        ArrayNode phases = MAPPER.createArrayNode();
        for (org.ventcase.thermo.mix.MixturePhase ph : f.phases()) {
            ObjectNode p = MAPPER.createObjectNode();
            p.put("phase", ph.label().label());
            p.put("phaseCriterion", ph.labelCriterion());
            p.put("moleFraction", ph.amount());
            p.set("composition", fractions(mm.model().components(), ph.composition()));
            p.put("Z", ph.z());
            p.put("density_kg_m3", ph.density());
            p.put("densityBasis", ph.densityBasis().label());
            p.put("densityCubic_kg_m3", ph.densityCubic());
            p.put("molarVolume_m3_mol", ph.molarVolume());
            p.put("molarMass_kg_kmol", ph.molarMass());
            p.put("enthalpy_J_mol", ph.enthalpyJmol());
            p.put("entropy_J_molK", ph.entropyJmolK());
            phases.add(p);
        }
        n.set("phases", phases);
        n.put("method", f.method());
        java.util.List<String> w = new java.util.ArrayList<>(mm.kij().warnings());
        w.addAll(f.warnings());
        n.set("warnings", strings(w));
        return n;
    }

    /** Contract of {@code ventcase sat --json} for a mixture (bubble or dew point). */
    public static ObjectNode saturationPoint(org.ventcase.thermo.mix.MixtureModel mm,
                                             org.ventcase.thermo.mix.SaturationPoint s) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("kind", s.kind().name().toLowerCase(java.util.Locale.ROOT));
        fluidBlock(n, mm, s.feed());
        n.put("temperature_K", s.temperatureK());
        n.put("pressure_Pa", s.pressurePa());
        n.set("incipientComposition", fractions(mm.model().components(), s.incipientComposition()));
        n.set("kValues", fractions(mm.model().components(), s.kValues()));
        n.put("iterations", s.iterations());
        java.util.List<String> w = new java.util.ArrayList<>(mm.kij().warnings());
        w.addAll(s.warnings());
        n.set("warnings", strings(w));
        return n;
    }

    private static ObjectNode statePoint(org.ventcase.thermo.mix.PhaseEnvelope.StatePoint p) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("temperature_K", p.temperatureK());
        n.put("pressure_Pa", p.pressurePa());
        n.put("method", p.method());
        return n;
    }

    /** Contract of {@code ventcase envelope --json}. */
    public static ObjectNode envelope(org.ventcase.thermo.mix.MixtureModel mm, double[] feed,
                                      org.ventcase.thermo.mix.PhaseEnvelope.Result r) {
        ObjectNode n = MAPPER.createObjectNode();
        fluidBlock(n, mm, feed);
        ArrayNode pts = MAPPER.createArrayNode();
        for (org.ventcase.thermo.mix.PhaseEnvelope.Point p : r.points()) {
            ObjectNode o = MAPPER.createObjectNode();
            o.put("branch", p.branch().name().toLowerCase(java.util.Locale.ROOT));
            o.put("temperature_K", p.temperatureK());
            o.put("pressure_Pa", p.pressurePa());
            o.put("vaporFraction", p.vaporFraction());
            pts.add(o);
        }
        n.set("points", pts);
        java.util.List<String> w = new java.util.ArrayList<>(mm.kij().warnings());
        w.addAll(r.warnings());
        if (r.criticalPoint().isPresent()) {
            n.set("criticalPoint", statePoint(r.criticalPoint().get()));
        } else {
            n.putNull("criticalPoint");
            w.add("The critical point was not located on the traced curve.");
        }
        n.set("cricondenbar", statePoint(r.cricondenbar()));
        n.set("cricondentherm", statePoint(r.cricondentherm()));
        n.set("warnings", strings(w));
        return n;
    }
    /**
     * Contract of {@code ventcase inventory --json}: the fluid model, the storage state, the vessel
     * block (as {@code vessel --json}), each phase, totals, the liquid-full check, the trace and the
     * warnings. A phase that does not exist (the liquid of a gas-filled vessel) and a figure not
     * computed are {@code null}.
     */
    public static ObjectNode inventory(Inventory inv) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("mode", inv.mode().label());
        n.put("eos", inv.fluid().variant().name());
        n.put("eosName", inv.fluid().variant().displayName());
        n.put("densityBasis", inv.fluid().densityBasis().label());
        n.put("temperature_K", inv.temperatureK());
        n.put("pressure_Pa", inv.pressurePa());
        n.set("composition", fractions(inv.fluid().composition().asMap()));
        ArrayNode comps = MAPPER.createArrayNode();
        inv.fluid().components().forEach(c -> comps.add(component(c, inv.fluid().variant())));
        n.set("components", comps);
        ArrayNode kij = MAPPER.createArrayNode();
        double[][] k = inv.fluid().kij().kij();
        String[][] src = inv.fluid().kij().sources();
        List<Component> cs = inv.fluid().components();
        for (int i = 0; i < cs.size(); i++) {
            for (int j = i + 1; j < cs.size(); j++) {
                ObjectNode e = MAPPER.createObjectNode();
                e.put("first", cs.get(i).name());
                e.put("second", cs.get(j).name());
                e.put("kij", k[i][j]);
                e.put("source", src[i][j]);
                kij.add(e);
            }
        }
        n.set("kij", kij);
        n.set("vessel", vessel(inv.vessel(), inv.exposure().bottomElevation(), inv.exposure().fireHeight()));
        if (inv.liquid().isPresent()) {
            n.set("liquid", phase(inv.liquid().get()));
        } else {
            n.putNull("liquid");
        }
        n.set("vapor", phase(inv.vapour()));
        ObjectNode tot = MAPPER.createObjectNode();
        tot.put("mass_kg", inv.totalMassKg());
        tot.put("moles_mol", inv.totalMoles());
        tot.put("liquidMass_kg", inv.liquidMassKg());
        tot.put("vaporMass_kg", inv.vapourMassKg());
        tot.set("massPerComponent_kg", fractions(inv.massPerComponentKg()));
        n.set("totals", tot);
        if (inv.rackettLiquidDensity().isPresent()) {
            n.put("rackettLiquidDensity_kg_m3", inv.rackettLiquidDensity().getAsDouble());
        } else {
            n.putNull("rackettLiquidDensity_kg_m3");
        }
        if (inv.liquidFull().isPresent()) {
            LiquidFullCheck c = inv.liquidFull().get();
            ObjectNode f = MAPPER.createObjectNode();
            f.put("relievingPressure_Pa", c.relievingPressurePa());
            f.put("relievingTemperature_K", c.relievingTemperatureK());
            f.put("liquidDensityAtRelief_kg_m3", c.liquidDensityAtReliefKgM3());
            f.put("densityBasis", c.densityBasis().label());
            f.put("liquidVolumeAtRelief_m3", c.liquidVolumeAtReliefM3());
            f.put("vesselVolume_m3", c.vesselVolumeM3());
            f.put("fillsBeforeRelief", c.fillsBeforeRelief());
            if (c.liquidFullTemperatureK().isPresent()) {
                f.put("liquidFullTemperature_K", c.liquidFullTemperatureK().getAsDouble());
            } else {
                f.putNull("liquidFullTemperature_K");
            }
            f.put("method", c.method());
            n.set("liquidFull", f);
        } else {
            n.putNull("liquidFull");
        }
        n.set("trace", trace(inv.trace()));
        n.set("warnings", strings(inv.warnings()));
        return n;
    }

    private static ObjectNode phase(PhaseInventory p) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("volume_m3", p.volumeM3());
        n.put("density_kg_m3", p.densityKgM3());
        n.put("densityBasis", p.densityBasis().label());
        n.put("Z", p.z());
        n.put("mass_kg", p.massKg());
        n.put("moles_mol", p.moles());
        n.put("molarMass_kg_kmol", p.molarMassKgKmol());
        n.set("composition", fractions(p.composition().asMap()));
        n.set("massPerComponent_kg", fractions(p.massPerComponentKg()));
        return n;
    }

    private static ObjectNode fractions(java.util.Map<String, Double> m) {
        ObjectNode n = MAPPER.createObjectNode();
        m.forEach(n::put);
        return n;
    }

    private static ArrayNode trace(List<TraceStep> steps) {
        ArrayNode a = MAPPER.createArrayNode();
        for (TraceStep s : steps) {
            ObjectNode n = MAPPER.createObjectNode();
            n.put("title", s.title());
            n.put("equation", s.equation());
            n.put("source", s.source());
            ObjectNode in = MAPPER.createObjectNode();
            s.inputs().forEach(in::put);
            n.set("inputs", in);
            ObjectNode out = MAPPER.createObjectNode();
            s.outputs().forEach(out::put);
            n.set("outputs", out);
            n.set("notes", strings(s.notes()));
            a.add(n);
        }
        return a;
    }
}
