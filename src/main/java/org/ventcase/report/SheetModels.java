package org.ventcase.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.casefile.Templates;
import org.ventcase.relief.DeviceCount;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.FireLoadCurve;
import org.ventcase.relief.WettedFireInput;
import org.ventcase.relief.WettedFireResult;
import org.ventcase.report.DisplayUnits.Kind;
import org.ventcase.report.SheetModel.Row;
import org.ventcase.report.SheetModel.Table;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.LevelState;
import org.ventcase.vessel.Vessel;

/**
 * Turns calculation results into a {@link SheetModel}. Every number is a field of the result (or
 * of the domain's {@link FireLoadCurve}); this class only chooses what to print and formats it
 * through {@link DisplayUnits}.
 */
public final class SheetModels {

    /** Fill levels of the load-against-level chart, % of volume: 5 to 95 in steps of 5. */
    public static final double CURVE_FROM_PERCENT = 5;
    /** Upper end of the chart's level range, % of volume. */
    public static final double CURVE_TO_PERCENT = 95;
    /** Intervals of the chart's level range. */
    public static final int CURVE_STEPS = 18;

    private SheetModels() {
    }

    /**
     * The sheet of a whole case: every scenario of {@code result} (computed from {@code input} by
     * {@code calc.CaseCalculation.run}), with the title block, revision row and sign-off of
     * {@code id} (the case file's identity, the tool's name and version, the input hash). Inputs,
     * inventory by phase and component, relieving conditions, relieved-fluid properties, loads with
     * the governing scenario marked, areas and orifices, warnings, the vessel sketch, the
     * load-against-level curve of each wetted fire, the phase envelope of a mixture and the load over
     * time of boil-off and near-critical scenarios; the method of each scenario with its statement
     * and trace.
     */
    public static SheetModel from(org.ventcase.calc.CaseResult result, org.ventcase.calc.CaseInput input,
                                  SheetIdentity id, UnitSystem units) {
        return new CaseSheet(result, input, id, units).model();
    }

    /** The sheet of a pure-fluid wetted-vessel fire case, in SI. */
    public static SheetModel from(WettedFireResult r, SheetIdentity id) {
        return from(r, id, UnitSystem.SI);
    }

    /**
     * The sheet of a pure-fluid wetted-vessel fire case. The load-against-level curve is asked of
     * the domain ({@link FireLoadCurve#overLevels}) over {@link #CURVE_FROM_PERCENT} to
     * {@link #CURVE_TO_PERCENT} % of volume.
     */
    public static SheetModel from(WettedFireResult r, SheetIdentity id, UnitSystem units) {
        FireLoadCurve curve = FireLoadCurve.overLevels(r.input(), CURVE_FROM_PERCENT, CURVE_TO_PERCENT, CURVE_STEPS);
        return from(r, curve, id, units);
    }

    /** The sheet of a pure-fluid wetted-vessel fire case with a load curve computed by the caller. */
    public static SheetModel from(WettedFireResult r, FireLoadCurve curve, SheetIdentity id, UnitSystem units) {
        DisplayUnits u = new DisplayUnits(units);
        WettedFireInput in = r.input();
        String scenarioLabel = "Pool fire, wetted vessel";
        List<SheetModel.RevisionRow> revisions = List.of(new SheetModel.RevisionRow(id.revision(),
                id.date().toString(), "First-pass relief basis", id.preparer(), id.checker()));
        SheetModel.SignOff signOff = new SheetModel.SignOff(List.of(new SheetModel.Signatory("Prepared", id.preparer()),
                new SheetModel.Signatory("Checked", id.checker()), new SheetModel.Signatory("Approved", "")));

        List<Table> inputs = inputTables(in, r.vessel(), u);
        List<SheetModel.ScenarioLoad> loads = List.of(new SheetModel.ScenarioLoad(scenarioLabel,
                "Pool fire, wetted vessel (API Std 521 / ISO 23251)",
                u.format(Kind.PRESSURE_ABS, r.relieving().relievingPressurePa()),
                u.format(Kind.TEMPERATURE, r.relief().temperatureK()),
                u.format(Kind.MASS_FLOW, r.reliefLoadKgPerS()),
                u.format(Kind.ORIFICE_AREA, r.sizing().areaM2()), true));
        List<Table> results = resultTables(r, u);
        List<Figure> figures = List.of(sketch(r, u), loadChart(curve, u));
        String statement = paragraphs(block("method-fire-wetted")).stream().reduce((a, b) -> a + "\n" + b)
                .orElse("");
        List<SheetModel.MethodSection> method = List.of(new SheetModel.MethodSection(scenarioLabel, statement,
                r.trace()));
        String deferral = fill(block("code-deferral"), id).strip().replaceAll("\\s*\\n\\s*", " ");
        List<String> cautions = paragraphs(block("cautions"));
        String unitNote = units == UnitSystem.SI
                ? "Inputs and results in SI units, with US customary units in brackets for key values. "
                        + "The method steps are printed as computed, in SI; pressures are absolute unless marked gauge."
                : "Inputs and results in US customary units, with SI in brackets for key values. "
                        + "The method steps are printed as computed, in SI; pressures are absolute unless marked gauge.";
        return new SheetModel(id, units, revisions, signOff, inputs, loads, results, r.warnings(), figures, method,
                cautions, deferral, unitNote);
    }

    // ------------------------------------------------------------------------------ inputs

    private static List<Table> inputTables(WettedFireInput in, LevelState vs, DisplayUnits u) {
        List<Table> t = new ArrayList<>();
        Component c = in.component();
        t.add(new Table("Fluid and composition", List.of("Component", "Formula", "CAS", "Mole fraction", "Tc",
                "Pc", "Acentric factor", "M"), List.of(1.3, 0.8, 0.9, 0.9, 1.1, 1.1, 0.9, 0.9),
                List.of(Row.of(c.name(), c.formula(), c.cas().isEmpty() ? "custom" : c.cas(), "1.0000",
                        u.plain(Kind.TEMPERATURE, c.tcK()), u.plain(Kind.PRESSURE_ABS, c.pcPa()),
                        String.format(Locale.ROOT, "%.4f", c.omega()),
                        String.format(Locale.ROOT, "%.3f kg/kmol", c.molarMass()))),
                "Constants: " + org.ventcase.thermo.Citations.constants(c) + ". Ideal-gas Cp: " + org.ventcase.thermo.Citations.cp(c) + "."));
        t.add(Table.keyValue("Equation of state and density basis", List.of(
                Row.of("Equation of state", in.eos().displayName()),
                Row.of("Reference", in.eos().citation()),
                Row.of("Liquid-density basis", in.densityBasis().label()
                        + (in.eos().hasVolumeShift() ? " (" + in.eos().volumeShiftCitation() + ")" : ""))), ""));
        Vessel v = in.vessel();
        List<Row> vessel = new ArrayList<>();
        vessel.addAll(SheetModels.vesselGeometryRows(v, u));
        vessel.add(Row.of("Total volume", u.plain(Kind.VOLUME, vs.totalVolume())));
        vessel.add(Row.of("Total inside area", u.plain(Kind.AREA, vs.totalInsideArea())));
        t.add(Table.keyValue("Vessel (inside dimensions)", vessel, ""));
        t.add(Table.keyValue("Storage conditions", List.of(
                Row.of("Storage", "saturated liquid with its vapour"),
                Row.of("Storage temperature", u.format(Kind.TEMPERATURE, in.storageTemperatureK())),
                Row.of("Liquid level as given", levelText(in.level(), u)),
                Row.of("Liquid level", u.plain(Kind.LENGTH, vs.levelM()) + String.format(Locale.ROOT,
                        " above the lowest inside point (%.1f %% of height, %.1f %% of volume)",
                        vs.levelPercentHeight(), vs.levelPercentVolume()))), ""));
        t.add(Table.keyValue("Site", List.of(
                Row.of("Atmospheric pressure", u.format(Kind.PRESSURE_ABS, in.relieving().atmosphericPa())),
                Row.of("Vessel bottom above grade", u.plain(Kind.LENGTH, in.exposure().bottomElevation())),
                Row.of("Fire height above grade", u.plain(Kind.LENGTH, in.exposure().fireHeight()))), ""));
        t.add(Table.keyValue("Scenario", List.of(
                Row.of("Scenario", "Pool fire, wetted vessel"),
                Row.of("Drainage and fire-fighting", in.fireFighting() == FireFighting.INADEQUATE
                        ? "not both adequate" : "adequate drainage and prompt fire-fighting"),
                Row.of("Environment factor F", String.format(Locale.ROOT, "%.4g", in.environment().f()) + " ("
                        + in.environment().description() + "; " + in.environment().source() + ")"),
                Row.of("Load equation", in.subtractDisplacedVapour() ? "W = Q / L x (1 - rho_V / rho_L)" : "W = Q / L"),
                Row.of("Skirted bottom head excluded", in.exposure().excludeSkirtedBottomHead() ? "yes" : "no")), ""));
        t.add(Table.keyValue("Relief device", List.of(
                Row.of("Set pressure", u.format(Kind.PRESSURE_GAUGE, in.relieving().setPressureGaugePa())),
                Row.of("MAWP", u.format(Kind.PRESSURE_GAUGE, in.relieving().mawpGaugePa())),
                Row.of("Devices", in.relieving().deviceCount() == DeviceCount.SINGLE ? "single device"
                        : "several devices sharing the load"),
                Row.of("Supplemental fire valve", in.relieving().supplementalFireValve() ? "yes" : "no"),
                Row.of("Back pressure while relieving", u.format(Kind.PRESSURE_ABS, in.backPressurePa())),
                Row.of("Kd / Kb / Kc", String.format(Locale.ROOT, "%.3f / %.3f / %.3f", in.kd(), in.kb(), in.kc()))),
                ""));
        return t;
    }

    /** The rows that describe a vessel's inside geometry, shared by every sheet that shows a vessel. */
    static List<Row> vesselGeometryRows(Vessel v, DisplayUnits u) {
        List<Row> vessel = new ArrayList<>();
        vessel.add(Row.of("Arrangement", v.describe()));
        vessel.add(Row.of("Inside diameter", u.plain(Kind.LENGTH, v.diameter())));
        if (v.shape() != Vessel.Shape.SPHERE) {
            vessel.add(Row.of("Tangent-to-tangent length", u.plain(Kind.LENGTH, v.tangentLength())));
            vessel.add(Row.of(v.shape() == Vessel.Shape.HORIZONTAL_CYLINDER ? "Head depths (left / right)"
                    : "Head depths (bottom / top)", u.plain(Kind.LENGTH, v.firstHeadDepth()) + " / "
                    + u.plain(Kind.LENGTH, v.secondHeadDepth())));
        }
        vessel.add(Row.of("Inside height", u.plain(Kind.LENGTH, v.totalHeight())));
        return vessel;
    }

    static String levelText(Level level, DisplayUnits u) {
        switch (level.basis()) {
            case HEIGHT_M:
                return u.plain(Kind.LENGTH, level.value()) + " above the lowest inside point";
            case PERCENT_OF_HEIGHT:
                return String.format(Locale.ROOT, "%.1f %% of the inside height", level.value());
            default:
                return String.format(Locale.ROOT, "%.1f %% of the inside volume", level.value());
        }
    }

    // ------------------------------------------------------------------------------ results

    private static List<Table> resultTables(WettedFireResult r, DisplayUnits u) {
        List<Table> t = new ArrayList<>();
        t.add(Table.keyValue("Relief device", List.of(
                Row.of("Required effective area", u.format(Kind.ORIFICE_AREA, r.sizing().areaM2())),
                new Row(List.of("Selected orifice", r.orifice().designation() + " (API Std 526), effective area "
                        + u.format(Kind.ORIFICE_AREA, r.orifice().selectedAreaM2())), true),
                Row.of("Margin over required area", String.format(Locale.ROOT, "%.1f %%", r.orifice().marginPercent())),
                Row.of("Rated capacity at relieving conditions", u.format(Kind.MASS_FLOW,
                        r.orifice().ratedCapacityKgPerS())),
                Row.of("Flow regime", r.sizing().regime().name().toLowerCase(Locale.ROOT) + String.format(Locale.ROOT,
                        " (critical pressure ratio %.4f)", r.sizing().criticalPressureRatio()))),
                r.orifice().ruleApplied()));
        t.add(Table.keyValue("Relieving conditions", List.of(
                Row.of("Relieving pressure P1", u.format(Kind.PRESSURE_ABS, r.relieving().relievingPressurePa())),
                Row.of("Overpressure above set", u.format(Kind.PRESSURE_DIFFERENCE, r.relieving().overpressurePa())
                        + String.format(Locale.ROOT, " (%.1f %% of set)", r.relieving().overpressurePercentOfSet())),
                Row.of("Relieving temperature T1", u.format(Kind.TEMPERATURE, r.relief().temperatureK())),
                Row.of("Latent heat at T1 (EOS)", u.format(Kind.SPECIFIC_ENERGY, r.latentHeat().computedJPerKg())),
                Row.of("Latent heat used", u.format(Kind.SPECIFIC_ENERGY, r.latentHeat().usedJPerKg())
                        + (r.latentHeat().minimumApplied() ? " (near-critical minimum applied)" : "")),
                Row.of("Wetted area at the liquid level", u.plain(Kind.AREA, r.vessel().wettedArea())),
                Row.of("Fire-exposed wetted area", u.plain(Kind.AREA, r.vessel().fire().area())),
                Row.of("Fire heat input Q", u.plain(Kind.POWER, r.heat().heatW()))),
                r.relieving().ruleApplied()));
        LevelState vs = r.vessel();
        t.add(Table.keyValue("Inventory at storage conditions", List.of(
                Row.of("Storage pressure (saturation)", u.format(Kind.PRESSURE_ABS, r.storage().pressurePa())),
                Row.of("Liquid volume", u.plain(Kind.VOLUME, vs.liquidVolume())),
                Row.of("Vapour volume", u.plain(Kind.VOLUME, vs.vapourVolume())),
                Row.of("Liquid density (" + r.storage().liquid().densityBasis().label() + ")",
                        u.plain(Kind.DENSITY, r.storage().liquid().density())
                                + "; Rackett cross-check " + u.plain(Kind.DENSITY, r.storage().rackettLiquidDensity())),
                Row.of("Vapour density", u.plain(Kind.DENSITY, r.storage().vapor().density())),
                Row.of("Liquid mass", u.plain(Kind.MASS, r.liquidMassKg())),
                Row.of("Vapour mass", u.plain(Kind.MASS, r.vaporMassKg())),
                Row.of("Total mass", u.plain(Kind.MASS, r.liquidMassKg() + r.vaporMassKg()))), ""));
        FluidProperties vap = r.relievedVapor();
        StringBuilder roots = new StringBuilder();
        for (double z : vap.roots().physical()) {
            roots.append(roots.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.5f", z));
        }
        t.add(Table.keyValue("Relieved vapour at relieving conditions", List.of(
                Row.of("Molar mass M", String.format(Locale.ROOT, "%.3f kg/kmol", vap.molarMass())),
                Row.of("Compressibility Z (vapour root)", String.format(Locale.ROOT, "%.4f", vap.z())),
                Row.of("Real roots of the cubic", roots + " (" + vap.roots().rootCase().words() + ")"),
                Row.of("k = Cp/Cv, ideal gas (used for sizing)", String.format(Locale.ROOT, "%.4f", vap.kIdeal())),
                Row.of("Real-gas isentropic exponent", String.format(Locale.ROOT, "%.4f", vap.isentropicExponent())),
                Row.of("Density", u.plain(Kind.DENSITY, vap.density()))), vap.rootReason()));
        return t;
    }

    // ------------------------------------------------------------------------------ figures

    private static Figure sketch(WettedFireResult r, DisplayUnits u) {
        WettedFireInput in = r.input();
        Vessel v = in.vessel();
        LevelState vs = r.vessel();
        Figure.SketchLabels labels = new Figure.SketchLabels("ID " + u.plain(Kind.LENGTH, v.diameter()),
                v.shape() == Vessel.Shape.SPHERE ? "" : "T/T " + u.plain(Kind.LENGTH, v.tangentLength()),
                "bottom " + u.plain(Kind.LENGTH, in.exposure().bottomElevation()) + " above grade",
                "liquid level " + u.plain(Kind.LENGTH, vs.levelM()),
                "fire height " + u.plain(Kind.LENGTH, in.exposure().fireHeight()) + " above grade",
                "fire-exposed wetted area " + u.plain(Kind.AREA, vs.fire().area()));
        return new Figure.VesselSketch("Elevation to scale: liquid level, fire height above grade and the "
                + "fire-exposed wetted wall (shaded).", v.shape(), v.diameter(), v.tangentLength(),
                v.headProfile(true, 24), v.headProfile(false, 24), in.exposure().bottomElevation(), vs.levelM(),
                in.exposure().fireHeight(), vs.fire().effectiveLevel(), labels);
    }

    private static Figure loadChart(FireLoadCurve curve, DisplayUnits u) {
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
        markers.add(new Figure.Marker(String.format(Locale.ROOT, "largest: %.1f %% of volume, %s",
                g.levelPercentVolume(), u.plain(Kind.MASS_FLOW, g.reliefLoadKgPerS())), g.levelPercentVolume(),
                u.value(Kind.MASS_FLOW, g.reliefLoadKgPerS()), true));
        if (curve.caseLevelIndex() != curve.governingIndex()) {
            markers.add(new Figure.Marker(String.format(Locale.ROOT, "case level: %.1f %% of volume, %s",
                    c.levelPercentVolume(), u.plain(Kind.MASS_FLOW, c.reliefLoadKgPerS())), c.levelPercentVolume(),
                    u.value(Kind.MASS_FLOW, c.reliefLoadKgPerS()), false));
        }
        return new Figure.LineChart("Fire relief load against fill level, all other inputs as in the case. "
                + "The load follows the fire-exposed wetted area (Q = C F A^0.82) and is flat where the fire "
                + "zone, not the liquid, limits the wetted area.", "Liquid level, % of vessel volume",
                "Relief load, " + u.unit(Kind.MASS_FLOW),
                List.of(new Figure.Series("Relief load W", x, y, false)), markers);
    }

    // ------------------------------------------------------------------------------ text blocks

    static String block(String name) {
        return Templates.text(name).orElseThrow(() -> new IllegalStateException("missing text block " + name));
    }

    /** Paragraphs of a text block: separated by blank lines, lines inside a paragraph joined. */
    static List<String> paragraphs(String text) {
        List<String> out = new ArrayList<>();
        for (String p : text.strip().split("\\n\\s*\\n")) {
            String joined = p.strip().replaceAll("\\s*\\n\\s*", " ");
            if (!joined.isEmpty()) {
                out.add(joined);
            }
        }
        return out;
    }

    static String fill(String text, SheetIdentity id) {
        return text.replace("{tag}", id.tag()).replace("{title}", id.title()).replace("{revision}", id.revision())
                .replace("{ventcaseVersion}", id.toolVersion()).replace("{inputHash}", id.inputHash());
    }
}
