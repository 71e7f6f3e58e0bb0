package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;

/**
 * The temperature-dependent volume translation of the default model: what it promises
 * (saturated-liquid density equal to the published correlation, smooth c(T), phase equilibrium
 * untouched, the enthalpy term of a T-dependent shift) checked by invariants and finite
 * differences. No external check values here: ReferenceSaturationTest compares the results with
 * reference equations of state.
 */
class VolumeTranslationTest {

    private static final ComponentLibrary LIB = ComponentLibrary.builtIn();
    private static final EosVariant V = EosVariant.PRTWU;

    @Test
    void everyBuiltInComponentWithACorrelationGetsAnAnchoredTranslation() {
        List<String> constant = new ArrayList<>();
        for (Component c : LIB.all()) {
            VolumeTranslation t = V.translation(c);
            if (!t.temperatureDependent()) {
                constant.add(c.name());
                assertTrue(V.translationNote(c).startsWith(c.name() + ":"), "a fallback is named: " + c.name());
            } else {
                assertTrue(SaturatedLiquidDensity.find(c).isPresent(), c.name());
            }
        }
        // neopentane has no row in Perry's Table 2-32 (liquid-density.csv header)
        assertEquals(List.of("neopentane"), constant);
    }

    @Test
    void saturatedLiquidDensityFollowsTheCorrelationBetweenAnchors() {
        for (String name : List.of("propane", "ammonia", "water", "n-decane", "methanol", "nitrogen")) {
            Component c = LIB.get(name);
            CubicModel m = CubicModel.pure(V, c);
            SaturatedLiquidDensity.Correlation corr = SaturatedLiquidDensity.find(c).orElseThrow();
            double[] range = ((VolumeTranslation.Anchored) m.translation(0)).anchorRange();
            PureSaturation sat = new PureSaturation(m);
            for (double f = 0.013; f < 1.0; f += 0.0617) {
                double t = range[0] + f * (range[1] - range[0]);
                double rho = sat.atTemperature(t, DensityBasis.TRANSLATED).liquid().density();
                double want = c.molarMass() * 1e-3 / corr.molarVolume(t, c.molarMass());
                // Spline interpolation between anchors 1 % of Tc apart: well under 0.05 %.
                assertEquals(want, rho, 5e-4 * want, String.format(Locale.US, "%s at %.2f K", name, t));
            }
        }
    }

    @Test
    void derivativesMatchFiniteDifferencesAndTheTaperIsContinuous() {
        for (String name : List.of("propane", "water", "hydrogen", "carbon dioxide")) {
            Component c = LIB.get(name);
            VolumeTranslation tr = V.translation(c);
            double[] range = ((VolumeTranslation.Anchored) tr).anchorRange();
            double tc = CubicModel.pure(V, c).tc(0);
            double[] ts = {range[0] - 0.07 * tc, range[0] - 0.02 * tc, 0.5 * (range[0] + range[1]), range[1] - 0.01 * tc,
                    range[1] + 0.02 * tc, range[1] + 0.08 * tc, range[1] + 0.15 * tc};
            for (double t : ts) {
                double h = 1e-3;
                double fd1 = (tr.c(t + h) - tr.c(t - h)) / (2 * h);
                double fd2 = (tr.dcdT(t + h) - tr.dcdT(t - h)) / (2 * h);
                double scale = Math.abs(tr.c(range[1]) - tr.c(range[0])) / (range[1] - range[0]) + 1e-15;
                assertEquals(fd1, tr.dcdT(t), 1e-5 * scale, name + " c' at " + t);
                assertEquals(fd2, tr.d2cdT2(t), 1e-3 * scale, name + " c'' at " + t);
            }
            for (double edge : range) {
                double e = 1e-7;
                assertEquals(tr.c(edge - e), tr.c(edge + e), 1e-9 * Math.abs(tr.c(edge)) + 4 * e * Math.abs(tr.dcdT(edge)),
                        name + " c at " + edge);
                assertEquals(tr.dcdT(edge - e), tr.dcdT(edge + e), 1e-4 * Math.abs(tr.dcdT(edge)) + 1e-15,
                        name + " c' at " + edge);
                // c'' too (a review found a step here with a linear taper: a step in Cp and in loads)
                double curvScale = Math.abs(tr.dcdT(edge)) / (0.1 * tc) + 1e-15;
                assertEquals(tr.d2cdT2(edge - e), tr.d2cdT2(edge + e), 1e-4 * curvScale, name + " c'' at " + edge);
            }
            // constant beyond the taper
            assertEquals(0.0, tr.dcdT(range[1] + 0.2 * tc), 0.0);
            assertEquals(0.0, tr.dcdT(range[0] - 0.2 * tc), 0.0);
        }
    }

    @Test
    void translationLeavesPhaseEquilibriumAndPureLatentHeatUnchanged() {
        for (String name : List.of("propane", "ammonia", "toluene")) {
            Component c = LIB.get(name);
            PureSaturation sat = new PureSaturation(CubicModel.pure(V, c));
            double t = 0.8 * CubicModel.pure(V, c).tc(0);
            SaturationResult a = sat.atTemperature(t, DensityBasis.TRANSLATED);
            SaturationResult b = sat.atTemperature(t, DensityBasis.CUBIC);
            assertEquals(b.pressurePa(), a.pressurePa(), 0.0);
            assertEquals(b.latentHeatJmol(), a.latentHeatJmol(), 0.0);
            assertTrue(Math.abs(a.liquid().density() / b.liquid().density() - 1) > 1e-3, "the translation acts");
        }
    }

    @Test
    void enthalpyTermIsMinusTSquaredTimesTheSlopeOfTheGibbsShiftOverT() {
        // G_shift = -P c(T) at fixed P; H_shift = G_shift - T dG_shift/dT = -P (c - T c').
        CubicModel m = new CubicModel(V, List.of(LIB.get("propane"), LIB.get("n-butane")), null);
        double[] x = {0.6, 0.4};
        double p = 2e6;
        for (double t : new double[] {250, 300, 340, 380}) {
            double h = 1e-3;
            double gPlus = -p * m.volumeShift(t + h, x);
            double gMinus = -p * m.volumeShift(t - h, x);
            double g = -p * m.volumeShift(t, x);
            double hShift = g - t * (gPlus - gMinus) / (2 * h);
            assertEquals(hShift, m.translatedEnthalpyShift(t, p, x), 1e-6 * Math.abs(hShift) + 1e-9);
        }
    }

    @Test
    void translatedHeatCapacityIsTheTemperatureSlopeOfTheTranslatedEnthalpy() {
        // Cp on the translated basis must equal d/dT of H = H_ig + H_res - P (c - T c') at fixed P
        // (a finite difference of the enthalpy the energy balances use); it differs from the
        // cubic's Cp by P T c''.
        for (String name : List.of("propane", "carbon monoxide", "water", "toluene")) {
            Component c = LIB.get(name);
            CubicModel m = CubicModel.pure(V, c);
            double[] x = {1};
            double tc = m.tc(0);
            double p = Math.min(5e6, 0.9 * m.pc(0));
            for (double tr : new double[] {0.55, 0.7, 0.85, 0.88, 0.95}) {
                double t = tr * tc;
                double h = 1e-4 * t;
                double hPlus = enthalpy(m, t + h, p);
                double hMinus = enthalpy(m, t - h, p);
                FluidProperties fp = m.properties(t, p, x, PhaseRequest.LIQUID, DensityBasis.TRANSLATED);
                double fd = (hPlus - hMinus) / (2 * h);
                assertEquals(fd, fp.cp(), 2e-4 * fp.cp(), name + " at Tr " + tr);
                FluidProperties cubic = m.properties(t, p, x, PhaseRequest.LIQUID, DensityBasis.CUBIC);
                assertEquals(cubic.cp() + p * t * m.translation(0).d2cdT2(t), fp.cp(), 1e-9 * fp.cp());
            }
        }
    }

    private static double enthalpy(CubicModel m, double t, double p) {
        double[] x = {1};
        FluidProperties fp = m.properties(t, p, x, PhaseRequest.LIQUID, DensityBasis.CUBIC);
        return m.components().get(0).cp().enthalpyChange(298.15, t) + fp.residualEnthalpy()
                + m.translatedEnthalpyShift(t, p, x);
    }
}
