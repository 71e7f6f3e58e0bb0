package org.ventcase.casefile;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;

/**
 * The starter cases and calculation-sheet text blocks kept in the project's {@code templates/}
 * folder and packaged as resources under {@code /org/ventcase/templates/}.
 */
public final class Templates {

    /** Starter case names, one per vessel type; each is {@code templates/cases/NAME.json}. */
    public static final List<String> CASES = List.of("horizontal-bullet", "vertical-drum", "sphere");

    /** Text block names; each is {@code templates/text/NAME.txt}. */
    public static final List<String> TEXTS = List.of("code-deferral", "cautions", "method-fire-wetted",
            "method-fire-near-critical", "method-fire-boil-off", "method-fire-gas-filled", "method-blocked-outlet",
            "method-thermal-expansion", "method-audit");

    private static final String ROOT = "/org/ventcase/templates/";

    private Templates() {
    }

    /** The JSON text of a starter case, or empty when there is no such template. */
    public static Optional<String> caseJson(String name) {
        return CASES.contains(name) ? Optional.of(resource("cases/" + name + ".json")) : Optional.empty();
    }

    /** A text block, or empty when there is no such block. */
    public static Optional<String> text(String name) {
        return TEXTS.contains(name) ? Optional.of(resource("text/" + name + ".txt")) : Optional.empty();
    }

    private static String resource(String path) {
        try (InputStream in = Templates.class.getResourceAsStream(ROOT + path)) {
            if (in == null) {
                throw new IllegalStateException("missing packaged template " + ROOT + path);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read template " + path, e);
        }
    }
}
