package org.ventcase.app;

import java.util.function.BooleanSupplier;

import org.ventcase.casefile.ValidatedCase;
import org.ventcase.report.UnitSystem;

/**
 * What the wizard's results and export steps ask of the calculation: one call for the whole
 * case, returning a summary the results step shows row by row, and the calculation sheet where one
 * can be made. The wizard knows only this interface; the implementation is chosen in one place
 * ({@link #standard()}): {@link PipelineCaseRunner}, the full case pipeline.
 * Implementations are stateless, thread-safe and free of JavaFX: the wizard calls them off the
 * application thread, and a unit test or the command line can call them directly.
 */
public interface CaseRunner {

    /** Progress callback: fraction done 0..1 and a line saying what is being computed. */
    @FunctionalInterface
    interface Progress {
        void update(double fraction, String message);

        /** A callback that ignores progress. */
        static Progress none() {
            return (f, m) -> { };
        }
    }

    /** Thrown when a run notices {@code cancelled} and stops. */
    final class Cancelled extends RuntimeException {
        private static final long serialVersionUID = 1L;

        public Cancelled() {
            super("calculation cancelled");
        }
    }

    /**
     * Runs every scenario of a validated case.
     *
     * @param kase      the case, validated
     * @param progress  progress callback (called from the calculating thread)
     * @param cancelled polled between steps; when true the run throws {@link Cancelled}
     */
    CaseSummary run(ValidatedCase kase, Progress progress, BooleanSupplier cancelled);

    /**
     * The calculation sheet of a case, or the reason none can be made yet.
     *
     * @param units unit system of the sheet's tables
     */
    SheetOutcome sheet(ValidatedCase kase, UnitSystem units, String toolVersion);

    /** The runner the wizard uses: the full case pipeline. */
    static CaseRunner standard() {
        return new PipelineCaseRunner();
    }
}
