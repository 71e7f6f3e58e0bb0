package org.ventcase.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.ventcase.casefile.JsonReports;
import org.ventcase.common.InvalidInputException;
import org.ventcase.units.Dimension;
import org.ventcase.units.Units;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.LevelState;
import org.ventcase.vessel.Specs;
import org.ventcase.vessel.Vessel;

import picocli.CommandLine.Command;
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

    @Option(names = "--shape", required = true, paramLabel = "SHAPE",
            description = "horizontal, vertical or sphere.")
    String shape;

    @Option(names = "--diameter", required = true, paramLabel = "D", description = "Inside diameter (e.g. \"3.2 m\").")
    String diameter;

    @Option(names = "--length", paramLabel = "L",
            description = "Tangent-to-tangent length of the cylindrical shell (cylinders only).")
    String length;

    @Option(names = "--heads", paramLabel = "HEAD", defaultValue = "2:1",
            description = "Both heads (default ${DEFAULT-VALUE}); see the forms above.")
    String heads;

    @Option(names = "--second-head", paramLabel = "HEAD",
            description = "A different top (vertical) or right-hand (horizontal) head.")
    String secondHead;

    @Option(names = "--level", required = true, paramLabel = "LEVEL",
            description = "Liquid level: a height (\"2.1 m\"), %% of height (\"65 %%\" or \"65 %%h\") or %% of volume "
                    + "(\"70 %%v\").")
    String level;

    @Option(names = "--elevation", paramLabel = "Z", defaultValue = "0 m",
            description = "Height of the vessel's lowest inside point above grade (fire base). Default: ${DEFAULT-VALUE}.")
    String elevation;

    @Option(names = "--fire-height", paramLabel = "H", defaultValue = "7.6 m",
            description = "Effective fire height above grade. Default: ${DEFAULT-VALUE} (API Std 521).")
    String fireHeight;

    @Option(names = "--skirt", description = "Exclude a vertical vessel's bottom head inside a skirt.")
    boolean skirt;

    @Option(names = "--wall", paramLabel = "T", description = "Wall thickness, for an outside-area figure only.")
    String wall;

    @Option(names = "--json", description = "Print the documented JSON result instead of the table.")
    boolean json;

    @Override
    public Integer call() {
        double d = Units.parse("--diameter", diameter, Dimension.LENGTH);
        Vessel v = buildVessel(d);
        if (wall != null) {
            v = v.withWallThickness(Units.parse("--wall", wall, Dimension.LENGTH));
        }
        double z = Units.parse("--elevation", elevation, Dimension.LENGTH);
        double hf = Units.parse("--fire-height", fireHeight, Dimension.LENGTH);
        FireExposure fe = new FireExposure(z, hf, false);
        if (skirt) {
            fe = fe.excludingSkirtedBottomHead();
        }
        LevelState s = LevelState.of(v, Specs.level("--level", level), fe);
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

    private Vessel buildVessel(double d) {
        String sh = shape.trim().toLowerCase(Locale.ROOT);
        if (sh.equals("sphere")) {
            if (length != null) {
                throw InvalidInputException.invalid("--length", length, "a sphere has no shell length; omit --length");
            }
            return Vessel.sphere(d);
        }
        if (!sh.equals("horizontal") && !sh.equals("vertical")) {
            throw InvalidInputException.invalid("--shape", shape, "expected horizontal, vertical or sphere");
        }
        if (length == null) {
            throw InvalidInputException.missing("--length", "a cylinder needs its tangent-to-tangent length, e.g. \"12 m\"");
        }
        double l = Units.parse("--length", length, Dimension.LENGTH);
        Head h1 = Specs.head("--heads", heads, d);
        Head h2 = secondHead == null ? h1 : Specs.head("--second-head", secondHead, d);
        return sh.equals("horizontal") ? Vessel.horizontal(d, l, h1, h2) : Vessel.vertical(d, l, h1, h2);
    }
}
