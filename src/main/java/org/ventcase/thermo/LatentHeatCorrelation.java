package org.ventcase.thermo;

import static org.ventcase.common.PhysicalConstants.R;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

import org.ventcase.common.CsvTable;

/**
 * Published latent-heat correlations of the built-in fluids whose vapour hydrogen-bonds, from
 * {@code latent-heat.csv} (sources in its header), matched by CAS number. They anchor the
 * saturated latent heat and saturated-vapour density of {@link EosVariant#PRTWU} for a pure fluid
 * ({@link #anchor}), because no two-parameter cubic describes association in the vapour
 * ({@link AssociatingFluids}).
 *
 * <p>Equation (PPDS): L = R Tc (A tau^(1/3) + B tau^(2/3) + C tau + D tau^2 + E tau^6),
 * tau = 1 - T/Tc, J/mol. Source: VDI Heat Atlas, 2nd ed., Springer 2010, Part D3.1.
 *
 * <p>How the anchor is applied, and what it leaves alone. The vapour pressure (and so every
 * K-value and the saturation temperature at the relieving pressure) stays the equation of
 * state's. The latent heat is the correlation's. The saturated-vapour molar volume follows from
 * the Clapeyron equation L = T (v_V - v_L) dPsat/dT applied to the model's own vapour-pressure
 * curve, whose slope is exact for the cubic: dPsat/dT = L_cubic / (T (v_V - v_L)_cubic). So
 * (v_V - v_L) = (L / L_cubic) (v_V - v_L)_cubic, with v_L on the translated basis: one scale
 * factor on the cubic's volume of vaporisation, no fitted constant. The vapour's other properties
 * away from saturation (Z of a superheated vapour, k, residual enthalpy), and every mixture, stay
 * the cubic's; the association warning says so.
 */
public final class LatentHeatCorrelation {

    /** Resource path of the table. */
    public static final String RESOURCE = "/org/ventcase/thermo/latent-heat.csv";

    /** Citation printed beside an anchored latent heat. */
    public static final String CITATION = "PPDS equation, VDI Heat Atlas 2nd ed. (Springer 2010) Part D3.1, "
            + "coefficients as tabulated in the open-source chemicals library";

    /**
     * One correlation.
     *
     * @param tcK   the correlation's own critical temperature, K
     * @param tMinK lowest temperature it is used at (the triple point), K
     */
    public record Correlation(String component, double tcK, double a, double b, double c, double d, double e,
                              double tMinK, String source) {

        /** Whether T lies in the range the correlation is used for. */
        public boolean covers(double t) {
            return t >= tMinK && t < tcK;
        }

        /** Latent heat at T (covers(T)), J/mol. */
        public double latentHeatJmol(double t) {
            double tau = 1.0 - t / tcK;
            double c3 = Math.cbrt(tau);
            double tau2 = tau * tau;
            return R * tcK * (a * c3 + b * c3 * c3 + c * tau + d * tau2 + e * tau2 * tau2 * tau2);
        }
    }

    /**
     * A saturation state's latent heat and vapour volume after the anchor.
     *
     * @param latentHeatJmol       the correlation's latent heat, J/mol
     * @param cubicLatentHeatJmol  the cubic's h_V - h_L at the same state, J/mol
     * @param vapourMolarVolume    saturated-vapour molar volume, m3/mol (Clapeyron, see the class comment)
     */
    public record Anchored(double latentHeatJmol, double cubicLatentHeatJmol, double vapourMolarVolume) {

        /** L / L_cubic: the factor on the cubic's volume of vaporisation. */
        public double ratio() {
            return latentHeatJmol / cubicLatentHeatJmol;
        }
    }

    private static final class Holder {
        static final Map<String, Correlation> BY_CAS = load();
    }

    private LatentHeatCorrelation() {
    }

    /** The correlation of a built-in component, matched by CAS number; empty where none is listed. */
    public static Optional<Correlation> find(Component c) {
        if (c.cas().isEmpty()) {
            return Optional.empty();
        }
        return Optional.ofNullable(Holder.BY_CAS.get(c.cas()));
    }

    /**
     * The anchored latent heat and saturated-vapour volume of a pure fluid at saturation, or empty
     * where the anchor does not apply: a model other than {@link EosVariant#PRTWU}, a fluid without
     * a correlation, or T outside its range.
     *
     * @param lCubicJmol     the cubic's h_V - h_L at (T, Psat), J/mol
     * @param vLiquid        saturated-liquid molar volume on the density basis in use, m3/mol
     * @param dvCubic        the cubic's v_V - v_L at (T, Psat), m3/mol
     */
    public static Optional<Anchored> anchor(EosVariant variant, Component c, double t, double lCubicJmol,
                                            double vLiquid, double dvCubic) {
        if (variant != EosVariant.PRTWU || !(lCubicJmol > 0) || !(dvCubic > 0)) {
            return Optional.empty();
        }
        Optional<Correlation> corr = find(c);
        if (corr.isEmpty() || !corr.get().covers(t)) {
            return Optional.empty();
        }
        double l = corr.get().latentHeatJmol(t);
        if (!(l > 0)) {
            return Optional.empty();
        }
        return Optional.of(new Anchored(l, lCubicJmol, vLiquid + l / lCubicJmol * dvCubic));
    }

    private static Map<String, Correlation> load() {
        Map<String, Correlation> out = new HashMap<>();
        for (CsvTable.Row row : CsvTable.resource(LatentHeatCorrelation.class, RESOURCE, CsvTable.LastColumn.FIELD).rows()) {
            if (!"PPDS12".equals(row.text("equation"))) {
                throw new IllegalStateException(RESOURCE + ": unknown equation " + row.text("equation"));
            }
            Correlation c = new Correlation(row.text("name"), row.number("Tc_K"),
                    row.number("A"), row.number("B"), row.number("C"),
                    row.number("D"), row.number("E"), row.number("Tmin_K"),
                    CITATION);
            if (out.put(row.text("cas"), c) != null) {
                throw new IllegalStateException(RESOURCE + ": two rows for CAS " + row.text("cas"));
            }
        }
        return Map.copyOf(out);
    }
}
