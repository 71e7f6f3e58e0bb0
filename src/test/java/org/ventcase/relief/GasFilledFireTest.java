package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.device.FlowRegime;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Vessel;

class GasFilledFireTest {

    static MixtureSpec nitrogen() {
        return MixtureSpec.pure(EosVariant.PR78, ComponentLibrary.builtIn().get("nitrogen"), DensityBasis.TRANSLATED);
    }

    static GasFilledFireInput input(Vessel v, double elevation, GasFilledFireInput.AreaBasis basis) {
        // Invented receiver: normal operation 10 bar abs, 20 C; P1 = 12.1 bar abs; carbon-steel wall 593 C.
        return new GasFilledFireInput(nitrogen(), v, FireExposure.atElevation(elevation), basis, 12.1e5, 10e5, 293.15,
                UnwettedVesselFire.CARBON_STEEL_WALL_K, DeviceSpec.gasValve(PhysicalConstants.ATM_PA));
    }

    @Test
    void loadFollowsTheApi521FormulaByHand() {
        Vessel v = Vessel.vertical(1.5, 4, Head.ellipsoidal2to1(1.5), Head.ellipsoidal2to1(1.5));
        GasFilledFireResult r = GasFilledFire.run(input(v, 1.0, GasFilledFireInput.AreaBasis.BELOW_FIRE_HEIGHT));
        // Vessel bottom 1 m above grade, top at 1 + 4.75 m < 7.6 m: the whole surface is in the fire zone.
        assertEquals(v.totalInsideArea(), r.exposedAreaM2(), 1e-9);
        // Hand calculation, API Std 521 gas-filled vessel (REFERENCES.md section 2, SI constant 0.2772 [D]):
        // T1 = (P1/Pn) Tn = 1.21 x 293.15 = 354.7115 K; M(N2) = 28.0134 (library value, Poling 2001);
        // W = 0.2772 sqrt(M x 1210 kPa) A' (866.15 - T1)^1.25 / T1^1.1506 kg/h.
        double t1 = 1.21 * 293.15;
        double m = ComponentLibrary.builtIn().get("nitrogen").molarMass();
        double wKgH = 0.2772 * Math.sqrt(m * 1210) * r.exposedAreaM2() * Math.pow(866.15 - t1, 1.25)
                / Math.pow(t1, 1.1506);
        assertEquals(t1, r.load().relievingTemperatureK(), 1e-9);
        assertEquals(wKgH, r.load().massFlowKgPerH(), 1e-9 * wKgH);
        assertEquals(t1, r.relievedGas().temperatureK(), 1e-9);
        assertTrue(r.warnings().contains(UnwettedVesselFire.RUPTURE_CAUTION));
        // F' cross-check: ideal gas, critical flow, Kb = Kc = 1 -> A(F') / A(API 520) = 1 / sqrt(Z) exactly.
        assertEquals(FlowRegime.CRITICAL, r.sizing().regime());
        assertEquals(1 / Math.sqrt(r.relievedGas().z()), r.fPrimeRatio(), 1e-9);
    }

    @Test
    void onlyTheSurfaceBelowTheFireHeightCountsUnlessTheWholeSurfaceIsChosen() {
        Vessel v = Vessel.vertical(2, 12, Head.ellipsoidal2to1(2), Head.ellipsoidal2to1(2));
        GasFilledFireResult below = GasFilledFire.run(input(v, 2.0, GasFilledFireInput.AreaBasis.BELOW_FIRE_HEIGHT));
        GasFilledFireResult whole = GasFilledFire.run(input(v, 2.0, GasFilledFireInput.AreaBasis.WHOLE_SURFACE));
        // Fire zone 7.6 - 2.0 = 5.6 m above the bottom: the area a liquid to 5.6 m would wet.
        assertEquals(v.wettedArea(5.6), below.exposedAreaM2(), 1e-9);
        assertEquals(v.totalInsideArea(), whole.exposedAreaM2(), 1e-9);
        // W is proportional to A' (the formula is linear in A').
        assertEquals(whole.load().massFlowKgPerS() / whole.exposedAreaM2(),
                below.load().massFlowKgPerS() / below.exposedAreaM2(), 1e-12);
    }

    @Test
    void normalPressureAboveP1NamesTheField() {
        Vessel v = Vessel.vertical(1.5, 4, Head.ellipsoidal2to1(1.5), Head.ellipsoidal2to1(1.5));
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new GasFilledFireInput(nitrogen(), v,
                FireExposure.atElevation(0), GasFilledFireInput.AreaBasis.WHOLE_SURFACE, 12e5, 13e5, 293.15, 866.15,
                DeviceSpec.gasValve(1e5)));
        assertEquals("gasFire.normalPressure", e.field());
    }
}
