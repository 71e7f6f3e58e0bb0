package org.ventcase.report;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.ventcase.audit.AuditResult;
import org.ventcase.audit.VesselAudit;
import org.ventcase.casefile.Templates;
import org.ventcase.report.SheetModel.Row;
import org.ventcase.report.SheetModel.Table;
import org.ventcase.report.DisplayUnits.Kind;

/**
 * The summary PDF of an inventory audit: title block, the counts, totals by area, by component and
 * by fluid, a bar chart of the inventory by area, the threshold checks, the largest vessels by
 * inventory and by screening fire load, the flagged rows, the rows that could not be computed,
 * the screening basis, the cautions and the code-deferral note. Laid out by
 * {@link CalculationSheet}; nothing here computes beyond sorting and unit conversion.
 */
public final class AuditSheet {

    /** Vessels listed in each "largest" table. */
    public static final int TOP = AuditResult.TOP;

    /** Rows listed in the flagged and error tables before the sheet refers to the CSV. */
    public static final int MAX_LISTED = AuditResult.LISTED;

    private final boolean us;

    private AuditSheet(UnitSystem units) {
        this.us = units == UnitSystem.US;
    }

    /**
     * What the title block says.
     *
     * @param title       e.g. "Kestrel Point terminal: inventory audit of the vessel register"
     * @param register    the register's file or folder name (printed in the Tag field)
     * @param inputHash   SHA-256 of the register (and thresholds) as read
     * @param date        date of the audit
     * @param preparer    who ran it (may be empty)
     * @param toolVersion Ventcase version
     */
    public record Info(String title, String register, String inputHash, LocalDate date, String preparer,
                       String toolVersion) {
    }

    /** Writes the summary PDF atomically. */
    public static void write(AuditResult r, Info info, Path target, CalculationSheet.PageSize size)
            throws IOException {
        write(r, info, target, size, UnitSystem.SI);
    }

    /** Writes the summary PDF atomically, its figures in the unit system given. */
    public static void write(AuditResult r, Info info, Path target, CalculationSheet.PageSize size, UnitSystem units)
            throws IOException {
        CalculationSheet.write(model(r, info, units), target, size);
    }

    // Masses in t (SI) or lb (US); the US factors are DisplayUnits'.
    private String t(double kg) {
        return us ? String.format(Locale.ROOT, "%,.0f lb", usValue(Kind.MASS, kg))
                : String.format(Locale.ROOT, "%,.1f t", kg / 1000.0);
    }

    private String kgh(double kgPerS) {
        return us ? String.format(Locale.ROOT, "%,.0f lb/h", usValue(Kind.MASS_FLOW, kgPerS))
                : String.format(Locale.ROOT, "%,.0f kg/h", kgPerS * 3600);
    }

    private String mm2(double m2) {
        return us ? String.format(Locale.ROOT, "%,.3f in²", usValue(Kind.ORIFICE_AREA, m2))
                : String.format(Locale.ROOT, "%,.0f mm²", m2 * 1e6);
    }

    private static double usValue(Kind k, double si) {
        return DisplayUnits.convert(k, si, UnitSystem.US);
    }

    /** A sentence written in SI, US first on a US sheet. */
    private String said(String text) {
        return us ? QuantityText.usFirst(text) : text;
    }

    private static String rowRef(VesselAudit v) {
        return Integer.toString(v.row());
    }

    /** The sheet model, in SI. */
    public static SheetModel model(AuditResult r, Info info) {
        return model(r, info, UnitSystem.SI);
    }

    /** The sheet model in the unit system given. */
    public static SheetModel model(AuditResult r, Info info, UnitSystem units) {
        return new AuditSheet(units).build(r, info);
    }

    private SheetModel build(AuditResult r, Info info) {
        SheetIdentity id = new SheetIdentity(info.title(), info.register(), "A", info.date(), info.preparer(), "",
                "Ventcase", info.toolVersion(), info.inputHash());
        long ok = r.count(VesselAudit.Status.OK);
        long partial = r.count(VesselAudit.Status.PARTIAL);
        long error = r.count(VesselAudit.Status.ERROR);
        long shortCount = r.digest().installedShortCount();
        long withInstalled = r.digest().withInstalled();
        long exceeded = r.thresholds().stream().filter(c -> c.siteExceeds() || !c.areasExceeding().isEmpty()).count();

        List<Table> results = new ArrayList<>();
        results.add(Table.keyValue("Audit summary", List.of(
                Row.of("Input rows", Integer.toString(r.rowCount())),
                Row.of("Computed (ok)", Long.toString(ok)),
                Row.of("Inventory only, fire load not computed (partial)", Long.toString(partial)),
                Row.of("Not computed (error): listed with row, field and reason", Long.toString(error)),
                Row.of("Site inventory, liquid + vapour", t(r.site().liquidMassKg()) + " + "
                        + t(r.site().vapourMassKg()) + " = " + t(r.site().totalMassKg())),
                Row.of("Installed orifices checked / short of the screening area", withInstalled + " / "
                        + shortCount),
                Row.of("Thresholds entered / exceeded at site or area level", r.thresholds().size() + " / "
                        + exceeded)),
                "Totals count the ok and partial rows; error rows add nothing."));

        results.add(groupTable("Totals by area", "Area", r.byArea()));
        List<Row> comp = new ArrayList<>();
        double site = r.site().totalMassKg();
        for (Map.Entry<String, Double> e : r.site().massPerComponentKg().entrySet()) {
            comp.add(Row.of(e.getKey(), t(e.getValue()), site > 0
                    ? String.format(Locale.ROOT, "%.1f %%", 100 * e.getValue() / site) : "0 %"));
        }
        results.add(new Table("Totals by component (site)", List.of("Component", "Mass", "Share of site mass"),
                List.of(2.0, 1.2, 1.2), comp, "Mass per component over both phases: m_i = n x_i M_i per phase."));
        results.add(groupTable("Totals by fluid (as written in the register)", "Fluid", r.byFluid()));
        results.add(thresholdTable(r));
        results.add(topInventory(r));
        results.add(topFire(r));
        results.add(flagged(r));
        results.add(errors(r));

        List<Table> inputs = new ArrayList<>();
        inputs.add(Table.keyValue("Register", List.of(
                Row.of("Register", info.register()),
                Row.of("Rows", Integer.toString(r.rowCount())),
                Row.of("Screening scenario (liquid)", "API Std 521 pool fire, wetted vessel, bare (F = 1), adequate "
                        + "drainage and fire-fighting, W = Q / L at the bubble point at P1"),
                Row.of("Screening scenario (gas-filled)", said("API Std 521 unwetted vessel, wall 593 C")),
                Row.of("Device", "one conventional valve, fire overpressure 21 %, Kd 0.975, Kb = Kc = 1, back "
                        + "pressure atmospheric"),
                Row.of("Fire height; atmospheric pressure", said("7.6 m above grade; 101.325 kPa abs"))), "")
                .echoing(1));
        List<Row> th = new ArrayList<>();
        r.thresholds().forEach(c -> th.add(Row.of(c.entry().substance(), c.entry().component().name(),
                t(c.entry().thresholdKg()), c.entry().label())));
        inputs.add(new Table("Thresholds entered by the user" + (r.thresholdsOrigin().isEmpty() ? ""
                : " (" + r.thresholdsOrigin() + ")"), List.of("Substance", "Component", "Threshold", "Label / source"),
                List.of(1.2, 1.2, 1.0, 3.0), th, th.isEmpty() ? "No thresholds file was given."
                : "Figures and labels as the user entered them; Ventcase supplies none.").echoing(0, 3));

        List<String> warnings = new ArrayList<>();
        for (AuditResult.ThresholdCheck c : r.thresholds()) {
            if (c.siteExceeds()) {
                warnings.add(String.format(Locale.ROOT, "Site total of %s, %s, exceeds the threshold %s (%s) by a "
                        + "factor of %.2f.", c.entry().component().name(), t(c.siteKg()), t(c.entry().thresholdKg()),
                        c.entry().label().isEmpty() ? "no label" : c.entry().label(), c.siteRatio()));
            }
            c.areasExceeding().forEach((a, m) -> warnings.add(String.format(Locale.ROOT, "Area '%s' holds %s of %s, "
                    + "above the threshold %s.", a, t(m), c.entry().component().name(), t(c.entry().thresholdKg()))));
        }
        if (error > 0) {
            warnings.add(error + (error == 1 ? " row" : " rows") + " could not be computed and add nothing to the "
                    + "totals: see 'Rows not computed'.");
        }
        if (partial > 0) {
            warnings.add(partial + (partial == 1 ? " row has" : " rows have") + " an inventory but no screening fire "
                    + "load: see 'Rows not computed'.");
        }
        if (shortCount > 0) {
            warnings.add(shortCount + (shortCount == 1 ? " installed orifice is" : " installed orifices are")
                    + " smaller than the screening required area: see 'Flagged rows'.");
        }

        List<Figure> figures = new ArrayList<>();
        if (!r.byArea().isEmpty()) {
            List<Figure.Bar> bars = new ArrayList<>();
            for (AuditResult.Group g : r.byArea()) {
                double[] bar = us ? new double[] {usValue(Kind.MASS, g.liquidMassKg()) / 1000,
                        usValue(Kind.MASS, g.vapourMassKg()) / 1000}
                        : new double[] {g.liquidMassKg() / 1000, g.vapourMassKg() / 1000};
                bars.add(new Figure.Bar(g.name(), bar,
                        t(g.totalMassKg())));
            }
            figures.add(new Figure.BarChart("Inventory by area (liquid and vapour), sums of the single-vessel "
                    + "results.", us ? "Mass, 1000 lb" : "Mass, t", List.of("Liquid", "Vapour"), bars));
        }

        String statement = String.join("\n", SheetModels.paragraphs(block("method-audit")));
        List<SheetModel.MethodSection> method = List.of(new SheetModel.MethodSection("Screening basis of the audit",
                statement, List.of()));
        List<String> cautions = SheetModels.paragraphs(block("cautions"));
        String deferral = block("code-deferral").replace("{tag}", "the vessels of " + info.register())
                .replace("{title}", info.title()).replace("{revision}", "A")
                .replace("{ventcaseVersion}", info.toolVersion()).replace("{inputHash}", info.inputHash())
                .strip().replaceAll("\\s*\\n\\s*", " ");
        return new SheetModel(id, us ? UnitSystem.US : UnitSystem.SI, List.of(new SheetModel.RevisionRow("A", info.date().toString(),
                "Inventory audit of the register", info.preparer(), "")),
                new SheetModel.SignOff(List.of(new SheetModel.Signatory("Prepared", info.preparer()),
                        new SheetModel.Signatory("Checked", ""), new SheetModel.Signatory("Approved", ""))),
                inputs, List.of(), results, warnings, figures, method, cautions, deferral,
                (us ? "Masses in lb, loads in lb/h, areas in in²; the per-vessel CSV stays in SI, with every "
                        + "number's unit in its column header."
                        : "Masses in tonnes (1 t = 1000 kg), loads in kg/h, areas in mm²; the per-vessel CSV has every "
                        + "number with its unit in the column header."), "INVENTORY AUDIT  \u00b7  SCREENING SUMMARY");
    }

    private Table groupTable(String title, String first, List<AuditResult.Group> groups) {
        List<Row> rows = new ArrayList<>();
        for (AuditResult.Group g : groups) {
            rows.add(Row.of(g.name(), Integer.toString(g.vessels()), t(g.liquidMassKg()), t(g.vapourMassKg()),
                    t(g.totalMassKg()), g.largestFire().map(v -> v.tag() + ", " + kgh(v.fire().get()
                            .reliefLoadKgPerS())).orElse("none computed")));
        }
        return new Table(title, List.of(first, "Vessels", "Liquid", "Vapour", "Total", "Largest fire load"),
                List.of(2.2, 0.8, 1.1, 1.1, 1.1, 1.8), rows, "").echoing(0, 5);
    }

    private Table thresholdTable(AuditResult r) {
        List<Row> rows = new ArrayList<>();
        for (AuditResult.ThresholdCheck c : r.thresholds()) {
            boolean any = c.siteExceeds() || !c.areasExceeding().isEmpty();
            List<String> areas = new ArrayList<>();
            c.areasExceeding().forEach((a, m) -> areas.add(a + " (" + t(m) + ")"));
            rows.add(new Row(List.of(c.entry().component().name(), t(c.entry().thresholdKg()), t(c.siteKg()),
                    String.format(Locale.ROOT, "%.2f", c.siteRatio()), c.siteExceeds() ? "exceeded" : "below",
                    areas.isEmpty() ? "none" : String.join("; ", areas), c.entry().label()), any));
        }
        return new Table("Threshold checks", List.of("Component", "Threshold", "Site total", "Site / threshold",
                "Site", "Areas above the threshold", "Label / source"), List.of(1.1, 0.9, 0.9, 0.8, 1.0, 1.9, 1.6),
                rows, r.thresholds().isEmpty() ? "No thresholds were given (--thresholds FILE)."
                : "Exceeded means the total is greater than the threshold. Highlighted rows exceed at site or area "
                        + "level.").echoing(5, 6);
    }

    private Table topInventory(AuditResult r) {
        List<Row> rows = new ArrayList<>();
        for (VesselAudit v : r.topByInventory()) {
            VesselAudit.Contents c = v.inventory().get();
            rows.add(Row.of(rowRef(v), v.tag(), v.area(), v.fluid(), String.format(Locale.ROOT, "%.1f m³",
                    c.totalVolumeM3()), String.format(Locale.ROOT, "%.0f %%", c.levelPercentVolume()),
                    t(c.totalMassKg())));
        }
        return new Table("Largest vessels by inventory", List.of("Row", "Tag", "Area", "Fluid", "Volume",
                "Level (% vol)", "Mass"), List.of(0.5, 0.9, 1.6, 1.9, 0.8, 0.7, 0.8), rows, "").echoing(1, 2, 3);
    }

    private Table topFire(AuditResult r) {
        List<Row> rows = new ArrayList<>();
        for (VesselAudit v : r.topByFireLoad()) {
            VesselAudit.FireLoad f = v.fire().get();
            String installed = f.installed().map(i -> i.designation() + (i.covers() ? ", covers" : ", SHORT")
                    + String.format(Locale.ROOT, " (%+.0f %%)", i.marginPercent())).orElse("not given");
            rows.add(new Row(List.of(rowRef(v), v.tag(), v.area(), kgh(f.reliefLoadKgPerS()), mm2(f.requiredAreaM2()),
                    f.selectedOrifice(), installed), f.installed().map(i -> !i.covers()).orElse(false)));
        }
        return new Table("Largest screening fire loads", List.of("Row", "Tag", "Area", "Relief load W",
                "Required area", "Smallest API 526", "Installed"), List.of(0.5, 0.9, 1.6, 1.0, 1.0, 0.8, 1.6), rows,
                "Relief load and area of the screening scenario only; highlighted: the installed orifice is short.")
                .echoing(1, 2);
    }

    private Table flagged(AuditResult r) {
        List<Row> rows = new ArrayList<>();
        long total = r.digest().flaggedCount();
        for (VesselAudit v : r.digest().flagged()) {
            List<VesselAudit.Flag> fl = v.flags().stream().filter(f -> f != VesselAudit.Flag.FIRE_NOT_COMPUTED)
                    .toList();
            String detail = v.fire().flatMap(VesselAudit.FireLoad::installed).map(i -> String.format(Locale.ROOT,
                    "installed %s %s for %s required", i.designation(), mm2(i.areaM2()),
                    mm2(v.fire().get().requiredAreaM2()))).orElse("");
            rows.add(Row.of(rowRef(v), v.tag(), v.area(), String.join("; ", fl.stream()
                    .map(VesselAudit.Flag::words).toList()), detail));
        }
        return new Table("Flagged rows", List.of("Row", "Tag", "Area", "Flags", "Detail"),
                List.of(0.5, 0.9, 1.6, 1.8, 2.4), rows, total == 0 ? "No row is flagged."
                : total > rows.size() ? "The first " + rows.size() + " of " + total + " flagged rows; the CSV lists all."
                : "Flags: installed orifice short of the screening area; liquid fills the vessel before P1; vapour "
                        + "space under 5 %; stated pressure differs from the bubble pressure by more than 10 %.")
                .echoing(1, 2);
    }

    private Table errors(AuditResult r) {
        List<Row> rows = new ArrayList<>();
        long total = r.digest().notComputedCount();
        for (VesselAudit v : r.notComputed()) {
            rows.add(Row.of(rowRef(v), v.tag(), v.status().word(), v.error().map(e -> e.field()).orElse(""),
                    v.error().map(e -> (e.value().isEmpty() ? "" : "'" + e.value() + "': ") + e.reason())
                            .orElse("")));
        }
        return new Table("Rows not computed", List.of("Row", "Tag", "Status", "Field", "Reason"),
                List.of(0.5, 0.9, 0.6, 1.0, 4.2), rows, total == 0 ? "Every row was computed."
                : (total > rows.size() ? "The first " + rows.size() + " of " + total + " rows; the CSV lists all. " : "")
                        + "Row is the line of the register file (for a folder, the case file's position).")
                .echoing(1);
    }

    private static String block(String name) {
        return Templates.text(name).orElseThrow(() -> new IllegalStateException("missing text block " + name));
    }
}
