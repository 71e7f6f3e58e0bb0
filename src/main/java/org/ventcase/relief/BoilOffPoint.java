package org.ventcase.relief;

/**
 * One point of the boil-off load curve, at the end of a step.
 *
 * @param timeS                 time since the device opened, s
 * @param temperatureK          liquid (bubble) temperature, K
 * @param liquid                liquid mole fractions (copied)
 * @param vapour                equilibrium vapour mole fractions (copied)
 * @param liquidMassKg          liquid left, kg
 * @param vapourSpaceMassKg     vapour in the vessel, kg
 * @param massFlowKgPerS        relief rate, kg/s: vented mass over the step divided by the step's
 *                              duration (point 0: the initial bubble-point rate Q/L (1 - rho_V/rho_L))
 * @param ventedEnthalpyJPerKg  mean specific enthalpy of what left over the step, J/kg (point 0:
 *                              that of the initial vapour)
 * @param vapourMolarMass       M of the vapour at the point, kg/kmol
 * @param vapourZ               Z of the vapour at the point
 * @param vapourKIdeal          ideal-gas k of the vapour at the point
 * @param requiredAreaM2        API 520 required area at the point's rate and vapour properties, m2
 */
public record BoilOffPoint(double timeS, double temperatureK, double[] liquid, double[] vapour, double liquidMassKg,
                           double vapourSpaceMassKg, double massFlowKgPerS, double ventedEnthalpyJPerKg,
                           double vapourMolarMass, double vapourZ, double vapourKIdeal, double requiredAreaM2) {
    public BoilOffPoint {
        liquid = liquid.clone();
        vapour = vapour.clone();
    }

    @Override
    public double[] liquid() {
        return liquid.clone();
    }

    @Override
    public double[] vapour() {
        return vapour.clone();
    }
}
