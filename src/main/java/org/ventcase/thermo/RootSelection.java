package org.ventcase.thermo;

/**
 * The root chosen for a requested phase and why.
 *
 * @param z          the chosen compressibility factor (raw cubic root)
 * @param roots      all real roots
 * @param reason     one sentence: which root was chosen and why
 * @param liquidLike whether the chosen root is the liquid-like one (smaller volume) by the
 *                   criterion stated in {@link CubicModel#select}
 * @param requestedMissing true when the caller asked for a liquid or vapour root that does not
 *                   exist at these conditions (only one real root); the single root is returned
 */
public record RootSelection(double z, CubicRoots roots, String reason, boolean liquidLike, boolean requestedMissing) {
}
