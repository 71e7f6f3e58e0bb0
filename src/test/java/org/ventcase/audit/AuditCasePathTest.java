package org.ventcase.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseResult;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;

/**
 * The audit computes every vessel through the case path: for each row, the equivalent case file
 * (written out by hand below, as a user would) run by CaseFiles.load -> CaseInputs.from ->
 * CaseCalculation.run gives the same numbers, and the audit's totals are the sums of those
 * single-vessel results.
 */
class AuditCasePathTest {

    /** The case file a user would write for the same vessel and the same screening scenario. */
    private static String caseFile(String tag, String components, String vessel, String storage, boolean gas,
                                   String set, String mawp) {
        String scenario = gas
                ? "{\"type\": \"fire-gas-filled\", \"label\": \"fire\"}"
                : "{\"type\": \"fire-wetted\", \"label\": \"fire\", \"fireFighting\": \"adequate\", "
                + "\"environmentFactor\": \"bare\"}";
        return "{\"schemaVersion\": 1, \"identity\": {\"title\": \"" + tag + "\", \"tag\": \"" + tag + "\", "
                + "\"revision\": \"A\", \"preparer\": \"test\", \"checker\": \"\", \"date\": \"2026-01-15\"}, "
                + "\"fluid\": {\"components\": [" + components + "], \"eos\": \"" + (tag.equals("V-3001") ? "PR78" : "PR-Twu")
                + "\", \"densityBasis\": \"translated\"}, "
                + "\"vessel\": {" + vessel + "}, \"storage\": {" + storage + "}, \"scenarios\": [" + scenario + "], "
                + "\"device\": {\"setPressure\": \"" + set + "\", \"mawp\": \"" + mawp + "\", \"deviceCount\": \"single\", "
                + "\"backPressure\": {\"superimposed\": \"0 barg\", \"builtUp\": \"0 bar\"}, \"valveType\": \"conventional\"}, "
                + "\"site\": {\"atmosphericPressure\": \"101.325 kPaa\", \"fireHeight\": \"7.6 m\"}}";
    }

    /** The case files equivalent to AuditFixtures.SIX, row by row. */
    private static List<String> sixCaseFiles() {
        return List.of(
                caseFile("V-1001", "{\"name\": \"propane\", \"moleFraction\": 1.0}",
                        "\"shape\": \"horizontal\", \"insideDiameter\": \"3.2 m\", \"tangentLength\": \"16 m\", "
                                + "\"heads\": \"2:1\", \"bottomElevation\": \"1.2 m\"",
                        "\"mode\": \"saturated\", \"temperature\": \"38 C\", \"liquidLevel\": \"85 %v\"", false,
                        "17.2 barg", "17.2 barg"),
                caseFile("TK-1201", "{\"name\": \"propane\", \"moleFraction\": 0.6}, {\"name\": \"n-butane\", "
                                + "\"moleFraction\": 0.3}, {\"name\": \"isobutane\", \"moleFraction\": 0.1}",
                        "\"shape\": \"sphere\", \"insideDiameter\": \"12 m\", \"bottomElevation\": \"2.5 m\"",
                        "\"mode\": \"saturated\", \"temperature\": \"20 C\", \"liquidLevel\": \"70 %v\"", false,
                        "14 barg", "16 barg"),
                caseFile("V-3001", "{\"name\": \"ammonia\", \"moleFraction\": 1.0}",
                        "\"shape\": \"vertical\", \"insideDiameter\": \"2.4 m\", \"tangentLength\": \"5 m\", "
                                + "\"heads\": \"hemispherical\", \"bottomElevation\": \"0.8 m\"",
                        "\"mode\": \"saturated\", \"temperature\": \"15 C\", \"liquidLevel\": \"3.1 m\"", false,
                        "17 barg", "17.5 barg"),
                caseFile("D-4001", "{\"name\": \"n-hexane\", \"moleFraction\": 1.0}",
                        "\"shape\": \"vertical\", \"insideDiameter\": \"2.4 m\", \"tangentLength\": \"6 m\", "
                                + "\"heads\": \"2:1\", \"bottomElevation\": \"0.8 m\"",
                        "\"mode\": \"specified\", \"temperature\": \"30 C\", \"pressure\": \"0.5 barg\", "
                                + "\"liquidLevel\": \"60 %v\", \"vapourComposition\": [{\"name\": \"nitrogen\", "
                                + "\"moleFraction\": 0.9}, {\"name\": \"n-hexane\", \"moleFraction\": 0.1}]", false,
                        "3.5 barg", "3.5 barg"),
                caseFile("R-6001", "{\"name\": \"nitrogen\", \"moleFraction\": 1.0}",
                        "\"shape\": \"vertical\", \"insideDiameter\": \"1.2 m\", \"tangentLength\": \"3.5 m\", "
                                + "\"heads\": \"2:1\", \"bottomElevation\": \"0.5 m\"",
                        "\"mode\": \"gas-filled\", \"temperature\": \"20 C\", \"pressure\": \"8 barg\"", true,
                        "10 barg", "10 barg"),
                caseFile("V-1002", "{\"name\": \"propane\", \"moleFraction\": 0.95}, {\"name\": \"n-butane\", "
                                + "\"moleFraction\": 0.05}",
                        "\"shape\": \"horizontal\", \"insideDiameter\": \"2800 mm\", \"tangentLength\": \"12 m\", "
                                + "\"heads\": \"hemispherical\", \"bottomElevation\": \"1.0 m\"",
                        "\"mode\": \"saturated\", \"temperature\": \"25 C\", \"liquidLevel\": \"70 %v\"", false,
                        "17.2 barg", "17.2 barg"));
    }

    private static List<CaseResult> casePath() {
        List<CaseResult> out = new ArrayList<>();
        int i = 0;
        for (String json : sixCaseFiles()) {
            out.add(CaseCalculation.run(CaseInputs.from(CaseFiles.load(json, "row" + (++i) + ".json"))));
        }
        return out;
    }

    /**
     * The audit's screening path (no load-against-level curve, no envelope) against the full case
     * calculation of the same row, for every row of the demo register: the reported numbers and the
     * warnings must be identical (same code, so exact equality).
     */
    @Test
    void screeningPathEqualsTheFullCalculationForEveryDemoRegisterRow() throws Exception {
        Register reg = Register.read(java.nio.file.Path.of("demo-cases/register/kestrel-point-register.csv"));
        RegisterCases rc = new RegisterCases(reg.origin());
        int compared = 0;
        for (RegisterRow row : reg.rows()) {
            AuditItem it = rc.item(row);
            if (it.input().isEmpty()) {
                continue;
            }
            VesselAudit v = Audit.audit(it);
            CaseResult full;
            try {
                full = CaseCalculation.run(it.input().get());
            } catch (RuntimeException e) {
                assertEquals(VesselAudit.Status.ERROR, v.status(), it.tag() + ": the full case failed: " + e);
                continue;
            }
            VesselAudit w = Audit.from(it, full);
            assertEquals(w.status(), v.status(), it.tag());
            assertEquals(w.inventory(), v.inventory(), it.tag());
            assertEquals(w.fire(), v.fire(), it.tag());
            assertEquals(w.flags(), v.flags(), it.tag());
            assertEquals(w.warnings(), v.warnings(), it.tag());
            compared++;
        }
        assertTrue(compared > 200, "compared " + compared + " rows");
    }

    @Test
    void everyRowGivesTheSameNumbersAsItsCaseFile() {
        AuditResult r = Audit.run(RegisterCases.items(Register.parse(AuditFixtures.SIX, "six.csv")),
                Thresholds.none(), 2, Audit.Progress.NONE);
        List<CaseResult> cases = casePath();
        assertEquals(cases.size(), r.rows().size());
        for (int i = 0; i < cases.size(); i++) {
            VesselAudit v = r.rows().get(i);
            CaseResult c = cases.get(i);
            assertEquals(VesselAudit.Status.OK, v.status(), v.tag() + " " + v.error());
            VesselAudit.Contents a = v.inventory().orElseThrow();
            // same numbers: the audit and calc run the same code on the same inputs, so equality is exact
            assertEquals(c.vessel().totalVolume(), a.totalVolumeM3(), 0.0, v.tag());
            assertEquals(c.vessel().liquidVolume(), a.liquidVolumeM3(), 0.0, v.tag());
            assertEquals(c.vessel().fire().area(), a.fireWettedAreaM2(), 0.0, v.tag());
            assertEquals(c.inventory().liquidMassKg(), a.liquidMassKg(), 0.0, v.tag());
            assertEquals(c.inventory().vapourMassKg(), a.vapourMassKg(), 0.0, v.tag());
            assertEquals(c.inventory().massPerComponentKg(), a.massPerComponentKg(), v.tag());
            CaseResult.ScenarioResult s = c.scenarios().get(0);
            VesselAudit.FireLoad f = v.fire().orElseThrow();
            assertEquals(s.type().key(), f.method(), v.tag());
            assertEquals(s.relievingPressurePa().getAsDouble(), f.relievingPressurePa(), 0.0, v.tag());
            assertEquals(s.reliefLoadKgPerS().getAsDouble(), f.reliefLoadKgPerS(), 0.0, v.tag());
            assertEquals(s.requiredAreaM2().getAsDouble(), f.requiredAreaM2(), 0.0, v.tag());
            assertEquals(s.orifice().orElseThrow().designation(), f.selectedOrifice(), v.tag());
        }
        // the gas receiver went the unwetted way, the others the wetted fire (common practice, no source)
        assertEquals("fire-gas-filled", r.rows().get(4).fire().orElseThrow().method());
        assertEquals("fire-wetted", r.rows().get(0).fire().orElseThrow().method());
    }

    @Test
    void totalsAreTheSumsOfTheSingleVesselCaseResults() {
        AuditResult r = Audit.run(RegisterCases.items(Register.parse(AuditFixtures.SIX, "six.csv")),
                Thresholds.none(), 2, Audit.Progress.NONE);
        List<CaseResult> cases = casePath();
        String[] areas = {"Area 10", "Area 12", "Area 30", "Area 40", "Area 60", "Area 10"};
        double liquid = 0;
        double vapour = 0;
        double total = 0;
        Map<String, Double> perComponent = new LinkedHashMap<>();
        Map<String, Double> perArea = new LinkedHashMap<>();
        for (int i = 0; i < cases.size(); i++) {
            CaseResult c = cases.get(i);
            liquid += c.inventory().liquidMassKg();
            vapour += c.inventory().vapourMassKg();
            total += c.inventory().totalMassKg();
            c.inventory().massPerComponentKg().forEach((k, m) -> perComponent.merge(k, m, Double::sum));
            perArea.merge(areas[i], c.inventory().totalMassKg(), Double::sum);
        }
        // summed in the same (register) order, so the sums agree to the last bit
        assertEquals(liquid, r.site().liquidMassKg(), 0.0);
        assertEquals(vapour, r.site().vapourMassKg(), 0.0);
        assertEquals(total, r.site().totalMassKg(), 0.0);
        assertEquals(perComponent, r.site().massPerComponentKg());
        for (AuditResult.Group g : r.byArea()) {
            assertEquals(perArea.get(g.name()), g.totalMassKg(), 0.0, g.name());
        }
        assertEquals(5, r.byArea().size());
        assertEquals(2, r.byArea().get(0).vessels(), "Area 10 holds two of the six vessels");
        // Hand calculation: the site total is the liquid plus the vapour total
        assertEquals(r.site().liquidMassKg() + r.site().vapourMassKg(), r.site().totalMassKg(),
                1e-9 * r.site().totalMassKg());
        assertTrue(r.site().totalMassKg() > 0);
    }

    @Test
    void installedValvesAreRatedAgainstTheScreeningArea() {
        AuditResult r = Audit.run(RegisterCases.items(Register.parse(AuditFixtures.SIX, "six.csv")),
                Thresholds.none(), 1, Audit.Progress.NONE);
        VesselAudit v = r.rows().get(5);
        VesselAudit.FireLoad f = v.fire().orElseThrow();
        VesselAudit.InstalledCheck ic = f.installed().orElseThrow();
        assertEquals("2 x J", ic.designation());
        // Source: API Std 526 effective area of J, 1.287 in2 = 830.32 mm2; two valves 1660.6 mm2
        assertEquals(2 * 1.287 * 645.16e-6, ic.areaM2(), 1e-12);
        // Hand calculation: margin = 100 (A_installed / A_required - 1)
        assertEquals(100 * (ic.areaM2() / f.requiredAreaM2() - 1), ic.marginPercent(), 1e-9);
        assertEquals(ic.areaM2() >= f.requiredAreaM2(), ic.covers());
        assertEquals(!ic.covers(), v.flags().contains(VesselAudit.Flag.INSTALLED_SHORT));
        assertTrue(r.rows().get(1).fire().orElseThrow().installed().isEmpty(), "no orifice given for TK-1201");
    }
}
