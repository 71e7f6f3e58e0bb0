package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Saturation at a given pressure never fails on an ordinary state: for every built-in component
 * and every variant with a volume shift, random temperatures from Tr 0.45 to 0.95 (fixed seed), the
 * vapour pressure there, and back: Tsat(Psat(T)) = T. Invariant (no external values). A first
 * version bracketed the search at Tr 0.2, where the vapour pressure of methanol, ethanol and
 * n-decane (~1e-11 Pa) cannot be resolved, and every Tsat(P) for them failed.
 */
class SaturationAtPressureRoundTripTest {

    @Test
    void tsatOfPsatIsTheTemperatureForEveryComponentAndVariant() {
        Random rnd = new Random(20261203);
        List<String> failures = new ArrayList<>();
        int n = 0;
        for (Component c : ComponentLibrary.builtIn().all()) {
            for (EosVariant v : new EosVariant[] {EosVariant.PRTWU, EosVariant.PR78, EosVariant.PR76, EosVariant.SRK}) {
                CubicModel m = CubicModel.pure(v, c);
                PureSaturation sat = new PureSaturation(m);
                for (int k = 0; k < 12; k++) {
                    double t = (0.45 + 0.5 * rnd.nextDouble()) * m.tc(0);
                    n++;
                    try {
                        double p = sat.pressure(t);
                        double back = sat.atPressure(p, DensityBasis.TRANSLATED).temperatureK();
                        if (!(Math.abs(back / t - 1) < 1e-7)) {
                            failures.add(c.name() + " " + v + " " + t + " K -> " + back + " K");
                        }
                    } catch (RuntimeException e) {
                        failures.add(c.name() + " " + v + " " + t + " K: " + e.getMessage());
                    }
                }
            }
        }
        assertTrue(failures.isEmpty(), failures.size() + " of " + n + ":\n  " + String.join("\n  ",
                failures.subList(0, Math.min(20, failures.size()))));
    }
}
