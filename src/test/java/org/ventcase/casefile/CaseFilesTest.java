package org.ventcase.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CaseFilesTest {

    @TempDir
    Path dir;

    private static Set<String> paths(CaseValidationException e) {
        return e.problems().stream().map(Problem::path).collect(Collectors.toSet());
    }

    private static List<String> files(Path d) throws IOException {
        try (Stream<Path> s = Files.list(d)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void writtenCaseReadsBackEqual() {
        for (String name : Templates.CASES) {
            Case c = CaseFiles.read(Fixtures.template(name), name);
            Path f = dir.resolve(name + ".json");
            CaseFiles.write(c, f);
            Case back = CaseFiles.read(f);
            assertEquals(c, back, name);
            assertEquals(CaseFiles.toJson(c), CaseFiles.toJson(back), name);
        }
    }

    @Test
    void keyOrderWhitespaceAndNumberSpellingDoNotChangeTheHash() {
        String a = "{\"schemaVersion\":1,\"identity\":{\"title\":\"T\",\"tag\":\"V-1\",\"revision\":\"A\",\"preparer\":\"p\","
                + "\"checker\":\"\",\"date\":\"2026-01-15\"},\"device\":{\"kd\":0.975,\"setPressure\":\"10 barg\"}}";
        String b = "{\n  \"device\" : { \"setPressure\" : \"10 barg\", \"kd\" : 9.750e-1 },\n"
                + "  \"identity\": {\"date\":\"2026-01-15\",\"checker\":\"\",\"preparer\":\"p\",\"revision\":\"A\","
                + "\"tag\":\"V-1\",\"title\":\"T\"},\n  \"schemaVersion\": 1\n}\n";
        Case ca = CaseFiles.parse(a, "a").kase();
        Case cb = CaseFiles.parse(b, "b").kase();
        assertEquals(CaseFiles.normalise(ca), CaseFiles.normalise(cb));
        assertEquals(CaseFiles.inputHash(ca), CaseFiles.inputHash(cb));
        assertTrue(CaseFiles.inputHash(ca).matches("[0-9a-f]{64}"));
        Case changed = CaseFiles.parse(a.replace("10 barg", "10.5 barg"), "c").kase();
        assertNotEquals(CaseFiles.inputHash(ca), CaseFiles.inputHash(changed));
    }

    @Test
    void canonicalNumbersAreShortestPlainDecimals() {
        // Hand calculation: the decimal forms below are the shortest that read back to the same double.
        assertEquals("1", CaseFiles.number(1.0));
        assertEquals("0.975", CaseFiles.number(0.9750));
        assertEquals("0.0000001", CaseFiles.number(1e-7));
        assertEquals("-2.5", CaseFiles.number(-2.5));
        assertEquals("0", CaseFiles.number(-0.0));
    }

    @Test
    void normalisedFormHasSortedKeysAndNoWhitespace() {
        Case c = CaseFiles.read(Fixtures.template("sphere"), "sphere");
        String n = CaseFiles.normalise(c);
        assertTrue(n.startsWith("{\"device\":{\"backPressure\":{\"builtUp\":\"0.4 bar\""), n);
        assertFalse(n.contains("\n"));
        assertFalse(n.contains("\": "));
    }

    @Test
    void failedSerialisationLeavesTheOldFileAndNoTemporaryFile() throws IOException {
        Path f = dir.resolve("case.json");
        Files.writeString(f, "old contents");
        Case good = CaseFiles.read(Fixtures.template("horizontal-bullet"), "t");
        Case.Device d = good.device();
        Case.Device nan = new Case.Device(d.setPressure(), d.mawp(), d.deviceCount(), d.supplementalFireValve(),
                d.setAboveLimitReason(), d.backPressure(), Double.NaN, d.kdLiquid(), d.kb(), d.kc(), d.valveType(),
                d.ruptureDiskUpstream(), d.liquidViscosityCorrection());
        Case bad = new Case(good.schemaVersion(), good.identity(), good.fluid(), good.vessel(), good.storage(),
                good.scenarios(), nan, good.site());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> CaseFiles.write(bad, f));
        assertTrue(e.getMessage().contains("$.device.kd"), e.getMessage());
        assertEquals("old contents", Files.readString(f));
        assertEquals(List.of("case.json"), files(dir));
    }

    @Test
    void unwritableTargetLeavesItIntactAndNoTemporaryFile() throws IOException {
        Path target = dir.resolve("case.json");
        Files.createDirectory(target);
        Files.writeString(target.resolve("inside.txt"), "keep");
        Case c = CaseFiles.read(Fixtures.template("sphere"), "sphere");
        assertThrows(UncheckedIOException.class, () -> CaseFiles.write(c, target));
        assertTrue(Files.isDirectory(target));
        assertEquals("keep", Files.readString(target.resolve("inside.txt")));
        assertEquals(List.of("case.json"), files(dir));
    }

    @Test
    void writeReplacesAnExistingFileWhole() throws IOException {
        Path f = dir.resolve("case.json");
        Files.writeString(f, "x".repeat(100_000));
        Case c = CaseFiles.read(Fixtures.template("sphere"), "sphere");
        CaseFiles.write(c, f);
        assertEquals(CaseFiles.toJson(c), Files.readString(f, StandardCharsets.UTF_8));
        assertEquals(List.of("case.json"), files(dir));
    }

    @Test
    void oversizedFileIsRefusedBeforeParsing() throws IOException {
        // Not JSON at all: a parse would fail differently, so the size message proves the order.
        String big = "x".repeat((int) CaseFiles.MAX_BYTES + 1);
        CaseValidationException e = assertThrows(CaseValidationException.class, () -> CaseFiles.read(big, "big"));
        assertTrue(e.problems().get(0).accepted().contains("at most " + CaseFiles.MAX_BYTES), e.getMessage());
        Path f = dir.resolve("big.json");
        Files.writeString(f, big);
        CaseValidationException e2 = assertThrows(CaseValidationException.class, () -> CaseFiles.read(f));
        assertTrue(e2.getMessage().contains("2 MiB"), e2.getMessage());
    }

    @Test
    void duplicateKeyIsRefusedWithItsPath() {
        String json = Fixtures.bulletWith("\"insideDiameter\": \"3.2 m\",",
                "\"insideDiameter\": \"3.2 m\", \"insideDiameter\": \"3.4 m\",");
        CaseValidationException e = assertThrows(CaseValidationException.class, () -> CaseFiles.read(json, "dup"));
        Problem p = e.problems().get(0);
        assertEquals("$.vessel.insideDiameter", p.path(), e.getMessage());
        assertTrue(p.accepted().contains("repeated"), p.accepted());
    }

    /**
     * Broken JSON is reported in the user's terms, with the line and column: a file cut short, a
     * comma too many, a bare word, nesting beyond the limit, never the parser's internal wording
     * (character codes, setting names). Invariant of the project's own texts.
     */
    @Test
    void brokenJsonIsDescribedWithoutTheParsersInternals() {
        String whole = Fixtures.bulletWith("\"tangentLength\"", "\"tangentLength\"");
        CaseValidationException cut = assertThrows(CaseValidationException.class,
                () -> CaseFiles.read(whole.substring(0, whole.length() / 2), "cut"));
        Problem p = cut.problems().get(0);
        assertTrue(p.accepted().contains("cut short") && p.accepted().contains("line "), p.accepted());
        CaseValidationException comma = assertThrows(CaseValidationException.class,
                () -> CaseFiles.read("{\"schemaVersion\": 1, \"identity\": {\"title\": \"x\",}}", "comma"));
        assertEquals("}", comma.problems().get(0).value());
        assertTrue(comma.problems().get(0).accepted().contains("a comma too many"), comma.problems().get(0).accepted());
        CaseValidationException word = assertThrows(CaseValidationException.class,
                () -> CaseFiles.read("{\"schemaVersion\": 1, \"identity\": {\"title\": x}}", "word"));
        assertEquals("x", word.problems().get(0).value());
        String deep = "[".repeat(2000) + "]".repeat(2000);
        CaseValidationException nested = assertThrows(CaseValidationException.class, () -> CaseFiles.read(deep, "deep"));
        for (CaseValidationException e : java.util.List.of(cut, comma, word, nested)) {
            String text = e.problems().get(0).value() + " " + e.problems().get(0).accepted();
            assertTrue(!text.contains("code ") && !text.contains("`") && !text.contains("Constraints"), text);
        }
    }

    /**
     * A refused quantity is echoed as the user wrote it ("105 %v", not the domain's "105 %"; a set
     * pressure in barg, not in kPa gauge), and the hint names the case file's field. Invariant.
     */
    @Test
    void refusedValuesAreEchoedAsWritten() {
        String level = Fixtures.bulletWith(LEVEL_FROM, "\"liquidLevel\": \"105 %v\"");
        CaseValidationException e = assertThrows(CaseValidationException.class, () -> CaseFiles.load(level, "l"));
        Problem p = e.problems().stream().filter(q -> q.path().equals("$.storage.liquidLevel")).findFirst()
                .orElseThrow();
        assertEquals("105 %v", p.value(), e.getMessage());
    }

    private static final String LEVEL_FROM = levelFrom();

    private static String levelFrom() {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\"liquidLevel\": \"[^\"]*\"")
                .matcher(Fixtures.bulletWith("\"tangentLength\"", "\"tangentLength\""));
        if (!m.find()) {
            throw new IllegalStateException("the bullet template has no liquidLevel");
        }
        return m.group();
    }

    @Test
    void unknownFieldIsReportedWithTheNearestKnownName() {
        String json = Fixtures.bulletWith("\"tangentLength\"", "\"tangentLenght\"");
        CaseValidationException e = assertThrows(CaseValidationException.class, () -> CaseFiles.read(json, "typo"));
        Problem p = e.problems().get(0);
        assertEquals("$.vessel.tangentLenght", p.path());
        assertTrue(p.accepted().contains("did you mean 'tangentLength'?"), p.accepted());
    }

    @Test
    void bareNumberForADimensionalFieldIsRefused() {
        String json = Fixtures.bulletWith("\"insideDiameter\": \"3.2 m\"", "\"insideDiameter\": 3.2");
        CaseValidationException e = assertThrows(CaseValidationException.class, () -> CaseFiles.read(json, "bare"));
        Problem p = e.problems().get(0);
        assertEquals("$.vessel.insideDiameter", p.path());
        assertTrue(p.accepted().contains("bare number is refused") && p.accepted().contains("'3.2 m'"), p.accepted());
    }

    @Test
    void quotedNumberForADimensionlessFieldIsRefused() {
        String json = Fixtures.bulletWith("\"moleFraction\": 0.95", "\"moleFraction\": \"0.95\"");
        CaseValidationException e = assertThrows(CaseValidationException.class, () -> CaseFiles.read(json, "q"));
        assertEquals("$.fluid.components[0].moleFraction", e.problems().get(0).path());
    }

    @Test
    void pressureWithoutGaugeOrAbsoluteIsRefused() {
        String json = Fixtures.bulletWith("\"setPressure\": \"17.2 barg\"", "\"setPressure\": \"17.2 bar\"");
        ValidationReport r = CaseFiles.check(json, "p");
        assertFalse(r.ok());
        Problem p = r.problems().get(0);
        assertEquals("$.device.setPressure", p.path());
        assertTrue(p.accepted().contains("gauge or absolute"), p.accepted());
    }

    @Test
    void everyProblemIsReportedAtOnceWithItsPath() {
        String json = Fixtures.template("horizontal-bullet")
                .replace("\"insideDiameter\": \"3.2 m\"", "\"insideDiameter\": 3.2")          // bare number
                .replace("\"heads\": \"2:1\"", "\"heads\": \"2:1\", \"head\": \"flat\"")      // unknown field
                .replace("\"date\": \"2026-01-15\"", "\"date\": \"15/01/2026\"")              // not ISO
                .replace("\"moleFraction\": 0.05", "\"moleFraction\": 0.04")                  // sum 0.99
                .replace("\"mawp\": \"17.2 barg\"", "\"mawp\": \"17.2 bar\"")                 // no gauge/abs
                .replace("\"inflowPhase\": \"liquid\"", "\"inflowPhase\": \"liquid\", \"wallTemperature\": \"600 C\"")
                .replace("\"fireHeight\": \"7.6 m\"", "\"fireHeight\": \"-7.6 m\"");
        ValidationReport r = CaseFiles.check(json, "many");
        Set<String> paths = r.problems().stream().map(Problem::path).collect(Collectors.toSet());
        assertEquals(Set.of("$.vessel.insideDiameter", "$.vessel.head", "$.identity.date", "$.fluid.components",
                "$.device.mawp", "$.scenarios[1].wallTemperature", "$.site.fireHeight"), paths, r.problems().toString());
        CaseValidationException e = assertThrows(CaseValidationException.class, r::orThrow);
        assertEquals(7, e.problems().size());
        assertEquals(paths, paths(e));
    }

    @Test
    void nullIsRefusedRatherThanTakenAsAbsent() {
        String json = Fixtures.bulletWith("\"wallThickness\": \"28 mm\"", "\"wallThickness\": null");
        CaseValidationException e = assertThrows(CaseValidationException.class, () -> CaseFiles.read(json, "n"));
        assertEquals("$.vessel.wallThickness", e.problems().get(0).path());
    }

    @Test
    void syntaxErrorIsOneProblemWithLineAndColumn() {
        CaseValidationException e = assertThrows(CaseValidationException.class,
                () -> CaseFiles.read("{\"schemaVersion\": 1,\n \"identity\": {", "broken"));
        assertTrue(e.problems().get(0).accepted().contains("line 2"), e.getMessage());
    }
}
