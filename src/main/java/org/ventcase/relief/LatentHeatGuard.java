package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;
import org.ventcase.units.CustomaryUnits;

/**
 * Applies the minimum latent heat used for hydrocarbons near their critical point in the
 * wetted-vessel fire case: when the computed latent heat is below 50 Btu/lb, 50 Btu/lb is used.
 *
 * <p>50 Btu/lb = 50 x 2326 J/kg = 116,300 J/kg exactly (the International Table Btu per pound is
 * 2.326 kJ/kg by definition: 1055.05585262 J / 0.45359237 kg).
 *
 * <p>Source: API Std 521 5th ed. 2007 / ISO 23251:2006, fire-case relief rate clause
 * (5.15.2.2.1, from memory); REFERENCES.md section 1 [S]. Near or above the critical point the
 * latent-heat method itself is questionable; the stepwise method (REFERENCES.md section 1) is
 * preferred and this guard only keeps the simple method from dividing by a tiny number.
 */
public final class LatentHeatGuard {

    /** Minimum latent heat, J/kg: 50 Btu/lb exactly converted. */
    public static final double MINIMUM_J_PER_KG = 50 * CustomaryUnits.J_PER_KG_PER_BTU_PER_LB;

    /**
     * The latent heat to use and whether the minimum was applied.
     *
     * @param computedJPerKg latent heat as computed, J/kg
     * @param usedJPerKg     latent heat to use, J/kg (at least {@link #MINIMUM_J_PER_KG})
     * @param minimumApplied true when the computed value was below the minimum
     * @param warning        text to print when the minimum was applied, else empty
     */
    public record Result(double computedJPerKg, double usedJPerKg, boolean minimumApplied, String warning) {
    }

    private LatentHeatGuard() {
    }

    /** Applies the minimum to a computed latent heat (J/kg, must be positive). */
    public static Result apply(double computedJPerKg) {
        InvalidInputException.requirePositive("fire.latentHeat", computedJPerKg, "J/kg");
        if (computedJPerKg < MINIMUM_J_PER_KG) {
            return new Result(computedJPerKg, MINIMUM_J_PER_KG, true, String.format(java.util.Locale.US,
                    "Latent heat %.4g kJ/kg is below the near-critical minimum of 116.3 kJ/kg (50 Btu/lb) used for "
                            + "hydrocarbons; the minimum was used. The contents are near their critical point: "
                            + "consider the stepwise (dv/dh) method.", computedJPerKg / 1000));
        }
        return new Result(computedJPerKg, computedJPerKg, false, "");
    }
}
