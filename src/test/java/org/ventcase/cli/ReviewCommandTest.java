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

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

class ReviewCommandTest {

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
    void reviewPrintsTheTableAndWritesJsonAndPdf() throws IOException {
        Path json = dir.resolve("review.json");
        Path pdf = dir.resolve("review.pdf");
        Run r = run("review", "--claimed", "demo-cases/review/propane-bullet-latent-at-storage.json", "--json",
                json.toString(), "-o", pdf.toString());
        assertEquals(ExitCode.OK, r.code(), r.err());
        assertTrue(r.out().contains("Latent heat L") && r.out().contains("disagrees"), r.out());
        assertTrue(r.out().contains("[latent-heat-at-storage]"), r.out());
        assertTrue(r.out().contains("qualified engineer"), "cautions line");
        JsonNode n = new ObjectMapper().readTree(json.toFile());
        assertEquals("Pool fire under V-4101", n.get("scenario").get("label").asText());
        JsonNode latent = null;
        for (JsonNode row : n.get("rows")) {
            if (row.get("quantity").asText().equals("latentHeat")) {
                latent = row;
            }
        }
        assertEquals("disagrees", latent.get("verdict").asText());
        // the claimed 346.6 kJ/kg as written in the demo file, in SI
        assertEquals(346600, latent.get("claimed").asDouble(), 1e-9);
        assertEquals("latent-heat-at-storage", latent.get("hints").get(0).get("code").asText());
        assertEquals(5, n.get("modelRuns").size()); // the case (PR-Twu) and PR78, SRK on both bases
        byte[] head = new byte[5];
        System.arraycopy(Files.readAllBytes(pdf), 0, head, 0, 5);
        assertArrayEquals("%PDF-".getBytes(), head);
    }

    /**
     * Issue 18 item 4: --units us prints the table in US customary units and the hints lead with
     * them. Check values: the SI display of the same run (bar abs, C), converted with the exact
     * factors of NIST SP 811 (1 psi = 0.0689476 bar; F = 1.8 C + 32), to the printed rounding.
     */
    @Test
    void unitsUsPrintsTheTableInCustomaryUnits() {
        Run si = run("review", "--claimed", "demo-cases/review/propane-bullet-gauge-as-absolute.json");
        Run us = run("review", "--claimed", "demo-cases/review/propane-bullet-gauge-as-absolute.json", "--units", "us");
        assertEquals(ExitCode.OK, us.code(), us.err());
        java.util.regex.Matcher p = java.util.regex.Pattern.compile("Relieving pressure P1 +[0-9.]+ bar abs +([0-9.]+) bar abs")
                .matcher(si.out());
        assertTrue(p.find(), si.out());
        double bar = Double.parseDouble(p.group(1));
        java.util.regex.Matcher q = java.util.regex.Pattern.compile("Relieving pressure P1 +[0-9.]+ psia +([0-9.]+) psia")
                .matcher(us.out());
        assertTrue(q.find(), us.out());
        assertEquals(bar / 0.0689475729, Double.parseDouble(q.group(1)), 0.05 / 0.0689475729 + 0.05);
        assertTrue(us.out().contains(" \u00b0F "), "temperatures in F");
        assertTrue(us.out().contains(" psia ["), "a hint leads with psia, SI bracketed");
        assertFalse(us.out().lines().anyMatch(l -> l.matches("Relieving pressure P1 +[0-9].*") && l.contains("bar")),
                "no bar abs in the table row");
        Run bad = run("review", "--claimed", "demo-cases/review/propane-bullet-clean.json", "--units", "imperial");
        assertEquals(ExitCode.INVALID_INPUT, bad.code());
        assertTrue(bad.err().contains("--units") && bad.err().contains("si or us"), bad.err());
    }

    @Test
    void toleranceOptionChangesTheVerdict() {
        Run r = run("review", "demo-cases/propane-bullet-fire.json", "--claimed",
                "demo-cases/review/propane-bullet-untranslated-density.json", "--tolerance", "liquidDensity=0.5%");
        assertEquals(ExitCode.OK, r.code(), r.err());
        // the claim is 1.2 % off (ReviewTest): above 2 x 0.5 % it disagrees
        assertTrue(r.out().matches("(?s).*Liquid density at T1, P1 .*disagrees.*"), r.out());
        assertTrue(r.out().contains("[density-basis]"), r.out());
    }

    @Test
    void badInputIsOneMessageAndExitTwo() throws IOException {
        Run tol = run("review", "--claimed", "demo-cases/review/propane-bullet-clean.json", "--tolerance", "k=2");
        assertEquals(ExitCode.INVALID_INPUT, tol.code());
        assertTrue(tol.err().contains("--tolerance k") && tol.err().contains("0.5"), tol.err());
        Path claimed = dir.resolve("c.json");
        Files.writeString(claimed, "{\"claimed\": {\"k\": 1.1}}");
        Run noCase = run("review", "--claimed", claimed.toString());
        assertEquals(ExitCode.INVALID_INPUT, noCase.code());
        assertTrue(noCase.err().contains("CASE.json"), noCase.err());
        assertEquals(1, noCase.err().strip().lines().count(), noCase.err());
        Path same = dir.resolve("d.json");
        Files.writeString(same, "{\"case\": \"" + Path.of("demo-cases/propane-bullet-fire.json").toAbsolutePath()
                .toString().replace("\\", "\\\\") + "\", \"claimed\": {\"k\": 1.1}}");
        Run overwrite = run("review", "--claimed", same.toString(), "--json", same.toString());
        assertEquals(ExitCode.INVALID_INPUT, overwrite.code());
        assertFalse(Files.readString(same).contains("rows"));
    }
}
