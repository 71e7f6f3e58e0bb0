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
    }
}
