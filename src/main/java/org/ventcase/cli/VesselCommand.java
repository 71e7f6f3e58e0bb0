package org.ventcase.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.ventcase.casefile.JsonReports;
import org.ventcase.vessel.LevelState;
import org.ventcase.vessel.Specs;
import org.ventcase.vessel.Vessel;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code ventcase vessel}: volumes, wetted and fire-exposed areas at a liquid level. */
@Command(name = "vessel", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Volumes, wetted area and fire-exposed wetted area of a vessel at a liquid level.",
        description = {"Inside dimensions. The fire-exposed wetted area is the wetted area below the effective "
                + "fire height above grade (API Std 521 / ISO 23251: 7.6 m by default).",
                "Heads: " + Specs.HEAD_FORMS + ".",
                "Example: ventcase vessel --shape horizontal --diameter \"3.2 m\" --length \"12 m\" "
                        + "--heads 2:1 --level \"65 %%\" --elevation \"1.2 m\""},
        footer = ExitCode.HELP_LIST)
final class VesselCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    VesselOptions vesselOptions;

    @Option(names = "--json", description = "Print the documented JSON result instead of the table.")
    boolean json;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "Unit system of the printed table: si or us (JSON is always SI). Default: ${DEFAULT-VALUE}.")
    String units;

    @Override
    public Integer call() {
        org.ventcase.report.UnitSystem system = org.ventcase.report.UnitSystem.parse("--units", units);
        Vessel v = vesselOptions.vessel();
        double z = vesselOptions.elevationM();
        double hf = vesselOptions.fireHeightM();
        LevelState s = LevelState.of(v, vesselOptions.level(), vesselOptions.exposure());
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.print(JsonReports.write(JsonReports.vessel(s, z, hf)));
            return ExitCode.OK;
        }
        Text tx = new Text(out);
        // how this table writes a length, an area and a volume in the system asked for (SI as before)
        boolean us = system == org.ventcase.report.UnitSystem.US;
        org.ventcase.report.DisplayUnits u = new org.ventcase.report.DisplayUnits(system);
        org.ventcase.vessel.Words w = u.words();
        java.util.function.DoubleFunction<String> len = us ? w.length() : m -> String.format(Locale.ROOT, "%.4f m", m);
        java.util.function.DoubleFunction<String> area = us ? w.area()
                : a -> String.format(Locale.ROOT, "%.4f m2", a);
        java.util.function.DoubleFunction<String> vol = us
                ? x -> Text.plain(u.plain(org.ventcase.report.DisplayUnits.Kind.VOLUME, x))
                : x -> String.format(Locale.ROOT, "%.4f m3", x);
        tx.title(v.describe(w));
        tx.row("Inside height", len.apply(v.totalHeight()));
        tx.row("Total volume", vol.apply(s.totalVolume()));
        tx.row("Total inside area", area.apply(s.totalInsideArea()));
        tx.row("Liquid level", len.apply(s.levelM()) + String.format(Locale.ROOT,
                " = %.2f %% of height = %.2f %% of volume", s.levelPercentHeight(), s.levelPercentVolume()));
        tx.row("Liquid / vapour volume", us ? vol.apply(s.liquidVolume()) + " / " + vol.apply(s.vapourVolume())
                : String.format(Locale.ROOT, "%.4f / %.4f m3", s.liquidVolume(), s.vapourVolume()));
        tx.row("Wetted inside area", area.apply(s.wettedArea()));
        tx.row("Fire-exposed wetted area", area.apply(s.fire().area()));
        tx.row("Rule applied", s.fire().ruleApplied(w));
        v.outsideArea().ifPresent(a -> tx.row("Total outside area", area.apply(a)));
        return ExitCode.OK;
    }
}
