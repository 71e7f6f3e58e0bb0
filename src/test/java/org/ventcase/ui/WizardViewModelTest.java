package org.ventcase.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.ScenarioType;
import org.ventcase.app.CaseRunner;
import org.ventcase.units.Dimension;

/** The wizard's view-model without a window: validation beside fields, navigation, undo/redo, files. */
class WizardViewModelTest {

    @TempDir
    Path tmp;

    private WizardViewModel vm() {
        return new WizardViewModel(CaseRunner.standard(), new UserFiles(tmp.resolve("home")));
    }

    /**
     * A section the new case has not filled yet is reported with the labels on screen, not the case
     * file's member names (issue: "Required: ... shape, insideDiameter, tangentLength"). Invariant of
     * the project's own texts.
     */
    @Test
    void sectionProblemsNameTheFieldsAsTheScreenDoes() {
        WizardViewModel vm = vm();
        vm.newCase();
        String vessel = WizardViewModel.describe(org.ventcase.casefile.Problem.missing("$.vessel",
                "expected the vessel: shape, insideDiameter, tangentLength, heads, bottomElevation"));
        assertEquals("Required: expected the vessel: Shape, Inside diameter, Tangent-to-tangent length, Heads, "
                + "Bottom above grade", vessel);
        String storage = WizardViewModel.describe(org.ventcase.casefile.Problem.missing("$.storage",
                "expected the storage state: mode, temperature, liquidLevel (and pressure)"));
        assertEquals("Required: expected the storage state: Storage mode, Storage temperature, Liquid level (and "
                + "Storage pressure)", storage);
        assertFalse(vm.problems().stream().map(WizardViewModel::describe)
                .anyMatch(t -> t.contains("insideDiameter") || t.contains("densityBasis")), "no member names shown");
    }

    @Test
    void aBadValueGetsTheValidatorsMessageBesideItsField() {
        WizardViewModel vm = vm();
        vm.newFromTemplate("horizontal-bullet");
        FieldModel d = vm.quantity("$.vessel.insideDiameter", Dimension.LENGTH);
        assertEquals("", d.message().get());
        d.text().set("3.2");
        assertTrue(d.message().get().contains("3.2"), d.message().get());
        assertTrue(d.message().get().contains("unit"), d.message().get());
        d.text().set("3.2 m");
        assertEquals("", d.message().get());
    }

    @Test
    void aNewCaseLeavesTheFirstStepOnceItsRequiredFieldsAreFilled() {
        // seen: the empty checker of a new case was refused ("expected who checked the case, or \"\""),
        // so Next stayed grey; and the equation of state and density basis started blank
        WizardViewModel vm = vm();
        vm.newCase();
        vm.text("$.identity.title").text().set("Test drum");
        vm.text("$.identity.tag").text().set("D-1");
        vm.text("$.identity.preparer").text().set("A. Engineer");
        assertTrue(vm.stepProblems(Step.IDENTITY).isEmpty(), vm.stepProblems(Step.IDENTITY).toString());
        assertTrue(vm.canAdvance().get());
        assertTrue(vm.next());
        assertEquals("PR-Twu", vm.choice("$.fluid.eos", java.util.List.of()).text().get());
        assertEquals("translated", vm.choice("$.fluid.densityBasis", java.util.List.of()).text().get());
    }

    @Test
    void nextIsBlockedOnlyByProblemsOfTheCurrentStep() {
        WizardViewModel vm = vm();
        vm.newFromTemplate("horizontal-bullet");
        assertTrue(vm.canAdvance().get());
        vm.text("$.identity.tag").text().set("");
        assertFalse(vm.canAdvance().get());
        assertFalse(vm.next());
        assertEquals(Step.IDENTITY, vm.step().get());
        vm.text("$.identity.tag").text().set("V-9001");
        // a problem on a later step does not block this one
        vm.quantity("$.device.setPressure", Dimension.PRESSURE).text().set("17.2 bar");
        assertTrue(vm.next());
        assertEquals(Step.FLUID, vm.step().get());
        assertFalse(vm.reachable(Step.RESULTS), "results lie beyond a step with a problem");
    }

    @Test
    void warningsDoNotBlock() {
        WizardViewModel vm = vm();
        vm.newFromTemplate("vertical-drum");
        // a level above the outage limit gives an inventory warning only; the storage step still advances
        vm.goTo(Step.STORAGE);
        vm.text("$.storage.liquidLevel").text().set("97 %v");
        assertTrue(vm.stepProblems(Step.STORAGE).isEmpty(), vm.problems().toString());
        assertTrue(vm.canAdvance().get());
    }

    @Test
    void compositionSumIsLiveAndANonNumberIsRefusedBesideTheField() {
        WizardViewModel vm = vm();
        vm.newFromTemplate("horizontal-bullet");
        assertTrue(vm.compositionOk().get());
        FieldModel x = vm.number("$.fluid.components[1].moleFraction");
        x.text().set("0.15");
        assertFalse(vm.compositionOk().get());
        assertTrue(vm.compositionSum().get().contains("1.100000"), vm.compositionSum().get());
        x.text().set("abc");
        assertEquals(Messages.get("field.number"), x.message().get());
        x.text().set("0.05");
        assertTrue(vm.compositionOk().get());
    }

    @Test
    void undoAndRedoRestoreEditsAndStructure() {
        WizardViewModel vm = vm();
        vm.newFromTemplate("horizontal-bullet");
        FieldModel tag = vm.text("$.identity.tag");
        tag.text().set("V-1");
        assertTrue(vm.canUndo().get());
        int before = vm.scenarioCount();
        vm.addScenario(ScenarioType.THERMAL_EXPANSION);
        assertEquals(before + 1, vm.scenarioCount());
        vm.undo();
        assertEquals(before, vm.scenarioCount());
        vm.undo();
        assertEquals("V-2101", tag.text().get());
        vm.redo();
        assertEquals("V-1", tag.text().get());
        vm.redo();
        assertEquals(before + 1, vm.scenarioCount());
        assertFalse(vm.canRedo().get());
    }

    @Test
    void changingTheScenarioTypeDropsFieldsTheNewTypeDoesNotUse() {
        WizardViewModel vm = vm();
        vm.newFromTemplate("horizontal-bullet");
        vm.choice("$.scenarios[1].type", ScenarioType.keys()).text().set("thermal-expansion");
        assertEquals("", vm.valueAt("$.scenarios[1].inflow"));
        // the case still binds (no field the type does not use) and asks for the new fields
        assertTrue(vm.stepProblems(Step.SCENARIOS).stream().anyMatch(p -> p.path().equals("$.scenarios[1].heatInput")));
        vm.quantity("$.scenarios[1].heatInput", Dimension.POWER).text().set("12 kW");
        vm.quantity("$.scenarios[1].blockedInVolume", Dimension.VOLUME).text().set("0.4 m3");
        assertTrue(vm.stepProblems(Step.SCENARIOS).isEmpty(), vm.problems().toString());
    }

    @Test
    void saveAndReopenGiveAnIdenticalCaseFile() throws Exception {
        WizardViewModel vm = vm();
        vm.newFromTemplate("vertical-drum");
        vm.text("$.identity.checker").text().set("A. Checker");
        assertTrue(vm.dirty().get());
        Path f = tmp.resolve("d-3204.json");
        vm.saveAs(f);
        assertFalse(vm.dirty().get());
        String written = Files.readString(f);
        assertEquals(CaseFiles.toJson(CaseFiles.read(f)), written);
        WizardViewModel again = vm();
        again.open(f);
        assertFalse(again.dirty().get());
        Path g = tmp.resolve("copy.json");
        again.saveAs(g);
        assertEquals(written, Files.readString(g));
        assertEquals(f.toAbsolutePath().normalize(), again.files().recent().get(1).toAbsolutePath().normalize());
    }

    @Test
    void autosaveWritesOnlyUnsavedWorkAndASaveRemovesIt() throws Exception {
        WizardViewModel vm = vm();
        vm.newFromTemplate("sphere");
        assertTrue(vm.autosave().isEmpty(), "nothing unsaved yet");
        vm.text("$.identity.revision").text().set("B");
        Path copy = vm.autosave().orElseThrow();
        assertTrue(Files.readString(copy).contains("\"B\""));
        assertEquals(1, vm.files().autosaves().size());
        WizardViewModel recovered = vm();
        recovered.openUnsaved(Files.readString(copy), "autosave", true);
        assertEquals("B", recovered.valueAt("$.identity.revision"));
        assertTrue(recovered.dirty().get());
        vm.saveAs(tmp.resolve("s.json"));
        assertTrue(vm.files().autosaves().isEmpty());
    }

    @Test
    void theUnitChooserConvertsTheValue() {
        WizardViewModel vm = vm();
        vm.newFromTemplate("horizontal-bullet");
        FieldModel d = vm.quantity("$.vessel.insideDiameter", Dimension.LENGTH);
        vm.convert(d, "ft");
        // Hand calculation: 3.2 m / 0.3048 m/ft = 10.4987 ft
        assertEquals("10.5 ft", d.text().get());
        FieldModel set = vm.quantity("$.device.setPressure", Dimension.PRESSURE);
        vm.convert(set, "psig");
        // Hand calculation: 17.2e5 Pa / 6894.757 Pa/psi = 249.46 psi
        assertEquals("249.5 psig", set.text().get());
        FieldModel bare = vm.quantity("$.vessel.bottomElevation", Dimension.LENGTH);
        bare.text().set("4");
        vm.convert(bare, "m");
        assertEquals("4 m", bare.text().get());
    }

    @Test
    void theSketchFollowsTheFieldsAndDisappearsWhenTheyAreInvalid() {
        WizardViewModel vm = vm();
        vm.newFromTemplate("horizontal-bullet");
        WizardViewModel.Sketch s = vm.sketch().orElseThrow();
        assertEquals(3.2, s.vessel().diameter(), 1e-12);
        assertEquals(1.2, s.bottomElevation(), 1e-12);
        assertEquals(7.6, s.fireHeight(), 1e-12);
        assertTrue(s.levelM() > 0 && s.levelM() < 3.2);
        vm.quantity("$.vessel.insideDiameter", Dimension.LENGTH).text().set("-1 m");
        assertTrue(vm.sketch().isEmpty());
    }

    @Test
    void everyFieldOfTheStepsHasALabelAndHelp() {
        WizardViewModel vm = vm();
        for (String p : new String[] {"$.identity.title", "$.fluid.eos", "$.vessel.insideDiameter",
                "$.storage.liquidLevel", "$.scenarios[0].inflow", "$.device.backPressure.builtUp",
                "$.site.fireHeight"}) {
            FieldModel f = vm.text(p);
            assertFalse(f.help().isBlank(), p);
            assertFalse(f.label().equals(Messages.fieldKey(p)), p);
        }
    }
}
