package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.ventcase.common.NoSolutionException;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.device.GasSizingInput;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

class WettedFireTest {

    private static WettedFireInput input(String fluid, double setGaugePa, double tStorage, boolean refine) {
        double atm = PhysicalConstants.ATM_PA;
        return new WettedFireInput(ComponentLibrary.builtIn().get(fluid), EosVariant.PR78, DensityBasis.TRANSLATED,
                Vessel.horizontal(2.5, 10, Head.ellipsoidal2to1(2.5), Head.ellipsoidal2to1(2.5)),
                Level.ofPercentOfHeight(70), FireExposure.atElevation(0.8), tStorage,
                new RelievingPressureInput(setGaugePa, setGaugePa, atm, DeviceCount.SINGLE, ScenarioKind.FIRE, false,
                        Optional.empty()),
                FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING, EnvironmentFactors.byKey("bare"), atm,
                GasSizingInput.DEFAULT_KD, 1, 1, refine);
    }

    @Test
    void loadIsHeatOverLatentHeatAndRefinementSubtractsDisplacedVapour() {
        WettedFireResult plain = WettedFire.run(input("n-butane", 10e5, 290, false));
        WettedFireResult refined = WettedFire.run(input("n-butane", 10e5, 290, true));
        // Definition (API Std 521 relief rate from heat input): W = Q / L
        assertEquals(plain.heat().heatW() / plain.latentHeat().usedJPerKg(), plain.reliefLoadKgPerS(), 1e-12);
        double ratio = 1 - plain.relief().vapor().density() / plain.relief().liquid().density();
        assertEquals(plain.reliefLoadKgPerS() * ratio, refined.reliefLoadKgPerS(), 1e-12);
        assertTrue(refined.sizing().areaM2() < plain.sizing().areaM2());
    }

    @Test
    void relievingConditionsAreSaturationAtP1() {
        WettedFireResult r = WettedFire.run(input("propane", 15e5, 288.15, false));
        // P1 = 1.21 x MAWP (gauge) + atmosphere (fire, single device at MAWP; REFERENCES.md section 6)
        assertEquals(1.21 * 15e5 + PhysicalConstants.ATM_PA, r.relieving().relievingPressurePa(), 1e-6);
        assertEquals(r.relieving().relievingPressurePa(), r.relief().pressurePa(), 1e-6 * r.relief().pressurePa());
        assertEquals(r.relief().temperatureK(), r.relievedVapor().temperatureK(), 1e-9);
        assertEquals(r.relief().vapor().z(), r.relievedVapor().z(), 1e-9);
        // Orifice covers the required area
        assertTrue(r.orifice().selectedAreaM2() >= r.sizing().areaM2());
        assertTrue(r.trace().size() >= 8);
    }

    @Test
    void relievingAboveTheCriticalPressureIsRefusedWithAClearMessage() {
        // Propane Pc about 4.25 MPa (Poling 2001 App. A, in the built-in library): set 40 barg gives
        // P1 = 1.21 x 40 + 1.01 = 49.4 bar abs > Pc.
        NoSolutionException e = assertThrows(NoSolutionException.class,
                () -> WettedFire.run(input("propane", 40e5, 288.15, false)));
        assertTrue(e.getMessage().contains("critical pressure"), e.getMessage());
    }

    @Test
    void nearCriticalHydrocarbonGetsTheMinimumLatentHeat() {
        // Propane at P1 close to Pc: EOS latent heat below 116.3 kJ/kg (= 50 Btu/lb, API Std 521),
        // so the published minimum is applied and a warning given.
        WettedFireResult r = WettedFire.run(input("propane", 33.5e5, 288.15, false));
        assertTrue(r.latentHeat().computedJPerKg() < LatentHeatGuard.MINIMUM_J_PER_KG, "" + r.latentHeat());
        assertTrue(r.latentHeat().minimumApplied());
        assertEquals(LatentHeatGuard.MINIMUM_J_PER_KG, r.latentHeat().usedJPerKg(), 0.0);
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("Tr =")));
    }
}
