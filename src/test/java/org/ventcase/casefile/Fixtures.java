package org.ventcase.casefile;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Template text and small edits for the case-file tests. */
final class Fixtures {
    /** The project's templates folder (tests run from the project root). */
    static final Path TEMPLATES = Path.of("templates", "cases");

    private Fixtures() {
    }

    static String template(String name) {
        try {
            return Files.readString(TEMPLATES.resolve(name + ".json"), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The bullet template with one literal piece of text replaced (which must be present). */
    static String bulletWith(String from, String to) {
        String t = template("horizontal-bullet");
        if (!t.contains(from)) {
            throw new IllegalArgumentException("fixture text not found: " + from);
        }
        return t.replace(from, to);
    }
}
