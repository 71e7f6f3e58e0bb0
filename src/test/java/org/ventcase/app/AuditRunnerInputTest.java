package org.ventcase.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ventcase.common.InvalidInputException;

/** The wizard's audit reads its files as strictly as {@code ventcase audit} does. */
class AuditRunnerInputTest {

    @TempDir
    Path dir;

    @Test
    void aLatin1RegisterIsRefusedWithItsLineAndColumn() throws Exception {
        String demo = new String(AuditRunner.class.getResourceAsStream(
                "/org/ventcase/demo-cases/register/" + AuditRunner.DEMO_REGISTER).readAllBytes(), StandardCharsets.UTF_8);
        String[] lines = demo.split("\n", -1);
        // an accented letter in the second line's first field, saved as Latin-1 (invented edit of the demo register)
        lines[1] = "\u00c9" + lines[1];
        Path p = dir.resolve("register-latin1.csv");
        Files.write(p, String.join("\n", lines).getBytes(StandardCharsets.ISO_8859_1));
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new AuditRunner().run(
                AuditRunner.Input.file(p), Optional.empty(), 1, (d, n) -> { }, () -> false));
        assertEquals("register-latin1.csv line 2, column 1", e.field());
        assertTrue(e.getMessage().contains("save the file as UTF-8"), e.getMessage());
    }

    @Test
    void theDemoRegisterStillReads() {
        AuditRunner.Outcome o = new AuditRunner().run(AuditRunner.Input.demo(AuditRunner.DEMO_REGISTER),
                Optional.of(AuditRunner.Input.demo(AuditRunner.DEMO_THRESHOLDS)), 1, (d, n) -> { }, () -> false);
        assertTrue(!o.result().rows().isEmpty());
    }
}
