package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.device.GasSizingInput;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

class FireLoadCurveTest {

    private static WettedFireInput input(Vessel v, Level level, double elevation) {
        double atm = PhysicalConstants.ATM_PA;
        return new WettedFireInput(ComponentLibrary.builtIn().get("propane"), EosVariant.PR78, DensityBasis.TRANSLATED,
                v, level, FireExposure.atElevation(elevation), 288.15,
                new RelievingPressureInput(15e5, 15e5, atm, DeviceCount.SINGLE, ScenarioKind.FIRE, false,
                        Optional.empty()),
                FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING, EnvironmentFactors.byKey("bare"), atm,
                GasSizingInput.DEFAULT_KD, 1, 1, false);
    }

    private static final Vessel BULLET = Vessel.horizontal(2.5, 10, Head.ellipsoidal2to1(2.5), Head.ellipsoidal2to1(2.5));

    @Test
    void caseLevelPointIsTheCaseItself() {
        WettedFireInput in = input(BULLET, Level.ofPercentOfVolume(72.5), 0.8);
        FireLoadCurve c = FireLoadCurve.overLevels(in, 10, 90, 8);
        WettedFireResult r = WettedFire.run(in);
        // 72.5 % is not on the 10 % grid, so it is inserted: 9 grid points + 1
        assertEquals(10, c.points().size());
        assertEquals(72.5, c.caseLevel().levelPercentVolume(), 1e-9);
        // Definition: the curve runs the same calculation, so the loads agree to round-off
        assertEquals(r.reliefLoadKgPerS(), c.caseLevel().reliefLoadKgPerS(), 1e-12 * r.reliefLoadKgPerS());
        assertEquals(r.sizing().areaM2(), c.caseLevel().requiredAreaM2(), 1e-12 * r.sizing().areaM2());
    }

    @Test
    void loadRisesWithLevelAsAreaToThePower082() {
        // Whole bullet inside the 7.6 m fire zone: the area, and with it the load, grows with the level.
        FireLoadCurve c = FireLoadCurve.overLevels(input(BULLET, Level.ofPercentOfVolume(50), 0.8), 5, 95, 18);
        List<FireLoadCurve.Point> p = c.points();
        for (int i = 1; i < p.size(); i++) {
            assertTrue(p.get(i).reliefLoadKgPerS() > p.get(i - 1).reliefLoadKgPerS(), "point " + i);
        }
        assertEquals(p.size() - 1, c.governingIndex());
        // Hand calculation: Q = C F A^0.82 and W = Q / L with the same L at every level,
        // so W2 / W1 = (A2 / A1)^0.82.
        FireLoadCurve.Point a = p.get(2);
        FireLoadCurve.Point b = p.get(15);
        assertEquals(Math.pow(b.fireWettedAreaM2() / a.fireWettedAreaM2(), 0.82),
                b.reliefLoadKgPerS() / a.reliefLoadKgPerS(), 1e-12);
    }

    @Test
    void governingLevelIsTheLowestOnThePlateauAboveTheFireZone() {
        // Vertical drum 2 m ID, 10 m tangent length, bottom 3 m above grade: the fire zone reaches
        // 7.6 - 3 = 4.6 m above the vessel bottom, below its 11 m height, so the load is flat above 4.6 m.
        Vessel drum = Vessel.vertical(2.0, 10, Head.ellipsoidal2to1(2.0), Head.ellipsoidal2to1(2.0));
        FireLoadCurve c = FireLoadCurve.overLevels(input(drum, Level.ofPercentOfVolume(30), 3.0), 5, 95, 18);
        FireLoadCurve.Point gov = c.governing();
        assertTrue(gov.levelM() >= 4.6, "governing level " + gov.levelM());
        assertTrue(c.points().get(c.governingIndex() - 1).levelM() < 4.6);
        for (FireLoadCurve.Point p : c.points()) {
            assertTrue(p.reliefLoadKgPerS() <= gov.reliefLoadKgPerS() * (1 + FireLoadCurve.PLATEAU_TOLERANCE));
        }
        assertEquals(gov.reliefLoadKgPerS(), c.points().get(c.points().size() - 1).reliefLoadKgPerS(),
                1e-9 * gov.reliefLoadKgPerS());
    }

    @Test
    void emptyVesselAndReversedRangeAreRefused() {
        WettedFireInput in = input(BULLET, Level.ofPercentOfVolume(50), 0.8);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> FireLoadCurve.overLevels(in, 0, 90, 9));
        assertTrue(e.getMessage().contains("curve.fromPercent"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> FireLoadCurve.overLevels(in, 50, 40, 9));
        assertThrows(InvalidInputException.class, () -> FireLoadCurve.overLevels(in, 10, 90, 0));
    }
}
