package org.ventcase.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.relief.WettedFireInput;

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
    void demoCaseFileDescribesTheDemoInputs() {
        // The demo sheet takes its title block and input hash from demo-case.json, so that file
        // must describe the same case as DemoCommand.demoInput().
        ValidatedCase k = CaseFiles.load(SheetCommand.demoCaseJson(), "demo-case.json");
        WettedFireInput in = DemoCommand.demoInput();
        assertEquals(in.vessel(), k.vessel().vessel());
        assertEquals(in.exposure(), k.vessel().exposure());
        assertEquals(in.storageTemperatureK(), k.storage().temperatureK(), 1e-9);
        assertEquals(in.level(), k.storage().level());
        assertEquals(in.relieving().setPressureGaugePa(), k.device().setPressureGaugePa(), 1e-6);
        assertEquals(in.relieving().mawpGaugePa(), k.device().mawpGaugePa(), 1e-6);
        assertEquals(in.component().name(), k.fluid().composition().components().get(0).name());
        assertEquals(in.eos(), k.fluid().eos());
        assertEquals(64, k.inputHash().length());
    }
}
