package org.ventcase.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.calc.CaseResult;
import org.ventcase.casefile.Templates;
import org.ventcase.relief.FireLoadCurve;

class SheetModelsTest {

    @Test
    void fireCaseFillsEveryPartOfTheModel() {
        SheetFixtures.Computed c = SheetFixtures.bullet();
        SheetModel m = c.model();
        assertEquals(UnitSystem.SI, m.units());
        assertEquals(c.result().scenarios().size(), m.loads().size());
        assertEquals(1, m.loads().stream().filter(SheetModel.ScenarioLoad::governing).count());
        assertEquals(c.result().scenarios().size(), m.method().size());
        for (int i = 0; i < m.method().size(); i++) {
            // the first section also carries the case's own steps (fluid model, vessel, inventory)
            assertTrue(m.method().get(i).steps().containsAll(c.result().scenarios().get(i).trace()), "scenario " + i);
        }
        assertFalse(m.inputs().isEmpty());
        assertFalse(m.results().isEmpty());
        assertTrue(m.figures().get(0) instanceof Figure.VesselSketch);
        assertTrue(m.figures().stream().anyMatch(f -> f instanceof Figure.LineChart), "load against level");
        for (CaseResult.CaseWarning w : c.result().warnings()) {
            assertTrue(m.warnings().stream().anyMatch(x -> x.contains(w.message())), w.message());
        }
    }

    @Test
    void textBlocksComeFromTheTemplatesWithPlaceholdersFilled() {
        SheetModel m = SheetFixtures.bullet().modelWithTestIdentity();
        List<String> cautions = SheetModels.paragraphs(Templates.text("cautions").orElseThrow());
        assertEquals(cautions, m.cautions());
        assertTrue(m.cautions().size() >= 5);
        assertTrue(m.deferral().contains("T-0001"), m.deferral());
        assertTrue(m.deferral().contains(SheetFixtures.identity().inputHash()));
        assertTrue(m.deferral().contains("ASME BPVC Section VIII"));
        assertFalse(m.deferral().contains("{"), "every placeholder filled: " + m.deferral());
    }

    @Test
    void chartCarriesTheDomainCurveWithTheGoverningLevelMarked() {
        SheetFixtures.Computed c = SheetFixtures.bullet();
        CaseResult.ScenarioResult fire = c.result().scenarios().stream().filter(s -> s.levelCurve().isPresent())
                .findFirst().orElseThrow();
        FireLoadCurve curve = fire.levelCurve().orElseThrow();
        SheetModel m = c.model(UnitSystem.US);
        Figure.LineChart ch = m.figures().stream().filter(f -> f instanceof Figure.LineChart)
                .map(Figure.LineChart.class::cast).findFirst().orElseThrow();
        double[] y = ch.series().get(0).y();
        assertEquals(curve.points().size(), y.length);
        // Definition: lb/h = kg/s x 3600 / 0.45359237
        assertEquals(curve.governing().reliefLoadKgPerS() * 3600 / 0.45359237, ch.markers().get(0).y(), 1e-9);
        assertTrue(ch.markers().get(0).filled());
        assertTrue(ch.yLabel().contains("lb/h"));
    }

    @Test
    void modelRefusesTwoGoverningScenariosAndMissingCautions() {
        SheetModel m = SheetFixtures.bullet().model();
        SheetModel.ScenarioLoad l = m.loads().get(0);
        assertThrows(IllegalArgumentException.class, () -> new SheetModel(m.identity(), m.units(), m.revisions(),
                m.signOff(), m.inputs(), List.of(l, l), m.results(), m.warnings(), m.figures(), m.method(),
                m.cautions(), m.deferral(), m.unitNote()));
        assertThrows(IllegalArgumentException.class, () -> new SheetModel(m.identity(), m.units(), m.revisions(),
                m.signOff(), m.inputs(), m.loads(), m.results(), m.warnings(), m.figures(), m.method(),
                List.of(), m.deferral(), m.unitNote()));
    }
}
