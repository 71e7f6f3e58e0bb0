package org.ventcase.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;

import org.junit.jupiter.api.Test;
import org.ventcase.app.CaseRunner;

/**
 * The one background-job contract of the wizard, review and audit modes: a superseded job's
 * progress and result never reach the screen, its run sees the cancel flag, a failure is reported
 * only for the current job, and a debounced start is dropped when superseded. Invariant, no
 * external values; the application thread is a list of queued updates run by hand.
 */
class BackgroundJobTest {

    /** Background work runs on a real thread; "UI" updates are queued and run by the test. */
    private final List<Runnable> ui = java.util.Collections.synchronizedList(new ArrayList<>());
    private final List<Runnable> timers = new ArrayList<>();
    private final LiveCalculation.Env env = new LiveCalculation.Env() {
        @Override
        public LiveCalculation.Cancellable after(long delayMs, Runnable r) {
            boolean[] off = {false};
            timers.add(() -> {
                if (!off[0]) {
                    r.run();
                }
            });
            return () -> off[0] = true;
        }

        @Override
        public void background(Runnable r) {
            new Thread(r, "job-test").start();
        }

        @Override
        public void ui(Runnable r) {
            ui.add(r);
        }
    };

    private void pump() {
        List<Runnable> now;
        synchronized (ui) {
            now = new ArrayList<>(ui);
            ui.clear();
        }
        now.forEach(Runnable::run);
    }

    @Test
    void aSupersededJobNeverReachesTheScreen() throws Exception {
        BackgroundJob job = new BackgroundJob(this, env);
        List<String> shown = new ArrayList<>();
        CountDownLatch firstRunning = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        AtomicBoolean sawCancel = new AtomicBoolean();
        CountDownLatch firstDone = new CountDownLatch(1);
        job.<String, String>start((p, cancelled) -> {
            p.accept("first progress");
            firstRunning.countDown();
            try {
                release.await(10, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            sawCancel.set(cancelled.getAsBoolean());
            firstDone.countDown();
            return "first";
        }, shown::add, shown::add, e -> shown.add("failed"));
        assertTrue(firstRunning.await(10, TimeUnit.SECONDS));
        CountDownLatch secondDone = new CountDownLatch(1);
        job.<String, String>start((p, cancelled) -> "second", shown::add, r -> {
            shown.add(r);
            secondDone.countDown();
        }, e -> shown.add("failed"));
        release.countDown();
        assertTrue(firstDone.await(10, TimeUnit.SECONDS));
        long end = System.currentTimeMillis() + 10_000;
        while (secondDone.getCount() > 0 && System.currentTimeMillis() < end) {
            pump();
            Thread.sleep(5);
        }
        Thread.sleep(50);
        pump();
        assertTrue(sawCancel.get(), "the superseded run saw its cancel flag");
        assertEquals(List.of("second"), shown, "only the current job's result is shown");
    }

    @Test
    void cancelledRunIsDroppedAndAFailureOfTheCurrentJobIsReported() throws Exception {
        BackgroundJob job = new BackgroundJob(this, env);
        List<String> shown = new ArrayList<>();
        CountDownLatch ran = new CountDownLatch(2);
        job.<String, String>start((p, cancelled) -> {
            ran.countDown();
            throw new CaseRunner.Cancelled();
        }, shown::add, shown::add, e -> shown.add("failed " + e.getMessage()));
        job.<String, String>start((p, cancelled) -> {
            ran.countDown();
            throw new IllegalStateException("boom");
        }, shown::add, shown::add, e -> shown.add("failed " + e.getMessage()));
        assertTrue(ran.await(10, TimeUnit.SECONDS));
        long end = System.currentTimeMillis() + 10_000;
        while (shown.isEmpty() && System.currentTimeMillis() < end) {
            pump();
            Thread.sleep(5);
        }
        assertEquals(List.of("failed boom"), shown);
    }

    @Test
    void aDebouncedStartIsDroppedWhenSuperseded() {
        BackgroundJob job = new BackgroundJob(this, env);
        List<String> started = new ArrayList<>();
        job.startAfter(600, () -> started.add("first"));
        job.startAfter(600, () -> started.add("second"));
        timers.forEach(Runnable::run);
        assertEquals(List.of("second"), started);
        job.startAfter(600, () -> started.add("third"));
        job.supersede();
        timers.forEach(Runnable::run);
        assertEquals(List.of("second"), started, "a cancel drops the pending start");
    }

    @Test
    void cancelActsOnlyOnAPendingOrRunningJobAndStepsOnlyWhileRunning() {
        BackgroundJob job = new BackgroundJob(this, env);
        job.cancel("cancelled");
        assertEquals(JobState.IDLE, job.now(), "nothing to cancel: the state stays");
        job.report(JobState.CURRENT, "");
        job.step("ignored");
        assertEquals("", job.message().get(), "a progress step after the result does not overwrite it");
        List<String> started = new ArrayList<>();
        job.report(JobState.WAITING, "waiting");
        job.startAfter(600, () -> started.add("run"));
        job.cancel("cancelled");
        timers.forEach(Runnable::run);
        assertEquals(JobState.CANCELLED, job.now());
        assertEquals("cancelled", job.message().get());
        assertEquals(List.of(), started, "the cancelled pending start never runs");
        job.report(JobState.RUNNING, "running");
        job.step("step 2");
        assertEquals("step 2", job.message().get());
    }
}
