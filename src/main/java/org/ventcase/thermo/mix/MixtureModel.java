package org.ventcase.thermo.mix;

import java.util.List;
import java.util.Map;

import org.ventcase.thermo.Component;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.EosVariant;

/**
 * A cubic model for a list of components with the k_ij matrix that was used and where each
 * entry came from: what every front end needs to build and then to report.
 *
 * @param model the equation of state applied to the components
 * @param kij   the matrix, with the source of each entry and warnings for missing pairs
 */
public record MixtureModel(CubicModel model, KijTable.Matrix kij) {

    /** Builds with the built-in k_ij table and optional per-pair overrides. */
    public static MixtureModel of(List<Component> components, EosVariant variant,
                                  Map<KijTable.Pair, Double> overrides) {
        KijTable.Matrix m = KijTable.builtIn().matrix(components, variant, overrides == null ? Map.of() : overrides);
        return new MixtureModel(new CubicModel(variant, components, m.kij()), m);
    }
}
