package org.ventcase.app;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.BooleanSupplier;

import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseInput;
import org.ventcase.calc.CaseResult;
import org.ventcase.calc.ScenarioKey;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.common.VentcaseException;
import org.ventcase.inventory.Inventory;
import org.ventcase.report.SheetIdentity;
import org.ventcase.report.SheetModels;
import org.ventcase.report.UnitSystem;

/**
 * The wizard's calculation: the full case pipeline ({@link CaseInputs#from} then
 * {@link CaseCalculation#run}), the same as {@code ventcase calc}, with progress per step and
 * cancellation between steps; the result mapped to the rows the results step shows. Every scenario
 * type is computed; a scenario whose method has no answer is shown with its reason and no number.
 * The sheet is the whole case's ({@link SheetModels#from(CaseResult, CaseInput, SheetIdentity,
 * UnitSystem)}), for any case.
 */
public final class PipelineCaseRunner implements CaseRunner {

    /** The last result computed, with the input hash of its case (the export reuses it). */
    private record Last(String inputHash, CaseResult result) {
    }

    private volatile Last last;

    @Override
    public CaseSummary run(ValidatedCase kase, Progress progress, BooleanSupplier cancelled) {
        if (cancelled.getAsBoolean()) {
            throw new Cancelled();
        }
        CaseResult r = calculate(kase, progress, cancelled);
        last = new Last(kase.inputHash(), r);
        return summary(r);
    }

    /**
     * The result of this case: the one the live calculation made for the same inputs (same input
     * hash: the normalised case), else computed now.
     */
    CaseResult resultOf(ValidatedCase kase, CaseInput in) {
        Last l = last;
        if (l != null && l.inputHash().equals(kase.inputHash())) {
            return l.result();
        }
        CaseResult r = CaseCalculation.run(in);
        last = new Last(kase.inputHash(), r);
        return r;
    }

    @Override
    public SheetOutcome sheet(ValidatedCase kase, UnitSystem units, String toolVersion) {
        try {
            CaseInput in = CaseInputs.from(kase);
            CaseResult r = resultOf(kase, in);
            return SheetOutcome.of(SheetModels.from(r, in, CaseSheets.identity(kase, toolVersion), units));
        } catch (VentcaseException e) {
            return SheetOutcome.none("the case could not be computed: " + e.getMessage());
        }
    }

    private static CaseResult calculate(ValidatedCase kase, Progress progress, BooleanSupplier cancelled) {
        try {
            return CaseCalculation.run(CaseInputs.from(kase), new CaseCalculation.Monitor() {
                @Override
                public void progress(double fraction, String message) {
                    progress.update(fraction, message);
                }

                @Override
                public boolean cancelled() {
                    return cancelled.getAsBoolean();
                }
            });
        } catch (CaseCalculation.Cancelled e) {
            throw new Cancelled();
        }
    }

    /** The results step's rows of a case result. */
    static CaseSummary summary(CaseResult r) {
        Inventory i = r.inventory();
        CaseSummary.InventoryRow inv = new CaseSummary.InventoryRow(i.liquidMassKg(), i.vapourMassKg(), i.totalMassKg(),
                i.pressurePa(), i.temperatureK(), r.vessel().liquidVolume(), r.vessel().totalVolume());
        List<CaseSummary.ScenarioRow> rows = new ArrayList<>();
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            if (s.failure().isPresent()) {
                rows.add(CaseSummary.ScenarioRow.notComputed(s.label(), s.type().key(), "not computed: "
                        + s.failure().get()));
                continue;
            }
            boolean wettedFire = s.type() == ScenarioKey.FIRE_WETTED || s.type() == ScenarioKey.FIRE_BOIL_OFF
                    || s.type() == ScenarioKey.FIRE_NEAR_CRITICAL;
            rows.add(new CaseSummary.ScenarioRow(s.label(), s.type().key(), true, s.sizingEquation(),
                    s.relievingPressurePa(), s.relievingTemperatureK(), s.reliefLoadKgPerS(), s.heatInputW(),
                    wettedFire ? OptionalDouble.of(r.vessel().fire().area()) : OptionalDouble.empty(),
                    s.requiredAreaM2(), s.orifice().map(o -> o.designation()), s.relievedFluid().map(f -> {
                        boolean liquid = f.phase() == org.ventcase.relief.RelievedFluid.Phase.LIQUID;
                        return new CaseSummary.ScenarioRow.Relieved(liquid, f.molarMass(), f.z(),
                                liquid ? OptionalDouble.empty() : OptionalDouble.of(f.kIdeal()), f.density(),
                                f.latentHeatJPerKg());
                    }), s.orifice().map(o -> OptionalDouble.of(o.marginPercent())).orElse(OptionalDouble.empty())));
        }
        LinkedHashSet<String> warnings = new LinkedHashSet<>();
        for (CaseResult.CaseWarning w : r.warnings()) {
            warnings.add(w.scenarios().isEmpty() ? w.message() : "[" + String.join("; ", w.scenarios()) + "] "
                    + w.message());
        }
        Optional<Integer> gov = r.governingIndex().isPresent() ? Optional.of(r.governingIndex().getAsInt())
                : Optional.empty();
        boolean complete = rows.stream().allMatch(CaseSummary.ScenarioRow::computed);
        return new CaseSummary(Optional.of(inv), "", rows, gov, complete, new ArrayList<>(warnings));
    }
}
