package org.ventcase.thermo.mix;

import static org.ventcase.common.PhysicalConstants.ATM_PA;
import static org.ventcase.common.PhysicalConstants.R;
import static org.ventcase.common.PhysicalConstants.T_REF_K;

import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.MixParams;

/**
 * Molar enthalpy and entropy of a phase of a mixture.
 *
 * <p>Reference state: each component as an ideal gas at T0 = 298.15 K and P0 = 101325 Pa has
 * H = 0 and S = 0. Then, for a phase of composition x at (T, P) on cubic root Z:
 * <pre>
 *   H = sum_i x_i integral_{T0}^{T} Cp_i^ig dT + H^R(T, P, x, Z)
 *   S = sum_i x_i integral_{T0}^{T} Cp_i^ig/T dT - R ln(P/P0) - R sum_i x_i ln x_i + S^R(T, P, x, Z)
 * </pre>
 * The ideal-gas integrals are {@link org.ventcase.thermo.IdealGasCp#enthalpyChange} and
 * {@link org.ventcase.thermo.IdealGasCp#entropyChange}; the residual parts are
 * {@link CubicModel#residualEnthalpy} and {@link CubicModel#residualEntropy}. Standard
 * thermodynamics (e.g. J.M. Smith, H.C. Van Ness, M.M. Abbott, Introduction to Chemical Engineering
 * Thermodynamics, 7th ed., 2005, sections 6.2 and 11.4 (ideal-gas mixture) and 6.4 (residual
 * properties)). Stateless.
 */
public final class MixtureThermo {

    private MixtureThermo() {
    }

    /** Ideal-gas enthalpy of composition x at T relative to the reference state, J/mol. */
    public static double idealGasEnthalpy(CubicModel model, double t, double[] x) {
        double h = 0;
        for (int i = 0; i < x.length; i++) {
            if (x[i] > 0) {
                h += x[i] * model.components().get(i).cp().enthalpyChange(T_REF_K, t);
            }
        }
        return h;
    }

    /** Ideal-gas entropy of composition x at (T, P), including the ideal mixing term, J/(mol K). */
    public static double idealGasEntropy(CubicModel model, double t, double p, double[] x) {
        double s = -R * Math.log(p / ATM_PA);
        for (int i = 0; i < x.length; i++) {
            if (x[i] > 0) {
                s += x[i] * (model.components().get(i).cp().entropyChange(T_REF_K, t) - R * Math.log(x[i]));
            }
        }
        return s;
    }

    /** H of a phase on root z (MixParams at T and x), J/mol. */
    public static double enthalpy(CubicModel model, MixParams m, double p, double[] x, double z) {
        return idealGasEnthalpy(model, m.t(), x) + model.residualEnthalpy(m, p, z);
    }

    /** S of a phase on root z, J/(mol K). */
    public static double entropy(CubicModel model, MixParams m, double p, double[] x, double z) {
        return idealGasEntropy(model, m.t(), p, x) + model.residualEntropy(m, p, z);
    }
}
