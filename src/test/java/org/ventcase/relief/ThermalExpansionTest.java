package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.units.CustomaryUnits;

class ThermalExpansionTest {

    @Test
    void publishedExample() {
        // Source: API Std 521 thermal relief example [S] (REFERENCES.md 10): phi 34 kW, alpha 0.00111 1/C,
        // d 0.994, c 4200 J/kgK -> q = 9.04e-6 m3/s (3 significant figures).
        assertEquals(9.04e-6, ThermalExpansion.reliefRateM3PerS(0.00111, 34_000, 0.994, 4200), 0.005e-6);
    }

    @Test
    void siAndUsFormsAgreeAfterConversion() {
        double si = ThermalExpansion.reliefRateM3PerS(0.00111, 34_000, 0.994, 4200);
        double gpm = ThermalExpansion.reliefRateUsGpm(0.00111 * CustomaryUnits.K_PER_R,
                34_000 / CustomaryUnits.W_PER_BTU_PER_H, 0.994, 4200 / (CustomaryUnits.J_PER_KG_PER_BTU_PER_LB * 1.8));
        // Hand calculation: 500 stands for 8.33 lb/gal x 60 min/h; water at 60 F is 8.337 lb/gal, so the
        // US form differs from the SI one by about 0.1 %.
        assertEquals(1.0, gpm * CustomaryUnits.M3_PER_US_GAL / 60 / si, 0.003);
    }

    @Test
    void rejectsNonPositiveHeat() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> ThermalExpansion.reliefRateM3PerS(0.001, -5, 1, 4200));
        assertEquals("thermal.heat", e.field());
    }
}
