package org.ventcase.arch;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * Keeps the layering of DEVELOPERS.md: domain packages import only java.*, Commons Math and lower
 * domain packages; only casefile (and ui's draft case) imports Jackson, only report imports PDFBox, only cli imports
 * picocli and prints to standard streams, only ui imports JavaFX (app, the application layer that
 * the wizard and the CLI share, imports none of these). Checked on the source text.
 */
class LayeringTest {

    private static final Path SRC = Path.of("src/main/java/org/ventcase");

    /** Package -> import prefixes it may NOT use. */
    private static final Map<String, List<String>> FORBIDDEN = Map.ofEntries(
            Map.entry("common", List.of("org.ventcase.", "com.fasterxml", "picocli", "org.apache.pdfbox", "javafx")),
            Map.entry("units", List.of("org.ventcase.thermo", "org.ventcase.vessel", "org.ventcase.relief", "org.ventcase.device",
                    "org.ventcase.casefile", "org.ventcase.cli", "com.fasterxml", "picocli", "javafx")),
            Map.entry("thermo", List.of("org.ventcase.vessel", "org.ventcase.relief", "org.ventcase.device",
                    "org.ventcase.casefile", "org.ventcase.cli", "com.fasterxml", "picocli", "org.apache.pdfbox", "javafx")),
            Map.entry("vessel", List.of("org.ventcase.thermo", "org.ventcase.relief", "org.ventcase.device",
                    "org.ventcase.casefile", "org.ventcase.cli", "com.fasterxml", "picocli", "org.apache.pdfbox", "javafx")),
            Map.entry("relief", List.of("org.ventcase.calc", "org.ventcase.casefile", "org.ventcase.cli", "com.fasterxml", "picocli",
                    "org.apache.pdfbox", "javafx")),
            Map.entry("device", List.of("org.ventcase.calc", "org.ventcase.casefile", "org.ventcase.cli", "com.fasterxml", "picocli",
                    "org.apache.pdfbox", "javafx")),
            Map.entry("inventory", List.of("org.ventcase.calc", "org.ventcase.relief", "org.ventcase.device", "org.ventcase.casefile",
                    "org.ventcase.cli", "com.fasterxml", "picocli", "org.apache.pdfbox", "javafx")),
            Map.entry("casefile", List.of("org.ventcase.cli", "picocli", "org.apache.pdfbox", "javafx")),
            Map.entry("report", List.of("org.ventcase.cli", "picocli", "com.fasterxml", "javafx")),
            Map.entry("cli", List.of("org.apache.pdfbox", "javafx")),
            Map.entry("ui", List.of("picocli", "org.ventcase.cli")),
            // the application layer (the wizard's and the CLI's shared work) is JavaFX- and picocli-free
            Map.entry("app", List.of("picocli", "javafx", "org.ventcase.cli", "org.ventcase.ui", "com.fasterxml",
                    "org.apache.pdfbox")),
            // the reviewer's cross-check is domain-level: it may use calc and the lower domain packages
            Map.entry("review", List.of("org.ventcase.casefile", "org.ventcase.cli", "org.ventcase.report",
                    "org.ventcase.ui", "com.fasterxml", "picocli", "org.apache.pdfbox", "javafx")),
            // the inventory audit is domain-level: no case files (JSON), sheet, command line or JavaFX
            Map.entry("audit", List.of("org.ventcase.casefile", "org.ventcase.cli", "org.ventcase.report", "org.ventcase.ui",
                    "com.fasterxml", "picocli", "org.apache.pdfbox", "javafx")),
            Map.entry("calc", List.of("org.ventcase.casefile", "org.ventcase.cli", "org.ventcase.report", "com.fasterxml",
                    "picocli", "org.apache.pdfbox", "javafx")));

    @Test
    void packagesImportOnlyWhatTheirLayerAllows() throws IOException {
        List<String> violations = new ArrayList<>();
        for (Map.Entry<String, List<String>> e : FORBIDDEN.entrySet()) {
            Path dir = SRC.resolve(e.getKey());
            if (!Files.isDirectory(dir)) {
                continue;
            }
            try (Stream<Path> files = Files.walk(dir)) {
                for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                    for (String line : Files.readAllLines(f)) {
                        String l = line.trim();
                        if (!l.startsWith("import ")) {
                            continue;
                        }
                        for (String bad : e.getValue()) {
                            if (l.matches("import (static )?" + java.util.regex.Pattern.quote(bad) + ".*")
                                    && !l.contains("org.ventcase.common") && !l.contains("org.ventcase.units")
                                    || e.getKey().equals("common") && l.contains(bad)) {
                                violations.add(f + ": " + l);
                            }
                        }
                    }
                }
            }
        }
        assertTrue(violations.isEmpty(), String.join("\n", violations));
    }

    @Test
    void reportTakesOnlyTheTextBlocksFromCasefile() throws IOException {
        List<String> violations = new ArrayList<>();
        Path dir = SRC.resolve("report");
        if (Files.isDirectory(dir)) {
            try (Stream<Path> files = Files.walk(dir)) {
                for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                    for (String line : Files.readAllLines(f)) {
                        String l = line.trim();
                        if (l.startsWith("import org.ventcase.casefile.")
                                && !l.equals("import org.ventcase.casefile.Templates;")) {
                            violations.add(f + ": " + l);
                        }
                    }
                }
            }
        }
        assertTrue(violations.isEmpty(), String.join("\n", violations));
    }

    @Test
    void onlyTheCommandLinePrintsToStandardStreams() throws IOException {
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(SRC)) {
            for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                if (f.startsWith(SRC.resolve("cli"))) {
                    continue;
                }
                String text = Files.readString(f);
                if (text.contains("System.out") || text.contains("System.err") || text.contains("System.exit")) {
                    violations.add(f.toString());
                }
            }
        }
        assertTrue(violations.isEmpty(), String.join("\n", violations));
    }
}
