package org.ventcase.calc;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.NoSolutionException;
import org.ventcase.common.TraceStep;
import org.ventcase.device.LiquidSizing;
import org.ventcase.device.LiquidSizingInput;
import org.ventcase.device.LiquidSizingResult;
import org.ventcase.device.OrificeSelection;
import org.ventcase.device.OrificeTable;
import org.ventcase.inventory.Fluid;
import org.ventcase.inventory.Inventories;
import org.ventcase.inventory.Inventory;
import org.ventcase.inventory.Storage;
import org.ventcase.relief.BlockedOutlet;
import org.ventcase.relief.BlockedOutletInput;
import org.ventcase.relief.BlockedOutletResult;
import org.ventcase.relief.BoilOff;
import org.ventcase.relief.BoilOffInput;
import org.ventcase.relief.BoilOffPoint;
import org.ventcase.relief.BoilOffResult;
import org.ventcase.relief.EnvironmentFactor;
import org.ventcase.relief.EnvironmentFactors;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.FireHeatInput;
import org.ventcase.relief.FireLoadCurve;
import org.ventcase.relief.GasFilledFire;
import org.ventcase.relief.GasFilledFireInput;
import org.ventcase.relief.GasFilledFireResult;
import org.ventcase.relief.HeatInputResult;
import org.ventcase.relief.MixtureFire;
import org.ventcase.relief.MixtureFireInput;
import org.ventcase.relief.MixtureFireResult;
import org.ventcase.relief.MixtureSpec;
import org.ventcase.relief.NearCriticalFire;
import org.ventcase.relief.NearCriticalFireInput;
import org.ventcase.relief.NearCriticalFireResult;
import org.ventcase.relief.RelievedFluid;
import org.ventcase.relief.RelievingPressure;
import org.ventcase.relief.RelievingPressureResult;
import org.ventcase.relief.ThermalRelief;
import org.ventcase.relief.ThermalReliefInput;
import org.ventcase.relief.ThermalReliefResult;
import org.ventcase.thermo.Composition;
import org.ventcase.thermo.mix.PhaseEnvelope;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.LevelState;

/**
 * Runs a case: the vessel at its level and the inventory once, then every scenario by its relief
 * class, each sized by API 520 (gas or liquid) with an API 526 orifice, then the governing
 * scenario by {@link CaseResult#GOVERNING_RULE}. Thin: it maps the case to each relief class's
 * input and collects what they return; the numbers come from relief, inventory, device and thermo.
 *
 * <p>Choices made here (stated in the README and in each trace):
 * <ul>
 * <li>Wetted fire goes through {@link MixtureFire} for pure fluids and mixtures alike (one component
 *     gives exactly {@code WettedFire}'s answer), with the standard form W = Q / L.</li>
 * <li>Fire scenarios with a wetted area use the fire-exposed wetted area at the storage level.</li>
 * <li>Near-critical heat-up: from the storage state to the storage temperature + 300 K.</li>
 * <li>Blocked outlet: the storage vapour composition when given, else the fluid's; liquid and
 *     gas-filled or specified storage at the storage temperature; vapour from saturated storage at
 *     its dew point at P1.</li>
 * <li>Thermal expansion: the liquid at the storage temperature and P1.</li>
 * </ul>
 * A scenario whose method has no answer (e.g. a wetted fire whose P1 is above the critical
 * pressure) is reported with its reason and no numbers; the others still run.
 */
public final class CaseCalculation {

    /** Heat-up range of the near-critical case above the storage temperature, K. */
    public static final double NEAR_CRITICAL_HEAT_UP_K = 300.0;

    /** Lowest fill level of a wetted fire's load-against-level curve, % of volume. */
    public static final double LEVEL_CURVE_FROM_PERCENT = 5;
    /** Highest fill level of the curve, % of volume. */
    public static final double LEVEL_CURVE_TO_PERCENT = 95;
    /** Intervals of the curve (5 % steps; the case's own level is added). */
    public static final int LEVEL_CURVE_STEPS = 18;

    private static final double NO_TIME_LIMIT_S = 1e12;

    private CaseCalculation() {
    }

    /**
     * Watches a run: told what is being computed, asked between steps whether to stop. Called on the
     * calculating thread.
     */
    public interface Monitor {
        /** Fraction done 0..1 and what comes next. */
        void progress(double fraction, String message);

        /** Polled between steps (inventory, each scenario, the envelope); true stops the run. */
        boolean cancelled();

        /** A monitor that ignores progress and never cancels. */
        Monitor NONE = new Monitor() {
            @Override
            public void progress(double fraction, String message) {
            }

            @Override
            public boolean cancelled() {
                return false;
            }
        };
    }

    /** Thrown by {@link #run(CaseInput, Monitor)} when the monitor asked to stop. */
    public static final class Cancelled extends RuntimeException {
        private static final long serialVersionUID = 1L;

        public Cancelled() {
            super("case calculation cancelled");
        }
    }

    /**
     * What a run computes beyond each scenario's own result.
     *
     * @param levelCurve the wetted fire's load against fill level (the scenario re-run over 19 levels)
     * @param envelope   the phase envelope of a mixture
     * @param expansion  the fire scenarios' isenthalpic expansion to the back pressure (outlet temperature,
     *                   brittle-fracture and outlet-condensation warnings); loads, areas and orifices do not
     *                   depend on it
     */
    public record Options(boolean levelCurve, boolean envelope, boolean expansion) {
        /** Everything: what the sheet, the results JSON and the wizard show. */
        public static final Options FULL = new Options(true, true, true);
        /**
         * The numbers of each scenario and of the inventory only, through the same code as
         * {@link #FULL}, so they are identical (the audit's screening path).
         */
        public static final Options SCREENING = new Options(false, false, false);
    }

    /** Why the parts left out by {@link Options#SCREENING} are absent. */
    public static final String NOT_COMPUTED = "not computed in a screening run";

    /** Runs every scenario of the case. */
    public static CaseResult run(CaseInput in) {
        return run(in, Monitor.NONE);
    }

    /** Runs every scenario of the case, computing what the options ask for. */
    public static CaseResult run(CaseInput in, Options options) {
        return run(in, Monitor.NONE, options);
    }

    /**
     * Runs every scenario of the case, reporting progress and stopping between steps when the
     * monitor asks ({@link Cancelled}).
     */
    public static CaseResult run(CaseInput in, Monitor monitor) {
        return run(in, monitor, Options.FULL);
    }

    /** Runs every scenario of the case with the monitor and the options. */
    public static CaseResult run(CaseInput in, Monitor monitor, Options options) {
        int n = in.scenarios().size();
        double steps = n + 2.0;
        monitor.progress(0, "Inventory at storage conditions");
        check(monitor);
        // each scenario's relieving pressure, computed once and handed to its scenario
        double maxP1 = 0;
        List<RelievingPressureResult> p1s = new ArrayList<>();
        for (CaseInput.Scenario s : in.scenarios()) {
            RelievingPressureResult rp = RelievingPressure.compute(s.relieving());
            p1s.add(rp);
            maxP1 = Math.max(maxP1, rp.relievingPressurePa());
        }
        Storage storage = in.storage();
        if (storage instanceof Storage.Saturated sat) {
            storage = new Storage.Saturated(sat.temperatureK(), OptionalDouble.of(maxP1));
        }
        Inventory inv = Inventories.compute(in.fluid(), storage, in.vessel(), in.level(), in.exposure());
        Context ctx = new Context(in, inv, options);
        List<CaseResult.ScenarioResult> results = new ArrayList<>();
        for (CaseInput.Scenario s : in.scenarios()) {
            monitor.progress((results.size() + 1) / steps, "Scenario " + (results.size() + 1) + " of " + n + ": "
                    + s.label());
            check(monitor);
            results.add(runOne(ctx, s, p1s.get(results.size())));
        }
        monitor.progress((n + 1) / steps, "Phase envelope");
        check(monitor);
        CaseResult.Envelope envelope = options.envelope() ? envelope(in)
                : new CaseResult.Envelope(Optional.empty(), NOT_COMPUTED);
        OptionalInt gov = governing(results);
        List<CaseResult.ScenarioResult> marked = new ArrayList<>();
        for (int i = 0; i < results.size(); i++) {
            marked.add(results.get(i).withGoverning(gov.isPresent() && gov.getAsInt() == i));
        }
        CaseResult r = new CaseResult(in.title(), in.tag(), in.inputHash(), inv.vessel(), inv, marked, gov,
                CaseResult.GOVERNING_RULE, warnings(in, inv, marked, gov), envelope);
        monitor.progress(1, "Done");
        return r;
    }

    private static void check(Monitor m) {
        if (m.cancelled()) {
            throw new Cancelled();
        }
    }

    // ------------------------------------------------------------------------------ envelope

    /**
     * The phase envelope of the stored liquid's composition (the fluid's composition; for a gas-filled
     * vessel the gas's) with the case's EOS and k_ij; for one component present, none (a pure
     * fluid has a saturation curve, not an envelope).
     */
    static CaseResult.Envelope envelope(CaseInput in) {
        double[] x = in.fluid().composition().fractions();
        int present = 0;
        for (double v : x) {
            if (v > 0) {
                present++;
            }
        }
        if (present < 2) {
            return new CaseResult.Envelope(Optional.empty(), "a pure fluid has no phase envelope, only its "
                    + "saturation curve");
        }
        try {
            return new CaseResult.Envelope(Optional.of(new PhaseEnvelope(in.fluid().model()).trace(x)), "");
        } catch (NoSolutionException | ConvergenceException | InvalidInputException e) {
            return new CaseResult.Envelope(Optional.empty(), "the phase envelope could not be traced: "
                    + e.getMessage());
        }
    }

    // ------------------------------------------------------------------------------ governing

    static OptionalInt governing(List<CaseResult.ScenarioResult> rs) {
        int bestGas = -1;
        int bestLiquid = -1;
        for (int i = 0; i < rs.size(); i++) {
            CaseResult.ScenarioResult r = rs.get(i);
            if (r.requiredAreaM2().isEmpty()) {
                continue;
            }
            double a = r.requiredAreaM2().getAsDouble();
            if (r.relievesLiquid()) {
                if (bestLiquid < 0 || a > rs.get(bestLiquid).requiredAreaM2().getAsDouble()) {
                    bestLiquid = i;
                }
            } else if (bestGas < 0 || a > rs.get(bestGas).requiredAreaM2().getAsDouble()) {
                bestGas = i;
            }
        }
        return bestGas >= 0 ? OptionalInt.of(bestGas) : bestLiquid >= 0 ? OptionalInt.of(bestLiquid) : OptionalInt.empty();
    }

    private static List<CaseResult.CaseWarning> warnings(CaseInput in, Inventory inv,
                                                         List<CaseResult.ScenarioResult> rs, OptionalInt gov) {
        Map<String, List<String>> by = new LinkedHashMap<>();
        for (String w : in.warnings()) {
            by.computeIfAbsent(w, k -> new ArrayList<>());
        }
        for (String w : inv.warnings()) {
            by.computeIfAbsent(w, k -> new ArrayList<>());
        }
        for (CaseResult.ScenarioResult r : rs) {
            for (String w : r.warnings()) {
                List<String> tags = by.computeIfAbsent(w, k -> new ArrayList<>());
                if (!in.warnings().contains(w) && !inv.warnings().contains(w) && !tags.contains(r.label())) {
                    tags.add(r.label());
                }
            }
        }
        if (gov.isPresent() && !rs.get(gov.getAsInt()).relievesLiquid()) {
            CaseResult.ScenarioResult g = rs.get(gov.getAsInt());
            for (CaseResult.ScenarioResult r : rs) {
                if (r.relievesLiquid() && r.requiredAreaM2().isPresent()
                        && r.requiredAreaM2().getAsDouble() > g.requiredAreaM2().getAsDouble()) {
                    by.computeIfAbsent(String.format(Locale.US, "The liquid-relief scenario '%s' needs %.0f mm2, more "
                            + "than the governing vapour scenario '%s' (%.0f mm2): check that the selected valve also "
                            + "passes the liquid case.", r.label(), r.requiredAreaM2().getAsDouble() * 1e6, g.label(),
                            g.requiredAreaM2().getAsDouble() * 1e6), k -> new ArrayList<>()).add(r.label());
                }
            }
        }
        if (gov.isEmpty()) {
            by.computeIfAbsent("No scenario could be sized: there is no governing scenario.", k -> new ArrayList<>());
        }
        List<CaseResult.CaseWarning> out = new ArrayList<>();
        by.forEach((m, t) -> out.add(new CaseResult.CaseWarning(m, t)));
        return out;
    }

    // ------------------------------------------------------------------------------ scenarios

    /** What every scenario needs: the case, the inventory, the fluid as the relief classes take it. */
    private record Context(CaseInput in, Inventory inv, MixtureSpec liquid, Optional<MixtureSpec> vapourSpace,
                           LevelState level, Options options) {
        Context(CaseInput in, Inventory inv, Options options) {
            this(in, inv, spec(in.fluid(), in.fluid().composition()), vapourSpace(in), inv.vessel(), options);
        }

        static MixtureSpec spec(Fluid f, Composition x) {
            return new MixtureSpec(f.variant(), f.components(), f.kij().kij(), f.kij().warnings(), x.fractions(),
                    f.densityBasis());
        }

        static Optional<MixtureSpec> vapourSpace(CaseInput in) {
            if (in.storage() instanceof Storage.Specified s) {
                return Optional.of(spec(in.fluid(), s.vapour().over("storage.vapour", in.fluid().components())));
            }
            return Optional.empty();
        }
    }

    /** Collects one scenario's result while it is being built. */
    private static final class Out {
        OptionalDouble p1 = OptionalDouble.empty();
        OptionalDouble t1 = OptionalDouble.empty();
        OptionalDouble q = OptionalDouble.empty();
        OptionalDouble latent = OptionalDouble.empty();
        OptionalDouble w = OptionalDouble.empty();
        OptionalDouble area = OptionalDouble.empty();
        Optional<RelievedFluid> fluid = Optional.empty();
        Optional<OrificeSelection> orifice = Optional.empty();
        String sizing = "";
        Optional<FireLoadCurve> levelCurve = Optional.empty();
        String levelCurveNote = "";
        final List<CaseResult.LoadPoint> curve = new ArrayList<>();
        final List<TraceStep> trace = new ArrayList<>();
        final LinkedHashSet<String> warnings = new LinkedHashSet<>();
    }

    private static CaseResult.ScenarioResult runOne(Context c, CaseInput.Scenario s, RelievingPressureResult rp) {
        Out o = new Out();
        Optional<String> failure = Optional.empty();
        try {
            o.p1 = OptionalDouble.of(rp.relievingPressurePa());
            o.warnings.addAll(rp.warnings());
            if (s instanceof CaseInput.WettedFire f) {
                wetted(c, f, o);
            } else if (s instanceof CaseInput.BoilOffFire f) {
                o.trace.add(relievingStep(s.relieving(), rp));
                boilOff(c, f, rp.relievingPressurePa(), o);
            } else if (s instanceof CaseInput.NearCriticalFire f) {
                o.trace.add(relievingStep(s.relieving(), rp));
                nearCritical(c, f, rp.relievingPressurePa(), o);
            } else if (s instanceof CaseInput.GasFilledFire f) {
                o.trace.add(relievingStep(s.relieving(), rp));
                gasFilled(c, f, rp.relievingPressurePa(), o);
            } else if (s instanceof CaseInput.BlockedOutlet f) {
                o.trace.add(relievingStep(s.relieving(), rp));
                blocked(c, f, rp.relievingPressurePa(), o);
            } else if (s instanceof CaseInput.ThermalExpansion f) {
                o.trace.add(relievingStep(s.relieving(), rp));
                thermal(c, f, rp.relievingPressurePa(), o);
            }
        } catch (NoSolutionException | InvalidInputException e) {
            String why = "Scenario '" + s.label() + "' could not be computed: " + e.getMessage();
            failure = Optional.of(why);
            o = failed(o, why);
        }
        return new CaseResult.ScenarioResult(s.index(), s.label(), s.key(), false, o.p1, o.t1, o.q, o.latent, o.w,
                o.area, o.fluid, o.orifice, o.sizing, o.curve, o.trace, new ArrayList<>(o.warnings), failure,
                o.levelCurve, o.levelCurveNote);
    }

    private static Out failed(Out partial, String why) {
        Out o = new Out();
        o.p1 = partial.p1;
        o.warnings.addAll(partial.warnings);
        o.warnings.add(why);
        o.trace.addAll(partial.trace);
        return o;
    }

    private static EnvironmentFactor factor(CaseInput.FireFactor f, double temperatureK) {
        if (f instanceof CaseInput.TableFactor t) {
            return t.row();
        }
        CaseInput.InsulationFactor i = (CaseInput.InsulationFactor) f;
        return EnvironmentFactors.insulation(i.conductivityWPerMK(), i.thicknessM(), temperatureK - 273.15);
    }

    private static MixtureFireInput fireInput(Context c, FireFighting ff, EnvironmentFactor env,
                                              org.ventcase.relief.RelievingPressureInput rel) {
        return fireInput(c, ff, env, rel, c.in().level());
    }

    private static MixtureFireInput fireInput(Context c, FireFighting ff, EnvironmentFactor env,
                                              org.ventcase.relief.RelievingPressureInput rel, Level level) {
        return new MixtureFireInput(c.liquid(), c.in().vessel(), level, c.in().exposure(), rel, ff, env,
                c.in().device().gas(), false);
    }

    /**
     * The wetted fire re-run over fill levels with the same environment factor (T1 and so an
     * insulation factor do not depend on the level): the load-against-level curve.
     */
    private static FireLoadCurve levelCurve(Context c, CaseInput.WettedFire f, EnvironmentFactor env) {
        return FireLoadCurve.overLevels(c.in().level().percentOfVolumeIn(c.in().vessel()), LEVEL_CURVE_FROM_PERCENT,
                LEVEL_CURVE_TO_PERCENT, LEVEL_CURVE_STEPS, pct -> {
                    MixtureFireResult r = MixtureFire.run(fireInput(c, f.fireFighting(), env, f.relieving(),
                            Level.ofPercentOfVolume(pct)), null, false);
                    return new FireLoadCurve.Point(r.vessel().levelPercentVolume(), r.vessel().levelPercentHeight(),
                            r.vessel().levelM(), r.vessel().fire().area(), r.heat().heatW(), r.reliefLoadKgPerS(),
                            r.sizing().areaM2());
                });
    }

    private static void wetted(Context c, CaseInput.WettedFire f, Out o) {
        EnvironmentFactor env;
        if (f.factor() instanceof CaseInput.InsulationFactor) {
            // T1 does not depend on F: a first pass with any factor gives it.
            MixtureFireResult first = MixtureFire.run(fireInput(c, f.fireFighting(), EnvironmentFactors.byKey("bare"),
                    f.relieving()), null, false);
            env = factor(f.factor(), first.boiling().temperatureK());
        } else {
            env = factor(f.factor(), Double.NaN);
        }
        // the vessel at the case's level is the inventory's (same vessel, level and exposure)
        MixtureFireResult r = MixtureFire.run(fireInput(c, f.fireFighting(), env, f.relieving()), c.level(),
                c.options().expansion());
        o.t1 = OptionalDouble.of(r.boiling().temperatureK());
        o.q = OptionalDouble.of(r.heat().heatW());
        o.latent = OptionalDouble.of(r.latentHeat().usedJPerKg());
        o.w = OptionalDouble.of(r.reliefLoadKgPerS());
        o.area = OptionalDouble.of(r.sizing().areaM2());
        o.fluid = Optional.of(r.relievedVapour());
        o.orifice = Optional.of(r.orifice());
        o.sizing = r.sizing().equation();
        o.trace.addAll(r.trace());
        if (f.factor() instanceof CaseInput.InsulationFactor) {
            o.trace.add(factorStep(env, "the relieving temperature T1"));
        }
        o.warnings.addAll(r.warnings());
        if (!c.options().levelCurve()) {
            o.levelCurveNote = NOT_COMPUTED;
            return;
        }
        try {
            o.levelCurve = Optional.of(levelCurve(c, f, env));
        } catch (NoSolutionException | InvalidInputException | ConvergenceException e) {
            o.levelCurveNote = "the load against fill level could not be computed: " + e.getMessage();
        }
    }

    private static HeatInputResult heat(Context c, FireFighting ff, EnvironmentFactor env, Out o) {
        HeatInputResult h = FireHeatInput.wettedVessel(c.level().fire().area(), env.f(), ff);
        o.warnings.addAll(h.warnings());
        env.warning().ifPresent(o.warnings::add);
        o.trace.add(TraceStep.of("Fire heat input").equation(h.equation()).source(h.source())
                .in("Fire-exposed wetted area A", "%.3f m2 at the storage level",
                        c.level().fire().area())
                .in("Environment factor F", "%.4g (%s)", env.f(), env.description())
                .in("Drainage and fire-fighting", ff == FireFighting.INADEQUATE ? "inadequate" : "adequate")
                .out("Q", "%.1f kW", h.heatW() / 1e3)
                .note(c.level().fire()::ruleApplied).build());
        o.q = OptionalDouble.of(h.heatW());
        return h;
    }

    private static void boilOff(Context c, CaseInput.BoilOffFire f, double p1, Out o) {
        EnvironmentFactor env;
        String at = "";
        if (f.factor() instanceof CaseInput.InsulationFactor) {
            MixtureFireResult first = MixtureFire.run(fireInput(c, f.fireFighting(), EnvironmentFactors.byKey("bare"),
                    f.relieving()), null, false);
            env = factor(f.factor(), first.boiling().temperatureK());
            at = "the initial bubble point at P1";
        } else {
            env = factor(f.factor(), Double.NaN);
        }
        HeatInputResult h = heat(c, f.fireFighting(), env, o);
        if (!at.isEmpty()) {
            o.trace.add(factorStep(env, at));
        }
        BoilOffInput bi = new BoilOffInput(c.liquid(), c.in().vessel(), c.in().level(), h.heatW(), p1,
                f.stopAtLiquidFraction(), f.durationS().orElse(NO_TIME_LIMIT_S), BoilOffInput.DEFAULT_STEPS,
                c.in().device().gas());
        if (c.in().storage() instanceof Storage.Saturated) {
            // start from what is stored (moles per component of liquid and vapour), not from the
            // stored liquid's volume re-read at P1
            java.util.List<org.ventcase.thermo.Component> cs = c.liquid().components();
            double[] moles = new double[cs.size()];
            for (int i = 0; i < cs.size(); i++) {
                Double kg = c.inv().massPerComponentKg().get(cs.get(i).name());
                moles[i] = kg == null ? 0.0 : kg / (cs.get(i).molarMass() * 1e-3);
            }
            bi = bi.withStoredMoles(moles);
        }
        BoilOffResult r = BoilOff.run(bi);
        BoilOffPoint peak = r.peak();
        o.t1 = OptionalDouble.of(peak.temperatureK());
        o.latent = r.peakVapour().latentHeatJPerKg();
        o.w = OptionalDouble.of(r.peakLoadKgPerS());
        o.area = OptionalDouble.of(r.peakAreaM2());
        o.fluid = Optional.of(r.peakVapour());
        o.sizing = r.peakSizing().equation();
        for (BoilOffPoint p : r.curve()) {
            o.curve.add(new CaseResult.LoadPoint(p.timeS(), p.temperatureK(), p.massFlowKgPerS(), p.requiredAreaM2()));
        }
        o.trace.addAll(r.trace());
        orifice(r.peakAreaM2(), r.peakLoadKgPerS(), o);
        o.warnings.addAll(r.warnings());
    }

    private static void nearCritical(Context c, CaseInput.NearCriticalFire f, double p1, Out o) {
        double t0 = c.inv().temperatureK();
        EnvironmentFactor env = factor(f.factor(), t0);
        HeatInputResult h = heat(c, f.fireFighting(), env, o);
        if (f.factor() instanceof CaseInput.InsulationFactor) {
            o.trace.add(factorStep(env, "the storage temperature (the lowest of the heat-up: the largest F)"));
        }
        NearCriticalFireResult r = NearCriticalFire.run(new NearCriticalFireInput(c.liquid(), c.in().vessel()
                .totalVolume(), h.heatW(), p1, t0, c.inv().pressurePa(), t0 + NEAR_CRITICAL_HEAT_UP_K, f.steps(),
                c.in().device().gas(), OptionalDouble.of(c.level().totalVolume() / c.inv().totalMassKg())));
        NearCriticalFireResult.Point g = r.governing();
        o.t1 = OptionalDouble.of(g.temperatureK());
        o.w = OptionalDouble.of(g.massFlowKgPerS());
        o.area = OptionalDouble.of(r.governingSizing().areaM2());
        o.fluid = Optional.of(r.governingFluid());
        o.sizing = r.governingSizing().equation();
        for (NearCriticalFireResult.Point p : r.curve()) {
            o.curve.add(new CaseResult.LoadPoint(p.timeS(), p.temperatureK(), p.massFlowKgPerS(), p.requiredAreaM2()));
        }
        o.trace.addAll(r.trace());
        orifice(r.governingSizing().areaM2(), g.massFlowKgPerS(), o);
        o.warnings.addAll(r.warnings());
    }

    private static void gasFilled(Context c, CaseInput.GasFilledFire f, double p1, Out o) {
        GasFilledFireResult r = GasFilledFire.run(new GasFilledFireInput(c.liquid(), c.in().vessel(),
                c.in().exposure(), GasFilledFireInput.AreaBasis.BELOW_FIRE_HEIGHT, p1, c.inv().pressurePa(),
                c.inv().temperatureK(), f.wallTemperatureK(), c.in().device().gas()), c.options().expansion());
        o.t1 = OptionalDouble.of(r.load().relievingTemperatureK());
        o.w = OptionalDouble.of(r.load().massFlowKgPerS());
        o.area = OptionalDouble.of(r.sizing().areaM2());
        o.fluid = Optional.of(r.relievedGas());
        o.sizing = r.sizing().equation();
        o.trace.addAll(r.trace());
        orifice(r.sizing().areaM2(), r.load().massFlowKgPerS(), o);
        o.warnings.addAll(r.warnings());
    }

    private static void blocked(Context c, CaseInput.BlockedOutlet f, double p1, Out o) {
        boolean gasStorage = c.in().storage() instanceof Storage.GasFilled;
        MixtureSpec spec = !f.liquid() && c.vapourSpace().isPresent() ? c.vapourSpace().get() : c.liquid();
        RelievedFluid.Phase phase = f.liquid() ? RelievedFluid.Phase.LIQUID
                : gasStorage ? RelievedFluid.Phase.GAS : RelievedFluid.Phase.VAPOUR;
        BlockedOutletInput.VapourTemperature vt = c.in().storage() instanceof Storage.Saturated
                ? BlockedOutletInput.VapourTemperature.SATURATION_AT_P1
                : BlockedOutletInput.VapourTemperature.INFLOW_TEMPERATURE;
        if (f.liquid() && c.in().device().balancedBellows()) {
            o.warnings.add("Balanced-bellows valve in liquid service: Kw = 1 was used; take Kw from the "
                    + "manufacturer's curve.");
        }
        BlockedOutletResult r = BlockedOutlet.run(new BlockedOutletInput(spec, f.inflow(), phase,
                f.liquid() ? null : vt, c.inv().temperatureK(), p1,
                f.liquid() ? c.in().device().liquid() : c.in().device().gas(), OptionalDouble.empty(),
                c.in().device().kvForm()));
        o.t1 = OptionalDouble.of(r.relieved().temperatureK());
        o.w = OptionalDouble.of(r.massFlowKgPerS());
        o.fluid = Optional.of(r.relieved());
        o.trace.addAll(r.trace());
        if (r.liquidSizing().isPresent()) {
            LiquidSizingResult ls = r.liquidSizing().get();
            o.area = OptionalDouble.of(ls.areaM2());
            o.sizing = "API 520 Part I liquid equation";
            o.orifice = Optional.of(ls.selection());
            o.trace.add(orificeStep(ls.selection()));
        } else {
            o.area = OptionalDouble.of(r.gasSizing().orElseThrow().areaM2());
            o.sizing = r.gasSizing().orElseThrow().equation();
            orifice(r.gasSizing().orElseThrow().areaM2(), r.massFlowKgPerS(), o);
        }
        o.warnings.addAll(r.warnings());
    }

    private static void thermal(Context c, CaseInput.ThermalExpansion f, double p1, Out o) {
        ThermalReliefResult r = ThermalRelief.run(new ThermalReliefInput(c.liquid(), c.inv().temperatureK(), p1,
                f.heatW()));
        o.t1 = OptionalDouble.of(c.inv().temperatureK());
        o.q = OptionalDouble.of(f.heatW());
        o.w = OptionalDouble.of(r.massRateKgPerS());
        o.fluid = Optional.of(r.relievedLiquid());
        o.trace.addAll(r.trace());
        o.warnings.addAll(r.warnings());
        CaseInput.Device d = c.in().device();
        double g = r.densityKgM3() / BlockedOutlet.WATER_REFERENCE_DENSITY;
        LiquidSizingResult ls = LiquidSizing.size(new LiquidSizingInput(r.volumetricRateM3PerS(), g, p1,
                d.liquid().backPressurePa(), OptionalDouble.empty(), d.liquid().kd(), d.liquid().kb(), d.liquid().kc(),
                d.kvForm()));
        o.warnings.addAll(ls.warnings());
        TraceStep.Builder b = TraceStep.of("Required effective area (liquid)")
                .equation("A = 11.78 Q / (Kd Kw Kc Kv) sqrt(G / (P1 - P2)); A mm2, Q L/min, P kPa")
                .source(ls.source())
                .in("Q", "%.4g m3/h", r.volumetricRateM3PerS() * 3600)
                .in("G = rho / 999.0 kg/m3", "%.4f", g)
                .in("Blocked-in volume", "%.3f m3 (does not enter q, which depends on "
                        + "the heat input only)", f.blockedInVolumeM3());
        for (String line : ls.trace()) {
            b.note(line);
        }
        o.trace.add(b.out("Required area", "%.2f mm2", ls.areaMm2()).build());
        o.area = OptionalDouble.of(ls.areaM2());
        o.sizing = "API 520 Part I liquid equation";
        o.orifice = Optional.of(ls.selection());
        o.trace.add(orificeStep(ls.selection()));
    }

    private static void orifice(double areaM2, double w, Out o) {
        OrificeSelection os = OrificeTable.select(areaM2, w);
        o.orifice = Optional.of(os);
        o.trace.add(orificeStep(os));
    }

    private static TraceStep orificeStep(OrificeSelection os) {
        return TraceStep.of("Standard orifice").equation("smallest API 526 effective area >= required area")
                .source("API Std 526 effective orifice areas (used with the API 520 Part I equations)")
                .in("Required area", "%.1f mm2", os.requiredAreaM2() * 1e6)
                .out("Orifice", os.designation())
                .out("Selected effective area", "%.1f mm2", os.selectedAreaMm2())
                .out("Margin", "%.1f %%", os.marginPercent())
                .note(os.ruleApplied()).build();
    }

    private static TraceStep relievingStep(org.ventcase.relief.RelievingPressureInput in, RelievingPressureResult rp) {
        return RelievingPressure.step(in, rp);
    }

    private static TraceStep factorStep(EnvironmentFactor env, String at) {
        return TraceStep.of("Environment factor from the insulation")
                .equation("F = (k/t)(904 - T)/66,570 (SI; k W/(m K), t m, T C)")
                .source(env.source())
                .in("Temperature used", at)
                .out("F", "%.4g", env.f())
                .note(env.description()).build();
    }
}
