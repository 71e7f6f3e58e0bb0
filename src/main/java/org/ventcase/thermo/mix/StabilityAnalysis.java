package org.ventcase.thermo.mix;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.MixParams;
import org.ventcase.thermo.PhaseRequest;

/**
 * Michelsen's tangent-plane-distance (TPD) stability test. For a feed z at (T, P) with
 * d_i = ln z_i + ln phi_i(z), a trial phase of mole numbers W has the modified tangent-plane
 * distance tm(W) = 1 + sum_i W_i (ln W_i + ln phi_i(w) - d_i - 1), w = W/sum W. The feed is stable
 * when tm >= 0 at every stationary point; a stationary point with tm < 0 proves it unstable and
 * gives the composition of an incipient phase.
 *
 * <p>Trials: Wilson vapour-like W = z K and liquid-like W = z/K, and, where those find nothing
 * (or always, for the exhaustive test), one nearly pure trial per component. Each trial runs
 * successive substitution ln W_i = d_i - ln phi_i(w) with dominant-eigenvalue acceleration every
 * fifth step (reverted if tm rises), then, where that is slow, Newton's method in
 * alpha_i = 2 sqrt(W_i), whose Hessian H_ij = delta_ij (1 + g_i/2) + sqrt(W_i W_j) d ln phi_i/dW_j
 * is positive definite near a minimum; a Levenberg shift keeps it so further away. Convergence:
 * max_i |ln W_i + ln phi_i - d_i| < 1e-10. A trial that converges to the feed composition (trivial
 * solution) is discarded.
 *
 * <p>Root of each phase: the one with the lower Gibbs energy. The composition derivatives of
 * ln phi in the Newton step are analytic ({@link CubicModel#lnPhiDerivatives}) at that root.
 *
 * <p>Source: M.L. Michelsen, The isothermal flash problem. Part I. Stability, Fluid Phase
 * Equilib. 9 (1982) 1-19, DOI 10.1016/0378-3812(82)85001-2; M.L. Michelsen, J.M. Mollerup,
 * Thermodynamic Models: Fundamentals and Computational Aspects, 2nd ed., 2007, ch. 10.
 * Stateless and thread-safe.
 */
public final class StabilityAnalysis {

    static final double G_TOL = 1e-10;
    static final double TM_UNSTABLE = -1e-8;
    /**
     * A tm below which the search stops at the first trial that finds it. A stationary point only
     * just below zero (seen: tm = -5.6e-7 next to the feed of a binary liquid near its spinodal)
     * decides instability but is a poor start for the split; the other trials run and the most
     * negative stationary point is kept.
     */
    static final double TM_CLEARLY_UNSTABLE = -1e-5;
    private static final int SS_ITER = 40;
    private static final int NEWTON_ITER = 40;

    private final CubicModel model;

    public StabilityAnalysis(CubicModel model) {
        this.model = model;
    }

    /** Exhaustive test (all trials run to convergence) of feed z at (T, P). */
    public StabilityResult test(double t, double p, double[] z0) {
        double[] z = model.checkState(t, p, z0);
        double[] lnPhiZ = new double[z.length];
        CubicModel.AtTemperature at = model.at(t);
        PhaseEval.lnPhi(model, at, p, z, PhaseRequest.STABLE, lnPhiZ);
        return test(at, p, z, lnPhiZ, true);
    }

    /**
     * The test on a validated, normalised feed whose ln phi (lower-Gibbs root) is given.
     *
     * @param exhaustive false: stop at the first trial that proves instability, and skip the pure
     *                   trials when a Wilson trial already did
     */
    StabilityResult test(double t, double p, double[] z, double[] lnPhiZ, boolean exhaustive) {
        return test(model.at(t), p, z, lnPhiZ, exhaustive);
    }

    /**
     * Every stationary point of the exhaustive test with tm below the instability threshold, most
     * negative first: the other starts a phase split can try when the best one does not converge.
     */
    List<StabilityResult> unstableTrials(CubicModel.AtTemperature at, double p, double[] z, double[] lnPhiZ) {
        List<StabilityResult> out = new ArrayList<>();
        test(at, p, z, lnPhiZ, true, out);
        out.sort(java.util.Comparator.comparingDouble(StabilityResult::minimumTpd));
        return out;
    }

    /** As {@link #test(double, double, double[], double[], boolean)} with the per-temperature parameters given. */
    StabilityResult test(CubicModel.AtTemperature at, double p, double[] z, double[] lnPhiZ, boolean exhaustive) {
        return test(at, p, z, lnPhiZ, exhaustive, null);
    }

    private StabilityResult test(CubicModel.AtTemperature at, double p, double[] z, double[] lnPhiZ,
                                 boolean exhaustive, List<StabilityResult> unstableOut) {
        double t = at.t();
        int n = z.length;
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = z[i] > 0 ? Math.log(z[i]) + lnPhiZ[i] : Double.NEGATIVE_INFINITY;
        }
        MixParams mz = model.mix(at, z);
        double zFeed = PhaseEval.chooseZ(model, mz, p, PhaseRequest.STABLE);
        double[] lnK = new double[n];
        PhaseEval.wilsonLnK(model, t, p, lnK);
        List<String> warnings = new ArrayList<>();
        Trial best = null;
        int iterations = 0;
        int nTrials = n == 1 ? 2 : n + 2;
        double[] lnW = new double[n];
        for (int trial = 0; trial < nTrials; trial++) {
            String name;
            if (trial == 0) {
                name = "Wilson vapour-like";
                for (int i = 0; i < n; i++) {
                    lnW[i] = z[i] > 0 ? Math.log(z[i]) + lnK[i] : Double.NEGATIVE_INFINITY;
                }
            } else if (trial == 1) {
                name = "Wilson liquid-like";
                for (int i = 0; i < n; i++) {
                    lnW[i] = z[i] > 0 ? Math.log(z[i]) - lnK[i] : Double.NEGATIVE_INFINITY;
                }
            } else {
                int c = trial - 2;
                if (!exhaustive && best != null && best.tm < TM_CLEARLY_UNSTABLE) {
                    break;
                }
                if (z[c] <= 0) {
                    continue;
                }
                name = "pure " + model.components().get(c).name();
                for (int i = 0; i < n; i++) {
                    lnW[i] = z[i] > 0 ? (i == c ? 0.0 : Math.log(1e-3 * z[i])) : Double.NEGATIVE_INFINITY;
                }
            }
            Trial r = runTrial(at, p, z, d, lnW, name, zFeed, exhaustive);
            iterations += r.iterations;
            if (r.warning != null) {
                warnings.add(r.warning);
            }
            if (!r.trivial && (best == null || r.tm < best.tm)) {
                best = r;
            }
            if (unstableOut != null && !r.trivial && r.tm < TM_UNSTABLE) {
                unstableOut.add(new StabilityResult(t, p, false, r.tm, r.w, r.vapourLike, r.name, r.iterations,
                        List.of()));
            }
            if (!exhaustive && best != null && best.tm < TM_CLEARLY_UNSTABLE) {
                break;
            }
        }
        if (best == null) {
            return new StabilityResult(t, p, true, 0.0, z, false, "all trials collapsed to the trivial solution",
                    iterations, warnings);
        }
        boolean stable = !(best.tm < TM_UNSTABLE);
        return new StabilityResult(t, p, stable, best.tm, best.w, best.vapourLike, best.name, iterations, warnings);
    }

    private static final class Trial {
        String name;
        double tm;
        double[] w;
        boolean vapourLike;
        boolean trivial;
        int iterations;
        String warning;
    }

    private Trial runTrial(CubicModel.AtTemperature at, double p, double[] z, double[] d, double[] lnW0, String name,
                           double zFeed, boolean exhaustive) {
        int n = z.length;
        double[] lnW = lnW0.clone();
        double[] w = new double[n];
        double[] lnPhi = new double[n];
        double[] g = new double[n];
        double[] prev = new double[n];
        double[] prevDelta = new double[n];
        double[] plain = new double[n];
        Trial out = new Trial();
        out.name = name;
        double tmPrev = Double.POSITIVE_INFINITY;
        boolean accelerated = false;
        double zTrial = zFeed;
        int it = 0;
        boolean converged = false;
        double tm = Double.NaN;
        double gmax = Double.NaN;
        for (; it < SS_ITER; it++) {
            double sumW = toMoles(lnW, w);
            zTrial = PhaseEval.lnPhi(model, at, p, w, PhaseRequest.STABLE, lnPhi);
            tm = 1.0;
            gmax = 0;
            for (int i = 0; i < n; i++) {
                if (z[i] > 0) {
                    g[i] = lnW[i] + lnPhi[i] - d[i];
                    tm += Math.exp(lnW[i]) * (g[i] - 1.0);
                    gmax = Math.max(gmax, Math.abs(g[i]));
                }
            }
            if (accelerated && tm > tmPrev + 1e-12) {
                System.arraycopy(plain, 0, lnW, 0, n);
                accelerated = false;
                continue;
            }
            accelerated = false;
            tmPrev = tm;
            if (isTrivial(w, z)) {
                out.trivial = true;
                break;
            }
            if (gmax < G_TOL) {
                converged = true;
                break;
            }
            if (!exhaustive && tm < -1e-3) {
                converged = true;
                break;
            }
            // successive substitution step, with the change recorded for acceleration
            double num = 0;
            double den = 0;
            for (int i = 0; i < n; i++) {
                if (z[i] > 0) {
                    double next = d[i] - lnPhi[i];
                    double delta = next - lnW[i];
                    num += delta * delta;
                    den += delta * prevDelta[i];
                    prevDelta[i] = delta;
                    prev[i] = lnW[i];
                    lnW[i] = next;
                }
            }
            if (it % 5 == 4 && den > 0) {
                double lambda = num / den;
                if (lambda > 0 && lambda < 0.99) {
                    System.arraycopy(lnW, 0, plain, 0, n);
                    double f = lambda / (1.0 - lambda);
                    for (int i = 0; i < n; i++) {
                        if (z[i] > 0) {
                            lnW[i] += f * prevDelta[i];
                        }
                    }
                    accelerated = true;
                }
            }
            if (sumW > 1e8 || !Double.isFinite(sumW)) {
                break;
            }
        }
        int ssIt = it;
        if (!converged && !out.trivial) {
            NewtonOut nw = newton(at, p, z, d, lnW);
            it += nw.iterations;
            tm = nw.tm;
            gmax = nw.gmax;
            converged = nw.converged;
            toMoles(lnW, w);
            zTrial = PhaseEval.lnPhi(model, at, p, w, PhaseRequest.STABLE, lnPhi);
            out.trivial = isTrivial(w, z);
            if (!converged && !out.trivial) {
                out.warning = String.format(Locale.US,
                        "stability trial '%s' stopped after %d successive-substitution and %d Newton iterations with "
                                + "max |g| = %.3g (tm = %.6g); its tm is a bound, not a stationary value",
                        name, ssIt, nw.iterations, gmax, tm);
            }
        }
        out.tm = tm;
        out.w = w.clone();
        out.vapourLike = zTrial > zFeed;
        out.iterations = it;
        return out;
    }

    private static double toMoles(double[] lnW, double[] w) {
        double s = 0;
        for (int i = 0; i < lnW.length; i++) {
            w[i] = Math.exp(lnW[i]);
            s += w[i];
        }
        for (int i = 0; i < w.length; i++) {
            w[i] /= s;
        }
        return s;
    }

    static boolean isTrivial(double[] w, double[] z) {
        double s = 0;
        for (int i = 0; i < w.length; i++) {
            double dd = w[i] - z[i];
            s += dd * dd;
        }
        return s < 1e-10;
    }

    private record NewtonOut(int iterations, double tm, double gmax, boolean converged) {
    }

    /** Newton's method in alpha_i = 2 sqrt(W_i); updates lnW in place. */
    private NewtonOut newton(CubicModel.AtTemperature at, double p, double[] z, double[] d, double[] lnW) {
        int n = z.length;
        double[] w = new double[n];
        double[] lnPhi = new double[n];
        double[] g = new double[n];
        double[] sq = new double[n];
        double[][] phi = new double[n][n];
        double[][] h = new double[n][n];
        double[] rhs = new double[n];
        double[] trialLnW = new double[n];
        double tm = Double.NaN;
        double gmax = Double.NaN;
        for (int it = 1; it <= NEWTON_ITER; it++) {
            double sumW = toMoles(lnW, w);
            MixParams m = model.mix(at, w);
            double zz = PhaseEval.chooseZ(model, m, p, PhaseRequest.STABLE);
            model.lnPhi(m, p, zz, lnPhi);
            tm = tmOf(z, d, lnW, lnPhi, g);
            gmax = 0;
            for (int i = 0; i < n; i++) {
                if (z[i] > 0) {
                    gmax = Math.max(gmax, Math.abs(g[i]));
                }
            }
            if (gmax < G_TOL) {
                return new NewtonOut(it - 1, tm, gmax, true);
            }
            if (isTrivial(w, z)) {
                return new NewtonOut(it - 1, tm, gmax, false);
            }
            model.lnPhiDerivatives(at, m, w, p, zz, null, null, phi);
            double shift = 0;
            boolean accepted = false;
            for (int attempt = 0; attempt < 8 && !accepted; attempt++) {
                for (int i = 0; i < n; i++) {
                    sq[i] = z[i] > 0 ? Math.exp(0.5 * lnW[i]) : 0;
                }
                for (int i = 0; i < n; i++) {
                    for (int j = 0; j < n; j++) {
                        if (z[i] > 0 && z[j] > 0) {
                            h[i][j] = sq[i] * sq[j] * phi[i][j] / sumW;
                        } else {
                            h[i][j] = 0;
                        }
                    }
                    h[i][i] += z[i] > 0 ? 1.0 + 0.5 * g[i] + shift : 1.0;
                    rhs[i] = z[i] > 0 ? -sq[i] * g[i] : 0;
                }
                if (!PhaseEval.solve(h, rhs)) {
                    shift = shift == 0 ? 1.0 : shift * 10;
                    continue;
                }
                for (int i = 0; i < n; i++) {
                    if (z[i] > 0) {
                        double alpha = 2 * sq[i];
                        double na = alpha + rhs[i];
                        if (!(na > 0)) {
                            na = 0.1 * alpha;
                        }
                        trialLnW[i] = 2 * Math.log(0.5 * na);
                    } else {
                        trialLnW[i] = Double.NEGATIVE_INFINITY;
                    }
                }
                toMoles(trialLnW, w);
                PhaseEval.lnPhi(model, at, p, w, PhaseRequest.STABLE, lnPhi);
                double tmNew = tmOf(z, d, trialLnW, lnPhi, null);
                if (tmNew <= tm + 1e-12 * Math.max(1, Math.abs(tm))) {
                    accepted = true;
                    System.arraycopy(trialLnW, 0, lnW, 0, n);
                } else {
                    shift = shift == 0 ? 1.0 : shift * 10;
                }
            }
            if (!accepted) {
                return new NewtonOut(it, tm, gmax, false);
            }
        }
        return new NewtonOut(NEWTON_ITER, tm, gmax, false);
    }

    private static double tmOf(double[] z, double[] d, double[] lnW, double[] lnPhi, double[] gOut) {
        double tm = 1.0;
        for (int i = 0; i < z.length; i++) {
            if (z[i] > 0) {
                double gi = lnW[i] + lnPhi[i] - d[i];
                if (gOut != null) {
                    gOut[i] = gi;
                }
                tm += Math.exp(lnW[i]) * (gi - 1.0);
            }
        }
        return tm;
    }
}
