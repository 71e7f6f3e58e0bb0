package org.ventcase.common;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.UncheckedIOException;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A file error reads in the user's terms: what is wrong, the path once, no exception class name
 * ("cannot read case file X: X" was the message for a missing file). Invariant.
 */
class FileErrorsTest {

    @Test
    void missingFileSaysSoAndNamesThePathOnce(@TempDir Path dir) {
        Path missing = dir.resolve("nowhere.json");
        UncheckedIOException e = assertThrows(UncheckedIOException.class,
                () -> org.ventcase.casefile.CaseFiles.read(missing));
        assertEquals("cannot read case file " + missing + ": no such file or folder", e.getMessage());
        assertTrue(!e.getMessage().contains("Exception"), e.getMessage());
    }

    @Test
    void reasonsOfTheUsualFileErrors() {
        assertEquals("no such file or folder", FileErrors.reason(new java.nio.file.NoSuchFileException("/x")));
        assertEquals("permission denied", FileErrors.reason(new java.nio.file.AccessDeniedException("/x")));
        assertEquals("disk full", FileErrors.reason(new java.nio.file.FileSystemException("/x", null, "disk full")));
        assertEquals("the file cannot be read or written", FileErrors.reason(new java.io.IOException()));
    }

    @Test
    void aFolderGivenAsACaseFileIsCalledAFolder(@TempDir Path dir) {
        // issue 19 item 8: before, the operating system's "Is a directory" was passed on as it was
        UncheckedIOException e = assertThrows(UncheckedIOException.class,
                () -> org.ventcase.casefile.CaseFiles.read(dir));
        assertEquals("cannot read case file " + dir + ": it is a folder, not a file", e.getMessage());
        assertEquals("the disk is full",
                FileErrors.reason(new java.nio.file.FileSystemException("/x", null, "No space left on device")));
    }
}
