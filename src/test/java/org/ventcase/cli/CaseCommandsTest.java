package org.ventcase.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.Templates;

class CaseCommandsTest {

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

    @Test
    void newWritesEachTemplateAndTheResultChecksClean() {
        for (String name : Templates.CASES) {
            Path f = dir.resolve(name + ".json");
            Run r = run("new", "--template", name, f.toString());
            assertEquals(ExitCode.OK, r.code(), r.err());
            assertTrue(CaseFiles.check(f).ok());
            Run c = run("check", f.toString());
            assertEquals(ExitCode.OK, c.code(), c.err());
            assertTrue(c.out().contains("OK, ready for calculation"), c.out());
        }
    }

    @Test
    void newWithAnUnknownTemplateListsTheTemplates() {
        Run r = run("new", "--template", "cube", dir.resolve("x.json").toString());
        assertEquals(ExitCode.INVALID_INPUT, r.code());
        assertTrue(r.err().contains("horizontal-bullet, vertical-drum, sphere"), r.err());
        assertFalse(Files.exists(dir.resolve("x.json")));
    }

    @Test
    void newHelpListsTheTemplates() {
        Run r = run("new", "--help");
        assertEquals(ExitCode.OK, r.code());
        assertTrue(r.out().contains("horizontal-bullet, vertical-drum, sphere"), r.out());
    }

    @Test
    void newKeepsAnExistingFileUnlessForced() throws IOException {
        Path f = dir.resolve("case.json");
        Files.writeString(f, "mine");
        Run r = run("new", "--template", "sphere", f.toString());
        assertEquals(ExitCode.IO, r.code());
        assertEquals("mine", Files.readString(f));
        assertEquals(ExitCode.OK, run("new", "--force", "--template", "sphere", f.toString()).code());
        assertEquals(Templates.caseJson("sphere").orElseThrow(), Files.readString(f));
    }

    @Test
    void checkPrintsEveryProblemAndExitsTwo() throws IOException {
        Path f = dir.resolve("bad.json");
        Files.writeString(f, Templates.caseJson("horizontal-bullet").orElseThrow()
                .replace("\"insideDiameter\": \"3.2 m\"", "\"insideDiameter\": 3.2")
                .replace("\"mawp\": \"17.2 barg\"", "\"mawp\": \"17.2 bar\""));
        Run r = run("check", f.toString());
        assertEquals(ExitCode.INVALID_INPUT, r.code());
        assertTrue(r.err().contains("2 problems"), r.err());
        assertTrue(r.err().contains("$.vessel.insideDiameter") && r.err().contains("$.device.mawp"), r.err());
    }

    @Test
    void checkOfAFileThatIsNotJsonExitsTwo() throws IOException {
        Path f = dir.resolve("notes.json");
        Files.writeString(f, "these are notes, not a case");
        Run r = run("check", f.toString());
        assertEquals(ExitCode.INVALID_INPUT, r.code());
        assertTrue(r.err().contains("1 problem"), r.err());
    }

    @Test
    void checkOfAMissingFileIsAFileError() {
        Run r = run("check", dir.resolve("absent.json").toString());
        assertEquals(ExitCode.IO, r.code(), r.err());
    }
}
