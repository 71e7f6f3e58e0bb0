package org.ventcase.ui.calc;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.BooleanSupplier;
import java.util.function.Function;

import org.ventcase.casefile.ScenarioType;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.common.VentcaseException;
import org.ventcase.inventory.Fluid;
import org.ventcase.inventory.Inventories;
import org.ventcase.inventory.Inventory;
import org.ventcase.inventory.Storage;
import org.ventcase.relief.DeviceSpec;
import org.ventcase.relief.EnvironmentFactor;
import org.ventcase.relief.EnvironmentFactors;
import org.ventcase.relief.MixtureFire;
import org.ventcase.relief.MixtureFireInput;
import org.ventcase.relief.MixtureFireResult;
import org.ventcase.relief.MixtureSpec;
import org.ventcase.relief.WettedFire;
import org.ventcase.relief.WettedFireInput;
import org.ventcase.relief.WettedFireResult;
import org.ventcase.report.SheetIdentity;
import org.ventcase.report.SheetModels;
import org.ventcase.report.UnitSystem;
import org.ventcase.thermo.Composition;
import org.ventcase.thermo.mix.KijTable;

/**
 * The wizard's calculation until the full case pipeline lands: the inventory of every case
 * ({@link Inventories}) and the wetted pool-fire scenarios ({@link MixtureFire}, which for one
 * component gives {@link WettedFire}'s answer); every other scenario is returned as "not computed
 * yet" with the reason, never with a number. The sheet is offered for a pure fluid with a wetted
 * fire scenario (the sheet mapper covers {@link WettedFireResult} so far).
 *
 * <p>Relief load: W = Q/L, without the vapour-displacement refinement (the larger of the two forms).
 * Insulation credit: the environment factor by the general formula at the relieving temperature,
 * which the fire case itself gives (the bubble point at P1 does not depend on F), so the case is
 * run once to find T1 and once with the factor.
 */
public final class InterimCaseRunner implements CaseRunner {

    /** Why a scenario type is not computed by this runner. */
    static final String PENDING = "not computed yet: this scenario type comes with the full case calculation "
            + "(use the command line scenario tools meanwhile)";

    @Override
    public CaseSummary run(ValidatedCase kase, Progress progress, BooleanSupplier cancelled) {
        LinkedHashSet<String> warnings = new LinkedHashSet<>(kase.warnings());
        int n = kase.scenarios().size();
        double steps = n + 1.0;
        progress.update(0, "Inventory at storage conditions");
        check(cancelled);
        Optional<CaseSummary.InventoryRow> inv = Optional.empty();
        String invNote = "";
        try {
            Inventory i = inventory(kase);
            warnings.addAll(i.warnings());
            inv = Optional.of(new CaseSummary.InventoryRow(i.liquidMassKg(), i.vapourMassKg(), i.totalMassKg(),
                    i.pressurePa(), i.temperatureK(), i.vessel().liquidVolume(), i.vessel().totalVolume()));
        } catch (VentcaseException e) {
            invNote = "not computed: " + e.getMessage();
        }
        List<CaseSummary.ScenarioRow> rows = new ArrayList<>();
        for (int s = 0; s < n; s++) {
            ValidatedCase.ScenarioSpec spec = kase.scenarios().get(s);
            progress.update((s + 1) / steps, "Scenario " + (s + 1) + " of " + n + ": " + spec.label());
            check(cancelled);
            if (spec instanceof ValidatedCase.WettedFire f && f.type() == ScenarioType.FIRE_WETTED) {
                try {
                    MixtureFireResult r = wettedFire(kase, f);
                    warnings.addAll(r.warnings());
                    rows.add(new CaseSummary.ScenarioRow(f.label(), f.type().key(), true, "W = Q/L (API Std 521 pool fire, "
                            + "API Std 520 Part I vapour sizing)", OptionalDouble.of(r.relieving().relievingPressurePa()),
                            OptionalDouble.of(r.boiling().temperatureK()), OptionalDouble.of(r.reliefLoadKgPerS()),
                            OptionalDouble.of(r.heat().heatW()), OptionalDouble.of(r.vessel().fire().area()),
                            OptionalDouble.of(r.sizing().areaM2()), Optional.of(r.orifice().designation())));
                } catch (VentcaseException e) {
                    rows.add(CaseSummary.ScenarioRow.notComputed(f.label(), f.type().key(),
                            "not computed: " + e.getMessage()));
                }
            } else {
                rows.add(CaseSummary.ScenarioRow.notComputed(spec.label(), spec.type().key(), PENDING));
            }
        }
        Optional<Integer> gov = Optional.empty();
        double best = -1;
        for (int s = 0; s < rows.size(); s++) {
            OptionalDouble a = rows.get(s).requiredAreaM2();
            if (a.isPresent() && a.getAsDouble() > best) {
                best = a.getAsDouble();
                gov = Optional.of(s);
            }
        }
        boolean complete = rows.stream().allMatch(CaseSummary.ScenarioRow::computed);
        if (!complete && gov.isPresent()) {
            warnings.add("Not every scenario was computed: the governing scenario shown governs only among those "
                    + "computed. The relief basis is incomplete until every scenario has a result.");
        }
        progress.update(1, "Done");
        return new CaseSummary(inv, invNote, rows, gov, complete, new ArrayList<>(warnings));
    }

    @Override
    public SheetOutcome sheet(ValidatedCase kase, UnitSystem units, String toolVersion) {
        if (kase.fluid().composition().components().size() != 1) {
            return SheetOutcome.none("the calculation sheet for a mixture comes with the full case calculation; "
                    + "so far sheets are made for a pure fluid with a wetted pool-fire scenario");
        }
        Optional<ValidatedCase.WettedFire> fire = kase.scenarios().stream()
                .filter(s -> s instanceof ValidatedCase.WettedFire w && w.type() == ScenarioType.FIRE_WETTED)
                .map(s -> (ValidatedCase.WettedFire) s).findFirst();
        if (fire.isEmpty()) {
            return SheetOutcome.none("so far sheets are made for a wetted pool-fire scenario; this case has none");
        }
        ValidatedCase.WettedFire f = fire.get();
        ValidatedCase.Identity id = kase.identity();
        SheetIdentity sid = new SheetIdentity(id.title(), id.tag(), id.revision(), id.date(), id.preparer(),
                id.checker(), "Ventcase", toolVersion, kase.inputHash());
        try {
            WettedFireResult r = withFactor(f.factor(), env -> WettedFire.run(pureInput(kase, f, env)),
                    x -> x.relief().temperatureK());
            return SheetOutcome.of(SheetModels.from(r, sid, units));
        } catch (VentcaseException e) {
            return SheetOutcome.none("the fire case could not be computed: " + e.getMessage());
        }
    }

    // ------------------------------------------------------------------------------ wiring

    private static void check(BooleanSupplier cancelled) {
        if (cancelled.getAsBoolean()) {
            throw new Cancelled();
        }
    }

    /** Runs {@code f} with the case's environment factor; an insulation factor needs T1 from a first run. */
    private static <R> R withFactor(ValidatedCase.FireFactor factor, Function<EnvironmentFactor, R> f,
                                    Function<R, Double> relievingTemperatureK) {
        if (factor instanceof ValidatedCase.TableFactor t) {
            return f.apply(t.row());
        }
        ValidatedCase.InsulationFactor ins = (ValidatedCase.InsulationFactor) factor;
        R first = f.apply(EnvironmentFactors.byKey("bare"));
        double t1C = relievingTemperatureK.apply(first) - PhysicalConstants.ZERO_CELSIUS_K;
        return f.apply(EnvironmentFactors.insulation(ins.conductivityWPerMK(), ins.thicknessM(), t1C));
    }

    static MixtureFireResult wettedFire(ValidatedCase kase, ValidatedCase.WettedFire f) {
        MixtureSpec spec = mixture(kase);
        DeviceSpec device = device(kase);
        return withFactor(f.factor(), env -> MixtureFire.run(new MixtureFireInput(spec, kase.vessel().vessel(),
                        kase.storage().level(), kase.vessel().exposure(), f.relieving(), f.fireFighting(), env, device,
                        false)),
                r -> r.boiling().temperatureK());
    }

    private static WettedFireInput pureInput(ValidatedCase kase, ValidatedCase.WettedFire f, EnvironmentFactor env) {
        ValidatedCase.DeviceSpec d = kase.device();
        return new WettedFireInput(kase.fluid().composition().components().get(0), kase.fluid().eos(),
                kase.fluid().densityBasis(), kase.vessel().vessel(), kase.storage().level(), kase.vessel().exposure(),
                kase.storage().temperatureK(), f.relieving(), f.fireFighting(), env, d.totalBackPressurePa(), d.kd(),
                d.kb(), d.kc(), false);
    }

    private static DeviceSpec device(ValidatedCase kase) {
        ValidatedCase.DeviceSpec d = kase.device();
        return new DeviceSpec(d.totalBackPressurePa(), d.kd(), d.kb(), d.kc(),
                kase.site().minimumDesignMetalTemperatureK());
    }

    /** The case's k_ij (pairs not given are 0, as the validated model has them). */
    private static double[][] kij(ValidatedCase kase) {
        int n = kase.fluid().composition().components().size();
        double[][] k = new double[n][n];
        for (ValidatedCase.KijEntry e : kase.fluid().kij()) {
            k[e.i()][e.j()] = e.value();
            k[e.j()][e.i()] = e.value();
        }
        return k;
    }

    private static MixtureSpec mixture(ValidatedCase kase) {
        ValidatedCase.FluidModel fm = kase.fluid();
        List<String> w = fm.composition().components().size() > 1 && fm.kij().isEmpty()
                ? List.of("k_ij = 0 for every pair: the case gives no interaction parameters") : List.of();
        return new MixtureSpec(fm.eos(), fm.composition().components(), kij(kase), w, fm.composition().fractions(),
                fm.densityBasis());
    }

    static Inventory inventory(ValidatedCase kase) {
        ValidatedCase.FluidModel fm = kase.fluid();
        Composition liquid = new Composition(fm.composition().components(), fm.composition().fractions());
        ValidatedCase.StorageState s = kase.storage();
        Fluid fluid;
        Storage storage;
        switch (s.mode()) {
            case SATURATED -> {
                fluid = new Fluid(liquid, fm.eos(), matrix(kase), fm.densityBasis());
                storage = Storage.Saturated.at(s.temperatureK());
            }
            case SPECIFIED -> {
                Composition vapour = s.vapourComposition()
                        .map(v -> new Composition(v.components(), v.fractions())).orElse(liquid);
                fluid = s.vapourComposition().isPresent()
                        ? Fluid.withVapourSpace(liquid, vapour, fm.eos(), fm.densityBasis())
                        : new Fluid(liquid, fm.eos(), matrix(kase), fm.densityBasis());
                storage = new Storage.Specified(s.temperatureK(), s.pressurePa().orElseThrow(),
                        vapour.over("storage.vapourComposition", fluid.components()));
            }
            default -> {
                fluid = new Fluid(liquid, fm.eos(), matrix(kase), fm.densityBasis());
                storage = new Storage.GasFilled(s.temperatureK(), s.pressurePa().orElseThrow());
            }
        }
        return Inventories.compute(fluid, storage, kase.vessel().vessel(), s.level(), kase.vessel().exposure());
    }

    private static KijTable.Matrix matrix(ValidatedCase kase) {
        int n = kase.fluid().composition().components().size();
        String[][] src = new String[n][n];
        for (String[] row : src) {
            java.util.Arrays.fill(row, "not given in the case (0)");
        }
        for (ValidatedCase.KijEntry e : kase.fluid().kij()) {
            src[e.i()][e.j()] = e.source();
            src[e.j()][e.i()] = e.source();
        }
        return new KijTable.Matrix(kij(kase), src, List.of());
    }
}
