package org.ventcase.relief;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseLabel;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.vessel.Vessel;

/**
 * Fire on a gas-filled (unwetted) vessel: the API 521 method of {@link UnwettedVesselFire} with
 * the exposed area from the vessel geometry, T1 = (P1/Pn) Tn from normal operating conditions,
 * the relieved gas's Z, M and k from the equation of state at (T1, P1), the API 520 area, and
 * the F' area form as a cross-check.
 *
 * <p>Exposed area A': with {@link GasFilledFireInput.AreaBasis#BELOW_FIRE_HEIGHT} the inside
 * surface from the vessel bottom up to the fire height above grade (the vessel's
 * {@code wettedArea(h)} evaluated at the fire zone height, i.e. the surface a liquid filling to
 * that height would wet); with {@code WHOLE_SURFACE} the total inside surface. The method's
 * source text speaks of the exposed surface area of the vessel (from memory); which reading applies
 * is the engineer's call, and the result names the one used. Inside areas are used, as in the
 * wetted case (the outside area is larger by the wall thickness; a conservative user may prefer it).
 *
 * <p>The F' form assumes an ideal gas (Z = 1) and critical flow with Kb = Kc = 1, so in critical
 * flow A(F') / A(API 520) = 1/sqrt(Z) exactly: the ratio reported shows what the ideal-gas
 * assumption changes.
 */
public final class GasFilledFire {

    private GasFilledFire() {
    }

    /** Runs the case. */
    public static GasFilledFireResult run(GasFilledFireInput in) {
        return run(in, true);
    }

    /**
     * Runs the case; {@code expansion} false leaves out the isenthalpic expansion to the back
     * pressure (step, warnings, result), which changes no load, area or orifice (a screening run).
     */
    public static GasFilledFireResult run(GasFilledFireInput in, boolean expansion) {
        LinkedHashSet<String> warnings = new LinkedHashSet<>(in.fluid().kijWarnings());
        Vessel v = in.vessel();
        double area;
        String rule;
        if (in.areaBasis() == GasFilledFireInput.AreaBasis.WHOLE_SURFACE) {
            area = v.totalInsideArea();
            rule = "A' = whole inside surface of the vessel";
        } else {
            double zone = in.exposure().fireHeight() - in.exposure().bottomElevation();
            double h = Math.min(Math.max(zone, 0), v.totalHeight());
            area = zone > 0 ? v.wettedArea(h) : 0;
            rule = String.format(Locale.US, "A' = inside surface from the vessel bottom up to the fire height "
                    + "(%.3f m above the bottom)", h);
        }
        if (!(area > 0)) {
            throw new org.ventcase.common.NoSolutionException("gasFire.exposure", "the vessel lies wholly above the "
                    + "fire height: no surface is exposed by this reading; choose WHOLE_SURFACE if the vessel can "
                    + "still be engulfed");
        }
        CubicModel model = in.fluid().model();
        double t1 = UnwettedVesselFire.relievingTemperatureK(in.relievingPressurePa(), in.normalPressurePa(),
                in.normalTemperatureK());
        FluidProperties fp = model.properties(t1, in.relievingPressurePa(), in.fluid().composition(),
                PhaseRequest.VAPOR, in.fluid().densityBasis());
        if (fp.phase() == PhaseLabel.LIQUID) {
            warnings.add("At (T1, P1) the EOS finds the contents liquid-like: the gas-filled vessel method does not "
                    + "apply; use a wetted or near-critical fire case.");
        }
        UnwettedVesselFireResult load = UnwettedVesselFire.reliefRate(new UnwettedVesselFireInput(area, fp.molarMass(),
                in.relievingPressurePa(), in.normalPressurePa(), in.normalTemperatureK(), in.wallTemperatureK()));
        warnings.addAll(load.warnings());
        RelievedFluid gas = RelievedFluid.of(RelievedFluid.Phase.GAS, in.fluid(), fp, OptionalDouble.empty(), "",
                OptionalDouble.empty(), "");
        GasSizingResult gs = ScenarioSupport.sizeGas(load.massFlowKgPerS(), gas, in.device());
        warnings.addAll(gs.warnings());
        double fPrime = UnwettedVesselFire.fPrimeSi(gs.coefficientC(), in.device().kd(), in.wallTemperatureK(), t1);
        double aFPrimeMm2 = fPrime * area / Math.sqrt(in.relievingPressurePa() / 1000.0);
        double ratio = aFPrimeMm2 * 1e-6 / gs.areaM2();
        java.util.Optional<IsenthalpicExpansion.Result> ex = expansion
                ? java.util.Optional.of(IsenthalpicExpansion.toBackPressure(in.fluid(), gas,
                        in.device().backPressurePa(), in.device().minimumDesignMetalTemperatureK()))
                : java.util.Optional.empty();
        ex.ifPresent(e -> warnings.addAll(e.warnings()));
        warnings.addAll(gas.warnings());
        List<TraceStep> trace = new ArrayList<>();
        trace.add(TraceStep.of("Exposed surface A'").equation("A' = inside surface exposed to the fire")
                .source("API Std 521 / ISO 23251 unwetted-vessel method; which surface: stated here")
                .in("Vessel", v::describe)
                .in("Bottom elevation, fire height", "%.2f m, %.2f m above grade",
                        in.exposure().bottomElevation(), in.exposure().fireHeight())
                .out("A'", "%.3f m2", area).note(rule).build());
        trace.add(TraceStep.of("Relief load of the gas-filled vessel").equation(load.equation()).source(load.source())
                .in("P1", ScenarioSupport.kpa(in.relievingPressurePa()) + " abs")
                .in("Normal operating Pn, Tn", ScenarioSupport.kpa(in.normalPressurePa()) + " abs, "
                        + ScenarioSupport.kelvinC(in.normalTemperatureK()))
                .in("Wall temperature Tw", ScenarioSupport.kelvinC(in.wallTemperatureK()))
                .in("M (EOS)", "%.3f kg/kmol", fp.molarMass())
                .out("T1 = (P1/Pn) Tn", ScenarioSupport.kelvinC(t1))
                .out("W", "%.1f kg/h", load.massFlowKgPerH()).build());
        trace.add(ScenarioSupport.fluidStep("Relieved gas at relieving conditions", gas));
        trace.add(ScenarioSupport.sizingStep(gs));
        trace.add(TraceStep.of("Cross-check by the F' area form").equation("A = F' A' / sqrt(P1), "
                + "F' = 0.2772 / (C Kd) (Tw - T1)^1.25 / T1^0.6506 (SI; ideal gas, critical flow)")
                .source("API Std 521 / ISO 23251: gas-filled vessel in a pool fire, area form (F' factor)")
                .out("F'", "%.5g", fPrime)
                .out("A from F'", "%.1f mm2", aFPrimeMm2)
                .out("Ratio to the EOS-based area", "%.4f", ratio)
                .note("in critical flow with Kb = Kc = 1 the ratio is 1/sqrt(Z): what the ideal-gas form leaves out")
                .build());
        ex.ifPresent(e -> trace.add(ScenarioSupport.expansionStep(e)));
        return new GasFilledFireResult(in, area, rule, load, gas, gs, fPrime, aFPrimeMm2 * 1e-6, ratio, ex, trace,
                new ArrayList<>(warnings));
    }
}
