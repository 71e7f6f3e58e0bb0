package org.ventcase.device;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

/**
 * The omega method's equations checked by derivation (no worked example is used; the published
 * method's source is named in OmegaMethod, from memory). Each check value says how it follows.
 */
class OmegaMethodTest {

    @Test
    void omegaOneIsTheIsothermalIdealGas() {
        // omega = 1: the critical equation becomes 1 + 2 ln eta_c = 0, so eta_c = exp(-1/2)
        // (derivation; the isothermal ideal-gas critical pressure ratio)
        assertEquals(Math.exp(-0.5), OmegaMethod.criticalRatio(1.0), 1e-12);
        // and G = eta_c sqrt(P0 / v0), the isothermal ideal gas's critical flux sqrt(P0 rho0) e^(-1/2)
        OmegaMethod.Result r = OmegaMethod.size(1.0, 1e6, 1e5, 0.05, 1.0, 1.0, 1.0, 1.0);
        assertTrue(r.critical());
        assertEquals(Math.exp(-0.5) * Math.sqrt(1e6 / 0.05), r.massFluxKgM2S(), 1e-9 * r.massFluxKgM2S());
    }

    @Test
    void smallOmegaTendsToBernoulliForAnIncompressibleLiquid() {
        // omega -> 0: -2[omega ln eta + (omega - 1)(1 - eta)] -> 2 (1 - eta), the denominator -> 1,
        // so G -> sqrt(2 rho0 (P0 - Pa)) (derivation: Bernoulli)
        double p0 = 2e6;
        double pa = 1e6;
        double v0 = 1.0 / 500.0;
        OmegaMethod.Result r = OmegaMethod.size(1.0, p0, pa, v0, 1e-6, 1.0, 1.0, 1.0);
        assertFalse(r.critical(), "a nearly incompressible liquid is not choked at half the inlet pressure");
        assertEquals(Math.sqrt(2 * 500.0 * (p0 - pa)), r.massFluxKgM2S(), 1e-4 * r.massFluxKgM2S());
    }

    @Test
    void criticalAndSubcriticalFluxesMeetAtTheCriticalRatio() {
        // at eta_a = eta_c the subcritical flux is the maximum of the flux over eta, equal to the
        // critical flux (derivation: the critical equation is dG/d eta = 0)
        for (double omega : new double[] {0.2, 0.7, 1.0, 3.0, 10.0, 40.0}) {
            double etaC = OmegaMethod.criticalRatio(omega);
            double gc = OmegaMethod.criticalFlux(1e6, 0.02, omega, etaC);
            double gs = OmegaMethod.subcriticalFlux(1e6, 0.02, omega, etaC);
            assertEquals(gc, gs, 1e-9 * gc, "omega " + omega);
            assertTrue(OmegaMethod.subcriticalFlux(1e6, 0.02, omega, Math.min(0.999, etaC * 1.05)) < gc);
        }
    }

    @Test
    void criticalRatioRisesWithOmegaBetweenItsLimits() {
        // eta_c increases with omega, from 0 (incompressible) towards 1 (derivation of the limits)
        double last = 0;
        for (double omega : new double[] {0.05, 0.2, 1, 5, 20, 100}) {
            double e = OmegaMethod.criticalRatio(omega);
            assertTrue(e > last && e < 1, "omega " + omega + ": " + e);
            last = e;
        }
    }

    @Test
    void omegaFromTwoSpecificVolumesAndBadInput() {
        // omega = 9 (v9/v0 - 1): a mixture whose volume grows 10 % over the 10 % pressure drop has omega 0.9
        assertEquals(0.9, OmegaMethod.omega(0.01, 0.011), 1e-12);
        assertThrows(InvalidInputException.class, () -> OmegaMethod.omega(0.01, 0.009));
        assertThrows(InvalidInputException.class, () -> OmegaMethod.size(1, 1e6, 2e6, 0.01, 1, 0.85, 1, 1));
        assertThrows(InvalidInputException.class, () -> OmegaMethod.criticalRatio(0));
    }

    @Test
    void areaIsTheLoadOverTheCorrectedFlux() {
        OmegaMethod.Result r = OmegaMethod.size(10.0, 1.5e6, 1.0e5, 0.03, 4.0, 0.85, 1.0, 1.0);
        assertEquals(10.0 / (0.85 * r.massFluxKgM2S()), r.areaM2(), 1e-12 * r.areaM2());
    }
}
