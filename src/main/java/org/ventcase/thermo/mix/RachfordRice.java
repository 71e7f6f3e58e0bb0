package org.ventcase.thermo.mix;

import java.util.Locale;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.NoSolutionException;

/**
 * The Rachford-Rice equation f(beta) = sum_i z_i (K_i - 1)/(1 + beta (K_i - 1)) = 0 for the
 * vapour fraction beta, solved in the window where every phase fraction x_i and y_i stays
 * positive:
 * beta_min = max over K_i > 1 of (K_i z_i - 1)/(K_i - 1), beta_max = min over K_i < 1 of
 * (1 - z_i)/(1 - K_i). f decreases monotonically between the poles 1/(1 - K_max) and
 * 1/(1 - K_min), and the window lies inside them, so Newton's method safeguarded by bisection
 * (the bracket shrinks at every step) cannot diverge for any K-values. The root may lie outside
 * [0, 1] (a "negative flash"); callers decide what that means.
 *
 * <p>Source: H.H. Rachford, J.D. Rice, J. Petrol. Technol. 4 (1952) 19; window bounds from
 * C.H. Whitson, M.L. Michelsen, Fluid Phase Equilib. 53 (1989) 51-71, and C.F. Leibovici,
 * J. Neoschil, Fluid Phase Equilib. 74 (1992) 303-308 (safeguarded Newton in a bounded interval).
 * Stateless.
 */
public final class RachfordRice {

    private static final int MAX_ITER = 200;

    private RachfordRice() {
    }

    /**
     * Solution.
     *
     * @param beta       vapour fraction (may be outside [0, 1])
     * @param iterations Newton/bisection steps
     */
    public record Solution(double beta, int iterations) {
    }

    /** f(beta). */
    public static double residual(double[] z, double[] k, double beta) {
        double f = 0;
        for (int i = 0; i < z.length; i++) {
            double km1 = k[i] - 1.0;
            f += z[i] * km1 / (1.0 + beta * km1);
        }
        return f;
    }

    /**
     * Solves for beta.
     *
     * @throws NoSolutionException when all K_i >= 1 or all K_i <= 1 (no root exists: one phase)
     */
    public static Solution solve(double[] z, double[] k) {
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        boolean anyAbove = false;
        boolean anyBelow = false;
        for (int i = 0; i < z.length; i++) {
            if (!(k[i] > 0) || !Double.isFinite(k[i])) {
                throw new IllegalArgumentException("K-value " + k[i] + " of component " + i + " is not finite and positive");
            }
            if (z[i] <= 0) {
                continue;
            }
            if (k[i] > 1.0) {
                anyAbove = true;
                lo = Math.max(lo, (k[i] * z[i] - 1.0) / (k[i] - 1.0));
            } else if (k[i] < 1.0) {
                anyBelow = true;
                hi = Math.min(hi, (1.0 - z[i]) / (1.0 - k[i]));
            }
        }
        if (!anyAbove || !anyBelow) {
            throw new NoSolutionException("K", "all K-values are on one side of 1: the Rachford-Rice equation has no root"
                    + " (the mixture is a single phase at these K-values)");
        }
        double fLo = residual(z, k, lo);
        double fHi = residual(z, k, hi);
        // f(lo) >= 0 >= f(hi) holds in exact arithmetic; round-off at a bound is resolved here.
        if (!(fLo > 0)) {
            return new Solution(lo, 0);
        }
        if (!(fHi < 0)) {
            return new Solution(hi, 0);
        }
        double beta = 0.5 * (lo + hi);
        if (lo < 0.5 && hi > 0.5) {
            beta = 0.5;
        }
        double width0 = hi - lo;
        for (int it = 1; it <= MAX_ITER; it++) {
            double f = 0;
            double df = 0;
            for (int i = 0; i < z.length; i++) {
                double km1 = k[i] - 1.0;
                double den = 1.0 + beta * km1;
                double t = km1 / den;
                f += z[i] * t;
                df -= z[i] * t * t;
            }
            if (f > 0) {
                lo = beta;
            } else if (f < 0) {
                hi = beta;
            } else {
                return new Solution(beta, it);
            }
            double next = beta - f / df;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - beta) <= 1e-15 * Math.max(1.0, Math.abs(beta)) || hi - lo <= 1e-16 * width0) {
                return new Solution(next, it);
            }
            beta = next;
        }
        throw new ConvergenceException("Rachford-Rice Newton/bisection", MAX_ITER, residual(z, k, beta),
                String.format(Locale.US, "bracket [%.17g, %.17g]", lo, hi));
    }
}
