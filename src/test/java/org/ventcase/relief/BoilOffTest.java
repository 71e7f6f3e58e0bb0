package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.SaturationResult;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

class BoilOffTest {

    static final double P1 = 15e5;
    static final double Q = 1.5e6;

    static Vessel drum() {
        return Vessel.horizontal(2.0, 6, Head.ellipsoidal2to1(2.0), Head.ellipsoidal2to1(2.0));
    }

    static MixtureSpec fiveComponents() {
        ComponentLibrary lib = ComponentLibrary.builtIn();
        List<Component> cs = List.of(lib.get("ethane"), lib.get("propane"), lib.get("n-butane"), lib.get("n-pentane"),
                lib.get("n-hexane"));
        return MixtureSpec.withBuiltInKij(EosVariant.PR78, cs, new double[] {0.05, 0.35, 0.3, 0.2, 0.1},
                DensityBasis.TRANSLATED);
    }

    static BoilOffInput input(MixtureSpec f, double stop, int steps) {
        return new BoilOffInput(f, drum(), Level.ofPercentOfHeight(60), Q, P1, stop, 1e7, steps,
                DeviceSpec.gasValve(PhysicalConstants.ATM_PA));
    }

    @Test
    void pureFluidBoilsOffAtTheConstantBalanceLoad() {
        Component butane = ComponentLibrary.builtIn().get("n-butane");
        BoilOffResult r = BoilOff.run(input(MixtureSpec.pure(EosVariant.PR78, butane, DensityBasis.TRANSLATED), 0.2, 40));
        // Hand calculation from the saturation state at P1 (PureSaturation, independent of the simulation loop):
        // at constant P1 in a rigid vessel, W = Q / L x (1 - rho_V / rho_L) (balance derived in DEVELOPERS.md).
        SaturationResult s = new PureSaturation(CubicModel.pure(EosVariant.PR78, butane)).atPressure(P1,
                DensityBasis.TRANSLATED);
        double expected = Q / s.latentHeatJkg() * (1 - s.vapor().density() / s.liquid().density());
        for (BoilOffPoint p : r.curve()) {
            // Tolerance 1e-8 relative: round-off of the step differences and of the saturation solver (1e-10).
            assertEquals(expected, p.massFlowKgPerS(), 1e-8 * expected, "t = " + p.timeS());
            assertEquals(s.temperatureK(), p.temperatureK(), 1e-8 * s.temperatureK());
        }
        assertEquals(0.0, r.peakMinusInitialLoadPercent(), 1e-6);
    }

    @Test
    void massAndEnergyBalancesCloseOnTheReportedCurve() {
        MixtureSpec f = fiveComponents();
        BoilOffResult r = BoilOff.run(input(f, 0.1, 100));
        List<BoilOffPoint> c = r.curve();
        CubicModel model = f.model();
        BoilOffPoint first = c.get(0);
        BoilOffPoint last = c.get(c.size() - 1);
        // Vented mass and vented enthalpy from the reported rates and times (sum of W dt over the steps).
        double ventedMass = 0;
        double ventedH = 0;
        for (int k = 1; k < c.size(); k++) {
            double m = c.get(k).massFlowKgPerS() * (c.get(k).timeS() - c.get(k - 1).timeS());
            ventedMass += m;
            ventedH += m * c.get(k).ventedEnthalpyJPerKg();
        }
        double m0 = first.liquidMassKg() + first.vapourSpaceMassKg();
        double mf = last.liquidMassKg() + last.vapourSpaceMassKg();
        // Mass balance: initial = final + vented. Tolerance 1e-9 relative (round-off; the discrete
        // balance is exact by construction of the step).
        assertEquals(m0 - mf, ventedMass, 1e-9 * m0);
        // Energy balance with U recomputed here from the reported end states (bubble point of the reported
        // liquid at P1, phase masses as reported): Q t = U_f - U_0 + vented enthalpy.
        double u0 = internalEnergy(model, f, first);
        double uf = internalEnergy(model, f, last);
        double heat = Q * last.timeS();
        // Tolerance 1e-6 of the heat: the bubble point is re-solved here to 1e-10 in ln K and the
        // reported compositions are exact copies.
        assertEquals(heat, uf - u0 + ventedH, 1e-6 * heat);
        assertEquals(0.0, r.balance().massResidualKg(), 1e-9 * m0);
        assertEquals(0.0, r.balance().energyResidualJ(), 1e-9 * heat);
        // The fixed volume is filled at the end: n_L v_L + n_G v_V = V (1e-9 relative).
        BoilingState bs = BoilingState.at(model, DensityBasis.TRANSLATED, P1, last.liquid(), Double.NaN, null);
        double vol = last.liquidMassKg() / (bs.liquidProps().molarMass() * 1e-3) * bs.liquidMolarVolume()
                + last.vapourSpaceMassKg() / (bs.vapourProps().molarMass() * 1e-3) * bs.vapourMolarVolume();
        assertEquals(drum().totalVolume(), vol, 1e-6 * drum().totalVolume());
    }

    private static double internalEnergy(CubicModel model, MixtureSpec f, BoilOffPoint p) {
        BoilingState bs = BoilingState.at(model, DensityBasis.TRANSLATED, P1, p.liquid(), Double.NaN, null);
        double nL = p.liquidMassKg() / (bs.liquidProps().molarMass() * 1e-3);
        double nG = p.vapourSpaceMassKg() / (bs.vapourProps().molarMass() * 1e-3);
        return nL * bs.hLiquidJmol() + nG * bs.hVapourJmol() - P1 * drum().totalVolume();
    }

    @Test
    void wideBoilingLiquidHeatsUpAndItsVapourGetsHeavier() {
        BoilOffResult r = BoilOff.run(input(fiveComponents(), 0.1, 100));
        List<BoilOffPoint> c = r.curve();
        // Physics (common practice, no source): the light ends boil first, so T_bubble rises and the
        // vapour's molar mass rises as the liquid is depleted.
        for (int k = 1; k < c.size(); k++) {
            assertTrue(c.get(k).temperatureK() > c.get(k - 1).temperatureK());
        }
        assertTrue(c.get(c.size() - 1).vapourMolarMass() > c.get(0).vapourMolarMass());
        assertTrue(r.peakAreaM2() >= r.initialAreaM2());
        assertEquals(100 * (r.peakAreaM2() - r.initialAreaM2()) / r.initialAreaM2(), r.peakMinusInitialAreaPercent(),
                1e-9);
        assertEquals(BoilOffResult.StopReason.LIQUID_FRACTION_REACHED, r.stopReason());
        assertEquals(r.peak().vapourMolarMass(), r.peakVapour().molarMass(), 1e-12);
    }

    @Test
    void peakIsStableUnderStepRefinement() {
        BoilOffResult coarse = BoilOff.run(input(fiveComponents(), 0.1, 50));
        BoilOffResult fine = BoilOff.run(input(fiveComponents(), 0.1, 200));
        // The method is second order in the step (trapezoid); 1 % between 50 and 200 steps is a loose
        // bound chosen so that a first-order error or a wrong step duration would show.
        assertEquals(fine.peakAreaM2(), coarse.peakAreaM2(), 0.01 * fine.peakAreaM2());
        assertEquals(fine.curve().get(fine.curve().size() - 1).timeS(),
                coarse.curve().get(coarse.curve().size() - 1).timeS(),
                0.01 * fine.curve().get(fine.curve().size() - 1).timeS());
    }

    @Test
    void timeLimitStopsTheRun() {
        MixtureSpec f = fiveComponents();
        BoilOffResult r = BoilOff.run(new BoilOffInput(f, drum(), Level.ofPercentOfHeight(60), Q, P1, 0, 600, 100,
                DeviceSpec.gasValve(PhysicalConstants.ATM_PA)));
        assertEquals(BoilOffResult.StopReason.TIME_LIMIT, r.stopReason());
        List<BoilOffPoint> c = r.curve();
        assertTrue(c.get(c.size() - 1).timeS() >= 600 && c.get(c.size() - 2).timeS() < 600);
    }

    @Test
    void negativeHeatNamesTheField() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new BoilOffInput(fiveComponents(),
                drum(), Level.ofPercentOfHeight(60), -1, P1, 0, 600, 100, DeviceSpec.gasValve(1e5)));
        assertEquals("boilOff.heat", e.field());
        InvalidInputException m = assertThrows(InvalidInputException.class, () -> new BoilOffInput(null,
                drum(), Level.ofPercentOfHeight(60), Q, P1, 0, 600, 100, DeviceSpec.gasValve(1e5)));
        assertEquals("boilOff.fluid", m.field());
    }
}
