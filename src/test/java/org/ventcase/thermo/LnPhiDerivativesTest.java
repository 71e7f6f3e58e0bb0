package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.ventcase.common.PhysicalConstants.R;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The analytic composition, temperature and pressure derivatives of ln phi
 * ({@link CubicModel#lnPhiDerivatives}) against central finite differences of
 * {@link CubicModel#lnPhi} on the same root, and against exact identities of classical
 * thermodynamics (common practice, no source): the Gibbs-Duhem relation
 * sum_i x_i N d ln phi_i/d n_j = 0 with a symmetric matrix, sum_i x_i d ln phi_i/dT = -H^R/(R T^2)
 * and sum_i x_i d ln phi_i/d ln P = Z - 1.
 */
class LnPhiDerivativesTest {

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
            x[i] = rnd.nextDouble() + 0.02;
            s += x[i];
        }
        for (int i = 0; i < n; i++) {
            x[i] /= s;
        }
        return x;
    }

    /** ln phi on the branch of the given root (smallest or largest), at (t, p, x). */
    private static double[] lnPhiOnBranch(CubicModel model, double t, double p, double[] x, PhaseRequest branch) {
        MixParams m = model.mix(t, x);
        double z = model.chooseZ(m, p, branch);
        double[] out = new double[x.length];
        model.lnPhi(m, p, z, out);
        return out;
    }

    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void derivativesAgreeWithFiniteDifferencesAndIdentities(EosVariant v) {
        Random rnd = new Random(101 + v.ordinal());
        int checked = 0;
        for (int trial = 0; trial < 60; trial++) {
            int n = 1 + rnd.nextInt(6);
            CubicModel model = randomMixture(v, rnd, n);
            double[] x = randomComposition(rnd, n);
            double t = 100 + 500 * rnd.nextDouble();
            double p = Math.pow(10, 4 + 3 * rnd.nextDouble());
            CubicModel.AtTemperature at = model.at(t);
            MixParams m = model.mix(at, x);
            RootSelection sel = model.select(m, p, PhaseRequest.STABLE);
            PhaseRequest branch = sel.roots().count() == 1 ? PhaseRequest.STABLE
                    : sel.liquidLike() ? PhaseRequest.LIQUID : PhaseRequest.VAPOR;
            double z = sel.z();
            double[] lnPhi = new double[n];
            model.lnPhi(m, p, z, lnPhi);
            double[] dT = new double[n];
            double[] dP = new double[n];
            double[][] dn = new double[n][n];
            model.lnPhiDerivatives(at, m, x, p, z, dT, dP, dn);
            String where = v + " n=" + n + " T=" + t + " P=" + p + " Z=" + z;

            // Exact identities (round-off only).
            double sumT = 0;
            double sumP = 0;
            for (int i = 0; i < n; i++) {
                sumT += x[i] * dT[i];
                sumP += x[i] * dP[i];
            }
            double hR = model.residualEnthalpy(m, p, z);
            assertEquals(-hR / (R * t * t), sumT, 1e-9 * (Math.abs(hR / (R * t * t)) + 1e-6), "sum x dT " + where);
            assertEquals(z - 1, sumP, 1e-9 * (1 + Math.abs(z)), "sum x dlnP " + where);
            double scaleN = 0;
            for (double[] row : dn) {
                for (double e : row) {
                    scaleN = Math.max(scaleN, Math.abs(e));
                }
            }
            for (int j = 0; j < n; j++) {
                double s = 0;
                for (int i = 0; i < n; i++) {
                    s += x[i] * dn[i][j];
                    assertEquals(dn[i][j], dn[j][i], 0.0, "symmetry " + where);
                }
                assertEquals(0.0, s, 1e-9 * (1 + scaleN), "Gibbs-Duhem column " + j + " " + where);
            }

            // Central differences on the same root branch; step 1e-5 relative, truncation error
            // O(1e-10) relative, round-off O(1e-11); tolerance 1e-6 of the local scale.
            double ht = 1e-5 * t;
            double[] tp = lnPhiOnBranch(model, t + ht, p, x, branch);
            double[] tm = lnPhiOnBranch(model, t - ht, p, x, branch);
            double hp = 1e-5;
            double[] pp = lnPhiOnBranch(model, t, p * Math.exp(hp), x, branch);
            double[] pm = lnPhiOnBranch(model, t, p * Math.exp(-hp), x, branch);
            for (int i = 0; i < n; i++) {
                double fdT = (tp[i] - tm[i]) / (2 * ht);
                assertEquals(fdT, dT[i], 1e-6 * (Math.abs(fdT) + 1.0 / t), "dT " + i + " " + where);
                double fdP = (pp[i] - pm[i]) / (2 * hp);
                assertEquals(fdP, dP[i], 1e-6 * (Math.abs(fdP) + 1), "dlnP " + i + " " + where);
            }
            for (int j = 0; j < n; j++) {
                double h = 1e-5;
                double[] xp = new double[n];
                double[] xm = new double[n];
                for (int i = 0; i < n; i++) {
                    xp[i] = (x[i] + (i == j ? h : 0)) / (1 + h);
                    xm[i] = (x[i] - (i == j ? h : 0)) / (1 - h);
                }
                double[] fp = lnPhiOnBranch(model, t, p, xp, branch);
                double[] fm = lnPhiOnBranch(model, t, p, xm, branch);
                for (int i = 0; i < n; i++) {
                    double fd = (fp[i] - fm[i]) / (2 * h);
                    assertEquals(fd, dn[i][j], 1e-6 * (1 + scaleN), "dn " + i + "," + j + " " + where);
                }
            }
            checked++;
        }
        assertEquals(60, checked);
    }
}
