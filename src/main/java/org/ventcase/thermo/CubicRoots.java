package org.ventcase.thermo;

import java.util.Arrays;

/**
 * The real roots of a cubic in Z, already split into physical roots (Z > B, ascending) and
 * roots at or below the co-volume (no physical meaning, reported for completeness). Immutable:
 * the accessors return copies.
 */
public final class CubicRoots {

    private final double[] physical;
    private final double[] rejected;
    private final RootCase rootCase;

    /**
     * @param physical ascending roots with Z > B (one or more; copied)
     * @param rejected real roots with Z <= B (copied)
     * @param rootCase classification of the real roots of the whole cubic
     */
    public CubicRoots(double[] physical, double[] rejected, RootCase rootCase) {
        this(physical.clone(), rejected.clone(), rootCase, true);
    }

    /** Takes ownership of the arrays (no copy): for the solver, which made them. */
    private CubicRoots(double[] physical, double[] rejected, RootCase rootCase, boolean owned) {
        this.physical = physical;
        this.rejected = rejected;
        this.rootCase = rootCase;
    }

    static CubicRoots owning(double[] physical, double[] rejected, RootCase rootCase) {
        return new CubicRoots(physical, rejected, rootCase, true);
    }

    /** Ascending physical roots (copy). */
    public double[] physical() {
        return physical.clone();
    }

    /** Roots at or below the co-volume (copy). */
    public double[] rejected() {
        return rejected.clone();
    }

    public RootCase rootCase() {
        return rootCase;
    }

    /** Number of physical roots. */
    public int count() {
        return physical.length;
    }

    /** Smallest physical root (liquid-like where there are two or more). */
    public double smallest() {
        return physical[0];
    }

    /** Largest physical root (vapour-like where there are two or more). */
    public double largest() {
        return physical[physical.length - 1];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CubicRoots r && Arrays.equals(physical, r.physical) && Arrays.equals(rejected, r.rejected)
                && rootCase == r.rootCase;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(physical) * 31 + rootCase.hashCode();
    }

    @Override
    public String toString() {
        return rootCase.words() + ": " + Arrays.toString(physical)
                + (rejected.length > 0 ? " (below co-volume: " + Arrays.toString(rejected) + ")" : "");
    }
}
