package org.ventcase.relief;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.NoSolutionException;
import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizing;
import org.ventcase.device.GasSizingInput;
import org.ventcase.device.GasSizingResult;
import org.ventcase.device.OrificeSelection;
import org.ventcase.device.OrificeTable;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.SaturationResult;
import org.ventcase.vessel.LevelState;

/**
 * Pool fire on a liquid-wetted vessel holding a pure fluid: relieving pressure, fire-exposed
 * wetted area, heat input, relieving temperature (saturation at P1), latent heat, relief load,
 * relieved-vapour properties, required area and standard orifice, and the inventory.
 *
 * <p>Relief load W = Q / L (API Std 521, 6th ed., 5.15.2.2, relief rate from the heat absorbed and
 * the latent heat at relieving conditions; section number from memory), or, as the refinement
 * offered, W = Q / L (1 - rho_V / rho_L), which accounts for the vapour that stays behind to fill
 * the volume the boiled-off liquid vacated (mass and energy balance at constant pressure in a
 * rigid vessel; common practice, derived in DEVELOPERS.md). The result states which was used.
 * Near the critical point of a hydrocarbon the published minimum latent heat of 50 Btu/lb
 * (116.3 kJ/kg) is applied with a warning.
 */
public final class WettedFire {

    private WettedFire() {
    }

    /** Runs the case. */
    public static WettedFireResult run(WettedFireInput in) {
        List<TraceStep> trace = new ArrayList<>();
        LinkedHashSet<String> warnings = new LinkedHashSet<>();
        Component c = in.component();
        CubicModel model = CubicModel.pure(in.eos(), c);
        PureSaturation sat = new PureSaturation(model);

        // 1. Relieving pressure
        RelievingPressureResult rp = RelievingPressure.compute(in.relieving());
        warnings.addAll(rp.warnings());
        double p1 = rp.relievingPressurePa();
        trace.add(RelievingPressure.step(in.relieving(), rp));

        // 2. Vessel at level
        LevelState vs = LevelState.of(in.vessel(), in.level(), in.exposure());
        trace.add(TraceStep.of("Vessel and fire-exposed wetted area")
                .equation("A_wetted = wetted inside area below min(liquid level, fire height - elevation)")
                .source("API Std 521 / ISO 23251: wetted surface within 7.6 m (25 ft) of the base of the fire")
                .in("Vessel", in.vessel()::describe)
                .in("Liquid level", "%.3f m (%.1f %% of height, %.1f %% of volume)",
                        vs.levelM(), vs.levelPercentHeight(), vs.levelPercentVolume())
                .in("Bottom elevation above grade", "%.2f m", in.exposure().bottomElevation())
                .in("Fire height above grade", "%.2f m", in.exposure().fireHeight())
                .out("Total volume", "%.3f m3", vs.totalVolume())
                .out("Liquid volume", "%.3f m3", vs.liquidVolume())
                .out("Wetted area", "%.3f m2", vs.wettedArea())
                .out("Fire-exposed wetted area", "%.3f m2", vs.fire().area())
                .note(vs.fire()::ruleApplied).build());
        if (vs.levelPercentVolume() > 95.0) {
            warnings.add(String.format(Locale.US, "The liquid fills %.1f %% of the vessel: less than the usual 5 %% "
                    + "vapour space (outage) is left.", vs.levelPercentVolume()));
        }

        // 3. Heat input
        HeatInputResult heat = FireHeatInput.wettedVessel(vs.fire().area(), in.environment().f(), in.fireFighting());
        warnings.addAll(heat.warnings());
        in.environment().warning().ifPresent(warnings::add);
        trace.add(TraceStep.of("Fire heat input").equation(heat.equation()).source(heat.source())
                .in("Fire-exposed wetted area A", "%.3f m2", vs.fire().area())
                .in("Environment factor F", "%.4g (%s)", in.environment().f(),
                        in.environment().description())
                .in("Drainage and fire-fighting", in.fireFighting() == FireFighting.INADEQUATE ? "inadequate" : "adequate")
                .out("Q", "%.1f kW", heat.heatW() / 1e3).build());

        // 4. Inventory at storage
        SaturationResult storage = sat.atTemperature(in.storageTemperatureK(), in.densityBasis());
        warnings.addAll(storage.warnings());
        double mL = vs.liquidVolume() * storage.liquid().density();
        double mV = vs.vapourVolume() * storage.vapor().density();
        trace.add(TraceStep.of("Inventory at storage conditions")
                .equation("m = V_L rho_L + V_V rho_V at saturation at the storage temperature")
                .source(in.eos().displayName() + " (" + in.eos().citation() + "); density basis "
                        + storage.liquid().densityBasis().label())
                .in("Storage temperature", kelvinC(in.storageTemperatureK()))
                .out("Storage pressure (saturation)", kpa(storage.pressurePa()) + " abs")
                .out("Liquid density", "%.2f kg/m3 (%s; Rackett %.2f)",
                        storage.liquid().density(), storage.liquid().densityBasis().label(),
                        storage.rackettLiquidDensity())
                .out("Vapour density", "%.3f kg/m3", storage.vapor().density())
                .out("Liquid mass", "%.0f kg", mL)
                .out("Vapour mass", "%.0f kg", mV).build());

        // 5. Relieving temperature and latent heat
        if (p1 >= model.pc(0)) {
            throw new NoSolutionException("device.setPressure", String.format(Locale.US,
                    "the relieving pressure %.1f kPa abs is at or above the critical pressure of %s (%.1f kPa): "
                            + "the contents are supercritical at relief; use the near-critical fire scenario",
                    p1 / 1e3, c.name(), model.pc(0) / 1e3));
        }
        SaturationResult rel = sat.atPressure(p1, in.densityBasis());
        warnings.addAll(rel.warnings());
        LatentHeatGuard.Result lh = c.isHydrocarbon() ? LatentHeatGuard.apply(rel.latentHeatJkg())
                : new LatentHeatGuard.Result(rel.latentHeatJkg(), rel.latentHeatJkg(), false, "");
        if (lh.minimumApplied()) {
            warnings.add(lh.warning());
        }
        double tr = rel.temperatureK() / model.tc(0);
        if (tr > 0.9) {
            warnings.add(String.format(Locale.US, "Relieving temperature is at Tr = %.3f: near the critical point the "
                    + "latent heat falls quickly and the fire load rises; a transient (time-dependent) method may be needed.",
                    tr));
        }
        double l = lh.usedJPerKg();
        double displacement = 1.0 - rel.vapor().density() / rel.liquid().density();
        double w = heat.heatW() / l * (in.subtractDisplacedVapour() ? displacement : 1.0);
        trace.add(TraceStep.of("Relieving temperature and latent heat")
                .equation(rel.latentHeatAnchored()
                        ? "T1 = Tsat(P1) by equal fugacity; L from the latent-heat correlation at T1 ("
                                + rel.latentHeatSource() + ")"
                        : "T1 = Tsat(P1) by equal fugacity; L = h_V - h_L at T1, P1")
                .source(in.eos().displayName() + " (" + in.eos().citation() + ")")
                .in("P1", kpa(p1) + " abs")
                .out("Relieving temperature T1", kelvinC(rel.temperatureK()))
                .out("Liquid density at T1", "%.2f kg/m3 (%s)", rel.liquid().density(),
                        rel.liquid().densityBasis().label())
                .out("Vapour density at T1", "%.3f kg/m3", rel.vapor().density())
                .out(rel.latentHeatAnchored() ? "Latent heat (correlation)" : "Latent heat (EOS)", "%.2f kJ/kg",
                        lh.computedJPerKg() / 1e3)
                .out("Latent heat used", "%.2f kJ/kg%s", l / 1e3,
                        lh.minimumApplied() ? " (published minimum for hydrocarbons)" : "").build());
        trace.add(TraceStep.of("Relief load")
                .equation(in.subtractDisplacedVapour() ? "W = Q / L x (1 - rho_V / rho_L)" : "W = Q / L")
                .source(in.subtractDisplacedVapour()
                        ? "API Std 521 relief rate from heat input, with the vapour-displacement refinement "
                                + "(mass and energy balance at constant P1)"
                        : "API Std 521 / ISO 23251: relief rate = heat absorbed / latent heat at relieving conditions")
                .in("Q", "%.1f kW", heat.heatW() / 1e3)
                .in("L", "%.2f kJ/kg", l / 1e3)
                .in("1 - rho_V/rho_L", "%.4f%s", displacement,
                        in.subtractDisplacedVapour() ? "" : " (not applied)")
                .out("W", "%.1f kg/h", w * 3600).build());

        // 6. Relieved vapour properties
        FluidProperties vap = model.properties(rel.temperatureK(), p1, new double[] {1}, PhaseRequest.VAPOR,
                in.densityBasis());
        trace.add(TraceStep.of("Relieved vapour at relieving conditions")
                .equation("cubic EOS, vapour (largest) root at T1, P1; k = Cp_ig/Cv_ig per API 520")
                .source(in.eos().displayName() + "; ideal-gas Cp: " + org.ventcase.thermo.Citations.cp(c))
                .in("T1", kelvinC(rel.temperatureK())).in("P1", kpa(p1) + " abs")
                .out("Roots Z", joinRoots(vap.roots().physical()) + " (" + vap.roots().rootCase().words() + ")")
                .out("Z (vapour root)", "%.4f", vap.z())
                .out("Molar mass M", "%.3f kg/kmol", vap.molarMass())
                .out("k = Cp/Cv ideal gas", "%.4f", vap.kIdeal())
                .out("Real-gas isentropic exponent", "%.4f", vap.isentropicExponent())
                .out("Density", "%.3f kg/m3", vap.density())
                .note(vap.rootChoice()).build());

        // 7. Sizing
        GasSizingResult gs = GasSizing.size(new GasSizingInput(w, p1, in.backPressurePa(), rel.temperatureK(),
                vap.z(), vap.molarMass(), java.util.OptionalDouble.of(vap.kIdeal()), in.kd(), in.kb(), in.kc()));
        warnings.addAll(gs.warnings());
        TraceStep.Builder sz = TraceStep.of("Required effective area").equation(gs.equation()).source(gs.source());
        for (org.ventcase.common.LazyText line : gs.lines()) {
            sz.note(line);
        }
        sz.out("Flow regime", gs.regime().name().toLowerCase(Locale.ROOT))
                .out("Required area", "%.1f mm2 (%.4f in2)", gs.areaMm2(),
                        gs.areaMm2() / 645.16);
        trace.add(sz.build());
        OrificeSelection os = OrificeTable.select(gs.areaM2(), w);
        trace.add(TraceStep.of("Standard orifice").equation("smallest API 526 effective area >= required area")
                .source("API Std 526 effective orifice areas (used with the API 520 Part I equations)")
                .in("Required area", "%.1f mm2", gs.areaMm2())
                .out("Orifice", os.designation())
                .out("Selected effective area", "%.1f mm2", os.selectedAreaM2() * 1e6)
                .out("Rated capacity", "%.1f kg/h", os.ratedCapacityKgPerS() * 3600)
                .out("Margin", "%.1f %%", os.marginPercent())
                .note(os.ruleApplied()).build());
        warnings.addAll(vap.warnings());
        return new WettedFireResult(in, rp, vs, heat, storage, rel, lh, w, vap, gs, os, mL, mV, trace,
                new ArrayList<>(warnings));
    }

    private static String joinRoots(double[] z) {
        StringBuilder sb = new StringBuilder();
        for (double v : z) {
            sb.append(sb.length() == 0 ? "" : ", ").append(String.format(Locale.US, "%.5f", v));
        }
        return sb.toString();
    }

    private static String kpa(double pa) {
        return String.format(Locale.US, "%.1f kPa", pa / 1e3);
    }

    private static String kpag(double pa) {
        return String.format(Locale.US, "%.1f kPa gauge", pa / 1e3);
    }

    private static String kelvinC(double k) {
        return String.format(Locale.US, "%.2f K (%.2f C)", k, k - 273.15);
    }
}
