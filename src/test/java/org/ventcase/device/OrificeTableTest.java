package org.ventcase.device;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

class OrificeTableTest {

    @Test
    void tableHoldsThePublishedLettersInOrder() {
        // Source: API Std 526 (2009) effective orifice designations D..T (REFERENCES.md 5) [S].
        assertEquals("DEFGHJKLMNPQRT",
                OrificeTable.all().stream().map(Orifice::letter).collect(Collectors.joining()));
    }

    @Test
    void areasConvertWithExactFactor() {
        // Source: API Std 526, P = 6.38 in2, T = 26.0 in2 [S]; Hand calculation: x 645.16 mm2/in2.
        assertEquals(4116.1208, OrificeTable.byLetter("P").areaMm2(), 1e-9);
        assertEquals(16_774.16, OrificeTable.byLetter("t").areaMm2(), 1e-9);
        assertEquals(0.110, OrificeTable.byLetter("D").areaIn2(), 0);
    }

    @Test
    void exactlyEqualAreaSelectsThatOrifice() {
        Orifice n = OrificeTable.byLetter("N");
        OrificeSelection s = OrificeTable.select(n.areaM2(), 1.0);
        assertEquals("N", s.designation());
        assertEquals(0.0, s.marginPercent(), 1e-9);
        assertEquals(1.0, s.ratedCapacityKgPerS(), 1e-12);
    }

    @Test
    void slightlyAboveAnOrificeSelectsTheNext() {
        OrificeSelection s = OrificeTable.select(OrificeTable.byLetter("N").areaM2() * 1.0001, 1.0);
        assertEquals("P", s.designation());
    }

    @Test
    void ratedCapacityScalesWithArea() {
        // Hand calculation: required 3000 mm2 -> P 4116.1208 mm2; rated = 10 kg/s x 4116.1208/3000
        // = 13.720403 kg/s; margin 37.2040 %.
        OrificeSelection s = OrificeTable.select(3000e-6, 10.0);
        assertEquals("P", s.designation());
        assertEquals(13.720403, s.ratedCapacityKgPerS(), 1e-6);
        assertEquals(37.20403, s.marginPercent(), 1e-5);
    }

    @Test
    void aboveTUsesSeveralEqualValvesOfTheSmallestSufficientLetter() {
        // Hand calculation: 1.2 x 26 in2 = 31.2 in2 -> n = 2; 2 x R = 32.0 in2 >= 31.2, 2 x Q = 22.1 < 31.2.
        double req = 1.2 * OrificeTable.largest().areaM2();
        OrificeSelection s = OrificeTable.select(req, 5.0);
        assertEquals(2, s.count());
        assertEquals("2 x R", s.designation());
        assertEquals(List.of(OrificeTable.byLetter("R"), OrificeTable.byLetter("R")), s.orifices());
        assertEquals(100 * (32.0 / 31.2 - 1), s.marginPercent(), 1e-9);
        assertTrue(s.ruleApplied().contains("no source"));
    }

    @Test
    void exactlyTwiceTSelectsTwoT() {
        OrificeSelection s = OrificeTable.select(2 * OrificeTable.largest().areaM2(), 5.0);
        assertEquals("2 x T", s.designation());
        assertEquals(0.0, s.marginPercent(), 1e-9);
    }

    @Test
    void rejectsNonPositiveArea() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> OrificeTable.select(-1e-4, 1));
        assertEquals("device.requiredArea", e.field());
        e = assertThrows(InvalidInputException.class, () -> OrificeTable.byLetter("X"));
        assertEquals("device.orifice", e.field());
    }
}
