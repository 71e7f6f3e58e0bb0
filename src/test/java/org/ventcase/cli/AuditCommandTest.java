package org.ventcase.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AuditCommandTest {

    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new PrintWriter(out), new PrintWriter(err), args);
        return new Run(code, out.toString(), err.toString());
    }

    private static final String HEADER = "tag,area,fluid,eos,shape,heads,diameter [m],length [m],elevation [m],"
            + "level [%v],temperature [C],pressure,mode,vapour,set pressure [barg],mawp [barg],orifice,orifice count";

    @Test
    void aRegisterWithABadRowWritesCsvAndPdfAndExitsTwo() throws IOException {
        Path reg = dir.resolve("reg.csv");
        Files.writeString(reg, HEADER + "\n"
                + "V-1,Area 1,propane,,horizontal,2:1,3.2,16,1.2,85,38,,saturated,,17.2,,T,\n"
                + "V-2,Area 1,propain,,horizontal,2:1,3.2,16,1.2,85,38,,saturated,,17.2,,,\n"
                + "V-3,Area 2,ammonia,,horizontal,2:1,2.4,10,1.0,80,15,,saturated,,17,,,\n");
        Path th = dir.resolve("th.csv");
        Files.writeString(th, "substance,threshold [t],label\nammonia,1,invented for the test\n");
        Files.createDirectories(dir.resolve("out"));
        Path csv = dir.resolve("out/audit.csv");
        Path pdf = dir.resolve("out/audit.pdf");
        Run r = run("audit", reg.toString(), "-o", csv.toString(), "--pdf", pdf.toString(), "--thresholds",
                th.toString(), "--threads", "2");
        // exit 2: a row could not be computed, the outputs are still written (docs/audit.md)
        assertEquals(ExitCode.INVALID_INPUT, r.code(), r.err());
        assertTrue(r.out().contains("Rows 3: ok 2, partial 0, error 1"), r.out());
        assertTrue(r.out().contains("3 V-2 error fluid 'propain'"), r.out());
        assertTrue(r.out().contains("qualified engineer"), "cautions line");
        assertTrue(r.out().contains("ammonia") && r.out().contains("EXCEEDED"), r.out());
        List<String> lines = Files.readAllLines(csv);
        assertEquals(4, lines.size());
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(text.contains("Totals by area"), "totals table");
            assertTrue(text.contains("Rows not computed") && text.contains("propain"), "error rows on the sheet");
            assertTrue(text.contains("Threshold checks") && text.contains("invented for the test"), "thresholds");
            assertTrue(text.contains("qualified engineer"), "deferral note");
            assertTrue(text.contains("Inventory by area"), "bar chart caption");
        }
        assertFalse(r.err().contains("%"), "no progress bar when not asked and not a terminal");
    }

    /**
     * Sweep findings (issue 19): the audit PDF ended in an internal error (exit 1, no PDF) when a refused
     * row's message quoted 'NaN' or 'Infinity', when a vessel was tagged "NaN" or an area was "null", and
     * when the register's file name wrapped in the title block ("site-register-2024.csv"). Each now gives
     * the PDF, with the rows listed as written, and exit 2 for the refused rows.
     */
    @Test
    void refusedNonNumericCellsUserWordsAndLongFileNamesStillGiveThePdf() throws IOException {
        for (String name : List.of("site-register-2024.csv", "plant-b-vessel-list.csv", "null.csv")) {
            Path reg = dir.resolve(name);
            Files.writeString(reg, HEADER + "\n"
                    + "V-1,Area 1,propane,,horizontal,2:1,3.2,16,1.2,85,38,,saturated,,17.2,,T,\n"
                    + "V-2,Area 1,propane,,horizontal,2:1,3.2,16,1.2,85,NaN,,saturated,,17.2,,,\n"
                    + "V-3,Area 1,propane,,horizontal,2:1,3.2,16,1.2,85,38,,saturated,,Infinity,,,\n"
                    + "NaN,null,propane,,horizontal,2:1,3.2,16,1.2,85,38,,saturated,,17.2,,,\n");
            Path pdf = dir.resolve(name + ".pdf");
            Run r = run("audit", reg.toString(), "--pdf", pdf.toString(), "--threads", "1");
            assertEquals(ExitCode.INVALID_INPUT, r.code(), name + ": " + r.err());
            assertFalse(r.err().contains("internal error"), r.err());
            try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
                String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
                assertTrue(text.contains("'NaN': expected a number"), name + ": the refused value as written");
                assertTrue(text.contains("'Infinity': expected a number"), name);
                assertTrue(text.contains(" null "), name + ": the area named null is printed as written");
            }
        }
    }

    /**
     * Issue 18 item 4: --units us prints the summary and the PDF in lb, lb/h and in2; the CSV stays
     * SI and byte-identical. Check value: the SI run's site total in t, converted with the exact
     * 1 lb = 0.45359237 kg (NIST SP 811), to the printed rounding.
     */
    @Test
    void unitsUsPrintsPoundsAndKeepsTheCsvInSi() throws IOException {
        Path reg = dir.resolve("reg.csv");
        Files.writeString(reg, HEADER + "\n"
                + "V-1,Area 1,propane,,horizontal,2:1,3.2,16,1.2,85,38,,saturated,,17.2,,T,\n");
        Path siCsv = dir.resolve("si.csv");
        Path usCsv = dir.resolve("us.csv");
        Path pdf = dir.resolve("us.pdf");
        Run si = run("audit", reg.toString(), "-o", siCsv.toString());
        Run us = run("audit", reg.toString(), "-o", usCsv.toString(), "--pdf", pdf.toString(), "--units", "us");
        assertEquals(ExitCode.OK, us.code(), us.err());
        java.util.regex.Matcher t = java.util.regex.Pattern.compile("Site inventory: ([0-9.]+) t").matcher(si.out());
        java.util.regex.Matcher lb = java.util.regex.Pattern.compile("Site inventory: ([0-9]+) lb").matcher(us.out());
        assertTrue(t.find() && lb.find(), us.out());
        assertEquals(Double.parseDouble(t.group(1)) * 1000 / 0.45359237, Double.parseDouble(lb.group(1)),
                0.05 * 1000 / 0.45359237 + 1);
        assertArrayEquals(Files.readAllBytes(siCsv), Files.readAllBytes(usCsv));
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(text.contains("Masses in lb, loads in lb/h"), "unit note");
            assertTrue(text.contains(" lb/h"), "loads in lb/h");
            assertFalse(text.contains(" kg/h "), "no kg/h on a US audit sheet");
        }
    }

    @Test
    void aFolderOfCaseFilesIsAuditedOneFileARowWithTheSubFolderAsArea() throws IOException {
        Files.createDirectories(dir.resolve("cases/north"));
        Files.copy(Path.of("demo-cases/ammonia-storage.json"), dir.resolve("cases/north/a.json"));
        Files.copy(Path.of("demo-cases/propane-bullet-fire.json"), dir.resolve("cases/b.json"));
        Files.writeString(dir.resolve("cases/north/c.json"), "{\"schemaVersion\": 1}");
        Path csv = dir.resolve("folder.csv");
        Run r = run("audit", dir.resolve("cases").toString(), "-o", csv.toString(), "--progress");
        assertEquals(ExitCode.INVALID_INPUT, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("Rows 3: ok 2, partial 0, error 1"), r.out());
        List<String> lines = Files.readAllLines(csv);
        // files in path order: b.json, north/a.json, north/c.json
        assertTrue(lines.get(1).startsWith("1,b.json,"), lines.get(1));
        assertTrue(lines.get(2).startsWith("2,north/a.json,V-4301,north,ammonia,ok"), lines.get(2));
        assertTrue(lines.get(3).startsWith("3,north/c.json,,north,,error,$."), lines.get(3));
        assertTrue(r.err().contains("100 %"), "--progress draws the bar on standard error");
    }

    @Test
    void anOutputThatNamesTheRegisterIsRefused() throws IOException {
        Path reg = dir.resolve("reg.csv");
        Files.writeString(reg, HEADER + "\n");
        Run r = run("audit", reg.toString(), "-o", reg.toString());
        assertEquals(ExitCode.INVALID_INPUT, r.code());
        assertTrue(r.err().contains("never overwritten"), r.err());
        assertEquals(HEADER + "\n", Files.readString(reg));
    }
}
