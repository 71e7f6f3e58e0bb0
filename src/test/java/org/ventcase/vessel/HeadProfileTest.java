package org.ventcase.vessel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class HeadProfileTest {

    @Test
    void ellipsoidalProfileLiesOnTheEllipseFromTangentToApex() {
        Vessel v = Vessel.horizontal(3.2, 16, Head.ellipsoidal2to1(3.2), Head.hemispherical());
        List<double[]> p = v.headProfile(true, 16);
        assertEquals(17, p.size());
        assertEquals(1.6, p.get(0)[0], 1e-12);
        assertEquals(0.0, p.get(0)[1], 1e-12);
        assertEquals(0.0, p.get(16)[0], 1e-12);
        assertEquals(0.8, p.get(16)[1], 1e-12);
        for (double[] rz : p) {
            // Definition of the 2:1 head: (r/R)^2 + (z/a)^2 = 1 with R = 1.6 m, a = D/4 = 0.8 m
            assertEquals(1.0, Math.pow(rz[0] / 1.6, 2) + Math.pow(rz[1] / 0.8, 2), 1e-12);
        }
    }

    @Test
    void torisphericalProfileEndsAtTheHeadDepthAndFlatHeadIsAPlate() {
        Vessel v = Vessel.vertical(2.0, 5, Head.asmeFlangedAndDished(2.0), Head.flat());
        List<double[]> p = v.headProfile(true, 8);
        // knuckle and crown arcs, 8 steps each, plus the tangent point
        assertEquals(17, p.size());
        assertEquals(v.firstHeadDepth(), p.get(p.size() - 1)[1], 1e-12);
        assertEquals(0.0, p.get(p.size() - 1)[0], 1e-12);
        for (int i = 1; i < p.size(); i++) {
            assertTrue(p.get(i)[0] <= p.get(i - 1)[0] + 1e-15, "r decreases towards the axis");
            assertTrue(p.get(i)[1] >= p.get(i - 1)[1] - 1e-15, "z increases towards the apex");
        }
        List<double[]> flat = v.headProfile(false, 8);
        assertEquals(2, flat.size());
        assertEquals(0.0, flat.get(1)[1], 0.0);
    }

    @Test
    void sphereHasNoHeads() {
        assertTrue(Vessel.sphere(10).headProfile(true, 4).isEmpty());
    }
}
