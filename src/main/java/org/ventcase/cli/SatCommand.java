package org.ventcase.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.ventcase.casefile.JsonReports;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.SaturationResult;
import org.ventcase.units.Units;

import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code ventcase sat}: saturation state of a pure fluid at T or at P. */
@Command(name = "sat", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Saturation of a pure fluid (pressure or temperature, phase densities, latent heat), or the bubble or dew point of a mixture.",
        description = {"Equal-fugacity solution of the cubic equation of state; the liquid density is also "
                + "given by the Rackett equation as an independent cross-check.",
                "Example: ventcase sat --fluid propane --pressure \"17.2 barg\""},
        footer = ExitCode.HELP_LIST)
final class SatCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    CommonOptions common;

    @Mixin
    FluidOptions fluidOptions;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "Unit system of a pure fluid's printed saturation state: si or us (JSON is always SI). "
                    + "Default: ${DEFAULT-VALUE}.")
    String units;

    @Option(names = "--dew", description = "For a mixture: the dew point instead of the bubble point.")
    boolean dew;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Given given;

    static final class Given {
        @Option(names = "--temperature", paramLabel = "T", description = "Saturation temperature (e.g. \"45 C\").")
        String temperature;

        @Option(names = "--pressure", paramLabel = "P",
                description = "Saturation pressure, absolute or gauge (e.g. \"17.2 barg\").")
        String pressure;
    }

    @Override
    public Integer call() {
        org.ventcase.thermo.Composition parsed = fluidOptions.composition();
        if (parsed.size() != 1) {
            return mixture(parsed);
        }
        Component c = parsed.components().get(0);
        PureSaturation sat = new PureSaturation(CubicModel.pure(common.variant(), c));
        SaturationResult s;
        if (given.temperature != null) {
            s = withField(() -> sat.atTemperature(Units.temperatureK("--temperature", given.temperature),
                    common.basis()), "--temperature");
        } else {
            double p = Units.parsePressure("--pressure", given.pressure, common.atmosphericPa());
            s = withField(() -> sat.atPressure(p, common.basis()), "--pressure");
        }
        PrintWriter out = spec.commandLine().getOut();
        if (common.json) {
            out.print(JsonReports.write(JsonReports.sat(s)));
            return ExitCode.OK;
        }
        Text tx = new Text(out);
        org.ventcase.report.UnitSystem system = org.ventcase.report.UnitSystem.parse("--units", units);
        if (system == org.ventcase.report.UnitSystem.US) {
            org.ventcase.report.DisplayUnits u = new org.ventcase.report.DisplayUnits(system);
            tx.title(String.format(Locale.ROOT, "Saturation of %s  [%s]", c.name(), s.variant().displayName()));
            tx.row("Temperature", Text.plain(u.format(org.ventcase.report.DisplayUnits.Kind.TEMPERATURE, s.temperatureK())));
            tx.row("Pressure", Text.plain(u.format(org.ventcase.report.DisplayUnits.Kind.PRESSURE_ABS, s.pressurePa())));
            tx.row("Z liquid / vapour", "%.6f / %.6f", s.liquid().z(), s.vapor().z());
            tx.row("Liquid density", Text.plain(u.plain(org.ventcase.report.DisplayUnits.Kind.DENSITY, s.liquid().density()))
                    + " (" + s.liquid().densityBasis().label() + ")");
            tx.row("Vapour density", Text.plain(u.plain(org.ventcase.report.DisplayUnits.Kind.DENSITY, s.vapor().density()))
                    + " (" + s.vapor().densityBasis().label() + anchoredVapour(s,
                    v -> Text.plain(u.plain(org.ventcase.report.DisplayUnits.Kind.DENSITY, v))) + ")");
            tx.row("Latent heat", Text.plain(u.format(org.ventcase.report.DisplayUnits.Kind.SPECIFIC_ENERGY,
                    s.latentHeatJkg())) + anchoredLatent(s,
                    v -> Text.plain(u.plain(org.ventcase.report.DisplayUnits.Kind.SPECIFIC_ENERGY, v))));
            Text.modelRows(tx, s.variant(), c, u);
            tx.us(true).warnings(s.warnings());
            return ExitCode.OK;
        }
        tx.title(String.format(Locale.ROOT, "Saturation of %s  [%s]", c.name(), s.variant().displayName()));
        tx.row("Temperature", Text.temperature(s.temperatureK()));
        tx.row("Pressure", Text.pressure(s.pressurePa(), common.atmosphericPa()));
        tx.row("Z liquid / vapour", "%.6f / %.6f", s.liquid().z(), s.vapor().z());
        tx.row("Liquid density", "%.4g kg/m3 (%s; cubic %.4g; Rackett %.4g)", s.liquid().density(),
                s.liquid().densityBasis().label(),
                c.molarMass() * 1e-3 / s.liquid().molarVolumeCubic(), s.rackettLiquidDensity());
        tx.row("Vapour density", "%.4g kg/m3 (%s%s)", s.vapor().density(), s.vapor().densityBasis().label(),
                anchoredVapour(s, v -> String.format(Locale.ROOT, "%.4g kg/m3", v)));
        tx.row("Latent heat", "%.1f kJ/kg (%.1f J/mol)%s", s.latentHeatJkg() / 1e3, s.latentHeatJmol(),
                anchoredLatent(s, v -> String.format(Locale.ROOT, "%.1f kJ/kg", v / 1e3)));
        Text.modelRows(tx, s.variant(), c);
        tx.warnings(s.warnings());
        return ExitCode.OK;
    }

    private static String anchoredVapour(org.ventcase.thermo.SaturationResult s,
                                         java.util.function.DoubleFunction<String> density) {
        return s.latentHeatAnchored() && s.vapor().densityBasis() == org.ventcase.thermo.DensityBasis.TRANSLATED
                ? "; Clapeyron from the latent heat; cubic root "
                        + density.apply(s.component().molarMass() * 1e-3 / s.vapor().molarVolumeCubic())
                : "";
    }

    private static String anchoredLatent(org.ventcase.thermo.SaturationResult s,
                                         java.util.function.DoubleFunction<String> energy) {
        return s.latentHeatAnchored()
                ? "  [" + s.latentHeatSource() + "; the cubic alone: "
                        + energy.apply(s.cubicLatentHeatJmol() / (s.component().molarMass() * 1e-3)) + "]"
                : "";
    }

    private int mixture(org.ventcase.thermo.Composition parsed) {
        org.ventcase.thermo.mix.MixtureModel mm = fluidOptions.model(parsed, common.variant());
        org.ventcase.thermo.mix.SaturationPoints sp = new org.ventcase.thermo.mix.SaturationPoints(mm.model());
        double[] z = parsed.fractions();
        org.ventcase.thermo.mix.SaturationPoint s;
        if (given.temperature != null) {
            double t = Units.temperatureK("--temperature", given.temperature);
            s = relabel(() -> dew ? sp.dewPressure(t, z) : sp.bubblePressure(t, z), "--temperature");
        } else {
            double p = Units.parsePressure("--pressure", given.pressure, common.atmosphericPa());
            s = relabel(() -> dew ? sp.dewTemperature(p, z) : sp.bubbleTemperature(p, z), "--pressure");
        }
        PrintWriter out = spec.commandLine().getOut();
        if (common.json) {
            out.print(JsonReports.write(JsonReports.saturationPoint(mm, s)));
            return ExitCode.OK;
        }
        org.ventcase.report.UnitSystem system = org.ventcase.report.UnitSystem.parse("--units", units);
        boolean us = system == org.ventcase.report.UnitSystem.US;
        Text tx = new Text(out).us(us);
        tx.title(String.format(Locale.ROOT, "%s point of %s  [%s]", dew ? "Dew" : "Bubble", fluidOptions.fluid,
                mm.model().variant().displayName()));
        if (us) {
            org.ventcase.report.DisplayUnits u = new org.ventcase.report.DisplayUnits(system);
            tx.row("Temperature", Text.plain(u.format(org.ventcase.report.DisplayUnits.Kind.TEMPERATURE,
                    s.temperatureK())));
            tx.row("Pressure", Text.plain(u.format(org.ventcase.report.DisplayUnits.Kind.PRESSURE_ABS, s.pressurePa())));
        } else {
            tx.row("Temperature", Text.temperature(s.temperatureK()));
            tx.row("Pressure", Text.pressure(s.pressurePa(), common.atmosphericPa()));
        }
        double[] y = s.incipientComposition();
        double[] k = s.kValues();
        for (int i = 0; i < y.length; i++) {
            tx.row((dew ? "Incipient liquid " : "Incipient vapour ") + mm.model().components().get(i).name(),
                    "%.5f (K = %.4g)", y[i], k[i]);
        }
        java.util.List<String> w = new java.util.ArrayList<>(mm.kij().warnings());
        w.addAll(s.warnings());
        tx.warnings(w);
        return ExitCode.OK;
    }

    private static <T> T relabel(java.util.function.Supplier<T> f, String option) {
        try {
            return f.get();
        } catch (org.ventcase.common.NoSolutionException e) {
            String m = e.getMessage();
            throw new org.ventcase.common.NoSolutionException(option, m.substring(m.indexOf(':') + 2));
        }
    }

    /** Re-labels a core message about "temperature"/"pressure" with the option the user typed. */
    private static SaturationResult withField(java.util.function.Supplier<SaturationResult> f, String option) {
        try {
            return f.get();
        } catch (org.ventcase.common.NoSolutionException e) {
            throw new org.ventcase.common.NoSolutionException(option,
                    e.getMessage().substring(e.getMessage().indexOf(':') + 2));
        }
    }

}
