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

    @Override
    public Integer call() {
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
        tx.title(v.describe());
        tx.row("Inside height", "%.4f m", v.totalHeight());
        tx.row("Total volume", "%.4f m3", s.totalVolume());
        tx.row("Total inside area", "%.4f m2", s.totalInsideArea());
        tx.row("Liquid level", "%.4f m = %.2f %% of height = %.2f %% of volume", s.levelM(), s.levelPercentHeight(),
                s.levelPercentVolume());
        tx.row("Liquid / vapour volume", "%.4f / %.4f m3", s.liquidVolume(), s.vapourVolume());
        tx.row("Wetted inside area", "%.4f m2", s.wettedArea());
        tx.row("Fire-exposed wetted area", "%.4f m2", s.fire().area());
        tx.row("Rule applied", s.fire().ruleApplied());
        v.outsideArea().ifPresent(a -> tx.row("Total outside area", String.format(Locale.ROOT, "%.4f m2", a)));
        return ExitCode.OK;
    }
}
