package org.ventcase.thermo.mix;

import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.PhaseLabel;

/**
 * One phase of a flash result. Per mole of phase unless stated.
 *
 * @param label            liquid, vapor or supercritical (two-phase results: liquid and vapor)
 * @param labelCriterion   how the label was decided, in words
 * @param amount           moles of this phase per mole of feed
 * @param composition      mole fractions (copied)
 * @param z                raw cubic compressibility factor of the chosen root
 * @param molarVolumeCubic m3/mol, from the cubic itself
 * @param molarVolume      m3/mol on {@code densityBasis}
 * @param densityCubic     kg/m3 from the cubic volume
 * @param density          kg/m3 on {@code densityBasis}
 * @param densityBasis     TRANSLATED (cubic volume minus the variant's volume shift) or CUBIC
 *                         where the variant has none; phase equilibrium is unaffected either way
 * @param molarMass        kg/kmol
 * @param enthalpyJmol     J/mol, reference: ideal gas at 298.15 K, 101325 Pa
 * @param entropyJmolK     J/(mol K), same reference
 * @param lnPhi            ln fugacity coefficients (copied)
 */
public record MixturePhase(PhaseLabel label, String labelCriterion, double amount,
                           double[] composition, double z, double molarVolumeCubic, double molarVolume,
                           double densityCubic, double density, DensityBasis densityBasis, double molarMass,
                           double enthalpyJmol, double entropyJmolK, double[] lnPhi) {
    public MixturePhase {
        composition = composition.clone();
        lnPhi = lnPhi.clone();
    }

    @Override
    public double[] composition() {
        return composition.clone();
    }

    @Override
    public double[] lnPhi() {
        return lnPhi.clone();
    }

    /** Convenience for the two-phase case. */
    public boolean isVapor() {
        return label == PhaseLabel.VAPOR;
    }
}
