package org.ventcase.app;

import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.ValidatedCase;

/** The wizard's PDF export uses the live result of the same inputs instead of computing the case again. */
class PipelineCaseRunnerReuseTest {

    @Test
    void exportReusesTheLiveResultOfTheSameInputs() {
        PipelineCaseRunner runner = new PipelineCaseRunner();
        ValidatedCase kase = CaseFiles.load(Path.of("demo-cases/propane-bullet-fire.json"));
        runner.run(kase, (f, m) -> { }, () -> false);
        var first = runner.resultOf(kase, CaseInputs.from(kase));
        assertSame(first, runner.resultOf(kase, CaseInputs.from(kase)), "same inputs: the same result");
        ValidatedCase other = CaseFiles.load(Path.of("demo-cases/hexane-drum.json"));
        assertNotSame(first, runner.resultOf(other, CaseInputs.from(other)), "other inputs: computed anew");
    }

    @Test
    void theResultsStepRowsCarryTheRelievedFluidAndTheOrificeMargin() {
        // seen: the results step omitted latent heat, molar mass, Z, k, vapour density and the margin
        PipelineCaseRunner runner = new PipelineCaseRunner();
        ValidatedCase kase = CaseFiles.load(Path.of("demo-cases/ammonia-storage.json"));
        CaseSummary s = runner.run(kase, (f, m) -> { }, () -> false);
        CaseSummary.ScenarioRow fire = s.scenarios().get(0);
        CaseSummary.ScenarioRow.Relieved v = fire.relieved().orElseThrow();
        org.junit.jupiter.api.Assertions.assertFalse(v.liquid());
        org.junit.jupiter.api.Assertions.assertTrue(v.kIdeal().isPresent() && v.latentHeatJPerKg().isPresent());
        org.junit.jupiter.api.Assertions.assertTrue(fire.orificeMarginPercent().getAsDouble() >= 0);
        // the blocked-outlet scenario relieves liquid: no k
        CaseSummary.ScenarioRow.Relieved l = s.scenarios().get(1).relieved().orElseThrow();
        org.junit.jupiter.api.Assertions.assertTrue(l.liquid() && l.kIdeal().isEmpty());
    }
}
