package org.ventcase.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

class UnitsSpellingTest {

    @Test
    void acceptedUnitsAreListedInTheirUsualSpelling() {
        // SI prefix and symbol case (k, M; J, W, Pa, K): BIPM SI Brochure, 9th ed., sections 2.3 and 3 (from memory)
        List<String> energy = Units.acceptedUnits(Dimension.SPECIFIC_ENERGY);
        assertTrue(energy.contains("kJ/kg") && energy.contains("J/kg"), energy.toString());
        assertTrue(energy.stream().noneMatch(u -> u.equals("kj/kg")), energy.toString());
        List<String> power = Units.acceptedUnits(Dimension.POWER);
        assertTrue(power.contains("kW") && power.contains("MW"), power.toString());
        assertTrue(Units.acceptedUnits(Dimension.TEMPERATURE).contains("K"));
    }

    @Test
    void inputIsStillReadWhateverItsCase() {
        // 252 kJ/kg = 252,000 J/kg (SI prefix k = 1e3)
        assertEquals(252e3, Units.parse("f", "252 KJ/KG", Dimension.SPECIFIC_ENERGY), 1e-9);
        assertEquals(252e3, Units.parse("f", "252 kj/kg", Dimension.SPECIFIC_ENERGY), 1e-9);
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> Units.parse("latentHeat", "252 kJ", Dimension.SPECIFIC_ENERGY));
        assertTrue(e.getMessage().contains("latentHeat") && e.getMessage().contains("kJ/kg"), e.getMessage());
    }
}
