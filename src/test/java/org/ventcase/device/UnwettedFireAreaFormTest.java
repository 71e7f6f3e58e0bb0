package org.ventcase.device;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.ventcase.relief.UnwettedVesselFire;
import org.ventcase.relief.UnwettedVesselFireInput;
import org.ventcase.relief.UnwettedVesselFireResult;

/** The F' area form of the gas-filled vessel fire equals the load fed into the critical gas equation. */
class UnwettedFireAreaFormTest {

    @Test
    void fPrimeAreaEqualsCriticalAreaOfTheLoad() {
        UnwettedVesselFireInput in = UnwettedVesselFireInput.carbonSteel(50, 28.97, 700e3, 500e3, 300);
        UnwettedVesselFireResult load = UnwettedVesselFire.reliefRate(in);
        GasSizingResult gas = GasSizing.size(new GasSizingInput(load.massFlowKgPerS(), 700e3, 101_325,
                load.relievingTemperatureK(), 1.0, 28.97, OptionalDouble.of(1.4), 0.975, 1, 1));
        double fPrime = UnwettedVesselFire.fPrimeSi(GasSizing.coefficientC(1.4), 0.975,
                UnwettedVesselFire.CARBON_STEEL_WALL_K, load.relievingTemperatureK());
        // Hand calculation (REFERENCES.md 2 [D]): A = F' A' / sqrt(P1) is the same algebra, so the two
        // agree to round-off.
        assertEquals(gas.areaMm2(), fPrime * 50 / Math.sqrt(700), 1e-9 * gas.areaMm2());
    }
}
