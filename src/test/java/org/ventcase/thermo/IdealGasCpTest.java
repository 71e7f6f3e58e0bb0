package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.SimpsonIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class IdealGasCpTest {

    private final ComponentLibrary lib = ComponentLibrary.builtIn();

    /**
     * Ideal-gas Cp at 298.15 K from the stored polynomials against values from a different source
     * than the coefficients. Tolerance 1.5 % (the polynomials are fits over 50..1000 K).
     * Inorganics, methane and ethylene: NIST-JANAF Thermochemical Tables, 4th ed. (M.W. Chase, 1998),
     * values from memory. Ethane, propane, benzene, vinyl chloride, ethylene oxide: NIST Chemistry
     * WebBook (TRC) values, from memory.
     */
    @ParameterizedTest
    @CsvSource({
            "nitrogen,29.124", "oxygen,29.376", "hydrogen,28.836", "carbon monoxide,29.142",
            "carbon dioxide,37.129", "water,33.590", "ammonia,35.630", "hydrogen sulfide,34.192",
            "sulfur dioxide,39.878", "chlorine,33.949", "argon,20.786", "helium,20.786", "methane,35.639",
            "ethylene,42.886", "ethane,52.49", "propane,73.60", "benzene,82.44", "vinyl chloride,53.72",
            "ethylene oxide,48.19"})
    void cpAt298MatchesPublishedValue(String name, double cpJPerMolK) {
        double cp = lib.get(name).cp().cp(298.15);
        assertEquals(cpJPerMolK, cp, 0.015 * cpJPerMolK, name);
    }

    @Test
    void enthalpyAndEntropyAreTheIntegralsOfCp() {
        // Independent: Apache Commons Math 3.6.1 SimpsonIntegrator on Cp and Cp/T.
        SimpsonIntegrator simpson = new SimpsonIntegrator(1e-10, 1e-12, 3, 30);
        for (Component c : lib.all()) {
            IdealGasCp cp = c.cp();
            double t0 = Math.max(cp.tMinK(), 200);
            double t1 = cp.tMaxK();
            double h = simpson.integrate(1_000_000, cp::cp, t0, t1);
            double s = simpson.integrate(1_000_000, t -> cp.cp(t) / t, t0, t1);
            assertEquals(h, cp.enthalpyChange(t0, t1), 1e-7 * Math.abs(h), c.name());
            assertEquals(s, cp.entropyChange(t0, t1), 1e-7 * Math.abs(s), c.name());
            assertEquals(-cp.enthalpyChange(t0, t1), cp.enthalpyChange(t1, t0), 1e-9 * Math.abs(h), c.name());
        }
    }

    @Test
    void cpIsPositiveAcrossTheFittedRange() {
        // Common practice, no source: an ideal-gas Cp is at least 5/2 R (translational part) everywhere.
        for (Component c : lib.all()) {
            IdealGasCp cp = c.cp();
            for (double t = Math.max(cp.tMinK(), 50); t <= cp.tMaxK(); t += 10) {
                assertTrue(cp.cpOverR(t) > 2.5 - 0.05, c.name() + " at " + t + " K: " + cp.cpOverR(t));
            }
        }
    }

    @Test
    void rangeAndArgumentsAreChecked() {
        IdealGasCp cp = lib.get("propane").cp();
        assertTrue(cp.inRange(298.15));
        assertFalse(cp.inRange(1500));
        assertThrows(IllegalArgumentException.class, () -> new IdealGasCp(new double[] {1, 2}, 1, 2, "x"));
        assertThrows(IllegalArgumentException.class,
                () -> new IdealGasCp(new double[] {1, 0, 0, 0, Double.NaN}, 1, 2, "x"));
        assertThrows(IllegalArgumentException.class, () -> new IdealGasCp(new double[5], 300, 200, "x"));
    }
}
