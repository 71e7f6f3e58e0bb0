package org.ventcase.cli;

import org.ventcase.common.PhysicalConstants;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.units.Units;

import picocli.CommandLine.Option;

/** Options shared by the property commands. */
final class CommonOptions {

    @Option(names = "--eos", paramLabel = "NAME", defaultValue = "PR-Twu", completionCandidates = EosNames.class,
            description = "Equation of state, one of ${COMPLETION-CANDIDATES} (PR is taken as PR78). PR-Twu is "
                    + "Peng-Robinson with the Twu alpha and a temperature-dependent volume translation. Default: ${DEFAULT-VALUE}.")
    String eos;

    /** The offered variant names, read from {@link EosVariant#OFFERED} (one registry). */
    static final class EosNames implements Iterable<String> {
        @Override
        public java.util.Iterator<String> iterator() {
            return EosVariant.offeredIds().iterator();
        }
    }

    @Option(names = "--density-basis", paramLabel = "BASIS", defaultValue = "translated",
            description = "Liquid-density basis: translated (default; the model's volume translation: "
                    + "temperature-dependent for PR-Twu, a constant Peneloux-type shift for SRK, PR76 and PR78) or "
                    + "cubic (the raw equation's volume).")
    String densityBasis;

    @Option(names = "--atmosphere", paramLabel = "P", defaultValue = "101.325 kPaa",
            description = "Site atmospheric pressure, used to convert gauge pressures. Default: ${DEFAULT-VALUE}.")
    String atmosphere;

    @Option(names = "--json", description = "Print the documented JSON result instead of the table.")
    boolean json;

    EosVariant variant() {
        return EosVariant.parse("--eos", eos);
    }

    DensityBasis basis() {
        switch (densityBasis.trim().toLowerCase(java.util.Locale.ROOT)) {
            case "translated":
                return DensityBasis.TRANSLATED;
            case "cubic":
            case "raw":
                return DensityBasis.CUBIC;
            default:
                throw org.ventcase.common.InvalidInputException.invalid("--density-basis", densityBasis,
                        "expected translated or cubic");
        }
    }

    double atmosphericPa() {
        double p = Units.parsePressure("--atmosphere", atmosphere, PhysicalConstants.ATM_PA);
        org.ventcase.common.InvalidInputException.requireInRange("--atmosphere", p, 50e3, 110e3, "Pa");
        return p;
    }
}
