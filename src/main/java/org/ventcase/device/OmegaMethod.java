package org.ventcase.device;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.ventcase.common.InvalidInputException;

/**
 * Two-phase flow through a relief device by the omega method (homogeneous equilibrium flow of a
 * saturated or two-phase inlet, the mixture's specific volume taken linear in 1/P): the omega
 * parameter from two states of the isentropic expansion, the critical pressure ratio, the critical
 * or subcritical mass flux and the required area.
 *
 * <pre>
 *   omega = 9 (v9 / v0 - 1)                       (v0 at P0, v9 after isentropic flash to 0.9 P0)
 *   eta_c^2 + (omega^2 - 2 omega)(1 - eta_c)^2 + 2 omega^2 ln eta_c + 2 omega^2 (1 - eta_c) = 0
 *   critical (eta_a = Pa/P0 <= eta_c):  G = eta_c sqrt(P0 / (v0 omega))
 *   subcritical:  G = sqrt(-2 [omega ln eta_a + (omega - 1)(1 - eta_a)]) sqrt(P0 / v0)
 *                     / (omega (1/eta_a - 1) + 1)
 *   A = W / (Kd Kb Kc G)
 * </pre>
 *
 * <p>Source (from memory, to be checked against the standard before anything is printed on a
 * sheet): J.C. Leung, "A generalized correlation for one-component homogeneous equilibrium
 * flashing choked flow", AIChE J. 32 (1986) 1743; the same method in API Std 520 Part I, annex on
 * two-phase sizing. The relations are also checked by derivation in the tests: omega to 0 gives
 * Bernoulli's incompressible flux, omega = 1 gives the isothermal ideal gas (eta_c = e^(-1/2)),
 * and the critical and subcritical fluxes meet at eta_c.
 *
 * <p>Not yet used by a scenario (issue 17 wires it: the omega from the EOS flash, the case field,
 * the sheet section); a domain calculation with its own tests until then.
 */
public final class OmegaMethod {

    private OmegaMethod() {
    }

    /**
     * Result of the omega method.
     *
     * @param omega          omega
     * @param criticalRatio  eta_c = P_critical / P0
     * @param critical       true when eta_a <= eta_c (choked)
     * @param massFluxKgM2S  G, kg/(m2 s)
     * @param areaM2         required effective area, m2
     */
    public record Result(double omega, double criticalRatio, boolean critical, double massFluxKgM2S, double areaM2) {
    }

    /** omega from the specific volumes at P0 and after isentropic flash to 0.9 P0 (two-point form). */
    public static double omega(double v0, double v9) {
        InvalidInputException.requirePositive("twoPhase.v0", v0, "m3/kg");
        InvalidInputException.requirePositive("twoPhase.v9", v9, "m3/kg");
        if (!(v9 >= v0)) {
            throw InvalidInputException.invalid("twoPhase.v9", v9, "expected at least the inlet specific volume "
                    + v0 + " m3/kg: the mixture expands as the pressure falls");
        }
        return 9.0 * (v9 / v0 - 1.0);
    }

    /** eta_c for omega > 0 (the root in (0, 1) of the critical-flow equation). */
    public static double criticalRatio(double omega) {
        if (!(omega > 0) || Double.isInfinite(omega)) {
            throw InvalidInputException.invalid("twoPhase.omega", omega, "expected a finite omega above 0");
        }
        double w = omega;
        org.apache.commons.math3.analysis.UnivariateFunction f = e -> e * e + (w * w - 2 * w) * (1 - e) * (1 - e)
                + 2 * w * w * Math.log(e) + 2 * w * w * (1 - e);
        // f(1) = 1 > 0 and f -> -inf as eta -> 0: the bracket holds the physical root; for small omega
        // the root lies very close to 0, so the lower end is taken tiny
        return new BrentSolver(1e-15, 1e-15, 1e-300).solve(200, f, 1e-300, 1.0 - 1e-15);
    }

    /**
     * Mass flux and required area.
     *
     * @param w    relief load, kg/s
     * @param p0   inlet (relieving) pressure, Pa abs
     * @param pa   back pressure, Pa abs, below p0
     * @param v0   inlet specific volume, m3/kg
     * @param omega omega
     * @param kd   two-phase discharge coefficient
     * @param kb   back-pressure correction
     * @param kc   combination (rupture disc) correction
     */
    public static Result size(double w, double p0, double pa, double v0, double omega, double kd, double kb,
                              double kc) {
        InvalidInputException.requirePositive("twoPhase.massFlow", w, "kg/s");
        InvalidInputException.requirePositive("twoPhase.p0", p0, "Pa abs");
        InvalidInputException.requirePositive("twoPhase.v0", v0, "m3/kg");
        if (!(pa > 0 && pa < p0)) {
            throw InvalidInputException.outOfRange("twoPhase.backPressure", pa, 0, p0, "Pa abs (below P0)");
        }
        InvalidInputException.requireInRange("twoPhase.kd", kd, Double.MIN_NORMAL, 1.0, "(0 < Kd <= 1)");
        double etaC = criticalRatio(omega);
        double etaA = pa / p0;
        boolean critical = etaA <= etaC;
        double g = critical ? criticalFlux(p0, v0, omega, etaC) : subcriticalFlux(p0, v0, omega, etaA);
        return new Result(omega, etaC, critical, g, w / (kd * kb * kc * g));
    }

    /** G at choked flow, kg/(m2 s). */
    static double criticalFlux(double p0, double v0, double omega, double etaC) {
        return etaC * Math.sqrt(p0 / (v0 * omega));
    }

    /** G at eta_a above eta_c, kg/(m2 s). */
    static double subcriticalFlux(double p0, double v0, double omega, double etaA) {
        double num = -2.0 * (omega * Math.log(etaA) + (omega - 1.0) * (1.0 - etaA));
        return Math.sqrt(num) * Math.sqrt(p0 / v0) / (omega * (1.0 / etaA - 1.0) + 1.0);
    }
}
