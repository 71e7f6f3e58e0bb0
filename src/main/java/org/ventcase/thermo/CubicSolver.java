package org.ventcase.thermo;

/**
 * Real roots of Z^3 + c2 Z^2 + c1 Z + c0 = 0 by the analytic solution, each root then polished
 * by Newton's method on the original cubic. Never successive substitution.
 *
 * <p>Method: the substitution Z = t - c2/3 gives the depressed cubic t^3 + p t + q = 0 with
 * discriminant D = (q/2)^2 + (p/3)^3. For D > 0 there is one real root, taken from Cardano's
 * formula in the cancellation-free form t = u - p/(3u), u = cbrt(-q/2 - sign(q) sqrt D). For
 * D <= 0 there are three real roots, from Viete's trigonometric form
 * t_k = 2 sqrt(-p/3) cos(phi/3 - 2 pi k/3), cos phi = (3q/(2p)) sqrt(-3/p).
 * Source: W.H. Press et al., Numerical Recipes, 3rd ed., 2007, section 5.6.
 *
 * <p>Classification: a root pair is treated as coincident when the discriminant is within
 * round-off of zero relative to its terms; with p also within round-off of zero, all three
 * coincide (the critical point). Stateless and thread-safe.
 */
public final class CubicSolver {

    /** Relative size of the discriminant below which two roots are taken as equal. */
    static final double DISCRIMINANT_TOLERANCE = 1e-10;

    private CubicSolver() {
    }

    /**
     * Solves the cubic and splits the roots at the co-volume B.
     *
     * @param b dimensionless co-volume B = b P / (R T); physical roots satisfy Z > B
     */
    public static CubicRoots solve(double c2, double c1, double c0, double b) {
        double[] all = new double[3];
        int n = realRoots(c2, c1, c0, all);
        RootCase rc = classify(c2, c1, c0, n);
        if (rc == RootCase.DOUBLE || rc == RootCase.TRIPLE) {
            n = repeatedRoots(c2, c1, c0, rc, all);
        }
        int nPhys = 0;
        for (int i = 0; i < n; i++) {
            if (all[i] > b) {
                nPhys++;
            }
        }
        double[] phys = new double[nPhys];
        double[] rej = new double[n - nPhys];
        int ip = 0;
        int ir = 0;
        for (int i = 0; i < n; i++) {
            if (all[i] > b) {
                phys[ip++] = all[i];
            } else {
                rej[ir++] = all[i];
            }
        }
        return new CubicRoots(phys, rej, rc);
    }

    /**
     * The real roots in ascending order, written into {@code out}; returns how many (1 or 3;
     * repeated roots are returned repeated).
     */
    static int realRoots(double c2, double c1, double c0, double[] out) {
        double c2over3 = c2 / 3.0;
        double p = c1 - c2 * c2over3;
        double q = (2.0 * c2over3 * c2over3 - c1) * c2over3 + c0;
        double halfQ = 0.5 * q;
        double thirdP = p / 3.0;
        double disc = halfQ * halfQ + thirdP * thirdP * thirdP;
        if (disc > 0) {
            double sq = Math.sqrt(disc);
            double u = Math.cbrt(-halfQ - Math.copySign(sq, halfQ));
            double t = u == 0.0 ? 0.0 : u - thirdP / u;
            out[0] = polish(t - c2over3, c2, c1, c0);
            return 1;
        }
        if (thirdP >= 0) {
            // p = 0 and q = 0: triple root
            double z = -c2over3;
            out[0] = z;
            out[1] = z;
            out[2] = z;
            return 3;
        }
        double r = Math.sqrt(-thirdP);
        double cosPhi = -halfQ / (r * r * r);
        cosPhi = Math.max(-1.0, Math.min(1.0, cosPhi));
        double phi = Math.acos(cosPhi);
        double twoR = 2.0 * r;
        double t0 = twoR * Math.cos(phi / 3.0);
        double t1 = twoR * Math.cos((phi + 2.0 * Math.PI) / 3.0);
        double t2 = twoR * Math.cos((phi + 4.0 * Math.PI) / 3.0);
        // t1 <= t2 <= t0 for phi in [0, pi]
        out[0] = polish(t1 - c2over3, c2, c1, c0);
        out[1] = polish(t2 - c2over3, c2, c1, c0);
        out[2] = polish(t0 - c2over3, c2, c1, c0);
        if (out[0] > out[1]) {
            double tmp = out[0];
            out[0] = out[1];
            out[1] = tmp;
        }
        if (out[1] > out[2]) {
            double tmp = out[1];
            out[1] = out[2];
            out[2] = tmp;
        }
        if (out[0] > out[1]) {
            double tmp = out[0];
            out[0] = out[1];
            out[1] = tmp;
        }
        return 3;
    }

    /**
     * Roots when the discriminant is zero within round-off: for t^3 + p t + q = 0 with D = 0 the
     * simple root is 3q/p and the double root -3q/(2p) (all zero when p = q = 0).
     */
    static int repeatedRoots(double c2, double c1, double c0, RootCase rc, double[] out) {
        double c2over3 = c2 / 3.0;
        double p = c1 - c2 * c2over3;
        double q = (2.0 * c2over3 * c2over3 - c1) * c2over3 + c0;
        if (rc == RootCase.TRIPLE || p == 0.0) {
            double z = -c2over3;
            out[0] = z;
            out[1] = z;
            out[2] = z;
            return 3;
        }
        double simple = polish(3.0 * q / p - c2over3, c2, c1, c0);
        double dbl = -1.5 * q / p - c2over3;
        if (simple < dbl) {
            out[0] = simple;
            out[1] = dbl;
            out[2] = dbl;
        } else {
            out[0] = dbl;
            out[1] = dbl;
            out[2] = simple;
        }
        return 3;
    }

    /** Newton polishing, at most three steps; a step that does not reduce |f| is not taken. */
    static double polish(double z, double c2, double c1, double c0) {
        double f = ((z + c2) * z + c1) * z + c0;
        for (int i = 0; i < 3; i++) {
            double df = (3.0 * z + 2.0 * c2) * z + c1;
            if (df == 0.0) {
                break;
            }
            double zn = z - f / df;
            double fn = ((zn + c2) * zn + c1) * zn + c0;
            if (!(Math.abs(fn) < Math.abs(f))) {
                break;
            }
            z = zn;
            f = fn;
            if (f == 0.0) {
                break;
            }
        }
        return z;
    }

    static RootCase classify(double c2, double c1, double c0, int n) {
        double c2over3 = c2 / 3.0;
        double p = c1 - c2 * c2over3;
        double q = (2.0 * c2over3 * c2over3 - c1) * c2over3 + c0;
        double a = 0.25 * q * q;
        double b = p * p * p / 27.0;
        double disc = a + b;
        // Round-off scale of D: the size of its terms, and of the coefficients that made them.
        double scale = Math.max(Math.abs(a) + Math.abs(b), 1e-30)
                + Math.pow(Math.max(Math.abs(c0), Math.max(c1 * c1, Math.pow(c2, 4) / 9)), 1.5) * 1e-18;
        if (Math.abs(disc) <= DISCRIMINANT_TOLERANCE * scale) {
            double pScale = Math.abs(c1) + c2 * c2 / 3.0;
            return Math.abs(p) <= 1e-7 * Math.max(pScale, 1e-30) ? RootCase.TRIPLE : RootCase.DOUBLE;
        }
        return n == 1 ? RootCase.ONE_REAL : RootCase.THREE_DISTINCT;
    }
}
