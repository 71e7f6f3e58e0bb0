package org.ventcase.report;

import java.time.LocalDate;

import org.ventcase.common.PhysicalConstants;
import org.ventcase.device.GasSizingInput;
import org.ventcase.relief.DeviceCount;
import org.ventcase.relief.EnvironmentFactors;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.RelievingPressureInput;
import org.ventcase.relief.ScenarioKind;
import org.ventcase.relief.WettedFire;
import org.ventcase.relief.WettedFireInput;
import org.ventcase.relief.WettedFireResult;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

/** Invented cases for the sheet tests (no real site, vessel or person). */
final class SheetFixtures {

    private SheetFixtures() {
    }

    static WettedFireInput input(String fluid, Vessel v, Level level, double elevation, double tStorageK,
            double setGaugePa) {
        double atm = PhysicalConstants.ATM_PA;
        return new WettedFireInput(ComponentLibrary.builtIn().get(fluid), EosVariant.PR78, DensityBasis.TRANSLATED,
                v, level, FireExposure.atElevation(elevation), tStorageK,
                RelievingPressureInput.of(setGaugePa, setGaugePa, atm, DeviceCount.SINGLE, ScenarioKind.FIRE),
                FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING, EnvironmentFactors.byKey("bare"), atm,
                GasSizingInput.DEFAULT_KD, 1.0, 1.0, false);
    }

    /** Propane bullet, 2.8 m x 12 m, 2:1 heads, 80 % of volume, 0.9 m above grade. */
    static WettedFireResult bullet() {
        return WettedFire.run(input("propane", Vessel.horizontal(2.8, 12, Head.ellipsoidal2to1(2.8),
                Head.ellipsoidal2to1(2.8)), Level.ofPercentOfVolume(80), 0.9, 290.0, 16.5e5));
    }

    /** n-Butane drum, vertical, 2.0 m x 6 m, F&D heads, 3.1 m level, 2.5 m above grade. */
    static WettedFireResult drum() {
        return WettedFire.run(input("n-butane", Vessel.vertical(2.0, 6, Head.asmeFlangedAndDished(2.0),
                Head.asmeFlangedAndDished(2.0)), Level.ofHeight(3.1), 2.5, 295.0, 7.0e5));
    }

    /** Propane sphere, 12 m ID, 60 % of height, 2 m above grade. */
    static WettedFireResult sphere() {
        return WettedFire.run(input("propane", Vessel.sphere(12), Level.ofPercentOfHeight(60), 2.0, 285.0, 15e5));
    }

    static SheetIdentity identity() {
        return new SheetIdentity("Test bullet T-0001 (invented): fire relief basis",
                "T-0001", "B", LocalDate.of(2026, 2, 3), "A. Tester (invented)", "", "Ventcase", "test",
                "0123456789abcdef0123456789abcdef0123456789abcdef0123456789abcdef");
    }
}
