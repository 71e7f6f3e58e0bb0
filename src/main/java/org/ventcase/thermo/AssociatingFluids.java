package org.ventcase.thermo;

import java.util.Map;

/**
 * Built-in fluids whose molecules hydrogen-bond (associate) in the vapour, and acetone, whose vapour
 * is strongly polar: a two-parameter cubic equation of state has no term for either, so its
 * saturated-vapour density comes out low and, through the Clapeyron equation, its latent heat high,
 * whatever the alpha function. The figures are the largest deviations of the default model's cubic
 * alone (its vapour root and its own latent heat, without the anchor) from the reference equations
 * of state in the test resources at Tr 0.65 to 0.9 (ethanol and acetone: saturation-reference-more.csv).
 */
final class AssociatingFluids {

    private static final Map<String, String> BY_CAS = Map.of(
            "67-56-1", "vapour density up to 9 % low and latent heat up to 10 % high (measured)",
            "64-17-5", "vapour density up to 5.3 % low and latent heat up to 1.2 % high (measured)",
            "7664-41-7", "vapour density up to 5 % low and latent heat up to 5 % high (measured)",
            "7732-18-5", "vapour density up to 3 % low and latent heat up to 3.5 % high (measured)",
            "67-64-1", "vapour density up to 5 % low and latent heat up to 7 % high (measured)");

    /** Acetone does not hydrogen-bond with itself; its vapour is strongly polar. */
    private static final String POLAR = "67-64-1";

    private AssociatingFluids() {
    }

    /** The warning for a component under the given model, or "" for a fluid not listed. */
    static String note(Component c, EosVariant variant) {
        String f = BY_CAS.get(c.cas());
        if (f == null) {
            return "";
        }
        String what = POLAR.equals(c.cas()) ? "its strongly polar vapour" : "hydrogen bonding in the vapour";
        if (variant == EosVariant.PRTWU && LatentHeatCorrelation.find(c).isPresent()) {
            return c.name() + ": a cubic equation of state does not describe " + what + ". For the "
                    + "pure fluid at saturation the default model therefore takes the latent heat from a published "
                    + "correlation (" + LatentHeatCorrelation.CITATION + ") and the saturated-vapour density from it "
                    + "by the Clapeyron equation. Elsewhere the vapour is the cubic's: against reference equations "
                    + "the cubic alone gives " + f + " at Tr 0.65-0.9 (docs/accuracy.md). So the Z used for sizing "
                    + "may be as much too high (a larger area), and in a mixture the latent heat as much too high "
                    + "(a fire relief load W = Q/L understated).";
        }
        return c.name() + ": a cubic equation of state does not describe " + what + ": against "
                + "reference equations the default model gives " + f + " at Tr 0.65-0.9 (docs/accuracy.md); a fire "
                + "relief load W = Q/L may be understated by as much: check the latent heat against measured data.";
    }
}
