package org.ventcase.thermo;

import java.util.Arrays;

/**
 * The real roots of a cubic in Z, already split into physical roots (Z > B, ascending) and
 * roots at or below the co-volume (no physical meaning, reported for completeness).
 *
 * @param physical ascending roots with Z > B (one or more; copied)
 * @param rejected real roots with Z <= B (copied)
 * @param rootCase classification of the real roots of the whole cubic
 */
public record CubicRoots(double[] physical, double[] rejected, RootCase rootCase) {

    public CubicRoots {
        physical = physical.clone();
        rejected = rejected.clone();
    }

    @Override
    public double[] physical() {
        return physical.clone();
    }

    @Override
    public double[] rejected() {
        return rejected.clone();
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
