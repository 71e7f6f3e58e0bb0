package org.ventcase.app;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
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
import java.util.Optional;
import java.util.function.BooleanSupplier;
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

/**
 * The wizard's audit mode's bridge to {@link Audit}: reads a vessel register (a file on disk or
 * the packaged invented demo register) and optionally a thresholds file, runs the audit with
 * progress (rows done of total) and cancellation, and writes the per-vessel CSV and the summary
 * PDF, both atomically. The same steps as {@code ventcase audit} on a register file. Free of
 * JavaFX; called off the application thread.
 */
public final class AuditRunner {

    /** The packaged invented demo register and its thresholds (under demo-cases/register/). */
    public static final String DEMO_REGISTER = "kestrel-point-register.csv";
    public static final String DEMO_THRESHOLDS = "kestrel-point-thresholds.csv";

    private static final String DEMO_DIR = "/org/ventcase/demo-cases/register/";

    /** Vessels listed in each "largest" table (as on the summary sheet). */
    public static final int TOP = AuditResult.TOP;

    /** A CSV input: a file on disk, or a packaged demo file by name. */
    public record Input(String name, Optional<Path> path) {
        public static Input file(Path p) {
            return new Input(p.getFileName().toString(), Optional.of(p));
        }

        public static Input demo(String name) {
            if (!name.equals(DEMO_REGISTER) && !name.equals(DEMO_THRESHOLDS)) {
                throw new IllegalArgumentException("no demo register file " + name);
            }
            return new Input(name, Optional.empty());
        }

        byte[] bytes() {
            try {
                if (path.isPresent()) {
                    // bounded while reading (a growing file or a device stops at the limit), as the CLI reads
                    return org.ventcase.common.BoundedRead.bytes(path.get(), Register.MAX_BYTES).orElseThrow(() ->
                            InvalidInputException.invalid(name, "more than " + Register.MAX_BYTES + " bytes",
                                    "expected a file of at most " + Register.MAX_BYTES + " bytes"));
                }
                try (InputStream in = AuditRunner.class.getResourceAsStream(DEMO_DIR + name)) {
                    if (in == null) {
                        throw new IllegalStateException("the packaged demo file " + DEMO_DIR + name + " is missing");
                    }
                    return in.readAllBytes();
                }
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read " + name + ": " + org.ventcase.common.FileErrors.reason(e), e);
            }
        }
    }

    /**
     * A finished audit.
     *
     * @param result         the audit
     * @param registerName   the register's file name
     * @param thresholdsName the thresholds file's name, when one was given
     * @param inputHash      SHA-256 of the register and thresholds as read
     * @param ignoredColumns the register's header cells that are not register columns (docs/audit.md)
     */
    public record Outcome(AuditResult result, String registerName, Optional<String> thresholdsName,
                          String inputHash, List<String> ignoredColumns) {

        public Outcome {
            ignoredColumns = List.copyOf(ignoredColumns);
        }

        public long count(VesselAudit.Status s) {
            return result.count(s);
        }
    }

    /** Receives rows done of total; called from worker threads. */
    @FunctionalInterface
    public interface Progress {
        void update(int done, int total);
    }

    /**
     * Reads the register (and thresholds) and runs the audit.
     *
     * @throws InvalidInputException the register or thresholds file is not accepted (the message
     *         names the line and column)
     * @throws CaseRunner.Cancelled when {@code cancelled} turned true before the audit finished
     */
    public Outcome run(Input register, Optional<Input> thresholds, int threads, Progress progress,
                       BooleanSupplier cancelled) {
        MessageDigest hash = sha256();
        byte[] reg = register.bytes();
        hash.update(reg);
        // strict UTF-8, as the CLI reads: Latin-1 or UTF-16 is refused with the line and column
        Register parsed = Register.parse(org.ventcase.common.Utf8.decode(reg, register.name()), register.name());
        Thresholds th = thresholds(thresholds, hash);
        check(cancelled);
        progress.update(0, parsed.rows().size());
        AuditResult r;
        try {
            r = Audit.run(parsed, th, Math.max(1, threads), (d, n) -> {
                check(cancelled);
                progress.update(d, n);
            });
        } catch (IllegalStateException e) {
            if (e.getCause() instanceof CaseRunner.Cancelled c) {
                throw c;
            }
            throw e;
        }
        check(cancelled);
        return new Outcome(r, register.name(), thresholds.map(Input::name), HexFormat.of().formatHex(hash.digest()),
                parsed.ignoredColumns());
    }

    /**
     * The command line's audit: the register file, or a folder of case files (*.json, searched
     * recursively; the area is the sub-folder), read, computed and written a chunk at a time
     * ({@link Audit#CHUNK_ROWS} rows), each chunk's rows streamed to the per-vessel CSV when one is
     * asked for, so that memory does not grow with the register. The outcome keeps the totals and
     * summaries, not the rows.
     *
     * @param csv where to write the per-vessel CSV (atomically), or empty
     */
    public Outcome stream(Path input, Optional<Input> thresholds, int threads, Audit.Progress progress,
                          Optional<Path> csv) throws IOException {
        MessageDigest hash = sha256();
        String name = input.getFileName() == null ? input.toString() : input.getFileName().toString();
        Register.Stream register = null;
        FolderItems folder = null;
        int rows;
        if (java.nio.file.Files.isDirectory(input)) {
            folder = new FolderItems(input, hash);
            rows = folder.size();
        } else {
            byte[] bytes = Input.file(input).bytes();
            hash.update(bytes);
            String text = org.ventcase.common.Utf8.decode(bytes, name);
            rows = Register.countRows(text, name);
            register = Register.stream(text, name);
        }
        Thresholds th = thresholds(thresholds, hash);
        AuditResult r;
        try (org.ventcase.audit.AuditCsv.Spool spool = csv.isPresent()
                ? new org.ventcase.audit.AuditCsv.Spool(csv.get()) : null) {
            java.util.function.Consumer<List<VesselAudit>> sink = spool == null ? c -> { } : spool;
            r = register != null ? Audit.run(register, rows, th, Math.max(1, threads), progress, sink)
                    : Audit.run(folder, rows, th, Math.max(1, threads), progress, sink);
            if (spool != null) {
                spool.finish();
            }
        }
        return new Outcome(r, name, thresholds.map(Input::name), HexFormat.of().formatHex(hash.digest()),
                register != null ? register.ignoredColumns() : List.of());
    }

    private static Thresholds thresholds(Optional<Input> thresholds, MessageDigest hash) {
        if (thresholds.isEmpty()) {
            return Thresholds.none();
        }
        byte[] t = thresholds.get().bytes();
        hash.update(t);
        return Thresholds.parse(org.ventcase.common.Utf8.decode(t, thresholds.get().name()), thresholds.get().name());
    }

    private static void check(BooleanSupplier cancelled) {
        if (cancelled.getAsBoolean()) {
            throw new CaseRunner.Cancelled();
        }
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java runtime", e);
        }
    }

    /** Writes the per-vessel CSV atomically. */
    public static void writeCsv(Outcome o, Path target) throws IOException {
        AuditCsv.write(o.result(), target);
    }

    /** Writes the summary PDF atomically. */
    public static void writePdf(Outcome o, Path target, CalculationSheet.PageSize size, String toolVersion)
            throws IOException {
        writePdf(o, target, size, toolVersion, Optional.empty(), "", org.ventcase.report.UnitSystem.SI);
    }

    /**
     * Writes the summary PDF atomically, with the title (default: the register's name) and preparer
     * given, in the unit system given.
     */
    public static void writePdf(Outcome o, Path target, CalculationSheet.PageSize size, String toolVersion,
                                Optional<String> title, String preparer, org.ventcase.report.UnitSystem units)
            throws IOException {
        AuditSheet.write(o.result(), new AuditSheet.Info(title.orElse("Inventory audit of the vessel register "
                + o.registerName()), o.registerName(), o.inputHash(), LocalDate.now(), preparer, toolVersion), target,
                size, units);
    }

    /**
     * A folder of case files: each *.json in path order, the area is its sub-folder; read
     * {@link Audit#CHUNK_ROWS} files at a time, in order (the hash takes each file's relative path and
     * bytes in that order).
     */
    static final class FolderItems implements java.util.Iterator<List<AuditItem>> {
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

}
