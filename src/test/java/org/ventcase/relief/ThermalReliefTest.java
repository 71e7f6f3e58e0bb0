package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.mix.MixtureThermo;

class ThermalReliefTest {

    static MixtureSpec liquid(String name) {
        return MixtureSpec.pure(EosVariant.PR78, ComponentLibrary.builtIn().get(name), DensityBasis.TRANSLATED);
    }

    @Test
    void publishedExampleWithItsStatedProperties() {
        // Source: API Std 521 thermal relief example (REFERENCES.md section 10 [S]): phi 34 kW,
        // alpha_v 0.00111 1/C, d 0.994 (rho = 994 kg/m3), c 4200 J/(kg K) -> q = 9.04e-6 m3/s.
        double q = ThermalRelief.rateM3PerS(0.00111, 34_000, 994, 4200);
        // Tolerance: the published value has three significant figures.
        assertEquals(9.04e-6, q, 0.005e-6);
    }

    @Test
    void eosLiquidAgreesWithAHandCalculationAndTheStandardFormula() {
        MixtureSpec hexane = liquid("n-hexane");
        double t = 320;
        double p = 10e5;
        ThermalReliefResult r = ThermalRelief.run(new ThermalReliefInput(hexane, t, p, 50_000));
        CubicModel m = hexane.model();
        // Hand calculation from the EOS by central differences (+/- 0.01 K) of the liquid root:
        // alpha_v = (dv/dT)_P / v, c = (dh/dT)_P, q = alpha_v phi / (rho c).
        double d = 0.01;
        FluidProperties a = m.properties(t - d, p, new double[] {1}, PhaseRequest.LIQUID, DensityBasis.TRANSLATED);
        FluidProperties b = m.properties(t + d, p, new double[] {1}, PhaseRequest.LIQUID, DensityBasis.TRANSLATED);
        FluidProperties o = m.properties(t, p, new double[] {1}, PhaseRequest.LIQUID, DensityBasis.TRANSLATED);
        double alpha = (b.molarVolume() - a.molarVolume()) / (2 * d) / o.molarVolume();
        double ha = MixtureThermo.idealGasEnthalpy(m, t - d, new double[] {1}) + a.residualEnthalpy();
        double hb = MixtureThermo.idealGasEnthalpy(m, t + d, new double[] {1}) + b.residualEnthalpy();
        double c = (hb - ha) / (2 * d) / (o.molarMass() * 1e-3);
        // Tolerance 1e-6 relative: truncation error of a 10 mK central difference on a smooth liquid branch.
        assertEquals(alpha, r.expansionCoefficientPerK(), 1e-6 * alpha);
        assertEquals(c, r.specificHeatJPerKgK(), 1e-6 * c);
        double q = alpha * 50_000 / (o.density() * c);
        assertEquals(q, r.volumetricRateM3PerS(), 2e-6 * q);
        // The standard's form with d = rho / 1000 gives the same number (identity).
        assertEquals(r.volumetricRateM3PerS(), r.formulaCheckM3PerS(), 1e-15);
        assertFalse(r.vapourGenerationGoverns());
        // Order of magnitude: hydrocarbon liquids expand about 1e-3 1/K (common practice, no source).
        assertTrue(alpha > 5e-4 && alpha < 3e-3, "alpha " + alpha);
    }

    @Test
    void liquidAboveItsBubblePressureWarnsThatVapourGenerationGoverns() {
        // Propane at 320 K has a vapour pressure near 1.6 MPa (from memory); P1 = 1.0 MPa is below it.
        ThermalReliefResult r = ThermalRelief.run(new ThermalReliefInput(liquid("propane"), 320, 10e5, 10_000));
        assertTrue(r.vapourGenerationGoverns());
        assertTrue(r.bubblePressurePa().getAsDouble() > 10e5);
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("vapour generation governs")));
    }

    @Test
    void negativeHeatNamesTheField() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new ThermalReliefInput(liquid("n-hexane"), 300, 10e5, -5));
        assertEquals("thermal.heat", e.field());
    }
}
