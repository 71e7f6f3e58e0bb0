package org.ventcase.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.relief.FireLoadCurve;
import org.ventcase.thermo.mix.PhaseEnvelope;

/**
 * What the calculation adds for the sheet's figures: the wetted fire's load against fill level, the
 * phase envelope of a mixture, and the monitor (progress, cancellation).
 */
class CaseCurvesTest {

    private static CaseInput demo(String name) {
        return CaseInputs.from(CaseFiles.load(Path.of("demo-cases", name + ".json")));
    }

    @Test
    void levelCurveAtTheCaseLevelIsTheScenarioItselfAndFollowsTheAreaToThe082() {
        for (String name : List.of("propane-bullet-fire", "lpg-sphere-mixture")) {
            CaseResult r = CaseCalculation.run(demo(name));
            CaseResult.ScenarioResult s = r.scenarios().get(0);
            assertEquals(ScenarioKey.FIRE_WETTED, s.type());
            FireLoadCurve c = s.levelCurve().orElseThrow(() -> new AssertionError(s.levelCurveNote()));
            // 19 levels 5..95 % plus the case level where it is not one of them
            assertTrue(c.points().size() == 19 || c.points().size() == 20, name + ": " + c.points().size());
            // Hand calculation: the same inputs at the same level give the same result (round-off only)
            assertEquals(s.reliefLoadKgPerS().getAsDouble(), c.caseLevel().reliefLoadKgPerS(),
                    1e-9 * s.reliefLoadKgPerS().getAsDouble(), name);
            assertEquals(r.vessel().levelPercentVolume(), c.caseLevel().levelPercentVolume(), 1e-6, name);
            // Source: API Std 521 (7th ed.) eq. for Q = C F A^0.82; with P1, T1 and L fixed by the relieving
            // pressure, W_i / W_j = (A_i / A_j)^0.82. Tolerance 1e-9: the same arithmetic, round-off only.
            FireLoadCurve.Point a = c.points().get(0);
            for (FireLoadCurve.Point p : c.points()) {
                double expected = a.reliefLoadKgPerS() * Math.pow(p.fireWettedAreaM2() / a.fireWettedAreaM2(), 0.82);
                assertEquals(expected, p.reliefLoadKgPerS(), 1e-9 * expected, name + " at " + p.levelPercentVolume());
            }
            // the governing point carries the largest load
            for (FireLoadCurve.Point p : c.points()) {
                assertTrue(p.reliefLoadKgPerS() <= c.governing().reliefLoadKgPerS() * (1 + 1e-9), name);
            }
        }
    }

    @Test
    void otherScenarioTypesHaveNoLevelCurve() {
        CaseResult r = CaseCalculation.run(demo("gas-receiver-fire"));
        assertTrue(r.scenarios().get(0).levelCurve().isEmpty());
        assertEquals("", r.scenarios().get(0).levelCurveNote());
    }

    @Test
    void mixtureEnvelopePassesThroughTheSaturatedStoragePoint() {
        CaseResult r = CaseCalculation.run(demo("lpg-sphere-mixture"));
        PhaseEnvelope.Result env = r.envelope().result().orElseThrow(() -> new AssertionError(r.envelope().note()));
        double t = r.inventory().temperatureK();
        double p = r.inventory().pressurePa();
        // the saturated storage state is the bubble point at T: interpolate the bubble branch at T
        List<PhaseEnvelope.Point> bubble = new ArrayList<>();
        for (PhaseEnvelope.Point q : env.points()) {
            if (q.branch() == PhaseEnvelope.Branch.BUBBLE) {
                bubble.add(q);
            }
        }
        double found = Double.NaN;
        for (int i = 1; i < bubble.size(); i++) {
            PhaseEnvelope.Point a = bubble.get(i - 1);
            PhaseEnvelope.Point b = bubble.get(i);
            if ((a.temperatureK() - t) * (b.temperatureK() - t) <= 0 && a.temperatureK() != b.temperatureK()) {
                double f = (t - a.temperatureK()) / (b.temperatureK() - a.temperatureK());
                found = Math.exp(Math.log(a.pressurePa()) + f * (Math.log(b.pressurePa()) - Math.log(a.pressurePa())));
                break;
            }
        }
        // Independent: the inventory's bubble point (SaturationPoints) vs the envelope's continuation;
        // 1 % allows for interpolating ln P linearly between traced points a few kelvin apart
        assertEquals(p, found, 0.01 * p);
    }

    @Test
    void pureFluidHasNoEnvelopeAndSaysWhy() {
        CaseResult r = CaseCalculation.run(demo("propane-bullet-fire"));
        assertTrue(r.envelope().result().isEmpty());
        assertTrue(r.envelope().note().contains("pure fluid"), r.envelope().note());
    }

    @Test
    void monitorSeesProgressToTheEndAndCanStopTheRun() {
        List<Double> fractions = new ArrayList<>();
        CaseCalculation.run(demo("lpg-sphere-mixture"), new CaseCalculation.Monitor() {
            @Override
            public void progress(double fraction, String message) {
                fractions.add(fraction);
            }

            @Override
            public boolean cancelled() {
                return false;
            }
        });
        assertFalse(fractions.isEmpty());
        for (int i = 1; i < fractions.size(); i++) {
            assertTrue(fractions.get(i) >= fractions.get(i - 1), fractions.toString());
        }
        assertEquals(1.0, fractions.get(fractions.size() - 1));
        int[] polls = {0};
        assertThrows(CaseCalculation.Cancelled.class, () -> CaseCalculation.run(demo("lpg-sphere-mixture"),
                new CaseCalculation.Monitor() {
                    @Override
                    public void progress(double fraction, String message) {
                    }

                    @Override
                    public boolean cancelled() {
                        return ++polls[0] > 1;
                    }
                }));
        assertEquals(2, polls[0], "stopped at the first poll after the inventory");
    }
}
