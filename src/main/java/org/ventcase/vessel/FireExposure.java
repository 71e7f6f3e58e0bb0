package org.ventcase.vessel;

import org.ventcase.common.InvalidInputException;

/**
 * Where the vessel stands relative to a pool fire, for {@link Vessel#fireExposedArea}.
 *
 * @param bottomElevation          elevation of the vessel's lowest inside point above grade (the
 *                                 base of the pool fire), m, &gt;= 0 (field {@code fire.bottomElevation}).
 *                                 The inside point is used so that levels and elevations share one
 *                                 datum; the wall thickness below it is neglected.
 * @param fireHeight               height above grade within which wetted area counts, m, &gt; 0
 *                                 (field {@code fire.fireHeight}); {@link #DEFAULT_FIRE_HEIGHT_M} by default
 * @param excludeSkirtedBottomHead exclude the bottom head of a vertical vessel standing in a skirt
 *                                 with limited ventilation (field {@code fire.excludeSkirtedBottomHead})
 */
public record FireExposure(double bottomElevation, double fireHeight, boolean excludeSkirtedBottomHead) {

    /**
     * 7.6 m (25 ft) above the base of the fire. Source: API Std 521 (5th ed. 2007 = ISO 23251:2006),
     * fire-exposed wetted area; as summarised in REFERENCES.md section 1 [S].
     */
    public static final double DEFAULT_FIRE_HEIGHT_M = 7.6;

    public FireExposure {
        if (!(bottomElevation >= 0) || Double.isInfinite(bottomElevation)) {
            throw new InvalidInputException("fire.bottomElevation", Fmt.g(bottomElevation) + " m",
                    "expected a finite elevation of at least 0 m above grade");
        }
        InvalidInputException.requirePositive("fire.fireHeight", fireHeight, "m");
    }

    /** Default fire height 7.6 m, bottom head not excluded. */
    public static FireExposure atElevation(double bottomElevation) {
        return new FireExposure(bottomElevation, DEFAULT_FIRE_HEIGHT_M, false);
    }

    /** The same exposure with the bottom head inside a skirt excluded (vertical vessels only). */
    public FireExposure excludingSkirtedBottomHead() {
        return new FireExposure(bottomElevation, fireHeight, true);
    }
}
