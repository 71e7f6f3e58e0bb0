package org.ventcase.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.nio.file.Files;
import java.io.StringWriter;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The headless commands as a script would use them: exit codes, messages and JSON contracts. */
class CliTest {

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new PrintWriter(out), new PrintWriter(err), args);
        return new Run(code, out.toString(), err.toString());
    }

    static JsonNode json(String text) throws Exception {
        return new ObjectMapper().readTree(text);
    }

    @Test
    void noArgumentsPrintsHelp() {
        Run r = run();
        assertEquals(0, r.code());
        assertTrue(r.out().contains("Usage: ventcase"));
        assertTrue(r.out().replaceAll("\\s+", " ").contains("qualified engineer"), "cautions in the help");
    }

    @Test
    void demoTextPrintsTheStepsCautionsOrificeAndHowToGoOnHeadless() throws Exception {
        Run r = run("demo", "--text");
        assertEquals(0, r.code(), r.err());
        // Expected values: the golden results of the packaged demo case, the case the wizard opens
        // (demo-cases/golden/propane-bullet-fire.results.json, written by tools/regenerate-goldens.sh).
        JsonNode golden = json(java.nio.file.Files.readString(
                java.nio.file.Path.of("demo-cases/golden/propane-bullet-fire.results.json")));
        JsonNode fire = golden.get("scenarios").get(0);
        assertTrue(r.out().startsWith("VENTCASE DEMO: " + golden.get("title").asText() + " (V-4101)"), r.out());
        for (String caution : DemoCommand.CAUTIONS) {
            assertTrue(r.out().contains(caution + "\n") || r.out().contains(caution + "\r\n"), caution);
        }
        String flat = r.out().replaceAll("\\s+", " ");
        assertTrue(flat.contains("qualified engineer") && flat.contains("ASME BPVC Section VIII"), "cautions");
        assertTrue(r.out().contains("SCENARIO 1: " + fire.get("label").asText() + " [fire-wetted], governing"),
                r.out());
        // every step of the scenario's trace, numbered, in the golden's order
        int from = 0;
        int n = 1;
        for (JsonNode step : fire.get("trace")) {
            String heading = n++ + ". " + step.get("title").asText();
            int at = r.out().indexOf(heading, from);
            assertTrue(at >= from, "step in order: " + heading);
            from = at + heading.length();
        }
        assertTrue(r.out().indexOf("SUMMARY") > from, "summary after the steps");
        String letter = fire.get("orifice").get("letter").asText();
        assertTrue(r.out().matches("(?s).*Selected orifice +" + letter + " \\(.*"), "the golden orifice " + letter);
        assertTrue(r.out().contains(String.format(java.util.Locale.ROOT, "%.1f mm2",
                fire.get("requiredArea_mm2").asDouble())), "the golden required area");
        assertTrue(r.out().matches("(?s).*Governing scenario +1\\. " + java.util.regex.Pattern.quote(
                fire.get("label").asText()) + ".*"), r.out());
        assertTrue(r.out().indexOf("WARNINGS") > r.out().indexOf("SUMMARY"));
        for (JsonNode w : golden.get("warnings")) {
            assertTrue(flat.contains(w.get("message").asText().replaceAll("\\s+", " ")), "warning printed");
        }
        String[] lines = r.out().strip().split("\\R");
        String last = lines[lines.length - 1];
        assertEquals(DemoCommand.HEADLESS_HINT, last);
        for (String cmd : List.of("calc", "sheet", "props")) {
            assertTrue(last.contains("ventcase " + cmd), cmd);
        }
        assertFalse(r.out().contains("opening the case wizard"));
        assertFalse(r.out().contains("V-3101"), "the old hard-coded demo bullet is gone");
    }

    @Test
    void demoOpensTheWizardOnlyWithADisplayAndWithoutText() {
        assertTrue(DemoCommand.opensWindow(false, true, true));
        assertFalse(DemoCommand.opensWindow(true, true, true), "--text prints");
        assertFalse(DemoCommand.opensWindow(false, true, false), "no display: prints");
        assertFalse(DemoCommand.opensWindow(false, false, true), "Main.run (scripts, tests) stays headless");
        assertFalse(Main.displayAvailable(":0", null, "true", "Linux"), "headless AWT");
        assertFalse(Main.displayAvailable(null, null, null, "Linux"), "no DISPLAY on Linux");
        assertTrue(Main.displayAvailable(":97", null, null, "Linux"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"demo", "props", "sat", "vessel", "inventory", "flash", "envelope", "new", "check"})
    void everyCommandHasHelpAndVersion(String cmd) {
        Run h = run(cmd, "--help");
        assertEquals(0, h.code());
        assertTrue(h.out().contains("Exit codes"), h.out());
        Run v = run(cmd, "--version");
        assertEquals(0, v.code());
        assertTrue(v.out().startsWith("ventcase "));
    }

    @Test
    void propsJsonHasTheDocumentedContract() throws Exception {
        Run r = run("props", "--fluid", "propane", "--temperature", "300 K", "--pressure", "11 bara", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode n = json(r.out());
        for (String f : List.of("eos", "component", "temperature_K", "pressure_Pa", "roots", "phase", "Z",
                "molarVolume_m3_mol", "density_kg_m3", "densityBasis", "fugacityCoefficient",
                "residualEnthalpy_J_mol", "cp_J_molK", "cv_J_molK", "k", "speedOfSound_m_s", "warnings")) {
            assertTrue(n.has(f), "missing " + f);
        }
        for (String f : List.of("name", "Tc_K", "Pc_Pa", "omega", "molarMass_kg_kmol", "source")) {
            assertTrue(n.get("component").has(f), "missing component." + f);
        }
        assertEquals("PRTWU", n.get("eos").asText()); // the default model (EosVariant.DEFAULT)
        assertEquals(1.1e6, n.get("pressure_Pa").asDouble(), 1e-6);
        // Three real roots at 300 K, 11 bar for propane (below the vapour spinodal, 10 % above Psat):
        // liquid is stable (propane's vapour pressure at 300 K is about 0.998 MPa, NIST WebBook,
        // from memory; the default model gives 0.8 % more, docs/accuracy.md).
        assertEquals(3, n.get("roots").size());
        assertEquals("liquid", n.get("phase").asText());
        assertEquals(n.get("roots").get(0).asDouble(), n.get("Z").asDouble(), 0.0);
    }

    @Test
    void satJsonHasTheDocumentedContract() throws Exception {
        Run r = run("sat", "--fluid", "ammonia", "--temperature", "25 C", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode n = json(r.out());
        for (String f : List.of("eos", "component", "temperature_K", "pressure_Pa", "liquid", "vapor",
                "latentHeat_J_kg", "latentHeat_J_mol", "warnings")) {
            assertTrue(n.has(f), "missing " + f);
        }
        for (String f : List.of("Z", "density_kg_m3", "densityBasis", "molarVolume_m3_mol")) {
            assertTrue(n.get("liquid").has(f) && n.get("vapor").has(f), "missing phase field " + f);
        }
        // Ammonia vapour pressure at 25 C: 1.0029 MPa (NIST WebBook, from memory); PR within 3 %.
        assertEquals(1.0029e6, n.get("pressure_Pa").asDouble(), 0.03 * 1.0029e6);
    }

    @Test
    void satAtGaugePressureUsesTheAtmosphere() throws Exception {
        JsonNode a = json(run("sat", "--fluid", "propane", "--pressure", "17.2 barg", "--json").out());
        JsonNode b = json(run("sat", "--fluid", "propane", "--pressure", "18.21325 bara", "--json").out());
        assertEquals(b.get("temperature_K").asDouble(), a.get("temperature_K").asDouble(), 1e-9);
        JsonNode c = json(run("sat", "--fluid", "propane", "--pressure", "17.2 barg", "--atmosphere", "95 kPaa",
                "--json").out());
        assertTrue(c.get("temperature_K").asDouble() < a.get("temperature_K").asDouble());
    }

    @Test
    void badInputGivesExitCode2AndNamesTheOption() {
        Run r1 = run("props", "--fluid", "propane", "--temperature", "300 K", "--pressure", "10 bar");
        assertEquals(2, r1.code());
        assertTrue(r1.err().contains("--pressure") && r1.err().contains("barg"), r1.err());
        assertEquals(1, r1.err().strip().lines().count(), "one line: " + r1.err());
        Run r2 = run("props", "--fluid", "propan", "--temperature", "300 K", "--pressure", "10 bara");
        assertEquals(2, r2.code());
        assertTrue(r2.err().contains("--fluid") && r2.err().contains("propane"), r2.err());
        Run r3 = run("props", "--fluid", "propane", "--temperature", "300", "--pressure", "10 bara");
        assertEquals(2, r3.code());
        assertTrue(r3.err().contains("--temperature"), r3.err());
        Run r4 = run("sat", "--fluid", "propane", "--temperature", "120 C");
        assertEquals(2, r4.code());
        assertTrue(r4.err().contains("--temperature") && r4.err().contains("critical"), r4.err());
        Run r5 = run("props", "--fluid", "propane", "--temperature", "300 K", "--pressure", "10 bara", "--eos", "XYZ");
        assertEquals(2, r5.code());
        assertTrue(r5.err().contains("--eos"), r5.err());
        Run r6 = run("props", "--temperature", "300 K");
        assertEquals(2, r6.code());
        assertFalse(r6.err().isBlank());
    }

    /**
     * vessel --units us: every printed length, area and volume in ft, ft2 and ft3, the words of the
     * description and the fire rule too. Check values: the JSON's SI figures converted with the
     * international foot, 0.3048 m exactly (definition of the unit).
     */
    @Test
    void vesselPrintsCustomaryUnitsWhenAsked() throws Exception {
        String[] base = {"vessel", "--shape", "horizontal", "--diameter", "3.2 m", "--length", "12 m", "--heads", "2:1",
            "--level", "65 %", "--elevation", "1.2 m"};
        JsonNode n = json(run(concat(base, "--json")).out());
        Run us = run(concat(base, "--units", "us"));
        assertEquals(0, us.code(), us.err());
        double ft = 0.3048;
        assertTrue(us.out().contains("inside diameter 10.50 ft, tangent length 39.37 ft"), us.out());
        assertTrue(us.out().contains(String.format(java.util.Locale.ROOT, "%.4g ft2",
                n.get("wettedArea_m2").asDouble() / (ft * ft))), us.out());
        assertTrue(us.out().contains("ft3"), us.out());
        assertTrue(us.out().contains("wetted area within 24.93 ft above grade"), "fire height 7.6 m: " + us.out());
        assertTrue(!us.out().matches("(?s).*\\d m\\b.*") && !us.out().contains(" m2") && !us.out().contains(" m3"),
                "no SI unit left: " + us.out());
        assertEquals(2, run(concat(base, "--units", "imperial")).code());
    }

    private static String[] concat(String[] a, String... b) {
        String[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    @Test
    void vesselJsonAndMessages() throws Exception {
        Run r = run("vessel", "--shape", "horizontal", "--diameter", "3.2 m", "--length", "12 m", "--heads", "2:1",
                "--level", "100 %", "--elevation", "1.2 m", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode n = json(r.out());
        // Full vessel: wetted area equals the total inside area (identity).
        assertEquals(n.get("totalInsideArea_m2").asDouble(), n.get("wettedArea_m2").asDouble(), 1e-9);
        // Hand calculation: cylinder pi*1.6^2*12 = 96.510 m3 plus two 2:1 heads pi*3.2^3/24*2 = 8.579 m3
        assertEquals(105.089, n.get("totalVolume_m3").asDouble(), 0.001);
        Run bad = run("vessel", "--shape", "horizontal", "--diameter", "-3 m", "--length", "12 m", "--level", "50 %");
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("diameter"), bad.err());
        Run high = run("vessel", "--shape", "sphere", "--diameter", "10 m", "--level", "12 m");
        assertEquals(2, high.code());
        assertTrue(high.err().contains("level"), high.err());
    }

    @Test
    void everyCommandsHelpIsCleanText() throws Exception {
        // seen: an unescaped '%' in an option text made picocli print warnings; an unexpanded
        // ${COMPLETION-CANDIDATES} in a command description printed "Templates: null."
        for (String c : List.of("calc", "props", "sat", "flash", "envelope", "vessel", "inventory", "review", "audit",
                "sheet", "check", "new", "demo")) {
            Run r = run(c, "--help");
            assertEquals(0, r.code(), c + ": " + r.err());
            String all = r.out() + r.err();
            assertFalse(all.contains("picocli WARN") || all.contains("null."), c + " --help:\n" + all);
        }
    }

    @Test
    void aLiquidReliefShowsNoGasPropertiesAndTheViscosityNoteOnce() throws Exception {
        // seen: k = 1.31 and an isentropic exponent of 625 listed for relieved liquid ammonia, and the
        // Kv = 1 note printed twice in different words
        Run r = run("calc", "demo-cases/ammonia-storage.json");
        assertEquals(0, r.code(), r.err());
        String liquid = r.out().lines().filter(l -> l.contains("Relieved liquid")).findFirst().orElseThrow();
        assertFalse(liquid.contains(" k "), liquid);
        assertEquals(1, r.out().lines().filter(l -> l.contains("viscosity")).count(), r.out());
        // the liquid after flashing through the valve (at -26.8 C) used to carry a Rackett warning about
        // its cubic-basis density, which the flash does not use (only T2 and the split): gone, while the
        // sizing density (translated) is the one the sheet shows
        assertFalse(r.out().contains("Rackett"), r.out());
    }

    @Test
    void calcPrintsInTheChosenUnitSystem() throws Exception {
        Run us = run("calc", "demo-cases/propane-bullet-fire.json", "--units", "us");
        assertEquals(0, us.code(), us.err());
        assertTrue(us.out().contains(" psia [") && us.out().contains(" lb/h [") && us.out().contains(" in2 ["),
                us.out());
        Run bad = run("calc", "demo-cases/propane-bullet-fire.json", "--units", "imperial");
        assertEquals(2, bad.code());
        assertTrue((bad.err() + bad.out()).contains("--units"), bad.err() + bad.out());
    }

    @Test
    void satPrintsUsCustomaryUnitsWhenAsked() throws Exception {
        Run r = run("sat", "--fluid", "propane", "--temperature", "100 F", "--units", "us");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("psia") && r.out().contains("lb/ft3") && r.out().contains("Btu/lb"), r.out());
        assertFalse(r.out().contains("\u00A0"), "plain spaces on a console");
    }

    @Test
    void propsPrintsEveryQuantityInUsCustomaryUnitsWhenAsked() throws Exception {
        String[] args = {"props", "--fluid", "propane", "--temperature", "100 F", "--pressure", "250 psia"};
        Run si = run(args);
        Run us = run(java.util.stream.Stream.concat(java.util.Arrays.stream(args), java.util.stream.Stream.of(
                "--units", "us")).toArray(String[]::new));
        assertEquals(0, si.code(), si.err());
        assertEquals(0, us.code(), us.err());
        // Conversions by definition: lbmol = 453.59237 mol; Btu (IT) = 1055.05585262 J; R = K / 1.8;
        // ft = 0.3048 m; psi = 6894.757293168361 Pa; lb/ft3 = 16.01846337 kg/m3
        double hSi = number(si.out(), "Residual enthalpy H-H_ig");
        double hUs = number(us.out(), "Residual enthalpy H-H_ig");
        assertEquals(hSi * 453.59237 / 1055.05585262, hUs, 0.1);
        double cpSi = number(si.out(), "Cv real");
        double cpUs = number(us.out(), "Cv real");
        assertEquals(cpSi * 453.59237 / 1055.05585262 / 1.8, cpUs, 2e-3);
        assertEquals(number(si.out(), "Speed of sound") / 0.3048, number(us.out(), "Speed of sound"), 0.2);
        assertEquals(number(si.out(), "Density") / 16.01846337, number(us.out(), "Density"), 0.01);
        for (String unit : List.of("lb/ft3", "ft3/lbmol", "Btu/lbmol", "Btu/(lbmol R)", "ft/s", "F/psi", "psia",
                "lb/lbmol")) {
            assertTrue(us.out().contains(unit), unit + " in\n" + us.out());
        }
        for (String si1 : List.of("kg/m3", "J/mol", "m/s", "K/bar", "kPa,", "kg/kmol")) {
            assertFalse(us.out().contains(si1), si1 + " left in SI in\n" + us.out());
        }
        assertFalse(us.out().contains("\u00A0"), "plain spaces on a console");
        Run bad = run("props", "--fluid", "propane", "--temperature", "100 F", "--pressure", "250 psia", "--units",
                "imperial");
        assertEquals(2, bad.code());
        assertTrue((bad.err() + bad.out()).contains("--units"), bad.err());
    }

    @Test
    void flashPrintsUsCustomaryUnitsWhenAsked() throws Exception {
        String[] args = {"flash", "--fluid", "propane:0.7,n-butane:0.3", "--temperature", "40 C", "--pressure",
                "10 bara"};
        Run si = run(args);
        Run us = run(java.util.stream.Stream.concat(java.util.Arrays.stream(args), java.util.stream.Stream.of(
                "--units", "us")).toArray(String[]::new));
        assertEquals(0, si.code(), si.err());
        assertEquals(0, us.code(), us.err());
        // Conversions by definition: lbmol = 453.59237 mol; Btu (IT) = 1055.05585262 J; lb/ft3 = 16.01846337 kg/m3
        assertEquals(number(si.out(), "Feed enthalpy") * 453.59237 / 1055.05585262, number(us.out(), "Feed enthalpy"),
                0.1);
        assertEquals(number(si.out(), "Density") / 16.01846337, number(us.out(), "Density"), 0.01);
        for (String unit : List.of("°F", "psia", "Btu/lbmol", "lb/ft3", "lb/lbmol")) {
            assertTrue(us.out().contains(unit), unit + " in\n" + us.out());
        }
        for (String si1 : List.of("kg/m3", "J/mol", "kg/kmol")) {
            assertFalse(us.out().contains(si1), si1 + " left in SI in\n" + us.out());
        }
    }

    @Test
    void envelopePrintsUsCustomaryUnitsWhenAsked() throws Exception {
        Run si = run("envelope", "--fluid", "propane:0.7,n-butane:0.3");
        Run us = run("envelope", "--fluid", "propane:0.7,n-butane:0.3", "--units", "us");
        assertEquals(0, si.code(), si.err());
        assertEquals(0, us.code(), us.err());
        // Definitions: F = K x 1.8 - 459.67; psi = 6894.757293168361 Pa
        assertEquals(number(si.out(), "Critical point") * 1.8 - 459.67, number(us.out(), "Critical point"), 0.01);
        String cp = us.out().lines().filter(l -> l.contains("Critical point")).findFirst().orElseThrow();
        assertTrue(cp.contains("°F") && cp.contains("psia ["), cp);
    }

    /** The first number on the row whose label starts the line (after indentation). */
    private static double number(String out, String label) {
        String line = out.lines().filter(l -> l.strip().startsWith(label)).findFirst().orElseThrow(
                () -> new AssertionError("no row " + label + " in\n" + out));
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("-?\\d+(\\.\\d+)?(e-?\\d+)?")
                .matcher(line.strip().substring(label.length()));
        if (!m.find()) {
            throw new AssertionError("no number on " + line);
        }
        return Double.parseDouble(m.group());
    }

    @Test
    void commandLineMistakesAreSaidInTheUsersTerms() {
        // issue 19 item 8: the parser's own phrasing ("Unmatched argument at index 0", "Missing
        // required argument (specify one of these)") no longer reaches the user
        Run r = run("bogus");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("'bogus' is not a command; expected one of demo,"), r.err());
        r = run("sat", "--fluid", "propane");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--temperature=T or --pressure=P: missing; ventcase sat needs one of them"), r.err());
        r = run("sat", "--fluid", "propane", "--temprature", "300 K");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("'--temprature' is not an option of ventcase sat"), r.err());
        r = run("sat", "--fluid", "propane", "--temperature", "300 K", "--pressure", "10 bara");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("give only one of these"), r.err());
        for (String bad : List.of("Unmatched", "Missing required", "specify one of these", "mutually exclusive", "Error:")) {
            assertFalse(r.err().contains(bad), r.err());
        }
    }

    @Test
    void anOutputThatNamesAnInputOrAFolderIsRefusedBeforeAnyWork(@org.junit.jupiter.api.io.TempDir Path dir)
            throws Exception {
        Path reg = dir.resolve("reg.csv");
        Files.copy(Path.of("demo-cases/register/kestrel-point-register.csv"), reg);
        byte[] before = Files.readAllBytes(reg);
        Run same = run("audit", reg.toString(), "-o", reg.toString());
        assertEquals(2, same.code(), same.err());
        assertTrue(same.err().contains("--output") && same.err().contains("inputs are never overwritten"), same.err());
        assertArrayEquals(before, Files.readAllBytes(reg), "the register is untouched");
        Run folder = run("audit", reg.toString(), "--pdf", dir.toString());
        assertEquals(2, folder.code(), folder.err());
        assertTrue(folder.err().contains("--pdf") && folder.err().contains("not a folder"), folder.err());
        Path claims = dir.resolve("claims.csv");
        Files.writeString(claims, "case," + Path.of("demo-cases/propane-bullet-fire.json").toAbsolutePath()
                + "\nk,1.1\n");
        Run review = run("review", "--claimed", claims.toString(), "--json", claims.toString());
        assertEquals(2, review.code(), review.err());
        assertTrue(review.err().contains("--json") && review.err().contains("inputs are never overwritten"),
                review.err());
    }
}
