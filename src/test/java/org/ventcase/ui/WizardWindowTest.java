package org.ventcase.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.concurrent.Callable;

import javafx.application.Platform;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.ventcase.casefile.CaseFiles;

/**
 * The wizard in a real window (under Xvfb in CI: .ci/run provides the display): a template walked
 * through every step, a bad value typed and its message seen, saved and reopened. Skipped where no
 * display is available. The built-in demo opened on its results, which follow an edit live.
 * Screenshots of every step go to the folder named by -Dventcase.shots.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
@org.junit.jupiter.api.condition.EnabledIfEnvironmentVariable(named = "DISPLAY", matches = ".*\\S.*",
        disabledReason = "no display (DISPLAY is not set): the window test needs one; .ci/run starts Xvfb")
class WizardWindowTest {

    private static WizardApp app;
    private static Path home;

    @BeforeAll
    static void start() throws Exception {
        home = Files.createTempDirectory("ventcase-ui");
        System.setProperty("ventcase.home", home.toString());
        System.setProperty("prism.order", "sw");
        CountDownLatch up = new CountDownLatch(1);
        Platform.startup(() -> {
            try {
                WizardApp a = new WizardApp();
                a.start(new Stage());
                app = a;
            } catch (RuntimeException e) {
                throw e;
            } finally {
                up.countDown();
            }
        });
        assertTrue(up.await(30, TimeUnit.SECONDS));
        assertNotNull(app);
    }

    @AfterAll
    static void stop() {
        if (app != null) {
            Platform.runLater(() -> app.viewModel().discardAutosave());
            Platform.exit();
        }
    }

    private static <T> T fx(Callable<T> c) throws Exception {
        AtomicReference<T> out = new AtomicReference<>();
        AtomicReference<Exception> err = new AtomicReference<>();
        CountDownLatch done = new CountDownLatch(1);
        Platform.runLater(() -> {
            try {
                out.set(c.call());
            } catch (Exception e) {
                err.set(e);
            } finally {
                done.countDown();
            }
        });
        assertTrue(done.await(30, TimeUnit.SECONDS), "FX thread did not answer");
        if (err.get() != null) {
            throw err.get();
        }
        return out.get();
    }

    /** Lets the pulse run (deferred rebuilds, layout). */
    private static void settle() throws Exception {
        for (int i = 0; i < 3; i++) {
            fx(() -> null);
            Thread.sleep(80);
        }
    }

    private static Node lookup(String id) throws Exception {
        return fx(() -> app.stage().getScene().lookup("#" + id));
    }

    private static void shot(String name) throws Exception {
        String dir = System.getProperty("ventcase.shots");
        if (dir == null) {
            return;
        }
        settle();
        WritableImage img = fx(() -> app.stage().getScene().snapshot(null));
        int w = (int) img.getWidth();
        int h = (int) img.getHeight();
        BufferedImage b = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                b.setRGB(x, y, img.getPixelReader().getArgb(x, y));
            }
        }
        Files.createDirectories(Path.of(dir));
        javax.imageio.ImageIO.write(b, "png", Path.of(dir, name + ".png").toFile());
    }

    @Test
    @Order(1)
    void walksATemplateThroughEveryStepShowsAMessageSavesAndReopens() throws Exception {
        java.util.List<String> before = new java.util.ArrayList<>();
        shot("00-start");
        fx(() -> {
            app.viewModel().newFromTemplate("horizontal-bullet");
            app.enterWizard();
            return null;
        });
        settle();
        for (Step s : Step.values()) {
            assertEquals(s, fx(() -> app.viewModel().step().get()));
            shot(String.format("%02d-%s", s.ordinal() + 1, s.name().toLowerCase()));
            if (s == Step.VESSEL) {
                // type a bad value: the validator's message appears beside the field and Next is blocked
                TextField d = (TextField) lookup("f-vessel-insideDiameter");
                fx(() -> {
                    d.setText("3.2");
                    return null;
                });
                settle();
                Label m = (Label) lookup("f-vessel-insideDiameter-message");
                assertTrue(fx(m::isVisible));
                assertTrue(fx(m::getText).contains("unit"), fx(m::getText));
                Node nextButton = lookup("next");
                assertTrue(fx(nextButton::isDisabled));
                shot("03b-vessel-bad-value");
                fx(() -> {
                    d.setText("3.2 m");
                    return null;
                });
                settle();
                assertFalse(fx(m::isVisible));
            }
            if (s == Step.RESULTS) {
                // the calculation runs off the FX thread; wait for the governing line
                long end = System.currentTimeMillis() + 60_000;
                while (lookup("governing") == null && System.currentTimeMillis() < end) {
                    Thread.sleep(200);
                }
                assertNotNull(lookup("governing"), "results did not appear");
                Label deferral = (Label) lookup("deferral");
                String cautions = fx(deferral::getText);
                assertTrue(cautions.contains("ASME BPVC Section VIII"));
                assertTrue(cautions.contains("qualified engineer"));
                awaitCurrent();
                before.addAll(results());
                assertFalse(before.isEmpty());
                shot("07-results-done");
            }
            if (s == Step.EXPORT) {
                // export the PDF sheet from the Export step (the save dialog replaced by a fixed file)
                Path pdf = home.resolve("walked-sheet.pdf");
                fx(() -> {
                    app.steps().sheetTarget(name -> java.util.Optional.of(pdf));
                    ((Button) app.stage().getScene().lookup("#write-sheet")).fire();
                    return null;
                });
                long end = System.currentTimeMillis() + 60_000;
                while (!text("export-status").startsWith("Sheet written") && System.currentTimeMillis() < end) {
                    Thread.sleep(100);
                }
                assertTrue(text("export-status").startsWith("Sheet written"), text("export-status"));
                byte[] b = Files.readAllBytes(pdf);
                assertTrue(b.length > 1000);
                assertEquals("%PDF", new String(b, 0, 4, java.nio.charset.StandardCharsets.US_ASCII));
            }
            if (s != Step.EXPORT) {
                Button next = (Button) lookup("next");
                assertFalse(fx(next::isDisabled), "Next blocked on " + s + ": " + fx(() -> app.viewModel().stepProblems(s)));
                fx(() -> {
                    next.fire();
                    return null;
                });
                settle();
            }
        }
        Path f = home.resolve("walked.json");
        assertTrue(fx(() -> app.saveTo(f)));
        String saved = Files.readString(f);
        fx(() -> {
            app.open(f);
            return null;
        });
        settle();
        assertEquals(Step.IDENTITY, fx(() -> app.viewModel().step().get()));
        assertEquals(saved, fx(() -> app.viewModel().caseJson()));
        assertEquals(saved, CaseFiles.toJson(CaseFiles.read(f)));
        assertFalse(fx(() -> app.viewModel().dirty().get()));
        // the reopened case computes the same results as the case did before it was saved
        fx(() -> {
            app.viewModel().goTo(Step.RESULTS);
            return null;
        });
        awaitCurrent();
        assertEquals(before, results());
    }

    /** Every scenario's label, required area (full precision) and orifice, as the live calculation has them. */
    private static java.util.List<String> results() throws Exception {
        return fx(() -> app.viewModel().summary().get().orElseThrow().scenarios().stream()
                .map(r -> r.label() + " | " + r.requiredAreaM2() + " | " + r.orifice()).toList());
    }

    private static JobState liveState() throws Exception {
        return fx(() -> app.viewModel().live().state().get());
    }

    private static void awaitCurrent() throws Exception {
        long end = System.currentTimeMillis() + 60_000;
        while (liveState() != JobState.CURRENT && System.currentTimeMillis() < end) {
            Thread.sleep(100);
        }
        assertEquals(JobState.CURRENT, liveState(), () -> "live calculation did not finish");
        settle();
    }

    private static String text(String id) throws Exception {
        Label l = (Label) lookup(id);
        assertNotNull(l, id);
        return fx(l::getText);
    }

    private static boolean stale() throws Exception {
        Node body = lookup("results-body");
        return fx(() -> body.getPseudoClassStates().contains(javafx.css.PseudoClass.getPseudoClass("stale")));
    }

    @Test
    @Order(2)
    void theDemoOpensOnItsComputedResultsWhichFollowEditsLive() throws Exception {
        fx(() -> {
            app.openBuiltInDemo();
            return null;
        });
        assertEquals(Step.RESULTS, fx(() -> app.viewModel().step().get()));
        awaitCurrent();
        String orifice = fx(() -> app.viewModel().summary().get().orElseThrow().governingRow().orElseThrow()
                .orifice().orElseThrow());
        String governing = text("governing");
        assertTrue(governing.contains("orifice " + orifice), governing);
        assertTrue(text("deferral").contains("qualified engineer"));
        assertTrue(text("results-status").startsWith("Up to date"), text("results-status"));
        assertTrue(text("live-result").contains(orifice), text("live-result"));
        assertFalse(stale());
        shot("20-demo-results");

        // an edit (here from the view-model, as undo would on this step): the old numbers stay, greyed and labelled
        fx(() -> {
            app.viewModel().set("$.storage.liquidLevel", "40 %v");
            return null;
        });
        settle();
        assertTrue(stale(), "the previous result is greyed while the new one is pending");
        assertTrue(text("results-status").contains("NOT CURRENT"), text("results-status"));
        shot("21-demo-recalculating");
        awaitCurrent();
        assertFalse(stale());
        assertFalse(governing.equals(text("governing")), "a lower level wets less area: the required area changes");
        shot("22-demo-recalculated");

        // a problem in the case: no new numbers, and the old ones are not passed off as current
        fx(() -> {
            app.viewModel().set("$.vessel.insideDiameter", "3.4");
            return null;
        });
        settle();
        assertEquals(JobState.INVALID, liveState());
        assertTrue(text("results-status").contains("fix the marked fields"), text("results-status"));
        assertTrue(stale());
        assertTrue(text("live-result").contains("fix the marked fields"));
        shot("23-demo-invalid");
        fx(() -> {
            app.viewModel().undo();
            return null;
        });
        awaitCurrent();
    }
    @Test
    @Order(3)
    void theReviewScreenShowsTheDeviationTableAndAHintOfADemoFile() throws Exception {
        fx(() -> {
            app.showReview();
            return null;
        });
        settle();
        assertTrue(text("review-status").startsWith("No claimed values"), text("review-status"));
        shot("30-review-empty");
        fx(() -> {
            @SuppressWarnings("unchecked")
            javafx.scene.control.ChoiceBox<String> examples = (javafx.scene.control.ChoiceBox<String>) app.stage()
                    .getScene().lookup("#review-examples");
            examples.setValue("propane-bullet-latent-at-storage.json");
            ((Button) app.stage().getScene().lookup("#review-open-example")).fire();
            return null;
        });
        long end = System.currentTimeMillis() + 60_000;
        while (fx(() -> app.reviewModel().state().get()) != JobState.CURRENT
                && fx(() -> app.reviewModel().state().get()) != JobState.FAILED
                && System.currentTimeMillis() < end) {
            Thread.sleep(100);
        }
        settle();
        assertEquals(JobState.CURRENT, fx(() -> app.reviewModel().state().get()),
                () -> "review did not finish: " + app.reviewModel().message().get());
        assertNotNull(lookup("review-table"), "the deviation table is shown");
        assertEquals("Latent heat L", text("review-row-latentHeat"));
        assertTrue(text("review-verdict-latentHeat").startsWith("disagrees"), text("review-verdict-latentHeat"));
        Node causes = lookup("review-causes");
        String all = fx(() -> causes.lookupAll(".cause-code").stream().map(n -> ((Label) n).getText())
                .reduce("", (a, b) -> a + " " + b));
        assertTrue(all.contains("latent-heat-at-storage"), all);
        assertTrue(text("review-deferral").contains("qualified engineer"));
        assertNotNull(lookup("review-range"), "the model range is shown");
        shot("31-review-latent-at-storage");
        for (double v : new double[] {0.45, 1.0}) {
            fx(() -> {
                ((javafx.scene.control.ScrollPane) app.stage().getScene().lookup(".page-scroll")).setVvalue(v);
                return null;
            });
            shot("32-review-scrolled-" + Math.round(v * 100));
        }
        fx(() -> {
            app.closeReview();
            return null;
        });
        settle();
        assertNotNull(lookup("next"), "closing the review returns to the open case");
    }

    @Test
    @Order(4)
    void theAuditScreenShowsTheDemoRegistersCountsTotalsChecksAndRowsNotComputed() throws Exception {
        fx(() -> {
            app.showAudit();
            return null;
        });
        settle();
        assertTrue(text("audit-status").startsWith("No register chosen"), text("audit-status"));
        fx(() -> {
            ((Button) app.stage().getScene().lookup("#audit-open-demo")).fire();
            return null;
        });
        long end = System.currentTimeMillis() + 120_000;
        while (fx(() -> app.auditModel().state().get()) == JobState.RUNNING
                && System.currentTimeMillis() < end) {
            Thread.sleep(100);
        }
        settle();
        assertEquals(JobState.CURRENT, fx(() -> app.auditModel().state().get()),
                () -> "audit did not finish: " + app.auditModel().message().get());
        org.ventcase.app.AuditRunner.Outcome o = fx(() -> app.auditModel().outcome().get().orElseThrow());
        assertTrue(text("audit-counts").contains("error " + o.count(org.ventcase.audit.VesselAudit.Status.ERROR)),
                text("audit-counts"));
        assertNotNull(lookup("audit-by-area"));
        assertNotNull(lookup("audit-by-component"));
        assertNotNull(lookup("audit-top-inventory"));
        assertNotNull(lookup("audit-top-fire"));
        assertNotNull(lookup("audit-not-computed"));
        String verdict = text("audit-threshold-propane");
        assertTrue(verdict.equals("EXCEEDED") || verdict.equals("below"), verdict);
        assertTrue(text("audit-deferral").contains("qualified engineer"));
        Node writePdf = lookup("audit-write-pdf");
        assertFalse(fx(writePdf::isDisabled));
        shot("40-audit-demo");
        for (double v : new double[] {0.5, 1.0}) {
            fx(() -> {
                ((javafx.scene.control.ScrollPane) app.stage().getScene().lookup(".page-scroll")).setVvalue(v);
                return null;
            });
            shot("41-audit-scrolled-" + Math.round(v * 100));
        }
        fx(() -> {
            app.closeReview();
            return null;
        });
        settle();
        assertNotNull(lookup("next"), "closing the audit returns to the open case");
    }
}
