package org.ventcase.inventory;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.Composition;
import org.ventcase.thermo.DensityBasis;

/**
 * The contents of one phase of a vessel. SI; molar mass in kg/kmol.
 *
 * <p>Equations: m = V rho; n = m / M (M in kg/mol); m_i = n x_i M_i, so that sum m_i = m.
 *
 * @param phase              "liquid" or "vapour"
 * @param volumeM3           volume the phase occupies, m3 (&gt;= 0)
 * @param densityKgM3        density, kg/m3 (&gt; 0), on {@code densityBasis}
 * @param densityBasis       the basis actually used (translated or cubic)
 * @param z                  cubic compressibility factor of the root used (before translation)
 * @param massKg             m = V rho, kg
 * @param moles              n, mol
 * @param molarMassKgKmol    M = sum x_i M_i, kg/kmol
 * @param composition        mole fractions of this phase over the fluid's components
 * @param massPerComponentKg component name -> kg, in the fluid's order (zeros included)
 */
public record PhaseInventory(String phase, double volumeM3, double densityKgM3, DensityBasis densityBasis, double z,
                             double massKg, double moles, double molarMassKgKmol, Composition composition,
                             Map<String, Double> massPerComponentKg) {

    public PhaseInventory {
        if (!(volumeM3 >= 0) || Double.isInfinite(volumeM3)) {
            throw InvalidInputException.invalid(phase + ".volume", volumeM3, "expected a finite volume >= 0 m3");
        }
        InvalidInputException.requirePositive(phase + ".density", densityKgM3, "kg/m3");
        massPerComponentKg = Collections.unmodifiableMap(new LinkedHashMap<>(massPerComponentKg));
    }

    /** Builds a phase from its volume, density and composition. */
    public static PhaseInventory of(String phase, double volumeM3, double densityKgM3, DensityBasis basis, double z,
                                    Composition x) {
        double mass = volumeM3 * densityKgM3;
        double mw = x.molarMass();
        double moles = mass / (mw * 1e-3);
        Map<String, Double> per = new LinkedHashMap<>();
        for (int i = 0; i < x.size(); i++) {
            per.put(x.components().get(i).name(), moles * x.fraction(i) * x.components().get(i).molarMass() * 1e-3);
        }
        return new PhaseInventory(phase, volumeM3, densityKgM3, basis, z, mass, moles, mw, x, per);
    }

    /** Specific volume 1/rho, m3/kg. */
    public double specificVolumeM3Kg() {
        return 1.0 / densityKgM3;
    }
}
