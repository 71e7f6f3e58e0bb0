package org.ventcase.common;

/**
 * A numerical method that did not meet its tolerance within its iteration budget, or whose
 * bracket was lost. Carries the algorithm's name, the iterations spent, the last residual and a
 * short description of the state, so that the failure can be reproduced. The command line maps it
 * to exit code 3.
 */
public final class ConvergenceException extends VentcaseException {
    private static final long serialVersionUID = 1L;

    private final String algorithm;
    private final int iterations;
    private final double residual;

    public ConvergenceException(String algorithm, int iterations, double residual, String state) {
        super(algorithm + " did not converge after " + iterations + " iterations (last residual "
                + InvalidInputException.g(residual) + "); " + state);
        this.algorithm = algorithm;
        this.iterations = iterations;
        this.residual = residual;
    }

    public String algorithm() {
        return algorithm;
    }

    public int iterations() {
        return iterations;
    }

    public double residual() {
        return residual;
    }
}
