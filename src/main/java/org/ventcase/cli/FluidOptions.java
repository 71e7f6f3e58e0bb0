package org.ventcase.cli;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.Compositions;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.mix.KijTable;
import org.ventcase.thermo.mix.MixtureModel;

import picocli.CommandLine.Option;

/** The fluid options of the mixture commands: composition, normalising and k_ij overrides. */
final class FluidOptions {

    @Option(names = "--fluid", required = true, paramLabel = "FLUID",
            description = "A component (\"propane\") or mole fractions (\"propane:0.7,n-butane:0.3\").")
    String fluid;

    @Option(names = "--normalize", description = "Scale mole fractions that do not sum to 1 instead of refusing them.")
    boolean normalize;

    @Option(names = "--kij", paramLabel = "A/B=VALUE", split = ";",
            description = "Override a binary interaction parameter, e.g. \"carbon dioxide/propane=0.12\"; repeatable.")
    List<String> kij;

    org.ventcase.thermo.Composition composition() {
        return Compositions.parse("--fluid", fluid, normalize);
    }

    MixtureModel model(org.ventcase.thermo.Composition c, EosVariant v) {
        Map<KijTable.Pair, Double> overrides = new LinkedHashMap<>();
        if (kij != null) {
            for (String s : kij) {
                int slash = s.indexOf('/');
                int eq = s.indexOf('=');
                if (slash <= 0 || eq < slash) {
                    throw InvalidInputException.invalid("--kij", s, "expected A/B=VALUE, e.g. \"methane/ethane=0.005\"");
                }
                String a = org.ventcase.thermo.ComponentLibrary.builtIn().get("--kij", s.substring(0, slash).trim()).name();
                String b = org.ventcase.thermo.ComponentLibrary.builtIn().get("--kij", s.substring(slash + 1, eq).trim())
                        .name();
                double val;
                try {
                    val = Double.parseDouble(s.substring(eq + 1).trim());
                } catch (NumberFormatException e) {
                    throw InvalidInputException.invalid("--kij", s, "expected a number after '='");
                }
                if (!(Math.abs(val) < 1)) {
                    throw InvalidInputException.outOfRange("--kij", val, -1, 1, "");
                }
                overrides.put(KijTable.Pair.of(a, b), val);
            }
        }
        return MixtureModel.of(c.components(), v, overrides);
    }
}
