package org.ventcase.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.report.CalculationSheet;
import org.ventcase.review.ReviewQuantity;
import org.ventcase.review.ReviewResult;
import org.ventcase.review.Verdict;
import org.ventcase.app.ReviewRunner;
import org.ventcase.app.ReviewTable;

/**
 * The review mode's view-model without a window: demo files reviewed, a tolerance edit re-running
 * the verdicts, a bad claimed value reported by its field, the case open in the wizard used for a
 * file that names none, and the exports. The environment runs everything at once on the calling
 * thread, but timers are held until {@link #fire()} so that the debounce can be seen.
 */
class ReviewViewModelTest {

    @TempDir
    Path tmp;

    private final List<Runnable> timers = new ArrayList<>();

    private final LiveCalculation.Env env = new LiveCalculation.Env() {
        @Override
        public LiveCalculation.Cancellable after(long delayMs, Runnable r) {
            Runnable[] slot = {r};
            timers.add(() -> {
                if (slot[0] != null) {
                    slot[0].run();
                }
            });
            return () -> slot[0] = null;
        }

        @Override
        public void background(Runnable r) {
            r.run();
        }

        @Override
        public void ui(Runnable r) {
            r.run();
        }
    };

    private ReviewViewModel vm(ReviewRunner.OpenCase open) {
        return new ReviewViewModel(new ReviewRunner(), env, () -> open, 600);
    }

    private ReviewViewModel vm() {
        return vm(new ReviewRunner.OpenCase(Optional.empty(), "untitled"));
    }

    /** Runs the timers that are due (the debounce ending). */
    private void fire() {
        List<Runnable> due = new ArrayList<>(timers);
        timers.clear();
        due.forEach(Runnable::run);
    }

    private static ReviewResult result(ReviewViewModel vm) {
        assertEquals(JobState.CURRENT, vm.state().get(), vm.message().get());
        return vm.outcome().get().orElseThrow().result();
    }

    @Test
    void theCleanDemoFilesAgreeEverywhere() {
        for (String name : List.of("propane-bullet-clean.json", "lpg-sphere-clean.csv")) {
            ReviewViewModel vm = vm();
            vm.openDemo(name);
            ReviewResult r = result(vm);
            // the clean files state every quantity (13 rows), each the value of Ventcase's own run, rounded
            assertEquals(13, r.rows().size(), name);
            for (ReviewTable.Line l : ReviewTable.lines(r)) {
                assertEquals(Verdict.AGREES, l.verdict(), name + ": " + l);
            }
            assertEquals("13 agree, 0 to check, 0 disagree, 0 not compared", ReviewTable.counts(r));
            // the case is the one the file names, from the packaged demo cases
            assertTrue(vm.outcome().get().orElseThrow().caseOrigin().startsWith("named in " + name));
        }
    }

    @Test
    void theLatentHeatAtStorageDemoDisagreesOnLWithItsHint() {
        ReviewViewModel vm = vm();
        vm.openDemo("propane-bullet-latent-at-storage.json");
        ReviewResult r = result(vm);
        ReviewTable.Line l = ReviewTable.lines(r).stream().filter(x -> x.quantity() == ReviewQuantity.LATENT_HEAT)
                .findFirst().orElseThrow();
        assertEquals(Verdict.DISAGREES, l.verdict(), l.toString());
        assertTrue(l.verdictText().startsWith("disagrees"), l.verdictText());
        List<ReviewTable.Cause> causes = ReviewTable.causes(r);
        assertTrue(causes.stream().anyMatch(c -> c.code().equals("latent-heat-at-storage")
                && c.quantity().equals(ReviewQuantity.LATENT_HEAT.label()) && !c.informational()), causes.toString());
        // what the table shows is what the console prints: claimed 346.6 kJ/kg as written, 4 significant digits
        assertEquals("346.6 kJ/kg", l.claimed());
    }

    @Test
    void changingAToleranceReJudgesAtOnceWithoutComputingTheCaseAgain() {
        ReviewViewModel vm = vm();
        vm.openDemo("propane-bullet-latent-at-storage.json");
        ReviewResult before = result(vm);
        ReviewResult.Row l0 = before.row(ReviewQuantity.LATENT_HEAT).orElseThrow();
        assertEquals(Verdict.DISAGREES, l0.verdict());
        double rel = Math.abs(l0.relativeDifference().getAsDouble());
        // a tolerance just above the relative difference: L now agrees (the verdict rule of docs/review.md)
        String pct = ReviewViewModel.number(ReviewQuantity.LATENT_HEAT, Math.min(0.5, rel * 1.05));
        vm.tolerance(ReviewQuantity.LATENT_HEAT).text().set(pct);
        assertEquals("", vm.tolerance(ReviewQuantity.LATENT_HEAT).message().get());
        // judged again on the spot from the review already computed: current, nothing pending
        assertEquals(JobState.CURRENT, vm.state().get());
        assertTrue(vm.current());
        ReviewResult after = result(vm);
        assertSame(before.computed(), after.computed(), "the case was not computed again");
        ReviewResult.Row l1 = after.row(ReviewQuantity.LATENT_HEAT).orElseThrow();
        assertEquals(Verdict.AGREES, l1.verdict(), l1.toString());
        assertTrue(after.tolerances().changed(ReviewQuantity.LATENT_HEAT));
        assertTrue(ReviewTable.lines(after).stream().anyMatch(x -> x.quantity() == ReviewQuantity.LATENT_HEAT
                && x.toleranceChanged()));
        // back to the defaults: disagrees again, at once
        vm.resetTolerances();
        assertEquals(JobState.CURRENT, vm.state().get());
        assertEquals(Verdict.DISAGREES, result(vm).row(ReviewQuantity.LATENT_HEAT).orElseThrow().verdict());
        assertEquals("5", vm.tolerance(ReviewQuantity.LATENT_HEAT).text().get());
    }

    @Test
    void aToleranceOutOfRangeIsRefusedBesideItsFieldWithoutARun() {
        ReviewViewModel vm = vm();
        vm.openDemo("propane-bullet-clean.json");
        result(vm);
        ReviewViewModel.ToleranceField t = vm.tolerance(ReviewQuantity.RELIEVING_TEMPERATURE);
        assertEquals("K", t.unit());
        t.text().set("25");
        assertTrue(t.message().get().contains("20 K"), t.message().get());
        assertEquals(JobState.CURRENT, vm.state().get(), "a refused tolerance starts no run");
        vm.tolerance(ReviewQuantity.K).text().set("abc");
        assertTrue(vm.tolerance(ReviewQuantity.K).message().get().contains("%"));
        vm.tolerance(ReviewQuantity.K).text().set("4 %");
        assertEquals("", vm.tolerance(ReviewQuantity.K).message().get());
        assertEquals(0.04, vm.currentTolerances().of(ReviewQuantity.K), 1e-15);
    }

    @Test
    void aClaimedValueWithABadUnitShowsTheMessageNamingTheField() throws Exception {
        Path kase = Path.of("demo-cases/propane-bullet-fire.json").toAbsolutePath();
        Path f = tmp.resolve("bad-unit.json");
        // a bare 'bar' is refused: gauge or absolute must be said
        Files.writeString(f, "{\"case\": \"" + kase.toString().replace("\\", "\\\\") + "\", \"claimed\": "
                + "{\"latentHeat\": \"252 kJ/kg\", \"relievingPressure\": \"21.8 bar\"}}");
        ReviewViewModel vm = vm();
        vm.open(f);
        assertEquals(JobState.FAILED, vm.state().get());
        String m = vm.message().get();
        assertTrue(m.contains("claimed.relievingPressure"), m);
        assertTrue(m.contains("21.8 bar"), m);
        assertTrue(m.contains("bad-unit.json"), m);
        assertTrue(vm.outcome().get().isEmpty());
    }

    @Test
    void aFileWithoutACaseUsesTheCaseOpenInTheWizardOrSaysThereIsNone() throws Exception {
        Path f = tmp.resolve("claims.csv");
        Files.writeString(f, "quantity,value\nrelievingPressure,21.83 bara\nlatentHeat,252.5 kJ/kg\norifice,L\n");
        ReviewViewModel none = vm();
        none.open(f);
        assertEquals(JobState.FAILED, none.state().get());
        assertTrue(none.message().get().contains("names no case"), none.message().get());

        ReviewViewModel vm = vm(new ReviewRunner.OpenCase(Optional.of(CaseFiles.load(
                Path.of("demo-cases/propane-bullet-fire.json"))), "propane-bullet-fire.json"));
        vm.open(f);
        ReviewResult r = result(vm);
        assertEquals("propane-bullet-fire.json", vm.outcome().get().orElseThrow().caseName());
        assertTrue(vm.outcome().get().orElseThrow().caseOrigin().startsWith("open in the wizard"));
        // the clean file's values for this case
        assertEquals(Verdict.AGREES, r.row(ReviewQuantity.LATENT_HEAT).orElseThrow().verdict());
        assertEquals(Verdict.AGREES, r.row(ReviewQuantity.ORIFICE).orElseThrow().verdict());
    }

    @Test
    void writesTheReviewPdfAndJson() throws Exception {
        ReviewViewModel vm = vm();
        vm.openDemo("propane-bullet-gauge-as-absolute.json");
        ReviewResult r = result(vm);
        Path json = tmp.resolve("out/review.json");
        Files.createDirectories(json.getParent());
        vm.writeJson(json);
        assertTrue(vm.exportMessage().get().startsWith("Written"), vm.exportMessage().get());
        String text = Files.readString(json);
        assertTrue(text.contains("\"gauge-as-absolute\""), text);
        assertTrue(text.contains(r.inputHash()), "the JSON names the reviewed case by its input hash");
        Path pdf = tmp.resolve("out/review.pdf");
        vm.writePdf(pdf, CalculationSheet.PageSize.A4);
        assertTrue(vm.exportMessage().get().startsWith("Written"), vm.exportMessage().get());
        byte[] head = Arrays.copyOf(Files.readAllBytes(pdf), 5);
        assertEquals("%PDF-", new String(head, java.nio.charset.StandardCharsets.US_ASCII));
        // nothing else left in the folder (written through a temporary file, then moved)
        try (Stream<Path> s = Files.list(json.getParent())) {
            assertEquals(2, s.count());
        }
        // a tolerance edit re-judges at once, so the export is of the new tolerances
        vm.tolerance(ReviewQuantity.Z).text().set("4");
        vm.writeJson(tmp.resolve("out/rejudged.json"));
        assertTrue(Files.exists(tmp.resolve("out/rejudged.json")), vm.exportMessage().get());
        // while a run is pending (the file opened again), nothing is written
        vm.rerun();
        vm.writeJson(tmp.resolve("out/stale.json"));
        assertNotEquals("", vm.exportMessage().get());
    }

    @Test
    void everyDemoClaimedFileIsPackagedAndListed() throws Exception {
        List<String> onDisk;
        try (Stream<Path> s = Files.list(Path.of("demo-cases/review"))) {
            onDisk = s.map(p -> p.getFileName().toString()).sorted().toList();
        }
        assertEquals(onDisk, ReviewRunner.DEMOS.stream().sorted().toList());
        for (String n : ReviewRunner.DEMOS) {
            assertTrue(ReviewRunner.class.getResource("/org/ventcase/demo-cases/review/" + n) != null, n);
        }
    }
}
