package org.ventcase.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.ventcase.report.DisplayUnits.Kind;

class DisplayUnitsTest {

    private static String sp(String s) {
        return s.replace('\u00A0', ' ');
    }

    @Test
    void siFirstWithCustomaryInBracketsForKeyValues() {
        DisplayUnits u = new DisplayUnits(UnitSystem.SI);
        // Hand calculation: 101325 Pa / 6894.757 Pa/psi = 14.696 psi
        assertEquals("101.3 kPa abs [14.70 psia]", sp(u.format(Kind.PRESSURE_ABS, 101_325)));
        // Hand calculation: 1 kg/s = 3600 kg/h = 3600 / 0.45359237 lb/h = 7936.6 lb/h
        assertEquals("3600.0 kg/h [7937 lb/h]", sp(u.format(Kind.MASS_FLOW, 1.0)));
        // Definition: 1 in2 = 645.16 mm2 exactly
        assertEquals("645.2 mm2 [1.0000 in2]", sp(u.format(Kind.ORIFICE_AREA, 645.16e-6)));
        // Definition: 0 C = 32 F
        assertEquals("0.00 °C [32.00 °F]", sp(u.format(Kind.TEMPERATURE, 273.15)));
        // Lengths, areas and masses carry one unit only
        assertEquals("3.200 m", sp(u.format(Kind.LENGTH, 3.2)));
    }

    @Test
    void usFirstWithSiInBrackets() {
        DisplayUnits u = new DisplayUnits(UnitSystem.US);
        // Hand calculation: 100 psi = 689.5 kPa; gauge stays gauge
        assertEquals("100.00 psig [689.5 kPa gauge]", sp(u.format(Kind.PRESSURE_GAUGE, 100 * 6894.757293168361)));
        // Definition: 1 ft = 0.3048 m
        assertEquals("10.000 ft", sp(u.format(Kind.LENGTH, 3.048)));
        // Definition of the IT Btu: 1 Btu/lb = 2.326 kJ/kg
        assertEquals("100.00 Btu/lb [232.60 kJ/kg]", sp(u.format(Kind.SPECIFIC_ENERGY, 232_600)));
        assertEquals(7936.641438655, u.value(Kind.MASS_FLOW, 1.0), 1e-6);
    }

    @Test
    void nonFiniteValuesAreRefusedNotPrinted() {
        DisplayUnits u = new DisplayUnits(UnitSystem.SI);
        assertThrows(IllegalArgumentException.class, () -> u.format(Kind.MASS, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> u.format(Kind.MASS, Double.POSITIVE_INFINITY));
    }
}
