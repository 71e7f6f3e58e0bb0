package org.ventcase.vessel;

import java.util.Objects;

/**
 * The wetted area to use in the fire heat-input equation, with how it was obtained.
 *
 * @param area           fire-exposed wetted inside area, m2 (&gt;= 0)
 * @param effectiveLevel level above the vessel's lowest inside point up to which wetted area
 *                       was counted, m (&gt;= 0)
 * @param ruleApplied    the rule in words, for the calculation sheet
 */
public record FireExposedArea(double area, double effectiveLevel, String ruleApplied) {
    public FireExposedArea {
        if (!(area >= 0) || Double.isInfinite(area)) {
            throw new IllegalArgumentException("area must be finite and >= 0: " + area);
        }
        if (!(effectiveLevel >= 0) || Double.isInfinite(effectiveLevel)) {
            throw new IllegalArgumentException("effectiveLevel must be finite and >= 0: " + effectiveLevel);
        }
        Objects.requireNonNull(ruleApplied, "ruleApplied");
        if (ruleApplied.isBlank()) {
            throw new IllegalArgumentException("ruleApplied must not be blank");
        }
    }
}
