package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Contract for every alpha kind: alpha(1) = 1 and analytic derivatives equal central differences. */
class AlphaFunctionTest {

    static Stream<AlphaFunction> alphas() {
        return Stream.of(new AlphaFunction.Constant(), new AlphaFunction.RedlichKwong(),
                new AlphaFunction.Soave(MCorrelation.SOAVE_1972.m(0.2), MCorrelation.SOAVE_1972),
                new AlphaFunction.Soave(MCorrelation.PENG_ROBINSON_1976.m(0.35), MCorrelation.PENG_ROBINSON_1976),
                new AlphaFunction.Soave(MCorrelation.PENG_ROBINSON_1978.m(0.9), MCorrelation.PENG_ROBINSON_1978),
                new AlphaFunction.Soave(MCorrelation.SOAVE_1972.m(-0.2), MCorrelation.SOAVE_1972));
    }

    @ParameterizedTest
    @MethodSource("alphas")
    void isOneAtTheCriticalTemperature(AlphaFunction a) {
        // Definition: a(Tc) = a_c (common practice, no source)
        assertEquals(1.0, a.alpha(1.0), 1e-15);
    }

    @ParameterizedTest
    @MethodSource("alphas")
    void derivativesMatchCentralDifferences(AlphaFunction a) {
        for (double tr : new double[] {0.3, 0.7, 0.95, 1.0, 1.5, 3.0}) {
            double h = 1e-5 * tr;
            double d1 = (a.alpha(tr + h) - a.alpha(tr - h)) / (2 * h);
            double d2 = (a.dAlpha(tr + h) - a.dAlpha(tr - h)) / (2 * h);
            assertEquals(d1, a.dAlpha(tr), 1e-8 * (1 + Math.abs(d1)), a.describe() + " at " + tr);
            assertEquals(d2, a.d2Alpha(tr), 1e-7 * (1 + Math.abs(d2)), a.describe() + " at " + tr);
        }
    }
}
