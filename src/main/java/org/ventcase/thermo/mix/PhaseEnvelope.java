package org.ventcase.thermo.mix;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.NoSolutionException;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.MixParams;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.SaturationResult;

/**
 * Phase envelope (bubble and dew curves) of a mixture by continuation.
 *
 * <p>Michelsen's formulation: unknowns X = (ln K_1..ln K_n, ln T, ln P); equations
 * F_i = ln K_i + ln phi_i^W(w) - ln phi_i^Z(z) = 0 (w_i = K_i z_i, the incipient phase),
 * F_{n+1} = sum_i z_i (K_i - 1) = 0, and F_{n+2} = X_s - S = 0 with one variable X_s specified.
 * The set of solutions is the whole phase boundary: starting on the bubble curve at low pressure
 * (w vapour), it passes the critical point where every ln K changes sign, and continues down the
 * dew curve (w liquid). Each point is found by Newton's method (analytic Jacobian from the
 * composition, temperature and pressure derivatives of ln phi, iterations to max |Delta X| < 1e-9), started from a linear predictor along the sensitivity
 * dX/dS = J^-1 e_{n+2}. The specified variable is the one changing fastest along the curve; the
 * step grows when Newton needs few iterations and shrinks when it needs many or fails. Near the
 * critical point the specified variable is an ln K, stepped across zero symmetrically, and the
 * critical point is located by linear interpolation in that ln K between the two points either
 * side. Cricondenbar and cricondentherm: parabola through the three points around the largest P
 * (largest T) against arc length in (ln T, ln P). Roots: the feed uses the liquid root on the
 * bubble side and the vapour root on the dew side, the incipient phase the other.
 *
 * <p>One component present: the envelope is the pure saturation curve from {@link PureSaturation}
 * (Tr 0.5 to 0.9999), and the critical point is (Tc, Pc), which the cubic reproduces exactly.
 *
 * <p>Source: M.L. Michelsen, Calculation of phase envelopes and critical points for
 * multicomponent mixtures, Fluid Phase Equilib. 4 (1980) 1-10, DOI 10.1016/0378-3812(80)80001-X;
 * M.L. Michelsen, J.M. Mollerup, Thermodynamic Models: Fundamentals and Computational Aspects,
 * 2nd ed., 2007, ch. 12. Stateless and thread-safe.
 */
public final class PhaseEnvelope {

    /** Which side of the critical point a point lies on. */
    public enum Branch {
        BUBBLE, DEW
    }

    /**
     * One point of the envelope.
     *
     * @param temperatureK  K
     * @param pressurePa    Pa absolute
     * @param branch        bubble or dew side
     * @param vaporFraction 0 on the bubble curve, 1 on the dew curve
     */
    public record Point(double temperatureK, double pressurePa, Branch branch, double vaporFraction) {
    }

    /** A located point: critical point, cricondenbar or cricondentherm. */
    public record StatePoint(double temperatureK, double pressurePa, String method) {
    }

    /**
     * The envelope.
     *
     * @param points          traced points in order (bubble side from low pressure, then dew side)
     * @param criticalPoint   empty when tracing stopped before reaching it
     * @param cricondenbar    highest pressure on the envelope
     * @param cricondentherm  highest temperature on the envelope
     * @param newtonIterations total Newton iterations
     * @param warnings        tracing stopped early, and the like
     */
    public record Result(List<Point> points, Optional<StatePoint> criticalPoint, StatePoint cricondenbar,
                         StatePoint cricondentherm, int newtonIterations, List<String> warnings) {
        public Result {
            points = List.copyOf(points);
            warnings = List.copyOf(warnings);
        }
    }

    private static final int MAX_POINTS = 600;
    private static final int NEWTON_MAX = 12;
    private static final double NEWTON_TOL = 1e-9;

    private final CubicModel model;

    public PhaseEnvelope(CubicModel model) {
        this.model = model;
    }

    /** Traces the envelope from 1 bar on the bubble side to 1 bar on the dew side. */
    public Result trace(double[] z0) {
        return trace(z0, 1e5);
    }

    /** Traces the envelope from pStart (Pa) on the bubble side back down to pStart on the dew side. */
    public Result trace(double[] z0, double pStart) {
        double[] z = model.checkState(300, pStart, z0);
        int n = z.length;
        int present = 0;
        int only = -1;
        for (int i = 0; i < n; i++) {
            if (z[i] > 0) {
                present++;
                only = i;
            }
        }
        if (present == 1) {
            return pure(only);
        }
        List<String> warnings = new ArrayList<>();
        SaturationPoints sp = new SaturationPoints(model);
        SaturationPoint start = null;
        for (double p0 : new double[] {pStart, 0.2 * pStart, 5 * pStart}) {
            try {
                start = sp.bubbleTemperature(p0, z);
                break;
            } catch (NoSolutionException | ConvergenceException e) {
                warnings.add("bubble point at " + p0 + " Pa not found to start the envelope: " + e.getMessage());
            }
        }
        if (start == null) {
            throw new NoSolutionException("composition", "no bubble point found at " + pStart
                    + " Pa or nearby to start the phase envelope");
        }
        double pEnd = Math.min(start.pressurePa(), pStart);
        int m = n + 2;
        double[] x = new double[m];
        double[] k = start.kValues();
        int ref = 0;
        for (int i = 0; i < n; i++) {
            x[i] = Math.log(k[i]);
            if (z[i] > 0 && Math.abs(x[i]) > Math.abs(x[ref])) {
                ref = i;
            }
        }
        final double refSign = Math.signum(x[ref]);
        x[n] = Math.log(start.temperatureK());
        x[n + 1] = Math.log(start.pressurePa());
        int spec = n + 1;
        double ds = 0.05;
        Work wk = new Work(n);
        int totalNewton = 0;
        List<Point> points = new ArrayList<>();
        List<double[]> states = new ArrayList<>();
        points.add(new Point(start.temperatureK(), start.pressurePa(), Branch.BUBBLE, 0.0));
        states.add(x.clone());
        Branch branch = Branch.BUBBLE;
        StatePoint critical = null;
        double[] sens = new double[m];
        double[][] jac = new double[m][m];
        // initial sensitivity
        evaluate(z, x, spec, x[spec], true, wk, wk.f, jac);
        unitSolve(jac, m, sens);
        boolean finished = false;
        while (points.size() < MAX_POINTS) {
            // choose the specified variable: largest |dX_i/dS| relative to the current one
            double dsdS = sens[spec];
            int best = spec;
            double bestV = Math.abs(sens[spec]);
            for (int i = 0; i < m; i++) {
                if ((i < n && z[i] <= 0)) {
                    continue;
                }
                if (Math.abs(sens[i]) > bestV) {
                    best = i;
                    bestV = Math.abs(sens[i]);
                }
            }
            double dsNew = ds * sens[best] / dsdS; // same arc step, in the new variable
            if (best != spec) {
                for (int i = 0; i < m; i++) {
                    sens[i] /= sens[best];
                }
                spec = best;
                ds = dsNew;
            }
            // limit step in T, P and near the critical point
            double cap = 0.1;
            double maxLnK = 0;
            for (int i = 0; i < n; i++) {
                maxLnK = Math.max(maxLnK, Math.abs(x[i]));
            }
            if (maxLnK < 0.5) {
                cap = 0.05;
            }
            for (int i = 0; i < m; i++) {
                double d = Math.abs(sens[i] * ds);
                if (d > cap) {
                    ds *= cap / d;
                }
            }
            double target = x[spec] + ds;
            if (spec < n && Math.signum(target) != Math.signum(x[spec]) || spec < n && Math.abs(target) < 0.01) {
                target = -x[spec];
                ds = target - x[spec];
            }
            double[] trial = new double[m];
            boolean ok = false;
            int its = 0;
            for (int attempt = 0; attempt < 8 && !ok; attempt++) {
                for (int i = 0; i < m; i++) {
                    trial[i] = x[i] + sens[i] * ds;
                }
                trial[spec] = x[spec] + ds;
                boolean bubbleRoots = Math.signum(trial[ref]) == refSign;
                its = newton(z, trial, spec, trial[spec], bubbleRoots, wk, jac);
                totalNewton += Math.abs(its);
                if (its > 0 && finite(trial) && trivialDistance(trial, n, z) > 1e-10) {
                    ok = true;
                } else {
                    ds *= 0.5;
                }
            }
            if (!ok) {
                warnings.add(String.format(Locale.US, "tracing stopped early at T = %.4g K, P = %.6g Pa: Newton did "
                        + "not converge with the step reduced 8 times", Math.exp(x[n]), Math.exp(x[n + 1])));
                break;
            }
            // critical point crossing
            if (Math.signum(trial[ref]) != Math.signum(x[ref]) && branch == Branch.BUBBLE) {
                double f = x[ref] / (x[ref] - trial[ref]);
                double tc = Math.exp(x[n] + f * (trial[n] - x[n]));
                double pc = Math.exp(x[n + 1] + f * (trial[n + 1] - x[n + 1]));
                critical = new StatePoint(tc, pc, "linear interpolation in ln K of " + model.components().get(ref).name()
                        + " between the traced points either side (ln K = 0 at the critical point)");
                branch = Branch.DEW;
            }
            System.arraycopy(trial, 0, x, 0, m);
            points.add(new Point(Math.exp(x[n]), Math.exp(x[n + 1]), branch, branch == Branch.BUBBLE ? 0.0 : 1.0));
            states.add(x.clone());
            if (branch == Branch.DEW && Math.exp(x[n + 1]) < pEnd) {
                finished = true;
                break;
            }
            if (Math.exp(x[n]) < 20 || Math.exp(x[n]) > 3000 || Math.exp(x[n + 1]) > 1e9) {
                warnings.add("tracing left 20-3000 K or passed 1 GPa; stopped");
                break;
            }
            if (branch == Branch.BUBBLE && Math.exp(x[n + 1]) < 0.5 * pEnd && points.size() > 5) {
                warnings.add("the bubble branch turned back to low pressure without a critical point; stopped");
                break;
            }
            // step control and new sensitivity
            if (its <= 3) {
                ds *= 1.5;
            } else if (its > 5) {
                ds *= 0.6;
            }
            evaluate(z, x, spec, x[spec], Math.signum(x[ref]) == refSign, wk, wk.f, jac);
            unitSolve(jac, m, sens);
            if (!finite(sens)) {
                warnings.add("singular Jacobian while tracing; stopped");
                break;
            }
        }
        if (!finished && warnings.stream().noneMatch(w -> w.startsWith("tracing") || w.contains("stopped"))) {
            warnings.add("tracing stopped after " + MAX_POINTS + " points before returning to " + pEnd + " Pa");
        }
        if (critical == null) {
            warnings.add("no critical point located: the envelope was not traced through it");
        }
        StatePoint bar = extremum(points, true, critical);
        StatePoint therm = extremum(points, false, critical);
        return new Result(points, Optional.ofNullable(critical), bar, therm, totalNewton, warnings);
    }

    private static boolean finite(double[] v) {
        for (double d : v) {
            if (!Double.isFinite(d)) {
                return false;
            }
        }
        return true;
    }

    private static double trivialDistance(double[] x, int n, double[] z) {
        double s = 0;
        for (int i = 0; i < n; i++) {
            if (z[i] > 0) {
                s += x[i] * x[i];
            }
        }
        return s;
    }

    private static final class Work {
        final double[] w;
        final double[] f;
        final double[] lnPhiZ;
        final double[] lnPhiW;
        final double[] rhs;
        final double[] dTZ;
        final double[] dPZ;
        final double[] dTW;
        final double[] dPW;
        final double[][] phiW;

        Work(int n) {
            w = new double[n];
            f = new double[n + 2];
            lnPhiZ = new double[n];
            lnPhiW = new double[n];
            rhs = new double[n + 2];
            dTZ = new double[n];
            dPZ = new double[n];
            dTW = new double[n];
            dPW = new double[n];
            phiW = new double[n][n];
        }
    }

    /**
     * The residual F(X) into {@code out} and, where {@code jac} is not null, its Jacobian,
     * analytically: with w = K z/sum(K z) and Phi^W_ij = N d ln phi_i^W/d n_j,
     * dF_i/d ln K_j = delta_ij + Phi^W_ij w_j, dF_i/d ln T = T (d ln phi_i^W/dT - d ln phi_i^Z/dT),
     * dF_i/d ln P = d ln phi_i^W/d ln P - d ln phi_i^Z/d ln P, dF_{n+1}/d ln K_j = z_j K_j and
     * dF_{n+2}/dX = e_spec ({@link CubicModel#lnPhiDerivatives}).
     */
    private void evaluate(double[] z, double[] x, int spec, double target, boolean bubbleRoots, Work wk,
                          double[] out, double[][] jac) {
        int n = z.length;
        double t = Math.exp(x[n]);
        double p = Math.exp(x[n + 1]);
        double s = 0;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double k = Math.exp(x[i]);
            wk.w[i] = z[i] * k;
            s += wk.w[i];
            sum += z[i] * (k - 1);
        }
        for (int i = 0; i < n; i++) {
            wk.w[i] /= s;
        }
        CubicModel.AtTemperature at = model.at(t);
        MixParams mZ = model.mix(at, z);
        double zZ = model.chooseZ(mZ, p, bubbleRoots ? PhaseRequest.LIQUID : PhaseRequest.VAPOR);
        model.lnPhi(mZ, p, zZ, wk.lnPhiZ);
        MixParams mW = model.mix(at, wk.w);
        double zW = model.chooseZ(mW, p, bubbleRoots ? PhaseRequest.VAPOR : PhaseRequest.LIQUID);
        model.lnPhi(mW, p, zW, wk.lnPhiW);
        for (int i = 0; i < n; i++) {
            out[i] = x[i] + wk.lnPhiW[i] - wk.lnPhiZ[i];
        }
        out[n] = sum;
        out[n + 1] = x[spec] - target;
        if (jac == null) {
            return;
        }
        model.lnPhiDerivatives(at, mZ, z, p, zZ, wk.dTZ, wk.dPZ, null);
        model.lnPhiDerivatives(at, mW, wk.w, p, zW, wk.dTW, wk.dPW, wk.phiW);
        int m = n + 2;
        for (int i = 0; i < n; i++) {
            double[] row = jac[i];
            double[] phiRow = wk.phiW[i];
            for (int j = 0; j < n; j++) {
                row[j] = phiRow[j] * wk.w[j];
            }
            row[i] += 1.0;
            row[n] = t * (wk.dTW[i] - wk.dTZ[i]);
            row[n + 1] = wk.dPW[i] - wk.dPZ[i];
        }
        for (int j = 0; j < n; j++) {
            jac[n][j] = z[j] * Math.exp(x[j]);
        }
        jac[n][n] = 0;
        jac[n][n + 1] = 0;
        for (int j = 0; j < m; j++) {
            jac[n + 1][j] = j == spec ? 1.0 : 0.0;
        }
    }

    /** Solves J s = e_last into s (J is destroyed). */
    private static void unitSolve(double[][] jac, int m, double[] s) {
        for (int i = 0; i < m; i++) {
            s[i] = i == m - 1 ? 1.0 : 0.0;
        }
        if (!PhaseEval.solve(jac, s)) {
            java.util.Arrays.fill(s, Double.NaN);
        }
    }

    /** Newton on F(X) = 0 with X_spec = target; returns iterations (negative on failure). */
    private int newton(double[] z, double[] x, int spec, double target, boolean bubbleRoots, Work wk, double[][] jac) {
        int m = x.length;
        for (int it = 1; it <= NEWTON_MAX; it++) {
            evaluate(z, x, spec, target, bubbleRoots, wk, wk.rhs, jac);
            for (int i = 0; i < m; i++) {
                wk.rhs[i] = -wk.rhs[i];
            }
            if (!PhaseEval.solve(jac, wk.rhs)) {
                return -it;
            }
            double dmax = 0;
            double scale = 1;
            for (int i = 0; i < m; i++) {
                dmax = Math.max(dmax, Math.abs(wk.rhs[i]));
            }
            if (dmax > 0.5) {
                scale = 0.5 / dmax;
            }
            for (int i = 0; i < m; i++) {
                x[i] += scale * wk.rhs[i];
            }
            if (!finite(x)) {
                return -it;
            }
            if (dmax < NEWTON_TOL) {
                return it;
            }
        }
        return -NEWTON_MAX;
    }

    private static StatePoint extremum(List<Point> pts, boolean pressure, StatePoint critical) {
        int best = 0;
        for (int i = 1; i < pts.size(); i++) {
            double a = pressure ? pts.get(i).pressurePa() : pts.get(i).temperatureK();
            double b = pressure ? pts.get(best).pressurePa() : pts.get(best).temperatureK();
            if (a > b) {
                best = i;
            }
        }
        String what = pressure ? "largest pressure" : "largest temperature";
        Point pb = pts.get(best);
        StatePoint out = new StatePoint(pb.temperatureK(), pb.pressurePa(), what + " among the traced points");
        if (best > 0 && best < pts.size() - 1) {
            // parabola against arc length s in (ln T, ln P)
            Point a = pts.get(best - 1);
            Point c = pts.get(best + 1);
            double s0 = -dist(a, pb);
            double s2 = dist(pb, c);
            double fa = pressure ? Math.log(a.pressurePa()) : Math.log(a.temperatureK());
            double fb = pressure ? Math.log(pb.pressurePa()) : Math.log(pb.temperatureK());
            double fc = pressure ? Math.log(c.pressurePa()) : Math.log(c.temperatureK());
            double d1 = (fb - fa) / (0 - s0);
            double d2 = (fc - fb) / s2;
            double curv = (d2 - d1) / (s2 - s0);
            if (curv < 0) {
                double sStar = 0.5 * (s0 + 0) - d1 / (2 * curv);
                if (sStar > s0 && sStar < s2) {
                    double fStar = fa + d1 * (sStar - s0) + curv * (sStar - s0) * (sStar - 0);
                    // the other coordinate: linear along the same side
                    Point other = sStar < 0 ? a : c;
                    double frac = Math.abs(sStar) / dist(pb, other);
                    double g0 = pressure ? Math.log(pb.temperatureK()) : Math.log(pb.pressurePa());
                    double g1 = pressure ? Math.log(other.temperatureK()) : Math.log(other.pressurePa());
                    double gStar = g0 + frac * (g1 - g0);
                    out = pressure
                            ? new StatePoint(Math.exp(gStar), Math.exp(fStar), what + ": parabola through the three points around it")
                            : new StatePoint(Math.exp(fStar), Math.exp(gStar), what + ": parabola through the three points around it");
                }
            }
        }
        if (critical != null) {
            double cv = pressure ? critical.pressurePa() : critical.temperatureK();
            double ov = pressure ? out.pressurePa() : out.temperatureK();
            if (cv > ov) {
                return new StatePoint(critical.temperatureK(), critical.pressurePa(), what + ": the critical point");
            }
        }
        return out;
    }

    private static double dist(Point a, Point b) {
        double dt = Math.log(a.temperatureK()) - Math.log(b.temperatureK());
        double dp = Math.log(a.pressurePa()) - Math.log(b.pressurePa());
        return Math.hypot(dt, dp);
    }

    private Result pure(int only) {
        var c = model.components().get(only);
        CubicModel pure = CubicModel.pure(model.variant(), c);
        PureSaturation ps = new PureSaturation(pure);
        List<Point> pts = new ArrayList<>();
        int steps = 60;
        double tr0 = 0.5;
        for (int i = 0; i <= steps; i++) {
            double tr = tr0 + (PureSaturation.MAX_TR - tr0) * i / steps;
            double t = tr * pure.tc(0); // the model's own Tc (a published set may bring its own)
            SaturationResult s = ps.atTemperature(t, DensityBasis.CUBIC);
            pts.add(new Point(t, s.pressurePa(), Branch.BUBBLE, 0.0));
        }
        for (int i = steps; i >= 0; i--) {
            Point b = pts.get(i);
            pts.add(new Point(b.temperatureK(), b.pressurePa(), Branch.DEW, 1.0));
        }
        StatePoint crit = new StatePoint(pure.tc(0), pure.pc(0), "pure component: the cubic's critical point is (Tc, Pc)");
        return new Result(pts, Optional.of(crit), crit, crit, 0,
                List.of("one component: bubble and dew curves coincide with the pure saturation curve (Tr 0.5 to "
                        + PureSaturation.MAX_TR + ")"));
    }
}
