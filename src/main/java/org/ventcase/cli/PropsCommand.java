package org.ventcase.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.ventcase.casefile.JsonReports;
import org.ventcase.common.InvalidInputException;
import org.ventcase.report.DisplayUnits;
import org.ventcase.report.UnitSystem;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.units.CustomaryUnits;
import org.ventcase.units.Units;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code ventcase props}: single-phase properties of a pure fluid at (T, P). */
@Command(name = "props", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Properties of a pure fluid at a temperature and pressure from a cubic equation of state.",
        description = {"Reports every real root of the cubic in Z, which root was chosen and why, and the "
                + "phase's density, fugacity coefficient, residual enthalpy, heat capacities, Cp/Cv, "
                + "isentropic exponent, speed of sound and Joule-Thomson coefficient.",
                "Example: ventcase props --fluid propane --temperature \"300 K\" --pressure \"10 bara\""},
        footer = ExitCode.HELP_LIST)
final class PropsCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    CommonOptions common;

    @Option(names = "--fluid", required = true, paramLabel = "NAME",
            description = "Component by name, formula or CAS number (e.g. propane, C3H8, 74-98-6).")
    String fluid;

    @Option(names = "--temperature", required = true, paramLabel = "T",
            description = "Temperature with unit: K, C, F or R (e.g. \"45 C\").")
    String temperature;

    @Option(names = "--pressure", required = true, paramLabel = "P",
            description = "Pressure with unit and a/g for absolute/gauge: bara, barg, kPaa, kPag, MPaa, psia, "
                    + "psig... (e.g. \"10 bara\").")
    String pressure;

    @Option(names = "--phase", paramLabel = "PHASE", defaultValue = "stable",
            description = "Root to use: liquid (smallest), vapor (largest) or stable (lowest Gibbs energy). "
                    + "Default: ${DEFAULT-VALUE}.")
    String phase;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "Unit system of the printed properties: si or us (JSON is always SI). "
                    + "Default: ${DEFAULT-VALUE}.")
    String units;

    @Override
    public Integer call() {
        Component c = ComponentLibrary.builtIn().get("--fluid", fluid);
        double t = Units.temperatureK("--temperature", temperature);
        double p = Units.parsePressure("--pressure", pressure, common.atmosphericPa());
        PhaseRequest req = parsePhase(phase);
        UnitSystem system = UnitSystem.parse("--units", units);
        FluidProperties f = CubicModel.pure(common.variant(), c)
                .properties(t, p, new double[] {1.0}, req, common.basis());
        PrintWriter out = spec.commandLine().getOut();
        if (common.json) {
            out.print(JsonReports.write(JsonReports.props(f, c)));
            return ExitCode.OK;
        }
        Text tx = new Text(out);
        boolean us = system == UnitSystem.US;
        DisplayUnits u = new DisplayUnits(system);
        tx.title(String.format(Locale.ROOT, "%s at %s, %s  [%s]", c.name(),
                us ? Text.plain(u.format(DisplayUnits.Kind.TEMPERATURE, t)) : Text.temperature(t),
                us ? Text.plain(u.format(DisplayUnits.Kind.PRESSURE_ABS, p)) : Text.pressure(p, common.atmosphericPa()),
                f.variant().displayName()));
        tx.row("Real roots of the cubic (Z)", Text.roots(f.roots().physical()) + "  (" + f.roots().rootCase().words()
                + ")");
        if (f.roots().rejected().length > 0) {
            tx.row("Roots below co-volume", Text.roots(f.roots().rejected()) + " (no physical meaning)");
        }
        tx.row("Root chosen", f.rootReason());
        tx.row("Phase", f.phase().label());
        tx.row("Z (cubic root)", "%.6f", f.z());
        if (us) {
            tx.row("Density", "%s (%s basis; cubic %s)",
                    Text.plain(u.plain(DisplayUnits.Kind.DENSITY, f.density())), f.densityBasis().label(),
                    Text.plain(u.plain(DisplayUnits.Kind.DENSITY, f.molarMass() * 1e-3 / f.molarVolumeCubic())));
            tx.row("Molar volume", "%.6g ft3/lbmol", CustomaryUnits.m3PerMolToFt3PerLbmol(f.molarVolume()));
            tx.row("Fugacity coefficient", "%.6g", f.fugacityCoefficient(0));
            tx.row("Residual enthalpy H-H_ig", "%.1f Btu/lbmol", CustomaryUnits.jPerMolToBtuPerLbmol(f.residualEnthalpy()));
            tx.row("Residual entropy S-S_ig", "%.4f Btu/(lbmol R)", CustomaryUnits.jPerMolKToBtuPerLbmolR(f.residualEntropy()));
            tx.row("Cp ideal gas / real", "%.3f / %.3f Btu/(lbmol R)", CustomaryUnits.jPerMolKToBtuPerLbmolR(f.cpIdeal()),
                    CustomaryUnits.jPerMolKToBtuPerLbmolR(f.cp()));
            tx.row("Cv real", "%.3f Btu/(lbmol R)", CustomaryUnits.jPerMolKToBtuPerLbmolR(f.cv()));
        } else {
            tx.row("Density", "%.4g kg/m3 (%s basis; cubic %.4g kg/m3)", f.density(), f.densityBasis().label(),
                    f.molarMass() * 1e-3 / f.molarVolumeCubic());
            tx.row("Molar volume", "%.6g m3/mol", f.molarVolume());
            tx.row("Fugacity coefficient", "%.6g", f.fugacityCoefficient(0));
            tx.row("Residual enthalpy H-H_ig", "%.1f J/mol", f.residualEnthalpy());
            tx.row("Residual entropy S-S_ig", "%.4f J/(mol K)", f.residualEntropy());
            tx.row("Cp ideal gas / real", "%.3f / %.3f J/(mol K)", f.cpIdeal(), f.cp());
            tx.row("Cv real", "%.3f J/(mol K)", f.cv());
        }
        tx.row("k = Cp/Cv ideal gas / real", "%.4f / %.4f", f.kIdeal(), f.kReal());
        tx.row("Isentropic exponent", "%.4f", f.isentropicExponent());
        tx.row("Speed of sound", !Double.isFinite(f.speedOfSound()) ? "not defined (see warnings)"
                : us ? String.format(Locale.ROOT, "%.1f ft/s", f.speedOfSound() / CustomaryUnits.M_PER_FT)
                : String.format(Locale.ROOT, "%.1f m/s", f.speedOfSound()));
        if (us) {
            // K/Pa -> F/psi: a temperature difference of 1 K is 1.8 F
            tx.row("Joule-Thomson coefficient", "%.4g F/psi",
                    f.jouleThomson() / CustomaryUnits.K_PER_R * CustomaryUnits.PA_PER_PSI);
        } else {
            tx.row("Joule-Thomson coefficient", "%.4g K/bar", f.jouleThomson() * 1e5);
        }
        Text.modelRows(tx, f.variant(), c, u);
        tx.us(us).warnings(f.warnings());
        return ExitCode.OK;
    }

    static PhaseRequest parsePhase(String s) {
        switch (s.trim().toLowerCase(Locale.ROOT)) {
            case "liquid":
                return PhaseRequest.LIQUID;
            case "vapor":
            case "vapour":
                return PhaseRequest.VAPOR;
            case "stable":
                return PhaseRequest.STABLE;
            default:
                throw InvalidInputException.invalid("--phase", s, "expected liquid, vapor or stable");
        }
    }

}
