package org.ventcase.thermo.mix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.thermo.CubicModel;

class PTFlashTest {

    private final CubicModel c1to5 = MixFixtures.pr("methane", "ethane", "propane", "n-butane", "n-pentane");
    private final double[] gas = {0.5, 0.15, 0.15, 0.1, 0.1};

    @Test
    void twoPhaseSplitClosesTheMaterialBalance() {
        FlashResult r = new PTFlash(c1to5).flash(250, 3e6, gas);
        assertTrue(r.twoPhase(), r.toString());
        double beta = r.vaporFraction();
        double[] x = r.phases().get(0).composition();
        double[] y = r.phases().get(1).composition();
        for (int i = 0; i < gas.length; i++) {
            // Hand calculation: exact identity z_i = (1 - beta) x_i + beta y_i.
            assertEquals(gas[i], (1 - beta) * x[i] + beta * y[i], 1e-10);
        }
    }

    @Test
    void twoPhaseSplitHasEqualFugacities() {
        FlashResult r = new PTFlash(c1to5).flash(250, 3e6, gas);
        MixturePhase l = r.phases().get(0);
        MixturePhase v = r.phases().get(1);
        for (int i = 0; i < gas.length; i++) {
            // Exact identity at equilibrium: ln x_i + ln phi_i^L = ln y_i + ln phi_i^V.
            assertEquals(Math.log(l.composition()[i]) + l.lnPhi()[i], Math.log(v.composition()[i]) + v.lnPhi()[i], 1e-9);
        }
    }

    @Test
    void lightGasAtLowPressureIsOneStableVapour() {
        FlashResult r = new PTFlash(c1to5).flash(350, 1e5, gas);
        assertFalse(r.twoPhase());
        assertTrue(r.stability().stable());
        assertEquals(1.0, r.vaporFraction());
    }

    @Test
    void resultDoesNotDependOnComponentOrder() {
        CubicModel permuted = MixFixtures.pr("n-pentane", "propane", "methane", "n-butane", "ethane");
        double[] zp = {0.1, 0.15, 0.5, 0.1, 0.15};
        int[] map = {4, 2, 0, 3, 1}; // permuted index -> original index
        FlashResult a = new PTFlash(c1to5).flash(250, 3e6, gas);
        FlashResult b = new PTFlash(permuted).flash(250, 3e6, zp);
        // Exact invariance (up to round-off): permuting components cannot change the physics.
        assertEquals(a.vaporFraction(), b.vaporFraction(), 1e-9);
        for (int k = 0; k < map.length; k++) {
            assertEquals(a.phases().get(0).composition()[map[k]], b.phases().get(0).composition()[k], 1e-9);
        }
        assertEquals(a.enthalpyJmol(), b.enthalpyJmol(), 1e-6 * Math.abs(a.enthalpyJmol()) + 1e-6);
    }
}
