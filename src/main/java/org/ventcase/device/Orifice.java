package org.ventcase.device;

import org.ventcase.common.InvalidInputException;
import org.ventcase.units.CustomaryUnits;

/**
 * One standard orifice designation and its effective area.
 *
 * @param letter  designation, D..T
 * @param areaIn2 effective area as published, in2
 * @param source  where the value comes from
 */
public record Orifice(String letter, double areaIn2, String source) {
    public Orifice {
        if (letter == null || letter.isBlank()) {
            throw InvalidInputException.missing("device.orifice.letter", "expected a letter D..T");
        }
        InvalidInputException.requirePositive("device.orifice[" + letter + "].area", areaIn2, "in2");
        if (source == null || source.isBlank()) {
            throw InvalidInputException.missing("device.orifice[" + letter + "].source", "every datum needs a source");
        }
    }

    /** Effective area, mm2 (in2 x 645.16, exact). */
    public double areaMm2() {
        return areaIn2 * CustomaryUnits.MM2_PER_IN2;
    }

    /** Effective area, m2. */
    public double areaM2() {
        return areaMm2() * 1e-6;
    }
}
