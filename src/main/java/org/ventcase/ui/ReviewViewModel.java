package org.ventcase.ui;

import java.nio.file.Path;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Supplier;

import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

import org.ventcase.report.CalculationSheet;
import org.ventcase.review.ReviewQuantity;
import org.ventcase.review.Tolerances;
import org.ventcase.app.ReviewRunner;

/**
 * State and actions of the wizard's review mode: the claimed-value file chosen, the tolerance of
 * each quantity (editable, defaults with their reasons), the review of the last run and where it
 * stands. No calculation here: the {@link ReviewRunner} reads the file and runs the review, always
 * through the {@link LiveCalculation.Env}'s background; a tolerance edit re-judges the review
 * already computed at once (no case is computed again), or, while the first run is still going,
 * re-runs it after the debounce time; a newer request supersedes a run in progress (its result is
 * never shown).
 * Usable without a window (tests build one with an inline environment).
 */
public final class ReviewViewModel {


    /** One editable tolerance: the text in the field and the message beside it. */
    public static final class ToleranceField {
        private final ReviewQuantity quantity;
        private final StringProperty text = new SimpleStringProperty(this, "text", "");
        private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");

        ToleranceField(ReviewQuantity q) {
            this.quantity = q;
        }

        public ReviewQuantity quantity() {
            return quantity;
        }

        /** The number as typed, in {@link #unit()}. */
        public StringProperty text() {
            return text;
        }

        /** Why the text is not accepted, or "". */
        public ReadOnlyStringProperty message() {
            return message.getReadOnlyProperty();
        }

        /** The unit of the field: "%" or "K". */
        public String unit() {
            return quantity.kind() == ReviewQuantity.Kind.ABSOLUTE_KELVIN ? "K" : "%";
        }

        /** The default, as the field shows it, e.g. "5 %". */
        public String defaultText() {
            return quantity.formatTolerance(quantity.defaultTolerance());
        }
    }

    private final ReviewRunner runner;
    private final LiveCalculation.Env env;
    private final Supplier<ReviewRunner.OpenCase> openCase;
    private final long debounceMs;

    private final ReadOnlyObjectWrapper<Optional<ReviewRunner.Outcome>> outcome = new ReadOnlyObjectWrapper<>(this,
            "outcome", Optional.empty());
    private final ReadOnlyObjectWrapper<Optional<ReviewRunner.Source>> source = new ReadOnlyObjectWrapper<>(this,
            "source", Optional.empty());
    private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(this, "progress", 0);
    private final ReadOnlyStringWrapper exportMessage = new ReadOnlyStringWrapper(this, "exportMessage", "");
    private final Map<ReviewQuantity, ToleranceField> fields = new EnumMap<>(ReviewQuantity.class);
    private Tolerances tolerances = Tolerances.defaults();
    /** The open case the review shown was computed with (a tolerance edit re-judges only while it is the same). */
    private ReviewRunner.OpenCase lastOpen;
    private boolean resetting;

    /** The review run in progress or pending. */
    private final BackgroundJob job;

    /**
     * @param runner     reads claimed files and runs the review (off the application thread)
     * @param env        where timers, runs and updates happen
     * @param openCase   the case open in the wizard, for claimed values that name none
     * @param debounceMs quiet time after a tolerance edit before the review runs again
     */
    public ReviewViewModel(ReviewRunner runner, LiveCalculation.Env env, Supplier<ReviewRunner.OpenCase> openCase,
                           long debounceMs) {
        this.runner = runner;
        this.env = env;
        this.openCase = openCase;
        this.debounceMs = debounceMs;
        this.job = new BackgroundJob(this, env);
        for (ReviewQuantity q : ReviewQuantity.values()) {
            if (q.kind() == ReviewQuantity.Kind.EXACT) {
                continue;
            }
            ToleranceField f = new ToleranceField(q);
            f.text.set(number(q, q.defaultTolerance()));
            f.text.addListener((o, a, b) -> toleranceEdited(f));
            fields.put(q, f);
        }
    }

    // ------------------------------------------------------------------------------ actions

    /** Reviews a claimed-value file on disk (JSON, or CSV for any other name). */
    public void open(Path file) {
        open(new ReviewRunner.FileSource(file));
    }

    /** Reviews one of the packaged demo files ({@link ReviewRunner#DEMOS}). */
    public void openDemo(String name) {
        open(new ReviewRunner.DemoSource(name));
    }

    private void open(ReviewRunner.Source s) {
        source.set(Optional.of(s));
        outcome.set(Optional.empty());
        exportMessage.set("");
        rerun();
    }

    /** Runs the review again now (cancels what is pending or running first). */
    public void rerun() {
        job.supersede();
        start();
    }

    /** Cancels the run in progress; the review shown (if any) stays, marked not current. */
    public void cancel() {
        job.cancel(Messages.get("review.state.cancelled"));
    }

    /** Puts every tolerance back to its default and runs the review again. */
    public void resetTolerances() {
        resetting = true;
        try {
            for (ToleranceField f : fields.values()) {
                f.text.set(number(f.quantity, f.quantity.defaultTolerance()));
                f.message.set("");
            }
        } finally {
            resetting = false;
        }
        tolerances = Tolerances.defaults();
        changed();
    }

    private void toleranceEdited(ToleranceField f) {
        if (resetting) {
            return;
        }
        ReviewQuantity q = f.quantity;
        String t = f.text.get() == null ? "" : f.text.get().strip().toLowerCase(Locale.ROOT);
        String unit = f.unit().toLowerCase(Locale.ROOT);
        if (t.endsWith(unit)) {
            t = t.substring(0, t.length() - unit.length()).strip();
        }
        double v;
        try {
            v = Double.parseDouble(t);
        } catch (NumberFormatException e) {
            f.message.set(Messages.get("review.tolerance.number", f.unit()));
            return;
        }
        boolean kelvin = q.kind() == ReviewQuantity.Kind.ABSOLUTE_KELVIN;
        double value = kelvin ? v : v / 100;
        double max = kelvin ? Tolerances.MAX_KELVIN : Tolerances.MAX_RELATIVE;
        if (!(value > 0) || value > max) {
            f.message.set(Messages.get("review.tolerance.range", number(q, max), f.unit()));
            return;
        }
        f.message.set("");
        if (value == tolerances.of(q)) {
            return;
        }
        tolerances = tolerances.with(q, value);
        changed();
    }

    private void changed() {
        if (source.get().isEmpty()) {
            return;
        }
        Optional<ReviewRunner.Outcome> shown = outcome.get();
        if (shown.isPresent() && job.now() != JobState.RUNNING && lastOpen == openCase.get()) {
            // The case and the claimed values are unchanged: judge the computed review again with the
            // new tolerances, here and now (no case is computed again; ReviewRunner.Outcome.withTolerances).
            job.supersede();
            outcome.set(Optional.of(shown.get().withTolerances(tolerances)));
            progress.set(1);
            job.report(JobState.CURRENT, "");
            return;
        }
        job.supersede();
        job.report(JobState.WAITING, Messages.get("review.state.waiting"));
        job.startAfter(debounceMs, this::start);
    }

    private void start() {
        Optional<ReviewRunner.Source> s = source.get();
        if (s.isEmpty()) {
            return;
        }
        Tolerances tol = tolerances;
        ReviewRunner.OpenCase open = openCase.get();
        progress.set(0);
        job.report(JobState.RUNNING, Messages.get("review.state.running", s.get().name()));
        job.<ReviewRunner.Outcome, LiveCalculation.Step>start((p, cancelled) -> runner.run(s.get(), open, tol,
                (f, m) -> p.accept(new LiveCalculation.Step(f, m)), cancelled),
                st -> {
                    if (job.now() == JobState.RUNNING) {
                        progress.set(st.fraction());
                    }
                    job.step(Messages.get("review.state.step", st.what()));
                },
                o -> {
                    lastOpen = open;
                    outcome.set(Optional.of(o));
                    progress.set(1);
                    job.report(JobState.CURRENT, "");
                },
                e -> job.report(JobState.FAILED, Messages.get("review.failed", s.get().name(), describe(e))));
    }

    /** The message of a failure as the engineer needs it (the field and what is accepted). */
    static String describe(RuntimeException e) {
        String m = e.getMessage();
        return m == null || m.isBlank() ? e.getClass().getSimpleName() : m;
    }

    /** Writes the review PDF off the application thread; {@link #exportMessage()} reports. */
    public void writePdf(Path target, CalculationSheet.PageSize size) {
        writePdf(target, size, org.ventcase.report.UnitSystem.SI);
    }

    /** As {@link #writePdf(Path, CalculationSheet.PageSize)}, the values in the unit system given. */
    public void writePdf(Path target, CalculationSheet.PageSize size, org.ventcase.report.UnitSystem units) {
        export(o -> {
            try {
                ReviewRunner.writePdf(o, target, size, Texts.version(), units);
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException("cannot write " + target + ": " + org.ventcase.common.FileErrors.reason(e), e);
            }
        }, target);
    }

    /** Writes the review JSON off the application thread; {@link #exportMessage()} reports. */
    public void writeJson(Path target) {
        export(o -> ReviewRunner.writeJson(o, target, Texts.version()), target);
    }

    private void export(Consumer<ReviewRunner.Outcome> write, Path target) {
        Optional<ReviewRunner.Outcome> o = outcome.get();
        if (o.isEmpty() || job.now() != JobState.CURRENT) {
            exportMessage.set(Messages.get("review.export.notCurrent"));
            return;
        }
        exportMessage.set(Messages.get("review.export.writing", target.getFileName()));
        env.background(() -> {
            try {
                write.accept(o.get());
                env.ui(() -> exportMessage.set(Messages.get("review.export.done", target)));
            } catch (RuntimeException e) {
                env.ui(() -> exportMessage.set(Messages.get("review.export.failed", describe(e))));
            }
        });
    }

    // ------------------------------------------------------------------------------ state

    /** A tolerance in the field's unit, without trailing zeros: 0.05 -> "5", 1.0 K -> "1". */
    static String number(ReviewQuantity q, double tolerance) {
        double v = q.kind() == ReviewQuantity.Kind.ABSOLUTE_KELVIN ? tolerance : tolerance * 100;
        return java.math.BigDecimal.valueOf(v).round(new java.math.MathContext(6)).stripTrailingZeros()
                .toPlainString();
    }

    public ReadOnlyObjectProperty<JobState> state() {
        return job.state();
    }

    /** The last review made (of the current file and tolerances only when the state is CURRENT). */
    public ReadOnlyObjectProperty<Optional<ReviewRunner.Outcome>> outcome() {
        return outcome.getReadOnlyProperty();
    }

    /** The claimed-value file chosen. */
    public ReadOnlyObjectProperty<Optional<ReviewRunner.Source>> source() {
        return source.getReadOnlyProperty();
    }

    public ReadOnlyDoubleProperty progress() {
        return progress.getReadOnlyProperty();
    }

    /** What is being done, or why the review could not be made; "" when current. */
    public ReadOnlyStringProperty message() {
        return job.message();
    }

    /** What the last export did. */
    public ReadOnlyStringProperty exportMessage() {
        return exportMessage.getReadOnlyProperty();
    }

    /** The editable tolerances, in table order (not the orifice, which is compared exactly). */
    public Map<ReviewQuantity, ToleranceField> tolerances() {
        return Collections.unmodifiableMap(fields);
    }

    /** The tolerance field of a quantity. */
    public ToleranceField tolerance(ReviewQuantity q) {
        ToleranceField f = fields.get(q);
        if (f == null) {
            throw new IllegalArgumentException(q.key() + " is compared exactly; it has no tolerance field");
        }
        return f;
    }

    /** The tolerances the next run uses. */
    public Tolerances currentTolerances() {
        return tolerances;
    }

    /** True when the review shown is that of the file and tolerances as they are now. */
    public boolean current() {
        return job.now() == JobState.CURRENT;
    }
}
