package org.ventcase.ui;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;

/**
 * The invented demo cases of {@code demo-cases/}, packaged in the jar (so that {@code ventcase
 * demo} and the start screen's demo list work from any folder).
 */
public final class Demos {

    /** The case {@code ventcase demo} opens. */
    public static final String BUILT_IN = "propane-bullet-fire.json";

    /** Every packaged demo case, by file name (DemosTest checks this against the folder). */
    public static final List<String> ALL = List.of("propane-bullet-fire.json", "lpg-sphere-mixture.json",
            "ammonia-storage.json", "hexane-drum.json", "ethane-supercritical-fire.json", "gas-receiver-fire.json",
            "separator-blocked-outlet.json", "liquid-line-thermal.json");

    private Demos() {
    }

    /** The JSON text of a packaged demo case. */
    public static String json(String name) {
        if (!ALL.contains(name)) {
            throw new IllegalArgumentException("no demo case " + name + "; there are " + String.join(", ", ALL));
        }
        String path = "/org/ventcase/demo-cases/" + name;
        try (InputStream in = Demos.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("missing packaged demo case " + path);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
