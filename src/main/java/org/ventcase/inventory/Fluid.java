package org.ventcase.inventory;

import java.util.List;
import java.util.Objects;

import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.Composition;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.mix.KijTable;

/**
 * The fluid a vessel holds, as the calculation uses it: components and mole fractions (of the
 * liquid for saturated and specified storage, of the gas for a gas-filled vessel), the cubic
 * equation of state, the k_ij matrix with the source of every entry, and the density basis asked
 * for. The {@link CubicModel} is built once here. Immutable and thread-safe.
 *
 * <p>Where a vapour space holds components the liquid does not (a nitrogen blanket), build the
 * fluid with {@link #withVapourSpace}: its component list is the union, the liquid's fractions of
 * the extra components are zero, and one model serves both phases.
 */
public final class Fluid {

    private final Composition composition;
    private final EosVariant variant;
    private final KijTable.Matrix kij;
    private final DensityBasis densityBasis;
    private final CubicModel model;

    /**
     * @param composition  components and mole fractions (field {@code fluid.composition})
     * @param variant      equation of state (field {@code fluid.eos})
     * @param kij          k_ij matrix for exactly these components, with sources
     * @param densityBasis density basis asked for (field {@code fluid.densityBasis})
     */
    public Fluid(Composition composition, EosVariant variant, KijTable.Matrix kij, DensityBasis densityBasis) {
        if (composition == null) {
            throw InvalidInputException.missing("fluid.composition", "expected components and mole fractions");
        }
        if (variant == null) {
            throw InvalidInputException.missing("fluid.eos", "expected one of " + EosVariant.ACCEPTED);
        }
        if (densityBasis == null) {
            throw InvalidInputException.missing("fluid.densityBasis", "expected translated or cubic");
        }
        Objects.requireNonNull(kij, "kij");
        if (kij.kij().length != composition.size()) {
            throw InvalidInputException.invalid("fluid.kij", kij.kij().length + " x " + kij.kij().length,
                    "expected a " + composition.size() + " x " + composition.size() + " matrix, one row per component");
        }
        this.composition = composition;
        this.variant = variant;
        this.kij = kij;
        this.densityBasis = densityBasis;
        this.model = new CubicModel(variant, composition.components(), kij.kij());
    }

    /** A fluid with the built-in k_ij table (zero, with a warning, for pairs it does not list). */
    public static Fluid of(Composition composition, EosVariant variant, DensityBasis densityBasis) {
        if (composition == null) {
            throw InvalidInputException.missing("fluid.composition", "expected components and mole fractions");
        }
        if (variant == null) {
            throw InvalidInputException.missing("fluid.eos", "expected one of " + EosVariant.ACCEPTED);
        }
        return new Fluid(composition, variant, KijTable.builtIn().matrix(composition.components(), variant),
                densityBasis);
    }

    /**
     * A liquid under a vapour space of another composition: the component list is the liquid's
     * followed by the vapour's extra components (zero in the liquid); built-in k_ij table.
     */
    public static Fluid withVapourSpace(Composition liquid, Composition vapour, EosVariant variant,
                                        DensityBasis densityBasis) {
        if (vapour == null) {
            throw InvalidInputException.missing("storage.vapour", "expected the vapour-space composition");
        }
        List<Component> all = Composition.union(liquid, vapour);
        return of(liquid.over("fluid.composition", all), variant, densityBasis);
    }

    /** Components and mole fractions of the liquid (saturated, specified) or gas (gas-filled). */
    public Composition composition() {
        return composition;
    }

    public List<Component> components() {
        return composition.components();
    }

    public EosVariant variant() {
        return variant;
    }

    /** The k_ij matrix in use, with the source of each entry and the warnings for defaulted pairs. */
    public KijTable.Matrix kij() {
        return kij;
    }

    /** The density basis asked for (the one used is stated per phase in the result). */
    public DensityBasis densityBasis() {
        return densityBasis;
    }

    /** The cubic model over {@link #components()}. */
    public CubicModel model() {
        return model;
    }

    /** Whether exactly one component has a non-zero fraction. */
    public boolean isPure() {
        return composition.present().length == 1;
    }
}
