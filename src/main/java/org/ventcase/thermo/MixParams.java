package org.ventcase.thermo;

/**
 * The cubic's parameters at one temperature and composition (van der Waals one-fluid mixing:
 * a = sum_i sum_j x_i x_j (1 - k_ij) sqrt(a_i a_j), b = sum_i x_i b_i), with the temperature
 * derivatives of a and the per-component sums needed by fugacity coefficients. For a pure fluid
 * a = a_i and b = b_i. The arrays are shared, not copied, for speed:
 * callers must not modify them.
 *
 * @param t      temperature, K
 * @param a      mixture a, Pa m6/mol2
 * @param dadt   da/dT at constant composition
 * @param d2adt2 d2a/dT2 at constant composition
 * @param b      mixture b, m3/mol
 * @param aBar   sum_j x_j a_ij for each component i
 * @param bi     b_i of each component
 */
public record MixParams(double t, double a, double dadt, double d2adt2, double b, double[] aBar, double[] bi) {
}
