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
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CalcCommandTest {

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

    private Path copyOfDemo(String name) throws IOException {
        Path c = dir.resolve(name + ".json");
        Files.copy(Path.of("demo-cases", name + ".json"), c);
        return c;
    }

    /**
     * Issue 18 item 4: with --units us the warnings lead with US units (SI bracketed) and the
     * relieved fluid's molar mass is in lb/lbmol; a mixture's bubble point (sat) follows --units too.
     * Invariants of the display, no external values.
     */
    @Test
    void usUnitsReachTheWarningsAndTheMixtureSaturation() {
        Run r = run("calc", "demo-cases/ammonia-storage.json", "--units", "us");
        assertEquals(ExitCode.OK, r.code(), r.err());
        String warnings = r.out().substring(r.out().indexOf("WARNINGS"));
        assertTrue(warnings.contains("\u00b0F [288.15 K]"), warnings);
        assertFalse(warnings.matches("(?s).*\\d kPa abs(?!\\]).*"), warnings);
        assertTrue(r.out().contains("lb/lbmol") && !r.out().contains("kg/kmol"), r.out());
        Run sat = run("sat", "--fluid", "propane:0.5,n-butane:0.5", "--temperature", "300 K", "--units", "us");
        assertEquals(ExitCode.OK, sat.code(), sat.err());
        assertTrue(sat.out().contains("\u00b0F [26.85 \u00b0C]") && sat.out().contains(" psia ["), sat.out());
    }

    @Test
    void calcTwiceWritesTheSameBytesAndLeavesTheCaseFileAlone() throws IOException {
        Path c = copyOfDemo("ammonia-storage");
        byte[] before = Files.readAllBytes(c);
        Path a = dir.resolve("a.json");
        Path b = dir.resolve("b.json");
        Run r1 = run("calc", c.toString(), "--json", a.toString());
        Run r2 = run("calc", c.toString(), "--json", b.toString());
        assertEquals(ExitCode.OK, r1.code(), r1.err());
        assertEquals(ExitCode.OK, r2.code(), r2.err());
        assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b));
        assertArrayEquals(before, Files.readAllBytes(c));
        // the governing scenario is printed first, then the other one (common practice, no source: the layout)
        int gov = r1.out().indexOf("GOVERNING  1. Pool fire under V-4301");
        int other = r1.out().indexOf("2. Unloading pump");
        assertTrue(gov >= 0 && other > gov, r1.out());
        assertTrue(r1.out().contains("qualified engineer"), "cautions line");
        assertTrue(r1.out().contains("INVENTORY") && r1.out().contains("WARNINGS"), r1.out());
    }

    @Test
    void anInvalidCaseListsEveryProblemAndWritesNothing() throws IOException {
        Path c = copyOfDemo("propane-bullet-fire");
        String text = Files.readString(c).replace("\"85 %v\"", "\"185 %v\"").replace("\"17.2 barg\"", "\"17.2 bar\"");
        Files.writeString(c, text);
        Path out = dir.resolve("out.json");
        Run r = run("calc", c.toString(), "--json", out.toString());
        assertEquals(ExitCode.INVALID_INPUT, r.code(), r.err());
        assertTrue(r.err().contains("$.storage.liquidLevel"), r.err());
        assertTrue(r.err().contains("$.device.setPressure"), r.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void anUnwritableOutputIsAFileErrorAndLeavesNoPartialFile() throws IOException {
        Path c = copyOfDemo("gas-receiver-fire");
        Path out = dir.resolve("no-such-folder").resolve("out.json");
        Run r = run("calc", c.toString(), "--json", out.toString());
        assertEquals(ExitCode.IO, r.code(), r.err());
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(1, s.count(), "only the case file is left in the folder");
        }
    }

    @Test
    void theCaseFileCannotBeTheOutput() throws IOException {
        Path c = copyOfDemo("gas-receiver-fire");
        byte[] before = Files.readAllBytes(c);
        Run r = run("calc", c.toString(), "--json", c.toString());
        assertEquals(ExitCode.INVALID_INPUT, r.code());
        assertArrayEquals(before, Files.readAllBytes(c));
    }

    @Test
    void aMissingCaseFileIsAFileError() {
        Run r = run("calc", dir.resolve("absent.json").toString());
        assertEquals(ExitCode.IO, r.code(), r.err());
    }
}
