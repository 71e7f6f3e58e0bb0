package org.ventcase.device;

import java.util.List;

/**
 * The standard orifice chosen for a required area, and what it can pass.
 *
 * @param requiredAreaM2       required effective area, m2
 * @param orifice              selected designation
 * @param count                number of valves of that designation (1 unless the required area
 *                             exceeds the largest standard orifice)
 * @param selectedAreaM2       count x the orifice's effective area, m2
 * @param ratedCapacityKgPerS  W x selectedArea / requiredArea for the same relieving conditions, kg/s
 *                             (0 when no required flow was given)
 * @param marginPercent        100 (selectedArea / requiredArea - 1)
 * @param ruleApplied          the selection rule, in words
 */
public record OrificeSelection(double requiredAreaM2, Orifice orifice, int count, double selectedAreaM2,
                               double ratedCapacityKgPerS, double marginPercent, String ruleApplied) {

    /** Selected area, mm2. */
    public double selectedAreaMm2() {
        return selectedAreaM2 * 1e6;
    }

    /** Short designation such as "P" or "2 x T". */
    public String designation() {
        return count == 1 ? orifice.letter() : count + " x " + orifice.letter();
    }

    /** For records that want the chosen orifices spelled out one by one. */
    public List<Orifice> orifices() {
        return java.util.Collections.nCopies(count, orifice);
    }
}
