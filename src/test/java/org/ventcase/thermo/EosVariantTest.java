package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.ventcase.common.InvalidInputException;

class EosVariantTest {

    @Test
    void vanDerWaalsConstantsAreExact() {
        // Source: van der Waals critical conditions, Omega_a = 27/64, Omega_b = 1/8, Zc = 3/8
        // (Smith, Van Ness, Abbott, Intro. Chem. Eng. Thermodynamics, 7th ed., Table 3.1).
        assertEquals(27.0 / 64.0, EosVariant.VDW.omegaA(), 1e-14);
        assertEquals(1.0 / 8.0, EosVariant.VDW.omegaB(), 1e-14);
        assertEquals(3.0 / 8.0, EosVariant.VDW.zc(), 1e-14);
    }

    @Test
    void redlichKwongConstantsMatchClosedForm() {
        // Source: Redlich & Kwong (1949): Omega_b = (2^(1/3) - 1)/3 = 0.08664,
        // Omega_a = 1/(9 (2^(1/3) - 1)) = 0.42748, Zc = 1/3.
        double c = Math.cbrt(2.0) - 1.0;
        assertEquals(c / 3.0, EosVariant.RK.omegaB(), 1e-14);
        assertEquals(1.0 / (9.0 * c), EosVariant.RK.omegaA(), 1e-13);
        assertEquals(1.0 / 3.0, EosVariant.RK.zc(), 1e-14);
        assertEquals(EosVariant.RK.omegaA(), EosVariant.SRK.omegaA(), 0.0);
    }

    @Test
    void pengRobinsonConstantsMatchPublished() {
        // Source: Peng & Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59, eqs. (9), (10) and text:
        // Omega_a = 0.45724, Omega_b = 0.07780, Zc = 0.307 (published to 5 and 3 digits).
        assertEquals(0.45724, EosVariant.PR76.omegaA(), 5e-6);
        assertEquals(0.07780, EosVariant.PR76.omegaB(), 5e-6);
        assertEquals(0.3074, EosVariant.PR78.zc(), 5e-5);
    }

    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void cubicHasTripleRootZcAtTheCriticalPoint(EosVariant v) {
        // Definition of the critical point of the equation (common practice, no source needed):
        // at Tc, Pc the three roots coincide at Zc.
        Component c = Fixtures.propaneLike();
        CubicModel model = CubicModel.pure(v, c);
        MixParams m = model.mix(c.tcK(), new double[] {1});
        CubicRoots r = model.roots(m, c.pcPa());
        assertEquals(RootCase.TRIPLE, r.rootCase(), r.toString());
        for (double z : r.physical()) {
            // a triple root is found to about the cube root of machine precision
            assertEquals(v.zc(), z, 1e-4);
        }
    }

    @Test
    void parsesNamesAndRefusesUnknown() {
        assertSame(EosVariant.PR78, EosVariant.parse("--eos", "PR"));
        assertSame(EosVariant.PR76, EosVariant.parse("--eos", "pr76"));
        assertSame(EosVariant.SRK, EosVariant.parse("--eos", "srk"));
        assertSame(EosVariant.VDW, EosVariant.parse("--eos", "vdW"));
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> EosVariant.parse("--eos", "BWR"));
        assertEquals("--eos", e.field());
    }

    @Test
    void pr78EqualsPr76BelowTheBreakAndDiffersAbove() {
        // Source: Robinson & Peng, GPA RR-28 (1978): same m(omega) for omega <= 0.491.
        assertEquals(MCorrelation.PENG_ROBINSON_1976.m(0.491), MCorrelation.PENG_ROBINSON_1978.m(0.491), 0.0);
        double w = 0.6;
        // Hand calculation: 0.379642 + 0.891018 - 0.059192 + 0.003600 = 1.215068
        assertEquals(1.215068, MCorrelation.PENG_ROBINSON_1978.m(w), 1e-6);
        // Hand calculation: 0.37464 + 0.925356 - 0.097171 = 1.202825
        assertEquals(1.202825, MCorrelation.PENG_ROBINSON_1976.m(w), 1e-6);
    }

    @Test
    void everyVariantIsOfferedOnceAndEveryOfferedNameParsesBackToIt() {
        // one registry for the names: the UI choices and messages read EosVariant.OFFERED
        org.junit.jupiter.api.Assertions.assertEquals(java.util.EnumSet.allOf(EosVariant.class),
                java.util.EnumSet.copyOf(EosVariant.OFFERED));
        org.junit.jupiter.api.Assertions.assertEquals(EosVariant.DEFAULT, EosVariant.OFFERED.get(0));
        for (EosVariant v : EosVariant.OFFERED) {
            assertSame(v, EosVariant.parse("eos", v.id()));
            org.junit.jupiter.api.Assertions.assertTrue(EosVariant.ACCEPTED.contains(v.id()), v.id());
        }
    }
}
