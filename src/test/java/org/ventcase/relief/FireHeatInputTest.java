package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.units.CustomaryUnits;

class FireHeatInputTest {

    @Test
    void siFormMatchesHandCalculation() {
        // Hand calculation: 43,200 x 100^0.82 = 1,885,748 W; 70,900 x 100^0.82 = 3,094,897 W.
        assertEquals(1_885_748.4, FireHeatInput.wettedVessel(100, 1.0,
                FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING).heatW(), 0.1);
        assertEquals(3_094_897.3, FireHeatInput.wettedVessel(100, 1.0, FireFighting.INADEQUATE).heatW(), 0.1);
        assertEquals(0.3 * 1_885_748.4, FireHeatInput.wettedVessel(100, 0.3,
                FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING).heatW(), 0.1);
    }

    @Test
    void siAndUsFormsAgreeWithinTheirRounding() {
        for (FireFighting ff : FireFighting.values()) {
            for (double aM2 : new double[] {1, 20, 150, 900}) {
                double si = FireHeatInput.wettedVessel(aM2, 1.0, ff).heatW();
                double us = FireHeatInput.wettedVesselUsBtuPerHour(aM2 / CustomaryUnits.M2_PER_FT2, 1.0, ff)
                        * CustomaryUnits.W_PER_BTU_PER_H;
                // Source: REFERENCES.md 1 [D]: exact conversion gives 43,192 and 70,959, i.e. the
                // published SI constants differ from the US ones by 0.02 % and 0.08 %.
                assertEquals(1.0, si / us, 0.002, ff + " " + aM2);
            }
        }
    }

    @Test
    void exactConversionOfUsConstantsGivesPublishedSiConstants() {
        double k = CustomaryUnits.W_PER_BTU_PER_H / Math.pow(CustomaryUnits.M2_PER_FT2, 0.82);
        // Source: REFERENCES.md 1 [D]: 43,192 and 70,959.
        assertEquals(43_192, 21_000 * k, 1);
        assertEquals(70_959, 34_500 * k, 1);
    }

    @Test
    void environmentTableHoldsPublishedFactors() {
        // Source: API Std 521 environment factor table [S] (REFERENCES.md 1).
        assertEquals(1.0, EnvironmentFactors.byKey("bare").f(), 0);
        assertEquals(0.30, EnvironmentFactors.byKey("insulated_22.71").f(), 0);
        assertEquals(0.075, EnvironmentFactors.byKey("insulated_5.68").f(), 0);
        assertEquals(0.0376, EnvironmentFactors.byKey("insulated_2.84").f(), 0);
        assertEquals(0.026, EnvironmentFactors.byKey("insulated_1.87").f(), 0);
        assertEquals(1.0, EnvironmentFactors.byKey("water_application").f(), 0);
        assertEquals(1.0, EnvironmentFactors.byKey("depressuring").f(), 0);
        assertEquals(0.03, EnvironmentFactors.byKey("earth_covered").f(), 0);
        assertEquals(0.0, EnvironmentFactors.byKey("below_grade").f(), 0);
        assertEquals(12, EnvironmentFactors.all().size());
        assertTrue(EnvironmentFactors.all().stream().allMatch(f -> !f.source().isBlank()));
    }

    @Test
    void insulationFormulaReproducesTableRowsRoughly() {
        // Hand calculation: table rows assume an 871 C difference (Tf = 33 C with the 904 C form).
        // k/t = 22.71 W/m2K gives 22.71 x 871 / 66,570 = 0.2971 vs table 0.30 (1 %); k/t = 1.87 gives 0.0245
        // vs 0.026 (6 %): the table's rows are rounded and not all from the formula.
        EnvironmentFactor f = EnvironmentFactors.insulation(22.71 * 0.05, 0.05, 33);
        assertEquals(0.30, f.f(), 0.004);
        assertEquals("M", f.status());
        assertTrue(f.warning().orElseThrow().contains("not been verified"));
    }

    @Test
    void insulationFormulaSiAndUsDifferByAboutHalfAPercent() {
        // Hand calculation: 21,000 Btu/h ft2 = 66,246 W/m2 (exact), the SI form uses 66,570 [M]; with
        // 1660 F = 904.4 C the two forms differ by about 0.5 %. This test records the discrepancy.
        double si = EnvironmentFactors.insulation(0.05, 0.05, 100).f();
        double us = EnvironmentFactors.insulationUs(1.0 / 5.678263, 212);
        double ratio = us / si;
        assertTrue(ratio > 1.002 && ratio < 1.008, "ratio " + ratio);
    }

    @Test
    void lowPressureStorageTableRows() {
        double ft2 = CustomaryUnits.M2_PER_FT2;
        double w = CustomaryUnits.W_PER_BTU_PER_H;
        // Source: NFPA 30 / API 2000 table (REFERENCES.md 8 [D]); Hand calculation per row.
        assertEquals(20_000 * 100 * w, FireHeatInput.lowPressureStorage(100 * ft2, 0, 1).heatW(), 1e-6);
        assertEquals(199_300 * Math.pow(500, 0.566) * w, FireHeatInput.lowPressureStorage(500 * ft2, 0, 1).heatW(),
                1e-3);
        assertEquals(963_400 * Math.pow(2000, 0.338) * w, FireHeatInput.lowPressureStorage(2000 * ft2, 0, 1).heatW(),
                1e-3);
        assertEquals(14_090_000 * w, FireHeatInput.lowPressureStorage(5000 * ft2, 5000, 1).heatW(), 1e-6);
        assertEquals(21_000 * Math.pow(5000, 0.82) * w, FireHeatInput.lowPressureStorage(5000 * ft2, 10_000, 1)
                .heatW(), 1e-3);
    }

    @Test
    void lowPressureStorageTableIsNearlyContinuousAtItsBreaks() {
        double ft2 = CustomaryUnits.M2_PER_FT2;
        // Hand calculation: the published rows meet within 0.1 % at 200, 1000 and 2800 ft2.
        for (double a : new double[] {200, 1000, 2800}) {
            double below = FireHeatInput.lowPressureStorage((a - 1e-6) * ft2, 1e5, 1).heatW();
            double above = FireHeatInput.lowPressureStorage(a * ft2, 1e5, 1).heatW();
            assertEquals(1.0, above / below, 0.001, "at " + a + " ft2");
        }
    }

    @Test
    void rejectsEnvironmentFactorAboveOneAndUnknownKey() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> FireHeatInput.wettedVessel(10, 1.2, FireFighting.INADEQUATE));
        assertEquals("fire.environmentFactor", e.field());
        e = assertThrows(InvalidInputException.class, () -> EnvironmentFactors.byKey("painted"));
        assertEquals("fire.environment", e.field());
        e = assertThrows(InvalidInputException.class, () -> FireHeatInput.wettedVessel(-1, 1, FireFighting.INADEQUATE));
        assertEquals("fire.wettedArea", e.field());
        assertFalse(FireHeatInput.wettedVessel(1, 1, FireFighting.INADEQUATE).source().isBlank());
    }

    /**
     * Sweep finding (issue 19): a vessel wholly above the fire zone (register elevation 50 m) ended in
     * "fire.wettedArea: '0' is not accepted": it is not a typing error but a vessel that takes no wetted
     * pool-fire load, and the message says so and what to do instead (common practice, no source).
     */
    @Test
    void noWettedSurfaceInTheFireZoneIsExplainedNotRefusedAsInput() {
        org.ventcase.common.NoSolutionException e = assertThrows(org.ventcase.common.NoSolutionException.class,
                () -> FireHeatInput.wettedVessel(0, 1, FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING));
        assertTrue(e.getMessage().contains("no wetted surface lies within the fire zone"), e.getMessage());
        assertTrue(e.getMessage().contains("unwetted-vessel method"), e.getMessage());
    }
}
