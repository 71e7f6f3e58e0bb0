package org.ventcase.thermo.mix;

import java.util.List;

/**
 * Outcome of the tangent-plane-distance stability test of one feed at (T, P).
 *
 * @param temperatureK          K
 * @param pressurePa            Pa absolute
 * @param stable                true when no trial phase found a negative tangent-plane distance
 * @param minimumTpd            smallest modified tangent-plane distance tm found at a stationary
 *                              point (or, where a trial stopped early because it had already shown
 *                              instability, at that point); dimensionless, per mole of trial phase
 *                              scaled as in Michelsen (1982)
 * @param incipientComposition  normalised composition of the trial phase with that tm (equal to
 *                              the feed where every trial collapsed to the trivial solution)
 * @param incipientVapourLike   whether that trial phase has a larger molar volume than the feed
 * @param trial                 which trial gave it ("Wilson vapour-like", "Wilson liquid-like",
 *                              "pure <name>")
 * @param iterations            total iterations over all trials
 * @param warnings              trials that did not converge, and the like
 */
public record StabilityResult(double temperatureK, double pressurePa, boolean stable, double minimumTpd,
                              double[] incipientComposition, boolean incipientVapourLike, String trial,
                              int iterations, List<String> warnings) {
    public StabilityResult {
        incipientComposition = incipientComposition.clone();
        warnings = List.copyOf(warnings);
    }

    @Override
    public double[] incipientComposition() {
        return incipientComposition.clone();
    }
}
