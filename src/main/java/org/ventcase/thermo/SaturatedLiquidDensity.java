package org.ventcase.thermo;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

import org.ventcase.common.CsvTable;

/**
 * Published saturated-liquid density correlations of the built-in components, from
 * {@code liquid-density.csv} (sources in its header), matched by CAS number. They anchor the
 * temperature-dependent volume translation of {@link EosVariant#PRTWU}
 * ({@link VolumeTranslation.Anchored}).
 *
 * <ul>
 * <li>DIPPR equation 105: rho = C1 / C2^(1 + (1 - T/C3)^C4), kmol/m3. Source: Perry's Chemical
 * Engineers' Handbook, 8th ed. (2008), Table 2-32.</li>
 * <li>Water: rho'/rho_c = 1 + sum b_i tau^(e_i/3), tau = 1 - T/Tc, Tc = 647.096 K,
 * rho_c = 322 kg/m3, b = (1.99274064, 1.09965342, -0.510839303, -1.75493479, -45.5170352,
 * -6.74694450e5), e = (1, 2, 5, 16, 43, 110). Source: IAPWS, Revised Supplementary Release on
 * Saturation Properties of Ordinary Water Substance (1992), eq. 2.</li>
 * </ul>
 */
public final class SaturatedLiquidDensity {

    /** Resource path of the table. */
    public static final String RESOURCE = "/org/ventcase/thermo/liquid-density.csv";

    private static final double[] IAPWS_B = {1.99274064, 1.09965342, -0.510839303, -1.75493479, -45.5170352,
            -6.74694450e5};
    private static final double[] IAPWS_E = {1, 2, 5, 16, 43, 110};
    private static final double IAPWS_TC = 647.096;
    private static final double IAPWS_RHOC = 322.0;

    /**
     * One correlation.
     *
     * @param equation "DIPPR105" or "IAPWS1992"
     * @param tMinK    lowest temperature of the correlation's range, K
     * @param tMaxK    highest (the correlation's critical temperature), K
     * @param source   the citation printed beside it
     */
    public record Correlation(String component, String equation, double c1, double c2, double c3, double c4,
                              double tMinK, double tMaxK, String source) {

        /** Saturated-liquid molar volume at T (tMinK <= T < tMaxK), m3/mol. */
        public double molarVolume(double t, double molarMassKgKmol) {
            if ("IAPWS1992".equals(equation)) {
                double tau = 1.0 - t / IAPWS_TC;
                double c = Math.cbrt(tau);
                double s = 1.0;
                for (int i = 0; i < IAPWS_B.length; i++) {
                    s += IAPWS_B[i] * Math.pow(c, IAPWS_E[i]);
                }
                return molarMassKgKmol * 1e-3 / (s * IAPWS_RHOC);
            }
            double kmolPerM3 = c1 / Math.pow(c2, 1.0 + Math.pow(1.0 - t / c3, c4));
            return 1e-3 / kmolPerM3;
        }
    }

    private static final class Holder {
        static final Map<String, Correlation> BY_CAS = load();
    }

    private SaturatedLiquidDensity() {
    }

    /** The correlation of a built-in component, matched by CAS number; empty where none is listed. */
    public static Optional<Correlation> find(Component c) {
        if (c.cas().isEmpty()) {
            return Optional.empty();
        }
        return Optional.ofNullable(Holder.BY_CAS.get(c.cas()));
    }

    private static Map<String, Correlation> load() {
        Map<String, Correlation> out = new HashMap<>();
        for (CsvTable.Row row : CsvTable.resource(SaturatedLiquidDensity.class, RESOURCE, CsvTable.LastColumn.FIELD).rows()) {
            String eq = row.text("equation");
            if (!"DIPPR105".equals(eq) && !"IAPWS1992".equals(eq)) {
                throw new IllegalStateException(RESOURCE + ": unknown equation " + eq);
            }
            String source = row.text("source");
            String citation = source.startsWith("Perry8-T2-32")
                    ? "DIPPR eq. 105, Perry's Chemical Engineers' Handbook 8th ed. (2008) Table 2-32"
                    : source;
            Correlation c = new Correlation(row.text("name"), eq, row.number("C1"),
                    row.number("C2"), row.number("C3"), row.number("C4"),
                    row.number("Tmin_K"), row.number("Tmax_K"), citation);
            if (out.put(row.text("cas"), c) != null) {
                throw new IllegalStateException(RESOURCE + ": two rows for CAS " + row.text("cas"));
            }
        }
        return Map.copyOf(out);
    }
}
