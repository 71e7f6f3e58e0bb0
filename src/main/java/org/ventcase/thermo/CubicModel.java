package org.ventcase.thermo;

import static org.ventcase.common.PhysicalConstants.R;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.InvalidInputException;

/**
 * One cubic equation of state applied to a fixed set of components: the generic algorithm that
 * every {@link EosVariant} shares. Immutable and thread-safe; all state lives in arguments and
 * results.
 *
 * <p>Equation (see {@link EosVariant} for the sign convention):
 * P = R T/(v - b) - a/((v + sigma b)(v + epsilon b)). In terms of A = a P/(R T)^2, B = b P/(R T):
 * Z^3 + ((u - 1) B - 1) Z^2 + (A + w B^2 - u B^2 - u B) Z - (A B + w B^2 + w B^3) = 0, u = sigma
 * + epsilon, w = sigma epsilon.
 *
 * <p>With q = a/(b R T) and I = ln((Z + sigma B)/(Z + epsilon B))/(sigma - epsilon)
 * (I = B/(Z + epsilon B) when sigma = epsilon):
 * <ul>
 * <li>ln phi_i = (b_i/b)(Z - 1) - ln(Z - B) - q (2 aBar_i/a - b_i/b) I</li>
 * <li>H^R/(R T) = Z - 1 + (T a'/a - 1) q I;  S^R/R = ln(Z - B) + (T a'/a) q I</li>
 * <li>Cv^R = T a'' I/b (from Cv^R = integral of T (d2P/dT2)_v dv)</li>
 * <li>Cp = Cv + T (dP/dT)_v^2 / (-(dP/dv)_T)</li>
 * </ul>
 * Source: J.M. Smith, H.C. Van Ness, M.M. Abbott, Introduction to Chemical Engineering
 * Thermodynamics, 7th ed., 2005, eqs. (6.66)-(6.68) and (14.103)-(14.104) (fugacity in the
 * partial-parameter form); M.L. Michelsen, J.M. Mollerup, Thermodynamic Models: Fundamentals and
 * Computational Aspects, 2nd ed., 2007, ch. 3 (derivatives). The derivative identities are
 * checked against finite differences in the tests.
 */
public final class CubicModel {

    private final EosVariant variant;
    private final List<Component> components;
    private final double[][] oneMinusKij;
    private final double[][] kij;
    private final AlphaFunction[] alphas;
    private final double[] ac;
    private final double[] bi;
    private final double[] tc;
    private final double[] pc;
    private final VolumeTranslation[] shift;
    private final boolean shiftVaries;
    private final List<String> notes;
    private final double[] molarMass;
    private final double sigma;
    private final double epsilon;
    private final double u;
    private final double w;

    /**
     * @param kij binary interaction parameters, symmetric with zero diagonal; {@code null} for
     *            all zero
     */
    public CubicModel(EosVariant variant, List<Component> components, double[][] kij) {
        this(variant, components, kij, true);
    }

    /** A one-component model of the variant without its volume translation (builds the anchored one). */
    static CubicModel untranslated(EosVariant variant, Component c) {
        return new CubicModel(variant, List.of(c), null, false);
    }

    private CubicModel(EosVariant variant, List<Component> components, double[][] kij, boolean translated) {
        if (components == null || components.isEmpty()) {
            throw InvalidInputException.missing("fluid.components", "expected at least one component");
        }
        this.variant = variant;
        this.components = List.copyOf(components);
        int n = this.components.size();
        this.kij = new double[n][n];
        this.oneMinusKij = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double k = kij == null || i == j ? 0.0 : kij[i][j];
                if (kij != null && i != j) {
                    if (!(Math.abs(k) < 1.0)) {
                        throw InvalidInputException.outOfRange("fluid.kij[" + i + "][" + j + "]", k, -1, 1, "");
                    }
                    if (kij[i][j] != kij[j][i]) {
                        throw InvalidInputException.invalid("fluid.kij[" + i + "][" + j + "]", k,
                                "expected a symmetric matrix (k_ij = k_ji = " + kij[j][i] + ")");
                    }
                }
                this.kij[i][j] = k;
                this.oneMinusKij[i][j] = 1.0 - k;
            }
        }
        alphas = new AlphaFunction[n];
        ac = new double[n];
        bi = new double[n];
        tc = new double[n];
        pc = new double[n];
        molarMass = new double[n];
        shift = translated && variant.hasVolumeShift() ? new VolumeTranslation[n] : null;
        List<String> notes = new ArrayList<>();
        boolean varies = false;
        for (int i = 0; i < n; i++) {
            Component c = this.components.get(i);
            EosVariant.Constants k = variant.constants(c);
            alphas[i] = k.alpha();
            tc[i] = k.tcK();
            pc[i] = k.pcPa();
            double rt = R * k.tcK();
            ac[i] = variant.omegaA() * rt * rt / k.pcPa();
            bi[i] = variant.omegaB() * rt / k.pcPa();
            molarMass[i] = c.molarMass();
            if (!k.note().isEmpty()) {
                notes.add(k.note());
            }
            if (shift != null) {
                shift[i] = variant.translation(c);
                varies |= shift[i].temperatureDependent();
                String tn = variant.translationNote(c);
                if (!tn.isEmpty()) {
                    notes.add(tn);
                }
            }
        }
        this.shiftVaries = varies;
        for (Component c : this.components) {
            String a = AssociatingFluids.note(c, variant);
            if (!a.isEmpty()) {
                notes.add(a);
            }
        }
        this.notes = List.copyOf(notes);
        sigma = variant.sigma();
        epsilon = variant.epsilon();
        u = sigma + epsilon;
        w = sigma * epsilon;
    }

    /** A model for one pure component. */
    public static CubicModel pure(EosVariant variant, Component c) {
        return new CubicModel(variant, List.of(c), null);
    }

    public EosVariant variant() {
        return variant;
    }

    public List<Component> components() {
        return components;
    }

    public int size() {
        return components.size();
    }

    /** The k_ij matrix in use (copy). */
    public double[][] kij() {
        double[][] out = new double[kij.length][];
        for (int i = 0; i < kij.length; i++) {
            out[i] = kij[i].clone();
        }
        return out;
    }

    /** Critical temperature the model uses for component i, K (a published set may bring its own). */
    public double tc(int i) {
        return tc[i];
    }

    /** Critical pressure the model uses for component i, Pa. */
    public double pc(int i) {
        return pc[i];
    }

    /** The volume translation of component i, or {@code null} where the model has none. */
    public VolumeTranslation translation(int i) {
        return shift == null ? null : shift[i];
    }

    /**
     * Warnings about the model's constants: a component for which a fallback is in use (no
     * published parameter set), each naming the component. Empty for the classic variants.
     */
    public List<String> notes() {
        return notes;
    }

    /** The notes of the components present (x_i > 0) in a composition. */
    public List<String> notes(double[] x) {
        if (notes.isEmpty()) {
            return notes;
        }
        List<String> out = new ArrayList<>();
        for (int i = 0; i < components.size(); i++) {
            if (x[i] > 0) {
                String name = components.get(i).name() + ":";
                for (String n : notes) {
                    if (n.startsWith(name)) {
                        out.add(n);
                    }
                }
            }
        }
        return out;
    }

    /** The alpha function of component i (for the trace). */
    public AlphaFunction alpha(int i) {
        return alphas[i];
    }

    /** Molar mass of a composition, kg/kmol. */
    public double molarMass(double[] x) {
        double m = 0;
        for (int i = 0; i < x.length; i++) {
            m += x[i] * molarMass[i];
        }
        return m;
    }

    /**
     * The temperature-dependent parameters of every component at one temperature, with the
     * cross terms a_ij = (1 - k_ij) sqrt(a_i a_j) and their first and second temperature
     * derivatives. Computing them once per temperature and reusing them for every composition at
     * that temperature ({@link #mix(AtTemperature, double[])}) avoids re-evaluating alpha(T) and
     * the n^2 square roots in every mixing-rule call. Immutable and thread-safe: a value object,
     * made per call by a solver and handed down explicitly, never cached inside the model.
     *
     * <p>Derivatives of a_ij = (1 - k_ij) sqrt(g), g = a_i a_j:
     * da_ij/dT = (1 - k_ij) g'/(2 sqrt g), d2a_ij/dT2 = (1 - k_ij) (g''/(2 sqrt g) - g'^2/(4 g sqrt g)),
     * g' = a_i' a_j + a_i a_j', g'' = a_i'' a_j + 2 a_i' a_j' + a_i a_j''. On the diagonal these
     * reduce to a_i, a_i', a_i'' and are stored as such.
     */
    public static final class AtTemperature {
        private final double t;
        private final double[][] aij;
        private final double[][] daij;
        private final double[][] d2aij;

        private AtTemperature(double t, double[][] aij, double[][] daij, double[][] d2aij) {
            this.t = t;
            this.aij = aij;
            this.daij = daij;
            this.d2aij = d2aij;
        }

        /** Temperature, K. */
        public double t() {
            return t;
        }

        /** a_ij = (1 - k_ij) sqrt(a_i a_j) at this temperature, Pa m6/mol2. */
        public double aij(int i, int j) {
            return aij[i][j];
        }

        /** da_ij/dT at this temperature. */
        public double daij(int i, int j) {
            return daij[i][j];
        }

        /** d2a_ij/dT2 at this temperature. */
        public double d2aij(int i, int j) {
            return d2aij[i][j];
        }
    }

    /** The per-temperature parameters at T (see {@link AtTemperature}). */
    public AtTemperature at(double t) {
        int n = ac.length;
        double[] ai = new double[n];
        double[] dai = new double[n];
        double[] d2ai = new double[n];
        for (int i = 0; i < n; i++) {
            double tr = t / tc[i];
            ai[i] = ac[i] * alphas[i].alpha(tr);
            dai[i] = ac[i] * alphas[i].dAlpha(tr) / tc[i];
            d2ai[i] = ac[i] * alphas[i].d2Alpha(tr) / (tc[i] * tc[i]);
        }
        double[][] aij = new double[n][n];
        double[][] daij = new double[n][n];
        double[][] d2aij = new double[n][n];
        for (int i = 0; i < n; i++) {
            aij[i][i] = ai[i];
            daij[i][i] = dai[i];
            d2aij[i][i] = d2ai[i];
            for (int j = i + 1; j < n; j++) {
                double g = ai[i] * ai[j];
                double sg = Math.sqrt(g);
                double g1 = dai[i] * ai[j] + ai[i] * dai[j];
                double g2 = d2ai[i] * ai[j] + 2.0 * dai[i] * dai[j] + ai[i] * d2ai[j];
                double k = oneMinusKij[i][j];
                double v = k * sg;
                double dv = k * (g1 / (2.0 * sg));
                double d2v = k * (g2 / (2.0 * sg) - g1 * g1 / (4.0 * g * sg));
                aij[i][j] = v;
                aij[j][i] = v;
                daij[i][j] = dv;
                daij[j][i] = dv;
                d2aij[i][j] = d2v;
                d2aij[j][i] = d2v;
            }
        }
        return new AtTemperature(t, aij, daij, d2aij);
    }

    /** Mixing rule at T and composition x (mole fractions, assumed normalised). */
    public MixParams mix(double t, double[] x) {
        int n = ac.length;
        if (n == 1) {
            double tr = t / tc[0];
            AlphaFunction al = alphas[0];
            double a = ac[0] * al.alpha(tr);
            return new MixParams(t, a, ac[0] * al.dAlpha(tr) / tc[0], ac[0] * al.d2Alpha(tr) / (tc[0] * tc[0]),
                    bi[0], new double[] {a}, bi);
        }
        return mix(at(t), x);
    }

    /**
     * Mixing rule with the per-temperature parameters already evaluated: the same quantities as
     * {@link #mix(double, double[])} at at.t(), in O(n^2) multiply-adds and no square roots.
     * a = sum_i x_i aBar_i with aBar_i = sum_j x_j a_ij; da/dT and d2a/dT2 from the symmetric
     * derivative matrices over the upper triangle.
     */
    public MixParams mix(AtTemperature at, double[] x) {
        int n = ac.length;
        if (n == 1) {
            double a = at.aij[0][0];
            return new MixParams(at.t, a, at.daij[0][0], at.d2aij[0][0], bi[0], new double[] {a}, bi);
        }
        double a = 0;
        double da = 0;
        double d2a = 0;
        double b = 0;
        double[] aBar = new double[n];
        for (int i = 0; i < n; i++) {
            double xi = x[i];
            double[] row = at.aij[i];
            double[] drow = at.daij[i];
            double[] d2row = at.d2aij[i];
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += x[j] * row[j];
            }
            aBar[i] = s;
            a += xi * s;
            b += xi * bi[i];
            double ds = 0.5 * xi * drow[i];
            double d2s = 0.5 * xi * d2row[i];
            for (int j = i + 1; j < n; j++) {
                ds += x[j] * drow[j];
                d2s += x[j] * d2row[j];
            }
            da += 2.0 * xi * ds;
            d2a += 2.0 * xi * d2s;
        }
        return new MixParams(at.t, a, da, d2a, b, aBar, bi);
    }

    /** Pressure at molar volume v (m3/mol) from the equation itself, Pa. */
    public double pressure(MixParams m, double v) {
        double b = m.b();
        return R * m.t() / (v - b) - m.a() / ((v + sigma * b) * (v + epsilon * b));
    }

    /** Dimensionless A = a P/(R T)^2. */
    static double bigA(MixParams m, double p) {
        double rt = R * m.t();
        return m.a() * p / (rt * rt);
    }

    /** Dimensionless B = b P/(R T). */
    static double bigB(MixParams m, double p) {
        return m.b() * p / (R * m.t());
    }

    /** All real roots of the cubic in Z at (T, P) for these parameters. */
    public CubicRoots roots(MixParams m, double p) {
        double aa = bigA(m, p);
        double bb = bigB(m, p);
        double c2 = (u - 1.0) * bb - 1.0;
        double c1 = aa + w * bb * bb - u * bb * bb - u * bb;
        double c0 = -(aa * bb + w * bb * bb + w * bb * bb * bb);
        return CubicSolver.solve(c2, c1, c0, bb, newtonStart(aa, bb, c2, c1, c0));
    }

    /**
     * Where Newton's method starts from above for the largest root: Z = 1 + B - A/(1 + 2B), close
     * above the vapour root at ordinary states, where CubicSolver.startAbove proves it is above
     * every root; else the bound 1 + B (the attraction term only lowers Z below v/(v - b)). Every
     * root path starts here, so all of them give identical roots.
     */
    private static double newtonStart(double aa, double bb, double c2, double c1, double c0) {
        return CubicSolver.startAbove(c2, c1, c0, 1.0 + bb - aa / (1.0 + 2.0 * bb), 1.0 + bb + 1e-12);
    }

    /**
     * Z of the requested root without building a {@link RootSelection}: LIQUID the smallest
     * physical root, VAPOR the largest, STABLE the one of the two with the lower G^R/RT; where
     * there is a single physical root it is returned whatever was requested. The same choice as
     * {@link #select} makes, for inner loops that need only Z.
     */
    public double chooseZ(MixParams m, double p, PhaseRequest request) {
        double aa = bigA(m, p);
        double bb = bigB(m, p);
        double[] ends = new double[2];
        int nPhys = outerPhysicalRoots(aa, bb, m.t(), p, ends);
        double zl = ends[0];
        double zv = ends[1];
        if (nPhys == 1 || request == PhaseRequest.LIQUID) {
            return zl;
        }
        if (request == PhaseRequest.VAPOR) {
            return zv;
        }
        return reducedResidualGibbs(m, p, zl) < reducedResidualGibbs(m, p, zv) ? zl : zv;
    }

    /** I = ln((Z + sigma B)/(Z + epsilon B))/(sigma - epsilon), or B/(Z + epsilon B) if equal. */
    double integralI(double z, double bb) {
        if (sigma == epsilon) {
            return bb / (z + epsilon * bb);
        }
        return Math.log((z + sigma * bb) / (z + epsilon * bb)) / (sigma - epsilon);
    }

    /** G^R/(R T) of the phase with compressibility z (= sum x_i ln phi_i). */
    public double reducedResidualGibbs(MixParams m, double p, double z) {
        double aa = bigA(m, p);
        double bb = bigB(m, p);
        return z - 1.0 - Math.log(z - bb) - aa / bb * integralI(z, bb);
    }

    /**
     * Chooses a root. LIQUID takes the smallest physical root, VAPOR the largest; STABLE compares
     * the reduced residual Gibbs energy of the smallest and largest roots (same T, P and
     * composition, so the difference in G equals the difference in G^R) and takes the lower.
     * Where only one root exists it is returned; whether it is liquid-like is decided by its
     * volume against v* = (Zc/Omega_b) b, the volume at which the spinodal curve has its maximum
     * (the critical volume of the equation at the critical point).
     */
    public RootSelection select(MixParams m, double p, PhaseRequest request) {
        CubicRoots r = roots(m, p);
        if (r.count() == 1) {
            double z = r.smallest();
            double vStar = variant.zc() / variant.omegaB() * m.b();
            boolean liquidLike = z * R * m.t() / p < vStar;
            boolean missing = request == PhaseRequest.LIQUID && !liquidLike
                    || request == PhaseRequest.VAPOR && liquidLike;
            return new RootSelection(z, r, request, liquidLike, missing, 0, 0);
        }
        double zl = r.smallest();
        double zv = r.largest();
        switch (request) {
            case LIQUID:
                return new RootSelection(zl, r, request, true, false, 0, 0);
            case VAPOR:
                return new RootSelection(zv, r, request, false, false, 0, 0);
            default:
                double gl = reducedResidualGibbs(m, p, zl);
                double gv = reducedResidualGibbs(m, p, zv);
                boolean liq = gl < gv;
                return new RootSelection(liq ? zl : zv, r, request, liq, false, gl, gv);
        }
    }

    /**
     * Fugacity coefficients: writes ln phi_i into {@code out} and returns sum x_i ln phi_i is not
     * computed here; use {@link #reducedResidualGibbs} for that.
     */
    public void lnPhi(MixParams m, double p, double z, double[] out) {
        double aa = bigA(m, p);
        double bb = bigB(m, p);
        double q = aa / bb;
        double iI = integralI(z, bb);
        double lnZB = Math.log(z - bb);
        double b = m.b();
        double a = m.a();
        double[] aBar = m.aBar();
        double[] bb_i = m.bi();
        for (int i = 0; i < out.length; i++) {
            double br = bb_i[i] / b;
            out[i] = br * (z - 1.0) - lnZB - q * (2.0 * aBar[i] / a - br) * iI;
        }
    }

    /**
     * Analytic derivatives of ln phi at root z of the phase with parameters m (made by
     * {@link #mix(AtTemperature, double[])} from {@code at} and composition x, per mole of mixture):
     * any of the outputs may be null and is then skipped.
     *
     * <p>From Michelsen's reduced residual Helmholtz energy of the two-parameter cubic,
     * F(T, V, n) = -n g(V, B) - (D(T)/T) f(V, B), g = ln(1 - B/V),
     * f = ln((V + sigma B)/(V + epsilon B))/(R B (sigma - epsilon)) (f = 1/(R (V + epsilon B)) when
     * sigma = epsilon), B = sum n_i b_i, D = sum_i sum_j n_i n_j a_ij, evaluated at N = 1 mol:
     * <ul>
     * <li>N (d ln phi_i/d n_j)_{T,P} = F_nB (b_i + b_j) + F_BB b_i b_j + F_D 2 a_ij
     * + F_BD (b_i D_j + b_j D_i) + 1 + P_i P_j/(R T P_V), with D_i = 2 aBar_i, P_i = (dP/dn_i)_{T,V},
     * P_V = (dP/dV)_{T,n};</li>
     * <li>(d ln phi_i/dT)_{P,n} = F_iT + 1/T + P_i P_T/(R T P_V), F_iT = -(D_T/T - D/T^2) f_B b_i
     * + (f/T^2) D_i - (f/T) D_iT, D_iT = 2 sum_j x_j da_ij/dT;</li>
     * <li>(d ln phi_i/d ln P)_{T,n} = P vbar_i/(R T) - 1, vbar_i = -P_i/P_V.</li>
     * </ul>
     * with F_nB = -g_B, F_BB = -g_BB - (D/T) f_BB, F_D = -f/T, F_BD = -f_B/T and g_B = -1/(V - B),
     * g_BB = -1/(V - B)^2, f_V = -1/(R (V + sigma B)(V + epsilon B)), f_B = -(f + V f_V)/B,
     * f_VV = (2 V + (sigma + epsilon) B)/(R ((V + sigma B)(V + epsilon B))^2),
     * f_BV = -(2 f_V + V f_VV)/B, f_BB = -(2 f_B + V f_BV)/B.
     * Source: M.L. Michelsen, J.M. Mollerup, Thermodynamic Models: Fundamentals and Computational
     * Aspects, 2nd ed., 2007, ch. 2 (derivatives of ln phi from F) and ch. 3 (the cubic's g and
     * f). The tests check them against finite differences and against the exact identities
     * sum_i x_i N d ln phi_i/d n_j = 0, sum_i x_i d ln phi_i/dT = -H^R/(R T^2) and
     * sum_i x_i d ln phi_i/d ln P = Z - 1.
     *
     * @param dlnPhiDt   (d ln phi_i/dT)_{P,x}, 1/K
     * @param dlnPhiDlnP (d ln phi_i/d ln P)_{T,x}
     * @param dlnPhiDn   N (d ln phi_i/d n_j)_{T,P} at N = 1 (symmetric, n x n)
     */
    public void lnPhiDerivatives(AtTemperature at, MixParams m, double[] x, double p, double z, double[] dlnPhiDt,
                                 double[] dlnPhiDlnP, double[][] dlnPhiDn) {
        int n = ac.length;
        double t = m.t();
        double rt = R * t;
        double v = z * rt / p;
        double b = m.b();
        double a = m.a();
        double vb = v - b;
        double d1 = v + sigma * b;
        double d2 = v + epsilon * b;
        double d = d1 * d2;
        double f = sigma == epsilon ? 1.0 / (R * d2) : Math.log(d1 / d2) / (R * b * (sigma - epsilon));
        double fV = -1.0 / (R * d);
        double fB = -(f + v * fV) / b;
        double pV = -rt / (vb * vb) + a * (2.0 * v + u * b) / (d * d);
        double[] aBar = m.aBar();
        double[] pn = new double[n];
        double c = a * (u * v + 2.0 * w * b) / (d * d);
        for (int i = 0; i < n; i++) {
            pn[i] = rt / vb + rt * bi[i] / (vb * vb) - 2.0 * aBar[i] / d + c * bi[i];
        }
        if (dlnPhiDlnP != null) {
            for (int i = 0; i < n; i++) {
                dlnPhiDlnP[i] = -p * pn[i] / (pV * rt) - 1.0;
            }
        }
        if (dlnPhiDt != null) {
            double pT = R / vb - m.dadt() / d;
            double fb = -(m.dadt() / t - a / (t * t)) * fB;
            double fd = f / (t * t);
            double fdT = f / t;
            double rtPv = rt * pV;
            for (int i = 0; i < n; i++) {
                double daBar = 0;
                if (n == 1) {
                    daBar = at.daij[0][0];
                } else {
                    double[] row = at.daij[i];
                    for (int j = 0; j < n; j++) {
                        daBar += x[j] * row[j];
                    }
                }
                double fiT = fb * bi[i] + fd * 2.0 * aBar[i] - fdT * 2.0 * daBar;
                dlnPhiDt[i] = fiT + 1.0 / t + pn[i] * pT / rtPv;
            }
        }
        if (dlnPhiDn != null) {
            double fVV = (2.0 * v + u * b) / (R * d * d);
            double fBV = -(2.0 * fV + v * fVV) / b;
            double fBB = -(2.0 * fB + v * fBV) / b;
            double fnB = 1.0 / vb;
            double fBBt = 1.0 / (vb * vb) - a / t * fBB;
            double fD = -f / t;
            double fBD = -fB / t;
            double rtPv = rt * pV;
            for (int i = 0; i < n; i++) {
                double[] row = dlnPhiDn[i];
                double[] aRow = at.aij[i];
                for (int j = i; j < n; j++) {
                    double val = fnB * (bi[i] + bi[j]) + fBBt * bi[i] * bi[j] + fD * 2.0 * aRow[j]
                            + fBD * 2.0 * (bi[i] * aBar[j] + bi[j] * aBar[i]) + 1.0 + pn[i] * pn[j] / rtPv;
                    row[j] = val;
                    dlnPhiDn[j][i] = val;
                }
            }
        }
    }

    /**
     * Z and ln phi of a pure fluid at (T, P) for the requested root: the fast path used where many
     * states are evaluated (the Gibbs energies compared for the stable root are the ln phi values).
     *
     * @return {Z, ln phi}
     */
    public double[] pureZAndLnPhi(double t, double p, PhaseRequest request) {
        if (size() != 1) {
            throw new IllegalStateException("pure-fluid path on a " + size() + "-component model");
        }
        // Only a(T) is needed here (no temperature derivatives), and each root's G^R/RT is
        // evaluated at most once: for the stable root it is both the criterion and ln phi.
        double a = ac[0] * alphas[0].alpha(t / tc[0]);
        double b = bi[0];
        double rt = R * t;
        double aa = a * p / (rt * rt);
        double bb = b * p / rt;
        double[] ends = new double[2];
        int nPhys = outerPhysicalRoots(aa, bb, t, p, ends);
        double zl = ends[0];
        double zv = ends[1];
        double q = aa / bb;
        double z;
        double lnPhi;
        if (nPhys == 1 || request == PhaseRequest.LIQUID) {
            z = zl;
            lnPhi = gResidual(zl, bb, q);
        } else if (request == PhaseRequest.VAPOR) {
            z = zv;
            lnPhi = gResidual(zv, bb, q);
        } else {
            double gl = gResidual(zl, bb, q);
            double gv = gResidual(zv, bb, q);
            boolean liq = gl < gv;
            z = liq ? zl : zv;
            lnPhi = liq ? gl : gv;
        }
        return new double[] {z, lnPhi};
    }

    /**
     * The smallest and largest physical roots (Z > B) of the cubic for A and B, written into
     * {ends[0], ends[1]}; returns how many physical roots there are (1 to 3).
     */
    private int outerPhysicalRoots(double aa, double bb, double t, double p, double[] ends) {
        double c2 = (u - 1.0) * bb - 1.0;
        double c1 = aa + w * bb * bb - u * bb * bb - u * bb;
        double c0 = -(aa * bb + w * bb * bb + w * bb * bb * bb);
        double start = newtonStart(aa, bb, c2, c1, c0);
        // The common case (Newton from above finds the largest root) uses its own scratch array
        // and calls only small methods, with constant indices, so that the JIT can keep it in
        // registers; the rare analytic fallback has another.
        double zTop = CubicSolver.largestRootByNewton(c2, c1, c0, start);
        int code;
        double lo;
        double mid;
        double hi;
        if (!Double.isNaN(zTop)) {
            double[] all = new double[3];
            code = CubicSolver.deflated(zTop, c2, c1, c0, all);
            lo = all[0];
            mid = all[1];
            hi = all[2];
        } else {
            double[] all = new double[3];
            code = CubicSolver.rootsCoded(c2, c1, c0, start, all);
            lo = all[0];
            mid = all[1];
            hi = all[2];
        }
        if (code == 0) {
            hi = lo;
        }
        int nPhys;
        if (code == 0) {
            nPhys = lo > bb ? 1 : 0;
        } else if (lo > bb) {
            nPhys = 3;
        } else {
            nPhys = hi > bb ? (mid > bb ? 2 : 1) : 0;
            lo = mid > bb ? mid : hi;
        }
        if (nPhys == 0) {
            throw new IllegalStateException("no physical root of the cubic (Z > B) at T = " + t + " K, P = " + p
                    + " Pa");
        }
        ends[0] = lo;
        ends[1] = hi;
        return nPhys;
    }

    /** G^R/RT = Z - 1 - ln(Z - B) - (A/B) I, the same expression as {@link #reducedResidualGibbs}. */
    private double gResidual(double z, double bb, double q) {
        return z - 1.0 - Math.log(z - bb) - q * integralI(z, bb);
    }

    /** ln phi of a pure fluid (or of the mixture as a whole: G^R/RT) at root z. */
    public double lnPhiPure(MixParams m, double p, double z) {
        return reducedResidualGibbs(m, p, z);
    }

    /** Residual molar enthalpy H - H^ig at (T, P), J/mol. */
    public double residualEnthalpy(MixParams m, double p, double z) {
        double bb = bigB(m, p);
        double rt = R * m.t();
        double q = m.a() / (m.b() * rt);
        return rt * (z - 1.0 + (m.t() * m.dadt() / m.a() - 1.0) * q * integralI(z, bb));
    }

    /** Residual molar entropy S - S^ig at (T, P), J/(mol K). */
    public double residualEntropy(MixParams m, double p, double z) {
        double bb = bigB(m, p);
        return R * Math.log(z - bb) + m.dadt() / m.b() * integralI(z, bb);
    }

    /** Whether a published volume shift is available for this variant. */
    public boolean hasVolumeShift() {
        return shift != null;
    }

    /** Volume shift of a composition at T, m3/mol (v_translated = v_cubic - c(T, x)). */
    public double volumeShift(double t, double[] x) {
        if (shift == null) {
            throw new IllegalStateException(variant.displayName() + " has no published volume shift");
        }
        double c = 0;
        for (int i = 0; i < x.length; i++) {
            if (x[i] != 0) {
                c += x[i] * shift[i].c(t);
            }
        }
        return c;
    }

    /** d c(T, x)/dT of a composition, m3/(mol K); zero for a constant translation. */
    public double volumeShiftSlope(double t, double[] x) {
        return varyingShiftSum(x, tr -> tr.dcdT(t));
    }

    /** d2 c(T, x)/dT2 of a composition, m3/(mol K2); zero for a constant translation. */
    public double volumeShiftCurvature(double t, double[] x) {
        return varyingShiftSum(x, tr -> tr.d2cdT2(t));
    }

    /** sum_i x_i f(translation_i), zero where the translation does not vary with T. */
    private double varyingShiftSum(double[] x, java.util.function.ToDoubleFunction<VolumeTranslation> f) {
        if (shift == null || !shiftVaries) {
            return 0.0;
        }
        double d = 0;
        for (int i = 0; i < x.length; i++) {
            if (x[i] != 0) {
                d += x[i] * f.applyAsDouble(shift[i]);
            }
        }
        return d;
    }

    /** Whether the translation changes with temperature. */
    public boolean volumeShiftVaries() {
        return shiftVaries;
    }

    /**
     * What the translation adds to the molar enthalpy at (T, P, x), J/mol:
     * -P (c - T dc/dT), from G = G_cubic - P c(T) (see {@link VolumeTranslation}); zero without
     * a translation.
     */
    public double translatedEnthalpyShift(double t, double p, double[] x) {
        if (shift == null) {
            return 0.0;
        }
        return -p * (volumeShift(t, x) - t * volumeShiftSlope(t, x));
    }

    /** Ideal-gas Cp of a composition at T, J/(mol K). */
    public double idealGasCp(double t, double[] x) {
        double cp = 0;
        for (int i = 0; i < x.length; i++) {
            cp += x[i] * components.get(i).cp().cp(t);
        }
        return cp;
    }

    /** Validates T, P and composition at the edge of the core; returns a normalised copy of x. */
    public double[] checkState(double t, double p, double[] x) {
        InvalidInputException.requireInRange("temperature", t, 1.0, 5000.0, "K");
        InvalidInputException.requireInRange("pressure", p, 1e-3, 1e10, "Pa");
        if (x == null || x.length != size()) {
            throw InvalidInputException.invalid("composition", x == null ? "missing" : x.length + " fractions",
                    "expected " + size() + " mole fractions");
        }
        double sum = 0;
        for (int i = 0; i < x.length; i++) {
            if (!(x[i] >= 0 && x[i] <= 1)) {
                throw InvalidInputException.outOfRange("composition[" + i + "]", x[i], 0, 1, "");
            }
            sum += x[i];
        }
        if (!(Math.abs(sum - 1.0) <= 1e-6)) {
            throw InvalidInputException.invalid("composition", String.format(Locale.US, "sum %.9g", sum),
                    "mole fractions must sum to 1 within 1e-6");
        }
        double[] out = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            out[i] = x[i] / sum;
        }
        return out;
    }

    /**
     * Every single-phase property at (T, P, x) for the requested root, with warnings.
     *
     * @param basis the density basis wanted; TRANSLATED falls back to CUBIC with a warning when
     *              the variant has no published volume shift
     */
    public FluidProperties properties(double t, double p, double[] x0, PhaseRequest request, DensityBasis basis) {
        double[] x = checkState(t, p, x0);
        List<String> warnings = new ArrayList<>(notes(x));
        MixParams m = mix(t, x);
        RootSelection sel = select(m, p, request);
        if (sel.requestedMissing()) {
            warnings.add("The " + (request == PhaseRequest.LIQUID ? "liquid" : "vapour")
                    + " root requested does not exist at these conditions (the cubic has one real root, "
                    + (sel.liquidLike() ? "liquid-like" : "vapour-like") + "); properties are for that root.");
        }
        double z = sel.z();
        double rt = R * t;
        double vCubic = z * rt / p;
        DensityBasis used = basis;
        double v = vCubic;
        if (basis == DensityBasis.TRANSLATED) {
            if (hasVolumeShift()) {
                v = vCubic - volumeShift(t, x);
                if (!(v > 0)) {
                    warnings.add("The volume-shifted molar volume is not positive; the cubic volume is used.");
                    v = vCubic;
                    used = DensityBasis.CUBIC;
                }
            } else {
                warnings.add(variant.displayName() + " has no published volume shift: densities are the raw cubic's.");
                used = DensityBasis.CUBIC;
            }
        }
        double mw = molarMass(x);
        double[] lnPhi = new double[x.length];
        lnPhi(m, p, z, lnPhi);
        double hR = residualEnthalpy(m, p, z);
        double sR = residualEntropy(m, p, z);
        double gR = rt * reducedResidualGibbs(m, p, z);

        // Derivatives of P(T, v) on the cubic's own volume (thermodynamically consistent).
        double b = m.b();
        double d1 = vCubic + sigma * b;
        double d2 = vCubic + epsilon * b;
        double den = d1 * d2;
        double dPdT = R / (vCubic - b) - m.dadt() / den;
        double dPdv = -rt / ((vCubic - b) * (vCubic - b)) + m.a() * (2.0 * vCubic + u * b) / (den * den);
        double iI = integralI(z, bigB(m, p));
        double cvR = t * m.d2adt2() * iI / b;
        double cpIg = idealGasCp(t, x);
        double cvIg = cpIg - R;
        double cv = cvIg + cvR;
        double cp = cv - t * dPdT * dPdT / dPdv;
        double dvdT = -dPdT / dPdv;
        if (used == DensityBasis.TRANSLATED && shiftVaries) {
            // The translated equation P(T, v) = P_cubic(T, v + c(T)) with c = c(T) only: (dv/dP)_T
            // is the cubic's, (dv/dT)_P loses c', Cp gains P T c'' (from H = H_cubic - P (c - T c'));
            // Cv follows from Cp - Cv = -T (dv/dT)_P^2 (dP/dv)_T. A constant shift changes neither.
            dvdT -= volumeShiftSlope(t, x);
            cp += p * t * volumeShiftCurvature(t, x);
            cv = cp + t * dvdT * dvdT * dPdv;
        }
        double kIdeal = cpIg / cvIg;
        double kReal = cp / cv;
        // On the density basis in use: the translated volume where the basis is translated.
        double isentropic = -v / p * kReal * dPdv;
        double sound2 = -kReal * v * v * dPdv / (mw * 1e-3);
        double jt = (t * dvdT - v) / cp;
        for (int i = 0; i < x.length; i++) {
            IdealGasCp c = components.get(i).cp();
            if (x[i] > 0 && !c.inRange(t)) {
                warnings.add(String.format(Locale.US,
                        "%s: %.2f K is outside the ideal-gas Cp correlation's range %.0f-%.0f K; Cp, Cv, k and "
                                + "speed of sound are extrapolated.", components.get(i).name(), t, c.tMinK(), c.tMaxK()));
            }
        }
        PhaseLabel label = label(t, p, x, sel);
        if (dPdv < 0 && !(cv > 0 && cp > 0 && sound2 > 0)) {
            warnings.add(String.format(Locale.US, "The heat capacities at this state are not physical on the %s basis "
                    + "(Cp = %.4g, Cv = %.4g J/(mol K)): k, the isentropic exponent and the speed of sound are not "
                    + "meaningful here%s.", used.label(), cp, cv, shiftVaries && used == DensityBasis.TRANSLATED
                    ? " (the temperature-dependent volume translation dominates far from its anchors)" : ""));
        }
        if (!(dPdv < 0)) {
            warnings.add("The chosen root is mechanically unstable ((dP/dv)_T >= 0); heat capacities and speed of "
                    + "sound are not meaningful there.");
        }
        return new FluidProperties(variant, t, p, x, sel.roots(), sel.z(), org.ventcase.common.LazyText.of(sel::reason), label,
                labelCriterion(), vCubic, v, used, mw / 1e3 / v, mw, lnPhi, hR, sR, gR, cpIg, cp, cv, kIdeal, kReal,
                isentropic, sound2 > 0 ? Math.sqrt(sound2) : Double.NaN, jt, List.copyOf(warnings));
    }

    /**
     * Names the phase. Criterion: with T at or above the (pseudo-)critical temperature, the fluid
     * is supercritical at or above the (pseudo-)critical pressure and vapour below it; below it,
     * the chosen root is liquid or vapour as decided by {@link #select}. For a mixture the
     * pseudo-critical point is Kay's rule (mole-fraction averages of Tc and Pc), a screening
     * criterion only.
     */
    PhaseLabel label(double t, double p, double[] x, RootSelection sel) {
        double tcm = 0;
        double pcm = 0;
        for (int i = 0; i < x.length; i++) {
            tcm += x[i] * tc[i];
            pcm += x[i] * pc[i];
        }
        if (t >= tcm) {
            return p >= pcm ? PhaseLabel.SUPERCRITICAL : PhaseLabel.VAPOR;
        }
        return sel.liquidLike() ? PhaseLabel.LIQUID : PhaseLabel.VAPOR;
    }

    String labelCriterion() {
        return size() == 1
                ? "T >= Tc and P >= Pc: supercritical; T >= Tc, P < Pc: vapour; T < Tc: the chosen root "
                        + "(lowest Gibbs energy where two exist; v below v* = (Zc/Omega_b) b where one exists)"
                : "Kay's-rule pseudo-critical point; below it the chosen root as for a pure fluid (screening only)";
    }
}
