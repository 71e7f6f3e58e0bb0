package org.ventcase.thermo.mix;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.NoSolutionException;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.MixParams;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.mix.SaturationPoint.Kind;

/**
 * Bubble and dew points of a mixture: pressure at given T, temperature at given P.
 *
 * <p>Equations (bubble; dew is the mirror image with x and y exchanged): the feed z is the liquid,
 * the incipient vapour is y_i = K_i z_i / sum_j K_j z_j, and K_i = phi_i^L(z)/phi_i^V(y). The
 * point satisfies f = ln sum_i z_i K_i = 0 (dew: ln sum_i z_i/K_i = 0). Each iteration updates
 * K from the fugacity coefficients and takes one Newton step on the free variable (ln P, or T)
 * with df/d ln P = sum_i y_i (d ln phi_i^L/d ln P - d ln phi_i^V/d ln P) from the partial molar
 * volumes, or df/dT = sum_i y_i (d ln phi_i^L/dT - d ln phi_i^V/dT) (both analytic,
 * {@link CubicModel#lnPhiDerivatives}). Steps are limited (|Delta ln P| <= 0.5,
 * |Delta T| <= 0.1 T). Start: Wilson's K-values, ln K_i = ln(Pc_i/P) + 5.373 (1 + omega_i)
 * (1 - Tc_i/T), which give the bubble pressure sum z_i P_i^W(T) and dew pressure
 * 1/sum(z_i/P_i^W) directly, and the temperatures by bisection. Liquid uses the smallest cubic
 * root, vapour the largest. Converged when |f| < 1e-10 and max |Delta ln K| < 1e-10.
 *
 * <p>No solution: when the K-values collapse to 1 (sum over present i of (ln K_i)^2 < 1e-6: the trivial
 * solution, which is where the iteration goes above the cricondenbar or cricondentherm, or at
 * a composition that has no saturation point at this T or P) a {@link NoSolutionException} says
 * so; so does a pressure leaving 1 Pa to 1 GPa.
 *
 * <p>Source: M.L. Michelsen, J.M. Mollerup, Thermodynamic Models: Fundamentals and Computational
 * Aspects, 2nd ed., 2007, ch. 12 (saturation points); G.M. Wilson, A modified Redlich-Kwong
 * equation of state, application to general physical data calculations, AIChE 65th National
 * Meeting, Cleveland, 1969 (K-value estimate). Stateless and thread-safe.
 */
public final class SaturationPoints {

    private static final int MAX_ITER = 100;
    private static final double TOL = 1e-10;

    private final CubicModel model;

    public SaturationPoints(CubicModel model) {
        this.model = model;
    }

    /** Bubble pressure at T (continued from a lower temperature where a direct start fails; see below). */
    public SaturationPoint bubblePressure(double t, double[] z) {
        return pressureWithContinuation(Kind.BUBBLE, t, z);
    }

    /** Dew pressure at T (the lower, normal dew point where the iteration started from Wilson reaches it). */
    public SaturationPoint dewPressure(double t, double[] z) {
        return pressureWithContinuation(Kind.DEW, t, z);
    }

    /** Steps of the temperature continuation. */
    static final int CONTINUATION_STEPS = 20;

    /**
     * Near a mixture's critical point the Wilson start can lie so close to K = 1 that the
     * iteration falls into the trivial solution although a saturation point exists. Then the point
     * is found where it is easy (at a lower temperature, 5, 10, 20 ... K below) and followed back up
     * to T in small steps, each started from the previous solution (natural-parameter
     * continuation; M.L. Michelsen, Fluid Phase Equilib. 4 (1980) 1, the same idea as the envelope
     * tracer). Where even that fails, the original message stands: there is no point there.
     */
    private SaturationPoint pressureWithContinuation(Kind kind, double t, double[] z) {
        try {
            return pressure(kind, t, z, Double.NaN, null);
        } catch (NoSolutionException | org.ventcase.common.ConvergenceException first) {
            SaturationPoint cur = null;
            double t0 = t;
            for (double dt = 5; dt <= 0.5 * t && cur == null; dt *= 2) {
                try {
                    cur = pressure(kind, t - dt, z, Double.NaN, null);
                    t0 = t - dt;
                } catch (NoSolutionException | org.ventcase.common.ConvergenceException e) {
                    // try further below
                }
            }
            if (cur == null) {
                throw first;
            }
            for (int k = 1; k <= CONTINUATION_STEPS; k++) {
                double tk = t0 + (t - t0) * k / CONTINUATION_STEPS;
                double[] kv = cur.kValues();
                double[] lnK = new double[kv.length];
                for (int i = 0; i < kv.length; i++) {
                    lnK[i] = Math.log(kv[i]);
                }
                try {
                    cur = pressure(kind, tk, z, cur.pressurePa(), lnK);
                } catch (NoSolutionException | org.ventcase.common.ConvergenceException e) {
                    throw first;
                }
            }
            List<String> w = new java.util.ArrayList<>(cur.warnings());
            w.add(String.format(Locale.US, "The %s point was found by continuation in temperature from %.2f K: the "
                    + "direct start fell into the trivial solution (K -> 1), as it can close to the mixture's critical "
                    + "point; results this close to the critical point are sensitive to the equation of state.",
                    kind.label(), t0));
            return new SaturationPoint(cur.kind(), cur.temperatureK(), cur.pressurePa(), cur.feed(),
                    cur.incipientComposition(), cur.kValues(), cur.iterations(), w);
        }
    }

    /** Bubble temperature at P. */
    public SaturationPoint bubbleTemperature(double p, double[] z) {
        return temperature(Kind.BUBBLE, p, z, Double.NaN, null);
    }

    /** Dew temperature at P. */
    public SaturationPoint dewTemperature(double p, double[] z) {
        return temperature(Kind.DEW, p, z, Double.NaN, null);
    }

    /**
     * Pressure at T with an optional initial guess (pressure and ln K; NaN/null for Wilson).
     */
    public SaturationPoint pressure(Kind kind, double t, double[] z0, double p0, double[] lnK0) {
        double[] z = model.checkState(t, 1e5, z0);
        int n = z.length;
        double[] lnK = new double[n];
        double p;
        if (lnK0 == null || !(p0 > 0)) {
            double[] lnKw = new double[n];
            PhaseEval.wilsonLnK(model, t, 1.0, lnKw); // ln(P_i^W) with P = 1 Pa
            double s = 0;
            for (int i = 0; i < n; i++) {
                s += kind == Kind.BUBBLE ? z[i] * Math.exp(lnKw[i]) : z[i] / Math.exp(lnKw[i]);
            }
            p = kind == Kind.BUBBLE ? s : 1 / s;
            p = Math.min(Math.max(p, 10.0), 5e8);
            for (int i = 0; i < n; i++) {
                lnK[i] = lnKw[i] - Math.log(p);
            }
        } else {
            p = p0;
            System.arraycopy(lnK0, 0, lnK, 0, n);
        }
        return solve(kind, t, p, z, lnK, true);
    }

    /** Temperature at P with an optional initial guess (NaN/null for Wilson). */
    public SaturationPoint temperature(Kind kind, double p, double[] z0, double t0, double[] lnK0) {
        double[] z = model.checkState(300, p, z0);
        int n = z.length;
        double[] lnK = new double[n];
        double t;
        if (lnK0 == null || !(t0 > 0)) {
            t = wilsonTemperature(kind, p, z);
            PhaseEval.wilsonLnK(model, t, p, lnK);
        } else {
            t = t0;
            System.arraycopy(lnK0, 0, lnK, 0, n);
        }
        return solve(kind, t, p, z, lnK, false);
    }

    private double wilsonTemperature(Kind kind, double p, double[] z) {
        int n = z.length;
        double[] lnK = new double[n];
        double lo = 20;
        double hi = 3000;
        for (int it = 0; it < 100; it++) {
            double mid = Math.sqrt(lo * hi);
            PhaseEval.wilsonLnK(model, mid, p, lnK);
            double s = 0;
            for (int i = 0; i < n; i++) {
                s += kind == Kind.BUBBLE ? z[i] * Math.exp(lnK[i]) : z[i] * Math.exp(-lnK[i]);
            }
            boolean tooHot = kind == Kind.BUBBLE ? s > 1 : s < 1;
            if (tooHot) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return Math.sqrt(lo * hi);
    }

    private SaturationPoint solve(Kind kind, double t, double p, double[] z, double[] lnK, boolean pressureFree) {
        int n = z.length;
        boolean bubble = kind == Kind.BUBBLE;
        double[] w = new double[n];
        double[] lnPhiF = new double[n];
        double[] lnPhiW = new double[n];
        double[] dF = new double[n];
        double[] dW = new double[n];
        PhaseRequest feedRoot = bubble ? PhaseRequest.LIQUID : PhaseRequest.VAPOR;
        PhaseRequest incRoot = bubble ? PhaseRequest.VAPOR : PhaseRequest.LIQUID;
        double f = Double.NaN;
        CubicModel.AtTemperature at = null;
        for (int it = 1; it <= MAX_ITER; it++) {
            // incipient composition from current K
            double s = 0;
            for (int i = 0; i < n; i++) {
                w[i] = bubble ? z[i] * Math.exp(lnK[i]) : z[i] * Math.exp(-lnK[i]);
                s += w[i];
            }
            for (int i = 0; i < n; i++) {
                w[i] /= s;
            }
            double dmax = 0;
            double sk = 0;
            double sum = 0;
            if (at == null || at.t() != t) {
                at = model.at(t);
            }
            if (pressureFree) {
                PhaseEval.lnPhiAndDp(model, at, p, z, feedRoot, lnPhiF, dF);
                PhaseEval.lnPhiAndDp(model, at, p, w, incRoot, lnPhiW, dW);
            } else {
                PhaseEval.lnPhi(model, at, p, z, feedRoot, lnPhiF);
                PhaseEval.lnPhi(model, at, p, w, incRoot, lnPhiW);
            }
            double df = 0;
            for (int i = 0; i < n; i++) {
                // ln K = ln phi_L - ln phi_V
                double next = bubble ? lnPhiF[i] - lnPhiW[i] : lnPhiW[i] - lnPhiF[i];
                if (z[i] > 0) {
                    dmax = Math.max(dmax, Math.abs(next - lnK[i]));
                }
                lnK[i] = next;
                if (z[i] > 0) {
                    sk += next * next;
                }
                sum += bubble ? z[i] * Math.exp(next) : z[i] * Math.exp(-next);
            }
            f = Math.log(sum);
            if (sk < 1e-6) {
                throw new NoSolutionException(pressureFree ? "temperature" : "pressure", String.format(Locale.US,
                        "the %s-point iteration at %s collapsed to the trivial solution (K-values -> 1): there is no "
                                + "%s point of this mixture there (above the %s, or too near the critical point)",
                        kind.label(), pressureFree ? String.format(Locale.US, "T = %.6g K", t)
                                : String.format(Locale.US, "P = %.6g Pa", p),
                        kind.label(), pressureFree ? "cricondentherm" : "cricondenbar"));
            }
            // incipient composition at the new K, for the derivative weights
            s = 0;
            for (int i = 0; i < n; i++) {
                w[i] = bubble ? z[i] * Math.exp(lnK[i]) : z[i] * Math.exp(-lnK[i]);
                s += w[i];
            }
            for (int i = 0; i < n; i++) {
                w[i] /= s;
            }
            if (Math.abs(f) < TOL && dmax < TOL) {
                return result(kind, t, p, z, w, lnK, it);
            }
            if (pressureFree) {
                for (int i = 0; i < n; i++) {
                    double dlnK = bubble ? dF[i] - dW[i] : dW[i] - dF[i];
                    df += w[i] * (bubble ? dlnK : -dlnK);
                }
                double step = -f / df;
                if (!Double.isFinite(step)) {
                    step = bubble ? 0.1 * Math.signum(f) : -0.1 * Math.signum(f);
                }
                step = Math.max(-0.5, Math.min(0.5, step));
                p *= Math.exp(step);
                if (!(p > 1.0 && p < 1e9)) {
                    throw new NoSolutionException("pressure", String.format(Locale.US,
                            "the %s pressure at T = %.6g K left the range 1 Pa to 1 GPa: no %s point found",
                            kind.label(), t, kind.label()));
                }
            } else {
                MixParams mF = model.mix(at, z);
                double zF = model.chooseZ(mF, p, feedRoot);
                model.lnPhiDerivatives(at, mF, z, p, zF, dF, null, null);
                MixParams mW = model.mix(at, w);
                double zW = model.chooseZ(mW, p, incRoot);
                model.lnPhiDerivatives(at, mW, w, p, zW, dW, null, null);
                for (int i = 0; i < n; i++) {
                    double dlnK = bubble ? dF[i] - dW[i] : dW[i] - dF[i];
                    df += w[i] * (bubble ? dlnK : -dlnK);
                }
                double step = -f / df;
                if (!Double.isFinite(step)) {
                    step = 0.01 * t * (bubble ? -Math.signum(f) : Math.signum(f));
                }
                step = Math.max(-0.1 * t, Math.min(0.1 * t, step));
                t += step;
                if (!(t > 10 && t < 4000)) {
                    throw new NoSolutionException("temperature", String.format(Locale.US,
                            "the %s temperature at P = %.6g Pa left the range 10-4000 K: no %s point found",
                            kind.label(), p, kind.label()));
                }
            }
        }
        throw new ConvergenceException(kind.label() + "-point Newton with K updates", MAX_ITER, f,
                String.format(Locale.US, "T = %.6g K, P = %.6g Pa", t, p));
    }

    private SaturationPoint result(Kind kind, double t, double p, double[] z, double[] w, double[] lnK, int it) {
        double[] k = new double[lnK.length];
        for (int i = 0; i < k.length; i++) {
            k[i] = Math.exp(lnK[i]);
        }
        List<String> warnings = new ArrayList<>();
        double sk = 0;
        for (int i = 0; i < k.length; i++) {
            sk += z[i] * lnK[i] * lnK[i];
        }
        if (sk < 1e-2) {
            warnings.add(String.format(Locale.US, "near-critical %s point: sum z_i (ln K_i)^2 = %.3g",
                    kind.label(), sk));
        }
        return new SaturationPoint(kind, t, p, z, w, k, it, warnings);
    }

    static void requireFeed(double[] z) {
        if (z == null) {
            throw InvalidInputException.missing("composition", "expected mole fractions");
        }
    }
}
