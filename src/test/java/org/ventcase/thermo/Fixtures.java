package org.ventcase.thermo;

import java.util.List;
import java.util.Random;

/**
 * Components for invariant and property tests. Invariants hold for any valid constants, so these
 * need not be real fluids; {@link #propaneLike()} carries propane-like numbers only so that the
 * states tested are realistic. Data-driven checks use the built-in library instead.
 */
final class Fixtures {
    private Fixtures() {
    }

    static final IdealGasCp CP = new IdealGasCp(new double[] {3.8, 5.1e-3, 6.0e-5, -7.9e-8, 3.1e-11}, 50, 1000,
            "test fixture (propane-like shape), not data");

    static Component propaneLike() {
        return new Component("fixture-a", "C3H8", "", List.of(), 369.8, 4.25e6, 0.152, 44.1, 231.0,
                "test fixture, not data", CP, 0.2766, "test fixture, not data");
    }

    /** A random but valid component, for property tests. */
    static Component random(Random rnd) {
        double tc = 100 + rnd.nextDouble() * 600;
        double pc = (1 + rnd.nextDouble() * 10) * 1e6;
        double omega = -0.2 + rnd.nextDouble() * 1.2;
        double zra = 0.22 + rnd.nextDouble() * 0.07;
        return new Component("random", "", "", List.of(), tc, pc, omega, 10 + rnd.nextDouble() * 200, tc * 0.6,
                "random test fixture", CP, zra, "random test fixture");
    }
}
