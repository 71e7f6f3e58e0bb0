package org.ventcase.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseResult;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.common.TraceStep;
import org.ventcase.inventory.Inventory;
import org.ventcase.ui.Demos;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code ventcase demo}: the main job on the packaged demo case ({@link Demos#BUILT_IN}, an
 * invented propane storage bullet): the case wizard opened on it, or, without a display, its case
 * calculation printed step by step as a reviewer would check it. Every number printed comes from
 * the case file through the case pipeline ({@link CaseCalculation}); none is written here.
 */
@Command(name = "demo", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "The built-in demo: the case wizard on an invented propane bullet, or its calculation step by step.",
        description = {"Where a display is available, opens the case wizard with the demo case "
                + "demo-cases/propane-bullet-fire.json (invented bullet V-4101, packaged in the jar) loaded and its "
                + "results computed.",
                "With --text, or where no display is available, runs the same case and prints every scenario's "
                + "calculation step by step (equation, source, inputs, results, notes), then a summary (governing "
                + "scenario, relief load, required area, orifice and margin, inventory) and the warnings."},
        footer = ExitCode.HELP_LIST)
final class DemoCommand implements Callable<Integer> {

    /** The line after the printed demo: how to go on without a window. */
    static final String HEADLESS_HINT = "Headless commands: 'ventcase calc demo-cases/propane-bullet-fire.json', "
            + "'ventcase sheet --demo -o demo.pdf', 'ventcase props --fluid propane --temperature 50 C --pressure "
            + "20 bara', 'ventcase new --template horizontal-bullet case.json'; 'ventcase --help' lists them all.";

    /** The cautions printed under the demo's heading. */
    static final List<String> CAUTIONS = List.of(
            "First-pass estimate only. Final relief design must be verified by a qualified engineer under the",
            "applicable codes (e.g. ASME BPVC Section VIII, API Std 520/521, ISO 4126/23251) and local regulations.");

    @Spec
    CommandSpec spec;

    @Option(names = "--text", description = "Print the demo step by step instead of opening the wizard "
            + "(the default where no display is available).")
    boolean text;

    /** The packaged demo case (the one the wizard opens), validated. */
    static ValidatedCase demoCase() {
        return CaseFiles.load(Demos.json(Demos.BUILT_IN), "demo-cases/" + Demos.BUILT_IN);
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        boolean display = Main.displayAvailableHere();
        if (opensWindow(text, Main.windowsAllowed, display)) {
            out.println("ventcase demo: opening the case wizard with the demo case "
                    + "(for the printed demo: 'ventcase demo --text').");
            out.flush();
            if (org.ventcase.ui.WizardLauncher.launchDemo()) {
                return ExitCode.OK;
            }
            spec.commandLine().getErr().println(org.ventcase.ui.WizardLauncher.NO_WINDOW);
            out.println("ventcase demo: the demo is printed instead.");
            out.println();
        } else if (!text && !display) {
            out.println("ventcase demo: no display is available, so the demo is printed instead of opening the "
                    + "case wizard.");
            out.println();
        }
        ValidatedCase kase = demoCase();
        printDemo(out, kase, CaseCalculation.run(CaseInputs.from(kase)));
        out.println();
        out.println(HEADLESS_HINT);
        return ExitCode.OK;
    }

    /** True when {@code demo} opens the wizard: not asked for text, a window may be opened and a display is there. */
    static boolean opensWindow(boolean text, boolean windowsAllowed, boolean display) {
        return !text && windowsAllowed && display;
    }

    private static void printDemo(PrintWriter out, ValidatedCase kase, CaseResult r) {
        out.println("VENTCASE DEMO: " + r.title() + " (" + r.tag() + ")");
        kase.identity().notes().ifPresent(n -> out.println(n));
        out.println("Case file: demo-cases/" + Demos.BUILT_IN + " (packaged in the jar; the case the wizard opens).");
        out.println();
        for (String line : CAUTIONS) {
            out.println(line);
        }
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            out.println();
            String heading = String.format(Locale.ROOT, "SCENARIO %d: %s [%s]%s", s.index() + 1, s.label(),
                    s.type().key(), s.governing() ? ", governing" : "");
            out.println(heading);
            out.println("=".repeat(Math.min(heading.length(), 100)));
            if (s.failure().isPresent()) {
                out.println("   not computed: " + s.failure().get());
                continue;
            }
            int i = 1;
            for (TraceStep step : s.trace()) {
                out.println();
                printStep(out, i++, step);
            }
        }
        out.println();
        out.println("SUMMARY");
        if (r.governing().isPresent()) {
            CaseResult.ScenarioResult g = r.governing().get();
            row(out, "Governing scenario", String.format(Locale.ROOT, "%d. %s [%s]", g.index() + 1, g.label(),
                    g.type().key()));
            g.reliefLoadKgPerS().ifPresent(w -> {
                StringBuilder at = new StringBuilder(String.format(Locale.ROOT, "%.0f kg/h", w * 3600));
                g.relievingPressurePa().ifPresent(p -> at.append(String.format(Locale.ROOT, " at %.1f kPa abs",
                        p / 1e3)));
                g.relievingTemperatureK().ifPresent(t -> at.append(", ").append(Text.temperature(t)));
                row(out, "Relief load", at.toString());
            });
            g.requiredAreaM2().ifPresent(a -> row(out, "Required effective area", String.format(Locale.ROOT,
                    "%.1f mm2 (%.4f in2)", a * 1e6, a * 1e6 / 645.16)));
            g.orifice().ifPresent(o -> row(out, "Selected orifice", String.format(Locale.ROOT,
                    "%s (%.0f mm2), margin %.0f %%", o.designation(), o.selectedAreaMm2(), o.marginPercent())));
        } else {
            row(out, "Governing scenario", "none: no scenario could be sized (see the warnings)");
        }
        Inventory inv = r.inventory();
        row(out, "Inventory", String.format(Locale.ROOT, "%.0f kg liquid + %.0f kg vapour = %.0f kg",
                inv.liquidMassKg(), inv.vapourMassKg(), inv.totalMassKg()));
        if (!r.warnings().isEmpty()) {
            out.println();
            out.println("WARNINGS");
            for (CaseResult.CaseWarning w : r.warnings()) {
                out.println("  ! " + (w.scenarios().isEmpty() ? "" : "[" + String.join("; ", w.scenarios()) + "] ")
                        + w.message());
            }
        }
    }

    private static void printStep(PrintWriter out, int n, TraceStep s) {
        out.printf(Locale.ROOT, "%d. %s%n", n, s.title());
        if (!s.equation().isBlank()) {
            out.printf(Locale.ROOT, "   Equation: %s%n", s.equation());
        }
        if (!s.source().isBlank()) {
            out.printf(Locale.ROOT, "   Source:   %s%n", s.source());
        }
        for (Map.Entry<String, String> e : s.inputs().entrySet()) {
            out.printf(Locale.ROOT, "   in   %-34s %s%n", e.getKey(), e.getValue());
        }
        for (Map.Entry<String, String> e : s.outputs().entrySet()) {
            out.printf(Locale.ROOT, "   out  %-34s %s%n", e.getKey(), e.getValue());
        }
        for (String note : s.notes()) {
            out.printf(Locale.ROOT, "   note %s%n", note);
        }
    }

    private static void row(PrintWriter out, String label, String value) {
        out.printf(Locale.ROOT, "  %-28s %s%n", label, value);
    }
}
