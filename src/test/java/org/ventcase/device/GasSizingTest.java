package org.ventcase.device;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.units.CustomaryUnits;

class GasSizingTest {

    private static final double W = 24_270.0 / 3600.0;
    private static final double ATM = 101_325.0;

    private static GasSizingInput example(double p2Pa) {
        return GasSizingInput.of(W, 670e3, p2Pa, 348.0, 0.90, 51.0, 1.11);
    }

    @Test
    void criticalExampleMatchesPublishedArea() {
        GasSizingResult r = GasSizing.size(example(ATM));
        assertEquals(FlowRegime.CRITICAL, r.regime());
        // Source: API Std 520 Part I critical vapour example, A = 3699 mm2 [S] (REFERENCES.md 10).
        // Tolerance: the published value is rounded to 1 mm2.
        assertEquals(3699.0, r.areaMm2(), 0.5);
        // Source: same example, C = 0.02489 [S]; published to 4 significant figures.
        assertEquals(0.02489, r.coefficientC(), 5e-6);
        assertTrue(r.f2().isEmpty());
        assertFalse(r.trace().isEmpty());
    }

    @Test
    void criticalExampleSelectsOrificeP() {
        GasSizingResult r = GasSizing.size(example(ATM));
        OrificeSelection s = OrificeTable.select(r.areaM2(), W);
        // Source: API Std 520 Part I critical vapour example, next standard orifice P [S].
        assertEquals("P", s.designation());
    }

    @Test
    void subcriticalExampleMatchesPublishedArea() {
        GasSizingResult r = GasSizing.size(example(532e3));
        assertEquals(FlowRegime.SUBCRITICAL, r.regime());
        // Source: API Std 520 Part I subcritical variant, A = 4248 mm2 [S]; rounded to 1 mm2.
        assertEquals(4248.0, r.areaMm2(), 0.5);
        // Source: REFERENCES.md section 10, F2 = 0.8548 [D]; 4 significant figures.
        assertEquals(0.8548, r.f2().getAsDouble(), 5e-5);
    }

    @Test
    void criticalPressureRatioMatchesHandCalculation() {
        // Hand calculation: (2/2.11)^(1.11/0.11) = 0.582588
        assertEquals(0.582588, GasSizing.criticalPressureRatio(1.11), 1e-6);
        // Hand calculation: k = 1.4 gives 0.528282 (the textbook air value)
        assertEquals(0.528282, GasSizing.criticalPressureRatio(1.4), 1e-6);
    }

    @Test
    void regimeSwitchesAtCriticalPressure() {
        double rc = GasSizing.criticalPressureRatio(1.11);
        assertEquals(FlowRegime.CRITICAL, GasSizing.size(example(670e3 * rc * (1 - 1e-9))).regime());
        assertEquals(FlowRegime.SUBCRITICAL, GasSizing.size(example(670e3 * rc * (1 + 1e-6))).regime());
        // Hand calculation: at r = rc the two equations agree to within the rounding of their
        // published constants (17.9 vs 0.03948), about 0.2 %.
        double crit = GasSizing.size(example(670e3 * rc * (1 - 1e-9))).areaMm2();
        double sub = GasSizing.size(example(670e3 * rc * (1 + 1e-6))).areaMm2();
        assertEquals(1.0, sub / crit, 0.003);
    }

    @Test
    void siAndUsCriticalFormsAgreeAfterConversion() {
        GasSizingResult si = GasSizing.size(example(ATM));
        double aUs = GasSizing.criticalAreaUsIn2(24_270 / CustomaryUnits.KG_PER_LB, 670e3 / CustomaryUnits.PA_PER_PSI,
                CustomaryUnits.kToRankine(348.0), 0.90, 51.0, 1.11, 0.975, 1, 1);
        // Hand calculation: exact conversion of 520 gives 0.039522, the standard prints 0.03948,
        // so the forms differ by about 0.1 %.
        assertEquals(1.0, aUs * CustomaryUnits.MM2_PER_IN2 / si.areaMm2(), 0.002);
    }

    @Test
    void siAndUsSubcriticalFormsAgreeAfterConversion() {
        GasSizingResult si = GasSizing.size(example(532e3));
        double aUs = GasSizing.subcriticalAreaUsIn2(24_270 / CustomaryUnits.KG_PER_LB,
                670e3 / CustomaryUnits.PA_PER_PSI, 532e3 / CustomaryUnits.PA_PER_PSI,
                CustomaryUnits.kToRankine(348.0), 0.90, 51.0, 1.11, 0.975, 1);
        // Hand calculation: 735 converts to 17.901; the forms agree to about 0.01 %.
        assertEquals(1.0, aUs * CustomaryUnits.MM2_PER_IN2 / si.areaMm2(), 5e-4);
    }

    @Test
    void unknownKUsesSmallestC() {
        GasSizingInput in = new GasSizingInput(W, 670e3, ATM, 348, 0.9, 51, OptionalDouble.empty(), 0.975, 1, 1);
        GasSizingResult r = GasSizing.size(in);
        // Source: API Std 520 Part I, C = 0.0239 when k is unknown [S] (REFERENCES.md 3).
        assertEquals(0.0239, r.coefficientC(), 0);
        assertTrue(r.areaMm2() > GasSizing.size(example(ATM)).areaMm2());
        assertFalse(r.warnings().isEmpty());
    }

    @Test
    void unknownKWithHighBackPressureAsksForK() {
        GasSizingInput in = new GasSizingInput(W, 670e3, 400e3, 348, 0.9, 51, OptionalDouble.empty(), 0.975, 1, 1);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> GasSizing.size(in));
        assertEquals("device.k", e.field());
    }

    @Test
    void kOneUsesContinuousLimit() {
        // Hand calculation: C(k -> 1) = 0.03948 e^-0.5 = 0.023946
        assertEquals(0.03948 * Math.exp(-0.5), GasSizing.coefficientC(1.0), 1e-15);
        assertEquals(GasSizing.coefficientC(1.0), GasSizing.coefficientC(1.0001), 1e-6);
        assertEquals(GasSizing.f2(1.0, 0.8), GasSizing.f2(1.0001, 0.8), 1e-4);
    }

    @Test
    void balancedBellowsInSubcriticalFlowUsesCriticalEquationWithKb() {
        GasSizingInput in = new GasSizingInput(W, 670e3, 532e3, 348, 0.9, 51, OptionalDouble.of(1.11), 0.975, 0.8, 1);
        GasSizingResult r = GasSizing.size(in);
        // Hand calculation: critical area / Kb = 3699.05 / 0.8
        assertEquals(GasSizing.size(example(ATM)).areaMm2() / 0.8, r.areaMm2(), 1e-9);
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("[M]")));
    }

    @Test
    void rejectsNegativeFlowNamingTheField() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> GasSizingInput.of(-1, 670e3, ATM, 348, 0.9, 51, 1.11));
        assertEquals("device.massFlow", e.field());
    }

    @Test
    void rejectsKdOutsideZeroToOne() {
        for (double kd : new double[] {0.0, 1.2, -0.5, Double.NaN}) {
            InvalidInputException e = assertThrows(InvalidInputException.class,
                    () -> new GasSizingInput(W, 670e3, ATM, 348, 0.9, 51, OptionalDouble.of(1.11), kd, 1, 1));
            assertEquals("device.kd", e.field());
        }
    }

    @Test
    void rejectsBackPressureAtOrAboveRelievingPressure() {
        for (double p2 : new double[] {670e3, 700e3, Double.NaN}) {
            InvalidInputException e = assertThrows(InvalidInputException.class,
                    () -> GasSizingInput.of(W, 670e3, p2, 348, 0.9, 51, 1.11));
            assertEquals("device.backPressure", e.field());
        }
    }
}
