package org.ventcase.thermo.mix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.thermo.CubicModel;

class StateFlashTest {

    private final CubicModel c1to5 = MixFixtures.pr("methane", "ethane", "propane", "n-butane", "n-pentane");
    private final double[] gas = {0.5, 0.15, 0.15, 0.1, 0.1};

    @Test
    void phFlashInvertsPtFlashInTheTwoPhaseRegion() {
        FlashResult pt = new PTFlash(c1to5).flash(250, 3e6, gas);
        assertTrue(pt.twoPhase());
        FlashResult ph = new StateFlash(c1to5).ph(3e6, pt.enthalpyJmol(), gas, 300);
        // Exact inverse; tolerance from the 1e-9 relative residual on H and dH/dT ~ Cp.
        assertEquals(250, ph.temperatureK(), 1e-5);
        assertEquals(pt.vaporFraction(), ph.vaporFraction(), 1e-6);
    }

    @Test
    void phFlashInvertsPtFlashForASinglePhase() {
        FlashResult pt = new PTFlash(c1to5).flash(400, 2e6, gas);
        FlashResult ph = new StateFlash(c1to5).ph(2e6, pt.enthalpyJmol(), gas, 250);
        assertEquals(400, ph.temperatureK(), 1e-5);
    }

    @Test
    void psFlashInvertsPtFlash() {
        FlashResult pt = new PTFlash(c1to5).flash(240, 2e6, gas);
        FlashResult ps = new StateFlash(c1to5).ps(2e6, pt.entropyJmolK(), gas, 320);
        assertEquals(240, ps.temperatureK(), 1e-5);
    }

    @Test
    void phFlashOfAPureComponentInsideItsLatentHeatIsTwoPhaseAtTsat() {
        CubicModel c3c4 = MixFixtures.pr("propane", "n-butane");
        double[] z = {1, 0};
        FlashResult liq = new PTFlash(c3c4).flash(250, 1e6, z);
        FlashResult vap = new PTFlash(c3c4).flash(320, 1e6, z);
        double h = 0.5 * (liq.enthalpyJmol() + vap.enthalpyJmol());
        FlashResult r = new StateFlash(c3c4).ph(1e6, h, z, 300);
        assertTrue(r.twoPhase(), r.toString());
        // Exact: the lever rule recovers H.
        assertEquals(h, r.enthalpyJmol(), 1e-9 * Math.abs(h));
    }

    /**
     * Issue 18 item 5: a liquid flashing through a valve (ammonia to 1.4 bar abs) used to carry the
     * Rackett cross-check of the cubic-basis liquid density of the internal saturation, which the
     * flash does not use (only Tsat and the split). Invariant, no external values: the liquid's
     * cubic density at -27 C is about 12 % below Rackett (PureSaturation gives both), so the
     * warning was there before the fix.
     */
    @Test
    void aPureComponentFlashDoesNotCarryTheDensityCheckItDoesNotUse() {
        CubicModel nh3 = MixFixtures.pr("ammonia", "propane");
        double[] z = {1, 0};
        FlashResult liq = new PTFlash(nh3).flash(288.15, 2.0e6, z);
        FlashResult r = new StateFlash(nh3).ph(1.4132e5, liq.enthalpyJmol(), z, 250);
        assertTrue(r.twoPhase(), r.toString());
        assertTrue(r.warnings().stream().noneMatch(w -> w.contains("Rackett")), r.warnings().toString());
    }

    @Test
    void idealGasEnthalpyIsZeroAtTheReferenceState() {
        // Definition of the reference state: ideal gas at 298.15 K and 101325 Pa has H = 0, S = 0
        // per component; the mixture's ideal-gas entropy is then -R sum x ln x.
        double[] x = {0.25, 0.75};
        CubicModel m = MixFixtures.pr("methane", "ethane");
        assertEquals(0.0, MixtureThermo.idealGasEnthalpy(m, 298.15, x), 1e-9);
        double sMix = -8.314462618 * (0.25 * Math.log(0.25) + 0.75 * Math.log(0.75));
        assertEquals(sMix, MixtureThermo.idealGasEntropy(m, 298.15, 101325, x), 1e-9);
    }
}
