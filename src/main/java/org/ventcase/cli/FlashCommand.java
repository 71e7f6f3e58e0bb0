package org.ventcase.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.ventcase.casefile.JsonReports;
import org.ventcase.report.DisplayUnits;
import org.ventcase.report.UnitSystem;
import org.ventcase.thermo.Compositions;
import org.ventcase.thermo.mix.FlashResult;
import org.ventcase.thermo.mix.MixtureModel;
import org.ventcase.thermo.mix.MixturePhase;
import org.ventcase.thermo.mix.PTFlash;
import org.ventcase.units.CustomaryUnits;
import org.ventcase.units.Units;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code ventcase flash}: PT flash of a mixture, with the stability test that decided it. */
@Command(name = "flash", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Phase split of a mixture at a temperature and pressure (PT flash).",
        description = {"Michelsen stability test, then Rachford-Rice with accelerated successive substitution and "
                + "a Newton finish. Reports the vapour fraction, each phase's composition, Z, density (with its "
                + "basis), molar mass and enthalpy, and the k_ij used with their sources.",
                "Example: ventcase flash --fluid \"propane:0.7,n-butane:0.3\" --temperature \"40 C\" "
                        + "--pressure \"10 bara\""},
        footer = ExitCode.HELP_LIST)
final class FlashCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    CommonOptions common;

    @Mixin
    FluidOptions fluid;

    @Option(names = "--temperature", required = true, paramLabel = "T", description = "Temperature (e.g. \"40 C\").")
    String temperature;

    @Option(names = "--pressure", required = true, paramLabel = "P",
            description = "Pressure, absolute or gauge (e.g. \"10 bara\").")
    String pressure;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "Unit system of the printed result: si or us (JSON is always SI). Default: ${DEFAULT-VALUE}.")
    String units;

    @Override
    public Integer call() {
        org.ventcase.thermo.Composition c = fluid.composition();
        MixtureModel mm = fluid.model(c, common.variant());
        double t = Units.temperatureK("--temperature", temperature);
        double p = Units.parsePressure("--pressure", pressure, common.atmosphericPa());
        UnitSystem system = UnitSystem.parse("--units", units);
        FlashResult f = new PTFlash(mm.model()).flash(t, p, c.fractions(), common.basis());
        PrintWriter out = spec.commandLine().getOut();
        if (common.json) {
            out.print(JsonReports.write(JsonReports.flash(mm, f)));
            return ExitCode.OK;
        }
        Text tx = new Text(out);
        boolean us = system == UnitSystem.US;
        DisplayUnits u = new DisplayUnits(system);
        tx.title(String.format(Locale.ROOT, "Flash of %s at %s, %s  [%s]", fluid.fluid,
                us ? Text.plain(u.format(DisplayUnits.Kind.TEMPERATURE, t)) : Text.temperature(t),
                us ? Text.plain(u.format(DisplayUnits.Kind.PRESSURE_ABS, p)) : Text.pressure(p, common.atmosphericPa()),
                mm.model().variant().displayName()));
        tx.row("Stability of the feed", f.stability().stable() ? "stable (one phase)"
                : String.format(Locale.ROOT, "unstable (tangent-plane distance %.4g): splits", f.stability().minimumTpd()));
        boolean twoLiquids = f.twoPhase() && !f.phases().get(1).isVapor();
        tx.row(twoLiquids ? "Lighter-liquid fraction (molar)" : "Vapour fraction (molar)", "%.6f", f.vaporFraction());
        if (us) {
            tx.row("Feed enthalpy", "%.1f Btu/lbmol (ideal gas at 77 F = 0)",
                    CustomaryUnits.jPerMolToBtuPerLbmol(f.enthalpyJmol()));
        } else {
            tx.row("Feed enthalpy", "%.1f J/mol (ideal gas at 298.15 K = 0)", f.enthalpyJmol());
        }
        for (MixturePhase ph : f.phases()) {
            tx.blank();
            tx.row("Phase", "%s, %.6f of the feed (molar)", ph.label().label(), ph.amount());
            tx.row("  Z", "%.6f", ph.z());
            if (us) {
                tx.row("  Density", "%s (%s; cubic %s)", Text.plain(u.plain(DisplayUnits.Kind.DENSITY, ph.density())),
                        ph.densityBasis().label(), Text.plain(u.plain(DisplayUnits.Kind.DENSITY, ph.densityCubic())));
                // kg/kmol and lb/lbmol are the same number
                tx.row("  Molar mass", "%.3f lb/lbmol", ph.molarMass());
            } else {
                tx.row("  Density", "%.4g kg/m3 (%s; cubic %.4g)", ph.density(), ph.densityBasis().label(),
                        ph.densityCubic());
                tx.row("  Molar mass", "%.3f kg/kmol", ph.molarMass());
            }
            double[] x = ph.composition();
            // y for a vapour, x for a liquid (z is the feed), as the trade writes them
            String sym = ph.label() == org.ventcase.thermo.PhaseLabel.VAPOR ? "y" : ph.label()
                    == org.ventcase.thermo.PhaseLabel.LIQUID ? "x" : "z";
            for (int i = 0; i < x.length; i++) {
                tx.row("  " + sym + " " + mm.model().components().get(i).name(), "%.6f", x[i]);
            }
        }
        tx.blank();
        tx.row("Method", f.method());
        java.util.List<org.ventcase.thermo.Component> cs = mm.model().components();
        double[][] k = mm.kij().kij();
        String[][] src = mm.kij().sources();
        for (int i = 0; i < cs.size(); i++) {
            for (int j = i + 1; j < cs.size(); j++) {
                tx.row("k_ij " + cs.get(i).name() + " / " + cs.get(j).name(), "%.4f (%s)", k[i][j], src[i][j]);
            }
        }
        java.util.List<String> w = new java.util.ArrayList<>(mm.kij().warnings());
        w.addAll(f.warnings());
        tx.us(us).warnings(w);
        return ExitCode.OK;
    }

}
