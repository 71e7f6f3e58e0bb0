package org.ventcase.relief;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.ventcase.common.NoSolutionException;
import org.ventcase.common.TraceStep;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.mix.SaturationPoints;

/**
 * Thermal (hydraulic) expansion of a blocked-in liquid with its properties from the equation of
 * state: q = alpha_v phi / (rho c), with alpha_v = (1/v)(dv/dT)_P and c = Cp of the liquid root at
 * (T, P1). This is the API 521 formula q = alpha_v phi / (1000 d c) with 1000 d = rho
 * ({@link ThermalExpansion}; REFERENCES.md section 7 [S]); the result carries both and they agree
 * to round-off.
 *
 * <p>(dv/dT)_P of the cubic follows from the Joule-Thomson identity (dT/dP)_H = (T (dv/dT)_P - v)/Cp,
 * i.e. (dv/dT)_P = (mu_JT Cp + v)/T on the cubic's own volume; a constant volume translation does
 * not change it, so alpha_v = (dv/dT)_P / v on the chosen density basis. Cubic liquid heat
 * capacities and expansivities are approximate (several percent; worse near the critical point).
 *
 * <p>If the liquid's bubble pressure at T exceeds P1, the liquid boils before the expansion case
 * matters: vapour generation governs, and the result says so.
 */
public final class ThermalRelief {

    private ThermalRelief() {
    }

    /** Runs the case. */
    public static ThermalReliefResult run(ThermalReliefInput in) {
        MixtureSpec spec = in.fluid();
        CubicModel model = spec.model();
        double t = in.temperatureK();
        double p = in.relievingPressurePa();
        double[] x = spec.composition();
        LinkedHashSet<String> warnings = new LinkedHashSet<>(spec.kijWarnings());
        FluidProperties fp = model.properties(t, p, x, PhaseRequest.LIQUID, spec.densityBasis());
        warnings.addAll(fp.warnings());
        double dvdT = (fp.jouleThomson() * fp.cp() + fp.molarVolume()) / t; // on the density basis
        double alpha = dvdT / fp.molarVolume();
        double mkg = fp.molarMass() * 1e-3;
        double c = fp.cp() / mkg;
        double rho = fp.density();
        if (!(alpha > 0) || !(c > 0)) {
            throw new NoSolutionException("thermal.temperature", String.format(Locale.US,
                    "the EOS liquid at %.2f K, %.1f kPa has alpha_v = %.3g 1/K and Cp = %.3g J/(kg K): no expansion "
                            + "relief by this method", t, p / 1e3, alpha, c));
        }
        double q = rateM3PerS(alpha, in.heatW(), rho, c);
        double check = ThermalExpansion.reliefRateM3PerS(alpha, in.heatW(), rho / 1000.0, c);
        OptionalDouble pb = OptionalDouble.empty();
        boolean vapourGoverns = false;
        try {
            pb = OptionalDouble.of(bubblePressure(model, spec.densityBasis(), t, x));
        } catch (NoSolutionException e) {
            warnings.add("No bubble pressure found at the relief temperature (" + e.getMessage() + "); the check that "
                    + "the liquid stays liquid at P1 was not made.");
        }
        if (pb.isPresent() && pb.getAsDouble() > p) {
            vapourGoverns = true;
            warnings.add(String.format(Locale.US, "The liquid's bubble pressure at %.2f K is %.1f kPa abs, above the "
                    + "relieving pressure %.1f kPa abs: the liquid boils, so vapour generation governs; size for "
                    + "vapour generation (API Std 521), not for thermal expansion.", t, pb.getAsDouble() / 1e3, p / 1e3));
        }
        if (fp.phase() != org.ventcase.thermo.PhaseLabel.LIQUID) {
            warnings.add("At these conditions the EOS root is not liquid-like: the thermal expansion formula is for a "
                    + "liquid.");
        }
        warnings.add("Cubic-EOS liquid heat capacity and expansion coefficient are approximate (typically a few "
                + "percent); compare with measured data where the result matters.");
        RelievedFluid liq = RelievedFluid.of(RelievedFluid.Phase.LIQUID, spec, fp, OptionalDouble.empty(), "",
                OptionalDouble.empty(), "not needed for the thermal case (the device is normally a small liquid valve)");
        List<TraceStep> trace = new ArrayList<>();
        trace.add(TraceStep.of("Blocked-in liquid at relieving conditions")
                .equation("alpha_v = (1/v)(dv/dT)_P with (dv/dT)_P = (mu_JT Cp + v)/T on the density basis; c = Cp / M; liquid root")
                .source(spec.eos().displayName() + " (" + spec.eos().citation() + ")")
                .in("T", ScenarioSupport.kelvinC(t)).in("P1", ScenarioSupport.kpa(p) + " abs")
                .out("alpha_v", "%.4g 1/K", alpha)
                .out("c", "%.1f J/(kg K)", c)
                .out("rho", "%.2f kg/m3 (%s)", rho, fp.densityBasis().label()).build());
        trace.add(TraceStep.of("Thermal relief rate").equation("q = alpha_v phi / (rho c); W = rho q")
                .source("API Std 521 / ISO 23251 hydraulic expansion, q = alpha_v phi / (1000 d c) with 1000 d = rho")
                .in("Heat transfer rate phi", "%.2f kW", in.heatW() / 1e3)
                .out("q", "%.4g m3/h", q * 3600)
                .out("W", "%.2f kg/h", q * rho * 3600)
                .out("Check by the standard's form", "%.4g m3/h", check * 3600).build());
        trace.add(TraceStep.of("Does the liquid stay liquid at P1?")
                .equation("bubble (vapour) pressure at T compared with P1")
                .source(spec.eos().displayName())
                .out("Bubble pressure", pb.isPresent() ? ScenarioSupport.kpa(pb.getAsDouble()) + " abs" : "not found")
                .out("Vapour generation governs", vapourGoverns ? "yes" : "no").build());
        trace.add(ScenarioSupport.fluidStep("Relieved liquid", liq));
        return new ThermalReliefResult(in, alpha, c, rho, q, q * rho, check, pb, vapourGoverns, liq, trace,
                new ArrayList<>(warnings));
    }

    /**
     * q = alpha_v phi / (rho c), m3/s (alpha_v 1/K, phi W, rho kg/m3, c J/(kg K)).
     */
    public static double rateM3PerS(double alphaPerK, double heatW, double densityKgM3, double cJPerKgK) {
        org.ventcase.common.InvalidInputException.requirePositive("thermal.expansionCoefficient", alphaPerK, "1/K");
        org.ventcase.common.InvalidInputException.requirePositive("thermal.heat", heatW, "W");
        org.ventcase.common.InvalidInputException.requirePositive("thermal.density", densityKgM3, "kg/m3");
        org.ventcase.common.InvalidInputException.requirePositive("thermal.specificHeat", cJPerKgK, "J/(kg K)");
        return alphaPerK * heatW / (densityKgM3 * cJPerKgK);
    }

    static double bubblePressure(CubicModel model, DensityBasis basis, double t, double[] x) {
        int present = 0;
        int only = -1;
        for (int i = 0; i < x.length; i++) {
            if (x[i] > 0) {
                present++;
                only = i;
            }
        }
        if (present == 1) {
            Component c = model.components().get(only);
            return new PureSaturation(CubicModel.pure(model.variant(), c)).pressure(t);
        }
        return new SaturationPoints(model).bubblePressure(t, x).pressurePa();
    }
}
