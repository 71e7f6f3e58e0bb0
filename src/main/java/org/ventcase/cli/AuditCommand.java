package org.ventcase.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Stream;

import org.ventcase.audit.Audit;
import org.ventcase.audit.AuditCsv;
import org.ventcase.audit.AuditError;
import org.ventcase.audit.AuditItem;
import org.ventcase.audit.AuditResult;
import org.ventcase.audit.Register;
import org.ventcase.audit.RegisterCases;
import org.ventcase.audit.ScreeningCase;
import org.ventcase.audit.Thresholds;
import org.ventcase.audit.VesselAudit;
import org.ventcase.calc.CaseInput;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.CaseValidationException;
import org.ventcase.casefile.Problem;
import org.ventcase.common.InvalidInputException;
import org.ventcase.report.AuditSheet;
import org.ventcase.report.CalculationSheet;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
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
                "First-pass estimates only: final relief design must be verified by a qualified engineer under "
                        + "the applicable codes (e.g. ASME BPVC Section VIII, API Std 520/521, ISO 4126/23251) "
                        + "and local regulations."},
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

    @Option(names = "--thresholds", paramLabel = "FILE",
            description = "User-entered threshold quantities: CSV with substance, threshold (mass with unit), label.")
    Path thresholdsFile;

    @Option(names = "--title", paramLabel = "TEXT", description = "Title for the PDF's title block.")
    String title;

    @Option(names = "--preparer", paramLabel = "NAME", defaultValue = "", description = "Name in the title block.")
    String preparer;

    @Option(names = "--page", paramLabel = "SIZE", defaultValue = "a4", description = "PDF page size: a4 or letter.")
    String page;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all processors).")
    Integer threads;

    @Option(names = "--progress", description = "Show the progress bar on standard error even when it is not a "
            + "terminal.")
    boolean progress;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        CalculationSheet.PageSize size = CalculationSheet.PageSize.parse("--page", page);
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (n < 1) {
            throw InvalidInputException.invalid("--threads", n, "expected at least 1");
        }
        for (Path p : new Path[] {csv, pdf}) {
            if (p != null && Files.isDirectory(p)) {
                throw InvalidInputException.invalid(p.equals(csv) ? "--output" : "--pdf", p, "expected a file name, "
                        + "not a folder");
            }
            if (p != null && (p.toAbsolutePath().normalize().equals(input.toAbsolutePath().normalize())
                    || thresholdsFile != null && p.toAbsolutePath().normalize()
                    .equals(thresholdsFile.toAbsolutePath().normalize()))) {
                throw InvalidInputException.invalid(p.equals(csv) ? "--output" : "--pdf", p,
                        "names an input file; inputs are never overwritten: choose another output file");
            }
        }
        if (!Files.exists(input)) {
            throw new java.nio.file.NoSuchFileException(input.toString());
        }
        MessageDigest hash = sha256();
        FolderItems items = null;
        Register.Stream register = null;
        int registerRows = 0;
        String registerName = input.getFileName() == null ? input.toString() : input.getFileName().toString();
        if (Files.isDirectory(input)) {
            items = new FolderItems(input, hash);
        } else {
            byte[] bytes = org.ventcase.common.BoundedRead.bytes(input, Register.MAX_BYTES).orElseThrow(() ->
                    InvalidInputException.invalid(input.toString(), "more than " + Register.MAX_BYTES + " bytes",
                            "expected a register of at most " + Register.MAX_BYTES + " bytes"));
            hash.update(bytes);
            String text = org.ventcase.common.Utf8.decode(bytes, registerName);
            bytes = null;
            registerRows = Register.countRows(text, registerName);
            register = Register.stream(text, registerName);
        }
        Thresholds th = Thresholds.none();
        if (thresholdsFile != null) {
            byte[] bytes = org.ventcase.common.BoundedRead.bytes(thresholdsFile, Register.MAX_BYTES).orElseThrow(() ->
                    InvalidInputException.invalid("--thresholds", "more than " + Register.MAX_BYTES + " bytes",
                            "expected a thresholds file of at most " + Register.MAX_BYTES + " bytes"));
            hash.update(bytes);
            th = Thresholds.parse(org.ventcase.common.Utf8.decode(bytes, thresholdsFile.getFileName().toString()),
                    thresholdsFile.getFileName().toString());
        }
        boolean bar = progress || System.console() != null;
        ProgressBar pb = new ProgressBar(err, bar);
        if (register != null && !register.ignoredColumns().isEmpty()) {
            err.println("ventcase: columns not used (not register columns, docs/audit.md): "
                    + String.join(", ", register.ignoredColumns()));
        }
        AuditResult r;
        // streamed: each chunk's rows go to the CSV spool and the summaries, then are dropped, so
        // memory does not grow with the register or the folder
        try (AuditCsv.Spool spool = csv == null ? null : new AuditCsv.Spool(csv)) {
            java.util.function.Consumer<List<VesselAudit>> sink = spool == null ? rows -> { } : spool;
            r = register != null ? Audit.run(register, registerRows, th, n, pb, sink)
                    : Audit.run(items, items.size(), th, n, pb, sink);
            pb.finish();
            if (spool != null) {
                spool.finish();
            }
        }
        if (pdf != null) {
            String t = title != null ? title : "Inventory audit of the vessel register " + registerName;
            AuditSheet.write(r, new AuditSheet.Info(t, registerName, HexFormat.of().formatHex(hash.digest()),
                    LocalDate.now(), preparer, Main.version()), pdf, size);
        }
        print(out, r, registerName);
        if (csv != null) {
            out.println("Per-vessel CSV written to " + csv);
        }
        if (pdf != null) {
            out.println("Summary PDF written to " + pdf);
        }
        return r.count(VesselAudit.Status.ERROR) > 0 ? ExitCode.INVALID_INPUT : ExitCode.OK;
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java runtime", e);
        }
    }

    /**
     * A folder of case files: each *.json in path order, the area is its sub-folder; read
     * {@link Audit#CHUNK_ROWS} files at a time, in order (the hash takes each file's relative path and
     * bytes in that order).
     */
    private static final class FolderItems implements java.util.Iterator<List<AuditItem>> {
        private final Path dir;
        private final MessageDigest hash;
        private final List<Path> files;
        private int next;

        FolderItems(Path dir, MessageDigest hash) throws IOException {
            this.dir = dir;
            this.hash = hash;
            try (Stream<Path> s = Files.walk(dir)) {
                files = s.filter(p -> Files.isRegularFile(p) && p.getFileName().toString().endsWith(".json"))
                        .sorted().toList();
            }
            if (files.isEmpty()) {
                throw InvalidInputException.invalid(dir.toString(), "(no *.json)",
                        "expected a folder holding case files");
            }
        }

        int size() {
            return files.size();
        }

        @Override
        public boolean hasNext() {
            return next < files.size();
        }

        @Override
        public List<AuditItem> next() {
            if (!hasNext()) {
                throw new java.util.NoSuchElementException();
            }
            List<AuditItem> items = new ArrayList<>();
            int end = Math.min(files.size(), next + Audit.CHUNK_ROWS);
            for (; next < end; next++) {
                try {
                    items.add(item(next + 1, files.get(next)));
                } catch (IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
            }
            return items;
        }

        private AuditItem item(int row, Path f) throws IOException {
            String rel = dir.relativize(f).toString().replace('\\', '/');
            Path parent = dir.relativize(f).getParent();
            String area = parent == null ? "(top folder)" : parent.toString().replace('\\', '/');
            hash.update(rel.getBytes(StandardCharsets.UTF_8));
            hash.update(Files.readAllBytes(f));
            try {
                CaseInput ci = CaseInputs.from(CaseFiles.load(f));
                return AuditItem.of(row, rel, ci.tag(), area, fluidLabel(ci), ScreeningCase.of(ci),
                        java.util.Optional.empty(), java.util.OptionalDouble.empty(), List.of());
            } catch (CaseValidationException e) {
                Problem p = e.problems().get(0);
                String more = e.problems().size() > 1 ? " (and " + (e.problems().size() - 1) + " more: 'ventcase check "
                        + rel + "' lists them)" : "";
                return AuditItem.failed(row, rel, "", area, "", new AuditError(p.path(), p.value(),
                        p.accepted() + more));
            } catch (InvalidInputException e) {
                return AuditItem.failed(row, rel, "", area, "", new AuditError(e.field(), e.value(),
                        e.accepted()));
            }
        }
    }

    private static String fluidLabel(CaseInput ci) {
        var x = ci.fluid().composition();
        int[] present = x.present();
        if (present.length == 1) {
            return x.components().get(present[0]).name();
        }
        List<String> parts = new ArrayList<>();
        for (int i : present) {
            parts.add(x.components().get(i).name() + ":" + String.format(Locale.ROOT, "%.4g", x.fraction(i)));
        }
        return String.join(",", parts);
    }

    private static void print(PrintWriter out, AuditResult r, String register) {
        out.println("VENTCASE AUDIT: " + register);
        DemoCommand.CAUTIONS.forEach(out::println);
        out.println();
        out.printf(Locale.ROOT, "Rows %d: ok %d, partial %d, error %d%n", r.rowCount(),
                r.count(VesselAudit.Status.OK), r.count(VesselAudit.Status.PARTIAL), r.count(VesselAudit.Status.ERROR));
        out.printf(Locale.ROOT, "Site inventory: %.1f t (liquid %.1f t, vapour %.1f t)%n", r.site().totalMassKg() / 1e3,
                r.site().liquidMassKg() / 1e3, r.site().vapourMassKg() / 1e3);
        out.println();
        out.println("BY AREA");
        for (AuditResult.Group g : r.byArea()) {
            out.printf(Locale.ROOT, "   %-32s %5d vessels %12.1f t%n", g.name(), g.vessels(), g.totalMassKg() / 1e3);
        }
        out.println("BY COMPONENT");
        r.site().massPerComponentKg().forEach((k, v) -> out.printf(Locale.ROOT, "   %-32s %12.1f t%n", k, v / 1e3));
        if (!r.thresholds().isEmpty()) {
            out.println("THRESHOLDS (user-entered)");
            for (AuditResult.ThresholdCheck c : r.thresholds()) {
                out.printf(Locale.ROOT, "   %-20s site %10.1f t of %10.1f t  %s%s%n", c.entry().component().name(),
                        c.siteKg() / 1e3, c.entry().thresholdKg() / 1e3, c.siteExceeds() ? "EXCEEDED" : "below",
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
