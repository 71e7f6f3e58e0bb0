package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

class RelievingPressureTest {

    private static final double ATM = 101_325;

    @Test
    void singleValveAtMawpGetsTenPercent() {
        RelievingPressureResult r = RelievingPressure.compute(
                RelievingPressureInput.of(1e6, 1e6, ATM, DeviceCount.SINGLE, ScenarioKind.NON_FIRE));
        // Source: ASME VIII-1 / API 520 single device 10 % of MAWP [S] (REFERENCES.md 6).
        // Hand calculation: P1 = 1000 + 100 + 101.325 kPa.
        assertEquals(1_201_325, r.relievingPressurePa(), 1e-6);
        assertEquals(100_000, r.overpressurePa(), 1e-6);
        assertEquals(10.0, r.overpressurePercentOfSet(), 1e-12);
        assertTrue(r.ruleApplied().contains("10 %"));
    }

    @Test
    void lowMawpSingleValveGetsMinimumOf20point7kPa() {
        RelievingPressureResult r = RelievingPressure.compute(
                RelievingPressureInput.of(150e3, 150e3, ATM, DeviceCount.SINGLE, ScenarioKind.NON_FIRE));
        // Source: single device 20.7 kPa minimum [S]; 10 % of 150 kPa = 15 kPa is smaller.
        assertEquals(20_700, r.accumulationPa(), 1e-9);
    }

    @Test
    void multipleValvesGetSixteenPercentOfMawp() {
        RelievingPressureResult r = RelievingPressure.compute(
                RelievingPressureInput.of(1.05e6, 1e6, ATM, DeviceCount.MULTIPLE, ScenarioKind.NON_FIRE));
        // Source: multiple devices 16 % of MAWP, additional valve set at 105 % [S].
        // Hand calculation: P1 = 1160 + 101.325 kPa; overpressure above set = 1160 - 1050 = 110 kPa.
        assertEquals(1_261_325, r.relievingPressurePa(), 1e-6);
        assertEquals(110_000, r.overpressurePa(), 1e-6);
    }

    @Test
    void multipleValvesAtLowMawpGet27point6kPa() {
        RelievingPressureResult r = RelievingPressure.compute(
                RelievingPressureInput.of(150e3, 150e3, ATM, DeviceCount.MULTIPLE, ScenarioKind.NON_FIRE));
        // Source: multiple devices 27.6 kPa minimum [S]; 16 % of 150 kPa = 24 kPa is smaller.
        assertEquals(27_600, r.accumulationPa(), 1e-9);
    }

    @Test
    void fireGetsTwentyOnePercent() {
        RelievingPressureResult r = RelievingPressure.compute(
                RelievingPressureInput.of(1e6, 1e6, ATM, DeviceCount.SINGLE, ScenarioKind.FIRE));
        // Source: fire 21 % of MAWP [S]. Hand calculation: P1 = 1210 + 101.325 kPa.
        assertEquals(1_311_325, r.relievingPressurePa(), 1e-6);
    }

    @Test
    void setBelowMawpGetsLargerOverpressureAboveSet() {
        RelievingPressureResult r = RelievingPressure.compute(
                RelievingPressureInput.of(800e3, 1e6, ATM, DeviceCount.SINGLE, ScenarioKind.NON_FIRE));
        // Hand calculation (accumulation on MAWP): P1 = 1100 + 101.325 kPa; overpressure = 300 kPa = 37.5 % of set.
        assertEquals(1_201_325, r.relievingPressurePa(), 1e-6);
        assertEquals(300_000, r.overpressurePa(), 1e-6);
        assertEquals(37.5, r.overpressurePercentOfSet(), 1e-9);
    }

    @Test
    void supplementalFireValveMaySetAt110Percent() {
        RelievingPressureResult r = RelievingPressure.compute(new RelievingPressureInput(1.1e6, 1e6, ATM,
                DeviceCount.MULTIPLE, ScenarioKind.FIRE, true, Optional.empty()));
        // Source: supplemental fire valves up to 110 % of MAWP, 21 % accumulation [S].
        // Hand calculation: overpressure above set = 1210 - 1100 = 110 kPa.
        assertEquals(110_000, r.overpressurePa(), 1e-6);
        assertEquals(1.10, r.maxSetFractionOfMawp(), 0);
    }

    @Test
    void setAboveMawpWithoutReasonIsRefusedNamingTheField() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> RelievingPressure.compute(
                RelievingPressureInput.of(1.01e6, 1e6, ATM, DeviceCount.SINGLE, ScenarioKind.NON_FIRE)));
        assertEquals("relief.setPressure", e.field());
        assertTrue(e.getMessage().contains("100.0 %"));
        assertThrows(InvalidInputException.class, () -> RelievingPressure.compute(
                RelievingPressureInput.of(1.06e6, 1e6, ATM, DeviceCount.MULTIPLE, ScenarioKind.NON_FIRE)));
        assertThrows(InvalidInputException.class, () -> RelievingPressure.compute(new RelievingPressureInput(
                1.11e6, 1e6, ATM, DeviceCount.SINGLE, ScenarioKind.FIRE, true, Optional.empty())));
    }

    @Test
    void setAboveMawpWithReasonIsAcceptedWithWarning() {
        RelievingPressureResult r = RelievingPressure.compute(new RelievingPressureInput(1.02e6, 1e6, ATM,
                DeviceCount.SINGLE, ScenarioKind.NON_FIRE, false, Optional.of("existing valve, under review")));
        assertEquals(1, r.warnings().size());
        assertTrue(r.warnings().get(0).contains("existing valve"));
        // Hand calculation: P1 still MAWP + 10 % + atm; overpressure = 1100 - 1020 = 80 kPa.
        assertEquals(80_000, r.overpressurePa(), 1e-6);
    }

    @Test
    void supplementalFlagOutsideFireIsRefused() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new RelievingPressureInput(1e6,
                1e6, ATM, DeviceCount.SINGLE, ScenarioKind.NON_FIRE, true, Optional.empty()));
        assertEquals("relief.supplementalFireValve", e.field());
    }

    @Test
    void fireAtVeryLowMawpNeverGetsLessThanNonFire() {
        RelievingPressureResult r = RelievingPressure.compute(
                RelievingPressureInput.of(100e3, 100e3, ATM, DeviceCount.MULTIPLE, ScenarioKind.FIRE));
        // Reasoned, no source: 21 % of 100 kPa = 21 kPa < 27.6 kPa, so 27.6 kPa is used, with a warning.
        assertEquals(27_600, r.accumulationPa(), 1e-9);
        assertEquals(1, r.warnings().size());
    }

    @Test
    void rejectsNegativeOrNaNPressures() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> RelievingPressureInput.of(-1, 1e6, ATM, DeviceCount.SINGLE, ScenarioKind.FIRE));
        assertEquals("relief.setPressure", e.field());
        e = assertThrows(InvalidInputException.class,
                () -> RelievingPressureInput.of(1e6, Double.NaN, ATM, DeviceCount.SINGLE, ScenarioKind.FIRE));
        assertEquals("relief.mawp", e.field());
    }
}
