package org.ventcase.relief;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.NoSolutionException;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.MixParams;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.mix.SaturationPoint;
import org.ventcase.thermo.mix.SaturationPoints;

/**
 * Boil-off of a multicomponent liquid in a rigid vessel held at the relieving pressure P1, heated
 * at a constant rate Q, the equilibrium vapour leaving through the relief device. The liquid's
 * composition and temperature move as the lighter components boil away; the load curve shows
 * how the relief rate and the required area change.
 *
 * <p>Model. The contents are liquid x at its bubble point T_b(x, P1) and vapour y(x), its
 * incipient vapour, filling the fixed volume V: n_L v_L + n_G v_V = V. The state is fixed by the
 * liquid moles L_i. Balances, with n_out moles vented of composition y and molar enthalpy H_V:
 * <pre>
 *   dN_i = -y_i dn_out                         (N_i = L_i + n_G y_i)
 *   dU   = Q dt - H_V dn_out                   (U = n_L H_L + n_G H_V - P1 V)
 * </pre>
 * Discretisation: equal steps in liquid moles; at each step the vented moles follow from the
 * total moles and the new state (Delta n = sum N_i - n_G' - n_L'), the liquid from
 * L_i' = N_i - ybar_i Delta n - n_G' y_i' with ybar the mean of the vapour compositions at both
 * ends of the step, iterated to convergence (max change below 1e-10 of the moles); the step's
 * duration from the energy balance with the mean vented enthalpy:
 * Q Delta t = U' - U + Delta n (H_V + H_V')/2. Both balances therefore close step by step to
 * round-off; the result reports them. For a pure fluid every step gives exactly
 * W = Q/L (1 - rho_V/rho_L). The relief rate of a step is its vented mass over its duration;
 * its required area uses the vapour at the end of the step.
 *
 * <p>Assumptions (stated on the result): thermodynamic equilibrium between the phases at every
 * instant, no liquid carry-over (vapour-only relief), constant P1 (the valve holds the pressure),
 * constant Q, and the opening state: where the stored contents are known
 * ({@link BoilOffInput#storedMoles}), the same moles per component in the same vessel volume,
 * split into liquid and vapour in equilibrium at P1 (the heat-up to P1 in the closed vessel; its
 * path is not followed); otherwise the stored liquid composition at its bubble point at P1 filling
 * the liquid volume at the level.
 * Enthalpies on the density basis (see {@link BoilingState}).
 *
 * <p>Source: the balances are the standard open-system mass and energy balances (e.g. J.M. Smith,
 * H.C. Van Ness, M.M. Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed., 2005,
 * section 2.12); the fire-case use of a boil-off curve for wide-boiling mixtures is common practice
 * (API Std 521 discusses relieving multicomponent liquids; clause not cited, from memory).
 */
public final class BoilOff {

    /** Liquid fraction (of the initial liquid moles) taken as "exhausted". */
    public static final double EXHAUSTED_FRACTION = 1e-3;
    /** A time limit at or above this (about 31.7 years) is printed as "none". */
    public static final double NO_TIME_LIMIT_S = 1e9;
    private static final int INNER_MAX = 50;
    private static final double INNER_TOL = 1e-10;

    private BoilOff() {
    }

    /** Runs the simulation. */
    public static BoilOffResult run(BoilOffInput in) {
        MixtureSpec spec = in.fluid();
        CubicModel model = spec.model();
        DensityBasis basis = spec.densityBasis();
        LinkedHashSet<String> warnings = new LinkedHashSet<>(spec.kijWarnings());
        double p1 = in.relievingPressurePa();
        double q = in.heatW();
        double vTot = in.vessel().totalVolume();
        double h0 = in.vessel().heightOf(in.level());
        double vl0 = in.vessel().liquidVolume(h0);
        int n = spec.components().size();
        double[] mw = new double[n];
        for (int i = 0; i < n; i++) {
            mw[i] = spec.components().get(i).molarMass() * 1e-3;
        }

        MixtureFire.Load initial = MixtureFire.load(model, spec, p1, q, true);
        BoilingState b = initial.state();
        warnings.addAll(b.warnings());
        double nL = vl0 / b.liquidMolarVolume();
        double nG = (vTot - vl0) / b.vapourMolarVolume();
        if (in.storedMoles().isPresent()) {
            // The stored contents, heated in the closed vessel to P1: the same moles per component
            // in the same volume, split into liquid and vapour at P1 (issue: the stored liquid's
            // volume re-read at P1 lost a sixth of an LPG sphere's mass).
            Start st = start(model, basis, spec, in.storedMoles().get(), vTot, p1, b, warnings);
            MixtureSpec atStart = spec.withComposition(st.state.liquid());
            initial = MixtureFire.load(model, atStart, p1, q, true);
            b = initial.state();
            nL = st.nL;
            nG = st.nG;
        }
        double nL0 = nL;
        double[] liq = b.liquid();
        double[] lMoles = new double[n];
        for (int i = 0; i < n; i++) {
            lMoles[i] = nL * liq[i];
        }
        double u = nL * b.hLiquidJmol() + nG * b.hVapourJmol() - p1 * vTot;
        double u0 = u;
        double mass0 = nL * b.liquidProps().molarMass() * 1e-3 + nG * b.vapourProps().molarMass() * 1e-3;

        List<BoilOffPoint> curve = new ArrayList<>();
        List<BoilingState> states = new ArrayList<>();
        List<Double> loads = new ArrayList<>();
        double initialArea = area(initial.w(), b, spec, in.device());
        curve.add(point(0, b, nL, nG, initial.w(), b.hVapourJmol() / (b.vapourProps().molarMass() * 1e-3),
                initialArea));
        states.add(b);
        loads.add(initial.w());

        boolean toExhaustion = in.stopLiquidFraction() == 0;
        double stopFraction = toExhaustion ? EXHAUSTED_FRACTION : in.stopLiquidFraction();
        double dnL = nL0 * (1 - stopFraction) / in.steps();
        double t = 0;
        double vented = 0;
        double ventedH = 0;
        BoilOffResult.StopReason reason = toExhaustion ? BoilOffResult.StopReason.LIQUID_EXHAUSTED
                : BoilOffResult.StopReason.LIQUID_FRACTION_REACHED;
        double[] total = new double[n];
        double[] lNew = new double[n];
        double[] x = new double[n];
        BoilingState prev = null;
        double nGPrev = nG;
        for (int k = 1; k <= in.steps(); k++) {
            double[] y = b.vapour();
            for (int i = 0; i < n; i++) {
                total[i] = lMoles[i] + nG * y[i];
            }
            double sumTotal = 0;
            for (double v : total) {
                sumTotal += v;
            }
            double nLNew = k == in.steps() ? nL0 * stopFraction : nL0 - k * dnL;
            // Predictor: extrapolate T, ln K and n_G linearly from the last two points.
            double tGuess = b.temperatureK();
            double[] lnK = b.lnK();
            double nGNew = nG;
            if (prev != null) {
                double[] lnKPrev = prev.lnK();
                for (int i = 0; i < n; i++) {
                    lnK[i] = 2 * lnK[i] - lnKPrev[i];
                }
                tGuess = 2 * tGuess - prev.temperatureK();
                nGNew = 2 * nG - nGPrev;
            }
            double dn = 0;
            boolean converged = false;
            boolean liquidFull = false;
            Light lb = null;
            int it;
            for (it = 0; it < INNER_MAX; it++) {
                // Mass balance at fixed K: A_i = N_i - y_i dn/2 = n_L' x_i' + c y_i', c = dn/2 + n_G', y' = K x'
                // -> x_i' = A_i / (n_L' + c K_i), normalised; then the bubble point of x' updates T and K.
                dn = sumTotal - nGNew - nLNew;
                double c = 0.5 * dn + nGNew;
                double s = 0;
                for (int i = 0; i < n; i++) {
                    double a = total[i] - 0.5 * y[i] * dn;
                    x[i] = a > 0 ? a / (nLNew + c * Math.exp(lnK[i])) : 0.0;
                    s += x[i];
                }
                for (int i = 0; i < n; i++) {
                    x[i] /= s;
                }
                double[] yPrev = new double[n];
                double sy = 0;
                for (int i = 0; i < n; i++) {
                    yPrev[i] = x[i] * Math.exp(lnK[i]);
                    sy += yPrev[i];
                }
                for (int i = 0; i < n; i++) {
                    yPrev[i] /= sy;
                }
                lb = light(model, basis, p1, x, tGuess, lnK);
                tGuess = lb.t;
                lnK = lb.lnK;
                double nGNext = (vTot - nLNew * lb.vL) / lb.vV;
                if (!(nGNext > 0)) {
                    liquidFull = true;
                    break;
                }
                double change = Math.abs(nGNext - nGNew) + Math.abs(s - 1) * nLNew;
                for (int i = 0; i < n; i++) {
                    change = Math.max(change, Math.abs(lb.y[i] - yPrev[i]) * sumTotal);
                }
                nGNew = nGNext;
                if (change <= INNER_TOL * sumTotal) {
                    converged = true;
                    break;
                }
            }
            BoilingState bn = b;
            if (converged) {
                bn = BoilingState.at(model, basis, p1, x, lb.t, lb.lnK);
                nGNew = (vTot - nLNew * bn.liquidMolarVolume()) / bn.vapourMolarVolume();
                dn = sumTotal - nGNew - nLNew;
                double[] xn = bn.liquid();
                double[] ynn = bn.vapour();
                for (int i = 0; i < n; i++) {
                    lNew[i] = nLNew * xn[i];
                    double residual = total[i] - 0.5 * (y[i] + ynn[i]) * dn - nGNew * ynn[i] - lNew[i];
                    if (!(Math.abs(residual) <= 1e-8 * sumTotal)) {
                        throw new ConvergenceException("boil-off step (component balance)", it, residual,
                                String.format(Locale.US, "component %s in step %d of %d",
                                        spec.components().get(i).name(), k, in.steps()));
                    }
                }
            }
            if (liquidFull) {
                warnings.add(String.format(Locale.US, "At %.0f s the expanding liquid would fill the vessel: the "
                        + "vapour-only boil-off model ends here; liquid or two-phase relief must be considered.", t));
                reason = BoilOffResult.StopReason.VESSEL_LIQUID_FULL;
                break;
            }
            if (!converged) {
                throw new ConvergenceException("boil-off step (substitution on the end state)", INNER_MAX, Double.NaN,
                        String.format(Locale.US, "step %d of %d at T = %.3f K", k, in.steps(), bn.temperatureK()));
            }
            if (!(dn > 0)) {
                warnings.add(String.format(Locale.US, "At %.0f s no vapour leaves (the liquid's expansion takes the "
                        + "volume): the device would close; the run ends here.", t));
                reason = BoilOffResult.StopReason.VESSEL_LIQUID_FULL;
                break;
            }
            double[] yn = bn.vapour();
            double ventMass = 0;
            for (int i = 0; i < n; i++) {
                ventMass += 0.5 * (y[i] + yn[i]) * dn * mw[i];
            }
            double ventEnthalpy = dn * 0.5 * (b.hVapourJmol() + bn.hVapourJmol());
            double uNew = nLNew * bn.hLiquidJmol() + nGNew * bn.hVapourJmol() - p1 * vTot;
            double dt = (uNew - u + ventEnthalpy) / q;
            if (!(dt > 0)) {
                throw new ConvergenceException("boil-off step (energy balance)", k, dt, String.format(Locale.US,
                        "the step needs no heat (dt = %.3g s) at T = %.3f K: the state is not boiling normally", dt,
                        bn.temperatureK()));
            }
            t += dt;
            vented += ventMass;
            ventedH += ventEnthalpy;
            double w = ventMass / dt;
            System.arraycopy(lNew, 0, lMoles, 0, n);
            prev = b;
            nGPrev = nG;
            nL = nLNew;
            nG = nGNew;
            u = uNew;
            b = bn;
            warnings.addAll(bn.warnings());
            curve.add(point(t, bn, nL, nG, w, ventEnthalpy / ventMass, area(w, bn, spec, in.device())));
            states.add(bn);
            loads.add(w);
            if (t >= in.timeLimitS()) {
                reason = BoilOffResult.StopReason.TIME_LIMIT;
                break;
            }
        }
        int peak = 0;
        for (int i = 1; i < curve.size(); i++) {
            if (curve.get(i).requiredAreaM2() > curve.get(peak).requiredAreaM2()) {
                peak = i;
            }
        }
        BoilingState ps = states.get(peak);
        double wPeak = loads.get(peak);
        RelievedFluid peakVapour = RelievedFluid.saturatedVapour(spec, ps, OptionalDouble.of(ps.latentHeatJPerKg()));
        GasSizingResult peakSizing = ScenarioSupport.sizeGas(wPeak, peakVapour, in.device());
        warnings.addAll(peakSizing.warnings());
        double massF = 0;
        double[] xf = b.liquid();
        double[] yf = b.vapour();
        for (int i = 0; i < n; i++) {
            massF += (nL * xf[i] + nG * yf[i]) * mw[i];
        }
        BoilOffResult.Balance bal = new BoilOffResult.Balance(mass0, massF, vented, q * t, u0, u, ventedH,
                mass0 - massF - vented, q * t - (u - u0) - ventedH);
        if (peak == curve.size() - 1 && curve.size() > 2) {
            warnings.add("The largest required area is at the last point of the run: the load may rise further "
                    + "beyond the stop condition.");
        }
        if (initial.latent().minimumApplied()) {
            warnings.add(initial.latent().warning());
        }
        warnings.add("Boil-off model: equilibrium between liquid and vapour, vapour-only relief (no liquid "
                + "carry-over), constant P1 and Q; " + (in.storedMoles().isPresent()
                ? "the opening state is the stored contents (every component's moles) heated in the closed vessel "
                        + "to P1."
                : "the opening state is the stored liquid at its bubble point at P1."));
        double a0 = curve.get(0).requiredAreaM2();
        double w0 = curve.get(0).massFlowKgPerS();
        List<TraceStep> trace = trace(in, initial, nL0, vl0, vTot, curve, peak, reason, bal, peakVapour, peakSizing);
        return new BoilOffResult(in, curve, peak, w0, a0, wPeak, curve.get(peak).requiredAreaM2(),
                100 * (curve.get(peak).requiredAreaM2() - a0) / a0, 100 * (wPeak - w0) / w0, peakVapour, peakSizing,
                reason, bal, trace, new ArrayList<>(warnings));
    }

    private static List<TraceStep> trace(BoilOffInput in, MixtureFire.Load initial, double nL0, double vl0,
                                         double vTot, List<BoilOffPoint> curve, int peak,
                                         BoilOffResult.StopReason reason, BoilOffResult.Balance bal,
                                         RelievedFluid peakVapour, GasSizingResult peakSizing) {
        List<TraceStep> trace = new ArrayList<>();
        BoilingState b = initial.state();
        MixtureSpec spec = in.fluid();
        boolean stored = in.storedMoles().isPresent();
        trace.add(TraceStep.of(stored ? "Opening state: the stored contents at P1" : "Opening state: liquid at its "
                        + "bubble point at P1")
                .equation(stored ? "N_i stored; x_i = N_i / (n_L + n_G K_i), T = T_b(x, P1); n_L v_L + n_G v_V = V, "
                        + "n_L + n_G = N" : "T_b(x, P1) by equal fugacities; n_L = V_L / v_L, n_G = (V - V_L) / v_V")
                .source(spec.eos().displayName() + " (" + spec.eos().citation() + "); " + b.method())
                .in("P1", ScenarioSupport.kpa(in.relievingPressurePa()) + " abs")
                .in("Liquid composition x", ScenarioSupport.fractions(b.liquid()))
                .in("Liquid volume at opening", "%.3f m3 of %.3f m3", stored ? nL0 * b.liquidMolarVolume() : vl0, vTot)
                .out("Bubble temperature", ScenarioSupport.kelvinC(b.temperatureK()))
                .out("Incipient vapour y", ScenarioSupport.fractions(b.vapour()))
                .out("Liquid moles", "%.1f kmol", nL0 / 1e3)
                .out("Latent heat (EOS)", "%.2f kJ/kg", initial.latent().computedJPerKg() / 1e3)
                .out("Opening load Q/L (1 - rho_V/rho_L)", "%.1f kg/h", initial.w() * 3600)
                .build());
        BoilOffPoint last = curve.get(curve.size() - 1);
        trace.add(TraceStep.of("Boil-off at constant P1 in the fixed vessel volume")
                .equation("dN_i = -y_i dn_out; dU = Q dt - H_V dn_out; n_L v_L + n_G v_V = V; equal steps in liquid "
                        + "moles, trapezoid-mean vented composition and enthalpy")
                .source("open-system mass and energy balances (Smith, Van Ness, Abbott, 7th ed., 2005, section "
                        + "2.12); boil-off curves for wide-boiling mixtures: common practice")
                .in("Heat input Q", "%.1f kW (constant)", in.heatW() / 1e3)
                .in("Steps", Integer.toString(in.steps()))
                .in("Stop at liquid fraction", in.stopLiquidFraction() == 0
                        ? String.format(Locale.US, "exhausted (%.1f %% left)", 100 * EXHAUSTED_FRACTION)
                        : String.format(Locale.US, "%.3f of the liquid moles at opening", in.stopLiquidFraction()))
                .in("Time limit", in.timeLimitS() >= NO_TIME_LIMIT_S ? "none"
                        : String.format(Locale.US, "%.0f s (%.2f h)", in.timeLimitS(), in.timeLimitS() / 3600))
                .out("Points on the load curve", Integer.toString(curve.size()))
                .out("Run ended", reason.name().toLowerCase(Locale.ROOT).replace('_', ' ')
                        + String.format(Locale.US, " at %.0f s (%.2f h)", last.timeS(), last.timeS() / 3600))
                .out("Liquid temperature at the end", ScenarioSupport.kelvinC(last.temperatureK()))
                .out("Liquid left", "%.0f kg", last.liquidMassKg())
                .out("Vented mass", "%.0f kg", bal.ventedMassKg()).build());
        BoilOffPoint p = curve.get(peak);
        trace.add(TraceStep.of("Sizing point: largest required area on the load curve")
                .equation("A(t) = API 520 gas area at W(t) and the vapour's T, Z, M, k at t; size for max A(t)")
                .source("API Std 520 Part I gas sizing at each point; governing point by largest area")
                .out("Opening: W, A", "%.1f kg/h, %.1f mm2", curve.get(0).massFlowKgPerS()
                        * 3600, curve.get(0).requiredAreaM2() * 1e6)
                .out("Peak: time", "%.0f s (point %d of %d)", p.timeS(), peak, curve.size() - 1)
                .out("Peak: liquid temperature", ScenarioSupport.kelvinC(p.temperatureK()))
                .out("Peak: W, A", "%.1f kg/h, %.1f mm2", p.massFlowKgPerS() * 3600,
                        p.requiredAreaM2() * 1e6).build());
        trace.add(TraceStep.of("Balances over the run")
                .equation("mass: m_0 - m_end - m_vented = 0; energy: Q t - (U_end - U_0) - H_vented = 0")
                .source("the simulated states (checked, not assumed)")
                .out("Mass residual", closure(bal.massResidualKg(), bal.initialMassKg(), "kg", "initial mass"))
                .out("Energy residual", closure(bal.energyResidualJ(), bal.heatInJ(), "J", "heat in")).build());
        trace.add(ScenarioSupport.fluidStep("Relieved vapour at the sizing point", peakVapour));
        trace.add(ScenarioSupport.sizingStep(peakSizing));
        return trace;
    }

    /** The state at P1 the boil-off starts from (see {@link #start}). */
    private record Start(BoilingState state, double nL, double nG) {
    }

    /**
     * The stored moles N_i in the vessel volume V at P1: the liquid moles n_L are found so that
     * n_L v_L + n_G v_V = V with n_G = N - n_L, where for each n_L the liquid and vapour are in
     * equilibrium at P1 (x_i = N_i/(n_L + n_G K_i), T the bubble temperature of x). The volume
     * residual falls with n_L at the rate v_V - v_L, so Newton on n_L converges in a few steps. Where
     * even all the contents as liquid would more than fill the vessel, the vessel is taken full of
     * liquid and the excess is reported as liquid that must leave before boil-off can begin.
     */
    private static Start start(CubicModel model, DensityBasis basis, MixtureSpec spec, double[] moles, double vTot,
                               double p1, BoilingState guess, LinkedHashSet<String> warnings) {
        int n = moles.length;
        double nTot = 0;
        for (double m : moles) {
            nTot += m;
        }
        double[] z = new double[n];
        for (int i = 0; i < n; i++) {
            z[i] = moles[i] / nTot;
        }
        // all liquid: the bubble point of the whole contents
        BoilingState bz = BoilingState.bubblePoint(spec.withComposition(z), p1);
        if (nTot * bz.liquidMolarVolume() >= vTot) {
            double nL = vTot / bz.liquidMolarVolume();
            double excessKg = (nTot - nL) * bz.liquidProps().molarMass() * 1e-3;
            warnings.add(String.format(Locale.US, "Heated to the relieving pressure, the stored contents would more "
                    + "than fill the vessel as liquid (%.0f kg too much at %.1f C): liquid relief comes first; the "
                    + "boil-off is computed from a vessel full of liquid at P1, and the excess is not in the vented "
                    + "vapour.", excessKg, bz.temperatureK() - 273.15));
            return new Start(bz, nL, 0.0);
        }
        // all vapour: even with no liquid the contents' vapour at its dew point would not fill the vessel
        try {
            org.ventcase.thermo.mix.SaturationPoint dew = new org.ventcase.thermo.mix.SaturationPoints(model)
                    .dewTemperature(p1, z);
            double vDew = model.properties(dew.temperatureK(), p1, z, org.ventcase.thermo.PhaseRequest.VAPOR, basis)
                    .molarVolume();
            if (nTot * vDew <= vTot) {
                throw new NoSolutionException("boilOff.storage", String.format(Locale.US, "heated to the relieving "
                        + "pressure in the closed vessel the stored contents are all vapour (at the dew point, %.1f C, "
                        + "they would take %.1f of %.1f m3): there is no liquid to boil off; use the gas-filled fire "
                        + "scenario", dew.temperatureK() - 273.15, nTot * vDew, vTot));
            }
        } catch (org.ventcase.common.ConvergenceException ignored) {
            // no dew point found: the volume check after the solve below still guards the result
        }
        double[] lnK = guess.lnK().clone();
        double t = guess.temperatureK();
        double nL = nTot * 0.99;
        double r = Double.NaN;
        double[] x = new double[n];
        Light lb = null;
        for (int outer = 0; outer < 60; outer++) {
            double nG = nTot - nL;
            for (int it = 0; it < INNER_MAX; it++) {
                double s = 0;
                for (int i = 0; i < n; i++) {
                    x[i] = moles[i] > 0 ? moles[i] / (nL + nG * Math.exp(lnK[i])) : 0.0;
                    s += x[i];
                }
                double change = 0;
                for (int i = 0; i < n; i++) {
                    x[i] /= s;
                }
                lb = light(model, basis, p1, x, t, lnK);
                for (int i = 0; i < n; i++) {
                    change = Math.max(change, Math.abs(lb.lnK[i] - lnK[i]));
                }
                t = lb.t;
                lnK = lb.lnK;
                if (change < 1e-12 && Math.abs(s - 1) < 1e-12) {
                    break;
                }
            }
            r = nL * lb.vL + nG * lb.vV - vTot;
            if (Math.abs(r) <= 1e-10 * vTot) {
                break;
            }
            double next = nL + r / (lb.vV - lb.vL);
            nL = Math.min(nTot, Math.max(0.5 * nL, next));
        }
        if (!(Math.abs(r) <= 1e-8 * vTot)) {
            throw new ConvergenceException("boil-off start (stored contents at P1, volume balance)", 60, r / vTot,
                    String.format(Locale.US, "liquid %.6g of %.6g mol", nL, nTot));
        }
        BoilingState b0 = BoilingState.at(model, basis, p1, x, t, lnK);
        double nG = nTot - nL;
        double[] y = b0.vapour();
        double[] xb = b0.liquid();
        for (int i = 0; i < n; i++) {
            double residual = moles[i] - nL * xb[i] - nG * y[i];
            if (!(Math.abs(residual) <= 1e-8 * nTot)) {
                throw new ConvergenceException("boil-off start (stored contents at P1)", 60, residual,
                        String.format(Locale.US, "component %s", spec.components().get(i).name()));
            }
        }
        return new Start(b0, nL, nG);
    }

    /** Bubble point and phase volumes only: the inner loop's evaluation (no full property sets). */
    private static final class Light {
        double t;
        double[] y;
        double[] lnK;
        double vL;
        double vV;
    }

    private static Light light(CubicModel model, DensityBasis basis, double p, double[] x, double t0, double[] lnK0) {
        int present = 0;
        for (double v : x) {
            if (v > 0) {
                present++;
            }
        }
        Light l = new Light();
        if (present == 1) {
            BoilingState b = BoilingState.at(model, basis, p, x, t0, lnK0);
            l.t = b.temperatureK();
            l.y = b.vapour();
            l.lnK = b.lnK();
            l.vL = b.liquidMolarVolume();
            l.vV = b.vapourMolarVolume();
            return l;
        }
        SaturationPoint sp = new SaturationPoints(model).temperature(SaturationPoint.Kind.BUBBLE, p, x, t0, lnK0);
        l.t = sp.temperatureK();
        l.y = sp.incipientComposition();
        double[] k = sp.kValues();
        l.lnK = new double[k.length];
        for (int i = 0; i < k.length; i++) {
            l.lnK[i] = Math.log(k[i]);
        }
        l.vL = molarVolume(model, basis, l.t, p, x, PhaseRequest.LIQUID);
        l.vV = molarVolume(model, basis, l.t, p, l.y, PhaseRequest.VAPOR);
        return l;
    }

    /** Molar volume of the requested root on the density basis, as CubicModel.properties computes it. */
    private static double molarVolume(CubicModel model, DensityBasis basis, double t, double p, double[] x,
                                      PhaseRequest req) {
        MixParams m = model.mix(t, x);
        double v = model.select(m, p, req).z() * PhysicalConstants.R * t / p;
        if (basis == DensityBasis.TRANSLATED && model.hasVolumeShift()) {
            double vt = v - model.volumeShift(t, x);
            return vt > 0 ? vt : v;
        }
        return v;
    }

    private static double area(double w, BoilingState s, MixtureSpec spec, DeviceSpec d) {
        RelievedFluid f = RelievedFluid.of(RelievedFluid.Phase.VAPOUR, spec, s.vapourProps(), OptionalDouble.empty(), "",
                OptionalDouble.empty(), "");
        return ScenarioSupport.sizeGas(w, f, d).areaM2();
    }

    private static BoilOffPoint point(double t, BoilingState s, double nL, double nG, double w, double hOut,
                                      double area) {
        return new BoilOffPoint(t, s.temperatureK(), s.liquid(), s.vapour(), nL * s.liquidProps().molarMass() * 1e-3,
                nG * s.vapourProps().molarMass() * 1e-3, w, hOut, s.vapourProps().molarMass(), s.vapourProps().z(),
                s.vapourProps().kIdeal(), area);
    }

    /**
     * A balance residual as a reviewer reads it: relative to its reference, and shown only as a
     * bound where it is at round-off level (below 1e-9 of the reference), so the printed text does
     * not change with the last bits of floating-point arithmetic.
     */
    static String closure(double residual, double reference, String unit, String what) {
        double rel = Math.abs(residual) / Math.abs(reference);
        if (rel < 1e-9) {
            return String.format(Locale.US, "below 1e-9 of the %s (%.4g %s): closes to round-off", what, reference,
                    unit);
        }
        return String.format(Locale.US, "%.3g %s (%.2g of the %s, %.4g %s)", residual, unit, rel, what, reference,
                unit);
    }
}
