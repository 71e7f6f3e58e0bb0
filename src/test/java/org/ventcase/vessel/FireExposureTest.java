package org.ventcase.vessel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Fire-exposed wetted area. Rule: API Std 521 (5th ed. 2007 = ISO 23251:2006), wetted area within
 * 7.6 m above the base of the fire; sphere rule as summarised in REFERENCES.md section 1 [M].
 */
class FireExposureTest {

    @Test
    void defaultFireHeightIs25Feet() {
        // Source: API Std 521 / ISO 23251, 7.6 m (25 ft); REFERENCES.md section 1 [S]
        assertEquals(7.6, FireExposure.DEFAULT_FIRE_HEIGHT_M, 0.0);
        // Hand calculation: 25 ft = 7.62 m, which the standard rounds to 7.6 m
        assertEquals(25 * 0.3048, FireExposure.DEFAULT_FIRE_HEIGHT_M, 0.0201);
    }

    @Test
    void liquidLevelGovernsWhenBelowTheFireHeight() {
        Vessel v = Vessel.horizontal(2.0, 6.0, Head.hemispherical(), Head.hemispherical());
        FireExposedArea f = v.fireExposedArea(1.2, FireExposure.atElevation(1.0));
        // Hand calculation: 2.2 m above grade < 7.6 m, so the whole wetted area counts
        assertEquals(v.wettedArea(1.2), f.area(), 0.0);
        assertEquals(1.2, f.effectiveLevel(), 0.0);
        assertTrue(f.ruleApplied().contains("liquid level governs"), f.ruleApplied());
    }

    @Test
    void fireHeightCutsATallVerticalVessel() {
        Vessel v = Vessel.vertical(2.0, 12.0, Head.flat(), Head.flat());
        FireExposedArea f = v.fireExposedArea(10.0, new FireExposure(1.6, 7.6, false));
        // Hand calculation: effective level 7.6 - 1.6 = 6 m; bottom disc pi + shell 2 pi 1 6 = 13 pi
        assertEquals(6.0, f.effectiveLevel(), 0.0);
        assertEquals(13 * Math.PI, f.area(), 1e-12);
        assertTrue(f.ruleApplied().contains("fire zone governs"), f.ruleApplied());
    }

    @Test
    void skirtedBottomHeadCanBeExcluded() {
        double d = 2.0;
        Vessel v = Vessel.vertical(d, 8.0, Head.ellipsoidal2to1(d), Head.ellipsoidal2to1(d));
        FireExposedArea with = v.fireExposedArea(5.0, FireExposure.atElevation(2.0));
        FireExposedArea without = v.fireExposedArea(5.0, FireExposure.atElevation(2.0).excludingSkirtedBottomHead());
        // Hand calculation: the difference is the whole 2:1 head area, the shell below 5 m is 2 pi (5 - 0.5)
        assertEquals(2 * Math.PI * 4.5, without.area(), 1e-12);
        assertEquals(v.wettedArea(0.5), with.area() - without.area(), 1e-12);
        assertTrue(without.ruleApplied().contains("skirt"), without.ruleApplied());
    }

    @Test
    void vesselAboveTheFireHeightHasNoFireWettedAreaAndPointsToTheGasFilledCase() {
        Vessel v = Vessel.horizontal(2.0, 6.0, Head.ellipsoidal2to1(2), Head.ellipsoidal2to1(2));
        FireExposedArea f = v.fireExposedArea(1.5, FireExposure.atElevation(8.0));
        // Hand calculation: bottom 8 m above grade > 7.6 m
        assertEquals(0.0, f.area(), 0.0);
        assertTrue(f.ruleApplied().contains("gas-filled"), f.ruleApplied());
        Vessel s = Vessel.sphere(10.0);
        assertEquals(0.0, s.fireExposedArea(6.0, FireExposure.atElevation(7.6)).area(), 0.0);
    }

    @Test
    void sphereIsWettedAtLeastToItsEquatorWhenTheFireHeightIsLower() {
        Vessel s = Vessel.sphere(12.0);
        // bottom 2 m above grade: fire zone reaches 5.6 m above the bottom, the equator is at 6 m
        FireExposedArea f = s.fireExposedArea(10.0, FireExposure.atElevation(2.0));
        // Hand calculation: h_eff = min(10, max(6, 5.6)) = 6; area = 2 pi R h = 2 pi 6 6
        assertEquals(6.0, f.effectiveLevel(), 0.0);
        assertEquals(72 * Math.PI, f.area(), 1e-12);
        assertTrue(f.ruleApplied().contains("maximum horizontal diameter"), f.ruleApplied());
        // liquid below the equator limits the area
        assertEquals(2 * Math.PI * 6 * 4.0, s.fireExposedArea(4.0, FireExposure.atElevation(2.0)).area(), 1e-12);
        // fire height above the equator governs when greater: bottom at 0.5 m -> 7.1 m
        FireExposedArea g = s.fireExposedArea(10.0, FireExposure.atElevation(0.5));
        assertEquals(7.1, g.effectiveLevel(), 1e-15);
    }
}
