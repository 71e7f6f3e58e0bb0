package org.ventcase.thermo.mix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.common.NoSolutionException;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.PureSaturation;

class SaturationPointsTest {

    private final CubicModel c3c4 = MixFixtures.pr("propane", "n-butane");
    private final double[] half = {0.5, 0.5};

    @Test
    void propaneButaneBubblePressureMatchesRaoultWithMeasuredVapourPressures() {
        // Source (from memory): NIST Chemistry WebBook / Lemmon et al. reference equations,
        // vapour pressures at 300 K: propane 0.9979 MPa, n-butane 0.2580 MPa. Propane + n-butane is
        // close to an ideal solution at this T (k_ij ~ 0), so Raoult's law for x = 0.5 gives the
        // bubble pressure to about 2 %; tolerance 5 % covers that and PR78's own vapour-pressure error.
        double expected = 0.5 * 0.9979e6 + 0.5 * 0.2580e6;
        SaturationPoint b = new SaturationPoints(c3c4).bubblePressure(300, half);
        assertEquals(expected, b.pressurePa(), 0.05 * expected);
    }

    @Test
    void bubbleTemperatureInvertsBubblePressure() {
        SaturationPoints sp = new SaturationPoints(c3c4);
        SaturationPoint bp = sp.bubblePressure(310, half);
        SaturationPoint bt = sp.bubbleTemperature(bp.pressurePa(), half);
        // Exact identity: the same point reached from the other side; tolerance from the 1e-10 criterion.
        assertEquals(310, bt.temperatureK(), 1e-6);
    }

    @Test
    void dewTemperatureInvertsDewPressure() {
        SaturationPoints sp = new SaturationPoints(c3c4);
        SaturationPoint dp = sp.dewPressure(310, half);
        SaturationPoint dt = sp.dewTemperature(dp.pressurePa(), half);
        assertEquals(310, dt.temperatureK(), 1e-6);
    }

    @Test
    void flashJustBelowTheBubblePressureGivesVanishingVapourWithTheSameKValues() {
        SaturationPoint b = new SaturationPoints(c3c4).bubblePressure(300, half);
        FlashResult f = new PTFlash(c3c4).flash(300, b.pressurePa() * (1 - 1e-6), half);
        assertTrue(f.twoPhase());
        // Common practice, no source: dP/P = 1e-6 below the bubble point moves beta by O(1e-5).
        assertEquals(0.0, f.vaporFraction(), 1e-4);
        double[] k = f.kValues();
        for (int i = 0; i < 2; i++) {
            assertEquals(b.kValues()[i], k[i], 1e-4 * b.kValues()[i]);
        }
    }

    @Test
    void flashJustAboveTheDewPressureGivesVanishingLiquid() {
        SaturationPoint d = new SaturationPoints(c3c4).dewPressure(300, half);
        FlashResult f = new PTFlash(c3c4).flash(300, d.pressurePa() * (1 + 1e-6), half);
        assertTrue(f.twoPhase());
        assertEquals(1.0, f.vaporFraction(), 1e-4);
    }

    @Test
    void stabilityIsUnstableBetweenDewAndBubbleAndStableOutside() {
        SaturationPoints sp = new SaturationPoints(c3c4);
        double pb = sp.bubblePressure(300, half).pressurePa();
        double pd = sp.dewPressure(300, half).pressurePa();
        StabilityAnalysis st = new StabilityAnalysis(c3c4);
        assertFalse(st.test(300, 0.5 * (pb + pd), half).stable());
        assertTrue(st.test(300, 1.05 * pb, half).stable());
        assertTrue(st.test(300, 0.95 * pd, half).stable());
        StabilityResult inside = st.test(300, 0.5 * (pb + pd), half);
        assertTrue(inside.minimumTpd() < 0);
    }

    @Test
    void nearlyPureFeedBubblePressureApproachesPureSaturation() {
        double[] z = {1 - 1e-7, 1e-7};
        double pMix = new SaturationPoints(c3c4).bubblePressure(300, z).pressurePa();
        double pPure = new PureSaturation(CubicModel.pure(EosVariant.PR78, c3c4.components().get(0))).pressure(300);
        // Exact limit: as x_2 -> 0 the bubble pressure tends to the pure Psat, with slope of order
        // (K_2 - 1) Psat; 1e-7 impurity moves it by less than 1e-6 relative.
        assertEquals(pPure, pMix, 1e-6 * pPure);
    }

    @Test
    void noBubblePointAboveTheCricondenthermIsReportedAsNoSolution() {
        CubicModel c1c2 = MixFixtures.pr("methane", "ethane");
        // Both components are supercritical at 320 K (Tc 190.6 K and 305.3 K): no saturation point.
        NoSolutionException e = assertThrows(NoSolutionException.class,
                () -> new SaturationPoints(c1c2).bubblePressure(320, half));
        assertTrue(e.getMessage().contains("bubble"), e.getMessage());
    }
}
