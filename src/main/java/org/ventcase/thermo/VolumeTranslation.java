package org.ventcase.thermo;

import java.util.Locale;

/**
 * A volume translation c(T) of one component: v = v_cubic - c(T), mixed linearly,
 * c = sum x_i c_i(T). Because c depends on temperature only (never on density), both phases of a
 * pure fluid, and every phase of a mixture through its ln phi_i, shift by the same c_i P/(R T):
 * vapour pressure, K-values and every phase split are exactly those of the untranslated cubic.
 *
 * <p>What a temperature-dependent c does to the other properties (the translated Gibbs energy is
 * G = G_cubic - P c(T) at given T and P): S = S_cubic + P dc/dT, H = H_cubic - P (c - T dc/dT),
 * Cp = Cp_cubic + P T d2c/dT2, (dv/dT)_P = (dv_cubic/dT)_P - dc/dT, (dv/dP)_T unchanged. Ventcase
 * applies the enthalpy term wherever a translated basis enters an energy balance
 * ({@link CubicModel#translatedEnthalpyShift}) and the others in
 * {@link CubicModel#properties} on the translated basis (Cv, k, isentropic exponent, speed of
 * sound and Joule-Thomson coefficient follow from them). The P T c'' term is not negligible near
 * the top anchor: at 5 MPa up to 25 % of Cp for carbon monoxide and 12 % for propane at Tr 0.89,
 * smaller at the pressures of saturated storage. The anchors stop at 0.90 Tc with a 0.10 Tc
 * smoothstep taper because closer to Tc the cubic's liquid volume and the correlation part so fast
 * that c'' (and so Cp) swings by up to 90 % (anchors to 0.95 Tc with a 0.05 Tc taper, measured);
 * the price is a liquid density up to 2.3 % low at Tr 0.925 (n-nonane; docs/accuracy.md). A pure fluid's
 * latent heat is unchanged by any translation.
 */
public interface VolumeTranslation {

    /** c at T, m3/mol. */
    double c(double t);

    /** dc/dT at T, m3/(mol K). */
    double dcdT(double t);

    /** d2c/dT2 at T, m3/(mol K2). */
    double d2cdT2(double t);

    /** Whether c changes with temperature. */
    boolean temperatureDependent();

    /** One line for the trace and the sheet: the form, and its source. */
    String describe();

    /**
     * A constant translation.
     *
     * @param source where c comes from
     */
    record Constant(double c, String source) implements VolumeTranslation {
        @Override
        public double c(double t) {
            return c;
        }

        @Override
        public double dcdT(double t) {
            return 0;
        }

        @Override
        public double d2cdT2(double t) {
            return 0;
        }

        @Override
        public boolean temperatureDependent() {
            return false;
        }

        @Override
        public String describe() {
            return String.format(Locale.US, "constant, c = %.4g cm3/mol (%s)", c * 1e6, source);
        }
    }

    /**
     * The translation that makes the cubic's saturated-liquid volume equal a published
     * saturated-liquid density correlation: c(T) = v_L,cubic(T) - v_L,correlation(T), evaluated at
     * uniformly spaced temperatures from max(T_min of the correlation, 0.3 Tc) to 0.90 Tc and
     * joined by a natural cubic spline (continuous c, c' and c''). Outside that range c' goes to
     * zero along a smoothstep over {@link #TAPER} Tc and c is constant beyond, so c, c' and c'' stay
     * continuous for a supercritical component of a mixture and for cold states.
     */
    final class Anchored implements VolumeTranslation {
        /** Number of anchor temperatures. */
        static final int NODES = 66;
        /** Highest anchor, as a fraction of Tc. */
        static final double TR_HIGH = 0.90;
        /** Lowest anchor, as a fraction of Tc, unless the correlation starts higher. */
        static final double TR_LOW = 0.30;
        /** Width of the taper outside the anchors, as a fraction of Tc. */
        static final double TAPER = 0.10;

        private final double lo;
        private final double h;
        private final double[] y;
        private final double[] m2;
        private final double w;
        private final double slopeLo;
        private final double slopeHi;
        private final String source;

        private Anchored(double lo, double h, double[] y, double[] m2, double w, String source) {
            this.lo = lo;
            this.h = h;
            this.y = y;
            this.m2 = m2;
            this.w = w;
            this.source = source;
            this.slopeLo = splineSlope(0, 0.0);
            this.slopeHi = splineSlope(y.length - 2, 1.0);
        }

        /**
         * Builds the translation of one component from its untranslated one-component model.
         *
         * @throws org.ventcase.common.VentcaseException when a saturation point cannot be found
         */
        static Anchored build(CubicModel raw, SaturatedLiquidDensity.Correlation corr) {
            double tc = raw.tc(0);
            double mw = raw.components().get(0).molarMass();
            double tLo = Math.max(corr.tMinK(), TR_LOW * tc);
            double tHi = TR_HIGH * Math.min(tc, corr.tMaxK());
            if (!(tHi > tLo)) {
                throw new IllegalArgumentException("no anchor range for " + corr.component());
            }
            int n = NODES;
            double h = (tHi - tLo) / (n - 1);
            double[] y = new double[n];
            PureSaturation sat = new PureSaturation(raw);
            for (int i = 0; i < n; i++) {
                double t = tLo + i * h;
                double vl = sat.liquidMolarVolumeCubic(t);
                y[i] = vl - corr.molarVolume(t, mw);
                if (!Double.isFinite(y[i])) {
                    throw new org.ventcase.common.NoSolutionException("volumeTranslation", String.format(Locale.US,
                            "the translation of %s at %.2f K is not finite", corr.component(), t));
                }
            }
            return new Anchored(tLo, h, y, naturalSecondDerivatives(y, h), TAPER * tc,
                    "anchored on " + corr.source());
        }

        /** Second derivatives of the natural cubic spline through y on a uniform grid (Thomas algorithm). */
        static double[] naturalSecondDerivatives(double[] y, double h) {
            int n = y.length;
            double[] m = new double[n];
            if (n < 3) {
                return m;
            }
            double[] cp = new double[n];
            double[] dp = new double[n];
            for (int i = 1; i < n - 1; i++) {
                double rhs = 6.0 * (y[i + 1] - 2.0 * y[i] + y[i - 1]) / (h * h);
                double denom = 4.0 - (i > 1 ? cp[i - 1] : 0.0);
                cp[i] = 1.0 / denom;
                dp[i] = (rhs - (i > 1 ? dp[i - 1] : 0.0)) / denom;
            }
            for (int i = n - 2; i >= 1; i--) {
                m[i] = dp[i] - cp[i] * m[i + 1];
            }
            return m;
        }

        private double splineSlope(int i, double b) {
            double a = 1.0 - b;
            return (y[i + 1] - y[i]) / h - (3 * a * a - 1) / 6.0 * h * m2[i] + (3 * b * b - 1) / 6.0 * h * m2[i + 1];
        }

        private double hi() {
            return lo + (y.length - 1) * h;
        }

        /** {c, c', c''} at t. */
        private void eval(double t, double[] out) {
            double tHi = hi();
            // Outside the anchors c' goes to zero along a smoothstep, 1 - 3u^2 + 2u^3 (u = distance / w),
            // whose slope is zero at both ends: c, c' and c'' stay continuous (the natural spline's c''
            // is zero at its ends), so no heat capacity or load steps at the joins.
            if (t < lo) {
                double u = Math.min((lo - t) / w, 1.0);
                out[0] = y[0] - slopeLo * w * (u - u * u * u + 0.5 * u * u * u * u);
                out[1] = slopeLo * (1 - 3 * u * u + 2 * u * u * u);
                out[2] = slopeLo * 6 * u * (1 - u) / w;
                return;
            }
            if (t > tHi) {
                double u = Math.min((t - tHi) / w, 1.0);
                int last = y.length - 1;
                out[0] = y[last] + slopeHi * w * (u - u * u * u + 0.5 * u * u * u * u);
                out[1] = slopeHi * (1 - 3 * u * u + 2 * u * u * u);
                out[2] = -slopeHi * 6 * u * (1 - u) / w;
                return;
            }
            int i = Math.min((int) ((t - lo) / h), y.length - 2);
            double b = (t - (lo + i * h)) / h;
            double a = 1.0 - b;
            out[0] = a * y[i] + b * y[i + 1] + ((a * a * a - a) * m2[i] + (b * b * b - b) * m2[i + 1]) * h * h / 6.0;
            out[1] = (y[i + 1] - y[i]) / h - (3 * a * a - 1) / 6.0 * h * m2[i] + (3 * b * b - 1) / 6.0 * h * m2[i + 1];
            out[2] = a * m2[i] + b * m2[i + 1];
        }

        private double part(double t, int which) {
            double[] o = new double[3];
            eval(t, o);
            return o[which];
        }

        @Override
        public double c(double t) {
            return part(t, 0);
        }

        @Override
        public double dcdT(double t) {
            return part(t, 1);
        }

        @Override
        public double d2cdT2(double t) {
            return part(t, 2);
        }

        @Override
        public boolean temperatureDependent() {
            return true;
        }

        /** The anchor range, K: {lowest, highest}. */
        public double[] anchorRange() {
            return new double[] {lo, hi()};
        }

        @Override
        public String describe() {
            return String.format(Locale.US,
                    "temperature-dependent, c(T) = v_L,cubic - v_L,correlation at saturation, %.1f-%.1f K (%s)", lo,
                    hi(), source);
        }
    }
}
