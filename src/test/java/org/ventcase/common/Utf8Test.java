package org.ventcase.common;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;

/** Input files must be UTF-8; anything else is named with where it breaks. */
class Utf8Test {

    @Test
    void latin1IsReportedWithLineAndColumn() {
        byte[] b = "{\n  \"title\": \"Tank D\u00e9p\u00f4t\"\n}".getBytes(StandardCharsets.ISO_8859_1);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Utf8.decode(b, "case.json"));
        // the e-acute is the 19th character of the line: 2 spaces, "title": (8), a space, the quote, "Tank D"
        assertTrue(e.field().equals("case.json line 2, column 19"), e.field());
        assertTrue(e.getMessage().contains("save the file as UTF-8") && e.getMessage().contains("byte E9"),
                e.getMessage());
    }

    @Test
    void utf16IsNamed() {
        byte[] b = "{}".getBytes(StandardCharsets.UTF_16);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Utf8.decode(b, "case.json"));
        assertTrue(e.getMessage().contains("UTF-16"), e.getMessage());
    }

    @Test
    void aByteOrderMarkIsDroppedAndUtf8Kept() {
        byte[] b = "\uFEFF{\"t\": \"D\u00e9p\u00f4t\"}".getBytes(StandardCharsets.UTF_8);
        assertEquals("{\"t\": \"D\u00e9p\u00f4t\"}", Utf8.decode(b, "x"));
    }
}
