package org.ventcase.thermo;

/** Which molar volume a density is computed from. */
public enum DensityBasis {
    /** The cubic equation's own volume. */
    CUBIC("cubic"),
    /**
     * The cubic volume minus the model's volume translation (temperature-dependent for PR-Twu, a constant
     * Peneloux-type shift for the others); phase equilibrium unchanged.
     */
    TRANSLATED("translated");

    private final String label;

    DensityBasis(String label) {
        this.label = label;
    }

    /** Lower-case label used in JSON and on the sheet. */
    public String label() {
        return label;
    }
}
