package org.ventcase.ui;

import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;

import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import org.ventcase.app.CaseRunner;

/**
 * One background job at a time for a view model (the wizard's live calculation, the review and the
 * audit modes): a newer start, a debounced start or a cancel supersedes the job in progress. A job's
 * progress, result and failure reach the application thread only while it is the current job, so a
 * superseded run can never overwrite what a newer one shows.
 *
 * <p>The contract with the work: it receives a progress sink and a cancel flag; a runner that sees
 * the flag stops by throwing {@link CaseRunner.Cancelled}, which the job drops (whoever superseded it
 * owns the state now). Any other runtime exception is a failure, reported to {@code onFailed}.
 * The job also holds where it stands ({@link JobState}) and the line of text shown beside it, so
 * that the wizard, the review and the audit cancel, report and show progress alike.
 * Not thread-safe: call it from the application thread.
 */
final class BackgroundJob {

    /** What a job computes off the application thread. */
    @FunctionalInterface
    interface Work<T, P> {
        T run(Consumer<P> progress, BooleanSupplier cancelled);
    }

    private final LiveCalculation.Env env;
    private long generation;
    private LiveCalculation.Cancellable pending = () -> { };
    private AtomicBoolean cancelled = new AtomicBoolean(false);

    private final ReadOnlyObjectWrapper<JobState> state;
    private final ReadOnlyStringWrapper message;

    /** @param bean the view model whose state this is (the properties' bean) */
    BackgroundJob(Object bean, LiveCalculation.Env env) {
        this.env = env;
        this.state = new ReadOnlyObjectWrapper<>(bean, "state", JobState.IDLE);
        this.message = new ReadOnlyStringWrapper(bean, "message", "");
    }

    /** Sets where the job stands and the text shown beside it. */
    void report(JobState s, String m) {
        message.set(m);
        state.set(s);
    }

    /** Replaces the text beside a running job (a progress step); ignored unless it is running. */
    void step(String m) {
        if (state.get() == JobState.RUNNING) {
            message.set(m);
        }
    }

    /** Where the job stands now. */
    JobState now() {
        return state.get();
    }

    ReadOnlyObjectProperty<JobState> state() {
        return state.getReadOnlyProperty();
    }

    ReadOnlyStringProperty message() {
        return message.getReadOnlyProperty();
    }

    /**
     * The Cancel button: supersedes what is pending or running and reports {@link JobState#CANCELLED}
     * with {@code m}; does nothing when nothing is pending or running.
     */
    void cancel(String m) {
        if (state.get() != JobState.RUNNING && state.get() != JobState.WAITING) {
            return;
        }
        supersede();
        report(JobState.CANCELLED, m);
    }

    /** Supersedes what is pending or running: its progress and result are dropped, its run is asked to stop. */
    void supersede() {
        generation++;
        pending.cancel();
        pending = () -> { };
        cancelled.set(true);
    }

    /** Supersedes what is pending or running, then calls {@code start} after {@code delayMs} unless superseded again. */
    void startAfter(long delayMs, Runnable start) {
        supersede();
        long g = generation;
        pending = env.after(delayMs, () -> {
            if (g == generation) {
                start.run();
            }
        });
    }

    /**
     * Runs {@code work} off the application thread as the current job (superseding any other);
     * {@code onProgress}, {@code onDone} and {@code onFailed} run on the application thread, each only
     * while this job is still current.
     */
    <T, P> void start(Work<T, P> work, Consumer<P> onProgress, Consumer<T> onDone,
                      Consumer<RuntimeException> onFailed) {
        supersede();
        long g = generation;
        AtomicBoolean stop = new AtomicBoolean(false);
        cancelled = stop;
        env.background(() -> {
            try {
                T result = work.run(p -> env.ui(() -> {
                    if (g == generation) {
                        onProgress.accept(p);
                    }
                }), stop::get);
                env.ui(() -> {
                    if (g == generation) {
                        onDone.accept(result);
                    }
                });
            } catch (CaseRunner.Cancelled e) {
                // superseded: a newer request or the Cancel button owns the state now
            } catch (RuntimeException e) {
                env.ui(() -> {
                    if (g == generation) {
                        onFailed.accept(e);
                    }
                });
            }
        });
    }
}
