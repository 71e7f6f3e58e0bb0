package org.ventcase.thermo;

/**
 * Real roots of Z^3 + c2 Z^2 + c1 Z + c0 = 0 by the analytic solution, polished by Newton's
 * method, then deflation. Never successive substitution.
 *
 * <p>Method: the substitution Z = t - c2/3 gives the depressed cubic t^3 + p t + q = 0 with
 * discriminant D = (q/2)^2 + (p/3)^3. One real root is taken analytically: for D > 0 from
 * Cardano's formula in the cancellation-free form t = u - p/(3u), u = cbrt(-q/2 - sign(q) sqrt D);
 * for D <= 0 the largest of Viete's trigonometric roots,
 * t = 2 sqrt(-p/3) cos(phi/3), cos phi = -(q/2)/(-p/3)^(3/2). That root is polished by Newton's
 * method and divided out; the remaining quadratic Z^2 + e1 Z + e0 (e1 = c2 + z1, e0 = -c0/z1)
 * is solved in the stable form r = -(e1 + sign(e1) sqrt(e1^2 - 4 e0))/2, e0/r. Deflation keeps
 * the small liquid-like roots accurate at low pressure, where they are many orders of magnitude
 * below the vapour root and a direct formula loses them to round-off.
 * Source: W.H. Press et al., Numerical Recipes, 3rd ed., 2007, sections 5.6 (quadratic and cubic
 * equations) and 9.5 (deflation).
 *
 * <p>Classification: the quadratic's discriminant within round-off of zero (relative 1e-10 of
 * e1^2) is a double root; a double root also equal to the first root (relative 1e-4, the
 * accuracy to which a triple root can be located in double precision) is the triple root of
 * the critical point. Stateless and thread-safe.
 */
public final class CubicSolver {

    /** Relative size of the quadratic discriminant below which two roots are taken as equal. */
    static final double DOUBLE_ROOT_TOLERANCE = 1e-10;
    /** Relative distance below which a double root and the first root form a triple root. */
    static final double TRIPLE_ROOT_TOLERANCE = 1e-4;

    private static final double[] NONE = new double[0];

    private CubicSolver() {
    }

    /**
     * Solves the cubic and splits the roots at the co-volume B.
     *
     * @param b dimensionless co-volume B = b P / (R T); physical roots satisfy Z > B
     */
    public static CubicRoots solve(double c2, double c1, double c0, double b) {
        return solve(c2, c1, c0, b, 1.0 + Math.max(Math.abs(c2), Math.max(Math.abs(c1), Math.abs(c0))));
    }

    /**
     * As {@link #solve(double, double, double, double)} with an upper bound on the largest real
     * root (the equations of state pass 1 + B).
     */
    public static CubicRoots solve(double c2, double c1, double c0, double b, double upper) {
        double[] all = new double[3];
        int code = rootsCoded(c2, c1, c0, upper, all);
        RootCase[] rc = {CASES[code]};
        int n = count(code);
        if (n == 1 && all[0] > b) {
            return CubicRoots.owning(new double[] {all[0]}, NONE, rc[0]);
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
        return CubicRoots.owning(phys, rej, rc[0]);
    }

    /** The real roots in ascending order (repeated roots repeated); returns how many (1 or 3). */
    static int realRoots(double c2, double c1, double c0, double[] out) {
        return count(rootsCoded(c2, c1, c0, out));
    }

    static int roots(double c2, double c1, double c0, double[] out, RootCase[] kind) {
        int code = rootsCoded(c2, c1, c0, out);
        kind[0] = CASES[code];
        return count(code);
    }

    private static final RootCase[] CASES = {RootCase.ONE_REAL, RootCase.DOUBLE, RootCase.TRIPLE,
            RootCase.THREE_DISTINCT};

    /** Number of real roots (with multiplicity) for a code of {@link #rootsCoded}. */
    static int count(int code) {
        return code == 0 ? 1 : 3;
    }

    /**
     * The real roots in ascending order without allocating; returns a code for the root case:
     * 0 one real root, 1 double, 2 triple, 3 three distinct (index into {@link #CASES}).
     */
    static int rootsCoded(double c2, double c1, double c0, double[] out) {
        return rootsCoded(c2, c1, c0, 1.0 + Math.max(Math.abs(c2), Math.max(Math.abs(c1), Math.abs(c0))), out);
    }

    /**
     * As {@link #rootsCoded(double, double, double, double[])} with a caller's upper bound on the
     * largest real root (for the cubic equations of state Z <= 1 + B, since the attraction term
     * can only lower Z below v/(v - b)); a tighter start saves Newton steps.
     */
    static int rootsCoded(double c2, double c1, double c0, double upper, double[] out) {
        double zTop = largestRootByNewton(c2, c1, c0, upper);
        if (!Double.isNaN(zTop)) {
            return deflated(zTop, c2, c1, c0, out);
        }
        double c2over3 = c2 / 3.0;
        double p = c1 - c2 * c2over3;
        double q = (2.0 * c2over3 * c2over3 - c1) * c2over3 + c0;
        double halfQ = 0.5 * q;
        double thirdP = p / 3.0;
        double disc = halfQ * halfQ + thirdP * thirdP * thirdP;
        double t;
        if (disc > 0) {
            double sq = Math.sqrt(disc);
            double u = Math.cbrt(-halfQ - Math.copySign(sq, halfQ));
            t = u == 0.0 ? 0.0 : u - thirdP / u;
        } else if (thirdP < 0) {
            double r = Math.sqrt(-thirdP);
            double cosPhi = Math.max(-1.0, Math.min(1.0, -halfQ / (r * r * r)));
            t = 2.0 * r * Math.cos(Math.acos(cosPhi) / 3.0);
        } else {
            t = 0.0;
        }
        return deflated(polish(t - c2over3, c2, c1, c0), c2, c1, c0, out);
    }

    /**
     * The largest real root by Newton's method from Cauchy's upper bound 1 + max|c_i|, or NaN
     * when that does not apply. Above the inflection point Z = -c2/3 the cubic is convex, so
     * Newton's iterates from above decrease monotonically to the largest root whenever that root
     * lies at or above the inflection (always the case with three real roots). An iterate that
     * falls below the inflection means the only real root lies in the concave part: the caller
     * then takes the analytic solution. Cheaper than the trigonometric form (no acos, cos, cbrt)
     * and as accurate: iteration stops when the iterates stop decreasing, i.e. at round-off, or
     * one step earlier where quadratic convergence already puts the error below 1e-15 Z.
     * Source: W.H. Press et al., Numerical Recipes, 3rd ed., 2007, 9.4 (Newton) and 9.5 (bounds
     * and deflation); Cauchy's bound on polynomial roots.
     */
    static double largestRootByNewton(double c2, double c1, double c0, double upper) {
        double inflection = -c2 / 3.0;
        double z = upper;
        if (!(((z + c2) * z + c1) * z + c0 > 0)) {
            return Double.NaN;
        }
        double lastStep = Double.POSITIVE_INFINITY;
        for (int i = 0; i < 100; i++) {
            double f = ((z + c2) * z + c1) * z + c0;
            double df = (3.0 * z + 2.0 * c2) * z + c1;
            if (!(df > 0)) {
                return Double.NaN;
            }
            double zn = z - f / df;
            if (zn < inflection) {
                return Double.NaN;
            }
            if (!(zn < z)) {
                return z;
            }
            double step = z - zn;
            // In the quadratic regime (a step under 1e-3 of the one before, which the linear
            // convergence at a double or triple root never gives) the error left after a step s
            // is about (s/s_prev^2) s^2 <= 1e-3 s^2/s_prev <= 1e-6 s: below 1e-15 z once
            // s <= 1e-9 z, so the confirming step that would change nothing is skipped.
            if (step <= 1e-9 * Math.abs(zn) && step <= 1e-3 * lastStep) {
                return zn;
            }
            lastStep = step;
            z = zn;
        }
        return Double.NaN;
    }

    /**
     * A start for {@link #largestRootByNewton} closer than the bound: {@code guess} where it is
     * provably above the largest real root, else {@code upper}. Proof: above the inflection point
     * Z = -c2/3 a cubic with f' > 0 has passed its local minimum (if any), so f > 0 there means
     * every real root lies below.
     */
    static double startAbove(double c2, double c1, double c0, double guess, double upper) {
        if (guess < upper && guess > -c2 / 3.0) {
            double f = ((guess + c2) * guess + c1) * guess + c0;
            double df = (3.0 * guess + 2.0 * c2) * guess + c1;
            if (f > 0 && df > 0) {
                return guess;
            }
        }
        return upper;
    }

    /** Deflates a known real root z1 and solves the remaining quadratic in stable form. */
    static int deflated(double z1, double c2, double c1, double c0, double[] out) {
        // Deflate: (Z - z1)(Z^2 + e1 Z + e0)
        double e1 = c2 + z1;
        double e0 = z1 != 0.0 ? -c0 / z1 : c1 + z1 * e1;
        double qd = e1 * e1 - 4.0 * e0;
        double tol = DOUBLE_ROOT_TOLERANCE * Math.max(e1 * e1, Math.abs(4.0 * e0));
        if (qd < -tol) {
            out[0] = z1;
            return 0;
        }
        double z2;
        double z3;
        int code;
        if (Math.abs(qd) <= tol) {
            z2 = -0.5 * e1;
            z3 = z2;
            code = Math.abs(z2 - z1) <= TRIPLE_ROOT_TOLERANCE * Math.max(Math.abs(z1), 1e-300) ? 2 : 1;
            if (code == 2) {
                double mean = (z1 + 2 * z2) / 3.0;
                z1 = mean;
                z2 = mean;
                z3 = mean;
            }
        } else {
            double r = -0.5 * (e1 + Math.copySign(Math.sqrt(qd), e1));
            z2 = polish(r, c2, c1, c0);
            z3 = r != 0.0 ? polish(e0 / r, c2, c1, c0) : 0.0;
            code = 3;
        }
        sort3(z1, z2, z3, out);
        return code;
    }

    private static void sort3(double a, double b, double c, double[] out) {
        double lo = Math.min(a, Math.min(b, c));
        double hi = Math.max(a, Math.max(b, c));
        out[0] = lo;
        out[1] = a + b + c - lo - hi;
        out[2] = hi;
    }

    /** Newton polishing, at most three steps; a step that does not reduce |f| is not taken. */
    static double polish(double z, double c2, double c1, double c0) {
        double f = ((z + c2) * z + c1) * z + c0;
        for (int i = 0; i < 3 && f != 0.0; i++) {
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
        }
        return z;
    }
}
