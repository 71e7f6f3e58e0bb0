package org.ventcase.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseResult;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.CaseValidationException;
import org.ventcase.casefile.Problem;
import org.ventcase.casefile.ResultsJson;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.inventory.Inventory;
import org.ventcase.relief.RelievedFluid;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code ventcase calc}: runs every scenario of a case file, prints a summary, writes the results JSON. */
@Command(name = "calc", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Run every scenario of a case file: loads, required areas, orifices, governing scenario.",
        description = {"Prints a summary (governing scenario first, then the others, the inventory and every "
                + "warning) and, with --json, writes the results JSON (format: README, 'Results JSON'). "
                + "The same case always gives the same bytes. The case file is only read.",
                Main.FIRST_PASS_HELP},
        footer = ExitCode.HELP_LIST)
final class CalcCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE.json", description = "The case file.")
    Path file;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "Unit system of the printed results: si or us (the other bracketed for key values; the "
                    + "results JSON is always SI). Default: ${DEFAULT-VALUE}.")
    String units;

    @Option(names = "--json", paramLabel = "OUT.json",
            description = "Write the results JSON here (atomically: a temporary file in the same folder, then moved).")
    Path json;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        ValidatedCase vc;
        try {
            vc = CaseFiles.load(file);
        } catch (CaseValidationException e) {
            err.println(e.origin() + ": " + e.problems().size() + (e.problems().size() == 1 ? " problem" : " problems"));
            for (Problem p : e.problems()) {
                err.println("  " + p.message());
            }
            return ExitCode.INVALID_INPUT;
        }
        if (json != null && json.toAbsolutePath().normalize().equals(file.toAbsolutePath().normalize())) {
            err.println("ventcase: --json " + json + " names the case file itself; the case file is never "
                    + "overwritten: choose another output file");
            return ExitCode.INVALID_INPUT;
        }
        org.ventcase.report.UnitSystem system = org.ventcase.report.UnitSystem.parse("--units", units);
        CaseResult r = CaseCalculation.run(CaseInputs.from(vc));
        String text = ResultsJson.write(r, ResultsJson.toolVersion());
        if (json != null) {
            CaseFiles.writeText(text, json);
        }
        print(out, r, system == org.ventcase.report.UnitSystem.SI ? null : new org.ventcase.report.DisplayUnits(system));
        if (json != null) {
            out.println();
            out.println("Results JSON written to " + json);
        }
        return ExitCode.OK;
    }

    /** A quantity on the chosen system, or in the SI text given when the system is SI (u null). */
    private static String q(org.ventcase.report.DisplayUnits u, org.ventcase.report.DisplayUnits.Kind k, double si,
                            String siText) {
        return u == null ? siText : u.format(k, si);
    }

    private static void print(PrintWriter out, CaseResult r, org.ventcase.report.DisplayUnits u) {
        org.ventcase.report.DisplayUnits.Kind P = org.ventcase.report.DisplayUnits.Kind.PRESSURE_ABS;
        out.println("VENTCASE CALC: " + r.title() + " (" + r.tag() + ")");
        DemoCommand.CAUTIONS.forEach(out::println);
        out.println("Input hash " + r.inputHash());
        out.println();
        List<CaseResult.ScenarioResult> order = new ArrayList<>();
        r.governing().ifPresent(order::add);
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            if (!s.governing()) {
                order.add(s);
            }
        }
        for (CaseResult.ScenarioResult s : order) {
            out.printf(Locale.ROOT, "%s%d. %s [%s]%n", s.governing() ? "GOVERNING  " : "", s.index() + 1, s.label(),
                    s.type().key());
            if (s.failure().isPresent()) {
                out.println("   not computed: " + s.failure().get());
                out.println();
                continue;
            }
            double p1 = s.relievingPressurePa().getAsDouble();
            row(out, "Relieving pressure P1", q(u, P, p1, String.format(Locale.ROOT, "%.1f kPa abs", p1 / 1e3)));
            s.relievingTemperatureK().ifPresent(t -> row(out, "Relieving temperature T1",
                    q(u, org.ventcase.report.DisplayUnits.Kind.TEMPERATURE, t, Text.temperature(t))));
            s.heatInputW().ifPresent(hq -> row(out, "Heat input Q", q(u, org.ventcase.report.DisplayUnits.Kind.POWER,
                    hq, String.format(Locale.ROOT, "%.1f kW", hq / 1e3))));
            s.latentHeatJPerKg().ifPresent(l -> row(out, "Latent heat", q(u,
                    org.ventcase.report.DisplayUnits.Kind.SPECIFIC_ENERGY, l, String.format(Locale.ROOT, "%.1f kJ/kg",
                            l / 1e3))));
            s.reliefLoadKgPerS().ifPresent(w -> row(out, "Relief load W", q(u,
                    org.ventcase.report.DisplayUnits.Kind.MASS_FLOW, w, String.format(Locale.ROOT, "%.1f kg/h",
                            w * 3600))));
            s.relievedFluid().ifPresent(f -> row(out, "Relieved " + f.phase().label(), fluid(f, u)));
            s.requiredAreaM2().ifPresent(a -> row(out, "Required effective area", u == null ? String.format(Locale.ROOT,
                    "%.1f mm2 (%.4f in2), %s", a * 1e6, a * 1e6 / 645.16, s.sizingEquation())
                    : u.format(org.ventcase.report.DisplayUnits.Kind.ORIFICE_AREA, a) + ", " + s.sizingEquation()));
            s.orifice().ifPresent(o -> row(out, "API 526 orifice", u == null ? String.format(Locale.ROOT,
                    "%s (%.0f mm2), margin %.0f %%", o.designation(), o.selectedAreaMm2(), o.marginPercent())
                    : String.format(Locale.ROOT, "%s (%s), margin %.0f %%", o.designation(),
                            u.plain(org.ventcase.report.DisplayUnits.Kind.ORIFICE_AREA, o.selectedAreaMm2() * 1e-6),
                            o.marginPercent())));
            if (!s.loadCurve().isEmpty()) {
                row(out, "Load curve", s.loadCurve().size() + " points (in the results JSON)");
            }
            out.println();
        }
        out.println("Governing rule: " + r.governingRule());
        out.println();
        Inventory inv = r.inventory();
        out.println(("INVENTORY (" + inv.mode().name().toLowerCase(Locale.ROOT) + ", "
                + q(u, org.ventcase.report.DisplayUnits.Kind.TEMPERATURE, inv.temperatureK(),
                        Text.temperature(inv.temperatureK())) + ", "
                + q(u, P, inv.pressurePa(), String.format(Locale.ROOT, "%.1f kPa abs", inv.pressurePa() / 1e3)) + ")")
                .replace('\u00A0', ' '));
        row(out, "Vessel", r.vessel().vessel().describe());
        if (u == null) {
            row(out, "Volume total / liquid", String.format(Locale.ROOT, "%.2f m3 / %.2f m3", r.vessel().totalVolume(),
                    r.vessel().liquidVolume()));
            row(out, "Wetted / fire-exposed area", String.format(Locale.ROOT, "%.2f m2 / %.2f m2",
                    r.vessel().wettedArea(), r.vessel().fire().area()));
            row(out, "Mass liquid / vapour / total", String.format(Locale.ROOT, "%.0f kg / %.0f kg / %.0f kg",
                    inv.liquidMassKg(), inv.vapourMassKg(), inv.totalMassKg()));
        } else {
            org.ventcase.report.DisplayUnits.Kind V = org.ventcase.report.DisplayUnits.Kind.VOLUME;
            org.ventcase.report.DisplayUnits.Kind A = org.ventcase.report.DisplayUnits.Kind.AREA;
            org.ventcase.report.DisplayUnits.Kind M = org.ventcase.report.DisplayUnits.Kind.MASS;
            row(out, "Volume total / liquid", u.plain(V, r.vessel().totalVolume()) + " / "
                    + u.plain(V, r.vessel().liquidVolume()));
            row(out, "Wetted / fire-exposed area", u.plain(A, r.vessel().wettedArea()) + " / "
                    + u.plain(A, r.vessel().fire().area()));
            row(out, "Mass liquid / vapour / total", u.plain(M, inv.liquidMassKg()) + " / "
                    + u.plain(M, inv.vapourMassKg()) + " / " + u.plain(M, inv.totalMassKg()));
        }
        for (Map.Entry<String, Double> e : inv.massPerComponentKg().entrySet()) {
            row(out, "  " + e.getKey(), u == null ? String.format(Locale.ROOT, "%.0f kg", e.getValue())
                    : u.plain(org.ventcase.report.DisplayUnits.Kind.MASS, e.getValue()));
        }
        if (!r.warnings().isEmpty()) {
            out.println();
            out.println("WARNINGS");
            for (CaseResult.CaseWarning w : r.warnings()) {
                boolean us = u != null && u.system() == org.ventcase.report.UnitSystem.US;
                out.println("  ! " + (w.scenarios().isEmpty() ? "" : "[" + String.join("; ", w.scenarios()) + "] ")
                        + (us ? org.ventcase.report.QuantityText.usFirst(w.message()) : w.message()));
            }
        }
    }

    private static String fluid(RelievedFluid f, org.ventcase.report.DisplayUnits u) {
        String rho = u == null ? String.format(Locale.ROOT, "%.4g kg/m3", f.density())
                : u.plain(org.ventcase.report.DisplayUnits.Kind.DENSITY, f.density());
        // kg/kmol and lb/lbmol are the same number
        String mu = u != null && u.system() == org.ventcase.report.UnitSystem.US ? "lb/lbmol" : "kg/kmol";
        if (f.phase() == org.ventcase.relief.RelievedFluid.Phase.LIQUID) {
            return String.format(Locale.ROOT, "M %.2f %s, Z %.4f, %s", f.molarMass(), mu, f.z(), rho);
        }
        return String.format(Locale.ROOT, "M %.2f %s, Z %.4f, k %.4f, %s", f.molarMass(), mu, f.z(),
                f.kIdeal(), rho);
    }

    private static void row(PrintWriter out, String label, String value) {
        // the sheet's no-break spaces between number and unit are plain spaces on a console
        out.printf(Locale.ROOT, "   %-30s %s%n", label, Text.plain(value));
    }
}
