package org.ventcase.vessel;

import java.util.Objects;

import org.ventcase.common.InvalidInputException;

/**
 * A liquid level as a person gives it: a height in metres above the lowest inside point, a
 * percentage of the total inside height, or a percentage of the total inside volume. Converts
 * among the three for a given {@link Vessel}; % of volume goes through
 * {@link Vessel#levelAtVolume(double)}.
 *
 * @param value the number, in m for {@link Basis#HEIGHT_M}, in % (0..100) otherwise
 * @param basis what the number means
 */
public record Level(double value, Basis basis) {

    /** What a level number means. */
    public enum Basis {
        /** metres above the lowest inside point (field {@code level.height}) */
        HEIGHT_M,
        /** percent of the total inside height (field {@code level.percentOfHeight}) */
        PERCENT_OF_HEIGHT,
        /** percent of the total inside volume (field {@code level.percentOfVolume}) */
        PERCENT_OF_VOLUME
    }

    public Level {
        Objects.requireNonNull(basis, "basis");
        switch (basis) {
            case HEIGHT_M:
                if (!(value >= 0) || Double.isInfinite(value)) {
                    throw new InvalidInputException("level.height", Fmt.g(value) + " m",
                            "expected a finite height of at least 0 m above the lowest inside point");
                }
                break;
            case PERCENT_OF_HEIGHT:
                InvalidInputException.requireInRange("level.percentOfHeight", value, 0, 100, "%");
                break;
            default:
                InvalidInputException.requireInRange("level.percentOfVolume", value, 0, 100, "%");
                break;
        }
    }

    public static Level ofHeight(double metres) {
        return new Level(metres, Basis.HEIGHT_M);
    }

    public static Level ofPercentOfHeight(double percent) {
        return new Level(percent, Basis.PERCENT_OF_HEIGHT);
    }

    public static Level ofPercentOfVolume(double percent) {
        return new Level(percent, Basis.PERCENT_OF_VOLUME);
    }

    /** Height above the lowest inside point, m; a height above the vessel top is rejected ({@code level.height}). */
    public double heightIn(Vessel vessel) {
        switch (basis) {
            case HEIGHT_M:
                InvalidInputException.requireInRange("level.height", value, 0.0, vessel.totalHeight(), "m");
                return value;
            case PERCENT_OF_HEIGHT:
                return value == 100.0 ? vessel.totalHeight() : value / 100.0 * vessel.totalHeight();
            default:
                return vessel.levelAtVolume(value == 100.0 ? vessel.totalVolume() : value / 100.0 * vessel.totalVolume());
        }
    }

    /** Percent of the total inside height. */
    public double percentOfHeightIn(Vessel vessel) {
        return basis == Basis.PERCENT_OF_HEIGHT ? value : 100.0 * heightIn(vessel) / vessel.totalHeight();
    }

    /** Percent of the total inside volume. */
    public double percentOfVolumeIn(Vessel vessel) {
        return basis == Basis.PERCENT_OF_VOLUME ? value
                : 100.0 * vessel.liquidVolume(heightIn(vessel)) / vessel.totalVolume();
    }

    /** The same level expressed on another basis for this vessel. */
    public Level as(Basis target, Vessel vessel) {
        switch (target) {
            case HEIGHT_M:
                return ofHeight(heightIn(vessel));
            case PERCENT_OF_HEIGHT:
                return ofPercentOfHeight(Math.min(100.0, percentOfHeightIn(vessel)));
            default:
                return ofPercentOfVolume(Math.min(100.0, percentOfVolumeIn(vessel)));
        }
    }
}
