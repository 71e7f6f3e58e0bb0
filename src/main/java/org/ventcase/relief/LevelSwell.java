package org.ventcase.relief;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.ventcase.common.InvalidInputException;

/**
 * Level swell of a boiling liquid by the drift-flux model used in first-pass two-phase relief
 * work: the average void fraction of the pool from the dimensionless superficial vapour velocity
 * psi = j_g / U_inf, for the churn-turbulent or the bubbly regime, and the swelled liquid volume
 * V_L / (1 - alpha).
 *
 * <pre>
 *   churn-turbulent:  psi = 2 alpha / (1 - C0 alpha),                      C0 = 1.5,
 *                     U_inf = 1.53 [sigma g (rho_L - rho_V) / rho_L^2]^(1/4)
 *   bubbly:           psi = alpha (1 - alpha)^2 / ((1 - alpha^3)(1 - C0 alpha)),  C0 = 1.2,
 *                     U_inf = 1.18 [sigma g (rho_L - rho_V) / rho_L^2]^(1/4)
 * </pre>
 *
 * <p>Source (from memory, to be verified before anything is printed on a sheet): the DIERS
 * drift-flux vessel models (H.G. Fisher et al., Emergency Relief System Design Using DIERS
 * Technology, AIChE 1992; J.C. Leung's vessel swell relations). The relations are also checked by
 * derivation in the tests: no vapour flow gives no swell; the churn-turbulent void fraction has the
 * closed form alpha = psi / (2 + C0 psi) and tends to 1/C0 for a large vapour flow.
 *
 * <p>Not yet used by a scenario (issue 17 wires it into the fire case, with a surface-tension
 * correlation with verified coefficients for U_inf).
 */
public final class LevelSwell {

    /** The flow regime assumed in the pool. */
    public enum Regime {
        /** Churn-turbulent: the usual choice for non-foaming fluids in first-pass work. */
        CHURN_TURBULENT(1.5, 1.53),
        /** Bubbly: swells more at the same vapour flow; for viscous or foamy liquids. */
        BUBBLY(1.2, 1.18);

        private final double c0;
        private final double riseCoefficient;

        Regime(double c0, double riseCoefficient) {
            this.c0 = c0;
            this.riseCoefficient = riseCoefficient;
        }

        /** The distribution parameter C0. */
        public double c0() {
            return c0;
        }
    }

    private LevelSwell() {
    }

    /** U_inf, m/s: the bubble-rise velocity of the regime from sigma (N/m) and the phase densities (kg/m3). */
    public static double bubbleRise(Regime r, double sigmaNPerM, double rhoL, double rhoV) {
        InvalidInputException.requirePositive("swell.surfaceTension", sigmaNPerM, "N/m");
        InvalidInputException.requirePositive("swell.liquidDensity", rhoL, "kg/m3");
        if (!(rhoV >= 0 && rhoV < rhoL)) {
            throw InvalidInputException.outOfRange("swell.vapourDensity", rhoV, 0, rhoL, "kg/m3 (below the liquid's)");
        }
        return r.riseCoefficient * Math.pow(sigmaNPerM * 9.80665 * (rhoL - rhoV) / (rhoL * rhoL), 0.25);
    }

    /** The average void fraction for psi = j_g / U_inf (>= 0). */
    public static double voidFraction(Regime r, double psi) {
        if (!(psi >= 0) || Double.isInfinite(psi)) {
            throw InvalidInputException.invalid("swell.psi", psi, "expected a finite psi of at least 0");
        }
        if (psi == 0) {
            return 0.0;
        }
        double c0 = r.c0();
        if (r == Regime.CHURN_TURBULENT) {
            return psi / (2.0 + c0 * psi);
        }
        // bubbly: psi(alpha) rises from 0 at alpha = 0 without bound as alpha -> 1/C0; one root below 1/C0
        org.apache.commons.math3.analysis.UnivariateFunction f = a -> a * (1 - a) * (1 - a)
                / ((1 - a * a * a) * (1 - c0 * a)) - psi;
        return new BrentSolver(1e-14, 1e-14, 1e-300).solve(200, f, 0.0, 1.0 / c0 - 1e-12);
    }

    /** The swelled volume of a pool of liquid volume vL at average void fraction alpha, m3. */
    public static double swelledVolume(double vL, double alpha) {
        InvalidInputException.requireInRange("swell.liquidVolume", vL, 0.0, Double.MAX_VALUE, "m3");
        if (!(alpha >= 0 && alpha < 1)) {
            throw InvalidInputException.outOfRange("swell.voidFraction", alpha, 0, 1, "(below 1)");
        }
        return vL / (1.0 - alpha);
    }
}
