package org.ventcase.thermo;

import java.util.List;

/**
 * A pure fluid's saturation state from a cubic equation of state.
 *
 * @param variant              equation of state
 * @param component            the fluid
 * @param temperatureK         K
 * @param pressurePa           Pa absolute
 * @param liquid               saturated liquid
 * @param vapor                saturated vapour
 * @param latentHeatJmol       H_V - H_L, J/mol
 * @param latentHeatJkg        J/kg
 * @param rackettLiquidDensity saturated-liquid density by the Rackett equation (Spencer-Danner
 *                             form), kg/m3, an independent cross-check of the EOS liquid density
 * @param iterations           equal-fugacity iterations spent (outer x inner for Tsat)
 * @param warnings             what the user must know
 * @param densityCheck         the one of the warnings that is the Rackett cross-check of the liquid
 *                             density, "" when the densities agree
 * @param latentHeatSource     where the latent heat comes from: "" for the equation of state's
 *                             h_V - h_L, else the citation of the correlation it is anchored on
 *                             ({@link LatentHeatCorrelation})
 * @param cubicLatentHeatJmol  the equation of state's own h_V - h_L, J/mol (equal to latentHeatJmol
 *                             when latentHeatSource is "")
 */
public record SaturationResult(EosVariant variant, Component component, double temperatureK, double pressurePa,
                               PhaseState liquid, PhaseState vapor, double latentHeatJmol, double latentHeatJkg,
                               double rackettLiquidDensity, int iterations, List<String> warnings,
                               String densityCheck, String latentHeatSource, double cubicLatentHeatJmol) {

    public SaturationResult {
        warnings = List.copyOf(warnings);
        densityCheck = densityCheck == null ? "" : densityCheck;
        latentHeatSource = latentHeatSource == null ? "" : latentHeatSource;
    }

    /** Whether the latent heat (and the saturated-vapour volume) are anchored on a correlation. */
    public boolean latentHeatAnchored() {
        return !latentHeatSource.isEmpty();
    }

    /**
     * The warnings without the liquid-density cross-check, for a caller that uses only the
     * saturation temperature or pressure and the phase split (a state flash), not this density.
     */
    public List<String> warningsBesidesDensityCheck() {
        if (densityCheck.isEmpty()) {
            return warnings;
        }
        return warnings.stream().filter(w -> !w.equals(densityCheck)).toList();
    }

    /**
     * One coexisting phase.
     *
     * @param z                raw cubic root
     * @param molarVolumeCubic m3/mol
     * @param molarVolume      m3/mol on the density basis used
     * @param density          kg/m3 on that basis
     * @param densityBasis     the basis used
     * @param lnPhi            ln fugacity coefficient
     * @param residualEnthalpy J/mol
     */
    public record PhaseState(double z, double molarVolumeCubic, double molarVolume, double density,
                             DensityBasis densityBasis, double lnPhi, double residualEnthalpy) {
    }
}
