package org.ventcase.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * SI quantities inside sentences, written for a US sheet. Check values: the exact conversion
 * factors of NIST SP 811 (2008), Appendix B (1 psi = 6894.757 Pa, 1 lb = 0.45359237 kg,
 * 1 ft = 0.3048 m, 1 Btu/lb = 2326 J/kg, 1 US gal = 3.785411784 L), worked by hand.
 */
class QuantityTextTest {

    @Test
    void writesUsFirstWithTheSiTextBracketed() {
        // 1916.33 kPa / 6.894757 kPa/psi = 277.94 psi; 298.15 K = 77.00 F
        assertEquals("P1 = 277.94 psia [1916.33 kPa abs] at 77.00 °F [298.15 K (25.00 C)]",
                QuantityText.usFirst("P1 = 1916.33 kPa abs at 298.15 K (25.00 C)"));
        // 73676 kg / 0.45359237 = 162428 lb (5 significant digits); 173.984 m3 / 0.0283168 = 6144.2 ft3
        assertEquals("the 162430 lb [73676 kg] of liquid would need 6144.2 ft3 [173.984 m3]",
                QuantityText.usFirst("the 73676 kg of liquid would need 173.984 m3"));
    }

    @Test
    void keepsSiFirstForMethodSteps() {
        // 267.81 kJ/kg / 2.326 = 115.14 Btu/lb
        assertEquals("267.81 kJ/kg [115.14 Btu/lb]", QuantityText.usBracketed("267.81 kJ/kg"));
        // 2.04451 L/min / 3.785411784 = 0.540103 US gal/min: 0.54010 to five digits, the trailing zero dropped
        assertEquals("Q = 2.04451 L/min [0.5401 US gal/min]", QuantityText.usBracketed("Q = 2.04451 L/min"));
    }

    @Test
    void temperatureDifferencesAndRangesConvertAsSuch() {
        // a difference of 0.5 K is 0.9 F; a range converts both ends, the unit once
        assertEquals("T is within 0.9 °F [0.5 K] of Tc", QuantityText.usFirst("T is within 0.5 K of Tc"));
        assertEquals("valid -260.05 to 139.37 °F [110.9-332.8 K]", QuantityText.usFirst("valid 110.9-332.8 K"));
    }

    @Test
    void leavesNumbersWithoutAnSiUnitAndBracketedOnesAlone() {
        String s = "Tr 0.9, 21 % of MAWP, Z = 0.86679, 5 x 60000, 2384.50 kg/h [5257 lb/h], M1 boundary";
        assertEquals(s, QuantityText.usFirst(s));
        assertEquals("", QuantityText.usFirst(""));
    }
}
