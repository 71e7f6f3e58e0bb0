package org.ventcase.ui;

import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.function.Supplier;

import javafx.animation.PauseTransition;
import javafx.application.Platform;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.util.Duration;

import org.ventcase.casefile.ValidatedCase;
import org.ventcase.app.CaseRunner;
import org.ventcase.app.CaseSummary;

/**
 * Keeps the results following the case as it is edited. Each change of the case restarts a quiet
 * period of {@link #DEBOUNCE_MS}; when it ends and the case is valid, the case is computed off the
 * application thread by the {@link CaseRunner}. A change during a run cancels that run (its result
 * is never shown). The last good result stays available while a new one runs, and is reported as
 * not current ({@link #current()} false) whenever the inputs have moved on or have problems: the
 * view shows it greyed and labelled, never as today's numbers. No calculation is done here, and no
 * JavaFX toolkit is needed: the {@link Env} says where timers, calculations and updates run, so the
 * view-model test drives it with a hand-wound clock.
 */
public final class LiveCalculation {

    /** Quiet time after the last edit before a recalculation starts, ms. */
    public static final long DEBOUNCE_MS = 600;


    /** A scheduled action that can be called off. */
    @FunctionalInterface
    public interface Cancellable {
        void cancel();
    }

    /** Where the live calculation's timers, calculations and updates run. */
    public interface Env {
        /** Runs {@code r} on the application thread after {@code delayMs}. */
        Cancellable after(long delayMs, Runnable r);

        /** Runs a calculation off the application thread. */
        void background(Runnable r);

        /** Runs {@code r} on the application thread (called from the calculating thread). */
        void ui(Runnable r);

        /** Live recalculation off: nothing is ever scheduled (view-model tests that do not look at results). */
        static Env off() {
            return new Env() {
                @Override
                public Cancellable after(long delayMs, Runnable r) {
                    return () -> { };
                }

                @Override
                public void background(Runnable r) {
                    throw new IllegalStateException("live calculation is off");
                }

                @Override
                public void ui(Runnable r) {
                    r.run();
                }
            };
        }

        /** The window's: JavaFX timers and thread, calculations on {@code worker}. */
        static Env fx(ExecutorService worker) {
            return new Env() {
                @Override
                public Cancellable after(long delayMs, Runnable r) {
                    PauseTransition p = new PauseTransition(Duration.millis(Math.max(1, delayMs)));
                    p.setOnFinished(e -> r.run());
                    p.play();
                    return p::stop;
                }

                @Override
                public void background(Runnable r) {
                    worker.submit(r);
                }

                @Override
                public void ui(Runnable r) {
                    Platform.runLater(r);
                }
            };
        }
    }

    private final CaseRunner runner;
    private final Env env;
    private final Supplier<Optional<ValidatedCase>> cases;
    private final long debounceMs;

    private final ReadOnlyObjectWrapper<Optional<CaseSummary>> summary = new ReadOnlyObjectWrapper<>(this, "summary",
            Optional.empty());
    private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(this, "progress", 0);
    private final ReadOnlyIntegerWrapper runs = new ReadOnlyIntegerWrapper(this, "runs", 0);

    /** The run in progress or pending; a change of the case supersedes it. */
    private final BackgroundJob job;

    public LiveCalculation(CaseRunner runner, Env env, Supplier<Optional<ValidatedCase>> cases, long debounceMs) {
        this.runner = runner;
        this.env = env;
        this.cases = cases;
        this.debounceMs = debounceMs;
        this.job = new BackgroundJob(this, env);
    }

    /**
     * The case changed (an edit, undo or redo): cancels a run in progress and a pending start, then
     * waits the debounce time, or reports the case invalid at once.
     */
    public void changed() {
        job.supersede();
        if (cases.get().isEmpty()) {
            job.report(JobState.INVALID, "");
            return;
        }
        job.report(JobState.WAITING, "");
        job.startAfter(debounceMs, this::start);
    }

    /** Another case was loaded: forgets the last result and computes the new case without waiting. */
    public void loaded() {
        job.supersede();
        summary.set(Optional.empty());
        if (cases.get().isEmpty()) {
            job.report(JobState.INVALID, "");
            return;
        }
        job.report(JobState.WAITING, "");
        job.startAfter(0, this::start);
    }

    /** Recalculates now (the Recalculate button): cancels what is pending or running first. */
    public void recalculate() {
        job.supersede();
        start();
    }

    /** Cancels the run in progress (the Cancel button); the last good result stays, marked not current. */
    public void cancel() {
        job.cancel(Messages.get("results.cancelled"));
    }

    private void start() {
        Optional<ValidatedCase> kase = cases.get();
        if (kase.isEmpty()) {
            job.report(JobState.INVALID, "");
            return;
        }
        progress.set(0);
        job.report(JobState.RUNNING, Messages.get("results.running"));
        runs.set(runs.get() + 1);
        ValidatedCase k = kase.get();
        job.<CaseSummary, Step>start((p, cancelled) -> runner.run(k, (f, m) -> p.accept(new Step(f, m)), cancelled),
                st -> {
                    if (job.now() == JobState.RUNNING) {
                        progress.set(st.fraction());
                    }
                    job.step(st.what());
                },
                s -> {
                    summary.set(Optional.of(s));
                    progress.set(1);
                    job.report(JobState.CURRENT, "");
                },
                e -> job.report(JobState.FAILED, Messages.get("results.failed", String.valueOf(e.getMessage()))));
    }

    /** One progress report of a run: the fraction done and what is being computed. */
    record Step(double fraction, String what) {
    }

    /** Where the live calculation stands. */
    public ReadOnlyObjectProperty<JobState> state() {
        return job.state();
    }

    /** The last good result (of the current inputs only when {@link #current()}). */
    public ReadOnlyObjectProperty<Optional<CaseSummary>> summary() {
        return summary.getReadOnlyProperty();
    }

    /** True when the result is that of the inputs as they are now. */
    public boolean current() {
        return job.now() == JobState.CURRENT;
    }

    /** Fraction done of the run in progress. */
    public ReadOnlyDoubleProperty progress() {
        return progress.getReadOnlyProperty();
    }

    /** What is being computed, why the run stopped, or "" . */
    public ReadOnlyStringProperty message() {
        return job.message();
    }

    /** Number of recalculations started so far. */
    public ReadOnlyIntegerProperty runs() {
        return runs.getReadOnlyProperty();
    }
}
