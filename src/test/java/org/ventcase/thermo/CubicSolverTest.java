package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;

class CubicSolverTest {

    @Test
    void findsThreeKnownRoots() {
        // Hand calculation: (Z - 0.05)(Z - 0.3)(Z - 0.9) = Z^3 - 1.25 Z^2 + 0.33 Z - 0.0135
        CubicRoots r = CubicSolver.solve(-1.25, 0.33, -0.0135, 0.01);
        assertEquals(RootCase.THREE_DISTINCT, r.rootCase());
        assertArrayEquals(new double[] {0.05, 0.3, 0.9}, r.physical(), 1e-14);
    }

    @Test
    void findsOneRealRoot() {
        // Hand calculation: (Z - 0.8)(Z^2 + 0.1 Z + 0.2) = Z^3 - 0.7 Z^2 + 0.12 Z - 0.16
        CubicRoots r = CubicSolver.solve(-0.7, 0.12, -0.16, 0.01);
        assertEquals(RootCase.ONE_REAL, r.rootCase());
        assertArrayEquals(new double[] {0.8}, r.physical(), 1e-14);
    }

    @Test
    void detectsDoubleRoot() {
        // Hand calculation: (Z - 0.2)^2 (Z - 0.7) = Z^3 - 1.1 Z^2 + 0.32 Z - 0.028
        CubicRoots r = CubicSolver.solve(-1.1, 0.32, -0.028, 0.01);
        assertEquals(RootCase.DOUBLE, r.rootCase());
        assertEquals(0.7, r.largest(), 1e-12);
        assertEquals(0.2, r.smallest(), 1e-7);
    }

    @Test
    void separatesRootsBelowTheCoVolume() {
        // Hand calculation: (Z + 0.1)(Z - 0.02)(Z - 0.6) has roots -0.1, 0.02, 0.6; with B = 0.05
        // only 0.6 is physical.
        double c2 = -(-0.1 + 0.02 + 0.6);
        double c1 = -0.1 * 0.02 + -0.1 * 0.6 + 0.02 * 0.6;
        double c0 = -(-0.1 * 0.02 * 0.6);
        CubicRoots r = CubicSolver.solve(c2, c1, c0, 0.05);
        assertArrayEquals(new double[] {0.6}, r.physical(), 1e-13);
        assertArrayEquals(new double[] {-0.1, 0.02}, r.rejected(), 1e-13);
    }

    @Test
    void everyRootSatisfiesItsCubic() {
        Random rnd = new Random(42);
        double[] out = new double[3];
        for (int k = 0; k < 100_000; k++) {
            double z1 = rnd.nextDouble() * 2;
            double z2 = rnd.nextDouble() * 2;
            double z3 = rnd.nextDouble() * 2 - 0.5;
            double c2 = -(z1 + z2 + z3);
            double c1 = z1 * z2 + z1 * z3 + z2 * z3;
            double c0 = -z1 * z2 * z3;
            int n = CubicSolver.realRoots(c2, c1, c0, out);
            assertTrue(n == 3 || n == 1);
            double scale = 1 + Math.abs(c2) + Math.abs(c1) + Math.abs(c0);
            for (int i = 0; i < n; i++) {
                double z = out[i];
                double f = ((z + c2) * z + c1) * z + c0;
                assertTrue(Math.abs(f) < 1e-12 * scale, "residual " + f + " at root " + z);
            }
        }
    }
}
