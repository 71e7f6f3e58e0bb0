package org.ventcase.thermo;

import java.util.List;

import org.ventcase.common.InvalidInputException;

/**
 * A pure component's constants, as used by the cubic equations of state, with where each came
 * from. Immutable. Built-in rows come from {@code components.csv} (see {@link ComponentLibrary});
 * a case may define a custom component with the same fields.
 *
 * @param name              preferred name, lower case (e.g. "propane", "n-butane")
 * @param formula           molecular formula in Hill order (e.g. "C3H8")
 * @param cas               CAS registry number (e.g. "74-98-6"), or "" for a custom component
 * @param aliases           other names accepted on lookup (lower case)
 * @param tcK               critical temperature, K
 * @param pcPa              critical pressure, Pa
 * @param omega             Pitzer acentric factor
 * @param molarMass         molar mass, kg/kmol (= g/mol)
 * @param normalBoilingK    normal boiling point at 101.325 kPa, K
 * @param criticalSource    source of Tc, Pc, omega, molar mass and Tb
 * @param cp                ideal-gas heat capacity correlation (carries its own source and range)
 * @param rackettZ          Rackett compressibility Z_RA (Spencer and Danner form), used for the
 *                          saturated-liquid density cross-check and for the Peneloux volume shift
 * @param rackettSource     source of Z_RA
 */
public record Component(String name, String formula, String cas, List<String> aliases,
                        double tcK, double pcPa, double omega, double molarMass, double normalBoilingK,
                        String criticalSource, IdealGasCp cp, double rackettZ, String rackettSource) {

    public Component {
        String where = "component '" + name + "'";
        if (name == null || name.isBlank()) {
            throw InvalidInputException.missing("component.name", "expected a non-empty name");
        }
        aliases = aliases == null ? List.of() : List.copyOf(aliases);
        formula = formula == null ? "" : formula;
        cas = cas == null ? "" : cas;
        InvalidInputException.requireInRange(where + ".Tc", tcK, 1, 2000, "K");
        InvalidInputException.requireInRange(where + ".Pc", pcPa, 1e4, 1e9, "Pa");
        InvalidInputException.requireInRange(where + ".omega", omega, -0.5, 2.0, "");
        InvalidInputException.requireInRange(where + ".molarMass", molarMass, 1, 2000, "kg/kmol");
        InvalidInputException.requireInRange(where + ".Tb", normalBoilingK, 1, 2000, "K");
        InvalidInputException.requireInRange(where + ".Z_RA", rackettZ, 0.1, 0.4, "");
        if (cp == null) {
            throw InvalidInputException.missing(where + ".cp", "expected an ideal-gas Cp correlation");
        }
        if (criticalSource == null || criticalSource.isBlank()) {
            throw InvalidInputException.missing(where + ".criticalSource", "every datum needs a source");
        }
        if (rackettSource == null || rackettSource.isBlank()) {
            throw InvalidInputException.missing(where + ".rackettSource", "every datum needs a source");
        }
    }

    private static final java.util.regex.Pattern HYDROCARBON = java.util.regex.Pattern.compile("C\\d*H\\d*");

    /**
     * Whether the formula has carbon and hydrogen only (the scope of the published minimum
     * latent heat for near-critical hydrocarbons).
     */
    public boolean isHydrocarbon() {
        return HYDROCARBON.matcher(formula).matches();
    }

    /** Molar mass in kg/mol (SI inside the calculations). */
    public double molarMassKgPerMol() {
        return molarMass * 1e-3;
    }
}
