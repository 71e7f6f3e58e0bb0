package org.ventcase.relief;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.PureSaturation;

/**
 * The two-point omega from the EOS. Check values by derivation: a near-ideal vapour expands along
 * P v^k = const, so omega = 9 (0.9^(-1/k) - 1) with k the ideal-gas Cp/Cv; a saturated liquid that
 * flashes is far more compressible than its liquid alone (omega well above 0) and a subcooled
 * liquid far from flashing nearly incompressible (omega near 0).
 */
class TwoPointOmegaTest {

    private static final Component PROPANE = ComponentLibrary.builtIn().find("propane").orElseThrow();

    @Test
    void nearIdealVapourFollowsItsIsentrope() {
        CubicModel m = CubicModel.pure(EosVariant.DEFAULT, PROPANE);
        double t = 400;
        double p = 1e5;
        TwoPointOmega o = TwoPointOmega.of(m, t, p, new double[] {1});
        double k = m.properties(t, p, new double[] {1}, org.ventcase.thermo.PhaseRequest.VAPOR,
                DensityBasis.TRANSLATED).kIdeal();
        double ideal = 9 * (Math.pow(0.9, -1 / k) - 1);
        assertEquals(ideal, o.omega(), 0.02 * ideal, "omega of propane vapour at 400 K, 1 bar");
    }

    @Test
    void saturatedLiquidFlashesSubcooledLiquidDoesNot() {
        CubicModel m = CubicModel.pure(EosVariant.DEFAULT, PROPANE);
        double t = 320;
        double psat = new PureSaturation(m).atTemperature(t, DensityBasis.TRANSLATED).pressurePa();
        // just below the bubble point: the 10 % pressure drop flashes part of the liquid
        TwoPointOmega sat = TwoPointOmega.of(m, t, psat * 1.0001, new double[] {1});
        // strongly subcooled: 0.9 P0 stays far above the saturation pressure
        TwoPointOmega sub = TwoPointOmega.of(m, t, psat * 3, new double[] {1});
        assertTrue(sat.omega() > 1, "a flashing saturated liquid: omega " + sat.omega());
        assertTrue(sub.omega() < 0.05, "a subcooled liquid: omega " + sub.omega());
        assertTrue(sat.t9() < t, "the flash cools the fluid");
        assertTrue(List.of(sat.v0(), sat.v9()).stream().allMatch(v -> v > 0));
    }
}
