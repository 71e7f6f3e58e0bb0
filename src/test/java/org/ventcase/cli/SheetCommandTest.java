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
        CliTest.Run kase = CliTest.run("sheet", "case.json", "-o", pdf.toString());
        assertEquals(ExitCode.INVALID_INPUT, kase.code());
        assertTrue(kase.err().contains("--demo"), kase.err());
        assertFalse(Files.exists(pdf));
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
