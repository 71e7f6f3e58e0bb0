package org.ventcase.thermo;

import java.util.List;

/**
 * Single-phase properties from a cubic equation of state at (T, P, x), with the roots and the
 * reason a root was chosen. SI throughout.
 *
 * @param variant             equation of state used
 * @param temperatureK        K
 * @param pressurePa          Pa absolute
 * @param composition         mole fractions (normalised copy)
 * @param roots               all real roots of the cubic
 * @param z                   the selected root, before any volume translation
 * @param rootChoice          which root was chosen and why (made when read)
 * @param phase               liquid, vapour or supercritical (criterion in {@code phaseCriterion})
 * @param phaseCriterion      the rule that named the phase
 * @param molarVolumeCubic    Z R T / P, m3/mol
 * @param molarVolume         on the density basis used, m3/mol
 * @param densityBasis        the basis actually used
 * @param density             kg/m3 on that basis
 * @param molarMass           kg/kmol
 * @param lnPhi               ln of each component's fugacity coefficient (cubic volume basis)
 * @param residualEnthalpy    H - H^ig, J/mol
 * @param residualEntropy     S - S^ig at the same T and P, J/(mol K)
 * @param residualGibbs       G - G^ig, J/mol
 * @param cpIdeal             ideal-gas Cp, J/(mol K)
 * @param cp                  real-fluid Cp, J/(mol K)
 * @param cv                  real-fluid Cv, J/(mol K)
 * @param kIdeal              ideal-gas Cp/Cv
 * @param kReal               real-fluid Cp/Cv
 * @param isentropicExponent  -(v/P)(Cp/Cv)(dP/dv)_T
 * @param speedOfSound        m/s; NaN only with a warning saying why
 * @param jouleThomson        (dT/dP)_H, K/Pa
 * @param warnings            what the user must know about these numbers
 */
public record FluidProperties(EosVariant variant, double temperatureK, double pressurePa, double[] composition,
                              CubicRoots roots, double z, org.ventcase.common.LazyText rootChoice, PhaseLabel phase, String phaseCriterion,
                              double molarVolumeCubic, double molarVolume, DensityBasis densityBasis, double density,
                              double molarMass, double[] lnPhi, double residualEnthalpy, double residualEntropy,
                              double residualGibbs, double cpIdeal, double cp, double cv, double kIdeal, double kReal,
                              double isentropicExponent, double speedOfSound, double jouleThomson,
                              List<String> warnings) {

    public FluidProperties {
        composition = composition.clone();
        lnPhi = lnPhi.clone();
        warnings = List.copyOf(warnings);
    }

    @Override
    public double[] composition() {
        return composition.clone();
    }

    @Override
    public double[] lnPhi() {
        return lnPhi.clone();
    }

    /** Which root was chosen and why. */
    public String rootReason() {
        return rootChoice.get();
    }

    /** Fugacity coefficient of component i. */
    public double fugacityCoefficient(int i) {
        return Math.exp(lnPhi[i]);
    }
}
