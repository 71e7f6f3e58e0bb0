package org.ventcase.thermo.mix;

import static org.ventcase.common.PhysicalConstants.R;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.NoSolutionException;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.MixParams;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.SaturationResult;

/**
 * PH and PS flashes: the temperature at which a PT flash at the given pressure has the given
 * molar enthalpy (or entropy). At fixed P and feed both are strictly increasing in T (Cp > 0), so
 * the root is bracketed first (T multiplied or divided by 1.15 from the start value until the
 * residual changes sign, within 20-3000 K), then found by the Illinois variant of regula falsi,
 * which keeps the bracket and converges superlinearly. Converged when |residual| <= 1e-9
 * (|spec| + R T) or the bracket is narrower than 1e-10 T.
 *
 * <p>One component present: H(T) jumps at the saturation temperature; a specification inside the
 * jump is a two-phase state at Tsat(P) with vapour fraction (H - H_L)/(H_V - H_L) (or with S),
 * from {@link PureSaturation}.
 *
 * <p>Source of the root finder: M. Dowell, P. Jarratt, BIT 11 (1971) 168-174 (Illinois method).
 * Stateless and thread-safe.
 */
public final class StateFlash {

    private static final int MAX_ITER = 100;
    private static final double T_MIN = 20;
    private static final double T_MAX = 3000;

    private final CubicModel model;
    private final PTFlash pt;

    public StateFlash(CubicModel model) {
        this.model = model;
        this.pt = new PTFlash(model);
    }

    /** PH flash: P in Pa, H in J/mol (reference in {@link MixtureThermo}); T0 a starting guess in K. */
    public FlashResult ph(double p, double h, double[] z, double t0) {
        return solve(p, h, z, t0, true);
    }

    /** PS flash: S in J/(mol K). */
    public FlashResult ps(double p, double s, double[] z, double t0) {
        return solve(p, s, z, t0, false);
    }

    private double value(FlashResult r, boolean enthalpy) {
        return enthalpy ? r.enthalpyJmol() : r.entropyJmolK();
    }

    private FlashResult solve(double p, double spec, double[] z0, double t0, boolean enthalpy) {
        String what = enthalpy ? "enthalpy" : "entropy";
        if (!Double.isFinite(spec)) {
            throw InvalidInputException.invalid(what, spec, "expected a finite number");
        }
        InvalidInputException.requireInRange("temperature guess", t0, T_MIN, T_MAX, "K");
        double[] z = model.checkState(t0, p, z0);
        int present = 0;
        int only = -1;
        for (int i = 0; i < z.length; i++) {
            if (z[i] > 0) {
                present++;
                only = i;
            }
        }
        if (present == 1) {
            FlashResult two = pureTwoPhase(p, spec, z, only, enthalpy);
            if (two != null) {
                return two;
            }
        }
        int evals = 0;
        double ta = t0;
        FlashResult ra = pt.flash(ta, p, z);
        evals++;
        double fa = value(ra, enthalpy) - spec;
        double tb = ta;
        FlashResult rb = ra;
        double fb = fa;
        while (Math.signum(fa) == Math.signum(fb) && fb != 0) {
            ta = tb;
            ra = rb;
            fa = fb;
            tb = fb < 0 ? tb * 1.15 : tb / 1.15;
            if (tb < T_MIN || tb > T_MAX) {
                throw new NoSolutionException(what, String.format(Locale.US,
                        "no temperature between %.0f and %.0f K gives %s %.6g at P = %.6g Pa", T_MIN, T_MAX, what,
                        spec, p));
            }
            rb = pt.flash(tb, p, z);
            evals++;
            fb = value(rb, enthalpy) - spec;
        }
        if (fb == 0) {
            return withOuter(rb, evals, what);
        }
        int side = 0;
        for (int it = 0; it < MAX_ITER; it++) {
            double tc = (ta * fb - tb * fa) / (fb - fa);
            if (!(tc > Math.min(ta, tb) && tc < Math.max(ta, tb))) {
                tc = 0.5 * (ta + tb);
            }
            FlashResult rc = pt.flash(tc, p, z);
            evals++;
            double fc = value(rc, enthalpy) - spec;
            double scale = Math.abs(spec) + R * tc * (enthalpy ? 1 : 1.0 / tc);
            if (Math.abs(fc) <= 1e-9 * scale || Math.abs(tb - ta) <= 1e-10 * tc) {
                if (Math.abs(fc) > 1e-6 * scale) {
                    List<String> w = new ArrayList<>(rc.warnings());
                    w.add(String.format(Locale.US, "%s flash ended on a bracket of width %.3g K with residual %.3g: "
                            + "the %s changes abruptly with T here", enthalpy ? "PH" : "PS", Math.abs(tb - ta), fc, what));
                    rc = copy(rc, w, evals, what);
                    return rc;
                }
                return withOuter(rc, evals, what);
            }
            if (Math.signum(fc) == Math.signum(fb)) {
                tb = tc;
                fb = fc;
                if (side == 1) {
                    fa *= 0.5;
                }
                side = 1;
            } else {
                ta = tb;
                fa = fb;
                tb = tc;
                fb = fc;
                side = -1;
            }
        }
        throw new ConvergenceException((enthalpy ? "PH" : "PS") + " flash (Illinois on T)", MAX_ITER, fb,
                String.format(Locale.US, "bracket T = [%.6f, %.6f] K at P = %.6g Pa", ta, tb, p));
    }

    private FlashResult withOuter(FlashResult r, int evals, String what) {
        return copy(r, r.warnings(), evals, what);
    }

    private FlashResult copy(FlashResult r, List<String> warnings, int evals, String what) {
        return new FlashResult(r.temperatureK(), r.pressurePa(), r.feed(), r.vaporFraction(), r.phases(),
                r.enthalpyJmol(), r.entropyJmolK(), r.molarMass(), r.stability(), r.ssIterations(),
                r.newtonIterations(), evals, "P-" + (what.equals("enthalpy") ? "H" : "S")
                        + " flash: Illinois regula falsi on T around PT flashes (" + r.method() + ")", warnings);
    }

    /** Two-phase state of a single component at Tsat(P) when the spec lies between the saturated values. */
    private FlashResult pureTwoPhase(double p, double spec, double[] z, int only, boolean enthalpy) {
        CubicModel pure = CubicModel.pure(model.variant(), model.components().get(only));
        SaturationResult sat;
        try {
            sat = new PureSaturation(pure).atPressure(p, DensityBasis.CUBIC);
        } catch (NoSolutionException e) {
            return null;
        }
        double t = sat.temperatureK();
        MixParams m = model.mix(t, z);
        double zl = sat.liquid().z();
        double zv = sat.vapor().z();
        double vl = enthalpy ? MixtureThermo.enthalpy(model, m, p, z, zl) : MixtureThermo.entropy(model, m, p, z, zl);
        double vv = enthalpy ? MixtureThermo.enthalpy(model, m, p, z, zv) : MixtureThermo.entropy(model, m, p, z, zv);
        if (!(spec > vl && spec < vv)) {
            return null;
        }
        double beta = (spec - vl) / (vv - vl);
        // only Tsat and the split are used here: the cubic-basis density check does not apply
        List<String> warnings = new ArrayList<>(sat.warningsBesidesDensityCheck());
        StabilityResult st = new StabilityResult(t, p, false, 0.0, z, true,
                "one component on its saturation curve: liquid and vapour coexist", 0, List.of());
        FlashResult r = pt.pureTwoPhase(t, p, z, beta, zl, zv, st, warnings);
        return copy(r, r.warnings(), 1, enthalpy ? "enthalpy" : "entropy");
    }
}
