package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.units.CustomaryUnits;

class UnwettedVesselFireTest {

    private static final UnwettedVesselFireInput AIR = UnwettedVesselFireInput.carbonSteel(50, 28.97, 700e3, 500e3,
            300);

    @Test
    void reliefRateMatchesHandCalculation() {
        UnwettedVesselFireResult r = UnwettedVesselFire.reliefRate(AIR);
        // Hand calculation: T1 = 700/500 x 300 = 420 K; W = 0.2772 sqrt(28.97 x 700) x 50 x (866.15 - 420)^1.25
        // / 420^1.1506 = 3879.96 kg/h.
        assertEquals(420.0, r.relievingTemperatureK(), 1e-12);
        assertEquals(3879.96, r.massFlowKgPerH(), 0.01);
        assertTrue(r.warnings().contains(UnwettedVesselFire.RUPTURE_CAUTION));
    }

    @Test
    void siAndUsFormsAgreeAfterConversion() {
        UnwettedVesselFireResult si = UnwettedVesselFire.reliefRate(AIR);
        double us = UnwettedVesselFire.reliefRateUsLbPerH(28.97, 700e3 / CustomaryUnits.PA_PER_PSI,
                50 / CustomaryUnits.M2_PER_FT2, CustomaryUnits.kToRankine(UnwettedVesselFire.CARBON_STEEL_WALL_K),
                CustomaryUnits.kToRankine(420));
        // Hand calculation: 0.1406 converts exactly to 0.27716 (SI constant 0.2772): 0.013 % apart.
        assertEquals(1.0, us * CustomaryUnits.KG_PER_LB / si.massFlowKgPerH(), 5e-4);
    }

    @Test
    void defaultWallTemperatureIs593C() {
        // Source: API 521 carbon steel wall temperature 593 C (1100 F) [S, weak] (REFERENCES.md 2).
        assertEquals(866.15, UnwettedVesselFire.CARBON_STEEL_WALL_K, 1e-12);
    }

    @Test
    void wallNotHotterThanGasIsRefused() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> UnwettedVesselFire.reliefRate(
                new UnwettedVesselFireInput(50, 28.97, 700e3, 100e3, 300, 900)));
        // Hand calculation: T1 = 7 x 300 = 2100 K > Tw = 900 K.
        assertEquals("fire.wallTemperature", e.field());
    }

    @Test
    void normalPressureAboveRelievingPressureIsRefused() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> UnwettedVesselFireInput.carbonSteel(50, 28.97, 700e3, 800e3, 300));
        assertEquals("process.normalPressure", e.field());
    }
}
