package org.ventcase.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import java.util.function.Supplier;

import org.ventcase.casefile.JsonReports;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.NoSolutionException;
import org.ventcase.inventory.Fluid;
import org.ventcase.inventory.Inventories;
import org.ventcase.inventory.Inventory;
import org.ventcase.inventory.PhaseInventory;
import org.ventcase.inventory.Storage;
import org.ventcase.inventory.StorageMode;
import org.ventcase.thermo.Composition;
import org.ventcase.thermo.Compositions;
import org.ventcase.units.Units;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Specs;
import org.ventcase.vessel.Vessel;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code ventcase inventory}: what a vessel holds, by phase and by component. */
@Command(name = "inventory", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Contents of a vessel by phase and component: volume, density, mass and moles.",
        description = {"Modes: saturated (liquid at its bubble point at --temperature; pressure and vapour follow), "
                + "specified (--temperature and --pressure given, liquid --fluid under a stated --vapour space, e.g. a "
                + "nitrogen blanket) and gas (no liquid; the --fluid is the gas). Densities from the cubic equation of "
                + "state on the stated basis; warnings where the liquid would flash, the gas condense, the vapour space "
                + "is under 5 %% or the liquid would fill the vessel before --relief-pressure.",
                "Compositions: \"name:fraction,name:fraction\" (mole fractions summing to 1) or one name.",
                "Heads: " + Specs.HEAD_FORMS + ".",
                "Example: ventcase inventory --shape horizontal --diameter \"3.2 m\" --length \"12 m\" --level \"80 %%v\" "
                        + "--fluid \"propane:0.95,n-butane:0.05\" --mode saturated --temperature \"15 C\" "
                        + "--relief-pressure \"17.2 barg\""},
        footer = ExitCode.HELP_LIST)
final class InventoryCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    VesselOptions vesselOptions;

    @Mixin
    CommonOptions common;

    @Option(names = "--fluid", required = true, paramLabel = "COMPOSITION",
            description = "Liquid (saturated, specified) or gas (gas mode): \"propane:0.95,n-butane:0.05\" or a name.")
    String fluid;

    @Option(names = "--normalize", description = "Divide the fractions by their sum instead of refusing a sum other than 1.")
    boolean normalize;

    @Option(names = "--mode", required = true, paramLabel = "MODE", description = "saturated, specified or gas.")
    String mode;

    @Option(names = "--temperature", required = true, paramLabel = "T", description = "Storage temperature (e.g. \"15 C\").")
    String temperature;

    @Option(names = "--pressure", paramLabel = "P",
            description = "Storage pressure, gauge or absolute (specified and gas modes only).")
    String pressure;

    @Option(names = "--vapour", paramLabel = "COMPOSITION",
            description = "Vapour-space composition as stated (specified mode only), e.g. \"nitrogen:0.9,propane:0.1\".")
    String vapour;

    @Option(names = "--relief-pressure", paramLabel = "P",
            description = "Relieving pressure for the check whether the liquid fills the vessel first (saturated mode).")
    String reliefPressure;

    /** Core field paths -> the options that feed them. */
    private static final Map<String, String> OPTION_OF = Map.of("storage.temperature", "--temperature",
            "storage.pressure", "--pressure", "storage.relievingPressure", "--relief-pressure",
            "storage.vapour", "--vapour", "vessel.level", "--level", "fluid.composition", "--fluid");

    @Override
    public Integer call() {
        StorageMode m = mode();
        Composition liquid = Compositions.parse("--fluid", fluid, normalize);
        double t = Units.temperatureK("--temperature", temperature);
        double atm = common.atmosphericPa();
        Vessel vessel = vesselOptions.vessel();
        Level level;
        Fluid f;
        Storage storage;
        switch (m) {
            case SATURATED:
                refuse("--pressure", pressure, "saturated mode takes the bubble pressure at --temperature; give no "
                        + "--pressure (or use --mode specified)");
                refuse("--vapour", vapour, "saturated mode computes the vapour in equilibrium; give no --vapour");
                OptionalDouble p1 = reliefPressure == null ? OptionalDouble.empty()
                        : OptionalDouble.of(Units.parsePressure("--relief-pressure", reliefPressure, atm));
                storage = relabel(() -> new Storage.Saturated(t, p1));
                f = Fluid.of(liquid, common.variant(), common.basis());
                level = vesselOptions.level();
                break;
            case SPECIFIED:
                refuse("--relief-pressure", reliefPressure, "the liquid-full check is made in saturated mode only");
                if (vapour == null) {
                    throw InvalidInputException.missing("--vapour", "specified mode needs the vapour-space composition, "
                            + "e.g. \"nitrogen:0.9,propane:0.1\"");
                }
                Composition v = Compositions.parse("--vapour", vapour, normalize);
                double p = requiredPressure(atm);
                storage = relabel(() -> new Storage.Specified(t, p, v));
                f = relabel(() -> Fluid.withVapourSpace(liquid, v, common.variant(), common.basis()));
                level = vesselOptions.level();
                break;
            default:
                refuse("--relief-pressure", reliefPressure, "the liquid-full check is made in saturated mode only");
                refuse("--vapour", vapour, "in gas mode --fluid is the gas; give no --vapour");
                double pg = requiredPressure(atm);
                storage = relabel(() -> new Storage.GasFilled(t, pg));
                f = Fluid.of(liquid, common.variant(), common.basis());
                level = vesselOptions.levelIfGiven().orElse(Level.ofHeight(0));
                break;
        }
        Fluid fl = f;
        Storage st = storage;
        Level lv = level;
        Inventory inv = relabel(() -> Inventories.compute(fl, st, vessel, lv, vesselOptions.exposure()));
        PrintWriter out = spec.commandLine().getOut();
        if (common.json) {
            out.print(JsonReports.write(JsonReports.inventory(inv)));
            return ExitCode.OK;
        }
        print(new Text(out), inv, atm);
        return ExitCode.OK;
    }

    private StorageMode mode() {
        String s = mode.trim().toLowerCase(Locale.ROOT);
        for (StorageMode m : StorageMode.values()) {
            if (m.label().equals(s)) {
                return m;
            }
        }
        throw InvalidInputException.invalid("--mode", mode, "expected saturated, specified or gas");
    }

    private double requiredPressure(double atm) {
        if (pressure == null) {
            throw InvalidInputException.missing("--pressure", "--mode " + mode.trim() + " needs the storage pressure, "
                    + "gauge or absolute (e.g. \"9 barg\")");
        }
        return Units.parsePressure("--pressure", pressure, atm);
    }

    private static void refuse(String option, String value, String why) {
        if (value != null) {
            throw InvalidInputException.invalid(option, value, why);
        }
    }

    /** Runs f, re-labelling core field paths with the option the user typed. */
    private static <T> T relabel(Supplier<T> f) {
        try {
            return f.get();
        } catch (InvalidInputException e) {
            String opt = option(e.field());
            throw opt == null ? e : e.withField(opt);
        } catch (NoSolutionException e) {
            String opt = option(e.field());
            if (opt == null) {
                throw e;
            }
            throw new NoSolutionException(opt, e.getMessage().substring(e.field().length() + 2));
        }
    }

    private static String option(String field) {
        for (Map.Entry<String, String> e : OPTION_OF.entrySet()) {
            if (field.equals(e.getKey()) || field.startsWith(e.getKey() + "[")) {
                return e.getValue() + field.substring(e.getKey().length());
            }
        }
        return null;
    }

    private static void print(Text tx, Inventory inv, double atm) {
        tx.title(String.format(Locale.ROOT, "Inventory, %s storage  [%s, density basis %s]", inv.mode().label(),
                inv.fluid().variant().displayName(), inv.fluid().densityBasis().label()));
        tx.row("Vessel", inv.vessel().vessel().describe());
        tx.row("Liquid level", "%.4f m = %.2f %% of height = %.2f %% of volume", inv.vessel().levelM(),
                inv.vessel().levelPercentHeight(), inv.vessel().levelPercentVolume());
        tx.row("Fluid", inv.fluid().composition().toString());
        tx.row("Temperature", Text.temperature(inv.temperatureK()));
        tx.row("Pressure", Text.pressure(inv.pressurePa(), atm));
        inv.liquid().ifPresent(l -> phase(tx, "Liquid", l));
        phase(tx, inv.liquid().isPresent() ? "Vapour" : "Gas", inv.vapour());
        tx.blank();
        tx.row("Total mass", "%.2f kg", inv.totalMassKg());
        tx.row("Total amount", "%.2f kmol", inv.totalMoles() / 1e3);
        inv.massPerComponentKg().forEach((k, v) -> tx.row("  " + k, "%.2f kg", v));
        inv.rackettLiquidDensity().ifPresent(r -> tx.row("Rackett liquid density", "%.2f kg/m3 (cross-check)", r));
        inv.liquidFull().ifPresent(c -> {
            tx.blank();
            tx.row("Relieving pressure", Text.pressure(c.relievingPressurePa(), atm));
            tx.row("Bubble temperature there", Text.temperature(c.relievingTemperatureK()));
            tx.row("Liquid volume there", "%.4f m3 of %.4f m3 (vapour neglected)", c.liquidVolumeAtReliefM3(),
                    c.vesselVolumeM3());
            tx.row("Liquid-full before relief", c.fillsBeforeRelief()
                    ? "YES, at " + Text.temperature(c.liquidFullTemperatureK().getAsDouble()) : "no");
        });
        tx.warnings(inv.warnings());
    }

    private static void phase(Text tx, String label, PhaseInventory p) {
        tx.blank();
        tx.row(label + " volume", "%.4f m3", p.volumeM3());
        tx.row(label + " density", "%.3f kg/m3 (%s)", p.densityKgM3(), p.densityBasis().label());
        tx.row(label + " mass", "%.2f kg (%.2f kmol, M = %.3f kg/kmol)", p.massKg(), p.moles() / 1e3,
                p.molarMassKgKmol());
        tx.row(label + " composition", p.composition().toString());
    }
}
