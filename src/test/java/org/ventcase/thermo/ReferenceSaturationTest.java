package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.api.Test;

/**
 * The default model's saturation states against published reference equations of state.
 *
 * <p>Check values: saturation-reference-eos.csv (15 fluids, Tr 0.475-0.925; values of the
 * reference equation named in each row, evaluated with CoolProp 8.0.0; header copied with the
 * file) and water-iapws95.csv (IAPWS-95 evaluated with Debian's python3-iapws 1.5.2 by
 * tools/gen_water_refs.py).
 *
 * <p>Tolerances up to Tr 0.9 (what the project asks of the default model): vapour pressure 2 %,
 * liquid density 2 %, vapour density 3 %, latent heat 3 %. Where a two-parameter cubic cannot do
 * that, the figure reached is asserted and named in {@link #EXCEPTIONS} with the reason, and the
 * program warns (AssociatingFluids, PureSaturation). Above Tr 0.9 the figures reached are
 * asserted (vapour pressure 1.5 %, liquid density 6.5 % (water at Tr 0.958; 1.2 % at Tr 0.925),
 * vapour density 4.5 %, latent heat 4.5 %)
 * and a warning is printed with every saturation state there.
 *
 * <p>The second test writes the accuracy table (docs/accuracy.md) from the same numbers and fails
 * when the committed file differs, so the table cannot drift from the code; regenerate it with
 * {@code mvn test -Dtest=ReferenceSaturationTest -Dventcase.accuracy.write=true}.
 */
class ReferenceSaturationTest {

    private static final ComponentLibrary LIB = ComponentLibrary.builtIn();
    private static final String[] QUANTITIES = {"Psat", "rhoL", "rhoV", "L"};
    private static final double[] TOL = {0.02, 0.02, 0.03, 0.03};
    /**
     * Above Tr 0.9: the figures reached. Liquid density: the translation's anchors end at 0.90 Tc
     * (VolumeTranslation.Anchored says why), so it falls off towards Tc: 1.2 % at Tr 0.925 for the
     * hydrocarbons, 6.2 % for water at Tr 0.958.
     */
    private static final double[] TOL_ABOVE_09 = {0.015, 0.065, 0.045, 0.045};

    /**
     * Where the default model is held to the figure it reaches rather than the general tolerance:
     * fluid + quantity -> {lowest Tr, highest Tr, tolerance}, with the reason.
     */
    private static final Map<String, double[]> EXCEPTIONS = new LinkedHashMap<>();

    static {
        // Vapour pressure at the lowest temperatures: the tc-PR alpha was fitted over the whole
        // range; below Tr 0.5 (n-hexane, 3.0 % at 241 K, 0.3 kPa) and 0.6 (ammonia, 3.6 % at 213 K)
        // it leaves more. No relief state is that cold for these fluids.
        EXCEPTIONS.put("n-hexane/Psat", new double[] {0, 0.5, 0.035});
        EXCEPTIONS.put("ammonia/Psat", new double[] {0, 0.6, 0.04});
        // Hydrogen bonding in the vapour, which no two-parameter cubic describes: for methanol,
        // ammonia and water the default model anchors the latent heat on the PPDS correlation and the
        // saturated-vapour density on it by Clapeyron (LatentHeatCorrelation), so no exception is
        // needed for them any more (before the anchor: methanol rhoV -9.0 %, L +9.9 %; ammonia -4.8 %,
        // +4.9 %; water -2.8 %, +3.5 %).
    }

    record Row(String fluid, double t, double tr, double p, double rhoL, double rhoV, double latentKJkg,
               String reference) {
    }

    static List<Row> rows() throws IOException {
        List<Row> out = new ArrayList<>();
        for (List<String> f : csv("saturation-reference-eos.csv")) {
            out.add(new Row(f.get(0), d(f.get(1)), d(f.get(2)), d(f.get(3)), d(f.get(4)), d(f.get(5)), d(f.get(6)),
                    f.get(7)));
        }
        for (List<String> f : csv("water-iapws95.csv")) {
            out.add(new Row("water", d(f.get(0)), d(f.get(1)), d(f.get(2)), d(f.get(3)), d(f.get(4)), d(f.get(5)),
                    "IAPWS-95 (python3-iapws 1.5.2)"));
        }
        return out;
    }

    private static double d(String s) {
        return Double.parseDouble(s.trim());
    }

    private static List<List<String>> csv(String name) throws IOException {
        return ReferenceCsv.rows(ReferenceSaturationTest.class, name);
    }

    /** {Psat, rhoL, rhoV, L} relative deviations of a variant at a row, and the result's warnings. */
    static double[] deviations(EosVariant v, Row r, List<String> warningsOut) {
        SaturationResult s = new PureSaturation(CubicModel.pure(v, LIB.get(r.fluid())))
                .atTemperature(r.t(), DensityBasis.TRANSLATED);
        if (warningsOut != null) {
            warningsOut.addAll(s.warnings());
        }
        return new double[] {s.pressurePa() / r.p() - 1, s.liquid().density() / r.rhoL() - 1,
                s.vapor().density() / r.rhoV() - 1, s.latentHeatJkg() / 1e3 / r.latentKJkg() - 1};
    }

    @Test
    void coldEndVapourPressureMissesCarryAWarning() throws IOException {
        // The two points held to a vapour-pressure exception (EXCEPTIONS) must say so on the sheet;
        // the same fluid inside the 2 % range must not.
        int warned = 0;
        for (Row r : rows()) {
            boolean cold = "ammonia".equals(r.fluid()) && r.tr() < 0.6 || "n-hexane".equals(r.fluid()) && r.tr() < 0.5;
            if (!cold && !"ammonia".equals(r.fluid()) && !"n-hexane".equals(r.fluid())) {
                continue;
            }
            List<String> warnings = new ArrayList<>();
            deviations(EosVariant.DEFAULT, r, warnings);
            boolean says = warnings.stream().anyMatch(w -> w.contains("vapour pressure is up to"));
            assertEquals(cold, says, r.fluid() + " at Tr " + r.tr() + ": " + warnings);
            warned += says ? 1 : 0;
        }
        assertTrue(warned >= 3, "cold-end points warned: " + warned);
    }

    @Test
    void defaultModelIsWithinTolerancesOfTheReferenceEquations() throws IOException {
        assertEquals(EosVariant.PRTWU, EosVariant.DEFAULT);
        List<String> failures = new ArrayList<>();
        int points = 0;
        for (Row r : rows()) {
            List<String> warnings = new ArrayList<>();
            double[] dev = deviations(EosVariant.DEFAULT, r, warnings);
            points++;
            for (int q = 0; q < 4; q++) {
                double tol = r.tr() > 0.9 ? TOL_ABOVE_09[q] : TOL[q];
                boolean excepted = false;
                for (Map.Entry<String, double[]> e : EXCEPTIONS.entrySet()) {
                    double[] ex = e.getValue();
                    if (e.getKey().split(" ")[0].equals(r.fluid() + "/" + QUANTITIES[q]) && r.tr() >= ex[0]
                            && r.tr() <= ex[1]) {
                        excepted = true;
                        tol = ex[2];
                    }
                }
                if (!(Math.abs(dev[q]) <= tol)) {
                    failures.add(String.format(Locale.US, "%s %.2f K (Tr %.3f) %s %+.2f %% > %.1f %% vs %s", r.fluid(),
                            r.t(), r.tr(), QUANTITIES[q], 100 * dev[q], 100 * tol, r.reference()));
                }
                if (excepted && Math.abs(dev[q]) > (r.tr() > 0.9 ? TOL_ABOVE_09[q] : TOL[q])
                        && q >= 2 && r.tr() >= 0.6 && warnings.stream().noneMatch(w -> w.contains("hydrogen bonding"))) {
                    failures.add(r.fluid() + " " + r.t() + " K: no association warning with " + QUANTITIES[q] + " off");
                }
            }
            if (r.tr() > 0.9 && r.tr() <= 0.95) {
                assertTrue(warnings.stream().anyMatch(w -> w.contains("above Tr 0.9")),
                        r.fluid() + " " + r.t() + " K: expected the Tr > 0.9 warning, got " + warnings);
            }
        }
        assertTrue(points >= 150, "read " + points + " reference points");
        assertTrue(failures.isEmpty(), failures.size() + " deviations:\n  " + String.join("\n  ", failures));
    }

    @Test
    void accuracyTableMatchesDocs() throws IOException {
        String table = accuracyMarkdown();
        Path doc = Path.of("docs", "accuracy.md");
        if (Boolean.getBoolean("ventcase.accuracy.write")) {
            Files.writeString(doc, table);
        }
        Files.createDirectories(Path.of("target"));
        Files.writeString(Path.of("target", "accuracy.md"), table);
        assertTrue(Files.exists(doc), "docs/accuracy.md is missing: run with -Dventcase.accuracy.write=true");
        assertEquals(table, Files.readString(doc),
                "docs/accuracy.md differs from what the code gives (target/accuracy.md): regenerate it with "
                        + "mvn test -Dtest=ReferenceSaturationTest -Dventcase.accuracy.write=true");
    }

    static String accuracyMarkdown() throws IOException {
        Map<String, List<Row>> byFluid = new LinkedHashMap<>();
        for (Row r : rows()) {
            String key = r.fluid() + "|" + r.reference();
            byFluid.computeIfAbsent(key, k -> new ArrayList<>()).add(r);
        }
        StringBuilder sb = new StringBuilder();
        sb.append("# Accuracy of the saturation states\n\n");
        sb.append("Generated by `ReferenceSaturationTest` from the code and the reference data in the test resources; "
                + "the test fails when this file differs from what the code gives. Regenerate with "
                + "`mvn test -Dtest=ReferenceSaturationTest -Dventcase.accuracy.write=true`.\n\n");
        sb.append("Each cell is the largest deviation (signed, per cent) of the model from the reference equation of "
                + "state over the points listed: vapour pressure (Psat), saturated-liquid density (rhoL) and vapour "
                + "density (rhoV) on the default translated density basis, and latent heat (L). `PR-Twu` is the "
                + "default model (Peng-Robinson, Twu alpha with the tc-PR parameters of Pina-Martinez, Privat and "
                + "Jaubert 2022, temperature-dependent volume translation anchored on published saturated-liquid "
                + "densities); `PR78` is the classic Peng-Robinson with its Peneloux-type constant shift. Reference "
                + "values: `src/test/resources/org/ventcase/thermo/saturation-reference-eos.csv` (reference "
                + "equations named per fluid, evaluated with CoolProp 8.0.0) and `water-iapws95.csv` (IAPWS-95, "
                + "python3-iapws 1.5.2). The reference-equation citations are as the data file gives them (its header says "
                + "they were written beside the fluid name from memory, to be checked before printing); none is printed "
                + "on a calculation sheet.\n\n"
                + "For the hydrogen-bonding fluids (methanol, ethanol, ammonia, water), whose vapour association no "
                + "two-parameter cubic describes, the default model takes the saturated latent heat from the PPDS "
                + "correlation of the VDI Heat Atlas and the saturated-vapour density from it by the Clapeyron equation "
                + "on the model's own vapour pressure; the PR78 columns show the cubic alone. "
                + "Where the default model misses 2 % (Psat, rhoL) or 3 % (rhoV, L) up to Tr 0.9: vapour pressure below "
                + "Tr 0.6 for ammonia and below Tr 0.5 for n-hexane, from the published Twu parameters themselves. "
                + "Above Tr 0.9 every saturation state carries a warning.\n\n");
        for (boolean above : new boolean[] {false, true}) {
            sb.append(above ? "## Above Tr 0.9 (Tr 0.925-0.96)\n\n" : "## Tr 0.45 to 0.9\n\n");
            sb.append("| fluid | reference | points | PR-Twu Psat | rhoL | rhoV | L | PR78 Psat | rhoL | rhoV | L |\n");
            sb.append("|---|---|---|---|---|---|---|---|---|---|---|\n");
            for (Map.Entry<String, List<Row>> e : byFluid.entrySet()) {
                List<Row> pts = new ArrayList<>();
                for (Row r : e.getValue()) {
                    if ((r.tr() > 0.9) == above) {
                        pts.add(r);
                    }
                }
                if (pts.isEmpty()) {
                    continue;
                }
                String[] parts = e.getKey().split("\\|", 2);
                sb.append("| ").append(parts[0]).append(" | ").append(parts[1]).append(" | ").append(pts.size());
                for (EosVariant v : new EosVariant[] {EosVariant.PRTWU, EosVariant.PR78}) {
                    double[] worst = new double[4];
                    for (Row r : pts) {
                        double[] dev = deviations(v, r, null);
                        for (int q = 0; q < 4; q++) {
                            if (Math.abs(dev[q]) > Math.abs(worst[q])) {
                                worst[q] = dev[q];
                            }
                        }
                    }
                    for (int q = 0; q < 4; q++) {
                        sb.append(String.format(Locale.US, " | %+.1f", 100 * worst[q]));
                    }
                }
                sb.append(" |\n");
            }
            sb.append('\n');
        }
        return sb.toString();
    }
}
