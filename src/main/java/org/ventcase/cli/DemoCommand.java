package org.ventcase.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import org.ventcase.common.PhysicalConstants;
import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizingInput;
import org.ventcase.relief.DeviceCount;
import org.ventcase.relief.EnvironmentFactors;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.RelievingPressureInput;
import org.ventcase.relief.ScenarioKind;
import org.ventcase.relief.WettedFire;
import org.ventcase.relief.WettedFireInput;
import org.ventcase.relief.WettedFireResult;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.units.Units;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code ventcase demo}: the main job on a built-in, invented case (a propane storage bullet at
 * an invented terminal), printed step by step as a reviewer would check it.
 */
@Command(name = "demo", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "The built-in demo: the case wizard on an invented propane bullet, or its fire case step by step.",
        description = {"Where a display is available, opens the case wizard with the demo case "
                + "demo-cases/propane-bullet-fire.json (invented bullet V-4101) loaded and its results computed.",
                "With --text, or where no display is available, prints a first-pass fire relief basis step by step "
                + "instead. Invented case: bullet V-3101 at the (invented) Wrenfield Marsh LPG terminal, 3.2 m ID x "
                + "16 m tangent-to-tangent, 2:1 heads, 85 % of volume full of propane at 15 C, bottom 1.0 m above "
                + "grade, bare, one relief valve set at its MAWP of 17.2 barg, discharging to atmosphere."},
        footer = ExitCode.HELP_LIST)
final class DemoCommand implements Callable<Integer> {

    /** The line after the printed demo: how to go on without a window. */
    static final String HEADLESS_HINT = "Headless commands: 'ventcase calc demo-cases/propane-bullet-fire.json', "
            + "'ventcase sheet --demo -o demo.pdf', 'ventcase props --fluid propane --temperature 50 C --pressure "
            + "20 bara', 'ventcase new --template horizontal-bullet case.json'; 'ventcase --help' lists them all.";

    @Spec
    CommandSpec spec;

    @Option(names = "--text", description = "Print the demo step by step instead of opening the wizard "
            + "(the default where no display is available).")
    boolean text;

    static WettedFireInput demoInput() {
        double atm = PhysicalConstants.ATM_PA;
        double d = 3.2;
        return new WettedFireInput(ComponentLibrary.builtIn().get("propane"), EosVariant.PR78,
                DensityBasis.TRANSLATED, Vessel.horizontal(d, 16.0, Head.ellipsoidal2to1(d), Head.ellipsoidal2to1(d)),
                Level.ofPercentOfVolume(85), FireExposure.atElevation(1.0), Units.temperatureK("demo", "15 C"),
                RelievingPressureInput.of(17.2e5, 17.2e5, atm, DeviceCount.SINGLE, ScenarioKind.FIRE),
                FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING, EnvironmentFactors.byKey("bare"), atm,
                GasSizingInput.DEFAULT_KD, 1.0, 1.0, false);
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        boolean display = Main.displayAvailableHere();
        if (opensWindow(text, Main.windowsAllowed, display)) {
            out.println("ventcase demo: opening the case wizard with the demo case "
                    + "(for the printed demo: 'ventcase demo --text').");
            out.flush();
            org.ventcase.ui.WizardLauncher.launchDemo();
            return ExitCode.OK;
        }
        if (!text && !display) {
            out.println("ventcase demo: no display is available, so the demo is printed instead of opening the "
                    + "case wizard.");
            out.println();
        }
        printDemo(out);
        out.println();
        out.println(HEADLESS_HINT);
        return ExitCode.OK;
    }

    /** True when {@code demo} opens the wizard: not asked for text, a window may be opened and a display is there. */
    static boolean opensWindow(boolean text, boolean windowsAllowed, boolean display) {
        return !text && windowsAllowed && display;
    }

    private static void printDemo(PrintWriter out) {
        WettedFireResult r = WettedFire.run(demoInput());
        out.println("VENTCASE DEMO: pool fire on propane bullet V-3101 (invented case, Wrenfield Marsh LPG terminal)");
        out.println("First-pass estimate only. Final relief design must be verified by a qualified engineer under the");
        out.println("applicable codes (e.g. ASME BPVC Section VIII, API Std 520/521, ISO 4126/23251) and local regulations.");
        out.println();
        int i = 1;
        for (TraceStep s : r.trace()) {
            out.printf(Locale.ROOT, "%d. %s%n", i++, s.title());
            out.printf(Locale.ROOT, "   Equation: %s%n", s.equation());
            out.printf(Locale.ROOT, "   Source:   %s%n", s.source());
            for (Map.Entry<String, String> e : s.inputs().entrySet()) {
                out.printf(Locale.ROOT, "   in   %-34s %s%n", e.getKey(), e.getValue());
            }
            for (Map.Entry<String, String> e : s.outputs().entrySet()) {
                out.printf(Locale.ROOT, "   out  %-34s %s%n", e.getKey(), e.getValue());
            }
            for (String n : s.notes()) {
                out.printf(Locale.ROOT, "   note %s%n", n);
            }
            out.println();
        }
        out.println("SUMMARY");
        out.printf(Locale.ROOT, "  Relief load                 %.0f kg/h at %.1f kPa abs, %.1f C%n", r.reliefLoadKgPerS() * 3600,
                r.relieving().relievingPressurePa() / 1e3, r.relief().temperatureK() - 273.15);
        out.printf(Locale.ROOT, "  Required effective area     %.0f mm2 (%.3f in2)%n", r.sizing().areaMm2(),
                r.sizing().areaMm2() / 645.16);
        out.printf(Locale.ROOT, "  Selected orifice            %s, margin %.0f %%%n", r.orifice().designation(),
                r.orifice().marginPercent());
        out.printf(Locale.ROOT, "  Inventory                   %.0f kg liquid + %.0f kg vapour%n", r.liquidMassKg(),
                r.vaporMassKg());
        if (!r.warnings().isEmpty()) {
            out.println();
            out.println("WARNINGS");
            for (String w : r.warnings()) {
                out.println("  ! " + w);
            }
        }
    }
}
