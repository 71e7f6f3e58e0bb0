package org.ventcase.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.ventcase.casefile.JsonReports;
import org.ventcase.report.DisplayUnits;
import org.ventcase.report.UnitSystem;
import org.ventcase.thermo.Compositions;
import org.ventcase.thermo.mix.MixtureModel;
import org.ventcase.thermo.mix.PhaseEnvelope;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code ventcase envelope}: bubble and dew curves of a mixture with its critical point. */
@Command(name = "envelope", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Phase envelope of a mixture: bubble and dew curves, critical point, cricondenbar, cricondentherm.",
        description = {"Traced by continuation from low pressure through the critical point.",
                "Example: ventcase envelope --fluid \"propane:0.7,n-butane:0.3\" --csv envelope.csv"},
        footer = ExitCode.HELP_LIST)
final class EnvelopeCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    CommonOptions common;

    @Mixin
    FluidOptions fluid;

    @Option(names = "--csv", paramLabel = "FILE", description = "Also write the points as CSV (written atomically).")
    Path csv;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "Unit system of the printed summary: si or us (JSON and the CSV are always SI). "
                    + "Default: ${DEFAULT-VALUE}.")
    String units;

    @Override
    public Integer call() throws IOException {
        UnitSystem system = UnitSystem.parse("--units", units);
        org.ventcase.thermo.Composition c = fluid.composition();
        MixtureModel mm = fluid.model(c, common.variant());
        PhaseEnvelope.Result r = new PhaseEnvelope(mm.model()).trace(c.fractions());
        if (csv != null) {
            StringBuilder sb = new StringBuilder("branch,temperature_K,pressure_Pa\n");
            for (PhaseEnvelope.Point p : r.points()) {
                sb.append(p.branch().name().toLowerCase(Locale.ROOT)).append(',').append(p.temperatureK()).append(',')
                        .append(p.pressurePa()).append('\n');
            }
            org.ventcase.common.AtomicFiles.writeText(sb.toString(), csv);
        }
        PrintWriter out = spec.commandLine().getOut();
        if (common.json) {
            out.print(JsonReports.write(JsonReports.envelope(mm, c.fractions(), r)));
            return ExitCode.OK;
        }
        DisplayUnits u = new DisplayUnits(system);
        boolean us = system == UnitSystem.US;
        java.util.function.DoubleFunction<String> temp = k -> us
                ? Text.plain(u.format(DisplayUnits.Kind.TEMPERATURE, k)) : Text.temperature(k);
        java.util.function.DoubleFunction<String> pres = pa -> us
                ? Text.plain(u.format(DisplayUnits.Kind.PRESSURE_ABS, pa))
                : Text.pressure(pa, common.atmosphericPa());
        Text tx = new Text(out);
        tx.title("Phase envelope of " + fluid.fluid + "  [" + mm.model().variant().displayName() + "]");
        tx.row("Points traced", "%d", r.points().size());
        r.criticalPoint().ifPresentOrElse(
                cp -> tx.row("Critical point", "%s, %s", temp.apply(cp.temperatureK()), pres.apply(cp.pressurePa())),
                () -> tx.row("Critical point", "not located (see warnings)"));
        tx.row("Cricondenbar", "%s at %s", pres.apply(r.cricondenbar().pressurePa()),
                temp.apply(r.cricondenbar().temperatureK()));
        tx.row("Cricondentherm", "%s at %s", temp.apply(r.cricondentherm().temperatureK()),
                pres.apply(r.cricondentherm().pressurePa()));
        if (csv != null) {
            tx.row("CSV written", csv.toString());
        }
        java.util.List<String> w = new java.util.ArrayList<>(mm.kij().warnings());
        w.addAll(r.warnings());
        tx.us(us).warnings(w);
        return ExitCode.OK;
    }
}
