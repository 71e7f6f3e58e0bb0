package org.ventcase.vessel;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Checks against textbook closed forms and published tables. */
class ClosedFormTest {
    /** Closed forms evaluated in double precision: a few ulps of round-off. */
    static final double TIGHT = 1e-12;

    @Test
    void sphereVolumeAndAreaMatchMensurationFormulas() {
        Vessel s = Vessel.sphere(3.0);
        // Source: sphere volume pi D^3 / 6 and area pi D^2 (any mensuration table)
        assertEquals(Math.PI * 27.0 / 6.0, s.totalVolume(), TIGHT * 14.2);
        assertEquals(Math.PI * 9.0, s.totalInsideArea(), TIGHT * 28.3);
        // Source: spherical cap V = pi h^2 (3R - h) / 3, zone area 2 pi R h (Archimedes)
        assertEquals(Math.PI * 0.25 * (4.5 - 0.5) / 3.0, s.liquidVolume(0.5), TIGHT);
        assertEquals(2 * Math.PI * 1.5 * 0.5, s.wettedArea(0.5), TIGHT);
        // Hand calculation: half full = half of everything
        assertEquals(s.totalVolume() / 2, s.liquidVolume(1.5), TIGHT * 14.2);
        assertEquals(s.totalInsideArea() / 2, s.wettedArea(1.5), TIGHT * 28.3);
    }

    @Test
    void emptyAndFullVesselsHaveZeroAndTotalVolumeAndArea() {
        for (Vessel v : PropertyTest.vessels()) {
            // Hand calculation: definitions
            assertEquals(0.0, v.liquidVolume(0.0), 0.0, v.describe());
            assertEquals(0.0, v.wettedArea(0.0), 0.0, v.describe());
            assertEquals(v.totalVolume(), v.liquidVolume(v.totalHeight()), 0.0, v.describe());
            assertEquals(v.totalInsideArea(), v.wettedArea(v.totalHeight()), 0.0, v.describe());
        }
    }

    @Test
    void halfFullSymmetricHorizontalVesselHoldsHalfItsVolumeAndWetsHalfItsArea() {
        for (Head h : new Head[] {Head.flat(), Head.hemispherical(), Head.ellipsoidal(0.4),
                Head.asmeFlangedAndDished(2.0), Head.torispherical80_10(2.0), Head.conical(35)}) {
            Vessel v = Vessel.horizontal(2.0, 5.0, h, h);
            // Hand calculation: reflection symmetry about the horizontal axis
            assertEquals(v.totalVolume() / 2, v.liquidVolume(1.0), 1e-11 * v.totalVolume(), h.describe());
            assertEquals(v.totalInsideArea() / 2, v.wettedArea(1.0), 1e-11 * v.totalInsideArea(), h.describe());
        }
    }

    @Test
    void cylinderWithTwoHemispheresIsSpherePlusCylinder() {
        double d = 2.2;
        double l = 4.0;
        double r = d / 2;
        Vessel horizontal = Vessel.horizontal(d, l, Head.hemispherical(), Head.hemispherical());
        Vessel vertical = Vessel.vertical(d, l, Head.hemispherical(), Head.hemispherical());
        Vessel sphere = Vessel.sphere(d);
        // Hand calculation: V = pi D^3/6 + pi R^2 L ; S = pi D^2 + pi D L
        double vol = Math.PI * d * d * d / 6 + Math.PI * r * r * l;
        double area = Math.PI * d * d + Math.PI * d * l;
        for (Vessel v : new Vessel[] {horizontal, vertical}) {
            assertEquals(vol, v.totalVolume(), TIGHT * vol);
            assertEquals(area, v.totalInsideArea(), TIGHT * area);
        }
        assertEquals(d + l, vertical.totalHeight(), 1e-15);
        for (double h = 0.05; h < d; h += 0.15) {
            // Hand calculation: horizontal = sphere cut at h + cylinder segment L A_seg(R, h)
            double alpha = Math.acos((r - h) / r);
            double seg = r * r * alpha - (r - h) * Math.sqrt(2 * r * h - h * h);
            assertEquals(sphere.liquidVolume(h) + l * seg, horizontal.liquidVolume(h), TIGHT * vol);
            assertEquals(sphere.wettedArea(h) + 2 * r * alpha * l, horizontal.wettedArea(h), TIGHT * area);
        }
        // Hand calculation: vertical, level in the bottom hemisphere = spherical cap; above it adds the shell
        assertEquals(sphere.liquidVolume(0.7), vertical.liquidVolume(0.7), TIGHT * vol);
        assertEquals(sphere.totalVolume() / 2 + Math.PI * r * r * 2.5, vertical.liquidVolume(r + 2.5), TIGHT * vol);
        assertEquals(sphere.totalInsideArea() / 2 + Math.PI * d * 2.5, vertical.wettedArea(r + 2.5), TIGHT * area);
    }

    @Test
    void twoToOneEllipsoidalHeadVolumeIsPiDCubedOver24() {
        double d = 1.8;
        Vessel v = Vessel.vertical(d, 1.0, Head.ellipsoidal2to1(d), Head.flat());
        double head = v.totalVolume() - Math.PI * d * d / 4 * 1.0;
        // Source: 2:1 ellipsoidal head volume pi D^3 / 24 (half a spheroid 4/3 pi R^2 (D/4) / 2; common practice, from memory)
        assertEquals(Math.PI * d * d * d / 24, head, TIGHT * head);
        assertEquals(d / 4, v.firstHeadDepth(), 0.0);
    }

    @Test
    void asmeFlangedAndDishedHeadHasPublishedDepthAndVolumeFactors() {
        double d = 1.0;
        Vessel v = Vessel.vertical(d, 1.0, Head.asmeFlangedAndDished(d), Head.flat());
        // Source: F&D head depth about 0.1693 D and volume about 0.0809 D^3 (vessel handbook tables,
        // from memory; such tables truncate to three or four figures, hence the tolerances of 1 and 2 in the last figure)
        assertEquals(0.1693, v.firstHeadDepth(), 1e-4);
        assertEquals(0.0809, v.totalVolume() - Math.PI / 4, 2e-4);
    }

    @Test
    void ellipsoidalHeadOfDepthHalfDiameterEqualsHemisphere() {
        Vessel e = Vessel.horizontal(2.0, 3.0, Head.ellipsoidal(1.0), Head.ellipsoidal(1.0));
        Vessel s = Vessel.horizontal(2.0, 3.0, Head.hemispherical(), Head.hemispherical());
        for (double h : new double[] {0.01, 0.3, 1.0, 1.7}) {
            // Hand calculation: an ellipsoid with equal semi-axes is a sphere
            assertEquals(s.liquidVolume(h), e.liquidVolume(h), 1e-12 * s.totalVolume());
            assertEquals(s.wettedArea(h), e.wettedArea(h), 1e-11 * s.totalInsideArea());
        }
    }

    @Test
    void verticalConeIsAClosedFormCone() {
        // cone of half-angle 30 deg on D = 2: depth a = 1/tan(30 deg) = sqrt(3)
        Vessel v = Vessel.vertical(2.0, 1.0, Head.conical(30), Head.flat());
        double a = Math.sqrt(3.0);
        assertEquals(a, v.firstHeadDepth(), 1e-15);
        double h = 0.6;
        double r = h * Math.tan(Math.toRadians(30));
        // Source: cone volume pi r^2 h / 3 and lateral area pi r s, s = h / cos(alpha) (mensuration)
        assertEquals(Math.PI * r * r * h / 3, v.liquidVolume(h), TIGHT);
        assertEquals(Math.PI * r * h / Math.cos(Math.toRadians(30)), v.wettedArea(h), TIGHT);
    }

    /**
     * Fraction of a horizontal cylinder's volume filled at h/D.
     * Source (from memory): the standard table of partially filled horizontal cylinders (as in
     * Perry's Chemical Engineers' Handbook, mensuration section), five decimals for h/D = 0.1 to
     * 0.5; each value re-checked by hand with the segment formula (alpha - sin(alpha) cos(alpha)) / pi,
     * alpha = acos(1 - 2 h/D). The remaining rows are hand calculations with that formula, which
     * is itself the standard result.
     */
    @ParameterizedTest(name = "h/D = {0}")
    @CsvSource({
        "0.05, 0.018693",   // Hand calculation: segment formula
        "0.10, 0.052044",   // Source: standard segment table (from memory), 0.05204
        "0.15, 0.094060",   // Hand calculation: segment formula
        "0.20, 0.142378",   // Source: standard segment table (from memory), 0.14238
        "0.25, 0.195501",   // Hand calculation: alpha = pi/3, (pi/3 - sqrt(3)/4) / pi
        "0.30, 0.252316",   // Source: standard segment table (from memory), 0.25232
        "0.40, 0.373530",   // Source: standard segment table (from memory), 0.37353
        "0.45, 0.436444",   // Hand calculation: segment formula
        "0.50, 0.500000",   // Hand calculation: symmetry
        "0.80, 0.857622",   // Hand calculation: 1 - f(0.20)
    })
    void horizontalFlatEndedCylinderFollowsTheSegmentTable(double hOverD, double fraction) {
        Vessel v = Vessel.horizontal(1.6, 7.0, Head.flat(), Head.flat());
        // tolerance: the values are rounded to six decimals
        assertEquals(fraction, v.liquidVolume(hOverD * 1.6) / v.totalVolume(), 5.0001e-7);
    }
}
