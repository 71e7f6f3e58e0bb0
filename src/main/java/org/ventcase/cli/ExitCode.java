package org.ventcase.cli;

/** Exit codes of the command line, listed in every command's help. */
public final class ExitCode {
    /** The command did what was asked. */
    public static final int OK = 0;
    /** A fault in Ventcase itself; please report it. */
    public static final int INTERNAL = 1;
    /** Invalid input or usage; the message names the option or field. */
    public static final int INVALID_INPUT = 2;
    /** A numerical method did not converge; the message says which and where. */
    public static final int NO_CONVERGENCE = 3;
    /** A file could not be read or written. */
    public static final int IO = 4;

    private ExitCode() {
    }

    static final String HELP_LIST = "%nExit codes:%n  0  done%n  1  internal error (please report)%n"
            + "  2  invalid input or usage (the message names the option or field)%n"
            + "  3  a numerical method did not converge%n  4  file could not be read or written%n";
}
