package org.ventcase.thermo.mix;

import static org.ventcase.common.PhysicalConstants.R;

import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.MixParams;
import org.ventcase.thermo.PhaseRequest;

/**
 * Fugacity-coefficient evaluations shared by the stability test, the flashes, saturation points
 * and the envelope. Static and allocation-light; all state lives in the caller's arrays.
 *
 * <p>Root choice: LIQUID = smallest physical root, VAPOR = largest, STABLE = the one of the two
 * with the lower G^R/RT (at equal T, P and composition the difference in G equals the difference
 * in G^R). This mirrors {@link CubicModel#select} without building its explanatory text, which
 * would dominate the cost of an inner loop.
 *
 * <p>Pressure derivative: (d ln phi_i/d ln P)_{T,x} = P vbar_i/(R T) - 1, with the partial molar
 * volume vbar_i = -(dP/dn_i)_{T,V,n_j}/(dP/dV)_{T,n} of
 * P = n R T/(V - B) - A/((V + sigma B)(V + epsilon B)), A = n^2 a, B = n b:
 * dP/dn_i = R T/(v - b) + R T b_i/(v - b)^2 - 2 aBar_i/D + a (u v + 2 w b) b_i/D^2 and
 * dP/dV = -R T/(v - b)^2 + a (2 v + u b)/D^2, D = (v + sigma b)(v + epsilon b), u = sigma +
 * epsilon, w = sigma epsilon (per mole of mixture). Source: M.L. Michelsen, J.M. Mollerup,
 * Thermodynamic Models: Fundamentals and Computational Aspects, 2nd ed., 2007, ch. 2-3 (the
 * relations are derived there for any pressure-explicit model).
 */
final class PhaseEval {

    private PhaseEval() {
    }

    /** Z of the requested root; the MixParams must be at (T, x). */
    static double chooseZ(CubicModel model, MixParams m, double p, PhaseRequest req) {
        return model.chooseZ(m, p, req);
    }

    /**
     * ln phi at (T, P, x) for the requested root; writes into {@code out} and returns Z.
     * x must be normalised.
     */
    static double lnPhi(CubicModel model, double t, double p, double[] x, PhaseRequest req, double[] out) {
        return lnPhi(model, model.at(t), p, x, req, out);
    }

    /**
     * ln phi at (at.t(), P, x) with the per-temperature parameters already evaluated; writes into
     * {@code out} and returns Z. x must be normalised.
     */
    static double lnPhi(CubicModel model, CubicModel.AtTemperature at, double p, double[] x, PhaseRequest req,
                        double[] out) {
        MixParams m = model.mix(at, x);
        double z = chooseZ(model, m, p, req);
        model.lnPhi(m, p, z, out);
        return z;
    }

    /**
     * ln phi and its ln P derivative at (T, P, x); returns Z.
     */
    static double lnPhiAndDp(CubicModel model, CubicModel.AtTemperature at, double p, double[] x, PhaseRequest req,
                             double[] out, double[] dLnPhiDlnP) {
        MixParams m = model.mix(at, x);
        double z = chooseZ(model, m, p, req);
        model.lnPhi(m, p, z, out);
        dLnPhiDlnP(model, m, p, z, dLnPhiDlnP);
        return z;
    }

    /** (d ln phi_i/d ln P)_{T,x} = P vbar_i/(R T) - 1 at root z. */
    static void dLnPhiDlnP(CubicModel model, MixParams m, double p, double z, double[] out) {
        double s = model.variant().sigma();
        double e = model.variant().epsilon();
        double u = s + e;
        double w = s * e;
        double rt = R * m.t();
        double v = z * rt / p;
        double b = m.b();
        double a = m.a();
        double d = (v + s * b) * (v + e * b);
        double vb = v - b;
        double dPdV = -rt / (vb * vb) + a * (2 * v + u * b) / (d * d);
        double[] aBar = m.aBar();
        double[] bi = m.bi();
        for (int i = 0; i < out.length; i++) {
            double dPdn = rt / vb + rt * bi[i] / (vb * vb) - 2 * aBar[i] / d + a * (u * v + 2 * w * b) * bi[i] / (d * d);
            double vbar = -dPdn / dPdV;
            out[i] = p * vbar / rt - 1.0;
        }
    }

    /** sum_i x_i (ln x_i + ln phi_i), skipping zero fractions. */
    static double reducedGibbs(double[] x, double[] lnPhi) {
        double g = 0;
        for (int i = 0; i < x.length; i++) {
            if (x[i] > 0) {
                g += x[i] * (Math.log(x[i]) + lnPhi[i]);
            }
        }
        return g;
    }

    /** Normalises in place; returns the sum before normalising. */
    static double normalise(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        for (int i = 0; i < x.length; i++) {
            x[i] /= s;
        }
        return s;
    }

    /**
     * Solves A x = b in place by Gaussian elimination with partial pivoting (A and b are
     * overwritten; the solution is left in b). Returns false for a singular matrix.
     */
    static boolean solve(double[][] a, double[] b) {
        int n = b.length;
        for (int c = 0; c < n; c++) {
            int piv = c;
            for (int r = c + 1; r < n; r++) {
                if (Math.abs(a[r][c]) > Math.abs(a[piv][c])) {
                    piv = r;
                }
            }
            if (!(Math.abs(a[piv][c]) > 1e-300)) {
                return false;
            }
            if (piv != c) {
                double[] tr = a[piv];
                a[piv] = a[c];
                a[c] = tr;
                double tb = b[piv];
                b[piv] = b[c];
                b[c] = tb;
            }
            for (int r = c + 1; r < n; r++) {
                double f = a[r][c] / a[c][c];
                if (f != 0) {
                    for (int k = c; k < n; k++) {
                        a[r][k] -= f * a[c][k];
                    }
                    b[r] -= f * b[c];
                }
            }
        }
        for (int r = n - 1; r >= 0; r--) {
            double s = b[r];
            for (int k = r + 1; k < n; k++) {
                s -= a[r][k] * b[k];
            }
            b[r] = s / a[r][r];
            if (!Double.isFinite(b[r])) {
                return false;
            }
        }
        return true;
    }

    /** Wilson's K-value estimate ln K_i = ln(Pc_i/P) + 5.373 (1 + omega_i)(1 - Tc_i/T). */
    static void wilsonLnK(CubicModel model, double t, double p, double[] out) {
        for (int i = 0; i < out.length; i++) {
            var c = model.components().get(i);
            out[i] = Math.log(c.pcPa() / p) + 5.373 * (1 + c.omega()) * (1 - c.tcK() / t);
        }
    }
}
