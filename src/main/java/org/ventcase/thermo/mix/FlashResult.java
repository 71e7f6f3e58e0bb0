package org.ventcase.thermo.mix;

import java.util.List;

/**
 * Result of a PT, PH or PS flash.
 *
 * @param temperatureK      K
 * @param pressurePa        Pa absolute
 * @param feed              feed mole fractions (normalised copy)
 * @param vaporFraction     moles of vapour per mole of feed; for a single phase 1 when its
 *                          root is vapour-like and 0 when liquid-like (by v against
 *                          v* = (Zc/Omega_b) b, as {@link org.ventcase.thermo.CubicModel#select})
 * @param phases            one phase, or two (liquid first, then vapour)
 * @param enthalpyJmol      feed molar enthalpy, J/mol (reference in {@link MixtureThermo})
 * @param entropyJmolK      feed molar entropy, J/(mol K)
 * @param molarMass         feed molar mass, kg/kmol
 * @param stability         the stability test that decided single vs two phases
 * @param ssIterations      successive-substitution iterations of the flash
 * @param newtonIterations  second-order (Newton) iterations of the flash
 * @param outerIterations   outer iterations on T for PH/PS flashes (0 for a PT flash)
 * @param method            what was done, in words
 * @param warnings          what the user must know
 */
public record FlashResult(double temperatureK, double pressurePa, double[] feed, double vaporFraction,
                          List<MixturePhase> phases, double enthalpyJmol, double entropyJmolK, double molarMass,
                          StabilityResult stability, int ssIterations, int newtonIterations, int outerIterations,
                          String method, List<String> warnings) {
    public FlashResult {
        feed = feed.clone();
        phases = List.copyOf(phases);
        warnings = List.copyOf(warnings);
    }

    @Override
    public double[] feed() {
        return feed.clone();
    }

    /** Number of phases (1 or 2). */
    public int phaseCount() {
        return phases.size();
    }

    /** Whether two phases coexist. */
    public boolean twoPhase() {
        return phases.size() == 2;
    }

    /** K_i = y_i/x_i for a two-phase result. */
    public double[] kValues() {
        if (!twoPhase()) {
            throw new IllegalStateException("K-values exist only for a two-phase result");
        }
        double[] x = phases.get(0).composition();
        double[] y = phases.get(1).composition();
        double[] k = new double[x.length];
        for (int i = 0; i < k.length; i++) {
            k[i] = y[i] / x[i];
        }
        return k;
    }
}
