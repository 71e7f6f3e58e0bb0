package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

/** The drift-flux swell relations checked by derivation (sources named in LevelSwell, from memory). */
class LevelSwellTest {

    @Test
    void noVapourFlowNoSwell() {
        for (LevelSwell.Regime r : LevelSwell.Regime.values()) {
            assertEquals(0.0, LevelSwell.voidFraction(r, 0.0), 0.0);
        }
        assertEquals(12.0, LevelSwell.swelledVolume(12.0, 0.0), 0.0);
    }

    @Test
    void churnTurbulentClosedFormAndItsLimit() {
        // psi = 2 a / (1 - 1.5 a) inverted: a = psi / (2 + 1.5 psi) (derivation); large psi -> 1/1.5
        double a = LevelSwell.voidFraction(LevelSwell.Regime.CHURN_TURBULENT, 0.8);
        assertEquals(0.8, 2 * a / (1 - 1.5 * a), 1e-12);
        assertEquals(1 / 1.5, LevelSwell.voidFraction(LevelSwell.Regime.CHURN_TURBULENT, 1e9), 1e-6);
    }

    @Test
    void bubblyRootSatisfiesItsRelationAndSwellsMoreAtLowFlow() {
        for (double psi : new double[] {0.01, 0.1, 0.5, 2, 10}) {
            double a = LevelSwell.voidFraction(LevelSwell.Regime.BUBBLY, psi);
            double back = a * (1 - a) * (1 - a) / ((1 - a * a * a) * (1 - 1.2 * a));
            assertEquals(psi, back, 1e-9 * psi, "psi " + psi);
            assertTrue(a > 0 && a < 1 / 1.2);
        }
        // at small psi the bubbly relation is psi ~ a, the churn-turbulent psi ~ 2 a: bubbly swells about twice
        double bubbly = LevelSwell.voidFraction(LevelSwell.Regime.BUBBLY, 0.01);
        double churn = LevelSwell.voidFraction(LevelSwell.Regime.CHURN_TURBULENT, 0.01);
        assertEquals(2.0, bubbly / churn, 0.05);
    }

    @Test
    void bubbleRiseScalesAsTheQuarterPower() {
        // U_inf ~ (sigma g (rhoL - rhoV) / rhoL^2)^(1/4): 16 times sigma doubles it (derivation)
        double u1 = LevelSwell.bubbleRise(LevelSwell.Regime.CHURN_TURBULENT, 0.005, 500, 20);
        double u16 = LevelSwell.bubbleRise(LevelSwell.Regime.CHURN_TURBULENT, 0.08, 500, 20);
        assertEquals(2.0, u16 / u1, 1e-12);
        assertThrows(InvalidInputException.class, () -> LevelSwell.bubbleRise(LevelSwell.Regime.BUBBLY, 0.01, 10, 20));
        assertThrows(InvalidInputException.class, () -> LevelSwell.swelledVolume(1, 1.0));
    }
}
