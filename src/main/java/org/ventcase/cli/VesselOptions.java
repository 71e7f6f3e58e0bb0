package org.ventcase.cli;

import java.util.Locale;
import java.util.Optional;

import org.ventcase.common.InvalidInputException;
import org.ventcase.units.Dimension;
import org.ventcase.units.Units;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Specs;
import org.ventcase.vessel.Vessel;

import picocli.CommandLine.Option;

/** The vessel, its liquid level and its fire exposure: options shared by the vessel and inventory commands. */
final class VesselOptions {

    @Option(names = "--shape", required = true, paramLabel = "SHAPE",
            description = "horizontal, vertical or sphere.")
    String shape;

    @Option(names = "--diameter", required = true, paramLabel = "D", description = "Inside diameter (e.g. \"3.2 m\").")
    String diameter;

    @Option(names = "--length", paramLabel = "L",
            description = "Tangent-to-tangent length of the cylindrical shell (cylinders only).")
    String length;

    @Option(names = "--heads", paramLabel = "HEAD", defaultValue = "2:1",
            description = "Both heads (default ${DEFAULT-VALUE}); forms: " + Specs.HEAD_FORMS + ".")
    String heads;

    @Option(names = "--second-head", paramLabel = "HEAD",
            description = "A different top (vertical) or right-hand (horizontal) head.")
    String secondHead;

    @Option(names = "--level", paramLabel = "LEVEL",
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

    /** The vessel, with its wall thickness where given. */
    Vessel vessel() {
        double d = Units.parse("--diameter", diameter, Dimension.LENGTH);
        Vessel v = shapeOf(d);
        if (wall != null) {
            v = v.withWallThickness(Units.parse("--wall", wall, Dimension.LENGTH));
        }
        return v;
    }

    double elevationM() {
        return Units.parse("--elevation", elevation, Dimension.LENGTH);
    }

    double fireHeightM() {
        return Units.parse("--fire-height", fireHeight, Dimension.LENGTH);
    }

    FireExposure exposure() {
        FireExposure fe = new FireExposure(elevationM(), fireHeightM(), false);
        return skirt ? fe.excludingSkirtedBottomHead() : fe;
    }

    /** The level; refused when missing. */
    Level level() {
        return levelIfGiven().orElseThrow(() -> InvalidInputException.missing("--level",
                "expected a liquid level: a height (\"2.1 m\"), a percentage of height (\"65 %\") or of volume (\"70 %v\")"));
    }

    Optional<Level> levelIfGiven() {
        return level == null ? Optional.empty() : Optional.of(Specs.level("--level", level));
    }

    private Vessel shapeOf(double d) {
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
