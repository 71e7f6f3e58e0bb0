package org.ventcase.thermo;

/** What a single phase is called on the output. */
public enum PhaseLabel {
    LIQUID("liquid"),
    VAPOR("vapor"),
    SUPERCRITICAL("supercritical");

    private final String label;

    PhaseLabel(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
