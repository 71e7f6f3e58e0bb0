package org.ventcase.thermo;

/**
 * Temperature dependence of the attraction parameter, a(T) = a_c alpha(Tr), with its first and
 * second derivatives with respect to the reduced temperature Tr = T/Tc (needed for enthalpy,
 * entropy and heat capacities). Implementations are immutable and satisfy alpha(1) = 1.
 */
public interface AlphaFunction {

    /** alpha at reduced temperature tr. */
    double alpha(double tr);

    /** d alpha / d Tr. */
    double dAlpha(double tr);

    /** d2 alpha / d Tr2. */
    double d2Alpha(double tr);

    /** Short description for the calculation trace, e.g. "Soave, m = 0.5999". */
    String describe();

    /** alpha = 1: the van der Waals equation (1873) has no temperature dependence in a. */
    record Constant() implements AlphaFunction {
        @Override
        public double alpha(double tr) {
            return 1.0;
        }

        @Override
        public double dAlpha(double tr) {
            return 0.0;
        }

        @Override
        public double d2Alpha(double tr) {
            return 0.0;
        }

        @Override
        public String describe() {
            return "alpha = 1";
        }
    }

    /**
     * alpha = Tr^-1/2.
     *
     * <p>Source: O. Redlich, J.N.S. Kwong, Chem. Rev. 44 (1949) 233-244, DOI 10.1021/cr60137a013.
     */
    record RedlichKwong() implements AlphaFunction {
        @Override
        public double alpha(double tr) {
            return 1.0 / Math.sqrt(tr);
        }

        @Override
        public double dAlpha(double tr) {
            return -0.5 / (tr * Math.sqrt(tr));
        }

        @Override
        public double d2Alpha(double tr) {
            return 0.75 / (tr * tr * Math.sqrt(tr));
        }

        @Override
        public String describe() {
            return "alpha = Tr^-0.5";
        }
    }

    /**
     * Soave form alpha = [1 + m (1 - sqrt(Tr))]^2, with m from an acentric-factor correlation
     * ({@link MCorrelation}).
     *
     * <p>Source: G. Soave, Chem. Eng. Sci. 27 (1972) 1197-1203, DOI 10.1016/0009-2509(72)80096-4.
     *
     * @param m the slope parameter
     * @param correlation which published m(omega) produced it (for the trace)
     */
    record Soave(double m, MCorrelation correlation) implements AlphaFunction {
        public Soave {
            if (!Double.isFinite(m)) {
                throw new IllegalArgumentException("Soave m must be finite");
            }
        }

        @Override
        public double alpha(double tr) {
            double s = 1.0 + m * (1.0 - Math.sqrt(tr));
            return s * s;
        }

        @Override
        public double dAlpha(double tr) {
            double sq = Math.sqrt(tr);
            double s = 1.0 + m * (1.0 - sq);
            return -m * s / sq;
        }

        @Override
        public double d2Alpha(double tr) {
            double sq = Math.sqrt(tr);
            // d/dTr of -m s Tr^-1/2 = m^2/(2 Tr) + m s/(2 Tr^1.5)
            double s = 1.0 + m * (1.0 - sq);
            return m * m / (2.0 * tr) + m * s / (2.0 * tr * sq);
        }

        @Override
        public String describe() {
            return String.format(java.util.Locale.US, "Soave form, m = %.5f (%s)", m, correlation.citation());
        }
    }
    /**
     * Twu (1991) form alpha = Tr^(N(M - 1)) exp[L (1 - Tr^(M N))], with per-component published L,
     * M and N. With g = d ln alpha/d Tr = N (M - 1)/Tr - L M N Tr^(M N - 1):
     * d alpha/d Tr = alpha g and d2 alpha/d Tr2 = alpha (g^2 + g'),
     * g' = -N (M - 1)/Tr^2 - L M N (M N - 1) Tr^(M N - 2).
     *
     * <p>Source: C.H. Twu, D. Bluck, J.R. Cunningham, J.E. Coon, Fluid Phase Equilib. 69 (1991)
     * 33-50, DOI 10.1016/0378-3812(91)90024-2. The parameters carry their own source
     * ({@link TwuParameters}).
     *
     * @param source where L, M and N come from (for the trace)
     */
    record Twu(double l, double m, double n, String source) implements AlphaFunction {
        public Twu {
            if (!(Double.isFinite(l) && Double.isFinite(m) && Double.isFinite(n)) || !(m > 0) || !(n > 0)) {
                throw new IllegalArgumentException("Twu L, M, N must be finite with M, N > 0");
            }
        }

        // One logarithm and two exponentials per evaluation: Tr^(M N) = exp(M N ln Tr).
        @Override
        public double alpha(double tr) {
            double lt = Math.log(tr);
            return Math.exp(n * (m - 1.0) * lt + l * (1.0 - Math.exp(m * n * lt)));
        }

        private double g(double tr, double trMn) {
            return n * (m - 1.0) / tr - l * m * n * trMn / tr;
        }

        @Override
        public double dAlpha(double tr) {
            double lt = Math.log(tr);
            double trMn = Math.exp(m * n * lt);
            double a = Math.exp(n * (m - 1.0) * lt + l * (1.0 - trMn));
            return a * g(tr, trMn);
        }

        @Override
        public double d2Alpha(double tr) {
            double lt = Math.log(tr);
            double trMn = Math.exp(m * n * lt);
            double a = Math.exp(n * (m - 1.0) * lt + l * (1.0 - trMn));
            double g = g(tr, trMn);
            double g1 = -n * (m - 1.0) / (tr * tr) - l * m * n * (m * n - 1.0) * trMn / (tr * tr);
            return a * (g * g + g1);
        }

        @Override
        public String describe() {
            return String.format(java.util.Locale.US, "Twu form, L = %.6f, M = %.6f, N = %.6f (%s)", l, m, n, source);
        }
    }
}
