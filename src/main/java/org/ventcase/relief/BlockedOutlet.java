package org.ventcase.relief;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.ventcase.common.NoSolutionException;
import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;
import org.ventcase.device.LiquidSizing;
import org.ventcase.device.LiquidSizingInput;
import org.ventcase.device.LiquidSizingResult;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseLabel;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.mix.SaturationPoints;

/**
 * Blocked outlet: the relief load is the maximum inflow, relieved at relieving conditions.
 *
 * <p>Inflow: a mass flow, or a standard volumetric gas flow converted with the ideal-gas molar
 * volume at the stated reference conditions ({@link StandardConditions}; default 15 C and
 * 101.325 kPa): W = V_std / (R T_std / P_std) x M.
 *
 * <p>Gas or vapour: T from the inflow temperature, or saturated vapour of the inflow composition
 * at P1 (dew point; Tsat for a pure fluid); Z, M and k from the EOS (vapour root); API 520 gas
 * sizing. Liquid: liquid root at (T_inflow, P1); Q = W / rho; G = rho / 999.0 kg/m3 (water at
 * 15.6 C / 60 F, about 999.0 kg/m3: common practice, from memory); API 520 liquid sizing with
 * the viscosity given (either edition's Kv) or, without one, Kv = 1 and a warning. If the
 * liquid's bubble pressure at T exceeds P1 it flashes in the valve and a warning says so.
 */
public final class BlockedOutlet {

    /** Density of water at 15.6 C (60 F) used for the relative density G, kg/m3 (from memory). */
    public static final double WATER_REFERENCE_DENSITY = 999.0;

    private BlockedOutlet() {
    }

    /** Runs the case. */
    public static BlockedOutletResult run(BlockedOutletInput in) {
        MixtureSpec spec = in.fluid();
        CubicModel model = spec.model();
        double p1 = in.relievingPressurePa();
        double[] z = spec.composition();
        LinkedHashSet<String> warnings = new LinkedHashSet<>(spec.kijWarnings());
        double mw = model.molarMass(z);
        double w = in.inflow().massFlowKgPerS(mw);
        String basis = in.inflow().kind() == InflowRate.Kind.MASS ? "mass flow as given"
                : String.format(Locale.US, "standard volume at %s (ideal-gas molar volume %.5f m3/kmol), M = %.4f "
                        + "kg/kmol", in.inflow().standard().label(), in.inflow().standard().molarVolume() * 1e3, mw);
        if (in.device().backPressurePa() >= p1) {
            throw new NoSolutionException("device.backPressure", "the back pressure is not below the relieving "
                    + "pressure: no flow through the device");
        }
        if (in.phase() == RelievedFluid.Phase.LIQUID) {
            double t = in.inflowTemperatureK();
            FluidProperties fp = model.properties(t, p1, z, PhaseRequest.LIQUID, spec.densityBasis());
            warnings.addAll(fp.warnings());
            if (fp.phase() != PhaseLabel.LIQUID) {
                warnings.add("At the inflow temperature and P1 the EOS root is not liquid-like: liquid sizing may not "
                        + "apply.");
            }
            try {
                double pb = ThermalRelief.bubblePressure(model, DensityBasis.CUBIC, t, z);
                if (pb > in.device().backPressurePa()) {
                    warnings.add(String.format(Locale.US, "The liquid's bubble pressure at %.2f K (%.1f kPa abs) is "
                            + "above the back pressure: it flashes through the valve; two-phase sizing may be needed.",
                            t, pb / 1e3));
                }
            } catch (NoSolutionException e) {
                warnings.add("No bubble pressure at the inflow temperature: flashing was not checked.");
            }
            double q = w / fp.density();
            double g = fp.density() / WATER_REFERENCE_DENSITY;
            String viscSource = in.liquidViscosityPaS().isPresent() ? "given by the user"
                    : "not given: Kv = 1 assumed";
            // without a viscosity, LiquidSizing says once that Kv = 1 was assumed
            LiquidSizingResult ls = LiquidSizing.size(new LiquidSizingInput(q, g, p1, in.device().backPressurePa(),
                    in.liquidViscosityPaS(), in.device().kd(), in.device().kb(), in.device().kc(), in.kvForm()));
            warnings.addAll(ls.warnings());
            RelievedFluid rf = RelievedFluid.of(RelievedFluid.Phase.LIQUID, spec, fp, OptionalDouble.empty(), "",
                    in.liquidViscosityPaS(), viscSource);
            IsenthalpicExpansion.Result ex = IsenthalpicExpansion.toBackPressure(spec, rf,
                    in.device().backPressurePa(), in.device().minimumDesignMetalTemperatureK());
            warnings.addAll(ex.warnings());
            List<TraceStep> trace = new ArrayList<>();
            trace.add(loadStep(in, w, basis));
            trace.add(ScenarioSupport.fluidStep("Relieved liquid at relieving conditions", rf));
            TraceStep.Builder lsz = TraceStep.of("Required effective area (liquid)")
                    .equation("A = 11.78 Q / (Kd Kw Kc Kv) sqrt(G / (P1 - P2)); A mm2, Q L/min, P kPa")
                    .source(ls.source())
                    .in("Q at relieving conditions", "%.4g m3/h", q * 3600)
                    .in("G = rho / 999.0 kg/m3", "%.4f", g);
            for (String line : ls.trace()) {
                lsz.note(line);
            }
            trace.add(lsz.out("Kv", "%.4f", ls.kv())
                    .out("Required area", "%.1f mm2 (%.4f in2)", ls.areaMm2(),
                            ls.areaMm2() / 645.16).build());
            trace.add(ScenarioSupport.expansionStep(ex));
            return new BlockedOutletResult(in, w, basis, rf, Optional.empty(), Optional.of(ls), OptionalDouble.of(q),
                    OptionalDouble.of(g), ex, trace, new ArrayList<>(warnings));
        }
        double t;
        if (in.vapourTemperature() == BlockedOutletInput.VapourTemperature.INFLOW_TEMPERATURE) {
            t = in.inflowTemperatureK();
        } else {
            t = dewTemperature(model, p1, z);
        }
        FluidProperties fp = model.properties(t, p1, z, PhaseRequest.VAPOR, spec.densityBasis());
        warnings.addAll(fp.warnings());
        if (fp.phase() == PhaseLabel.LIQUID) {
            warnings.add("At the relieving temperature and P1 the EOS root is liquid-like: gas sizing may not apply.");
        }
        RelievedFluid rf = RelievedFluid.of(in.phase(), spec, fp, OptionalDouble.empty(), "", OptionalDouble.empty(),
                "");
        GasSizingResult gs = ScenarioSupport.sizeGas(w, rf, in.device());
        warnings.addAll(gs.warnings());
        IsenthalpicExpansion.Result ex = IsenthalpicExpansion.toBackPressure(spec, rf, in.device().backPressurePa(),
                in.device().minimumDesignMetalTemperatureK());
        warnings.addAll(ex.warnings());
        List<TraceStep> trace = new ArrayList<>();
        trace.add(loadStep(in, w, basis));
        trace.add(TraceStep.of("Relieving temperature of the gas or vapour")
                .equation(in.vapourTemperature() == BlockedOutletInput.VapourTemperature.INFLOW_TEMPERATURE
                        ? "T1 = inflow temperature" : "T1 = dew temperature of the inflow at P1 (Tsat for a pure fluid)")
                .source(spec.eos().displayName() + " (" + spec.eos().citation() + ")")
                .in("P1", ScenarioSupport.kpa(p1) + " abs")
                .out("T1", ScenarioSupport.kelvinC(t)).build());
        trace.add(ScenarioSupport.fluidStep("Relieved gas or vapour at relieving conditions", rf));
        trace.add(ScenarioSupport.sizingStep(gs));
        trace.add(ScenarioSupport.expansionStep(ex));
        return new BlockedOutletResult(in, w, basis, rf, Optional.of(gs), Optional.empty(), OptionalDouble.empty(),
                OptionalDouble.empty(), ex, trace, new ArrayList<>(warnings));
    }

    private static TraceStep loadStep(BlockedOutletInput in, double w, String basis) {
        return TraceStep.of("Relief load: the maximum inflow")
                .equation(in.inflow().kind() == InflowRate.Kind.MASS ? "W = inflow (mass)"
                        : "W = V_std / (R T_std / P_std) x M")
                .source("API Std 521 / ISO 23251: blocked outlet, relief at the maximum inflow (common practice)")
                .in("Inflow", in.inflow().kind() == InflowRate.Kind.MASS
                        ? String.format(Locale.US, "%.1f kg/h", in.inflow().value() * 3600)
                        : String.format(Locale.US, "%.1f m3/h at reference conditions", in.inflow().value() * 3600))
                .in("Relieved phase", in.phase().label())
                .out("W", "%.1f kg/h", w * 3600).note(basis).build();
    }

    static double dewTemperature(CubicModel model, double p, double[] z) {
        int present = 0;
        int only = -1;
        for (int i = 0; i < z.length; i++) {
            if (z[i] > 0) {
                present++;
                only = i;
            }
        }
        if (present == 1) {
            Component c = model.components().get(only);
            return new PureSaturation(CubicModel.pure(model.variant(), c)).atPressure(p, DensityBasis.CUBIC)
                    .temperatureK();
        }
        return new SaturationPoints(model).dewTemperature(p, z).temperatureK();
    }
}
