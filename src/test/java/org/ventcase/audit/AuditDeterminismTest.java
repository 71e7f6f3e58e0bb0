package org.ventcase.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

/** The same register gives the same bytes whatever the number of threads. */
class AuditDeterminismTest {

    @Test
    void oneThreadAndFourThreadsWriteTheSameCsv() throws IOException {
        // every 5th row of the demo register (about 45 rows, all kinds, with its malformed rows)
        List<String> lines = Files.readAllLines(Path.of("demo-cases/register/kestrel-point-register.csv"));
        List<String> keep = new ArrayList<>();
        int data = 0;
        boolean header = false;
        for (String l : lines) {
            if (l.startsWith("#") || !header) {
                keep.add(l);
                header |= !l.startsWith("#");
                continue;
            }
            if (data++ % 5 == 0 || l.contains("Area 90")) {
                keep.add(l);
            }
        }
        String text = String.join("\n", keep) + "\n";
        Thresholds th = Thresholds.read(Path.of("demo-cases/register/kestrel-point-thresholds.csv"));
        AuditResult one = Audit.run(RegisterCases.items(Register.parse(text, "r.csv")), th, 1, Audit.Progress.NONE);
        AuditResult four = Audit.run(RegisterCases.items(Register.parse(text, "r.csv")), th, 4, Audit.Progress.NONE);
        assertEquals(AuditCsv.text(one), AuditCsv.text(four));
        assertEquals(one.site().totalMassKg(), four.site().totalMassKg(), 0.0);
        assertEquals(one.thresholds().get(0).siteKg(), four.thresholds().get(0).siteKg(), 0.0);
        assertEquals(keep.stream().filter(l -> !l.startsWith("#")).count() - 1, one.rows().size());
    }
}
