package org.ventcase.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseResult;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.Templates;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.report.UnitSystem;
import org.ventcase.app.CaseRunner;
import org.ventcase.app.CaseSummary;
import org.ventcase.app.PipelineCaseRunner;
import org.ventcase.app.SheetOutcome;

/** The wizard's runner is the case pipeline: every scenario computed, rows equal to the case result. */
class PipelineCaseRunnerTest {

    private static ValidatedCase template(String name) {
        return CaseFiles.load(Templates.caseJson(name).orElseThrow(), name);
    }

    @Test
    void theStandardRunnerIsThePipeline() {
        assertTrue(CaseRunner.standard() instanceof PipelineCaseRunner);
    }

    @Test
    void everyScenarioIsComputedAndEachRowIsTheCaseResult() {
        for (String name : Templates.CASES) {
            ValidatedCase k = template(name);
            CaseSummary s = CaseRunner.standard().run(k, CaseRunner.Progress.none(), () -> false);
            // Regression against the pipeline: the rows are CaseCalculation's numbers, unchanged
            CaseResult r = CaseCalculation.run(CaseInputs.from(k));
            assertEquals(r.scenarios().size(), s.scenarios().size(), name);
            for (int i = 0; i < r.scenarios().size(); i++) {
                CaseResult.ScenarioResult e = r.scenarios().get(i);
                CaseSummary.ScenarioRow row = s.scenarios().get(i);
                assertEquals(e.failure().isEmpty(), row.computed(), name + " " + row.note());
                assertEquals(e.label(), row.label());
                assertEquals(e.reliefLoadKgPerS(), row.loadKgPerS(), name);
                assertEquals(e.requiredAreaM2(), row.requiredAreaM2(), name);
                assertEquals(e.orifice().map(o -> o.designation()), row.orifice(), name);
            }
            assertEquals(r.governingIndex().isPresent() ? r.governingIndex().getAsInt() : -1,
                    s.governing().orElse(-1), name);
            assertEquals(r.inventory().totalMassKg(), s.inventory().orElseThrow().totalKg(), 0.0, name);
        }
    }

    @Test
    void aFailedScenarioShowsItsReasonAndNoNumber() {
        // propane at a set pressure above its critical pressure: the wetted fire has no boiling point at P1
        String json = Templates.caseJson("horizontal-bullet").orElseThrow().replaceFirst(
                "\"setPressure\"\\s*:\\s*\"[^\"]*\"", "\"setPressure\": \"45 barg\"")
                .replaceFirst("\"mawp\"\\s*:\\s*\"[^\"]*\"", "\"mawp\": \"45 barg\"");
        ValidatedCase k = CaseFiles.load(json, "above-critical");
        CaseSummary s = CaseRunner.standard().run(k, CaseRunner.Progress.none(), () -> false);
        CaseSummary.ScenarioRow fire = s.scenarios().get(0);
        assertFalse(fire.computed(), fire.note());
        assertTrue(fire.note().startsWith("not computed: "), fire.note());
        assertTrue(fire.requiredAreaM2().isEmpty() && fire.loadKgPerS().isEmpty());
        assertFalse(s.complete());
    }

    @Test
    void progressReachesTheEndAndACancelledRunStops() {
        ValidatedCase k = template("sphere");
        List<Double> seen = new ArrayList<>();
        CaseRunner.standard().run(k, (f, m) -> seen.add(f), () -> false);
        assertEquals(1.0, seen.get(seen.size() - 1));
        assertThrows(CaseRunner.Cancelled.class,
                () -> CaseRunner.standard().run(k, CaseRunner.Progress.none(), () -> true));
        int[] polls = {0};
        assertThrows(CaseRunner.Cancelled.class,
                () -> CaseRunner.standard().run(k, CaseRunner.Progress.none(), () -> ++polls[0] > 2));
    }

    @Test
    void anyCaseHasASheetIncludingMixturesAndBoilOff() {
        for (String name : Templates.CASES) {
            SheetOutcome o = CaseRunner.standard().sheet(template(name), UnitSystem.SI, "test");
            assertTrue(o.model().isPresent(), name + ": " + o.reason());
            assertFalse(o.model().get().cautions().isEmpty());
        }
        ValidatedCase lpg = CaseFiles.load(Path.of("demo-cases", "lpg-sphere-mixture.json"));
        SheetOutcome o = CaseRunner.standard().sheet(lpg, UnitSystem.US, "test");
        assertEquals(2, o.model().orElseThrow().method().size());
    }
}
