package org.ventcase.relief;

import java.util.ArrayList;
import java.util.List;

import org.ventcase.thermo.Component;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.SaturationResult;
import org.ventcase.thermo.mix.MixtureThermo;
import org.ventcase.thermo.mix.SaturationPoint;
import org.ventcase.thermo.mix.SaturationPoints;

/**
 * A liquid at its bubble point at pressure P together with its incipient (equilibrium) vapour:
 * the state of a boiling liquid in a vessel held at the relieving pressure.
 *
 * <p>Latent heat of a mixture, as used by every Ventcase fire case: the molar enthalpy of the
 * incipient vapour minus that of the liquid, both at the bubble point (T_b, P), divided by the
 * molar mass of the vapour: L = (H_V(T_b, P, y) - H_L(T_b, P, x)) / M_V, in J per kg of vapour.
 * For a pure fluid it is the ordinary latent heat h_V - h_L at Tsat(P).
 *
 * <p>Enthalpies are on the same density basis as the volumes: with a volume translation c
 * (v = v_cubic - c(T), Peneloux), H = H_cubic - P (c - T dc/dT), since the translation shifts the
 * Gibbs energy by -P c(T) and leaves phase equilibrium unchanged (A. Peneloux, E. Rauzy, R. Freze,
 * Fluid Phase Equilib. 8 (1982) 7-23, for constant c; the T dc/dT term follows from S = -dG/dT,
 * see {@link org.ventcase.thermo.VolumeTranslation}). This keeps U = H - P V exact in the
 * balances; for a pure fluid the latent heat is unaffected.
 *
 * @param temperatureK  bubble temperature, K
 * @param pressurePa    Pa absolute
 * @param liquid        liquid mole fractions (copied)
 * @param vapour        incipient vapour mole fractions (copied)
 * @param liquidProps   liquid-root properties at (T_b, P, x)
 * @param vapourProps   vapour-root properties at (T_b, P, y)
 * @param hLiquidJmol   liquid molar enthalpy, J/mol (ideal gas at 298.15 K, 101325 Pa = 0)
 * @param hVapourJmol   vapour molar enthalpy, J/mol
 * @param lnK           ln K_i (copied), for warm starts
 * @param method        how the bubble point was found
 * @param warnings      what the user must know
 * @param vapourDensity saturated-vapour density on the density basis, kg/m3: the vapour root's,
 *                      except for a pure fluid whose latent heat is anchored on a correlation
 *                      ({@link org.ventcase.thermo.LatentHeatCorrelation}), where on the translated
 *                      basis it follows from that latent heat by the Clapeyron equation
 * @param latentHeatSource "" when L is the equation of state's; else the correlation's citation
 *                      (hVapourJmol is then hLiquidJmol + L of the correlation)
 * @param cubicLatentHeatJmol the equation of state's own H_V - H_L, J/mol
 */
public record BoilingState(double temperatureK, double pressurePa, double[] liquid, double[] vapour,
                           FluidProperties liquidProps, FluidProperties vapourProps, double hLiquidJmol,
                           double hVapourJmol, double[] lnK, String method, List<String> warnings,
                           double vapourDensity, String latentHeatSource, double cubicLatentHeatJmol) {

    public BoilingState {
        liquid = liquid.clone();
        vapour = vapour.clone();
        lnK = lnK.clone();
        warnings = List.copyOf(warnings);
    }

    @Override
    public double[] liquid() {
        return liquid.clone();
    }

    @Override
    public double[] vapour() {
        return vapour.clone();
    }

    @Override
    public double[] lnK() {
        return lnK.clone();
    }

    /** Whether the latent heat is anchored on a correlation (a pure fluid, see latentHeatSource). */
    public boolean latentHeatAnchored() {
        return !latentHeatSource.isEmpty();
    }

    /** The equation of state's own latent heat, J per kg of vapour. */
    public double cubicLatentHeatJPerKg() {
        return cubicLatentHeatJmol / (vapourProps.molarMass() * 1e-3);
    }

    /** L = (H_V - H_L) / M_V, J per kg of vapour (see the class comment). */
    public double latentHeatJPerKg() {
        return (hVapourJmol - hLiquidJmol) / (vapourProps.molarMass() * 1e-3);
    }

    /** Liquid molar volume on the density basis, m3/mol. */
    public double liquidMolarVolume() {
        return liquidProps.molarVolume();
    }

    /** Vapour molar volume on the density basis, m3/mol. */
    public double vapourMolarVolume() {
        return vapourProps.molarVolume();
    }

    /**
     * The bubble point of the spec's liquid at pressure p, with its incipient vapour, on the spec's
     * density basis: the state {@link MixtureFire} boils at when p is the relieving pressure.
     * Public for the reviewer's cross-checks (e.g. the state at P1 - P_atm, or at the storage
     * bubble pressure).
     */
    public static BoilingState bubblePoint(MixtureSpec spec, double pressurePa) {
        return at(spec.model(), spec.densityBasis(), pressurePa, spec.composition(), Double.NaN, null);
    }

    /**
     * The bubble point of liquid x at pressure p, with its incipient vapour.
     *
     * @param t0   temperature guess, K, or NaN for the Wilson estimate
     * @param lnK0 ln K guess, or null
     */
    static BoilingState at(CubicModel model, DensityBasis basis, double p, double[] x, double t0, double[] lnK0) {
        int n = x.length;
        int present = 0;
        int only = -1;
        for (int i = 0; i < n; i++) {
            if (x[i] > 0) {
                present++;
                only = i;
            }
        }
        double t;
        double[] y;
        double[] lnK = new double[n];
        List<String> warnings = new ArrayList<>();
        String method;
        SaturationResult sat = null;
        if (present == 1) {
            Component c = model.components().get(only);
            sat = new PureSaturation(CubicModel.pure(model.variant(), c)).atPressure(p, DensityBasis.CUBIC);
            t = sat.temperatureK();
            y = new double[n];
            y[only] = 1.0;
            method = "one component present: saturation temperature by equal fugacity (PureSaturation)";
            if (model.variant() == org.ventcase.thermo.EosVariant.PRTWU) {
                // where the default model is known to miss its targets at this state (docs/accuracy.md)
                String known = org.ventcase.thermo.MeasuredDeviations.note(c, t / model.tc(only));
                if (!known.isEmpty()) {
                    warnings.add(known);
                }
            }
        } else {
            SaturationPoint sp = new SaturationPoints(model).temperature(SaturationPoint.Kind.BUBBLE, p, x, t0, lnK0);
            t = sp.temperatureK();
            y = sp.incipientComposition();
            double[] k = sp.kValues();
            for (int i = 0; i < n; i++) {
                lnK[i] = Math.log(k[i]);
            }
            warnings.addAll(sp.warnings());
            method = "bubble temperature: Newton on T with fugacity K-value updates (SaturationPoints)";
        }
        FluidProperties lp = model.properties(t, p, x, PhaseRequest.LIQUID, basis);
        FluidProperties vp = model.properties(t, p, y, PhaseRequest.VAPOR, basis);
        warnings.addAll(lp.warnings());
        warnings.addAll(vp.warnings());
        double hL = enthalpy(model, lp);
        double hV = enthalpy(model, vp);
        double rhoV = vp.density();
        String source = "";
        if (sat != null && sat.latentHeatAnchored()) {
            // For a pure fluid H_V - H_L is the cubic's latent heat on either basis (the translation
            // term -P c is the same in both phases); the anchor replaces it, and on the translated
            // basis scales the volume of vaporisation by the same factor (Clapeyron on the model's
            // own vapour-pressure curve, see LatentHeatCorrelation).
            hV = hL + sat.latentHeatJmol();
            source = sat.latentHeatSource();
            if (basis == DensityBasis.TRANSLATED) {
                double dvCubic = sat.vapor().molarVolumeCubic() - sat.liquid().molarVolumeCubic();
                double vV = lp.molarVolume() + sat.latentHeatJmol() / sat.cubicLatentHeatJmol() * dvCubic;
                rhoV = vp.molarMass() * 1e-3 / vV;
            }
        }
        return new BoilingState(t, p, x, y, lp, vp, hL, hV, lnK, method, warnings, rhoV, source,
                enthalpy(model, vp) - hL);
    }

    /**
     * Molar enthalpy of a single phase on its density basis, J/mol: ideal-gas part + residual
     * part - P c(x) when a volume translation is in use (see the class comment).
     */
    static double enthalpy(CubicModel model, FluidProperties fp) {
        double[] x = fp.composition();
        double h = MixtureThermo.idealGasEnthalpy(model, fp.temperatureK(), x) + fp.residualEnthalpy();
        if (fp.densityBasis() == DensityBasis.TRANSLATED) {
            h += model.translatedEnthalpyShift(fp.temperatureK(), fp.pressurePa(), x);
        }
        return h;
    }
}
