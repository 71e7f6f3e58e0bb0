package org.ventcase.thermo;

import java.util.Locale;

/**
 * The root chosen for a requested phase, with what is needed to say why. The sentence is built
 * only when asked for ({@link #reason()}), so that the hot path allocates no text.
 *
 * @param z          the chosen compressibility factor (raw cubic root)
 * @param roots      all real roots
 * @param request    what the caller asked for
 * @param liquidLike whether the chosen root is the liquid-like one
 * @param requestedMissing true when the caller asked for a liquid or vapour root that does not
 *                   exist at these conditions (only one real root); the single root is returned
 * @param gLiquid    G^R/RT of the smallest root when two were compared, else 0 (unused)
 * @param gVapor     G^R/RT of the largest root when two were compared, else 0 (unused)
 */
public record RootSelection(double z, CubicRoots roots, PhaseRequest request, boolean liquidLike,
                            boolean requestedMissing, double gLiquid, double gVapor) {

    /** One sentence: which root was chosen and why. */
    public String reason() {
        if (roots.count() == 1) {
            return String.format(Locale.US,
                    "one physical root Z = %.6g; it is %s (molar volume %s v* = (Zc/Omega_b) b)", z,
                    liquidLike ? "liquid-like" : "vapour-like", liquidLike ? "below" : "above");
        }
        switch (request) {
            case LIQUID:
                return String.format(Locale.US, "%s; liquid requested: smallest root Z = %.6g",
                        roots.rootCase().words(), z);
            case VAPOR:
                return String.format(Locale.US, "%s; vapour requested: largest root Z = %.6g",
                        roots.rootCase().words(), z);
            default:
                return String.format(Locale.US,
                        "%s; stable root by lowest Gibbs energy: G^R/RT = %.6g at Z = %.6g (liquid-like), "
                                + "%.6g at Z = %.6g (vapour-like); chose %s",
                        roots.rootCase().words(), gLiquid, roots.smallest(), gVapor, roots.largest(),
                        liquidLike ? "liquid-like" : "vapour-like");
        }
    }
}
