package org.ventcase.report;

import java.nio.file.Path;
import java.time.LocalDate;

import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseInput;
import org.ventcase.calc.CaseResult;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.ValidatedCase;

/**
 * Cases for the sheet tests, computed by the same path as {@code ventcase sheet}: a demo case file
 * (invented: no real site, vessel or person), its calculation and the case sheet model, under the
 * case file's identity or the invented test identity below.
 */
final class SheetFixtures {

    private SheetFixtures() {
    }

    /** A demo case computed: its input and result. */
    record Computed(CaseInput input, CaseResult result, SheetIdentity caseIdentity) {

        /** The governing scenario (every fixture has one). */
        CaseResult.ScenarioResult governing() {
            return result.governing().orElseThrow();
        }

        /** The sheet under the case file's own identity, as {@code ventcase sheet} writes it. */
        SheetModel model(UnitSystem units) {
            return SheetModels.from(result, input, caseIdentity, units);
        }

        /** The SI sheet under the invented test identity of {@link SheetFixtures#identity()}. */
        SheetModel modelWithTestIdentity() {
            return SheetModels.from(result, input, identity(), UnitSystem.SI);
        }

        SheetModel model() {
            return model(UnitSystem.SI);
        }
    }

    static Computed demo(String file) {
        ValidatedCase vc = CaseFiles.load(Path.of("demo-cases", file));
        CaseInput in = CaseInputs.from(vc);
        return new Computed(in, CaseCalculation.run(in), org.ventcase.app.CaseSheets.identity(vc, "test"));
    }

    /** Horizontal propane bullet, pool fire (demo-cases/propane-bullet-fire.json). */
    static Computed bullet() {
        return demo("propane-bullet-fire.json");
    }

    /** Vertical n-hexane drum (demo-cases/hexane-drum.json). */
    static Computed drum() {
        return demo("hexane-drum.json");
    }

    /** LPG sphere, wetted fire and boil-off (demo-cases/lpg-sphere-mixture.json). */
    static Computed sphere() {
        return demo("lpg-sphere-mixture.json");
    }

    static SheetIdentity identity() {
        return new SheetIdentity("Test bullet T-0001 (invented): fire relief basis",
                "T-0001", "B", LocalDate.of(2026, 2, 3), "A. Tester (invented)", "", "Ventcase", "test",
                "0123456789abcdef0123456789abcdef0123456789abcdef0123456789abcdef");
    }
}
