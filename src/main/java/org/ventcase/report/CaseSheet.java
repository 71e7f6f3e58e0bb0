package org.ventcase.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.ventcase.calc.CaseInput;
import org.ventcase.calc.CaseResult;
import org.ventcase.calc.ScenarioKey;
import org.ventcase.common.TraceStep;
import org.ventcase.device.OrificeSelection;
import org.ventcase.device.ViscosityCorrection;
import org.ventcase.inventory.Inventory;
import org.ventcase.inventory.PhaseInventory;
import org.ventcase.inventory.Storage;
import org.ventcase.relief.DeviceCount;
import org.ventcase.relief.DeviceSpec;
import org.ventcase.relief.EnvironmentFactor;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.FireLoadCurve;
import org.ventcase.relief.InflowRate;
import org.ventcase.relief.RelievedFluid;
import org.ventcase.relief.RelievingPressureInput;
import org.ventcase.report.DisplayUnits.Kind;
import org.ventcase.report.SheetModel.Row;
import org.ventcase.report.SheetModel.Table;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.mix.KijTable;
import org.ventcase.thermo.mix.PhaseEnvelope;
import org.ventcase.vessel.LevelState;
import org.ventcase.vessel.Vessel;

/**
 * Maps a whole case ({@link CaseResult} with the {@link CaseInput} it came from) to a
 * {@link SheetModel}. Every number printed is a field of the result, of its trace, or of the
 * input; this class chooses what to print and formats it through {@link DisplayUnits}. Reached
 * through {@link SheetModels#from(CaseResult, CaseInput, SheetIdentity, UnitSystem)}.
 */
final class CaseSheet {

    /** Printed in place of a number a scenario type does not have or could not compute. */
    static final String NONE = "\u2013";

    private final CaseResult r;
    private final CaseInput in;
    private final SheetIdentity id;
    private final UnitSystem units;
    private final DisplayUnits u;

    CaseSheet(CaseResult r, CaseInput in, SheetIdentity id, UnitSystem units) {
        this.r = r;
        this.in = in;
        this.id = id;
        this.units = units;
        this.u = new DisplayUnits(units);
    }

    SheetModel model() {
        List<SheetModel.RevisionRow> revisions = List.of(new SheetModel.RevisionRow(id.revision(),
                id.date().toString(), "First-pass relief basis (" + r.scenarios().size() + " scenario"
                + (r.scenarios().size() == 1 ? "" : "s") + ")", id.preparer(), id.checker()));
        SheetModel.SignOff signOff = new SheetModel.SignOff(List.of(new SheetModel.Signatory("Prepared", id.preparer()),
                new SheetModel.Signatory("Checked", id.checker()), new SheetModel.Signatory("Approved", "")));
        List<SheetModel.ScenarioLoad> loads = new ArrayList<>();
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            loads.add(new SheetModel.ScenarioLoad(s.label(), kind(s.type()) + (s.failure().isPresent()
                    ? " (not computed: see the warnings)" : ""), opt(Kind.PRESSURE_ABS, s.relievingPressurePa()),
                    opt(Kind.TEMPERATURE, s.relievingTemperatureK()), opt(Kind.MASS_FLOW, s.reliefLoadKgPerS()),
                    opt(Kind.ORIFICE_AREA, s.requiredAreaM2()), s.governing()));
        }
        List<SheetModel.MethodSection> method = new ArrayList<>();
        boolean first = true;
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            String statement = String.join("\n", SheetModels.paragraphs(SheetModels.block("method-" + s.type().key())));
            List<TraceStep> steps = new ArrayList<>();
            if (first) {
                // the inventory is computed once for the case; its steps open the first scenario's method
                steps.addAll(r.inventory().trace());
                first = false;
            }
            steps.addAll(s.trace());
            method.add(new SheetModel.MethodSection("Scenario " + (s.index() + 1) + ": " + s.label()
                    + (s.governing() ? " (governing)" : ""), statement, steps));
        }
        String deferral = SheetModels.fill(SheetModels.block("code-deferral"), id).strip()
                .replaceAll("\\s*\\n\\s*", " ");
        List<String> cautions = SheetModels.paragraphs(SheetModels.block("cautions"));
        String unitNote = (units == UnitSystem.SI
                ? "Inputs and results in SI units, with US customary units in brackets for key values. "
                : "Inputs and results in US customary units, with SI in brackets for key values. ")
                + (units == UnitSystem.SI ? "The method steps are printed as computed, in SI; "
                        : "The method steps are printed as computed, in SI (the units their equations are written "
                        + "for), with US customary values in brackets; ")
                + "pressures are absolute unless marked gauge. "
                + "The inventory's steps open the method of scenario 1. " + r.governingRule();
        return new SheetModel(id, units, revisions, signOff, inputs(), loads, results(), warnings(), figures(), method,
                cautions, deferral, unitNote);
    }

    // ------------------------------------------------------------------------------ helpers

    private String opt(Kind k, OptionalDouble v) {
        return v.isPresent() ? u.format(k, v.getAsDouble()) : NONE;
    }

    private String optPlain(Kind k, OptionalDouble v) {
        return v.isPresent() ? u.plain(k, v.getAsDouble()) : NONE;
    }

    private static String f(String fmt, Object... args) {
        return String.format(Locale.ROOT, fmt, args);
    }

    static String kind(ScenarioKey k) {
        switch (k) {
            case FIRE_WETTED:
                return "Pool fire, wetted vessel";
            case FIRE_NEAR_CRITICAL:
                return "Pool fire, near-critical contents";
            case FIRE_BOIL_OFF:
                return "Pool fire, boil-off";
            case FIRE_GAS_FILLED:
                return "Pool fire, gas-filled vessel";
            case BLOCKED_OUTLET:
                return "Blocked outlet";
            default:
                return "Thermal expansion, blocked-in liquid";
        }
    }

    // ------------------------------------------------------------------------------ inputs

    private List<Table> inputs() {
        List<Table> t = new ArrayList<>();
        List<Component> cs = in.fluid().components();
        double[] x = in.fluid().composition().fractions();
        Optional<double[]> vapour = in.storage() instanceof Storage.Specified sp
                ? Optional.of(sp.vapour().fractions()) : Optional.empty();
        List<String> cols = new ArrayList<>(List.of("Component", "Formula", "CAS",
                in.storage() instanceof Storage.GasFilled ? "Mole fraction (gas)" : "Mole fraction (liquid)"));
        List<Double> w = new ArrayList<>(List.of(1.3, 0.8, 0.9, 0.95));
        if (vapour.isPresent()) {
            cols.add("Mole fraction (vapour space)");
            w.add(0.95);
        }
        cols.addAll(List.of("Tc", "Pc", "Acentric factor", "M"));
        // "lb/lbmol" is longer than "kg/kmol": room for it on one line
        w.addAll(List.of(1.0, 1.1, 0.8, u.system() == UnitSystem.US ? 1.15 : 0.95));
        List<Row> rows = new ArrayList<>();
        StringBuilder sources = new StringBuilder();
        for (int i = 0; i < cs.size(); i++) {
            Component c = cs.get(i);
            List<String> cells = new ArrayList<>(List.of(c.name(), c.formula(), c.cas().isEmpty() ? "custom" : c.cas(),
                    f("%.5f", x[i])));
            if (vapour.isPresent()) {
                cells.add(f("%.5f", vapour.get()[i]));
            }
            // The constants the equation of state uses (a published parameter set brings its own).
            org.ventcase.thermo.EosVariant.Constants k = in.fluid().variant().constants(c);
            cells.addAll(List.of(u.plain(Kind.TEMPERATURE, k.tcK()), u.plain(Kind.PRESSURE_ABS, k.pcPa()),
                    f("%.4f", k.omega()), u.plain(Kind.MOLAR_MASS, c.molarMass())));
            rows.add(new Row(cells, false));
            sources.append(sources.length() == 0 ? "" : " ").append(c.name()).append(": Tc, Pc, omega ")
                    .append(k.source())
                    .append("; molar mass ").append(org.ventcase.thermo.Citations.constants(c)).append("; ideal-gas Cp ")
                    .append(org.ventcase.thermo.Citations.cp(c)).append('.');
        }
        t.add(new Table("Fluid and composition", cols, w, rows, "Sources. " + sources));
        List<Row> eos = new ArrayList<>();
        eos.add(Row.of("Equation of state", in.fluid().variant().displayName()));
        eos.add(Row.of("Reference", in.fluid().variant().citation()));
        eos.add(Row.of("Liquid-density basis", in.fluid().densityBasis().label()
                + (in.fluid().variant().hasVolumeShift() ? " (" + in.fluid().variant().volumeShiftCitation() + ")" : "")));
        for (Component c : cs) {
            org.ventcase.thermo.EosVariant.ComponentModel d = in.fluid().variant().describe(c);
            eos.add(Row.of("Alpha function, " + c.name(), d.alpha()));
            if (in.fluid().densityBasis() == org.ventcase.thermo.DensityBasis.TRANSLATED) {
                eos.add(Row.of("Volume translation, " + c.name(), said(d.translation())));
            }
            for (String note : d.notes()) {
                eos.add(Row.of("Note, " + c.name(), said(note)));
            }
        }
        KijTable.Matrix m = in.fluid().kij();
        double[][] k = m.kij();
        String[][] src = m.sources();
        for (int i = 0; i < cs.size(); i++) {
            for (int j = i + 1; j < cs.size(); j++) {
                eos.add(Row.of("k_ij " + cs.get(i).name() + " / " + cs.get(j).name(), f("%.4f", k[i][j])
                        + (src[i][j] == null || src[i][j].isBlank() ? "" : " (" + src[i][j] + ")")));
            }
        }
        if (cs.size() == 1) {
            eos.add(Row.of("k_ij", "none (one component)"));
        }
        t.add(Table.keyValue("Equation of state, density basis and interaction parameters", eos,
                said(String.join(" ", m.warnings()))));
        Vessel v = in.vessel();
        LevelState vs = r.vessel();
        List<Row> vessel = new ArrayList<>();
        vessel.addAll(SheetModels.vesselGeometryRows(v, u));
        vessel.add(Row.of("Vessel bottom above grade", u.plain(Kind.LENGTH, in.exposure().bottomElevation())));
        vessel.add(Row.of("Skirted bottom head excluded from the fire area",
                in.exposure().excludeSkirtedBottomHead() ? "yes" : "no"));
        t.add(Table.keyValue("Vessel (inside dimensions)", vessel, ""));
        Inventory inv = r.inventory();
        List<Row> st = new ArrayList<>();
        st.add(Row.of("Storage mode", inv.mode().label()));
        st.add(Row.of("Storage temperature", u.format(Kind.TEMPERATURE, in.storage().temperatureK())));
        if (in.storage() instanceof Storage.Specified sp) {
            st.add(Row.of("Storage pressure", u.format(Kind.PRESSURE_ABS, sp.pressurePa())));
        } else if (in.storage() instanceof Storage.GasFilled g) {
            st.add(Row.of("Storage pressure", u.format(Kind.PRESSURE_ABS, g.pressurePa())));
        } else {
            st.add(Row.of("Storage pressure", "the bubble pressure at the storage temperature (see results)"));
        }
        st.add(Row.of("Liquid level as given", SheetModels.levelText(in.level(), u)));
        t.add(Table.keyValue("Storage conditions", st, ""));
        RelievingPressureInput rel0 = in.scenarios().get(0).relieving();
        List<Row> site = new ArrayList<>();
        site.add(Row.of("Atmospheric pressure", u.format(Kind.PRESSURE_ABS, rel0.atmosphericPa())));
        site.add(Row.of("Fire height above grade", u.plain(Kind.LENGTH, in.exposure().fireHeight())));
        site.add(Row.of("Minimum design metal temperature (outlet)", in.device().gas().minimumDesignMetalTemperatureK()
                .isPresent() ? u.format(Kind.TEMPERATURE, in.device().gas().minimumDesignMetalTemperatureK()
                .getAsDouble()) : "not given (no brittle-fracture check)"));
        t.add(Table.keyValue("Site", site, ""));
        List<Row> sc = new ArrayList<>();
        for (CaseInput.Scenario s : in.scenarios()) {
            sc.add(Row.of(String.valueOf(s.index() + 1), s.label(), kind(s.key()), scenarioData(s),
                    relievingBasis(s.relieving())));
        }
        t.add(new Table("Scenarios", List.of("#", "Label", "Type", "Scenario data", "Relieving pressure basis"),
                List.of(0.3, 1.4, 1.2, 2.6, 1.8), sc, ""));
        CaseInput.Device d = in.device();
        DeviceSpec g = d.gas();
        DeviceSpec l = d.liquid();
        List<Row> dev = new ArrayList<>();
        dev.add(Row.of("Set pressure", u.format(Kind.PRESSURE_GAUGE, rel0.setPressureGaugePa())));
        dev.add(Row.of("MAWP", u.format(Kind.PRESSURE_GAUGE, rel0.mawpGaugePa())));
        dev.add(Row.of("Devices", rel0.deviceCount() == DeviceCount.SINGLE ? "single device"
                : "several devices sharing the load"));
        dev.add(Row.of("Supplemental fire valve", rel0.supplementalFireValve() ? "yes" : "no"));
        dev.add(Row.of("Valve construction", d.balancedBellows() ? "balanced bellows" : "conventional or pilot"));
        dev.add(Row.of("Total back pressure while relieving", u.format(Kind.PRESSURE_ABS, g.backPressurePa())));
        dev.add(Row.of("Gas and vapour: Kd / Kb / Kc", f("%.3f / %.3f / %.3f", g.kd(), g.kb(), g.kc())));
        dev.add(Row.of("Liquid: Kd / Kw / Kc", f("%.3f / %.3f / %.3f", l.kd(), l.kb(), l.kc())));
        dev.add(Row.of("Viscosity correction Kv", d.kvForm() == ViscosityCorrection.API520_10TH
                ? "API Std 520 Part I, 10th edition form" : "API Std 520 Part I, 7th to 9th edition form"));
        t.add(Table.keyValue("Relief device", dev, ""));
        return t;
    }

    private String factorText(CaseInput.FireFactor ff) {
        if (ff instanceof CaseInput.TableFactor tf) {
            EnvironmentFactor e = tf.row();
            return f("environment factor F = %.4g (%s; %s)", e.f(), e.description(), e.source());
        }
        CaseInput.InsulationFactor i = (CaseInput.InsulationFactor) ff;
        return f("insulation credit: conductivity %.4g W/(m K), thickness %s; F from the insulation formula "
                + "(see the method)", i.conductivityWPerMK(), u.plain(Kind.LENGTH, i.thicknessM()));
    }

    private static String fireFighting(FireFighting ff) {
        return ff == FireFighting.INADEQUATE ? "drainage or fire-fighting not adequate"
                : "adequate drainage and prompt fire-fighting";
    }

    private String scenarioData(CaseInput.Scenario s) {
        if (s instanceof CaseInput.WettedFire f) {
            return fireFighting(f.fireFighting()) + "; " + factorText(f.factor()) + "; W = Q / L";
        }
        if (s instanceof CaseInput.NearCriticalFire f) {
            return fireFighting(f.fireFighting()) + "; " + factorText(f.factor()) + "; " + f.steps()
                    + " temperature steps over the heat-up";
        }
        if (s instanceof CaseInput.BoilOffFire f) {
            return fireFighting(f.fireFighting()) + "; " + factorText(f.factor()) + "; duration "
                    + (f.durationS().isPresent() ? f("%.0f min", f.durationS().getAsDouble() / 60) : "not limited")
                    + f("; stops at a liquid fraction of %.3f", f.stopAtLiquidFraction());
        }
        if (s instanceof CaseInput.GasFilledFire f) {
            return "wall temperature " + u.format(Kind.TEMPERATURE, f.wallTemperatureK());
        }
        if (s instanceof CaseInput.BlockedOutlet f) {
            InflowRate q = f.inflow();
            String rate = q.kind() == InflowRate.Kind.MASS ? u.format(Kind.MASS_FLOW, q.value())
                    : f("%.1f m3/h at %s", q.value() * 3600, q.standard().label());
            return "maximum inflow " + rate + "; relieved as " + (f.liquid() ? "liquid" : "gas or vapour");
        }
        CaseInput.ThermalExpansion t = (CaseInput.ThermalExpansion) s;
        return "heat input " + u.plain(Kind.POWER, t.heatW()) + "; blocked-in volume "
                + u.plain(Kind.VOLUME, t.blockedInVolumeM3());
    }

    private String relievingBasis(RelievingPressureInput p) {
        return "set " + u.plain(Kind.PRESSURE_GAUGE, p.setPressureGaugePa()) + ", MAWP "
                + u.plain(Kind.PRESSURE_GAUGE, p.mawpGaugePa()) + "; "
                + (p.scenario() == org.ventcase.relief.ScenarioKind.FIRE ? "fire" : "non-fire") + " overpressure, "
                + (p.deviceCount() == DeviceCount.SINGLE ? "single device" : "multiple devices");
    }

    // ------------------------------------------------------------------------------ results

    private List<Table> results() {
        List<Table> t = new ArrayList<>();
        t.add(deviceSummary());
        t.add(sizingTable());
        t.add(heatTable());
        LevelState vs = r.vessel();
        t.add(Table.keyValue("Vessel at the storage level", List.of(
                Row.of("Total volume", u.plain(Kind.VOLUME, vs.totalVolume())),
                Row.of("Liquid volume", u.plain(Kind.VOLUME, vs.liquidVolume())),
                Row.of("Vapour volume", u.plain(Kind.VOLUME, vs.vapourVolume())),
                Row.of("Liquid level", u.plain(Kind.LENGTH, vs.levelM()) + f(" above the lowest inside point "
                        + "(%.2f %% of height, %.2f %% of volume)", vs.levelPercentHeight(), vs.levelPercentVolume())),
                Row.of("Total inside area", u.plain(Kind.AREA, vs.totalInsideArea())),
                Row.of("Wetted area at the liquid level", u.plain(Kind.AREA, vs.wettedArea())),
                Row.of("Fire-exposed wetted area", u.plain(Kind.AREA, vs.fire().area()))),
                vs.fire().ruleApplied(u.words())));
        t.addAll(inventoryTables());
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            s.relievedFluid().ifPresent(fl -> t.add(fluidTable(s, fl)));
        }
        t.add(envelopeTable());
        return t;
    }

    private Table deviceSummary() {
        Optional<CaseResult.ScenarioResult> g = r.governing();
        if (g.isEmpty() || g.get().orifice().isEmpty()) {
            return Table.keyValue("Relief device for the governing scenario", List.of(
                    new Row(List.of("Governing scenario", "none: no scenario could be sized"), true)),
                    r.governingRule());
        }
        CaseResult.ScenarioResult s = g.get();
        OrificeSelection o = s.orifice().get();
        return Table.keyValue("Relief device for the governing scenario", List.of(
                Row.of("Governing scenario", s.label() + " (" + kind(s.type()) + ")"),
                Row.of("Required effective area", opt(Kind.ORIFICE_AREA, s.requiredAreaM2())),
                new Row(List.of("Selected orifice", o.designation() + " (API Std 526), effective area "
                        + u.format(Kind.ORIFICE_AREA, o.selectedAreaM2() / o.count())
                        + (o.count() > 1 ? " each, " + u.format(Kind.ORIFICE_AREA, o.selectedAreaM2()) + " in total"
                        : "")), true),
                Row.of("Margin over required area", f("%.1f %%", o.marginPercent())),
                Row.of("Rated capacity at relieving conditions", u.format(Kind.MASS_FLOW, o.ratedCapacityKgPerS())),
                Row.of("Sizing equation", s.sizingEquation())), said(o.ruleApplied()));
    }

    private Table sizingTable() {
        List<Row> rows = new ArrayList<>();
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            String orifice = NONE;
            String each = NONE;
            String total = NONE;
            String margin = NONE;
            if (s.orifice().isPresent()) {
                OrificeSelection o = s.orifice().get();
                orifice = o.count() + " x " + o.orifice().letter();
                each = u.format(Kind.ORIFICE_AREA, o.selectedAreaM2() / o.count());
                total = u.format(Kind.ORIFICE_AREA, o.selectedAreaM2());
                margin = f("%.1f %%", o.marginPercent());
            }
            rows.add(new Row(List.of(s.label() + (s.governing() ? "\nGOVERNING" : ""),
                    opt(Kind.ORIFICE_AREA, s.requiredAreaM2()), orifice, each, total, margin,
                    s.sizingEquation().isEmpty() ? NONE : s.sizingEquation()), s.governing()));
        }
        return new Table("Required area and standard orifice by scenario", List.of("Scenario", "Required area",
                "Orifice (count x letter)", "Effective area, one orifice", "Effective area, total", "Margin",
                "Sizing equation"), List.of(1.3, 1.2, 0.8, 1.2, 1.2, 0.6, 1.4), rows,
                "Orifice letters and effective areas from API Std 526; margin = selected / required - 1.");
    }

    private Table heatTable() {
        List<Row> rows = new ArrayList<>();
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            rows.add(new Row(List.of(s.label(), optPlain(Kind.PRESSURE_ABS, s.relievingPressurePa()),
                    opt(Kind.TEMPERATURE, s.relievingTemperatureK()), optPlain(Kind.POWER, s.heatInputW()),
                    opt(Kind.SPECIFIC_ENERGY, s.latentHeatJPerKg()), opt(Kind.MASS_FLOW, s.reliefLoadKgPerS())),
                    s.governing()));
        }
        return new Table("Relieving conditions, heat input and latent heat by scenario", List.of("Scenario",
                "P1", "T1 (sizing point)", "Heat input Q", "Latent heat L", "Relief load W"),
                List.of(1.2, 0.9, 1.25, 1.3, 1.3, 1.25), rows, NONE + " : the scenario type has no such quantity, "
                + "or it could not be computed (see the warnings).");
    }

    private List<Table> inventoryTables() {
        Inventory inv = r.inventory();
        List<Table> t = new ArrayList<>();
        List<Row> ph = new ArrayList<>();
        List<PhaseInventory> phases = new ArrayList<>();
        inv.liquid().ifPresent(phases::add);
        phases.add(inv.vapour());
        if (inv.liquid().isEmpty()) {
            ph.add(Row.of("liquid", "none (gas-filled vessel)", NONE, NONE, NONE, u.plain(Kind.MASS, inv.liquidMassKg()),
                    NONE));
        }
        for (PhaseInventory p : phases) {
            ph.add(Row.of(p.phase(), u.plain(Kind.VOLUME, p.volumeM3()), u.plain(Kind.DENSITY, p.densityKgM3())
                    + " (" + p.densityBasis().label() + ")", f("%.5f", p.z()), u.plain(Kind.MOLAR_MASS, p.molarMassKgKmol()),
                    u.plain(Kind.MASS, p.massKg()), u.plain(Kind.AMOUNT, p.moles())));
        }
        ph.add(new Row(List.of("total", u.plain(Kind.VOLUME, r.vessel().totalVolume()), NONE, NONE, NONE,
                u.plain(Kind.MASS, inv.totalMassKg()), u.plain(Kind.AMOUNT, inv.totalMoles())), true));
        String note = "At " + u.format(Kind.TEMPERATURE, inv.temperatureK()) + " and "
                + u.format(Kind.PRESSURE_ABS, inv.pressurePa()) + " (" + inv.mode().label() + ")."
                + inv.rackettLiquidDensity().stream().mapToObj(d -> " Rackett liquid density (cross-check, not used): "
                + u.plain(Kind.DENSITY, d) + ".").findFirst().orElse("");
        if (inv.liquidFull().isPresent()) {
            var lf = inv.liquidFull().get();
            note += " Liquid-full check at " + u.format(Kind.PRESSURE_ABS, lf.relievingPressurePa()) + ": liquid "
                    + "volume at relief " + u.plain(Kind.VOLUME, lf.liquidVolumeAtReliefM3()) + " of "
                    + u.plain(Kind.VOLUME, lf.vesselVolumeM3()) + ", " + (lf.fillsBeforeRelief()
                    ? "the liquid fills the vessel before the relieving pressure" : "the vessel does not fill") + ".";
        }
        t.add(new Table("Inventory by phase", List.of("Phase", "Volume", "Density (basis)", "Z", "M", "Mass", "Moles"),
                List.of(0.8, 1.0, 1.6, 0.7, 1.0, 1.1, 1.0), ph, note));
        List<Row> comp = new ArrayList<>();
        List<Component> cs = inv.fluid().components();
        double[] xl = inv.liquid().map(p -> p.composition().fractions()).orElse(null);
        double[] yv = inv.vapour().composition().fractions();
        for (int i = 0; i < cs.size(); i++) {
            String name = cs.get(i).name();
            comp.add(Row.of(name, xl == null ? NONE : f("%.5f", xl[i]), f("%.5f", yv[i]),
                    inv.liquid().map(p -> u.plain(Kind.MASS, p.massPerComponentKg().get(name))).orElse(NONE),
                    u.plain(Kind.MASS, inv.vapour().massPerComponentKg().get(name)),
                    u.plain(Kind.MASS, inv.massPerComponentKg().get(name))));
        }
        t.add(new Table("Inventory by component", List.of("Component", "Liquid mole fraction", "Vapour mole fraction",
                "Mass in liquid", "Mass in vapour", "Total mass"), List.of(1.2, 1.0, 1.0, 1.1, 1.1, 1.1), comp, ""));
        return t;
    }

    private Table fluidTable(CaseResult.ScenarioResult s, RelievedFluid fl) {
        List<Row> rows = new ArrayList<>();
        rows.add(Row.of("Relieved phase", fl.phase().label()));
        rows.add(Row.of("Temperature T", u.format(Kind.TEMPERATURE, fl.temperatureK())));
        rows.add(Row.of("Pressure P1", u.format(Kind.PRESSURE_ABS, fl.pressurePa())));
        StringBuilder c = new StringBuilder();
        double[] x = fl.composition();
        for (int i = 0; i < x.length; i++) {
            c.append(i == 0 ? "" : ", ").append(fl.componentNames().get(i)).append(' ').append(f("%.5f", x[i]));
        }
        rows.add(Row.of("Composition (mole fractions)", c.toString()));
        rows.add(Row.of("Molar mass M", u.plain(Kind.MOLAR_MASS, fl.molarMass())));
        rows.add(Row.of("Compressibility Z (selected root)", f("%.5f", fl.z())));
        rows.add(Row.of("Real roots of the cubic", fl.realRootsText()));
        if (fl.phase() != org.ventcase.relief.RelievedFluid.Phase.LIQUID) {
            // k and the isentropic exponent size gas flow; for a liquid they mean nothing
            rows.add(Row.of("k = Cp/Cv, ideal gas (used for sizing)", f("%.4f", fl.kIdeal())));
            rows.add(Row.of("Real-fluid isentropic exponent", f("%.4f", fl.isentropicExponent())));
        }
        rows.add(Row.of("Density", u.plain(Kind.DENSITY, fl.density()) + " (" + fl.densityBasis().label() + ")"));
        fl.latentHeatJPerKg().ifPresent(l -> rows.add(Row.of("Latent heat", u.format(Kind.SPECIFIC_ENERGY, l)
                + (fl.latentHeatDefinition().isEmpty() ? "" : " (" + fl.latentHeatDefinition() + ")"))));
        fl.viscosityPaS().ifPresent(v -> rows.add(Row.of("Viscosity", f("%.4g mPa s", v * 1e3)
                + (fl.viscositySource().isEmpty() ? "" : " (" + fl.viscositySource() + ")"))));
        rows.add(Row.of("Equation of state", fl.eos().displayName()));
        return Table.keyValue("Relieved fluid, scenario " + (s.index() + 1) + ": " + s.label(), rows,
                "Root and model: " + fl.provenance());
    }

    private Table envelopeTable() {
        Optional<PhaseEnvelope.Result> e = r.envelope().result();
        if (e.isEmpty()) {
            return Table.keyValue("Phase envelope of the stored liquid", List.of(Row.of("Envelope",
                    "not drawn: " + r.envelope().note())), "");
        }
        PhaseEnvelope.Result env = e.get();
        List<Row> rows = new ArrayList<>();
        rows.add(Row.of("Critical point", env.criticalPoint().map(c -> u.format(Kind.TEMPERATURE, c.temperatureK())
                + ", " + u.format(Kind.PRESSURE_ABS, c.pressurePa())).orElse("not reached by the trace")));
        rows.add(Row.of("Cricondenbar", u.format(Kind.TEMPERATURE, env.cricondenbar().temperatureK()) + ", "
                + u.format(Kind.PRESSURE_ABS, env.cricondenbar().pressurePa())));
        rows.add(Row.of("Cricondentherm", u.format(Kind.TEMPERATURE, env.cricondentherm().temperatureK()) + ", "
                + u.format(Kind.PRESSURE_ABS, env.cricondentherm().pressurePa())));
        return Table.keyValue("Phase envelope of the stored liquid", rows, said(String.join(" ", env.warnings())));
    }

    // ------------------------------------------------------------------------------ warnings

    private List<String> warnings() {
        List<String> out = new ArrayList<>();
        for (CaseResult.CaseWarning w : r.warnings()) {
            out.add(w.scenarios().isEmpty() ? said(w.message())
                    : "[" + String.join("; ", w.scenarios()) + "] " + said(w.message()));
        }
        return out;
    }

    /** A sentence of the calculation (written in SI) in the sheet's units: US first on a US sheet. */
    private String said(String text) {
        return u.system() == UnitSystem.US ? QuantityText.usFirst(text) : text;
    }

    // ------------------------------------------------------------------------------ figures

    private List<Figure> figures() {
        List<Figure> out = new ArrayList<>();
        out.add(sketch());
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            s.levelCurve().ifPresent(c -> out.add(levelChart(s, c)));
        }
        r.envelope().result().ifPresent(e -> out.add(envelopeChart(e)));
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            if (s.loadCurve().size() >= 2) {
                out.add(timeChart(s));
            }
        }
        return out;
    }

    private Figure sketch() {
        Vessel v = in.vessel();
        LevelState vs = r.vessel();
        boolean gas = in.storage() instanceof Storage.GasFilled;
        Figure.SketchLabels labels = new Figure.SketchLabels("ID " + u.plain(Kind.LENGTH, v.diameter()),
                v.shape() == Vessel.Shape.SPHERE ? "" : "T/T " + u.plain(Kind.LENGTH, v.tangentLength()),
                "bottom " + u.plain(Kind.LENGTH, in.exposure().bottomElevation()) + " above grade",
                gas ? "no liquid (gas-filled)" : "liquid level " + u.plain(Kind.LENGTH, vs.levelM()),
                "fire height " + u.plain(Kind.LENGTH, in.exposure().fireHeight()) + " above grade",
                "fire-exposed wetted area " + u.plain(Kind.AREA, vs.fire().area()));
        return new Figure.VesselSketch("Elevation to scale: grade, vessel bottom elevation, liquid level, fire height "
                + "above grade and the fire-exposed wetted wall (shaded).", v.shape(), v.diameter(), v.tangentLength(),
                v.headProfile(true, 24), v.headProfile(false, 24), in.exposure().bottomElevation(), vs.levelM(),
                in.exposure().fireHeight(), vs.fire().effectiveLevel(), labels);
    }

    private Figure levelChart(CaseResult.ScenarioResult s, FireLoadCurve curve) {
        int n = curve.points().size();
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = curve.points().get(i).levelPercentVolume();
            y[i] = u.value(Kind.MASS_FLOW, curve.points().get(i).reliefLoadKgPerS());
        }
        FireLoadCurve.Point g = curve.governing();
        FireLoadCurve.Point c = curve.caseLevel();
        List<Figure.Marker> markers = new ArrayList<>();
        markers.add(new Figure.Marker(f("largest: %.1f %% of volume, %s", g.levelPercentVolume(),
                u.plain(Kind.MASS_FLOW, g.reliefLoadKgPerS())), g.levelPercentVolume(),
                u.value(Kind.MASS_FLOW, g.reliefLoadKgPerS()), true));
        if (curve.caseLevelIndex() != curve.governingIndex()) {
            markers.add(new Figure.Marker(f("case level: %.1f %% of volume, %s", c.levelPercentVolume(),
                    u.plain(Kind.MASS_FLOW, c.reliefLoadKgPerS())), c.levelPercentVolume(),
                    u.value(Kind.MASS_FLOW, c.reliefLoadKgPerS()), false));
        }
        return new Figure.LineChart("Scenario " + (s.index() + 1) + " (" + s.label() + "): fire relief load against "
                + "fill level, the scenario re-run at each level with all other inputs as in the case. The load "
                + "follows the fire-exposed wetted area (Q = C F A^0.82) and is flat where the fire zone, not the "
                + "liquid, limits the wetted area.", "Liquid level, % of vessel volume",
                "Relief load, " + u.unit(Kind.MASS_FLOW), List.of(new Figure.Series("Relief load W", x, y, false)),
                markers);
    }

    private Figure envelopeChart(PhaseEnvelope.Result e) {
        List<double[]> bubble = new ArrayList<>();
        List<double[]> dew = new ArrayList<>();
        for (PhaseEnvelope.Point p : e.points()) {
            double[] xy = {u.value(Kind.TEMPERATURE, p.temperatureK()), u.value(Kind.PRESSURE_ABS, p.pressurePa())};
            (p.branch() == PhaseEnvelope.Branch.BUBBLE ? bubble : dew).add(xy);
        }
        List<Figure.Series> series = new ArrayList<>();
        if (bubble.size() >= 2) {
            series.add(series("Bubble curve", bubble, false));
        }
        if (dew.size() >= 2) {
            series.add(series("Dew curve", dew, true));
        }
        Inventory inv = r.inventory();
        List<Figure.Marker> markers = new ArrayList<>();
        markers.add(new Figure.Marker("storage: " + u.plain(Kind.TEMPERATURE, inv.temperatureK()) + ", "
                + u.plain(Kind.PRESSURE_ABS, inv.pressurePa()), u.value(Kind.TEMPERATURE, inv.temperatureK()),
                u.value(Kind.PRESSURE_ABS, inv.pressurePa()), false, Figure.Marker.Shape.SQUARE));
        // one marker per distinct relieving point (scenarios at the same T1 and P1 share it), at most three
        java.util.Map<String, List<Integer>> at = new java.util.LinkedHashMap<>();
        java.util.Map<String, double[]> where = new java.util.HashMap<>();
        java.util.Set<String> governing = new java.util.HashSet<>();
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            if (s.relievingTemperatureK().isEmpty() || s.relievingPressurePa().isEmpty()) {
                continue;
            }
            double t = s.relievingTemperatureK().getAsDouble();
            double p = s.relievingPressurePa().getAsDouble();
            String label = u.plain(Kind.TEMPERATURE, t) + ", " + u.plain(Kind.PRESSURE_ABS, p);
            if (at.containsKey(label) || at.size() < 3) {
                at.computeIfAbsent(label, k -> new ArrayList<>()).add(s.index() + 1);
                where.putIfAbsent(label, new double[] {t, p});
                if (s.governing()) {
                    governing.add(label);
                }
            }
        }
        at.forEach((label, ns) -> {
            StringBuilder sb = new StringBuilder();
            ns.forEach(n -> sb.append(sb.length() == 0 ? "" : ", ").append(n));
            markers.add(new Figure.Marker("relieving, scenario" + (ns.size() > 1 ? "s " : " ") + sb + ": " + label,
                    u.value(Kind.TEMPERATURE, where.get(label)[0]), u.value(Kind.PRESSURE_ABS, where.get(label)[1]),
                    governing.contains(label)));
        });
        e.criticalPoint().ifPresent(c -> markers.add(new Figure.Marker("critical point",
                u.value(Kind.TEMPERATURE, c.temperatureK()), u.value(Kind.PRESSURE_ABS, c.pressurePa()), false,
                Figure.Marker.Shape.DIAMOND)));
        return new Figure.LineChart("Phase envelope of the stored liquid's composition (" + in.fluid().variant()
                .displayName() + ", k_ij as listed) with the storage point and the relieving points (the vapour "
                + "relieved at P1 is in equilibrium with the liquid at its bubble point).",
                "Temperature, " + u.unit(Kind.TEMPERATURE), "Pressure, " + u.unit(Kind.PRESSURE_ABS), series,
                markers);
    }

    private static Figure.Series series(String label, List<double[]> pts, boolean dashed) {
        double[] x = new double[pts.size()];
        double[] y = new double[pts.size()];
        for (int i = 0; i < pts.size(); i++) {
            x[i] = pts.get(i)[0];
            y[i] = pts.get(i)[1];
        }
        return new Figure.Series(label, x, y, dashed);
    }

    private Figure timeChart(CaseResult.ScenarioResult s) {
        List<CaseResult.LoadPoint> pts = s.loadCurve();
        double last = pts.get(pts.size() - 1).timeS();
        boolean hours = last > 3 * 3600;
        double scale = hours ? 3600 : 60;
        double[] x = new double[pts.size()];
        double[] y = new double[pts.size()];
        int sizing = -1;
        for (int i = 0; i < pts.size(); i++) {
            x[i] = pts.get(i).timeS() / scale;
            y[i] = u.value(Kind.MASS_FLOW, pts.get(i).massFlowKgPerS());
            if (s.requiredAreaM2().isPresent() && pts.get(i).requiredAreaM2() == s.requiredAreaM2().getAsDouble()
                    && sizing < 0) {
                sizing = i;
            }
        }
        List<Figure.Marker> markers = new ArrayList<>();
        if (sizing >= 0) {
            CaseResult.LoadPoint p = pts.get(sizing);
            markers.add(new Figure.Marker("sizing point (largest area): " + u.plain(Kind.MASS_FLOW,
                    p.massFlowKgPerS()) + " at " + u.plain(Kind.TEMPERATURE, p.temperatureK()), x[sizing], y[sizing],
                    true));
        }
        return new Figure.LineChart("Scenario " + (s.index() + 1) + " (" + s.label() + "): relief load over time "
                + "from the opening of the device. The sizing point is the largest required area on the curve "
                + "(the relieved fluid changes along it, so the largest load need not give the largest area)."
                + (s.type() == org.ventcase.calc.ScenarioKey.FIRE_BOIL_OFF
                        ? " The point at time zero is the first-pass load at the initial bubble point, Q/L (1 - rho_V/rho_L),"
                                + " which leaves out the heat taken up as the liquid warms while its light ends boil"
                                + " off; the simulated points after it include that heat, hence the step down."
                        : ""),
                "Time since opening, " + (hours ? "h" : "min"), "Relief load, " + u.unit(Kind.MASS_FLOW),
                List.of(new Figure.Series("Relief load W", x, y, false)), markers);
    }
}
