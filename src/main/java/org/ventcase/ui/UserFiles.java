package org.ventcase.ui;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.ventcase.casefile.CaseFiles;

/**
 * The wizard's files in the user's configuration folder ({@code ~/.ventcase}, or the folder named
 * by the system property {@code ventcase.home}): the recent-cases list and autosave copies.
 * Written atomically. No JavaFX.
 */
public final class UserFiles {

    /** Entries kept in the recent list. */
    public static final int MAX_RECENT = 8;

    private final Path home;

    public UserFiles(Path home) {
        this.home = home;
    }

    /** The default folder: {@code ventcase.home} or {@code ~/.ventcase}. */
    public static UserFiles standard() {
        String h = System.getProperty("ventcase.home");
        return new UserFiles(h != null ? Path.of(h) : Path.of(System.getProperty("user.home"), ".ventcase"));
    }

    public Path home() {
        return home;
    }

    public Path autosaveDir() {
        return home.resolve("autosave");
    }

    private Path recentFile() {
        return home.resolve("recent.txt");
    }

    /** Recent case files, newest first, only those that still exist. */
    public List<Path> recent() {
        Path f = recentFile();
        if (!Files.isRegularFile(f)) {
            return List.of();
        }
        try {
            return Files.readAllLines(f, StandardCharsets.UTF_8).stream().filter(s -> !s.isBlank()).map(Path::of)
                    .filter(Files::isRegularFile).distinct().limit(MAX_RECENT).toList();
        } catch (IOException e) {
            return List.of();
        }
    }

    /** Puts {@code file} at the head of the recent list. */
    public void addRecent(Path file) {
        List<String> out = new ArrayList<>();
        Path abs = file.toAbsolutePath().normalize();
        out.add(abs.toString());
        for (Path p : recent()) {
            if (!p.toAbsolutePath().normalize().equals(abs) && out.size() < MAX_RECENT) {
                out.add(p.toString());
            }
        }
        write(recentFile(), String.join("\n", out) + "\n");
    }

    /** Writes an autosave copy of a draft; returns its path. */
    public Path autosave(String name, String json) {
        Path p = autosaveDir().resolve(name);
        write(p, json);
        return p;
    }

    /** Autosave copies left from earlier sessions, newest first. */
    public List<Path> autosaves() {
        Path d = autosaveDir();
        if (!Files.isDirectory(d)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(d)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".json"))
                    .sorted((a, b) -> Long.compare(b.toFile().lastModified(), a.toFile().lastModified())).toList();
        } catch (IOException e) {
            return List.of();
        }
    }

    /** Deletes an autosave copy (after a save or a clean close). */
    public void deleteAutosave(Path p) {
        try {
            Files.deleteIfExists(p);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void write(Path p, String text) {
        try {
            Files.createDirectories(p.getParent());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create " + p.getParent() + ": " + e, e);
        }
        CaseFiles.writeText(text, p);
    }
}
