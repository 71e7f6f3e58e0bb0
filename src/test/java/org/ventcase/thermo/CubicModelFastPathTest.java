package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.ventcase.common.PhysicalConstants.R;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Regression guards for the speed-ups in the EOS core: the per-temperature parameter object
 * ({@link CubicModel#at}), the mixing rule that reuses it, the allocation-free root choice
 * ({@link CubicModel#chooseZ}) and the pure-fluid fast path must give the same numbers as the
 * straightforward formulas they replace. These tests guard against a change in results, they do
 * not check the thermodynamics (other tests do). The reference values are computed here from
 * the textbook van der Waals one-fluid mixing rule written out directly (common practice, no
 * source), and from {@link CubicModel#select}, which builds every root explicitly.
 */
class CubicModelFastPathTest {

    /** Relative agreement demanded between the fast path and the straightforward formulas. */
    private static final double REL = 1e-10;

    private static CubicModel randomMixture(EosVariant v, Random rnd, int n) {
        List<Component> cs = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            cs.add(Fixtures.random(rnd));
        }
        double[][] k = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                k[i][j] = -0.05 + 0.2 * rnd.nextDouble();
                k[j][i] = k[i][j];
            }
        }
        return new CubicModel(v, cs, k);
    }

    private static double[] randomComposition(Random rnd, int n) {
        double[] x = new double[n];
        double s = 0;
        for (int i = 0; i < n; i++) {
            x[i] = rnd.nextDouble() + 1e-3;
            s += x[i];
        }
        for (int i = 0; i < n; i++) {
            x[i] /= s;
        }
        return x;
    }

    private static void assertRel(double expected, double actual, String what) {
        assertEquals(expected, actual, REL * Math.max(Math.abs(expected), 1e-300), what);
    }

    /**
     * a, da/dT, d2a/dT2, b and aBar_i from the double sum over sqrt(a_i a_j)(1 - k_ij), with the
     * temperature derivatives of each a_ij by the product and chain rules, exactly as the mixing
     * rule was coded before the per-temperature object existed.
     */
    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void mixingRuleMatchesTheDirectDoubleSum(EosVariant v) {
        Random rnd = new Random(11 + v.ordinal());
        for (int trial = 0; trial < 30; trial++) {
            int n = 1 + rnd.nextInt(8);
            CubicModel model = randomMixture(v, rnd, n);
            double[] x = randomComposition(rnd, n);
            double t = 80 + 600 * rnd.nextDouble();
            double[][] kij = model.kij();
            double[] ai = new double[n];
            double[] dai = new double[n];
            double[] d2ai = new double[n];
            for (int i = 0; i < n; i++) {
                Component c = model.components().get(i);
                double tr = t / c.tcK();
                AlphaFunction al = model.alpha(i);
                double ac = v.ac(c);
                ai[i] = ac * al.alpha(tr);
                dai[i] = ac * al.dAlpha(tr) / c.tcK();
                d2ai[i] = ac * al.d2Alpha(tr) / (c.tcK() * c.tcK());
            }
            double a = 0;
            double da = 0;
            double d2a = 0;
            double b = 0;
            double[] aBar = new double[n];
            for (int i = 0; i < n; i++) {
                b += x[i] * v.b(model.components().get(i));
                for (int j = 0; j < n; j++) {
                    double g = ai[i] * ai[j];
                    double sg = Math.sqrt(g);
                    double g1 = dai[i] * ai[j] + ai[i] * dai[j];
                    double g2 = d2ai[i] * ai[j] + 2 * dai[i] * dai[j] + ai[i] * d2ai[j];
                    double k = 1 - kij[i][j];
                    aBar[i] += x[j] * k * sg;
                    a += x[i] * x[j] * k * sg;
                    da += x[i] * x[j] * k * g1 / (2 * sg);
                    d2a += x[i] * x[j] * k * (g2 / (2 * sg) - g1 * g1 / (4 * g * sg));
                }
            }
            CubicModel.AtTemperature at = model.at(t);
            for (MixParams m : new MixParams[] {model.mix(t, x), model.mix(at, x)}) {
                String w = v + " n=" + n + " T=" + t;
                assertRel(a, m.a(), "a " + w);
                assertRel(da, m.dadt(), "da/dT " + w);
                // d2a/dT2 sums terms of both signs; compare on the scale of its largest term.
                double scale = Math.abs(d2a) + Math.abs(da) / t;
                assertEquals(d2a, m.d2adt2(), REL * scale, "d2a/dT2 " + w);
                assertRel(b, m.b(), "b " + w);
                for (int i = 0; i < n; i++) {
                    assertRel(aBar[i], m.aBar()[i], "aBar " + i + " " + w);
                }
            }
            assertEquals(t, at.t(), 0.0);
        }
    }

    /** chooseZ picks the same root as select(), which lists every root, for each request. */
    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void chooseZPicksTheSameRootAsSelect(EosVariant v) {
        Random rnd = new Random(23 + v.ordinal());
        for (int trial = 0; trial < 200; trial++) {
            int n = 1 + rnd.nextInt(5);
            CubicModel model = randomMixture(v, rnd, n);
            double[] x = randomComposition(rnd, n);
            double t = 80 + 600 * rnd.nextDouble();
            double p = Math.pow(10, 3 + 5 * rnd.nextDouble());
            MixParams m = model.mix(t, x);
            for (PhaseRequest r : PhaseRequest.values()) {
                double expected = model.select(m, p, r).z();
                // Same roots from the same arithmetic: identical, not merely close.
                assertEquals(expected, model.chooseZ(m, p, r), 0.0, v + " " + r + " T=" + t + " P=" + p);
            }
        }
    }

    /** The pure-fluid fast path equals select() plus G^R/RT at the selected root. */
    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void pureFastPathMatchesSelectAndResidualGibbs(EosVariant v) {
        Random rnd = new Random(37 + v.ordinal());
        for (int trial = 0; trial < 200; trial++) {
            Component c = trial == 0 ? Fixtures.propaneLike() : Fixtures.random(rnd);
            CubicModel model = CubicModel.pure(v, c);
            double t = c.tcK() * (0.4 + 1.2 * rnd.nextDouble());
            double p = c.pcPa() * Math.pow(10, -4 + 4.5 * rnd.nextDouble());
            MixParams m = model.mix(t, new double[] {1});
            for (PhaseRequest r : PhaseRequest.values()) {
                double z = model.select(m, p, r).z();
                double lnPhi = model.reducedResidualGibbs(m, p, z);
                double[] fast = model.pureZAndLnPhi(t, p, r);
                assertEquals(z, fast[0], 0.0, v + " " + r + " Z");
                assertRel(lnPhi, fast[1], v + " " + r + " ln phi at T=" + t + " P=" + p);
                // ln phi of a pure fluid is G^R/RT: also check against the mixture formula.
                double[] out = new double[1];
                model.lnPhi(m, p, z, out);
                assertEquals(out[0], fast[1], 1e-9 * (1 + Math.abs(out[0])), v + " " + r + " ln phi (mixture form)");
            }
        }
    }

    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void purePathStillRejectsMixtures(EosVariant v) {
        CubicModel model = randomMixture(v, new Random(5), 2);
        assertThrows(IllegalStateException.class, () -> model.pureZAndLnPhi(300, 1e5, PhaseRequest.STABLE));
    }

    /** Pressure from the equation at the chosen root's volume returns the given pressure. */
    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void chosenRootReproducesThePressure(EosVariant v) {
        Random rnd = new Random(41 + v.ordinal());
        for (int trial = 0; trial < 50; trial++) {
            int n = 1 + rnd.nextInt(4);
            CubicModel model = randomMixture(v, rnd, n);
            double[] x = randomComposition(rnd, n);
            double t = 100 + 500 * rnd.nextDouble();
            double p = Math.pow(10, 4 + 3 * rnd.nextDouble());
            CubicModel.AtTemperature at = model.at(t);
            MixParams m = model.mix(at, x);
            double z = model.chooseZ(m, p, PhaseRequest.STABLE);
            // Exact identity: Z is a root of the cubic, so P(T, v = Z R T/P) = P (round-off only).
            assertEquals(p, model.pressure(m, z * R * t / p), 1e-7 * p, v + " T=" + t + " P=" + p);
        }
    }
}
