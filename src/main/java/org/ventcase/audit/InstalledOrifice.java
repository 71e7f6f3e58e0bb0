package org.ventcase.audit;

import org.ventcase.common.InvalidInputException;
import org.ventcase.device.Orifice;

/**
 * The relief valves installed on a vessel, as the register states them: {@code count} valves of
 * one API 526 orifice letter.
 *
 * @param orifice the orifice letter's effective area
 * @param count   number of valves, at least 1
 */
public record InstalledOrifice(Orifice orifice, int count) {
    public InstalledOrifice {
        if (orifice == null) {
            throw InvalidInputException.missing("orifice", "expected an API 526 letter D to T");
        }
        if (count < 1) {
            throw InvalidInputException.invalid("orifice count", count, "expected a whole number of at least 1");
        }
    }

    /** Total effective area, m2. */
    public double areaM2() {
        return count * orifice.areaM2();
    }

    /** "J" or "2 x J". */
    public String designation() {
        return count == 1 ? orifice.letter() : count + " x " + orifice.letter();
    }
}
