package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.SaturationResult;
import org.ventcase.thermo.mix.MixtureThermo;

class NearCriticalFireTest {

    static final double Q = 8e5;
    static final double V = 20;
    static final double P1 = 7e6;

    static MixtureSpec ethane() {
        return MixtureSpec.pure(EosVariant.PR78, ComponentLibrary.builtIn().get("ethane"), DensityBasis.TRANSLATED);
    }

    static NearCriticalFireResult run(int steps) {
        // Ethane (Tc about 305 K, Pc about 4.9 MPa) stored dense at 290 K, 6 MPa; P1 = 7 MPa is above Pc,
        // so the contents stay single-phase through the heat-up.
        return NearCriticalFire.run(new NearCriticalFireInput(ethane(), V, Q, P1, 290, 6e6, 420, steps,
                DeviceSpec.gasValve(PhysicalConstants.ATM_PA)));
    }

    @Test
    void singlePhaseLoadIsHeatTimesDvDhOverVByFiniteDifference() {
        NearCriticalFireResult r = run(40);
        CubicModel model = ethane().model();
        double[] x = {1};
        for (NearCriticalFireResult.Point p : r.curve()) {
            assertFalse(p.twoPhase());
            double d = 1e-3;
            double va = vol(model, p.temperatureK() - d);
            double vb = vol(model, p.temperatureK() + d);
            double ha = enth(model, p.temperatureK() - d);
            double hb = enth(model, p.temperatureK() + d);
            double v = vol(model, p.temperatureK());
            // Hand calculation (single-phase limit of the balance): W = Q (dv/dh)_P / v, with (dv/dh)_P by
            // central differences of the EOS at +/- 1 mK. Tolerance 1e-4 relative: truncation error of
            // the difference near the pseudo-critical peak, where v(T) bends sharply.
            double expected = Q * (vb - va) / (hb - ha) / v;
            assertEquals(expected, p.massFlowKgPerS(), 1e-4 * expected, "T = " + p.temperatureK());
            assertEquals(0.0, p.outflowEnthalpyExcess(), 0.0);
        }
        assertEquals(V / vol(model, r.openingTemperatureK()), r.curve().get(0).massKg(), 1e-9 * r.initialMassKg());
        assertEquals(r.initialMassKg(), r.curve().get(0).massKg(), 1e-6 * r.initialMassKg());
    }

    private static double vol(CubicModel m, double t) {
        FluidProperties fp = m.properties(t, P1, new double[] {1}, PhaseRequest.STABLE, DensityBasis.TRANSLATED);
        return fp.molarVolume() / (fp.molarMass() * 1e-3);
    }

    private static double enth(CubicModel m, double t) {
        FluidProperties fp = m.properties(t, P1, new double[] {1}, PhaseRequest.STABLE, DensityBasis.TRANSLATED);
        return (MixtureThermo.idealGasEnthalpy(m, t, new double[] {1}) + fp.residualEnthalpy())
                / (fp.molarMass() * 1e-3);
    }

    @Test
    void sizedForTheLargestAreaAndVentedMassMatchesTheLoadCurve() {
        NearCriticalFireResult r = run(400);
        List<NearCriticalFireResult.Point> c = r.curve();
        for (NearCriticalFireResult.Point p : c) {
            assertTrue(r.governing().requiredAreaM2() >= p.requiredAreaM2());
        }
        assertEquals(r.governing().requiredAreaM2(), r.governingSizing().areaM2(), 1e-9 * r.governingSizing().areaM2());
        // Mass balance: integral of W dt (trapezoid over the reported curve) equals the mass lost, V/v
        // at the start minus V/v at the end. Tolerance 0.5 %: trapezoid error with 400 steps.
        double vented = 0;
        for (int k = 1; k < c.size(); k++) {
            vented += 0.5 * (c.get(k).massFlowKgPerS() + c.get(k - 1).massFlowKgPerS())
                    * (c.get(k).timeS() - c.get(k - 1).timeS());
            assertTrue(c.get(k).massKg() < c.get(k - 1).massKg());
        }
        double lost = c.get(0).massKg() - c.get(c.size() - 1).massKg();
        assertEquals(lost, vented, 0.005 * lost);
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("transient")));
    }

    @Test
    void generalBalanceWithSaturatedVapourOutflowIsQOverLTimesDisplacement() {
        // Pure n-butane, two-phase at P1 = 10 bar abs (below its critical point). Along the two-phase line at
        // fixed P: v = v_L + q (v_V - v_L), h = h_L + q L, so (dv/dh)_P = (v_V - v_L)/L; saturated vapour
        // leaves, h_out = h_V. The balance must give Q/L (1 - rho_V/rho_L) at any quality q (hand algebra:
        // v + (dv/dh)(h_V - h) = v_V).
        SaturationResult s = new PureSaturation(CubicModel.pure(EosVariant.PR78,
                ComponentLibrary.builtIn().get("n-butane"))).atPressure(10e5, DensityBasis.TRANSLATED);
        double vl = 1 / s.liquid().density();
        double vv = 1 / s.vapor().density();
        double l = s.latentHeatJkg();
        double expected = Q / l * (1 - s.vapor().density() / s.liquid().density());
        for (double q : new double[] {0.01, 0.3, 0.9}) {
            double v = vl + q * (vv - vl);
            double w = NearCriticalFire.generalLoad(Q, (vv - vl) / l, v, (1 - q) * l);
            // Tolerance 1e-12 relative: an algebraic identity evaluated in floating point.
            assertEquals(expected, w, 1e-12 * expected, "quality " + q);
        }
    }

    @Test
    void initialPressureAboveP1NamesTheField() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new NearCriticalFireInput(ethane(),
                V, Q, P1, 290, 8e6, 420, 10, DeviceSpec.gasValve(1e5)));
        assertEquals("nearCritical.initialPressure", e.field());
    }

    @Test
    void aGivenInitialSpecificVolumeEqualToTheFlashedOneChangesNothing() {
        NearCriticalFireResult flashed = run(20);
        double v0 = V / flashed.initialMassKg();
        NearCriticalFireResult given = NearCriticalFire.run(new NearCriticalFireInput(ethane(), V, Q, P1, 290, 6e6, 420,
                20, DeviceSpec.gasValve(101_325), java.util.OptionalDouble.of(v0)));
        // Hand calculation: the same v0 must give the same opening temperature and curve (identity, to round-off)
        assertEquals(flashed.openingTemperatureK(), given.openingTemperatureK(), 1e-9 * flashed.openingTemperatureK());
        assertEquals(flashed.governing().massFlowKgPerS(), given.governing().massFlowKgPerS(),
                1e-9 * flashed.governing().massFlowKgPerS());
    }

    @Test
    void aDenserInventoryOpensAtALowerTemperature() {
        NearCriticalFireResult flashed = run(20);
        double v0 = V / flashed.initialMassKg();
        NearCriticalFireResult denser = NearCriticalFire.run(new NearCriticalFireInput(ethane(), V, Q, P1, 290, 6e6, 420,
                20, DeviceSpec.gasValve(101_325), java.util.OptionalDouble.of(0.8 * v0)));
        // Hand calculation: v(T, P1) rises with T, so v(T_open) = 0.8 v0 is reached at a lower T_open
        assertTrue(denser.openingTemperatureK() < flashed.openingTemperatureK());
    }
}
