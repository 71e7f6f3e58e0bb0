package org.ventcase.common;

/**
 * Root of every exception Ventcase throws on purpose. Unchecked: domain code does not catch it;
 * the edges (command line, wizard, case-file loader) map its subtypes to messages and exit codes.
 */
public class VentcaseException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public VentcaseException(String message) {
        super(message);
    }

    public VentcaseException(String message, Throwable cause) {
        super(message, cause);
    }
}
