package org.ventcase.ui.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.Templates;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.report.UnitSystem;

/** The interim runner: computes what the domain offers and says "not computed yet" for the rest. */
class InterimCaseRunnerTest {

    private static ValidatedCase template(String name) {
        return CaseFiles.load(Templates.caseJson(name).orElseThrow(), name);
    }

    @Test
    void wettedFireIsComputedAndOtherScenariosCarryAReasonInsteadOfNumbers() {
        ValidatedCase k = template("horizontal-bullet");
        CaseSummary s = new InterimCaseRunner().run(k, CaseRunner.Progress.none(), () -> false);
        assertTrue(s.inventory().isPresent());
        assertEquals(2, s.scenarios().size());
        CaseSummary.ScenarioRow fire = s.scenarios().get(0);
        assertTrue(fire.computed());
        assertTrue(fire.requiredAreaM2().getAsDouble() > 0);
        assertTrue(fire.orifice().isPresent());
        CaseSummary.ScenarioRow blocked = s.scenarios().get(1);
        assertFalse(blocked.computed());
        assertTrue(blocked.requiredAreaM2().isEmpty());
        assertTrue(blocked.note().startsWith("not computed yet"));
        assertEquals(0, s.governing().orElseThrow());
        assertFalse(s.complete());
        assertTrue(s.warnings().stream().anyMatch(w -> w.contains("governs only among those computed")));
    }

    @Test
    void theFireRowMatchesTheFireCaseRunDirectly() {
        ValidatedCase k = template("horizontal-bullet");
        CaseSummary s = new InterimCaseRunner().run(k, CaseRunner.Progress.none(), () -> false);
        // Regression against the domain: the row is the MixtureFire result, unchanged
        double direct = InterimCaseRunner.wettedFire(k, (ValidatedCase.WettedFire) k.scenarios().get(0)).reliefLoadKgPerS();
        assertEquals(direct, s.scenarios().get(0).loadKgPerS().getAsDouble(), 0.0);
    }

    @Test
    void insulationCreditUsesTheFactorAtTheRelievingTemperature() {
        ValidatedCase k = template("vertical-drum");
        CaseSummary s = new InterimCaseRunner().run(k, CaseRunner.Progress.none(), () -> false);
        CaseSummary.ScenarioRow fire = s.scenarios().get(0);
        assertTrue(fire.computed(), fire.note());
        // insulation (75 mm, 0.05 W/mK) gives F well below a bare vessel's 1: the heat input is lower
        ValidatedCase.WettedFire spec = (ValidatedCase.WettedFire) k.scenarios().get(0);
        double f = InterimCaseRunner.wettedFire(k, spec).input().environment().f();
        assertTrue(f > 0 && f < 0.3, "F = " + f);
    }

    @Test
    void aCancelledRunStops() {
        ValidatedCase k = template("horizontal-bullet");
        assertThrows(CaseRunner.Cancelled.class,
                () -> new InterimCaseRunner().run(k, CaseRunner.Progress.none(), () -> true));
    }

    @Test
    void aMixtureHasNoSheetYetAndSaysWhy() {
        SheetOutcome o = new InterimCaseRunner().sheet(template("horizontal-bullet"), UnitSystem.SI, "test");
        assertTrue(o.model().isEmpty());
        assertTrue(o.reason().contains("mixture"));
    }
}
