package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

class LatentHeatGuardTest {

    @Test
    void minimumIsFiftyBtuPerPoundExactly() {
        // Source: API 521 near-critical minimum 50 Btu/lb [S]; Hand calculation: 50 x 2326 J/kg = 116,300 J/kg.
        assertEquals(116_300.0, LatentHeatGuard.MINIMUM_J_PER_KG, 1e-9);
    }

    @Test
    void smallLatentHeatIsRaisedWithWarning() {
        LatentHeatGuard.Result r = LatentHeatGuard.apply(60_000);
        assertTrue(r.minimumApplied());
        assertEquals(116_300.0, r.usedJPerKg(), 1e-9);
        assertEquals(60_000, r.computedJPerKg(), 0);
        assertTrue(r.warning().contains("116.3"));
    }

    @Test
    void normalLatentHeatIsKept() {
        LatentHeatGuard.Result r = LatentHeatGuard.apply(350_000);
        assertFalse(r.minimumApplied());
        assertEquals(350_000, r.usedJPerKg(), 0);
        assertTrue(r.warning().isEmpty());
    }

    @Test
    void rejectsNaN() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> LatentHeatGuard.apply(Double.NaN));
        assertEquals("fire.latentHeat", e.field());
    }
}
