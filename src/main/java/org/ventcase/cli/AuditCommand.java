package org.ventcase.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.ventcase.app.AuditRunner;
import org.ventcase.audit.Audit;
import org.ventcase.audit.AuditError;
import org.ventcase.audit.AuditResult;
import org.ventcase.audit.Thresholds;
import org.ventcase.audit.VesselAudit;
import org.ventcase.common.InvalidInputException;
import org.ventcase.report.CalculationSheet;
import org.ventcase.report.UnitSystem;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code ventcase audit}: inventory and screening fire load of every vessel of a register, with totals. */
@Command(name = "audit", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Inventory audit of a vessel register: contents, screening fire load and totals per vessel, area, "
                + "fluid and component.",
        description = {"REGISTER is a CSV with one vessel a row (columns: docs/audit.md, template: "
                + "templates/register-template.csv) or a folder of case files (*.json, searched recursively; the "
                + "area is the sub-folder). Every vessel goes through the same case calculation as 'ventcase calc' "
                + "with one screening scenario: API Std 521 pool fire, bare, adequate drainage, W = Q / L at P1 "
                + "(gas-filled vessels: the unwetted-vessel method). A row that cannot be computed is listed with "
                + "its row number, field and reason; the others are still computed.",
                "Thresholds are the user's figures (--thresholds: CSV substance,threshold,label); Ventcase ships "
                        + "none.",
                "Exit code 0: every row computed (ok or partial); 2: one or more rows could not be computed (the "
                        + "outputs are still written), or the register, thresholds or options are invalid.",
                Main.FIRST_PASS_HELP},
        footer = ExitCode.HELP_LIST)
final class AuditCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "REGISTER.csv|FOLDER", description = "The vessel register or a folder of "
            + "case files.")
    Path input;

    @Option(names = {"-o", "--output"}, paramLabel = "AUDIT.csv",
            description = "Write the per-vessel CSV here (atomically). Text cells are neutralised against "
                    + "spreadsheet formulas; numbers are plain.")
    Path csv;

    @Option(names = "--pdf", paramLabel = "AUDIT.pdf", description = "Write the summary PDF here (atomically).")
    Path pdf;

    @Mixin
    PdfOptions pdfOptions;

    @Option(names = "--thresholds", paramLabel = "FILE",
            description = "User-entered threshold quantities: CSV with substance, threshold (mass with unit), label.")
    Path thresholdsFile;

    @Option(names = "--title", paramLabel = "TEXT", description = "Title for the PDF's title block.")
    String title;

    @Option(names = "--preparer", paramLabel = "NAME", defaultValue = "", description = "Name in the title block.")
    String preparer;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all processors).")
    Integer threads;

    @Option(names = "--progress", description = "Show the progress bar on standard error even when it is not a "
            + "terminal.")
    boolean progress;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (n < 1) {
            throw InvalidInputException.invalid("--threads", n, "expected at least 1");
        }
        OutputFiles.refuseFolderOrInput("--output", csv, input, thresholdsFile);
        OutputFiles.refuseFolderOrInput("--pdf", pdf, input, thresholdsFile);
        CalculationSheet.PageSize size = pdfOptions.size();
        UnitSystem system = pdfOptions.system();
        if (!Files.exists(input)) {
            throw new java.nio.file.NoSuchFileException(input.toString());
        }
        boolean bar = progress || System.console() != null;
        ProgressBar pb = new ProgressBar(err, bar);
        java.util.Optional<AuditRunner.Input> th = thresholdsFile == null ? java.util.Optional.empty()
                : java.util.Optional.of(AuditRunner.Input.file(thresholdsFile));
        AuditRunner.Outcome o = new AuditRunner().stream(input, th, n, pb, java.util.Optional.ofNullable(csv));
        pb.finish();
        if (!o.ignoredColumns().isEmpty()) {
            err.println("ventcase: columns not used (not register columns, docs/audit.md): "
                    + String.join(", ", o.ignoredColumns()));
        }
        AuditResult r = o.result();
        String registerName = o.registerName();
        if (pdf != null) {
            AuditRunner.writePdf(o, pdf, size, Main.version(), java.util.Optional.ofNullable(title), preparer, system);
        }
        print(out, r, registerName, system == UnitSystem.US);
        if (csv != null) {
            out.println("Per-vessel CSV written to " + csv);
        }
        if (pdf != null) {
            out.println("Summary PDF written to " + pdf);
        }
        return r.count(VesselAudit.Status.ERROR) > 0 ? ExitCode.INVALID_INPUT : ExitCode.OK;
    }

    private static void print(PrintWriter out, AuditResult r, String register, boolean us) {
        // masses in t (SI) or lb (US customary, CustomaryUnits.KG_PER_LB exact)
        double per = us ? org.ventcase.units.CustomaryUnits.KG_PER_LB : 1e3;
        String mu = us ? "lb" : "t";
        String mf = us ? "%.0f" : "%.1f";
        out.println("VENTCASE AUDIT: " + register);
        DemoCommand.CAUTIONS.forEach(out::println);
        out.println();
        out.printf(Locale.ROOT, "Rows %d: ok %d, partial %d, error %d%n", r.rowCount(),
                r.count(VesselAudit.Status.OK), r.count(VesselAudit.Status.PARTIAL), r.count(VesselAudit.Status.ERROR));
        out.printf(Locale.ROOT, "Site inventory: " + mf + " %s (liquid " + mf + " %s, vapour " + mf + " %s)%n",
                r.site().totalMassKg() / per, mu, r.site().liquidMassKg() / per, mu, r.site().vapourMassKg() / per, mu);
        out.println();
        out.println("BY AREA");
        for (AuditResult.Group g : r.byArea()) {
            out.printf(Locale.ROOT, "   %-32s %5d vessels %12" + mf.substring(1) + " %s%n", g.name(), g.vessels(),
                    g.totalMassKg() / per, mu);
        }
        out.println("BY COMPONENT");
        r.site().massPerComponentKg().forEach((k, v) -> out.printf(Locale.ROOT, "   %-32s %12" + mf.substring(1)
                + " %s%n", k, v / per, mu));
        if (!r.thresholds().isEmpty()) {
            out.println("THRESHOLDS (user-entered)");
            for (AuditResult.ThresholdCheck c : r.thresholds()) {
                out.printf(Locale.ROOT, "   %-20s site %10" + mf.substring(1) + " %s of %10" + mf.substring(1)
                        + " %s  %s%s%n", c.entry().component().name(), c.siteKg() / per, mu,
                        c.entry().thresholdKg() / per, mu, c.siteExceeds() ? "EXCEEDED" : "below",
                        c.areasExceeding().isEmpty() ? "" : "; areas above: " + String.join(", ",
                                c.areasExceeding().keySet()));
            }
        }
        long shortCount = r.digest().installedShortCount();
        if (shortCount > 0) {
            out.println("Installed orifices short of the screening area: " + shortCount + " (flag in the CSV)");
        }
        List<VesselAudit> bad = r.notComputed();
        if (!bad.isEmpty()) {
            long all = r.digest().notComputedCount();
            out.println("ROWS NOT COMPUTED (row, tag, status, field: reason)" + (all > bad.size() ? "; the first "
                    + bad.size() + " of " + all + ", the CSV lists all" : ""));
            for (VesselAudit v : bad) {
                out.printf(Locale.ROOT, "   %d %s %s %s%n", v.row(), v.tag(), v.status().word(),
                        v.error().map(AuditError::message).orElse(""));
            }
        }
        out.println();
    }

    /** A one-line progress bar on standard error, redrawn when the percentage changes. */
    static final class ProgressBar implements Audit.Progress {
        private static final int WIDTH = 40;
        private final PrintWriter err;
        private final boolean on;
        private int shown = -1;
        private boolean drawn;

        ProgressBar(PrintWriter err, boolean on) {
            this.err = err;
            this.on = on;
        }

        @Override
        public synchronized void update(int done, int total) {
            if (!on || total == 0) {
                return;
            }
            int pct = (int) (100L * done / total);
            if (pct == shown) {
                return;
            }
            shown = pct;
            int fill = pct * WIDTH / 100;
            err.print("\r[" + "#".repeat(fill) + " ".repeat(WIDTH - fill) + "] " + String.format(Locale.ROOT,
                    "%3d %% (%d of %d rows)", pct, done, total));
            err.flush();
            drawn = true;
        }

        synchronized void finish() {
            if (drawn) {
                err.println();
                err.flush();
            }
        }
    }
}
