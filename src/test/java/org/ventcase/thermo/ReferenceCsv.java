package org.ventcase.thermo;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads a reference-data CSV resource of the tests: '#' lines (the source header) and blank lines
 * skipped, the first other line taken as the column names and skipped, every later line split into
 * its fields.
 */
public final class ReferenceCsv {

    private ReferenceCsv() {
    }

    /** The data rows of the resource {@code name}, found beside {@code anchor}. */
    public static List<List<String>> rows(Class<?> anchor, String name) throws IOException {
        List<List<String>> out = new ArrayList<>();
        var in = anchor.getResourceAsStream(name);
        if (in == null) {
            throw new IOException("missing test resource " + name + " beside " + anchor.getName());
        }
        try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            boolean header = true;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                if (header) {
                    header = false;
                    continue;
                }
                out.add(org.ventcase.common.CsvTable.split(line, name, 0));
            }
        }
        return out;
    }
}
