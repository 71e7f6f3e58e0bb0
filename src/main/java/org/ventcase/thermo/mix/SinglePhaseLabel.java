package org.ventcase.thermo.mix;

import static org.ventcase.common.PhysicalConstants.R;

import java.util.Locale;

import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.MixParams;
import org.ventcase.thermo.PhaseLabel;

/**
 * Names a stable single phase of a mixture: liquid, vapour or supercritical.
 *
 * <p>Criterion, with (Tc_m, Pc_m) the mixture's critical point when a phase envelope has located
 * it, otherwise Kay's pseudo-critical point Tpc = sum x_i Tc_i, Ppc = sum x_i Pc_i (a screening
 * rule: the true critical point of a mixture can lie far from it):
 * <ul>
 * <li>T >= Tc_m and P >= Pc_m: supercritical;</li>
 * <li>T >= Tc_m and P < Pc_m: vapour;</li>
 * <li>T < Tc_m: liquid if the cubic root is liquid-like (molar volume below
 * v* = (Zc/Omega_b) b, the volume at the equation's own critical point), else vapour.</li>
 * </ul>
 * Source of Kay's rule: W.B. Kay, Ind. Eng. Chem. 28 (1936) 1014-1019.
 */
public final class SinglePhaseLabel {

    private SinglePhaseLabel() {
    }

    /**
     * A label and the criterion that produced it.
     *
     * @param label     the name
     * @param criterion the rule in words with the numbers used
     */
    public record Label(PhaseLabel label, String criterion) {
    }

    /** Whether root z at (T, P) is liquid-like: v < (Zc/Omega_b) b. */
    public static boolean liquidLike(CubicModel model, MixParams m, double p, double z) {
        double vStar = model.variant().zc() / model.variant().omegaB() * m.b();
        return z * R * m.t() / p < vStar;
    }

    /** Label by Kay's pseudo-critical point. */
    public static Label byKay(CubicModel model, double t, double p, double[] x, boolean liquidLikeRoot) {
        double tc = 0;
        double pc = 0;
        for (int i = 0; i < x.length; i++) {
            tc += x[i] * model.tc(i);
            pc += x[i] * model.pc(i);
        }
        return classify(t, p, tc, pc, liquidLikeRoot, "Kay's-rule pseudo-critical point (screening only)");
    }

    /** Label by a mixture critical point located on the phase envelope. */
    public static Label byCriticalPoint(double t, double p, double tcK, double pcPa, boolean liquidLikeRoot) {
        return classify(t, p, tcK, pcPa, liquidLikeRoot, "critical point of the phase envelope");
    }

    private static Label classify(double t, double p, double tc, double pc, boolean liquidLikeRoot, String what) {
        PhaseLabel l;
        String rule;
        if (t >= tc) {
            l = p >= pc ? PhaseLabel.SUPERCRITICAL : PhaseLabel.VAPOR;
            rule = p >= pc ? "T >= Tc and P >= Pc" : "T >= Tc and P < Pc";
        } else {
            l = liquidLikeRoot ? PhaseLabel.LIQUID : PhaseLabel.VAPOR;
            rule = "T < Tc: the root is " + (liquidLikeRoot ? "liquid-like" : "vapour-like")
                    + " (v against v* = (Zc/Omega_b) b)";
        }
        return new Label(l, String.format(Locale.US, "%s; %s with Tc = %.2f K, Pc = %.6g Pa", rule, what, tc, pc));
    }
}
