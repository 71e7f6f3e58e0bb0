package org.ventcase.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.inventory.Fluid;
import org.ventcase.inventory.Inventory;
import org.ventcase.relief.BoilOff;
import org.ventcase.relief.BoilOffInput;
import org.ventcase.relief.BoilOffResult;
import org.ventcase.relief.MixtureSpec;
import org.ventcase.thermo.Component;

/**
 * The boil-off starts from what is stored. Seen: the LPG sphere demo started from 315 t against
 * 375.8 t stored, because the stored liquid's volume was re-read at P1 (less dense there). Checks:
 * the opening mass equals the stored mass, and vented + left = stored over the run, to 1e-9
 * relative (invariants, no external values).
 */
class BoilOffStartTest {

    @Test
    void theBoilOffStartsFromTheStoredMassAndKeepsIt() {
        CaseInput in = CaseInputs.from(CaseFiles.load(Path.of("demo-cases/lpg-sphere-mixture.json")));
        CaseResult full = CaseCalculation.run(in);
        Inventory inv = full.inventory();
        Fluid f = in.fluid();
        MixtureSpec spec = new MixtureSpec(f.variant(), f.components(), f.kij().kij(), f.kij().warnings(),
                f.composition().fractions(), f.densityBasis());
        List<Component> cs = spec.components();
        double[] moles = new double[cs.size()];
        for (int i = 0; i < cs.size(); i++) {
            moles[i] = inv.massPerComponentKg().get(cs.get(i).name()) / (cs.get(i).molarMass() * 1e-3);
        }
        double p1 = full.scenarios().get(1).relievingPressurePa().getAsDouble();
        double q = full.scenarios().get(1).heatInputW().getAsDouble();
        BoilOffInput bi = new BoilOffInput(spec, in.vessel(), in.level(), q, p1, 0.1, 7200, BoilOffInput.DEFAULT_STEPS,
                in.device().gas()).withStoredMoles(moles);
        BoilOffResult r = BoilOff.run(bi);
        BoilOffResult.Balance b = r.balance();
        double stored = inv.totalMassKg();
        assertEquals(stored, b.initialMassKg(), 1e-9 * stored, "opening mass = stored mass");
        assertEquals(b.initialMassKg(), b.finalMassKg() + b.ventedMassKg(), 1e-9 * stored, "vented + left = stored");
        // the older start (the stored liquid's volume at P1) holds less: what the fix is about
        BoilOffResult old = BoilOff.run(new BoilOffInput(spec, in.vessel(), in.level(), q, p1, 0.1, 7200,
                BoilOffInput.DEFAULT_STEPS, in.device().gas()));
        assertTrue(old.balance().initialMassKg() < 0.99 * stored, old.balance().initialMassKg() + " vs " + stored);
    }

    @Test
    void theCaseCalculationUsesTheStoredContents() {
        CaseInput in = CaseInputs.from(CaseFiles.load(Path.of("demo-cases/lpg-sphere-mixture.json")));
        CaseResult r = CaseCalculation.run(in);
        CaseResult.ScenarioResult s = r.scenarios().get(1);
        assertTrue(s.trace().stream().anyMatch(t -> t.title().equals("Opening state: the stored contents at P1")),
                "the boil-off scenario opens from the stored contents");
    }
}
