package org.ventcase.common;

/**
 * The question has no answer at the stated conditions, as a matter of physics rather than of
 * numerics: for example a saturation pressure asked above the critical temperature, or a bubble
 * point above the cricondenbar. The message says why. The command line maps it to exit code 2,
 * since the input asked for something that does not exist.
 */
public final class NoSolutionException extends VentcaseException {
    private static final long serialVersionUID = 1L;

    private final String field;

    public NoSolutionException(String field, String message) {
        super(field + ": " + message);
        this.field = field;
    }

    public String field() {
        return field;
    }
}
