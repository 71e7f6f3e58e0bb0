package org.ventcase.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.casefile.Templates;
import org.ventcase.relief.FireLoadCurve;
import org.ventcase.relief.WettedFireResult;

class SheetModelsTest {

    @Test
    void fireCaseFillsEveryPartOfTheModel() {
        WettedFireResult r = SheetFixtures.bullet();
        SheetModel m = SheetModels.from(r, SheetFixtures.identity());
        assertEquals(UnitSystem.SI, m.units());
        assertEquals(1, m.loads().size());
        assertTrue(m.loads().get(0).governing());
        assertEquals(7, m.inputs().size(), "fluid, EOS, vessel, storage, site, scenario, device");
        assertEquals(4, m.results().size());
        assertEquals(r.trace(), m.method().get(0).steps());
        assertEquals(r.warnings(), m.warnings());
        assertTrue(m.figures().get(0) instanceof Figure.VesselSketch);
        assertTrue(m.figures().get(1) instanceof Figure.LineChart);
    }

    @Test
    void textBlocksComeFromTheTemplatesWithPlaceholdersFilled() {
        SheetModel m = SheetModels.from(SheetFixtures.bullet(), SheetFixtures.identity());
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
        WettedFireResult r = SheetFixtures.bullet();
        FireLoadCurve curve = FireLoadCurve.overLevels(r.input(), 10, 90, 8);
        SheetModel m = SheetModels.from(r, curve, SheetFixtures.identity(), UnitSystem.US);
        Figure.LineChart ch = (Figure.LineChart) m.figures().get(1);
        double[] y = ch.series().get(0).y();
        assertEquals(curve.points().size(), y.length);
        // Definition: lb/h = kg/s x 3600 / 0.45359237
        assertEquals(curve.governing().reliefLoadKgPerS() * 3600 / 0.45359237, ch.markers().get(0).y(), 1e-9);
        assertTrue(ch.markers().get(0).filled());
        assertTrue(ch.yLabel().contains("lb/h"));
    }

    @Test
    void modelRefusesTwoGoverningScenariosAndMissingCautions() {
        SheetModel m = SheetModels.from(SheetFixtures.bullet(), SheetFixtures.identity());
        SheetModel.ScenarioLoad l = m.loads().get(0);
        assertThrows(IllegalArgumentException.class, () -> new SheetModel(m.identity(), m.units(), m.revisions(),
                m.signOff(), m.inputs(), List.of(l, l), m.results(), m.warnings(), m.figures(), m.method(),
                m.cautions(), m.deferral(), m.unitNote()));
        assertThrows(IllegalArgumentException.class, () -> new SheetModel(m.identity(), m.units(), m.revisions(),
                m.signOff(), m.inputs(), m.loads(), m.results(), m.warnings(), m.figures(), m.method(),
                List.of(), m.deferral(), m.unitNote()));
    }
}
