package org.ventcase.thermo;

/** How many real roots the cubic in Z has at the stated conditions. */
public enum RootCase {
    /** One real root: only one phase-like volume exists. */
    ONE_REAL("one real root"),
    /** Three distinct real roots: smallest liquid-like, largest vapour-like, middle unphysical. */
    THREE_DISTINCT("three distinct real roots"),
    /** Two of the three roots coincide: a spinodal (limit of mechanical stability). */
    DOUBLE("a double root (spinodal)"),
    /** All three roots coincide: the critical point of the equation. */
    TRIPLE("a triple root (critical point)");

    private final String words;

    RootCase(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }
}
