package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.device.GasSizingResult;
import org.ventcase.device.LiquidSizingResult;
import org.ventcase.device.ViscosityCorrection;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.PureSaturation;

class BlockedOutletTest {

    static final double ATM = PhysicalConstants.ATM_PA;

    static MixtureSpec pure(String name) {
        return MixtureSpec.pure(EosVariant.PR78, ComponentLibrary.builtIn().get(name), DensityBasis.TRANSLATED);
    }

    static BlockedOutletInput gas(InflowRate inflow, BlockedOutletInput.VapourTemperature tb, String fluid) {
        return new BlockedOutletInput(pure(fluid), inflow, RelievedFluid.Phase.GAS, tb, 310, 20e5,
                DeviceSpec.gasValve(ATM), OptionalDouble.empty(), null);
    }

    @Test
    void standardVolumeUsesTheStatedReferenceConditions() {
        double m = ComponentLibrary.builtIn().get("nitrogen").molarMass();
        BlockedOutletResult std = BlockedOutlet.run(gas(InflowRate.standardVolume(1.0, null),
                BlockedOutletInput.VapourTemperature.INFLOW_TEMPERATURE, "nitrogen"));
        BlockedOutletResult nor = BlockedOutlet.run(gas(InflowRate.standardVolume(1.0, StandardConditions.NORMAL_0C),
                BlockedOutletInput.VapourTemperature.INFLOW_TEMPERATURE, "nitrogen"));
        // Hand calculation: default reference 15 C, 101.325 kPa; ideal-gas molar volume
        // R T / P = 8.314462618 x 288.15 / 101325 = 0.02364483 m3/mol; W = 1 / 0.02364483 x M / 1000 kg/s.
        assertEquals(1.0 / 0.02364483 * m / 1000, std.massFlowKgPerS(), 1e-6 * std.massFlowKgPerS());
        // Normal cubic metre (0 C): 8.314462618 x 273.15 / 101325 = 0.02241397 m3/mol
        // (22.414 m3/kmol, common practice): more mass per m3 by 288.15/273.15.
        assertEquals(1.0 / 0.02241397 * m / 1000, nor.massFlowKgPerS(), 1e-6 * nor.massFlowKgPerS());
        assertTrue(std.inflowBasis().contains("15 C"));
    }

    @Test
    void gasAreaIsTheApi520EquationWithEosProperties() {
        BlockedOutletResult r = BlockedOutlet.run(gas(InflowRate.mass(2.0),
                BlockedOutletInput.VapourTemperature.INFLOW_TEMPERATURE, "methane"));
        RelievedFluid f = r.relieved();
        assertEquals(310, f.temperatureK(), 0.0);
        // Hand calculation, API 520 Part I critical flow (REFERENCES.md section 3 [S]):
        // A (mm2) = W (kg/h) / (C Kd P1 (kPa) Kb Kc) sqrt(T Z / M), C = 0.03948 sqrt(k (2/(k+1))^((k+1)/(k-1))).
        double k = f.kIdeal();
        double c = 0.03948 * Math.sqrt(k * Math.pow(2 / (k + 1), (k + 1) / (k - 1)));
        double a = 2.0 * 3600 / (c * 0.975 * 2000) * Math.sqrt(310 * f.z() / f.molarMass());
        GasSizingResult gs = r.gasSizing().orElseThrow();
        assertEquals(a, gs.areaMm2(), 1e-9 * a);
        assertTrue(r.liquidSizing().isEmpty());
    }

    @Test
    void saturatedVapourReliefIsAtTheSaturationTemperature() {
        BlockedOutletResult r = BlockedOutlet.run(gas(InflowRate.mass(1.0),
                BlockedOutletInput.VapourTemperature.SATURATION_AT_P1, "propane"));
        double tsat = new PureSaturation(CubicModel.pure(EosVariant.PR78, ComponentLibrary.builtIn().get("propane")))
                .atPressure(20e5, DensityBasis.CUBIC).temperatureK();
        assertEquals(tsat, r.relieved().temperatureK(), 1e-9);
    }

    @Test
    void liquidReliefUsesEosDensityAndBothKvEditions() {
        for (ViscosityCorrection form : ViscosityCorrection.values()) {
            BlockedOutletResult r = BlockedOutlet.run(new BlockedOutletInput(pure("n-hexane"), InflowRate.mass(10),
                    RelievedFluid.Phase.LIQUID, null, 320, 10e5, DeviceSpec.liquidValve(ATM), OptionalDouble.of(3e-4),
                    form));
            double rho = r.relieved().density();
            double q = 10 / rho;
            assertEquals(q, r.volumetricFlowM3PerS().getAsDouble(), 1e-12);
            // Hand calculation, API 520 liquid equation (REFERENCES.md section 4 [S]):
            // A (mm2) = 11.78 Q (L/min) / (Kd Kw Kc) sqrt(G / (P1 - P2) kPa), G = rho / 999.0, Kv = 1 first pass.
            double g = rho / 999.0;
            double a = 11.78 * q * 60_000 / 0.65 * Math.sqrt(g / ((10e5 - ATM) / 1000));
            LiquidSizingResult ls = r.liquidSizing().orElseThrow();
            assertEquals(a, ls.areaWithoutKvM2() * 1e6, 1e-9 * a);
            assertEquals(form, ls.kvForm());
            assertTrue(ls.kv() <= 1.0);
            assertEquals(3e-4, r.relieved().viscosityPaS().getAsDouble(), 0.0);
        }
    }

    @Test
    void badInflowNamesTheField() {
        InvalidInputException neg = assertThrows(InvalidInputException.class, () -> InflowRate.mass(-1));
        assertEquals("blockedOutlet.inflow.value", neg.field());
        InvalidInputException liq = assertThrows(InvalidInputException.class, () -> new BlockedOutletInput(
                pure("n-hexane"), InflowRate.standardVolume(1, null), RelievedFluid.Phase.LIQUID, null, 300, 10e5,
                DeviceSpec.liquidValve(ATM), OptionalDouble.empty(), ViscosityCorrection.API520_10TH));
        assertEquals("blockedOutlet.inflow.kind", liq.field());
        InvalidInputException missing = assertThrows(InvalidInputException.class, () -> new BlockedOutletInput(
                pure("methane"), null, RelievedFluid.Phase.GAS, BlockedOutletInput.VapourTemperature.INFLOW_TEMPERATURE,
                300, 10e5, DeviceSpec.gasValve(ATM), OptionalDouble.empty(), null));
        assertEquals("blockedOutlet.inflow", missing.field());
    }
}
