package org.ventcase.vessel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

class LevelTest {
    final Vessel vessel = Vessel.horizontal(2.0, 5.0, Head.ellipsoidal2to1(2.0), Head.asmeFlangedAndDished(2.0));

    @Test
    void everyBasisRoundTripsThroughTheOthers() {
        for (Level start : new Level[] {Level.ofHeight(0.37), Level.ofPercentOfHeight(81), Level.ofPercentOfVolume(12.5)}) {
            for (Level.Basis via : Level.Basis.values()) {
                Level back = start.as(via, vessel).as(start.basis(), vessel);
                // Required: 1e-9 relative round trip
                assertEquals(start.value(), back.value(), 1e-9 * start.value(), start + " via " + via);
            }
        }
    }

    @Test
    void halfHeightOfASymmetricHorizontalVesselIsHalfVolume() {
        Vessel sym = Vessel.horizontal(2.0, 5.0, Head.conical(50), Head.conical(50));
        // Hand calculation: reflection symmetry about the axis
        assertEquals(50.0, Level.ofPercentOfHeight(50).percentOfVolumeIn(sym), 1e-9);
        assertEquals(1.0, Level.ofPercentOfVolume(50).heightIn(sym), 1e-9);
    }

    @Test
    void endpointsMapExactly() {
        assertEquals(vessel.totalHeight(), Level.ofPercentOfVolume(100).heightIn(vessel), 0.0);
        assertEquals(0.0, Level.ofPercentOfVolume(0).heightIn(vessel), 0.0);
        assertEquals(100.0, Level.ofHeight(2.0).percentOfVolumeIn(vessel), 0.0);
    }

    @Test
    void outOfRangeLevelsNameTheirField() {
        assertField("level.height", () -> Level.ofHeight(-0.1));
        assertField("level.height", () -> Level.ofHeight(2.01).heightIn(vessel));
        assertField("level.percentOfHeight", () -> Level.ofPercentOfHeight(100.5));
        assertField("level.percentOfVolume", () -> Level.ofPercentOfVolume(Double.NaN));
        assertField("level.height", () -> vessel.liquidVolume(2.0000001));
        assertField("level.height", () -> vessel.wettedArea(-1e-9));
        assertField("level.volume", () -> vessel.levelAtVolume(vessel.totalVolume() * 1.001));
    }

    @Test
    void aPercentageWrittenWithAnExponentIsReadAndRangeChecked() {
        // '1e300 %v' was once refused as 'not a height or percentage', hiding the real problem (the range)
        assertEquals(70.0, Specs.level("storage.liquidLevel", "7e1 %v").value(), 0.0);
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> Specs.level("storage.liquidLevel", "1e300 %v"));
        assertTrue(e.getMessage().contains("0 to 100"), e.getMessage());
    }

    static void assertField(String field, org.junit.jupiter.api.function.Executable call) {
        InvalidInputException e = assertThrows(InvalidInputException.class, call);
        assertEquals(field, e.field(), e.getMessage());
        assertTrue(e.getMessage().startsWith(field + ": "), e.getMessage());
        assertTrue(e.accepted().startsWith("expected"), e.getMessage());
    }
}
