package org.ventcase.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;

/** Reading the register in chunks gives the same audit as reading it whole. */
class AuditStreamTest {

    @Test
    void chunkedRunEqualsTheWholeRegisterRunRowByRow() throws Exception {
        String text = Files.readString(Path.of("demo-cases/register/kestrel-point-register.csv"));
        AuditResult whole = Audit.run(Register.parse(text, "kp.csv"), Thresholds.none(), 2, Audit.Progress.NONE);
        int rows = Register.countRows(text, "kp.csv");
        assertEquals(whole.rows().size(), rows);
        AuditResult chunked = Audit.run(Register.stream(text, "kp.csv"), rows, Thresholds.none(), 2,
                Audit.Progress.NONE);
        assertEquals(whole.rows(), chunked.rows());
        assertEquals(whole.site(), chunked.site());
        assertEquals(whole.byArea(), chunked.byArea());
        // the demo register has more rows than one chunk holds only when CHUNK_ROWS is small: check the
        // chunk boundary with a register longer than a chunk
        StringBuilder big = new StringBuilder();
        String[] lines = text.split("\n");
        int header = 0;
        while (lines[header].startsWith("#")) {
            header++;
        }
        big.append(lines[header]).append('\n');
        int n = 0;
        while (n < Audit.CHUNK_ROWS + 7) {
            for (int i = header + 1; i < lines.length && n < Audit.CHUNK_ROWS + 7; i++) {
                if (!lines[i].startsWith("#") && !lines[i].isBlank() && !lines[i].contains("Area 90")) {
                    big.append(lines[i]).append('\n');
                    n++;
                }
            }
        }
        String b = big.toString();
        AuditResult w2 = Audit.run(Register.parse(b, "big.csv"), Thresholds.none(), 2, Audit.Progress.NONE);
        AuditResult c2 = Audit.run(Register.stream(b, "big.csv"), Register.countRows(b, "big.csv"), Thresholds.none(),
                2, Audit.Progress.NONE);
        assertEquals(w2.rows(), c2.rows());
        assertEquals(w2.site(), c2.site());
        assertEquals(w2.digest(), c2.digest());
    }

    /**
     * The command line's streamed audit keeps no rows, yet writes the same CSV byte for byte and the
     * same totals and summaries as an audit that keeps them (a register longer than a chunk, with
     * error rows and more than one fluid, so that component columns appear after the first chunk).
     * Invariant of the project's own code, no external values (invented demo register rows).
     */
    @Test
    void streamedAuditWritesTheSameCsvAndSummariesWithoutKeepingRows(@org.junit.jupiter.api.io.TempDir Path dir)
            throws Exception {
        String text = Files.readString(Path.of("demo-cases/register/kestrel-point-register.csv"));
        String[] lines = text.split("\n");
        int header = 0;
        while (lines[header].startsWith("#")) {
            header++;
        }
        StringBuilder big = new StringBuilder(lines[header]).append('\n');
        int n = 0;
        while (n < Audit.CHUNK_ROWS + 300) {
            for (int i = header + 1; i < lines.length && n < Audit.CHUNK_ROWS + 300; i++) {
                if (!lines[i].startsWith("#") && !lines[i].isBlank()) {
                    big.append(lines[i]).append('\n');
                    n++;
                }
            }
        }
        String b = big.toString();
        AuditResult kept = Audit.run(Register.parse(b, "big.csv"), Thresholds.none(), 2, Audit.Progress.NONE);
        Path csv = dir.resolve("audit.csv");
        AuditResult streamed;
        try (AuditCsv.Spool spool = new AuditCsv.Spool(csv)) {
            streamed = Audit.run(Register.stream(b, "big.csv"), Register.countRows(b, "big.csv"), Thresholds.none(), 2,
                    Audit.Progress.NONE, spool);
            spool.finish();
        }
        assertEquals(0, streamed.rows().size(), "the streamed audit keeps no rows");
        assertEquals(kept.rowCount(), streamed.rowCount());
        assertEquals(AuditCsv.text(kept), Files.readString(csv));
        assertEquals(kept.digest(), streamed.digest());
        assertEquals(kept.site(), streamed.site());
        assertEquals(kept.byArea(), streamed.byArea());
        assertEquals(kept.byFluid(), streamed.byFluid());
        org.junit.jupiter.api.Assertions.assertTrue(kept.digest().notComputedCount() > 0,
                "the register has rows that are not computed (the demo's error rows)");
        try (var left = Files.list(dir)) {
            assertEquals(java.util.List.of(csv), left.toList(), "the scratch file is gone");
        }
    }

    /** The summaries of the kept rows are what sorting and filtering all rows gives. Invariant, no external values. */
    @Test
    void digestListsEqualSortingAllRows() throws Exception {
        String text = Files.readString(Path.of("demo-cases/register/kestrel-point-register.csv"));
        AuditResult r = Audit.run(Register.parse(text, "kp.csv"), Thresholds.none(), 2, Audit.Progress.NONE);
        java.util.List<VesselAudit> byMass = r.rows().stream().filter(v -> v.inventory().isPresent())
                .sorted(java.util.Comparator.comparingDouble((VesselAudit v) -> v.inventory().get().totalMassKg())
                        .reversed()).limit(AuditResult.TOP).toList();
        assertEquals(byMass, r.topByInventory());
        java.util.List<VesselAudit> byFire = r.rows().stream().filter(v -> v.fire().isPresent())
                .sorted(java.util.Comparator.comparingDouble((VesselAudit v) -> v.fire().get().reliefLoadKgPerS())
                        .reversed()).limit(AuditResult.TOP).toList();
        assertEquals(byFire, r.topByFireLoad());
        assertEquals(r.rows().stream().filter(v -> v.status() != VesselAudit.Status.OK).toList(), r.notComputed());
        for (VesselAudit.Status s : VesselAudit.Status.values()) {
            assertEquals(r.rows().stream().filter(v -> v.status() == s).count(), r.count(s));
        }
    }
}
