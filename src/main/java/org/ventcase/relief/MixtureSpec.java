package org.ventcase.relief;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.mix.KijTable;

/**
 * A fluid as the relief scenarios use it: components, equation of state, binary interaction
 * parameters, a composition (mole fractions) and the density basis. One component with
 * composition {1} is a pure fluid.
 *
 * @param eos           equation of state
 * @param components    components in order
 * @param kij           symmetric k_ij matrix (copied); zeros where none apply
 * @param kijWarnings   what the k_ij table had to assume (printed with the result)
 * @param composition   mole fractions, summing to 1 within 1e-6 (normalised copy)
 * @param densityBasis  density basis for volumes and densities (TRANSLATED or CUBIC)
 */
public record MixtureSpec(EosVariant eos, List<Component> components, double[][] kij, List<String> kijWarnings,
                          double[] composition, DensityBasis densityBasis) {

    public MixtureSpec {
        if (eos == null) {
            throw InvalidInputException.missing("fluid.eos", "expected an equation of state: " + org.ventcase.thermo.EosVariant.ACCEPTED);
        }
        if (components == null || components.isEmpty()) {
            throw InvalidInputException.missing("fluid.components", "expected at least one component");
        }
        components = List.copyOf(components);
        int n = components.size();
        if (composition == null || composition.length != n) {
            throw InvalidInputException.invalid("fluid.composition",
                    composition == null ? "missing" : composition.length + " fractions",
                    "expected " + n + " mole fractions, one per component");
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            if (!(composition[i] >= 0 && composition[i] <= 1)) {
                throw InvalidInputException.outOfRange("fluid.composition[" + i + "]", composition[i], 0, 1, "");
            }
            sum += composition[i];
        }
        if (!(Math.abs(sum - 1) <= 1e-6)) {
            throw InvalidInputException.invalid("fluid.composition", String.format(Locale.US, "sum %.9g", sum),
                    "mole fractions must sum to 1 within 1e-6");
        }
        double[] z = new double[n];
        for (int i = 0; i < n; i++) {
            z[i] = composition[i] / sum;
        }
        composition = z;
        double[][] k = new double[n][n];
        if (kij != null) {
            if (kij.length != n) {
                throw InvalidInputException.invalid("fluid.kij", kij.length + " rows", "expected " + n + " rows");
            }
            for (int i = 0; i < n; i++) {
                if (kij[i] == null || kij[i].length != n) {
                    throw InvalidInputException.invalid("fluid.kij[" + i + "]", "wrong length", "expected " + n
                            + " values");
                }
                k[i] = kij[i].clone();
            }
        }
        kij = k;
        kijWarnings = kijWarnings == null ? List.of() : List.copyOf(kijWarnings);
        if (densityBasis == null) {
            throw InvalidInputException.missing("fluid.densityBasis", "expected TRANSLATED or CUBIC");
        }
    }

    /** A pure fluid. */
    public static MixtureSpec pure(EosVariant eos, Component c, DensityBasis basis) {
        return new MixtureSpec(eos, List.of(c), null, List.of(), new double[] {1.0}, basis);
    }

    /** A mixture with the built-in k_ij table (pairs not in the table get 0 with a warning). */
    public static MixtureSpec withBuiltInKij(EosVariant eos, List<Component> components, double[] composition,
                                             DensityBasis basis) {
        if (components == null || components.isEmpty()) {
            throw InvalidInputException.missing("fluid.components", "expected at least one component");
        }
        if (eos == null) {
            throw InvalidInputException.missing("fluid.eos", "expected an equation of state");
        }
        KijTable.Matrix m = KijTable.builtIn().matrix(components, eos);
        return new MixtureSpec(eos, components, m.kij(), m.warnings(), composition, basis);
    }

    /** The same fluid at another composition. */
    public MixtureSpec withComposition(double[] x) {
        return new MixtureSpec(eos, components, kij, kijWarnings, x, densityBasis);
    }

    /** The cubic model of these components. */
    public CubicModel model() {
        return new CubicModel(eos, components, kij);
    }

    @Override
    public double[][] kij() {
        double[][] out = new double[kij.length][];
        for (int i = 0; i < kij.length; i++) {
            out[i] = kij[i].clone();
        }
        return out;
    }

    @Override
    public double[] composition() {
        return composition.clone();
    }

    /** Component names in order. */
    public List<String> names() {
        List<String> out = new ArrayList<>();
        for (Component c : components) {
            out.add(c.name());
        }
        return out;
    }

    /** Whether every component present is a hydrocarbon (scope of the near-critical minimum latent heat). */
    public boolean allHydrocarbon() {
        for (int i = 0; i < components.size(); i++) {
            if (composition[i] > 0 && !components.get(i).isHydrocarbon()) {
                return false;
            }
        }
        return true;
    }
}
