package org.ventcase.relief;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingResult;
import org.ventcase.device.OrificeSelection;
import org.ventcase.device.OrificeTable;
import org.ventcase.thermo.CubicModel;
import org.ventcase.vessel.LevelState;

/**
 * Pool fire on a liquid-wetted vessel holding a liquid mixture: the generalisation of
 * {@link WettedFire} to several components.
 *
 * <p>Relieving temperature: the bubble temperature of the liquid at P1. Relieved vapour: the
 * incipient (equilibrium) vapour of that liquid. Latent heat: L = (H_V(y) - H_L(x)) / M_V at the
 * bubble point, J per kg of vapour (definition in {@link BoilingState}). Relief load W = Q / L,
 * or with the vapour-displacement refinement W = Q / L (1 - rho_V / rho_L) (rho of the incipient
 * vapour and of the liquid; exact for a pure fluid, and for a mixture the initial rate while the
 * liquid composition has not yet moved; the boil-off simulation, {@link BoilOff}, follows the
 * composition). The near-critical minimum latent heat of 116.3 kJ/kg (50 Btu/lb) is applied when
 * every component present is a hydrocarbon.
 *
 * <p>Source: API Std 521 / ISO 23251 relief rate from heat input and latent heat (REFERENCES.md
 * section 1); the mixture latent-heat definition and the displacement refinement are stated here
 * (common practice, derived in DEVELOPERS.md).
 */
public final class MixtureFire {

    /** The latent heat definition as printed. */
    public static final String LATENT_HEAT_DEFINITION = "L = (H_V(T_b, P1, y) - H_L(T_b, P1, x)) / M_V: incipient "
            + "vapour minus liquid molar enthalpy at the bubble point, per kg of vapour";

    /** The definition of L for a pure fluid whose latent heat is anchored on a correlation. */
    public static final String ANCHORED_LATENT_HEAT_DEFINITION = "one component: T1 = Tsat(P1) by equal fugacity; L "
            + "from the latent-heat correlation at T1; saturated-vapour density rho_V = M / (v_L + (L / L_cubic) "
            + "(v_V - v_L)_cubic), the Clapeyron equation on the model's own vapour-pressure curve";

    private MixtureFire() {
    }

    /** The latent-heat definition that applies to a boiling state. */
    static String latentHeatDefinition(BoilingState b) {
        return b.latentHeatAnchored() ? ANCHORED_LATENT_HEAT_DEFINITION : LATENT_HEAT_DEFINITION;
    }

    /** The relief load at the initial bubble point, without the vessel and heat-input steps. */
    record Load(BoilingState state, LatentHeatGuard.Result latent, double displacement, double w) {
    }

    static Load load(CubicModel model, MixtureSpec spec, double p1, double heatW, boolean refine) {
        BoilingState b = BoilingState.at(model, spec.densityBasis(), p1, spec.composition(), Double.NaN, null);
        double l = b.latentHeatJPerKg();
        if (!(l > 0)) {
            throw new org.ventcase.common.NoSolutionException("fluid.composition", String.format(Locale.US,
                    "the latent heat at the bubble point (%.4g J/kg) is not positive: the liquid is at or near its "
                            + "critical point at P1; use the near-critical fire scenario", l));
        }
        LatentHeatGuard.Result lh = spec.allHydrocarbon() ? LatentHeatGuard.apply(l)
                : new LatentHeatGuard.Result(l, l, false, "");
        double disp = 1.0 - b.vapourDensity() / b.liquidProps().density();
        double w = heatW / lh.usedJPerKg() * (refine ? disp : 1.0);
        return new Load(b, lh, disp, w);
    }

    /** Runs the case. */
    public static MixtureFireResult run(MixtureFireInput in) {
        return run(in, null, true);
    }

    /**
     * Runs the case with the vessel at its level already evaluated for exactly this input's vessel,
     * level and exposure (the case calculation has it from the inventory); {@code null} evaluates it.
     */
    public static MixtureFireResult run(MixtureFireInput in, LevelState known) {
        return run(in, known, true);
    }

    /**
     * Runs the case as {@link #run(MixtureFireInput, LevelState)}; {@code expansion} false leaves out
     * the isenthalpic expansion to the back pressure (its step, warnings and result), which changes
     * no load, area or orifice: for callers that show none of it (the load-against-level points, the
     * audit's screening run).
     */
    public static MixtureFireResult run(MixtureFireInput in, LevelState known, boolean expansion) {
        List<TraceStep> trace = new ArrayList<>();
        LinkedHashSet<String> warnings = new LinkedHashSet<>(in.fluid().kijWarnings());
        MixtureSpec spec = in.fluid();
        CubicModel model = spec.model();

        RelievingPressureResult rp = RelievingPressure.compute(in.relieving());
        warnings.addAll(rp.warnings());
        double p1 = rp.relievingPressurePa();
        trace.add(RelievingPressure.step(in.relieving(), rp));

        LevelState vs = known != null && known.vessel() == in.vessel() ? known
                : LevelState.of(in.vessel(), in.level(), in.exposure());
        trace.add(TraceStep.of("Vessel and fire-exposed wetted area")
                .equation("A_wetted = wetted inside area below min(liquid level, fire height - elevation)")
                .source("API Std 521 / ISO 23251: wetted surface within 7.6 m (25 ft) of the base of the fire")
                .in("Vessel", in.vessel()::describe)
                .out("Liquid volume", "%.3f m3", vs.liquidVolume())
                .out("Fire-exposed wetted area", "%.3f m2", vs.fire().area())
                .note(vs.fire()::ruleApplied).build());

        HeatInputResult heat = FireHeatInput.wettedVessel(vs.fire().area(), in.environment().f(), in.fireFighting());
        warnings.addAll(heat.warnings());
        in.environment().warning().ifPresent(warnings::add);
        trace.add(TraceStep.of("Fire heat input").equation(heat.equation()).source(heat.source())
                .out("Q", "%.1f kW", heat.heatW() / 1e3).build());

        Load ld = load(model, spec, p1, heat.heatW(), in.subtractDisplacedVapour());
        BoilingState b = ld.state();
        warnings.addAll(b.warnings());
        if (ld.latent().minimumApplied()) {
            warnings.add(ld.latent().warning());
        }
        double tcMix = 0;
        double[] x = spec.composition();
        for (int i = 0; i < x.length; i++) {
            tcMix += x[i] * model.tc(i);
        }
        if (b.temperatureK() / tcMix > 0.9) {
            warnings.add(String.format(Locale.US, "Relieving temperature is at %.3f of the liquid's pseudo-critical "
                    + "temperature (Kay's rule): near the critical point the latent heat falls quickly and the fire "
                    + "load rises; a transient method (the near-critical scenario or boil-off simulation) may be needed. "
                    + "There a cubic equation's vapour density and latent heat also lose accuracy%s.",
                    b.temperatureK() / tcMix, spec.eos() == org.ventcase.thermo.EosVariant.PRTWU
                            ? " (the default model against reference equations at Tr 0.925: vapour density up to 4 % "
                                    + "high, latent heat up to 4 % low, liquid density up to 2.3 % low, docs/accuracy.md)"
                            : ""));
        }
        double liquidMass = vs.liquidVolume() * b.liquidProps().density();
        trace.add(TraceStep.of("Relieving temperature and latent heat")
                .equation(b.latentHeatAnchored() ? ANCHORED_LATENT_HEAT_DEFINITION
                        : "T1 = bubble temperature of the liquid at P1; " + LATENT_HEAT_DEFINITION)
                .source(spec.eos().displayName() + " (" + spec.eos().citation() + "); " + b.method())
                .in("Liquid composition x", ScenarioSupport.fractions(x))
                .out("Relieving temperature T1", ScenarioSupport.kelvinC(b.temperatureK()))
                .out("Incipient vapour y", ScenarioSupport.fractions(b.vapour()))
                .out("H_L, H_V", "%.1f, %.1f J/mol", b.hLiquidJmol(), b.hVapourJmol())
                .out("Liquid density", "%.2f kg/m3 (%s)", b.liquidProps().density(),
                        b.liquidProps().densityBasis().label())
                .out("Vapour density", "%.3f kg/m3%s", b.vapourDensity(), b.latentHeatAnchored()
                        && b.vapourDensity() != b.vapourProps().density()
                        ? " (saturated vapour, by the Clapeyron equation from the latent heat below)" : "")
                .out(b.latentHeatAnchored() ? "Latent heat (correlation)" : "Latent heat (EOS)", "%.2f kJ/kg%s",
                        ld.latent().computedJPerKg() / 1e3, b.latentHeatAnchored()
                                ? " (" + b.latentHeatSource() + "; the cubic alone: "
                                        + String.format(Locale.US, "%.2f",
                                        b.cubicLatentHeatJPerKg() / 1e3) + " kJ/kg)" : "")
                .out("Latent heat used", "%.2f kJ/kg", ld.latent().usedJPerKg() / 1e3)
                .out("Liquid inventory at P1", "%.0f kg", liquidMass).build());
        trace.add(TraceStep.of("Relief load")
                .equation(in.subtractDisplacedVapour() ? "W = Q / L x (1 - rho_V / rho_L)" : "W = Q / L")
                .source("API Std 521 / ISO 23251 relief rate from heat input"
                        + (in.subtractDisplacedVapour() ? ", with the vapour-displacement refinement" : ""))
                .in("1 - rho_V/rho_L", "%.4f%s", ld.displacement(),
                        in.subtractDisplacedVapour() ? "" : " (not applied)")
                .out("W", "%.1f kg/h", ld.w() * 3600).build());

        RelievedFluid vap = RelievedFluid.saturatedVapour(spec, b, OptionalDouble.of(ld.latent().usedJPerKg()));
        trace.add(ScenarioSupport.fluidStep("Relieved vapour at relieving conditions", vap));

        GasSizingResult gs = ScenarioSupport.sizeGas(ld.w(), vap, in.device());
        warnings.addAll(gs.warnings());
        trace.add(ScenarioSupport.sizingStep(gs));
        OrificeSelection os = OrificeTable.select(gs.areaM2(), ld.w());
        trace.add(TraceStep.of("Standard orifice").equation("smallest API 526 effective area >= required area")
                .source("API Std 526 effective orifice areas").out("Orifice", os.designation())
                .note(os.ruleApplied()).build());

        java.util.Optional<IsenthalpicExpansion.Result> ex = java.util.Optional.empty();
        if (expansion) {
            IsenthalpicExpansion.Result e = IsenthalpicExpansion.toBackPressure(spec, vap, in.device().backPressurePa(),
                    in.device().minimumDesignMetalTemperatureK());
            warnings.addAll(e.warnings());
            trace.add(ScenarioSupport.expansionStep(e));
            ex = java.util.Optional.of(e);
        }
        warnings.addAll(vap.warnings());
        return new MixtureFireResult(in, rp, vs, heat, b, ld.latent(), ld.displacement(), ld.w(), vap, gs, os,
                liquidMass, ex, trace, new ArrayList<>(warnings));
    }
}
