package org.ventcase.thermo;

/** Which root of the cubic a caller wants. */
public enum PhaseRequest {
    /** The smallest physical root (Z > B). */
    LIQUID,
    /** The largest root. */
    VAPOR,
    /** Of the smallest and largest roots, the one with the lower Gibbs energy. */
    STABLE
}
