package org.ventcase.ui;

/**
 * Where a background job of a view model stands: the wizard's live calculation, a review or an
 * audit. Each mode uses the states that apply to it (only the wizard has {@link #INVALID}, the audit
 * has no {@link #WAITING}: it starts on a button, not after edits).
 */
public enum JobState {
    /** Nothing asked for yet (no case, no claimed-value file, no register). */
    IDLE,
    /** An edit arrived: the job starts again when the edits have paused for the debounce time. */
    WAITING,
    /** The job is running. */
    RUNNING,
    /** The result shown is that of the inputs as they are now. */
    CURRENT,
    /** The case has problems: no new numbers until the marked fields are fixed. */
    INVALID,
    /** The engineer cancelled the run; the result shown (if any) is of earlier inputs. */
    CANCELLED,
    /** The job stopped with an error; the view model's message says why. */
    FAILED
}
