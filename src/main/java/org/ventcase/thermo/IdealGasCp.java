package org.ventcase.thermo;

import java.util.Arrays;

import org.ventcase.common.PhysicalConstants;

/**
 * Ideal-gas isobaric heat capacity as a polynomial in temperature,
 * Cp/R = a0 + a1 T + a2 T^2 + a3 T^3 + a4 T^4 (T in K), with its range of validity and source.
 * Enthalpy and entropy are its exact integrals. Outside [tMinK, tMaxK] the polynomial is still
 * evaluated (a cubic EOS calculation needs a value), and callers attach a warning: see
 * {@link #inRange(double)}.
 *
 * @param a      coefficients a0..a4 of Cp/R (a0 dimensionless, a1 in 1/K, ...); copied
 * @param tMinK  lower end of the fitted range, K
 * @param tMaxK  upper end of the fitted range, K
 * @param source where the coefficients come from
 */
public record IdealGasCp(double[] a, double tMinK, double tMaxK, String source) {

    public IdealGasCp {
        if (a == null || a.length != 5) {
            throw new IllegalArgumentException("ideal-gas Cp needs 5 coefficients a0..a4");
        }
        for (double c : a) {
            if (!Double.isFinite(c)) {
                throw new IllegalArgumentException("ideal-gas Cp coefficient is not finite");
            }
        }
        if (!(tMinK > 0 && tMaxK > tMinK)) {
            throw new IllegalArgumentException("ideal-gas Cp range must satisfy 0 < Tmin < Tmax");
        }
        a = a.clone();
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("ideal-gas Cp coefficients need a source");
        }
    }

    @Override
    public double[] a() {
        return a.clone();
    }

    /** Cp/R at T. */
    public double cpOverR(double t) {
        return a[0] + t * (a[1] + t * (a[2] + t * (a[3] + t * a[4])));
    }

    /** Cp in J/(mol K). */
    public double cp(double t) {
        return PhysicalConstants.R * cpOverR(t);
    }

    /** H(T) - H(T0) in J/mol, exact integral of the polynomial. */
    public double enthalpyChange(double t0, double t) {
        return PhysicalConstants.R * (hPrim(t) - hPrim(t0));
    }

    /** S(T, P) - S(T0, P) at constant pressure in J/(mol K), exact integral of Cp/T. */
    public double entropyChange(double t0, double t) {
        return PhysicalConstants.R * (sPrim(t) - sPrim(t0));
    }

    private double hPrim(double t) {
        return t * (a[0] + t * (a[1] / 2 + t * (a[2] / 3 + t * (a[3] / 4 + t * a[4] / 5))));
    }

    private double sPrim(double t) {
        return a[0] * Math.log(t) + t * (a[1] + t * (a[2] / 2 + t * (a[3] / 3 + t * a[4] / 4)));
    }

    /** Whether T lies inside the fitted range. */
    public boolean inRange(double t) {
        return t >= tMinK && t <= tMaxK;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof IdealGasCp c && Arrays.equals(a, c.a) && tMinK == c.tMinK && tMaxK == c.tMaxK
                && source.equals(c.source);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(a) * 31 + source.hashCode();
    }

    @Override
    public String toString() {
        return "IdealGasCp" + Arrays.toString(a) + " [" + tMinK + ", " + tMaxK + "] K (" + source + ")";
    }
}
