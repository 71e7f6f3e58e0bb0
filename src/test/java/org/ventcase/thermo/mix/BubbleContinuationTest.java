package org.ventcase.thermo.mix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.EosVariant;

/**
 * A bubble point a few kelvin below a mixture's critical point, where the Wilson start falls into
 * the trivial solution, is found by continuation from a lower temperature. Checked by the exact
 * conditions of a bubble point (common practice, no source): a PT flash just below the bubble
 * pressure splits off a little vapour, just above it the feed is one phase.
 */
class BubbleContinuationTest {

    @Test
    void bubblePointCloseToTheCriticalPointIsFoundAndIsConsistentWithTheFlash() {
        List<Component> cs = List.of(ComponentLibrary.builtIn().get("ethane"), ComponentLibrary.builtIn().get("propane"));
        CubicModel model = new CubicModel(EosVariant.PR78, cs, KijTable.builtIn().matrix(cs, EosVariant.PR78).kij());
        double[] z = {0.5, 0.5};
        // PR78's critical point of this feed: about 342.9 K (PhaseEnvelope of the same model).
        double t = 340.0;
        SaturationPoint b = new SaturationPoints(model).bubblePressure(t, z);
        assertTrue(b.warnings().stream().anyMatch(w -> w.contains("continuation")), b.warnings().toString());
        double[] k = b.kValues();
        assertTrue(k[0] > 1.01 && k[1] < 0.99, "not the trivial solution: " + k[0] + ", " + k[1]);
        double sum = z[0] * k[0] + z[1] * k[1];
        assertEquals(1.0, sum, 1e-8, "bubble condition sum z K = 1");
        PTFlash flash = new PTFlash(model);
        FlashResult below = flash.flash(t, b.pressurePa() * 0.995, z);
        assertTrue(below.twoPhase() && below.vaporFraction() < 0.2, "just below: a little vapour");
        FlashResult above = flash.flash(t, b.pressurePa() * 1.005, z);
        assertTrue(!above.twoPhase(), "just above: one phase");
    }
}
