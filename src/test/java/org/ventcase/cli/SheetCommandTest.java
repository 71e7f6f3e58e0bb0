package org.ventcase.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import com.fasterxml.jackson.databind.JsonNode;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.report.DisplayUnits;
import org.ventcase.report.UnitSystem;

class SheetCommandTest {

    @TempDir
    Path dir;

    @Test
    void demoSheetIsWritten() throws Exception {
        Path pdf = dir.resolve("demo.pdf");
        CliTest.Run r = CliTest.run("sheet", "--demo", "-o", pdf.toString(), "--units", "us", "--page", "letter");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("wrote"), r.out());
        byte[] head = new byte[5];
        try (var in = Files.newInputStream(pdf)) {
            assertEquals(5, in.read(head));
        }
        assertEquals("%PDF-", new String(head, java.nio.charset.StandardCharsets.US_ASCII));
    }

    @Test
    void badOptionsAndCaseFilesAreUsageErrors() {
        Path pdf = dir.resolve("x.pdf");
        CliTest.Run units = CliTest.run("sheet", "--demo", "-o", pdf.toString(), "--units", "imperial");
        assertEquals(ExitCode.INVALID_INPUT, units.code());
        assertTrue(units.err().contains("--units"), units.err());
        CliTest.Run page = CliTest.run("sheet", "--demo", "-o", pdf.toString(), "--page", "a3");
        assertEquals(ExitCode.INVALID_INPUT, page.code());
        CliTest.Run none = CliTest.run("sheet", "-o", pdf.toString());
        assertEquals(ExitCode.INVALID_INPUT, none.code());
        CliTest.Run both = CliTest.run("sheet", "demo-cases/hexane-drum.json", "--demo", "-o", pdf.toString());
        assertEquals(ExitCode.INVALID_INPUT, both.code());
        assertTrue(both.err().contains("--demo"), both.err());
        assertFalse(Files.exists(pdf));
    }

    @Test
    void caseFileSheetIsWrittenAndFileErrorsAreExitFour() throws Exception {
        Path pdf = dir.resolve("lpg.pdf");
        CliTest.Run ok = CliTest.run("sheet", "demo-cases/lpg-sphere-mixture.json", "-o", pdf.toString(), "--units",
                "us", "--page", "letter");
        assertEquals(ExitCode.OK, ok.code(), ok.err());
        assertTrue(ok.out().contains("TK-4201"), ok.out());
        try (var in = Files.newInputStream(pdf)) {
            assertEquals("%PDF-", new String(in.readNBytes(5), java.nio.charset.StandardCharsets.US_ASCII));
        }
        // no temporary file left beside the sheet (written to a temporary file, then moved)
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count());
        }
        CliTest.Run missing = CliTest.run("sheet", dir.resolve("no-such-case.json").toString(), "-o",
                dir.resolve("m.pdf").toString());
        assertEquals(ExitCode.IO, missing.code(), missing.err());
        // the output names a folder that holds a file: it cannot be replaced by the sheet
        Path folder = Files.createDirectories(dir.resolve("out").resolve("taken.pdf"));
        Files.writeString(folder.resolve("keep.txt"), "x");
        CliTest.Run taken = CliTest.run("sheet", "demo-cases/hexane-drum.json", "-o", folder.toString());
        assertEquals(ExitCode.IO, taken.code(), taken.err());
        assertTrue(Files.exists(folder.resolve("keep.txt")));
        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, "{\"schemaVersion\": 1}");
        CliTest.Run invalid = CliTest.run("sheet", bad.toString(), "-o", dir.resolve("b.pdf").toString());
        assertEquals(ExitCode.INVALID_INPUT, invalid.code(), invalid.err());
        CliTest.Run self = CliTest.run("sheet", bad.toString(), "-o", bad.toString());
        assertEquals(ExitCode.INVALID_INPUT, self.code(), self.err());
        assertFalse(Files.exists(dir.resolve("m.pdf")) || Files.exists(dir.resolve("b.pdf")));
    }

    @Test
    void demoSheetIsThePackagedDemoCaseThroughTheCasePipeline() throws Exception {
        Path pdf = dir.resolve("demo-si.pdf");
        CliTest.Run r = CliTest.run("sheet", "--demo", "-o", pdf.toString());
        assertEquals(ExitCode.OK, r.code(), r.err());
        assertTrue(r.out().contains("(V-4101, SI units, A4)"), r.out());
        String text;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            text = new PDFTextStripper().getText(doc).replaceAll("[\\s\\u00A0]+", " ");
        }
        // Expected values: the golden results of the packaged demo case (the case the wizard opens),
        // demo-cases/golden/propane-bullet-fire.results.json, written by tools/regenerate-goldens.sh.
        JsonNode golden = CliTest.json(Files.readString(Path.of("demo-cases/golden/propane-bullet-fire.results.json")));
        JsonNode fire = golden.get("scenarios").get(0);
        DisplayUnits si = new DisplayUnits(UnitSystem.SI);
        String area = si.plain(DisplayUnits.Kind.ORIFICE_AREA, fire.get("requiredArea_mm2").asDouble() * 1e-6)
                .replace('\u00A0', ' ');
        assertTrue(text.contains("Required effective area " + area), "golden required area " + area);
        String letter = fire.get("orifice").get("letter").asText();
        assertTrue(text.contains("Selected orifice " + letter + " (API Std 526)"), "golden orifice " + letter);
        // the title block is the case file's identity, hashed from the packaged case file
        ValidatedCase demo = CaseFiles.load(Path.of("demo-cases/propane-bullet-fire.json"));
        assertTrue(text.contains(demo.identity().title()), "title block");
        assertTrue(text.contains(demo.inputHash()), "input hash of the packaged case");
        assertEquals(golden.get("inputHash").asText(), demo.inputHash());
        assertFalse(text.contains("V-3101"), "the old hard-coded demo bullet is gone");
    }
}
