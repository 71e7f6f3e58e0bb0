package org.ventcase.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.BooleanSupplier;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.report.UnitSystem;
import org.ventcase.app.CaseRunner;
import org.ventcase.app.CaseSummary;
import org.ventcase.app.SheetOutcome;
import org.ventcase.units.Dimension;

/**
 * Live results without a window: the clock is wound by hand, calculations run on a real
 * background thread, and updates for the "application thread" are queued and run by the test
 * thread, as the window's thread would.
 */
class LiveCalculationTest {

    @TempDir
    Path tmp;

    private final ExecutorService background = Executors.newSingleThreadExecutor();

    @AfterEach
    void stop() {
        background.shutdownNow();
    }

    /** A hand-wound clock, a real background thread and a queue standing in for the application thread. */
    final class ManualEnv implements LiveCalculation.Env {
        long now;
        final List<long[]> due = new ArrayList<>();
        final List<Runnable> timers = new ArrayList<>();
        final BlockingQueue<Runnable> uiQueue = new LinkedBlockingQueue<>();

        @Override
        public LiveCalculation.Cancellable after(long delayMs, Runnable r) {
            long[] slot = {now + delayMs, 0};
            due.add(slot);
            timers.add(r);
            return () -> slot[1] = 1;
        }

        @Override
        public void background(Runnable r) {
            background.submit(r);
        }

        @Override
        public void ui(Runnable r) {
            uiQueue.add(r);
        }

        /** Moves the clock on, firing the timers that fall due and were not cancelled. */
        void advance(long ms) {
            now += ms;
            Iterator<long[]> d = due.iterator();
            Iterator<Runnable> t = timers.iterator();
            List<Runnable> fire = new ArrayList<>();
            while (d.hasNext()) {
                long[] slot = d.next();
                Runnable r = t.next();
                if (slot[0] <= now) {
                    d.remove();
                    t.remove();
                    if (slot[1] == 0) {
                        fire.add(r);
                    }
                }
            }
            fire.forEach(Runnable::run);
        }

        /** Runs queued application-thread updates until {@code done} holds (at most 30 s). */
        void pumpUntil(BooleanSupplier done) throws InterruptedException {
            long end = System.currentTimeMillis() + 30_000;
            while (!done.getAsBoolean()) {
                Runnable r = uiQueue.poll(100, TimeUnit.MILLISECONDS);
                if (r != null) {
                    r.run();
                }
                assertTrue(System.currentTimeMillis() < end, "timed out");
            }
        }

        /** Runs what is queued now, after the background thread has finished what it was given. */
        void pumpIdle() throws Exception {
            background.submit(() -> { }).get(30, TimeUnit.SECONDS);
            Runnable r;
            while ((r = uiQueue.poll()) != null) {
                r.run();
            }
        }
    }

    /**
     * Counts runs and answers with a summary naming the case's tag; a run can be held until the
     * test releases it or the live calculation cancels it.
     */
    static final class ProbeRunner implements CaseRunner {
        final AtomicInteger started = new AtomicInteger();
        final AtomicInteger cancelledRuns = new AtomicInteger();
        final AtomicInteger finished = new AtomicInteger();
        volatile CountDownLatch hold = new CountDownLatch(0);
        volatile CountDownLatch running = new CountDownLatch(1);

        @Override
        public CaseSummary run(ValidatedCase kase, Progress progress, BooleanSupplier cancelled) {
            started.incrementAndGet();
            running.countDown();
            progress.update(0.5, "half way");
            while (hold.getCount() > 0) {
                if (cancelled.getAsBoolean()) {
                    cancelledRuns.incrementAndGet();
                    throw new Cancelled();
                }
                try {
                    hold.await(5, TimeUnit.MILLISECONDS);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new Cancelled();
                }
            }
            finished.incrementAndGet();
            return new CaseSummary(Optional.empty(), "probe", List.of(CaseSummary.ScenarioRow.notComputed(
                    kase.identity().tag(), "probe", "probe")), Optional.empty(), false, List.of());
        }

        @Override
        public SheetOutcome sheet(ValidatedCase kase, UnitSystem units, String toolVersion) {
            return SheetOutcome.none("probe");
        }
    }

    private static String shownTag(WizardViewModel vm) {
        return vm.summary().get().orElseThrow().scenarios().get(0).label();
    }

    private WizardViewModel loaded(ProbeRunner probe, ManualEnv env) throws Exception {
        WizardViewModel vm = new WizardViewModel(probe, new UserFiles(tmp.resolve("home")), env, 600);
        vm.newFromTemplate("horizontal-bullet");
        // a loaded case is computed without waiting for the debounce
        env.advance(0);
        env.pumpUntil(() -> vm.live().current());
        assertEquals(1, probe.started.get());
        return vm;
    }

    @Test
    void editsTriggerExactlyOneRecalculationAfterTheDebounce() throws Exception {
        ProbeRunner probe = new ProbeRunner();
        ManualEnv env = new ManualEnv();
        WizardViewModel vm = loaded(probe, env);
        FieldModel tag = vm.text("$.identity.tag");
        tag.text().set("V-1");
        env.advance(200);
        tag.text().set("V-12");
        env.advance(200);
        tag.text().set("V-123");
        assertEquals(JobState.WAITING, vm.live().state().get());
        assertFalse(vm.live().current(), "the result shown is marked as not current while an edit waits");
        assertEquals("V-2101", shownTag(vm), "the last good result stays visible");
        env.advance(599);
        env.pumpIdle();
        assertEquals(1, probe.started.get(), "no run before 600 ms of quiet");
        env.advance(1);
        env.pumpUntil(() -> vm.live().current());
        assertEquals(2, probe.started.get(), "three edits, one run");
        assertEquals("V-123", shownTag(vm));
        env.advance(10_000);
        env.pumpIdle();
        assertEquals(2, probe.started.get(), "nothing more after the run");
        assertEquals(2, vm.live().runs().get());
    }

    @Test
    void anEditDuringARunCancelsItAndOnlyTheNewerResultIsShown() throws Exception {
        ProbeRunner probe = new ProbeRunner();
        ManualEnv env = new ManualEnv();
        WizardViewModel vm = loaded(probe, env);
        probe.hold = new CountDownLatch(1);
        probe.running = new CountDownLatch(1);
        vm.text("$.identity.tag").text().set("V-OLD");
        env.advance(600);
        assertTrue(probe.running.await(30, TimeUnit.SECONDS));
        env.pumpUntil(() -> vm.live().progress().get() == 0.5);
        assertEquals(JobState.RUNNING, vm.live().state().get());
        assertEquals("V-2101", shownTag(vm), "the previous result stays (greyed) while a run is under way");
        // a newer edit arrives while the first run is held
        vm.text("$.identity.tag").text().set("V-NEW");
        env.pumpIdle();
        assertEquals(1, probe.cancelledRuns.get(), "the held run saw its cancellation");
        assertEquals(1, probe.finished.get(), "only the first (load) run finished");
        probe.hold.countDown();
        assertEquals(JobState.WAITING, vm.live().state().get());
        assertEquals("V-2101", shownTag(vm), "the cancelled run's result is never shown");
        env.advance(600);
        env.pumpUntil(() -> vm.live().current());
        assertEquals("V-NEW", shownTag(vm));
        assertEquals(3, probe.started.get());
    }

    @Test
    void theCancelButtonStopsARunAndKeepsTheOldResultMarkedNotCurrent() throws Exception {
        ProbeRunner probe = new ProbeRunner();
        ManualEnv env = new ManualEnv();
        WizardViewModel vm = loaded(probe, env);
        probe.hold = new CountDownLatch(1);
        probe.running = new CountDownLatch(1);
        vm.live().recalculate();
        assertTrue(probe.running.await(30, TimeUnit.SECONDS));
        vm.live().cancel();
        env.pumpIdle();
        assertEquals(1, probe.cancelledRuns.get());
        assertEquals(JobState.CANCELLED, vm.live().state().get());
        assertFalse(vm.live().current());
        assertEquals("V-2101", shownTag(vm));
    }

    @Test
    void anInvalidCaseProducesNoNewNumbers() throws Exception {
        ProbeRunner probe = new ProbeRunner();
        ManualEnv env = new ManualEnv();
        WizardViewModel vm = loaded(probe, env);
        vm.text("$.identity.tag").text().set("V-BAD");
        vm.quantity("$.vessel.insideDiameter", Dimension.LENGTH).text().set("3.2");
        assertEquals(JobState.INVALID, vm.live().state().get());
        assertFalse(vm.live().current());
        env.advance(10_000);
        vm.live().recalculate();
        env.pumpIdle();
        assertEquals(1, probe.started.get(), "no run while the case has a problem, not even on Recalculate");
        assertEquals(JobState.INVALID, vm.live().state().get());
        assertEquals("V-2101", shownTag(vm), "the old numbers stay, marked not current");
        assertTrue(StepViews.statusLine(vm.live().state().get(), true, "").contains("fix the marked fields"));
        assertTrue(StepViews.statusLine(vm.live().state().get(), true, "").contains("NOT CURRENT"));
        // fixed: one run after the debounce
        vm.quantity("$.vessel.insideDiameter", Dimension.LENGTH).text().set("3.2 m");
        env.advance(600);
        env.pumpUntil(() -> vm.live().current());
        assertEquals("V-BAD", shownTag(vm));
        assertEquals(2, probe.started.get());
    }

    @Test
    void theRealPipelineComputesALoadedCaseLive() throws Exception {
        ManualEnv env = new ManualEnv();
        WizardViewModel vm = new WizardViewModel(CaseRunner.standard(), new UserFiles(tmp.resolve("home")), env, 600);
        vm.newFromTemplate("horizontal-bullet");
        env.advance(0);
        env.pumpUntil(() -> vm.live().state().get() != JobState.RUNNING
                && vm.live().state().get() != JobState.WAITING);
        assertEquals(JobState.CURRENT, vm.live().state().get(), vm.live().message().get());
        CaseSummary s = vm.summary().get().orElseThrow();
        assertNotNull(s.governingRow().orElseThrow().orifice().orElseThrow());
    }
}
