package org.ventcase.ui;

import java.nio.file.Path;
import java.util.Optional;

import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import org.ventcase.report.CalculationSheet;
import org.ventcase.app.AuditRunner;

/**
 * State and actions of the wizard's audit mode: the register and thresholds chosen, the audit of
 * the last run, rows done of total while it runs, and the exports. No calculation here: the
 * {@link AuditRunner} reads and computes, always through the {@link LiveCalculation.Env}'s
 * background; a newer run or Cancel supersedes a run in progress (its result is never shown).
 * Usable without a window.
 */
public final class AuditViewModel {


    private final AuditRunner runner;
    private final LiveCalculation.Env env;
    private final int threads;

    private final ReadOnlyObjectWrapper<Optional<AuditRunner.Outcome>> outcome = new ReadOnlyObjectWrapper<>(this,
            "outcome", Optional.empty());
    private final ReadOnlyIntegerWrapper done = new ReadOnlyIntegerWrapper(this, "done", 0);
    private final ReadOnlyIntegerWrapper total = new ReadOnlyIntegerWrapper(this, "total", 0);
    private final ReadOnlyStringWrapper exportMessage = new ReadOnlyStringWrapper(this, "exportMessage", "");
    private final ReadOnlyObjectWrapper<Optional<AuditRunner.Input>> thresholds = new ReadOnlyObjectWrapper<>(this,
            "thresholds", Optional.empty());
    private Optional<AuditRunner.Input> register = Optional.empty();

    /** The audit run in progress. */
    private final BackgroundJob job;

    /**
     * @param runner  reads and runs the audit (off the application thread)
     * @param env     where runs and updates happen
     * @param threads worker threads of the audit
     */
    public AuditViewModel(AuditRunner runner, LiveCalculation.Env env, int threads) {
        this.runner = runner;
        this.env = env;
        this.job = new BackgroundJob(this, env);
        this.threads = threads;
    }

    // ------------------------------------------------------------------------------ actions

    /** Audits a register file on disk with the thresholds chosen (if any). */
    public void open(Path register) {
        start(AuditRunner.Input.file(register));
    }

    /** Audits the packaged invented demo register with its invented thresholds. */
    public void openDemo() {
        thresholds.set(Optional.of(AuditRunner.Input.demo(AuditRunner.DEMO_THRESHOLDS)));
        start(AuditRunner.Input.demo(AuditRunner.DEMO_REGISTER));
    }

    /** Sets the thresholds file (empty: none); runs the audit again when a register is chosen. */
    public void thresholds(Optional<Path> file) {
        thresholds.set(file.map(AuditRunner.Input::file));
        register.ifPresent(this::start);
    }

    /** Cancels the run in progress; nothing is shown for it. */
    public void cancel() {
        job.cancel(Messages.get("audit.state.cancelled"));
    }

    private void start(AuditRunner.Input reg) {
        job.supersede();
        register = Optional.of(reg);
        Optional<AuditRunner.Input> th = thresholds.get();
        outcome.set(Optional.empty());
        exportMessage.set("");
        done.set(0);
        total.set(0);
        job.report(JobState.RUNNING, Messages.get("audit.state.running", reg.name()));
        job.<AuditRunner.Outcome, RowsDone>start((p, cancelled) -> runner.run(reg, th, threads,
                (d, n) -> p.accept(new RowsDone(d, n)), cancelled),
                r -> {
                    if (job.now() == JobState.RUNNING && r.done() >= done.get()) {
                        total.set(r.total());
                        done.set(r.done());
                    }
                },
                o -> {
                    outcome.set(Optional.of(o));
                    job.report(JobState.CURRENT, "");
                },
                e -> job.report(JobState.FAILED, Messages.get("audit.failed", reg.name(), ReviewViewModel.describe(e))));
    }

    /** Writes the per-vessel CSV off the application thread; {@link #exportMessage()} reports. */
    public void writeCsv(Path target) {
        export(o -> AuditRunner.writeCsv(o, target), target);
    }

    /** Writes the summary PDF off the application thread; {@link #exportMessage()} reports. */
    public void writePdf(Path target, CalculationSheet.PageSize size) {
        writePdf(target, size, org.ventcase.report.UnitSystem.SI);
    }

    /** As {@link #writePdf(Path, CalculationSheet.PageSize)}, the figures in the unit system given. */
    public void writePdf(Path target, CalculationSheet.PageSize size, org.ventcase.report.UnitSystem units) {
        export(o -> AuditRunner.writePdf(o, target, size, Texts.version(), java.util.Optional.empty(), "", units),
                target);
    }

    private interface Writer {
        void write(AuditRunner.Outcome o) throws java.io.IOException;
    }

    private void export(Writer w, Path target) {
        Optional<AuditRunner.Outcome> o = outcome.get();
        if (o.isEmpty() || job.now() != JobState.CURRENT) {
            exportMessage.set(Messages.get("audit.export.notDone"));
            return;
        }
        exportMessage.set(Messages.get("review.export.writing", target.getFileName()));
        env.background(() -> {
            try {
                w.write(o.get());
                env.ui(() -> exportMessage.set(Messages.get("review.export.done", target)));
            } catch (java.io.IOException | RuntimeException e) {
                String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
                env.ui(() -> exportMessage.set(Messages.get("review.export.failed", m)));
            }
        });
    }

    // ------------------------------------------------------------------------------ state

    public ReadOnlyObjectProperty<JobState> state() {
        return job.state();
    }

    /** The last audit finished (present only in state DONE). */
    public ReadOnlyObjectProperty<Optional<AuditRunner.Outcome>> outcome() {
        return outcome.getReadOnlyProperty();
    }

    /** Rows computed so far in the run. */
    public ReadOnlyIntegerProperty done() {
        return done.getReadOnlyProperty();
    }

    /** Rows of the register (0 until the run has read it). */
    public ReadOnlyIntegerProperty total() {
        return total.getReadOnlyProperty();
    }

    /** What is being done, or why the audit could not be made; "" when done. */
    public ReadOnlyStringProperty message() {
        return job.message();
    }

    /** What the last export did. */
    public ReadOnlyStringProperty exportMessage() {
        return exportMessage.getReadOnlyProperty();
    }

    /** The thresholds file chosen. */
    public ReadOnlyObjectProperty<Optional<AuditRunner.Input>> thresholdsFile() {
        return thresholds.getReadOnlyProperty();
    }

    /** The register chosen. */
    public Optional<AuditRunner.Input> register() {
        return register;
    }

    /** One progress report of an audit run. */
    private record RowsDone(int done, int total) {
    }
}
