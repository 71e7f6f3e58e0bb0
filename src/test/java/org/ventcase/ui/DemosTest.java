package org.ventcase.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/** The packaged demo cases are those of demo-cases/, byte for byte. */
class DemosTest {

    @Test
    void everyDemoCaseIsPackagedUnchanged() throws Exception {
        List<String> folder;
        try (Stream<Path> s = Files.list(Path.of("demo-cases"))) {
            folder = s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".json")).sorted().toList();
        }
        assertEquals(folder, Demos.ALL.stream().sorted().toList());
        for (String n : Demos.ALL) {
            assertEquals(Files.readString(Path.of("demo-cases", n)), Demos.json(n), n);
        }
        assertThrows(IllegalArgumentException.class, () -> Demos.json("no-such-case.json"));
    }
}
