package org.ventcase.thermo.mix;

import static org.ventcase.common.PhysicalConstants.R;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.NoSolutionException;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.IdealGasCp;
import org.ventcase.thermo.MixParams;
import org.ventcase.thermo.PhaseLabel;
import org.ventcase.thermo.PhaseRequest;

/**
 * Isothermal (PT) flash of a mixture with a cubic equation of state.
 *
 * <p>Steps: (1) the tangent-plane stability test ({@link StabilityAnalysis}) decides single or two
 * phases; (2) for an unstable feed, K-values start from the incipient phase (K = w/z for a
 * vapour-like trial, z/w for a liquid-like one); (3) successive substitution
 * ln K_i = ln phi_i^L(x) - ln phi_i^V(y) with x, y from the Rachford-Rice equation
 * ({@link RachfordRice}), accelerated every fifth step by the dominant eigenvalue method
 * (ln K += lambda/(1 - lambda) Delta ln K, lambda = (Delta_k . Delta_k)/(Delta_{k-1} . Delta_k));
 * (4) where substitution is slow (near critical points) a second-order step: Newton's method on
 * the vapour mole numbers v_i minimising the Gibbs energy, Hessian
 * H_ij = (delta_ij/y_i - 1 + Phi^V_ij)/V + (delta_ij/x_i - 1 + Phi^L_ij)/L with
 * Phi_ij = N d ln phi_i/d n_j (analytic, {@link CubicModel#lnPhiDerivatives}), step limited to keep
 * 0 < v_i < z_i and halved until G decreases. Converged when
 * max_i |ln f_i^V - ln f_i^L| < 1e-10. A run whose K-values collapse to 1 (trivial solution) is
 * reported as such.
 *
 * <p>Each phase uses the cubic root with the lower Gibbs energy.
 *
 * <p>Source: M.L. Michelsen, The isothermal flash problem. Part II. Phase-split calculation, Fluid
 * Phase Equilib. 9 (1982) 21-40, DOI 10.1016/0378-3812(82)85002-4; M.L. Michelsen, J.M. Mollerup,
 * Thermodynamic Models: Fundamentals and Computational Aspects, 2nd ed., 2007, ch. 10-11.
 * Stateless and thread-safe.
 */
public final class PTFlash {

    static final double TOL = 1e-10;
    private static final int SS_MAX = 100;
    private static final int SS_BEFORE_NEWTON = 25;
    private static final int NEWTON_MAX = 100;

    private final CubicModel model;
    private final StabilityAnalysis stability;

    public PTFlash(CubicModel model) {
        this.model = model;
        this.stability = new StabilityAnalysis(model);
    }

    public CubicModel model() {
        return model;
    }

    /** PT flash with densities on the translated basis where the variant has a volume shift. */
    public FlashResult flash(double t, double p, double[] z0) {
        return flash(t, p, z0, DensityBasis.TRANSLATED);
    }

    /**
     * PT flash.
     *
     * @throws ConvergenceException when neither substitution nor Newton converges in budget
     */
    public FlashResult flash(double t, double p, double[] z0, DensityBasis basis) {
        double[] z = model.checkState(t, p, z0);
        int n = z.length;
        List<String> warnings = new ArrayList<>();
        CubicModel.AtTemperature at = model.at(t);
        double[] lnPhiZ = new double[n];
        PhaseEval.lnPhi(model, at, p, z, PhaseRequest.STABLE, lnPhiZ);
        int present = 0;
        for (double v : z) {
            if (v > 0) {
                present++;
            }
        }
        StabilityResult stab;
        if (present == 1) {
            stab = new StabilityResult(t, p, true, 0.0, z, false,
                    "one component present: a pure fluid at given (T, P) is one phase except on its saturation curve",
                    0, List.of());
        } else {
            stab = stability.test(at, p, z, lnPhiZ, false);
        }
        warnings.addAll(stab.warnings());
        if (stab.stable()) {
            return singlePhase(t, p, z, basis, stab, warnings, 0, 0, "stability test: stable; single phase");
        }
        Split s;
        try {
            s = splitFrom(at, p, z, stab);
        } catch (ConvergenceException e) {
            s = splitFromOtherTrials(at, p, z, lnPhiZ, stab);
            if (s == null) {
                throw e;
            }
        }
        if (s == null) {
            s = splitFromOtherTrials(at, p, z, lnPhiZ, stab);
        }
        if (s == null) {
            throw new ConvergenceException("PT flash", 0, Double.NaN, String.format(Locale.US,
                    "the stability test found the feed unstable (tm = %.3g, trial %s) but the phase split collapsed to "
                            + "the trivial solution at T = %.6g K, P = %.6g Pa", stab.minimumTpd(), stab.trial(), t, p));
        }
        if (!(s.beta > 0 && s.beta < 1)) {
            warnings.add(String.format(Locale.US,
                    "the phase split converged to a vapour fraction of %.6g outside (0, 1) although the stability test "
                            + "found the feed unstable; reported as a single phase", s.beta));
            return singlePhase(t, p, z, basis, stab, warnings, s.ss, s.newton, "negative flash: single phase");
        }
        return twoPhase(t, p, z, s, basis, stab, warnings, "stability test, then successive substitution"
                + (s.newton > 0 ? " and Newton on vapour moles" : "") + " (DEM-accelerated)");
    }

    /**
     * The phase split started from one stability trial: substitution and Newton from its K-values,
     * then Gibbs-energy descent from it; null where both collapse to the trivial solution.
     *
     * @throws ConvergenceException when substitution and Newton fail and descent finds nothing
     */
    private Split splitFrom(CubicModel.AtTemperature at, double p, double[] z, StabilityResult stab) {
        int n = z.length;
        double[] w = stab.incipientComposition();
        double[] lnK = new double[n];
        double[] wil = new double[n];
        PhaseEval.wilsonLnK(model, at.t(), p, wil);
        for (int i = 0; i < n; i++) {
            if (z[i] > 0 && w[i] > 0) {
                lnK[i] = stab.incipientVapourLike() ? Math.log(w[i] / z[i]) : Math.log(z[i] / w[i]);
            } else {
                lnK[i] = wil[i];
            }
        }
        Split s;
        try {
            s = split(at, p, z, lnK);
        } catch (ConvergenceException e) {
            // substitution and Newton from the K-values did not converge (seen: ammonia and water at
            // 272.5 K, 1.34 bar, where substitution kept a vapour fraction outside (0, 1)): descent
            // from the trial phase may still find the split; if not, the first failure is reported
            s = splitByDescent(at, p, z, w, stab.incipientVapourLike());
            if (s == null) {
                throw e;
            }
        }
        if (s == null) {
            // Substitution can fall back to the trivial solution from a trial phase that is only just
            // unstable. Gibbs-energy descent cannot: started at a small amount of the trial phase,
            // where G lies below the feed's (tm < 0), each accepted step lowers G further.
            s = splitByDescent(at, p, z, w, stab.incipientVapourLike());
        }
        return s;
    }

    /**
     * When the split from the best stability trial fails: the other unstable stationary points of
     * the exhaustive test, most negative tm first (seen: sulfur dioxide, nitrogen, ammonia and water
     * at 278 K, 2.2 bar with PR-Twu, where every trial is nearly pure water and substitution from
     * it wanders), then the Wilson K-values. The first split with 0 < beta < 1 is kept; null if
     * none.
     */
    private Split splitFromOtherTrials(CubicModel.AtTemperature at, double p, double[] z, double[] lnPhiZ,
                                       StabilityResult tried) {
        List<StabilityResult> starts = new ArrayList<>();
        for (StabilityResult other : stability.unstableTrials(at, p, z, lnPhiZ)) {
            if (!other.trial().equals(tried.trial())) {
                starts.add(other);
            }
        }
        // Each trial also with the opposite orientation, K_i = w_i / z_i for a liquid-like trial
        // (seen: the same state with the built-in ammonia/water k_ij, where the split is found only
        // with the water-rich trial taken as the second phase of the Rachford-Rice pair).
        List<StabilityResult> flipped = new ArrayList<>();
        flipped.add(tried);
        flipped.addAll(starts);
        for (StabilityResult f : flipped) {
            starts.add(new StabilityResult(f.temperatureK(), f.pressurePa(), false, f.minimumTpd(),
                    f.incipientComposition(), !f.incipientVapourLike(), f.trial() + " (reversed)", 0, List.of()));
        }
        for (StabilityResult other : starts) {
            try {
                Split s = splitFrom(at, p, z, other);
                if (s != null && s.beta > 0 && s.beta < 1) {
                    return s;
                }
            } catch (ConvergenceException e) {
                // try the next start
            }
        }
        // Last, the Wilson K-values themselves (seen: the same state, where every trial is the
        // same nearly pure water and substitution from it wanders; from Wilson K it converges).
        double[] wil = new double[z.length];
        PhaseEval.wilsonLnK(model, at.t(), p, wil);
        try {
            Split s = split(at, p, z, wil);
            if (s != null && s.beta > 0 && s.beta < 1) {
                return s;
            }
        } catch (ConvergenceException e) {
            // no start left
        }
        return null;
    }

    /**
     * The phase split by restricted-step Newton on G from a small amount (at most 10 %) of the
     * stability test's trial phase w, which has tm < 0 (Michelsen 1982, part II: a descent method
     * started there cannot reach the trivial solution); null if it still ends there.
     */
    private Split splitByDescent(CubicModel.AtTemperature at, double p, double[] z, double[] w, boolean trialVapour) {
        int n = z.length;
        double amount = 0.1;
        for (int i = 0; i < n; i++) {
            if (w[i] > 0 && z[i] > 0) {
                amount = Math.min(amount, 0.5 * z[i] / w[i]);
            }
        }
        if (!(amount > 0)) {
            return null;
        }
        double[] x = new double[n];
        double[] y = new double[n];
        double beta0;
        if (trialVapour) {
            System.arraycopy(w, 0, y, 0, n);
            beta0 = amount;
        } else {
            // the trial is the liquid: the vapour is the rest of the feed
            for (int i = 0; i < n; i++) {
                y[i] = Math.max(0, (z[i] - amount * w[i]) / (1 - amount));
            }
            beta0 = 1 - amount;
        }
        Split s = new Split();
        double beta;
        try {
            beta = newton(at, p, z, beta0, x, y, s);
        } catch (ConvergenceException e) {
            return null;
        }
        return beta > 0 && beta < 1 ? converged(s, beta, x, y, z) : null;
    }

    private static int present(double[] z) {
        int n = 0;
        for (double v : z) {
            if (v > 0) {
                n++;
            }
        }
        return n;
    }

    /** A converged two-phase split. */
    static final class Split {
        double beta;
        double[] x;
        double[] y;
        double[] lnK;
        int ss;
        int newton;
    }

    /**
     * Converges a phase split from initial ln K; returns null when it collapses to the trivial
     * solution. The vapour fraction may end outside (0, 1).
     */
    Split split(CubicModel.AtTemperature at, double p, double[] z, double[] lnK0) {
        double t = at.t();
        int n = z.length;
        double[] lnK = lnK0.clone();
        double[] k = new double[n];
        double[] x = new double[n];
        double[] y = new double[n];
        double[] lnPhiL = new double[n];
        double[] lnPhiV = new double[n];
        double[] prevDelta = new double[n];
        double beta = 0.5;
        double errPrev = Double.POSITIVE_INFINITY;
        int slow = 0;
        int it;
        boolean converged = false;
        double err = Double.NaN;
        for (it = 1; it <= SS_MAX; it++) {
            for (int i = 0; i < n; i++) {
                k[i] = Math.exp(lnK[i]);
            }
            try {
                beta = RachfordRice.solve(z, k).beta();
            } catch (NoSolutionException e) {
                return null;
            }
            compositions(z, k, beta, x, y);
            PhaseEval.lnPhi(model, at, p, x, PhaseRequest.STABLE, lnPhiL);
            PhaseEval.lnPhi(model, at, p, y, PhaseRequest.STABLE, lnPhiV);
            err = 0;
            double sk = 0;
            double num = 0;
            double den = 0;
            for (int i = 0; i < n; i++) {
                double next = lnPhiL[i] - lnPhiV[i];
                double delta = next - lnK[i];
                if (z[i] > 0) {
                    err = Math.max(err, Math.abs(delta));
                }
                num += delta * delta;
                den += delta * prevDelta[i];
                prevDelta[i] = delta;
                lnK[i] = next;
                if (z[i] > 0) {
                    sk += next * next;
                }
            }
            if (err < TOL) {
                converged = true;
                break;
            }
            if (sk < 1e-8) {
                return null;
            }
            if (it % 5 == 0) {
                accelerate(lnK, prevDelta, num, den);
            }
            slow = err > 0.7 * errPrev ? slow + 1 : 0;
            errPrev = err;
            if (it >= SS_BEFORE_NEWTON || (it >= 6 && slow >= 3) || (it >= 4 && sk < 1e-2)) {
                break;
            }
        }
        Split s = new Split();
        s.ss = Math.min(it, SS_MAX);
        if (!converged) {
            for (int i = 0; i < n; i++) {
                k[i] = Math.exp(lnK[i]);
            }
            try {
                beta = RachfordRice.solve(z, k).beta();
            } catch (NoSolutionException e) {
                return null;
            }
            if (!(beta > 1e-12 && beta < 1 - 1e-12)) {
                // Newton on vapour moles needs both phases present; finish by substitution alone.
                beta = finishBySubstitution(at, p, z, lnK, x, y, s);
            } else {
                compositions(z, k, beta, x, y);
                double[] lnKBeforeNewton = lnK.clone();
                try {
                    beta = newton(at, p, z, beta, x, y, s);
                } catch (ConvergenceException e) {
                    // Newton on vapour moles can stall near its solution when G is flat to round-off
                    // (seen: a trace of ethylbenzene in nitrogen with isobutylene, |g| stuck near 1e-6).
                    // Substitution from the K-values before Newton converges there, linearly but surely.
                    System.arraycopy(lnKBeforeNewton, 0, lnK, 0, n);
                    try {
                        beta = finishBySubstitution(at, p, z, lnK, x, y, s);
                    } catch (ConvergenceException e2) {
                        throw new ConvergenceException("PT flash (Newton, then substitution)", s.newton + s.ss,
                                e2.residual(), String.format(Locale.US, "T = %.6g K, P = %.6g Pa: the feed is unstable but "
                                        + "no two-phase split converges%s", t, p, present(z) >= 3
                                        ? "; it may split into three phases (two liquids and a vapour), which "
                                        + "Ventcase does not compute"
                                        : " (a binary has three phases at one pressure only: this is a failure of "
                                        + "the method, not a three-phase state)"));
                    }
                }
            }
            if (Double.isNaN(beta)) {
                return null;
            }
        }
        return converged(s, beta, x, y, z);
    }

    /** Fills in a converged split, or null where it is the trivial solution (sum of ln K_i^2 < 1e-8). */
    private static Split converged(Split s, double beta, double[] x, double[] y, double[] z) {
        int n = z.length;
        double[] lnK = new double[n];
        double sk = 0;
        for (int i = 0; i < n; i++) {
            lnK[i] = Math.log(y[i] / x[i]);
            if (z[i] > 0) {
                sk += lnK[i] * lnK[i];
            }
        }
        if (sk < 1e-8) {
            return null;
        }
        s.beta = beta;
        s.x = x;
        s.y = y;
        s.lnK = lnK;
        return s;
    }

    private double finishBySubstitution(CubicModel.AtTemperature at, double p, double[] z, double[] lnK, double[] x,
                                        double[] y, Split s) {
        double t = at.t();
        int n = z.length;
        double[] k = new double[n];
        double[] lnPhiL = new double[n];
        double[] lnPhiV = new double[n];
        double[] prevDelta = new double[n];
        double err = Double.NaN;
        for (int it = 0; it < 4 * SS_MAX; it++) {
            for (int i = 0; i < n; i++) {
                k[i] = Math.exp(lnK[i]);
            }
            double beta;
            try {
                beta = RachfordRice.solve(z, k).beta();
            } catch (NoSolutionException e) {
                return Double.NaN;
            }
            compositions(z, k, beta, x, y);
            PhaseEval.lnPhi(model, at, p, x, PhaseRequest.STABLE, lnPhiL);
            PhaseEval.lnPhi(model, at, p, y, PhaseRequest.STABLE, lnPhiV);
            err = 0;
            double num = 0;
            double den = 0;
            for (int i = 0; i < n; i++) {
                double next = lnPhiL[i] - lnPhiV[i];
                double delta = next - lnK[i];
                if (z[i] > 0) {
                    err = Math.max(err, Math.abs(delta));
                    num += delta * delta;
                    den += delta * prevDelta[i];
                }
                prevDelta[i] = delta;
                lnK[i] = next;
            }
            s.ss++;
            if (err < TOL) {
                return beta;
            }
            // The same dominant-eigenvalue acceleration as the first substitution stage (every fifth
            // step): substitution alone crawls where the ratio of successive steps is near 1.
            if (it % 5 == 4) {
                accelerate(lnK, prevDelta, num, den);
            }
        }
        throw new ConvergenceException("PT flash successive substitution", s.ss, err,
                String.format(Locale.US, "T = %.6g K, P = %.6g Pa, vapour fraction outside (0, 1)", t, p));
    }

    /**
     * Dominant-eigenvalue extrapolation (DEM) of successive substitution:
     * with lambda = |delta_k|^2 / (delta_k . delta_k-1) the estimated ratio of successive steps,
     * ln K += lambda / (1 - lambda) delta_k, taken only for 0 < lambda < 0.99.
     */
    private static void accelerate(double[] lnK, double[] lastDelta, double num, double den) {
        if (den <= 0) {
            return;
        }
        double lambda = num / den;
        if (lambda > 0 && lambda < 0.99) {
            double f = lambda / (1 - lambda);
            for (int i = 0; i < lnK.length; i++) {
                lnK[i] += f * lastDelta[i];
            }
        }
    }

    static void compositions(double[] z, double[] k, double beta, double[] x, double[] y) {
        double sx = 0;
        double sy = 0;
        for (int i = 0; i < z.length; i++) {
            x[i] = z[i] / (1 + beta * (k[i] - 1));
            y[i] = k[i] * x[i];
            sx += x[i];
            sy += y[i];
        }
        for (int i = 0; i < z.length; i++) {
            x[i] /= sx;
            y[i] /= sy;
        }
    }

    /** Newton on vapour moles; updates x, y; returns beta (NaN on collapse). */
    private double newton(CubicModel.AtTemperature at, double p, double[] z, double beta0, double[] x, double[] y,
                          Split s) {
        double t = at.t();
        int n = z.length;
        double[] v = new double[n];
        double[] l = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = beta0 * y[i];
            l[i] = z[i] - v[i];
            if (z[i] > 0 && !(v[i] > 0 && l[i] > 0)) {
                v[i] = 0.5 * z[i];
                l[i] = 0.5 * z[i];
            }
        }
        double[] lnPhiL = new double[n];
        double[] lnPhiV = new double[n];
        double[] g = new double[n];
        double[][] phiL = new double[n][n];
        double[][] phiV = new double[n][n];
        double[][] h = new double[n][n];
        double[] dv = new double[n];
        double[] vt = new double[n];
        double[] sx = new double[n];
        double[] so = new double[n];
        double err = Double.NaN;
        double shift = 0;
        for (int it = 1; it <= NEWTON_MAX; it++) {
            double vv = molesToFractions(v, y);
            double ll = molesToFractions(l, x);
            MixParams mL = model.mix(at, x);
            MixParams mV = model.mix(at, y);
            double zL = PhaseEval.chooseZ(model, mL, p, PhaseRequest.STABLE);
            double zV = PhaseEval.chooseZ(model, mV, p, PhaseRequest.STABLE);
            model.lnPhi(mL, p, zL, lnPhiL);
            model.lnPhi(mV, p, zV, lnPhiV);
            double gibbs = 0;
            err = 0;
            for (int i = 0; i < n; i++) {
                if (z[i] > 0) {
                    g[i] = Math.log(y[i]) + lnPhiV[i] - Math.log(x[i]) - lnPhiL[i];
                    err = Math.max(err, Math.abs(g[i]));
                    gibbs += v[i] * (Math.log(y[i]) + lnPhiV[i]) + l[i] * (Math.log(x[i]) + lnPhiL[i]);
                } else {
                    g[i] = 0;
                }
            }
            if (err < TOL) {
                return vv;
            }
            s.newton++;
            model.lnPhiDerivatives(at, mL, x, p, zL, null, null, phiL);
            model.lnPhiDerivatives(at, mV, y, p, zV, null, null, phiV);
            // Levenberg-Marquardt-type safeguard (Michelsen 1982, part II: restricted-step Newton):
            // where the Hessian is not positive definite - near the critical point, or far from the
            // solution with a trial phase inside its spinodal - the Newton direction need not go
            // downhill in G. The diagonal shift is kept between iterations: raised until the step is
            // a descent direction that lowers G, lowered again after each success, so the method
            // returns to pure Newton (quadratic convergence) close to the solution.
            boolean accepted = false;
            for (int attempt = 0; attempt < 16 && !accepted; attempt++) {
                for (int i = 0; i < n; i++) {
                    for (int j = 0; j < n; j++) {
                        if (z[i] > 0 && z[j] > 0) {
                            h[i][j] = (phiV[i][j] - 1) / vv + (phiL[i][j] - 1) / ll;
                        } else {
                            h[i][j] = 0;
                        }
                    }
                    h[i][i] += z[i] > 0 ? (1 + shift) * (1 / v[i] + 1 / l[i]) : 1.0;
                    dv[i] = -g[i];
                }
                if (!PhaseEval.solve(h, dv)) {
                    shift = shift == 0 ? 0.1 : shift * 10;
                    continue;
                }
                double slope = 0;
                for (int i = 0; i < n; i++) {
                    slope += g[i] * dv[i];
                }
                if (!(slope < 0)) {
                    shift = shift == 0 ? 0.1 : shift * 10;
                    continue;
                }
                double step = 1.0;
                for (int i = 0; i < n; i++) {
                    if (z[i] <= 0) {
                        continue;
                    }
                    if (dv[i] < 0 && v[i] + dv[i] <= 0) {
                        step = Math.min(step, -0.9 * v[i] / dv[i]);
                    } else if (dv[i] > 0 && v[i] + dv[i] >= z[i]) {
                        step = Math.min(step, 0.9 * (z[i] - v[i]) / dv[i]);
                    }
                }
                for (int half = 0; half < 4 && !accepted; half++) {
                    for (int i = 0; i < n; i++) {
                        vt[i] = z[i] > 0 ? v[i] + step * dv[i] : 0;
                    }
                    double gNew;
                    try {
                        gNew = gibbsOf(at, p, z, vt, sx, so);
                    } catch (IllegalStateException e) {
                        // a trial point far outside the physical region (no root of the cubic above
                        // the co-volume for that composition): reject it, the step is halved
                        gNew = Double.POSITIVE_INFINITY;
                    }
                    if (gNew <= gibbs + 1e-4 * step * slope + 1e-14 * Math.abs(gibbs)) {
                        accepted = true;
                        for (int i = 0; i < n; i++) {
                            v[i] = vt[i];
                            l[i] = z[i] - vt[i];
                        }
                    } else {
                        step *= 0.5;
                    }
                }
                if (accepted) {
                    shift = shift < 1e-3 ? 0 : shift / 10;
                } else {
                    shift = shift == 0 ? 0.1 : shift * 10;
                }
            }
            if (!accepted) {
                break;
            }
        }
        throw new ConvergenceException("PT flash Newton on vapour moles", s.newton, err,
                String.format(Locale.US, "T = %.6g K, P = %.6g Pa after %d substitution steps", t, p, s.ss));
    }

    private double gibbsOf(CubicModel.AtTemperature at, double p, double[] z, double[] v, double[] y, double[] lnPhi) {
        int n = z.length;
        double[] l = new double[n];
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            l[i] = z[i] - v[i];
        }
        molesToFractions(v, y);
        molesToFractions(l, x);
        double g = 0;
        PhaseEval.lnPhi(model, at, p, y, PhaseRequest.STABLE, lnPhi);
        for (int i = 0; i < n; i++) {
            if (z[i] > 0) {
                g += v[i] * (Math.log(y[i]) + lnPhi[i]);
            }
        }
        PhaseEval.lnPhi(model, at, p, x, PhaseRequest.STABLE, lnPhi);
        for (int i = 0; i < n; i++) {
            if (z[i] > 0) {
                g += l[i] * (Math.log(x[i]) + lnPhi[i]);
            }
        }
        return g;
    }

    private static double molesToFractions(double[] moles, double[] out) {
        double s = 0;
        for (double m : moles) {
            s += m;
        }
        for (int i = 0; i < moles.length; i++) {
            out[i] = moles[i] / s;
        }
        return s;
    }

    FlashResult singlePhase(double t, double p, double[] z, DensityBasis basis, StabilityResult stab,
                            List<String> warnings, int ss, int newton, String method) {
        MixParams m = model.mix(t, z);
        double zz = PhaseEval.chooseZ(model, m, p, PhaseRequest.STABLE);
        boolean liq = SinglePhaseLabel.liquidLike(model, m, p, zz);
        SinglePhaseLabel.Label label = SinglePhaseLabel.byKay(model, t, p, z, liq);
        MixturePhase ph = phase(t, p, z, 1.0, m, zz, label.label(), label.criterion(), basis, warnings);
        cpRangeWarnings(t, z, warnings);
        return new FlashResult(t, p, z, liq ? 0.0 : 1.0, List.of(ph), ph.enthalpyJmol(), ph.entropyJmolK(),
                model.molarMass(z), stab, ss, newton, 0, method, warnings);
    }

    FlashResult twoPhase(double t, double p, double[] z, Split s, DensityBasis basis, StabilityResult stab,
                         List<String> warnings, String method) {
        MixParams mL = model.mix(t, s.x);
        MixParams mV = model.mix(t, s.y);
        double zL = PhaseEval.chooseZ(model, mL, p, PhaseRequest.STABLE);
        double zV = PhaseEval.chooseZ(model, mV, p, PhaseRequest.STABLE);
        String crit = "two phases in equilibrium: the denser one is called liquid";
        double[] x = s.x;
        double[] y = s.y;
        double beta = s.beta;
        if (zL > zV) {
            // The phase labelled vapour by the split is the denser one: swap names.
            double[] tmp = x;
            x = y;
            y = tmp;
            beta = 1 - beta;
            MixParams tm = mL;
            mL = mV;
            mV = tm;
            double tz = zL;
            zL = zV;
            zV = tz;
        }
        // Both phases clearly liquid-like (molar volume under half of v* = (Zc/Omega_b) b, the
        // volume at the equation's critical point; a vapour lies above v*, and the half keeps a dense
        // near-critical vapour out): a liquid-liquid split, and the lighter phase is a liquid too.
        double vStar = model.variant().zc() / model.variant().omegaB() * mV.b();
        boolean twoLiquids = zV * R * t / p < 0.5 * vStar;
        PhaseLabel lighter = PhaseLabel.VAPOR;
        if (twoLiquids) {
            lighter = PhaseLabel.LIQUID;
            crit = String.format(Locale.US, "two liquids in equilibrium (the lighter one's molar volume %.4g m3/mol "
                    + "is under half of v* = (Zc/Omega_b) b = %.4g m3/mol): listed denser first", zV * R * t / p, vStar);
            warnings.add(String.format(Locale.US, "Liquid-liquid split: both phases are liquids; the second phase "
                    + "(%.4g of the feed, molar) is the lighter liquid, not a vapour, and the 'vapour fraction' is its "
                    + "amount. Relief methods that assume a boiling liquid and its vapour do not apply to this state "
                    + "without review.", beta));
        }
        MixturePhase liq = phase(t, p, x, 1 - beta, mL, zL, PhaseLabel.LIQUID, crit, basis, warnings);
        MixturePhase vap = phase(t, p, y, beta, mV, zV, lighter, crit, basis, warnings);
        double sk = 0;
        for (int i = 0; i < z.length; i++) {
            double lk = Math.log(y[i] / x[i]);
            sk += z[i] * lk * lk;
        }
        if (sk < 1e-3) {
            warnings.add(String.format(Locale.US, "near-critical split: sum z_i (ln K_i)^2 = %.3g; the phases are "
                    + "nearly alike and their properties change fast with T and P", sk));
        }
        cpRangeWarnings(t, z, warnings);
        double h = (1 - beta) * liq.enthalpyJmol() + beta * vap.enthalpyJmol();
        double sEnt = (1 - beta) * liq.entropyJmolK() + beta * vap.entropyJmolK();
        return new FlashResult(t, p, z, beta, List.of(liq, vap), h, sEnt, model.molarMass(z), stab, s.ss, s.newton, 0,
                method, warnings);
    }

    /** Liquid and vapour of one component at its saturation point (roots given). */
    FlashResult pureTwoPhase(double t, double p, double[] z, double beta, double zL, double zV, StabilityResult stab,
                             List<String> warnings) {
        MixParams m = model.mix(t, z);
        String crit = "one component at its saturation temperature: liquid and vapour roots";
        MixturePhase liq = phase(t, p, z, 1 - beta, m, zL, PhaseLabel.LIQUID, crit, DensityBasis.TRANSLATED, warnings);
        MixturePhase vap = phase(t, p, z, beta, m, zV, PhaseLabel.VAPOR, crit, DensityBasis.TRANSLATED, warnings);
        cpRangeWarnings(t, z, warnings);
        double h = (1 - beta) * liq.enthalpyJmol() + beta * vap.enthalpyJmol();
        double s = (1 - beta) * liq.entropyJmolK() + beta * vap.entropyJmolK();
        return new FlashResult(t, p, z, beta, List.of(liq, vap), h, s, model.molarMass(z), stab, 0, 0, 0,
                "pure-fluid saturation (equal fugacity) and lever rule", warnings);
    }

    private MixturePhase phase(double t, double p, double[] x, double amount, MixParams m, double z, PhaseLabel label,
                               String crit, DensityBasis basis, List<String> warnings) {
        double vCubic = z * R * t / p;
        double v = vCubic;
        DensityBasis used = basis;
        if (basis == DensityBasis.TRANSLATED) {
            if (model.hasVolumeShift()) {
                v = vCubic - model.volumeShift(t, x);
                if (!(v > 0)) {
                    warnings.add("the volume-shifted molar volume of the " + label.label()
                            + " is not positive; the cubic volume is used");
                    v = vCubic;
                    used = DensityBasis.CUBIC;
                }
            } else {
                addOnce(warnings, model.variant().displayName() + " has no published volume shift: densities are the raw cubic's.");
                used = DensityBasis.CUBIC;
            }
        }
        double mw = model.molarMass(x);
        double[] lnPhi = new double[x.length];
        model.lnPhi(m, p, z, lnPhi);
        double h = MixtureThermo.enthalpy(model, m, p, x, z);
        double s = MixtureThermo.entropy(model, m, p, x, z);
        return new MixturePhase(label, crit, amount, x, z, vCubic, v, mw * 1e-3 / vCubic, mw * 1e-3 / v, used, mw, h, s,
                lnPhi);
    }

    private static void addOnce(List<String> warnings, String w) {
        if (!warnings.contains(w)) {
            warnings.add(w);
        }
    }

    void cpRangeWarnings(double t, double[] z, List<String> warnings) {
        for (int i = 0; i < z.length; i++) {
            IdealGasCp c = model.components().get(i).cp();
            if (z[i] > 0 && !c.inRange(t)) {
                addOnce(warnings, String.format(Locale.US,
                        "%s: %.2f K is outside the ideal-gas Cp correlation's range %.0f-%.0f K; enthalpy and entropy "
                                + "are extrapolated", model.components().get(i).name(), t, c.tMinK(), c.tMaxK()));
            }
        }
    }
}
