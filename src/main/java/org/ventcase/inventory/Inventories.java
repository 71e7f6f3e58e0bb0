package org.ventcase.inventory;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.NoSolutionException;
import org.ventcase.common.TraceStep;
import org.ventcase.common.VentcaseException;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.Composition;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.SaturationResult;
import org.ventcase.thermo.mix.SaturationPoint;
import org.ventcase.thermo.mix.SaturationPoints;
import org.ventcase.thermo.mix.StabilityAnalysis;
import org.ventcase.thermo.mix.StabilityResult;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.LevelState;
import org.ventcase.vessel.Vessel;

/**
 * Computes a vessel's inventory: the vessel at its level gives the liquid and vapour volumes; the
 * storage mode gives the state and composition of each phase; the cubic equation of state gives
 * each phase's density on the stated basis; then m = V rho, n = m / M and m_i = n x_i M_i per
 * phase.
 *
 * <ul>
 * <li><b>Saturated:</b> the liquid at its bubble point at T. Pure fluid: equal-fugacity
 *     saturation ({@link PureSaturation}); mixture: bubble pressure and incipient vapour
 *     ({@link SaturationPoints}), then each phase's density from its own root at (T, P_bubble),
 *     liquid root for the liquid, vapour root for the vapour. Optionally the liquid-full check
 *     against a relieving pressure ({@link LiquidFullCheck}).</li>
 * <li><b>Specified:</b> the liquid's density from its own liquid root at (T, P); the vapour
 *     space's from its own vapour root at (T, P) with the composition the user stated (no
 *     equilibrium is computed). Warnings where the liquid would flash (tangent-plane stability
 *     test, or P below its bubble pressure / vapour pressure) or the vapour space would condense
 *     (stability, or P above its dew pressure / vapour pressure).</li>
 * <li><b>Gas:</b> no liquid; the gas's vapour root at (T, P), with the condensation check.</li>
 * </ul>
 *
 * <p>Warnings also for: T above the (pseudo-)critical temperature of the liquid; less than
 * {@link #MIN_OUTAGE_PERCENT} % vapour space; a pure liquid whose density differs from the Rackett
 * (Spencer-Danner) correlation by more than 3 %. Stateless and thread-safe.
 */
public final class Inventories {

    /** Least vapour space (outage), % of the vessel volume, below which a warning is given. */
    public static final double MIN_OUTAGE_PERCENT = 5.0;

    /** Bisection tolerance of the liquid-full temperature, K. */
    static final double T_FULL_TOL_K = 1e-4;

    private static final String MASS_SOURCE = "definitions: m = V rho, n = m/M, M = sum x_i M_i, m_i = n x_i M_i";
    private static final String CHECK_METHOD = "liquid mass at storage held constant (vapour mass neglected; no "
            + "evaporation, condensation or change of composition); liquid specific volume along the saturation "
            + "(bubble) curve of the stored liquid; the vessel goes liquid-full before relief when "
            + "m_L / rho_L,sat(T1) >= V; liquid-full temperature by bisection on m_L / rho_L,sat(T) = V between the "
            + "storage temperature and T1";

    private Inventories() {
    }

    /**
     * Computes the inventory of one vessel.
     *
     * @param level for a gas-filled vessel, a level of zero (e.g. {@code Level.ofHeight(0)})
     * @throws InvalidInputException for missing or inconsistent input (field path in the message)
     * @throws NoSolutionException   in saturated mode where the liquid has no bubble point at T
     *                               (above its critical region)
     */
    public static Inventory compute(Fluid fluid, Storage storage, Vessel vessel, Level level, FireExposure exposure) {
        if (fluid == null) {
            throw InvalidInputException.missing("fluid", "expected the fluid");
        }
        if (storage == null) {
            throw InvalidInputException.missing("storage", "expected saturated, specified or gas storage");
        }
        if (vessel == null) {
            throw InvalidInputException.missing("vessel", "expected the vessel");
        }
        if (level == null) {
            throw InvalidInputException.missing("vessel.level", "expected a liquid level (0 for a gas-filled vessel)");
        }
        if (exposure == null) {
            throw InvalidInputException.missing("fire", "expected the fire exposure (elevation, fire height)");
        }
        LevelState vs = LevelState.of(vessel, level, exposure);
        Work w = new Work(fluid, storage, vs, exposure);
        w.fluidStep();
        w.vesselStep();
        if (storage instanceof Storage.Saturated s) {
            return w.saturated(s);
        }
        if (storage instanceof Storage.Specified s) {
            return w.specified(s);
        }
        return w.gas((Storage.GasFilled) storage);
    }

    /** One computation's state: the trace and warnings being collected. */
    private static final class Work {
        final Fluid fluid;
        final Storage storage;
        final LevelState vs;
        final FireExposure exposure;
        final CubicModel model;
        final DensityBasis basis;
        final List<TraceStep> trace = new ArrayList<>();
        final LinkedHashSet<String> warnings = new LinkedHashSet<>();
        OptionalDouble rackett = OptionalDouble.empty();

        Work(Fluid fluid, Storage storage, LevelState vs, FireExposure exposure) {
            this.fluid = fluid;
            this.storage = storage;
            this.vs = vs;
            this.exposure = exposure;
            this.model = fluid.model();
            this.basis = fluid.densityBasis();
        }

        void fluidStep() {
            TraceStep.Builder b = TraceStep.of("Fluid model")
                    .equation("P = R T/(v - b) - a(T)/((v + sigma b)(v + epsilon b)); a = sum_i sum_j x_i x_j "
                            + "(1 - k_ij) sqrt(a_i a_j), b = sum_i x_i b_i")
                    .source(fluid.variant().displayName() + " (" + fluid.variant().citation() + "); van der Waals "
                            + "one-fluid mixing rule")
                    .in("Composition (mole fractions)", fluid.composition().toString())
                    .in("Density basis asked for", basis.label()
                            + (basis == DensityBasis.TRANSLATED && fluid.variant().hasVolumeShift()
                                    ? " (" + fluid.variant().volumeShiftCitation() + ")" : ""));
            List<Component> cs = fluid.components();
            double[][] k = fluid.kij().kij();
            String[][] src = fluid.kij().sources();
            for (int i = 0; i < cs.size(); i++) {
                b.note(cs.get(i).name() + ": " + org.ventcase.thermo.Citations.constants(cs.get(i)));
                for (int j = i + 1; j < cs.size(); j++) {
                    b.in("k_ij " + cs.get(i).name() + " / " + cs.get(j).name(),
                            String.format(Locale.US, "%.4f (%s)", k[i][j], src[i][j]));
                }
            }
            trace.add(b.build());
            warnings.addAll(fluid.kij().warnings());
        }

        void vesselStep() {
            trace.add(TraceStep.of("Vessel at level").equation("V_L = V(h), V_V = V_total - V_L (exact head and shell "
                    + "geometry)").source("vessel geometry (see the vessel command)")
                    .in("Vessel", vs.vessel()::describe)
                    .in("Liquid level", "%.4f m (%.2f %% of height, %.2f %% of volume)",
                            vs.levelM(), vs.levelPercentHeight(), vs.levelPercentVolume())
                    .out("Total volume", m3(vs.totalVolume()))
                    .out("Liquid volume", m3(vs.liquidVolume()))
                    .out("Vapour volume", m3(vs.vapourVolume()))
                    .out("Fire-exposed wetted area", "%.4f m2", vs.fire().area())
                    .note(vs.fire()::ruleApplied).build());
        }

        void outage() {
            double vapourPercent = 100.0 - vs.levelPercentVolume();
            if (vapourPercent < MIN_OUTAGE_PERCENT) {
                warnings.add(String.format(Locale.US, "The liquid fills %.2f %% of the vessel: less than %.0f %% "
                        + "vapour space (outage) is left; a small temperature rise can fill the vessel with liquid.",
                        vs.levelPercentVolume(), MIN_OUTAGE_PERCENT));
            }
        }

        // ------------------------------------------------------------------ saturated

        Inventory saturated(Storage.Saturated s) {
            outage();
            double t = s.temperatureK();
            Composition x = fluid.composition();
            int[] present = x.present();
            double p;
            Composition y;
            double rhoL;
            double rhoV;
            double zL;
            double zV;
            DensityBasis bL;
            DensityBasis bV;
            TraceStep.Builder st = TraceStep.of("Storage state: saturated liquid at T").in("Storage temperature",
                    kelvinC(t));
            if (present.length == 1) {
                Component c = x.components().get(present[0]);
                PureSaturation sat = new PureSaturation(pureModel(present[0]));
                SaturationResult sr = relabel("storage.temperature", () -> sat.atTemperature(t, basis));
                warnings.addAll(sr.warnings());
                p = sr.pressurePa();
                y = x;
                rhoL = sr.liquid().density();
                rhoV = sr.vapor().density();
                zL = sr.liquid().z();
                zV = sr.vapor().z();
                bL = sr.liquid().densityBasis();
                bV = sr.vapor().densityBasis();
                rackett = OptionalDouble.of(sr.rackettLiquidDensity());
                st.equation("ln phi_L(T, Psat) = ln phi_V(T, Psat) (equal fugacity of the pure fluid)")
                        .source("Ventcase PureSaturation (Michelsen and Mollerup 2007, ch. 12); Rackett: Spencer and "
                                + "Danner, J. Chem. Eng. Data 17 (1972) 236, Z_RA from " + org.ventcase.thermo.Citations.rackett(c))
                        .out("Saturation pressure", kpa(p))
                        .out("Liquid density", dens(rhoL, bL))
                        .out("Vapour density", dens(rhoV, bV))
                        .out("Rackett liquid density (cross-check)", "%.2f kg/m3 (%+.1f %%)",
                                sr.rackettLiquidDensity(), 100 * (rhoL / sr.rackettLiquidDensity() - 1));
            } else {
                double tpc = x.pseudoCriticalTemperatureK();
                double[] xa = x.fractions();
                SaturationPoint bp;
                try {
                    bp = new SaturationPoints(model).bubblePressure(t, xa);
                } catch (NoSolutionException e) {
                    throw new NoSolutionException("storage.temperature", String.format(Locale.US,
                            "no bubble point of the stored liquid was found at %s: the liquid may be above its "
                                    + "critical region (Kay's pseudo-critical temperature %s; the true mixture critical "
                                    + "temperature can differ), or too near it for the bubble-point iteration; no "
                                    + "saturated inventory is given. Give the pressure and use specified or gas storage "
                                    + "instead (%s)", kelvinC(t), kelvinC(tpc), message(e)));
                }
                if (t >= tpc) {
                    warnings.add(String.format(Locale.US, "The storage temperature %s is at or above the liquid's "
                            + "pseudo-critical temperature (Kay's rule, %s): the mixture is near or above its critical "
                            + "region, and the bubble point, phase split and densities are uncertain.", kelvinC(t),
                            kelvinC(tpc)));
                }
                warnings.addAll(bp.warnings());
                p = bp.pressurePa();
                y = new Composition(x.components(), bp.incipientComposition());
                FluidProperties pl = model.properties(t, p, xa, PhaseRequest.LIQUID, basis);
                FluidProperties pv = model.properties(t, p, y.fractions(), PhaseRequest.VAPOR, basis);
                pl.warnings().forEach(m -> warnings.add("Liquid: " + m));
                pv.warnings().forEach(m -> warnings.add("Vapour: " + m));
                rhoL = pl.density();
                rhoV = pv.density();
                zL = pl.z();
                zV = pv.z();
                bL = pl.densityBasis();
                bV = pv.densityBasis();
                st.equation("sum_i x_i K_i = 1, K_i = phi_i^L(x)/phi_i^V(y), y_i = K_i x_i (bubble point at T); "
                        + "then each phase's own root at (T, P_bubble)")
                        .source("Ventcase SaturationPoints (Michelsen and Mollerup 2007, ch. 12)")
                        .in("Kay's pseudo-critical temperature", kelvinC(tpc))
                        .out("Bubble pressure", kpa(p))
                        .out("Vapour composition", y.toString())
                        .out("Liquid density", dens(rhoL, bL) + String.format(Locale.US, ", Z = %.5f", zL))
                        .out("Vapour density", dens(rhoV, bV) + String.format(Locale.US, ", Z = %.5f", zV))
                        .note("Rackett cross-check not made: the liquid is a mixture.")
                        .note("%d bubble-point iterations", bp.iterations());
            }
            trace.add(st.build());
            PhaseInventory liq = PhaseInventory.of("liquid", vs.liquidVolume(), rhoL, bL, zL, x);
            PhaseInventory vap = PhaseInventory.of("vapour", vs.vapourVolume(), rhoV, bV, zV, y);
            Optional<LiquidFullCheck> full = Optional.empty();
            if (s.relievingPressurePa().isPresent()) {
                full = liquidFull(t, p, s.relievingPressurePa().getAsDouble(), liq);
            }
            return finish(t, p, Optional.of(liq), vap, full);
        }

        Optional<LiquidFullCheck> liquidFull(double t, double p, double p1, PhaseInventory liq) {
            if (!(p1 > p)) {
                throw new InvalidInputException("storage.relievingPressure", String.format(Locale.US, "%.6g Pa", p1),
                        String.format(Locale.US, "expected a relieving pressure above the storage pressure "
                                + "(%.6g Pa absolute at %s)", p, kelvinC(t)));
            }
            Composition x = fluid.composition();
            int[] present = x.present();
            double t1;
            DoubleUnaryOperator rhoSat;
            DensityBasis used;
            try {
                if (present.length == 1) {
                    PureSaturation sat = new PureSaturation(pureModel(present[0]));
                    SaturationResult r1 = sat.atPressure(p1, basis);
                    t1 = r1.temperatureK();
                    used = r1.liquid().densityBasis();
                    rhoSat = tt -> sat.atTemperature(tt, basis).liquid().density();
                } else {
                    SaturationPoints sp = new SaturationPoints(model);
                    double[] xa = x.fractions();
                    t1 = sp.bubbleTemperature(p1, xa).temperatureK();
                    used = model.properties(t1, p1, xa, PhaseRequest.LIQUID, basis).densityBasis();
                    rhoSat = tt -> {
                        double pb = sp.bubblePressure(tt, xa).pressurePa();
                        return model.properties(tt, pb, xa, PhaseRequest.LIQUID, basis).density();
                    };
                }
                double v = vs.totalVolume();
                double m = liq.massKg();
                double rho1 = rhoSat.applyAsDouble(t1);
                double vol1 = m / rho1;
                boolean fills = vol1 >= v;
                OptionalDouble tFull = OptionalDouble.empty();
                TraceStep.Builder b = TraceStep.of("Liquid-full check before relief")
                        .equation("V_L(T1) = m_L / rho_L,sat(T1); liquid-full when V_L(T1) >= V; "
                                + "T_full: m_L / rho_L,sat(T_full) = V")
                        .source("mass balance on the liquid (common practice, no published source); saturated liquid "
                                + "density from " + fluid.variant().displayName() + " on the " + used.label()
                                + " basis")
                        .in("Relieving pressure P1", kpa(p1))
                        .in("Liquid mass m_L", "%.2f kg", m)
                        .in("Vessel volume V", m3(v))
                        .out("Bubble temperature at P1, T1", kelvinC(t1))
                        .out("rho_L,sat(T1)", dens(rho1, used))
                        .out("V_L(T1)", "%.4f m3 (%.2f %% of V)", vol1, 100 * vol1 / v)
                        .note("Method: " + CHECK_METHOD + ".");
                if (fills) {
                    double lo = t;
                    double hi = t1;
                    for (int it = 0; it < 200 && hi - lo > T_FULL_TOL_K; it++) {
                        double mid = 0.5 * (lo + hi);
                        if (m / rhoSat.applyAsDouble(mid) >= v) {
                            hi = mid;
                        } else {
                            lo = mid;
                        }
                    }
                    double tf = m / rhoSat.applyAsDouble(t) >= v ? t : 0.5 * (lo + hi);
                    tFull = OptionalDouble.of(tf);
                    b.out("Liquid-full temperature T_full", kelvinC(tf));
                    warnings.add(String.format(Locale.US, "The liquid would expand to fill the vessel before the "
                            + "relieving pressure is reached: at %s (relieving pressure %s) the %.0f kg of liquid "
                            + "would need %.3f m3 against a vessel volume of %.3f m3; liquid-full at about %s. Heated "
                            + "further the vessel is hydraulically full and the pressure rises steeply: consider "
                            + "liquid (thermal) relief and the fill limit.", kelvinC(t1), kpa(p1), m, vol1, v,
                            kelvinC(tf)));
                }
                trace.add(b.build());
                return Optional.of(new LiquidFullCheck(p1, t1, rho1, used, vol1, v, fills, tFull, CHECK_METHOD));
            } catch (NoSolutionException | ConvergenceException e) {
                warnings.add("The liquid-full check against the relieving pressure could not be made: " + message(e));
                return Optional.empty();
            }
        }

        // ------------------------------------------------------------------ specified

        Inventory specified(Storage.Specified s) {
            outage();
            double t = s.temperatureK();
            double p = s.pressurePa();
            Composition x = fluid.composition();
            Composition y = s.vapour().over("storage.vapour", fluid.components());
            FluidProperties pl = model.properties(t, p, x.fractions(), PhaseRequest.LIQUID, basis);
            FluidProperties pv = model.properties(t, p, y.fractions(), PhaseRequest.VAPOR, basis);
            pl.warnings().forEach(m -> warnings.add("Liquid: " + m));
            pv.warnings().forEach(m -> warnings.add("Vapour space: " + m));
            TraceStep.Builder st = TraceStep.of("Storage state: specified T and P, compositions stated")
                    .equation("each phase from its own cubic root at (T, P): liquid root for the liquid, vapour root for "
                            + "the vapour space; rho = M / (v_cubic - c) on the translated basis")
                    .source(fluid.variant().displayName() + " (" + fluid.variant().citation() + ")")
                    .in("Temperature", kelvinC(t)).in("Pressure", kpa(p))
                    .in("Liquid composition", x.toString()).in("Vapour-space composition (stated)", y.toString())
                    .out("Liquid density", dens(pl.density(), pl.densityBasis())
                            + String.format(Locale.US, ", Z = %.5f", pl.z()))
                    .out("Vapour-space density", dens(pv.density(), pv.densityBasis())
                            + String.format(Locale.US, ", Z = %.5f", pv.z()))
                    .note("The vapour-space composition is the user's statement; no equilibrium with the liquid is "
                            + "computed.");
            liquidFlashCheck(t, p, x, st);
            vapourCondensationCheck(t, p, y, st, "vapour space");
            rackettCheck(t, x, pl.density(), pl.densityBasis(), st);
            trace.add(st.build());
            PhaseInventory liq = PhaseInventory.of("liquid", vs.liquidVolume(), pl.density(), pl.densityBasis(),
                    pl.z(), x);
            PhaseInventory vap = PhaseInventory.of("vapour", vs.vapourVolume(), pv.density(), pv.densityBasis(),
                    pv.z(), y);
            return finish(t, p, Optional.of(liq), vap, Optional.empty());
        }

        // ------------------------------------------------------------------ gas

        Inventory gas(Storage.GasFilled s) {
            if (vs.liquidVolume() > 0) {
                throw new InvalidInputException("vessel.level", String.format(Locale.US, "%.6g m", vs.levelM()),
                        "a gas-filled vessel holds no liquid: give a level of 0 or none");
            }
            double t = s.temperatureK();
            double p = s.pressurePa();
            Composition z = fluid.composition();
            FluidProperties pv = model.properties(t, p, z.fractions(), PhaseRequest.VAPOR, basis);
            pv.warnings().forEach(m -> warnings.add("Gas: " + m));
            TraceStep.Builder st = TraceStep.of("Storage state: gas at T and P")
                    .equation("vapour root of the cubic at (T, P, z)")
                    .source(fluid.variant().displayName() + " (" + fluid.variant().citation() + ")")
                    .in("Temperature", kelvinC(t)).in("Pressure", kpa(p)).in("Composition", z.toString())
                    .out("Gas density", dens(pv.density(), pv.densityBasis())
                            + String.format(Locale.US, ", Z = %.5f", pv.z()))
                    .out("Phase", pv.phase().label()).note(pv.rootChoice());
            vapourCondensationCheck(t, p, z, st, "gas");
            trace.add(st.build());
            PhaseInventory vap = PhaseInventory.of("vapour", vs.vapourVolume(), pv.density(), pv.densityBasis(),
                    pv.z(), z);
            return finish(t, p, Optional.empty(), vap, Optional.empty());
        }

        // ------------------------------------------------------------------ checks

        void liquidFlashCheck(double t, double p, Composition x, TraceStep.Builder st) {
            int[] present = x.present();
            if (present.length == 1) {
                Component c = x.components().get(present[0]);
                if (t >= c.tcK()) {
                    warnings.add(String.format(Locale.US, "The liquid (%s) is stated at %s, at or above its critical "
                            + "temperature (%s): no liquid phase exists; the density is that of the single dense "
                            + "fluid.", c.name(), kelvinC(t), kelvinC(c.tcK())));
                    return;
                }
                try {
                    double psat = new PureSaturation(pureModel(present[0])).pressure(t);
                    st.out("Vapour pressure of the liquid at T", kpa(psat));
                    if (p < psat) {
                        warnings.add(String.format(Locale.US, "The liquid would flash: the pressure %s is below its "
                                + "vapour pressure %s at %s.", kpa(p), kpa(psat), kelvinC(t)));
                    }
                } catch (NoSolutionException | ConvergenceException e) {
                    warnings.add("The liquid's vapour pressure could not be computed, so whether it would flash is not "
                            + "checked: " + message(e));
                }
                return;
            }
            double tpc = x.pseudoCriticalTemperatureK();
            if (t >= tpc) {
                warnings.add(String.format(Locale.US, "The liquid is stated at %s, at or above its pseudo-critical "
                        + "temperature (Kay's rule, %s): it may not exist as a liquid; its density is uncertain.",
                        kelvinC(t), kelvinC(tpc)));
            }
            try {
                StabilityResult sr = new StabilityAnalysis(model).test(t, p, x.fractions());
                st.out("Liquid stability at (T, P)", sr.stable() ? "stable (single phase)"
                        : String.format(Locale.US, "unstable (tm = %.3g, %s incipient phase)", sr.minimumTpd(),
                                sr.incipientVapourLike() ? "vapour-like" : "liquid-like"));
                if (!sr.stable()) {
                    warnings.add(String.format(Locale.US, "The liquid would flash at %s and %s: the tangent-plane "
                            + "stability test finds it unstable (tm = %.3g, %s incipient phase); its single-phase "
                            + "density is then not what the vessel holds.", kelvinC(t), kpa(p), sr.minimumTpd(),
                            sr.incipientVapourLike() ? "vapour-like" : "liquid-like"));
                }
            } catch (NoSolutionException | ConvergenceException e) {
                warnings.add("The liquid's stability test did not complete: " + message(e));
            }
            try {
                double pb = new SaturationPoints(model).bubblePressure(t, x.fractions()).pressurePa();
                st.out("Bubble pressure of the liquid at T", kpa(pb));
                if (p < pb) {
                    warnings.add(String.format(Locale.US, "The liquid would flash: the pressure %s is below its "
                            + "bubble pressure %s at %s.", kpa(p), kpa(pb), kelvinC(t)));
                }
            } catch (NoSolutionException | ConvergenceException e) {
                warnings.add("No bubble point of the liquid was found at " + kelvinC(t)
                        + " (above its critical region?), so the flash check against the bubble pressure is not made: "
                        + message(e));
            }
        }

        void vapourCondensationCheck(double t, double p, Composition y, TraceStep.Builder st, String what) {
            int[] present = y.present();
            if (present.length == 1) {
                Component c = y.components().get(present[0]);
                if (t >= c.tcK()) {
                    st.note("The %s (%s) is above its critical temperature: it cannot "
                            + "condense.", what, c.name());
                    return;
                }
                try {
                    double psat = new PureSaturation(pureModel(present[0])).pressure(t);
                    st.out("Vapour pressure of the " + what + " at T", kpa(psat));
                    if (p >= psat) {
                        warnings.add(String.format(Locale.US, "The %s would condense: the pressure %s is at or above "
                                + "the vapour pressure of %s, %s at %s.", what, kpa(p), c.name(), kpa(psat),
                                kelvinC(t)));
                    }
                } catch (NoSolutionException | ConvergenceException e) {
                    warnings.add("The " + what + "'s vapour pressure could not be computed, so condensation is not "
                            + "checked: " + message(e));
                }
                return;
            }
            boolean warned = false;
            try {
                StabilityResult sr = new StabilityAnalysis(model).test(t, p, y.fractions());
                st.out("Stability of the " + what + " at (T, P)", sr.stable() ? "stable (single phase)"
                        : String.format(Locale.US, "unstable (tm = %.3g, %s incipient phase)", sr.minimumTpd(),
                                sr.incipientVapourLike() ? "vapour-like" : "liquid-like"));
                if (!sr.stable()) {
                    warned = true;
                    warnings.add(String.format(Locale.US, "The %s would condense at %s and %s: the tangent-plane "
                            + "stability test finds it unstable (tm = %.3g); a liquid phase would form.", what,
                            kelvinC(t), kpa(p), sr.minimumTpd()));
                }
            } catch (NoSolutionException | ConvergenceException e) {
                warnings.add("The " + what + "'s stability test did not complete: " + message(e));
            }
            try {
                double pd = new SaturationPoints(model).dewPressure(t, y.fractions()).pressurePa();
                st.out("Dew pressure of the " + what + " at T", kpa(pd));
                if (p >= pd && !warned) {
                    warnings.add(String.format(Locale.US, "The %s would condense: the pressure %s is at or above its "
                            + "dew pressure %s at %s.", what, kpa(p), kpa(pd), kelvinC(t)));
                }
            } catch (NoSolutionException | ConvergenceException e) {
                st.note("No dew point of the " + what + " found at " + kelvinC(t) + " (" + message(e)
                        + "); the stability test above decides.");
            }
        }

        void rackettCheck(double t, Composition x, double rho, DensityBasis used, TraceStep.Builder st) {
            int[] present = x.present();
            if (present.length != 1) {
                st.note("Rackett cross-check not made: the liquid is a mixture.");
                return;
            }
            Component c = x.components().get(present[0]);
            if (t >= c.tcK()) {
                return;
            }
            double r = PureSaturation.rackettDensity(c, t);
            rackett = OptionalDouble.of(r);
            double dev = rho / r - 1;
            st.out("Rackett saturated-liquid density at T (cross-check)", "%.2f kg/m3 (%+.1f %%)", r, 100 * dev);
            if (Math.abs(dev) > PureSaturation.RACKETT_WARNING) {
                warnings.add(String.format(Locale.US, "The %s liquid density (%.4g kg/m3) differs from the Rackett "
                        + "correlation (%.4g kg/m3, saturated liquid, Z_RA from %s) by %+.1f %%: the liquid inventory "
                        + "on this basis may be %s.", used.label(), rho, r, org.ventcase.thermo.Citations.rackett(c), 100 * dev,
                        dev < 0 ? "understated" : "overstated"));
            }
        }

        // ------------------------------------------------------------------ result

        Inventory finish(double t, double p, Optional<PhaseInventory> liq, PhaseInventory vap,
                         Optional<LiquidFullCheck> full) {
            Map<String, Double> per = new LinkedHashMap<>();
            liq.ifPresent(l -> l.massPerComponentKg().forEach((k, v) -> per.merge(k, v, Double::sum)));
            vap.massPerComponentKg().forEach((k, v) -> per.merge(k, v, Double::sum));
            double mass = liq.map(PhaseInventory::massKg).orElse(0.0) + vap.massKg();
            double moles = liq.map(PhaseInventory::moles).orElse(0.0) + vap.moles();
            liq.ifPresent(l -> trace.add(phaseStep(l)));
            trace.add(phaseStep(vap));
            TraceStep.Builder tot = TraceStep.of("Total inventory").equation("m = m_L + m_V; m_i = m_L,i + m_V,i")
                    .source(MASS_SOURCE)
                    .out("Total mass", "%.3f kg", mass)
                    .out("Total amount", "%.4g mol", moles);
            per.forEach((k, v) -> tot.out("Mass of " + k, String.format(Locale.US, "%.3f kg", v)));
            trace.add(tot.build());
            return new Inventory(storage.mode(), fluid, vs, exposure, t, p, liq, vap, mass, moles, per, rackett, full,
                    trace, new ArrayList<>(warnings));
        }

        TraceStep phaseStep(PhaseInventory ph) {
            TraceStep.Builder b = TraceStep.of("Inventory, " + ph.phase())
                    .equation("m = V rho; M = sum x_i M_i; n = m / M; m_i = n x_i M_i")
                    .source(MASS_SOURCE)
                    .in("Volume V", m3(ph.volumeM3()))
                    .in("Density rho", dens(ph.densityKgM3(), ph.densityBasis()))
                    .out("Mass m", "%.3f kg", ph.massKg())
                    .out("Molar mass M", "%.4f kg/kmol", ph.molarMassKgKmol())
                    .out("Amount n", "%.4g mol", ph.moles());
            ph.massPerComponentKg().forEach((k, v) -> b.out("Mass of " + k, String.format(Locale.US, "%.3f kg", v)));
            return b.build();
        }

        CubicModel pureModel(int i) {
            return fluid.components().size() == 1 ? model : CubicModel.pure(fluid.variant(), fluid.components().get(i));
        }
    }

    /** Runs f, re-labelling a NoSolutionException with the given field path. */
    private static <T> T relabel(String field, java.util.function.Supplier<T> f) {
        try {
            return f.get();
        } catch (NoSolutionException e) {
            throw new NoSolutionException(field, message(e));
        }
    }

    /** The message of a field-prefixed exception without its "field: " prefix. */
    static String message(VentcaseException e) {
        String m = e.getMessage();
        if (e instanceof NoSolutionException ns && m.startsWith(ns.field() + ": ")) {
            return m.substring(ns.field().length() + 2);
        }
        return m;
    }

    // trace texts, formatted when read (org.ventcase.common.LazyText)
    static org.ventcase.common.LazyText kpa(double pa) {
        return org.ventcase.common.LazyText.format("%.2f kPa abs", pa / 1e3);
    }

    static org.ventcase.common.LazyText kelvinC(double k) {
        return org.ventcase.common.LazyText.format("%.2f K (%.2f C)", k, k - 273.15);
    }

    static org.ventcase.common.LazyText m3(double v) {
        return org.ventcase.common.LazyText.format("%.4f m3", v);
    }

    static org.ventcase.common.LazyText dens(double rho, DensityBasis b) {
        return org.ventcase.common.LazyText.format("%.3f kg/m3 (%s)", rho, b.label());
    }
}
