package org.ventcase.app;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.LocalDate;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.util.function.BooleanSupplier;

import org.ventcase.audit.Audit;
import org.ventcase.audit.AuditCsv;
import org.ventcase.audit.AuditItem;
import org.ventcase.audit.AuditResult;
import org.ventcase.audit.Register;
import org.ventcase.audit.RegisterCases;
import org.ventcase.audit.Thresholds;
import org.ventcase.audit.VesselAudit;
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
    public static final int TOP = AuditSheet.TOP;

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
                throw new UncheckedIOException("cannot read " + name + ": " + e.getMessage(), e);
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
     */
    public record Outcome(AuditResult result, String registerName, Optional<String> thresholdsName,
                          String inputHash) {

        public long count(VesselAudit.Status s) {
            return result.count(s);
        }

        /** The computed vessels, largest inventory first, at most {@link #TOP}. */
        public List<VesselAudit> topByInventory() {
            return result.topByInventory();
        }

        /** The vessels with a screening fire load, largest first, at most {@link #TOP}. */
        public List<VesselAudit> topByFireLoad() {
            return result.topByFireLoad();
        }

        /** The first {@link AuditResult#LISTED} rows not (fully) computed, in input order. */
        public List<VesselAudit> notComputed() {
            return result.notComputed();
        }

        /** All rows not (fully) computed. */
        public long notComputedCount() {
            return result.digest().notComputedCount();
        }

        /** The first {@link AuditResult#LISTED} rows whose installed valves are short, in input order. */
        public List<VesselAudit> installedShort() {
            return result.installedShort();
        }

        /** All rows whose installed valves are short. */
        public long installedShortCount() {
            return result.digest().installedShortCount();
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
        Thresholds th = Thresholds.none();
        if (thresholds.isPresent()) {
            byte[] t = thresholds.get().bytes();
            hash.update(t);
            th = Thresholds.parse(org.ventcase.common.Utf8.decode(t, thresholds.get().name()), thresholds.get().name());
        }
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
        return new Outcome(r, register.name(), thresholds.map(Input::name), HexFormat.of().formatHex(hash.digest()));
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
        AuditSheet.write(o.result(), new AuditSheet.Info("Inventory audit of the vessel register " + o.registerName(),
                o.registerName(), o.inputHash(), LocalDate.now(), "", toolVersion), target, size);
    }
}
