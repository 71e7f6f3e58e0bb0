package org.ventcase.relief;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.FluidProperties;

/**
 * The relieved fluid at relieving conditions, as a reviewer checks it: one record per scenario
 * result, every number with the model that produced it.
 *
 * @param phase                 what is relieved
 * @param temperatureK          relieving temperature T, K
 * @param pressurePa            relieving pressure P1, Pa absolute
 * @param componentNames        component names in order
 * @param composition           mole fractions of the relieved fluid (copied)
 * @param molarMass             M, kg/kmol
 * @param z                     compressibility factor of the selected cubic root (before any
 *                              volume translation; the Z the API 520 gas equation takes)
 * @param density               kg/m3 on {@code densityBasis}
 * @param densityBasis          TRANSLATED (the model's volume translation) or CUBIC
 * @param kIdeal                ideal-gas Cp/Cv at T (the k of the API 520 gas equations)
 * @param isentropicExponent    real-fluid isentropic exponent -(v/P)(Cp/Cv)(dP/dv)_T
 * @param latentHeatJPerKg      latent heat where the scenario has one (definition in
 *                              {@code latentHeatDefinition}), J/kg
 * @param latentHeatDefinition  the definition used, or empty
 * @param viscosityPaS          dynamic viscosity where a liquid is relieved, Pa s
 * @param viscositySource       where the viscosity came from, or empty
 * @param eos                   equation of state
 * @param provenanceText        root chosen and why; ideal-gas Cp source (made when read)
 * @param warnings              what the user must know about these numbers
 * @param realRoots             every physical real root of the cubic in Z at (T, P1), ascending
 *                              (the selected one is {@code z})
 */
public record RelievedFluid(Phase phase, double temperatureK, double pressurePa, List<String> componentNames,
                            double[] composition, double molarMass, double z, double density,
                            DensityBasis densityBasis, double kIdeal, double isentropicExponent,
                            OptionalDouble latentHeatJPerKg, String latentHeatDefinition,
                            OptionalDouble viscosityPaS, String viscositySource, EosVariant eos, org.ventcase.common.LazyText provenanceText,
                            List<String> warnings, double[] realRoots) {

    /** What leaves through the device. */
    public enum Phase {
        /** Vapour in equilibrium with a liquid (fire, boil-off). */
        VAPOUR("vapour"),
        /** Gas or supercritical fluid, no liquid present. */
        GAS("gas"),
        /** Liquid. */
        LIQUID("liquid");

        private final String label;

        Phase(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    public RelievedFluid {
        componentNames = List.copyOf(componentNames);
        composition = composition.clone();
        latentHeatJPerKg = latentHeatJPerKg == null ? OptionalDouble.empty() : latentHeatJPerKg;
        viscosityPaS = viscosityPaS == null ? OptionalDouble.empty() : viscosityPaS;
        latentHeatDefinition = latentHeatDefinition == null ? "" : latentHeatDefinition;
        viscositySource = viscositySource == null ? "" : viscositySource;
        warnings = List.copyOf(warnings);
        realRoots = realRoots == null || realRoots.length == 0 ? new double[] {z} : realRoots.clone();
    }

    @Override
    public double[] composition() {
        return composition.clone();
    }

    @Override
    public double[] realRoots() {
        return realRoots.clone();
    }

    /** The real roots as text, e.g. "0.07123, 0.13801, 0.70465", five decimals. */
    public String realRootsText() {
        StringBuilder sb = new StringBuilder();
        for (double r : realRoots) {
            sb.append(sb.length() == 0 ? "" : ", ").append(String.format(Locale.US, "%.5f", r));
        }
        return sb.toString();
    }

    /** From single-phase EOS properties. */
    static RelievedFluid of(Phase phase, MixtureSpec spec, FluidProperties fp, OptionalDouble latent,
                            String latentDefinition, OptionalDouble viscosity, String viscositySource) {
        List<String> w = new ArrayList<>(fp.warnings());
        double[] x = fp.composition();
        org.ventcase.common.LazyText prov = org.ventcase.common.LazyText.of(() -> String.format(Locale.US,
                "%s (%s); %s; density basis %s; ideal-gas Cp: %s", spec.eos().displayName(), spec.eos().citation(),
                fp.rootReason(), fp.densityBasis().label(), cpSources(spec, x)));
        return new RelievedFluid(phase, fp.temperatureK(), fp.pressurePa(), spec.names(), fp.composition(),
                fp.molarMass(), fp.z(), fp.density(), fp.densityBasis(), fp.kIdeal(), fp.isentropicExponent(), latent,
                latentDefinition, viscosity, viscositySource, spec.eos(), prov, w, fp.roots().physical());
    }

    /**
     * The saturated vapour of a boiling state: the vapour root's properties, with the density of
     * the boiling state (which differs from the root's only where the latent heat is anchored on a
     * correlation, see {@link BoilingState#vapourDensity()}). Z stays the cubic root's.
     */
    static RelievedFluid saturatedVapour(MixtureSpec spec, BoilingState b, OptionalDouble latent) {
        RelievedFluid f = of(Phase.VAPOUR, spec, b.vapourProps(), latent, MixtureFire.latentHeatDefinition(b),
                OptionalDouble.empty(), "");
        if (b.vapourDensity() == f.density) {
            return f;
        }
        org.ventcase.common.LazyText prov = f.provenanceText;
        org.ventcase.common.LazyText withAnchor = org.ventcase.common.LazyText.of(() -> prov.get()
                + "; saturated-vapour density by the Clapeyron equation from the latent-heat correlation (the "
                + "cubic's vapour root gives " + String.format(Locale.US, "%.4g", b.vapourProps().density())
                + " kg/m3); Z is the cubic root's, as the API 520 gas equation takes it");
        return new RelievedFluid(f.phase, f.temperatureK, f.pressurePa, f.componentNames, f.composition,
                f.molarMass, f.z, b.vapourDensity(), f.densityBasis, f.kIdeal, f.isentropicExponent,
                f.latentHeatJPerKg, f.latentHeatDefinition, f.viscosityPaS, f.viscositySource, f.eos, withAnchor,
                f.warnings, f.realRoots);
    }

    private static String cpSources(MixtureSpec spec, double[] x) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < x.length; i++) {
            if (x[i] > 0) {
                sb.append(sb.length() == 0 ? "" : "; ").append(spec.components().get(i).name()).append(": ")
                        .append(org.ventcase.thermo.Citations.cp(spec.components().get(i)));
            }
        }
        return sb.toString();
    }

    /** Root chosen and why; ideal-gas Cp source. */
    public String provenance() {
        return provenanceText.get();
    }

    /** One property for a reviewer's table: its name and its value, made when read. */
    public record Row(String name, org.ventcase.common.LazyText value) {
    }

    /** One row per property, for a reviewer's table (values formatted when read). */
    public List<Row> rows() {
        List<Row> out = new ArrayList<>();
        out.add(new Row("Relieved phase", org.ventcase.common.LazyText.fixed(phase.label())));
        out.add(new Row("T", org.ventcase.common.LazyText.format("%.2f K (%.2f C)", temperatureK,
                temperatureK - 273.15)));
        out.add(new Row("P", org.ventcase.common.LazyText.format("%.1f kPa abs", pressurePa / 1e3)));
        out.add(new Row("Composition (mole fractions)", org.ventcase.common.LazyText.of(() -> {
            StringBuilder c = new StringBuilder();
            for (int i = 0; i < composition.length; i++) {
                c.append(i == 0 ? "" : ", ").append(componentNames.get(i)).append(' ')
                        .append(String.format(Locale.US, "%.5f", composition[i]));
            }
            return c.toString();
        })));
        out.add(new Row("M", org.ventcase.common.LazyText.format("%.3f kg/kmol", molarMass)));
        out.add(new Row("Z", org.ventcase.common.LazyText.of(() -> String.format(Locale.US,
                "%.5f (cubic root; real roots of the cubic: %s)", z, realRootsText()))));
        out.add(new Row("Density", org.ventcase.common.LazyText.format("%.4g kg/m3 (%s basis)", density,
                densityBasis.label())));
        out.add(new Row("k", org.ventcase.common.LazyText.format("Cp/Cv ideal gas = %.4f", kIdeal)));
        out.add(new Row("Real-fluid isentropic exponent", org.ventcase.common.LazyText.format("%.4f",
                isentropicExponent)));
        latentHeatJPerKg.ifPresent(l -> out.add(new Row("Latent heat", org.ventcase.common.LazyText.format(
                "%.2f kJ/kg (%s)", l / 1e3, latentHeatDefinition))));
        viscosityPaS.ifPresent(v -> out.add(new Row("Viscosity", org.ventcase.common.LazyText.format(
                "%.4g mPa s (%s)", v * 1e3, viscositySource))));
        out.add(new Row("Model", provenanceText));
        return out;
    }
}
