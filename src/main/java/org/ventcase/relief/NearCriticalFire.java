package org.ventcase.relief;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.ventcase.common.NoSolutionException;
import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.mix.FlashResult;
import org.ventcase.thermo.mix.MixturePhase;
import org.ventcase.thermo.mix.PTFlash;

/**
 * Fire on a vessel whose contents are near-critical or supercritical: the stepwise (dv/dh)_P
 * method at constant relieving pressure and fixed vessel volume.
 *
 * <p>Equations. With V = m v fixed, U = m u, h = u + P1 v and the outflow carrying h_out:
 * d(m u) = Q dt - h_out dm_out and dm_out = V dv / v^2 give
 * <pre>
 *   W = Q (dv/dh)_P / [ v + (dv/dh)_P (h_out - h) ]
 *   dt = V dh [ v + (dv/dh)_P (h_out - h) ] / (v^2 Q)
 * </pre>
 * For single-phase contents h_out = h and W = Q (dv/dh)_P / v, with (dv/dh)_P = (dv/dT)_P / c_p
 * evaluated analytically from the cubic (ideal-gas heat capacities plus residual parts). If a step
 * finds two phases, the vapour is taken to leave (h_out = h of the vapour) and (dv/dh)_P is a
 * central difference of the flashed contents; the composition change that would follow is not
 * tracked (a warning says so; use the boil-off simulation for boiling mixtures).
 *
 * <p>Procedure: the contents at (T0, P0) fix v0; heated at constant volume they reach P1 at the
 * opening temperature where v(T, P1) = v0 (bisection). From there T is stepped to the final
 * temperature; at each step the required area is computed by the API 520 gas equation with that
 * step's T, Z, M and k, and the case is sized for the largest required area, not the largest mass
 * rate. Time is integrated by the trapezoid rule from the opening.
 *
 * <p>Source: API Std 521 / ISO 23251 note that for supercritical fluids the relief rate follows
 * from the change of specific volume with heat input (REFERENCES.md section 1, [S in principle,
 * form D]); the balance is derived above. A transient (time-dependent) method, including wall
 * heating and the vessel's heat capacity, may be needed; the result says so.
 */
public final class NearCriticalFire {

    private static final int BISECTION_ITER = 80;

    private NearCriticalFire() {
    }

    /** Runs the case. */
    public static NearCriticalFireResult run(NearCriticalFireInput in) {
        MixtureSpec spec = in.fluid();
        CubicModel model = spec.model();
        PTFlash flash = new PTFlash(model);
        double[] z = spec.composition();
        DensityBasis basis = spec.densityBasis();
        double p1 = in.relievingPressurePa();
        LinkedHashSet<String> warnings = new LinkedHashSet<>(spec.kijWarnings());

        double v0 = in.initialSpecificVolumeM3Kg().isPresent() ? in.initialSpecificVolumeM3Kg().getAsDouble()
                : state(model, flash, z, in.initialTemperatureK(), in.initialPressurePa(), basis).v;
        double m0 = in.vesselVolumeM3() / v0;
        double tLo = in.initialTemperatureK();
        double tHi = in.finalTemperatureK();
        double tOpen;
        if (state(model, flash, z, tLo, p1, basis).v >= v0) {
            tOpen = tLo;
        } else {
            if (state(model, flash, z, tHi, p1, basis).v < v0) {
                throw new NoSolutionException("nearCritical.finalTemperature", String.format(Locale.US,
                        "heated at constant volume, the contents do not reach P1 = %.1f kPa abs below %.2f K; "
                                + "raise the final temperature", p1 / 1e3, tHi));
            }
            for (int i = 0; i < BISECTION_ITER && tHi - tLo > 1e-9 * tHi; i++) {
                double mid = 0.5 * (tLo + tHi);
                if (state(model, flash, z, mid, p1, basis).v < v0) {
                    tLo = mid;
                } else {
                    tHi = mid;
                }
            }
            tOpen = 0.5 * (tLo + tHi);
        }

        List<NearCriticalFireResult.Point> curve = new ArrayList<>();
        List<FluidProperties> outflow = new ArrayList<>();
        double dT = (in.finalTemperatureK() - tOpen) / in.steps();
        double t = 0;
        double prevRate = Double.NaN;
        boolean anyTwoPhase = false;
        for (int k = 0; k <= in.steps(); k++) {
            double temp = tOpen + k * dT;
            State s = state(model, flash, z, temp, p1, basis);
            double dvdh;
            double dhdT;
            double excess;
            if (!s.twoPhase) {
                double vMol = s.props.molarVolume();
                double dvdT = (s.props.jouleThomson() * s.props.cp() + vMol) / temp; // m3/(mol K), on the density basis
                dvdh = dvdT / s.props.cp();
                dhdT = s.props.cp() / (s.props.molarMass() * 1e-3);
                excess = 0;
            } else {
                anyTwoPhase = true;
                double d = 1e-4 * temp;
                State a = state(model, flash, z, temp - d, p1, basis);
                State b = state(model, flash, z, temp + d, p1, basis);
                dvdh = (b.v - a.v) / (b.h - a.h);
                dhdT = (b.h - a.h) / (2 * d);
                excess = s.hOut - s.h;
            }
            double denom = s.v + dvdh * excess;
            double w = generalLoad(in.heatW(), dvdh, s.v, excess);
            double rate = in.vesselVolumeM3() * dhdT * denom / (s.v * s.v * in.heatW()); // s per K
            if (k > 0) {
                t += 0.5 * (rate + prevRate) * dT;
            }
            prevRate = rate;
            if (!(w > 0)) {
                throw new NoSolutionException("nearCritical.initialTemperature", String.format(Locale.US,
                        "at %.2f K the contents do not expand on heating at P1 ((dv/dh)_P = %.3g): no relief load "
                                + "by this method", temp, dvdh));
            }
            FluidProperties out = s.outflow;
            RelievedFluid rf = RelievedFluid.of(RelievedFluid.Phase.GAS, spec, out, OptionalDouble.empty(), "",
                    OptionalDouble.empty(), "");
            double area = ScenarioSupport.sizeGas(w, rf, in.device()).areaM2();
            curve.add(new NearCriticalFireResult.Point(temp, t, in.vesselVolumeM3() / s.v, s.v, s.h, dvdh, excess, w,
                    s.twoPhase, out.z(), out.molarMass(), out.kIdeal(), area));
            outflow.add(out);
        }
        int gov = 0;
        int maxW = 0;
        for (int i = 1; i < curve.size(); i++) {
            if (curve.get(i).requiredAreaM2() > curve.get(gov).requiredAreaM2()) {
                gov = i;
            }
            if (curve.get(i).massFlowKgPerS() > curve.get(maxW).massFlowKgPerS()) {
                maxW = i;
            }
        }
        FluidProperties g = outflow.get(gov);
        warnings.addAll(g.warnings());
        RelievedFluid gf = RelievedFluid.of(RelievedFluid.Phase.GAS, spec, g, OptionalDouble.empty(),
                "", OptionalDouble.empty(), "");
        GasSizingResult gs = ScenarioSupport.sizeGas(curve.get(gov).massFlowKgPerS(), gf, in.device());
        warnings.addAll(gs.warnings());
        warnings.add("Near-critical/supercritical fire: the stepwise (dv/dh)_P method assumes constant heat input, "
                + "uniform contents and no wall heat capacity; a transient (time-dependent) method, including the "
                + "wall temperature (the unwetted wall may weaken before relief ends), may be needed.");
        if (anyTwoPhase) {
            warnings.add("Some steps found two phases at P1: the vapour was taken to leave, but the change of the "
                    + "contents' composition was not followed; use the boil-off simulation for a boiling liquid.");
        }
        if (gov == curve.size() - 1) {
            warnings.add("The largest required area is at the final temperature: extend the heat-up range.");
        }
        if (gov != maxW) {
            warnings.add(String.format(Locale.US, "The largest mass rate (%.1f kg/h at %.2f K) is not the sizing "
                    + "point: the largest required area is at %.2f K (%.1f kg/h).",
                    curve.get(maxW).massFlowKgPerS() * 3600, curve.get(maxW).temperatureK(),
                    curve.get(gov).temperatureK(), curve.get(gov).massFlowKgPerS() * 3600));
        }
        List<TraceStep> trace = new ArrayList<>();
        trace.add(TraceStep.of("Opening: heat-up at constant volume to P1")
                .equation(in.initialSpecificVolumeM3Kg().isPresent()
                        ? "v0 = V / m of the inventory; T_open solves v(T_open, P1) = v0 (bisection); m = V / v0"
                        : "v0 = v(T0, P0); T_open solves v(T_open, P1) = v0 (bisection); m = V / v0")
                .source(spec.eos().displayName() + " (" + spec.eos().citation() + "); PT flash for the phase split")
                .in("Initial state T0, P0", ScenarioSupport.kelvinC(in.initialTemperatureK()) + ", "
                        + ScenarioSupport.kpa(in.initialPressurePa()) + " abs")
                .in("Composition", ScenarioSupport.fractions(z))
                .in("Vessel volume V", "%.3f m3", in.vesselVolumeM3())
                .in("P1", ScenarioSupport.kpa(p1) + " abs")
                .out("Specific volume v0", "%.5g m3/kg", v0)
                .out("Contents' mass", "%.0f kg", m0)
                .out("Opening temperature", ScenarioSupport.kelvinC(tOpen)).build());
        NearCriticalFireResult.Point gp = curve.get(gov);
        NearCriticalFireResult.Point mp = curve.get(maxW);
        trace.add(TraceStep.of("Stepwise heat-up at P1")
                .equation("W = Q (dv/dh)_P / [v + (dv/dh)_P (h_out - h)]; single phase: W = Q (dv/dT)_P / (c_p v); "
                        + "dt = V dh [v + (dv/dh)_P (h_out - h)] / (v^2 Q)")
                .source("API Std 521 / ISO 23251: relief of supercritical fluids from the change of specific volume "
                        + "with heat input; balance derived in DEVELOPERS.md")
                .in("Heat input Q", "%.1f kW (constant)", in.heatW() / 1e3)
                .in("Temperature range", ScenarioSupport.kelvinC(tOpen) + " to "
                        + ScenarioSupport.kelvinC(in.finalTemperatureK()))
                .in("Steps", Integer.toString(in.steps()))
                .out("Largest mass rate", "%.1f kg/h at %.2f K", mp.massFlowKgPerS() * 3600,
                        mp.temperatureK())
                .out("Largest required area (sizing point)", "%.1f mm2 at %.2f K, "
                        + "%.1f kg/h, %.0f s after opening", gp.requiredAreaM2() * 1e6, gp.temperatureK(),
                        gp.massFlowKgPerS() * 3600, gp.timeS())
                .out("Two-phase steps", anyTwoPhase ? "yes (vapour taken to leave)" : "none").build());
        trace.add(ScenarioSupport.fluidStep("Relieved fluid at the sizing point", gf));
        trace.add(ScenarioSupport.sizingStep(gs));
        return new NearCriticalFireResult(in, tOpen, m0, curve, gov, maxW, gf, gs, trace, new ArrayList<>(warnings));
    }

    /**
     * The general constant-pressure, fixed-volume balance: W = Q (dv/dh)_P / [v + (dv/dh)_P (h_out - h)].
     *
     * @param heatW        Q, W
     * @param dvdh         (dv/dh)_P of the contents, m3/J
     * @param v            specific volume of the contents, m3/kg
     * @param hOutMinusH   h_out - h, J/kg
     * @return W, kg/s
     */
    public static double generalLoad(double heatW, double dvdh, double v, double hOutMinusH) {
        return heatW * dvdh / (v + dvdh * hOutMinusH);
    }

    /** Contents at (T, P): specific volume and enthalpy, the outflow phase's properties. */
    static final class State {
        double v;
        double h;
        double hOut;
        boolean twoPhase;
        FluidProperties props;
        FluidProperties outflow;
    }

    static State state(CubicModel model, PTFlash flash, double[] z, double t, double p, DensityBasis basis) {
        FlashResult r = flash.flash(t, p, z, basis);
        State s = new State();
        if (!r.twoPhase()) {
            FluidProperties fp = model.properties(t, p, z, PhaseRequest.STABLE, basis);
            s.props = fp;
            s.outflow = fp;
            double mkg = fp.molarMass() * 1e-3;
            s.v = fp.molarVolume() / mkg;
            s.h = BoilingState.enthalpy(model, fp) / mkg;
            s.hOut = s.h;
            return s;
        }
        s.twoPhase = true;
        double vol = 0;
        double h = 0;
        for (MixturePhase ph : r.phases()) {
            vol += ph.amount() * ph.molarVolume();
            double shift = ph.densityBasis() == DensityBasis.TRANSLATED
                    ? model.translatedEnthalpyShift(t, p, ph.composition()) : 0.0;
            h += ph.amount() * (ph.enthalpyJmol() + shift);
        }
        double mkg = r.molarMass() * 1e-3;
        s.v = vol / mkg;
        s.h = h / mkg;
        MixturePhase vap = r.phases().get(1);
        FluidProperties vp = model.properties(t, p, vap.composition(), PhaseRequest.VAPOR, basis);
        s.props = vp;
        s.outflow = vp;
        s.hOut = BoilingState.enthalpy(model, vp) / (vp.molarMass() * 1e-3);
        return s;
    }
}
