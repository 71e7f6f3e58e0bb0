package org.ventcase.vessel;

import static org.ventcase.vessel.LevelTest.assertField;
import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

/** Bad input is refused with a message naming the field, the value and the accepted range. */
class ValidationTest {

    @Test
    void sizesMustBePositiveAndFinite() {
        assertField("vessel.diameter", () -> Vessel.sphere(0));
        assertField("vessel.diameter", () -> Vessel.horizontal(-1, 2, Head.flat(), Head.flat()));
        assertField("vessel.diameter", () -> Vessel.vertical(Double.NaN, 2, Head.flat(), Head.flat()));
        assertField("vessel.tangentLength", () -> Vessel.vertical(1, 0, Head.flat(), Head.flat()));
        assertField("vessel.tangentLength", () -> Vessel.horizontal(1, Double.POSITIVE_INFINITY, Head.flat(), Head.flat()));
        assertField("vessel.wallThickness", () -> Vessel.sphere(1).withWallThickness(-0.01));
    }

    @Test
    void ellipsoidalDepthMustBeWithinZeroAndHalfTheDiameter() {
        assertField("head.depth", () -> Head.ellipsoidal(0));
        assertField("vessel.bottomHead.depth", () -> Vessel.vertical(2, 3, Head.ellipsoidal(1.0001), Head.flat()));
        assertField("vessel.rightHead.depth", () -> Vessel.horizontal(2, 3, Head.flat(), Head.ellipsoidal(1.5)));
        // boundary D/2 (hemisphere) accepted
        assertDoesNotThrow(() -> Vessel.vertical(2, 3, Head.ellipsoidal(1.0), Head.flat()));
        InvalidInputException e = org.junit.jupiter.api.Assertions.assertThrows(InvalidInputException.class,
                () -> Vessel.vertical(2, 3, Head.flat(), Head.ellipsoidal(1.2)));
        assertTrue(e.getMessage().contains("vessel.topHead.depth") && e.getMessage().contains("1.2")
                && e.getMessage().contains("D/2 = 1 m"), e.getMessage());
    }

    @Test
    void torisphericalHeadsMustBeGeometric() {
        assertField("head.knuckleRadius", () -> Head.torispherical(2, 0));
        assertField("head.crownRadius", () -> Head.torispherical(-2, 0.1));
        assertField("vessel.leftHead.crownRadius", () -> Vessel.horizontal(2, 3, Head.torispherical(0.9, 0.1), Head.flat()));
        assertField("vessel.bottomHead.knuckleRadius", () -> Vessel.vertical(2, 3, Head.torispherical(1.5, 1.5), Head.flat()));
        assertField("vessel.topHead.knuckleRadius", () -> Vessel.vertical(2, 3, Head.flat(), Head.torispherical(3.0, 1.2)));
        assertDoesNotThrow(() -> Vessel.vertical(2, 3, Head.torispherical(1.0, 0.3), Head.flat()));
    }

    @Test
    void coneHalfAngleMustBeBetweenZeroAndNinetyDegrees() {
        assertField("head.halfAngle", () -> Head.conical(0));
        assertField("head.halfAngle", () -> Head.conical(90));
        assertField("head.halfAngle", () -> Head.conical(Double.NaN));
    }

    @Test
    void fireInputsAreChecked() {
        assertField("fire.bottomElevation", () -> FireExposure.atElevation(-1));
        assertField("fire.fireHeight", () -> new FireExposure(0, 0, false));
        assertField("fire.excludeSkirtedBottomHead", () -> Vessel.sphere(3).fireExposedArea(1,
                FireExposure.atElevation(1).excludingSkirtedBottomHead()));
    }
}
