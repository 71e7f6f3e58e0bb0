package org.ventcase.common;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;

/**
 * Decodes an input file as UTF-8, strictly: a byte sequence that is not UTF-8 (a file saved as
 * Latin-1 or UTF-16, say) is reported with where it is, instead of being replaced silently or
 * failing with the decoder's own words. A UTF-8 byte-order mark is accepted and dropped.
 */
public final class Utf8 {

    private Utf8() {
    }

    /**
     * The text of {@code bytes}.
     *
     * @param origin the file name, for the message
     * @throws InvalidInputException when the bytes are not UTF-8 (names the line and column)
     */
    public static String decode(byte[] bytes, String origin) {
        int start = 0;
        if (bytes.length >= 3 && (bytes[0] & 0xff) == 0xEF && (bytes[1] & 0xff) == 0xBB && (bytes[2] & 0xff) == 0xBF) {
            start = 3;
        } else if (bytes.length >= 2 && ((bytes[0] & 0xff) == 0xFE && (bytes[1] & 0xff) == 0xFF
                || (bytes[0] & 0xff) == 0xFF && (bytes[1] & 0xff) == 0xFE)) {
            throw InvalidInputException.invalid(origin, "UTF-16 text (byte-order mark " + String.format("%02X %02X",
                    bytes[0] & 0xff, bytes[1] & 0xff) + ")", "expected UTF-8 text: save the file as UTF-8");
        }
        CharsetDecoder d = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes, start, bytes.length - start);
        try {
            CharBuffer out = d.decode(in);
            return out.toString();
        } catch (CharacterCodingException e) {
            int bad = firstBad(bytes, start);
            int line = 1;
            int col = 1;
            for (int i = start; i < bad; i++) {
                if (bytes[i] == '\n') {
                    line++;
                    col = 1;
                } else if ((bytes[i] & 0xC0) != 0x80) {
                    col++;
                }
            }
            throw InvalidInputException.invalid(origin + " line " + line + ", column " + col,
                    String.format("byte %02X", bytes[bad] & 0xff), "expected UTF-8 text: this looks like another "
                            + "encoding (Latin-1 or a Windows code page, perhaps); save the file as UTF-8");
        }
    }

    /** Index of the first byte that does not start a valid UTF-8 sequence. */
    private static int firstBad(byte[] b, int start) {
        int i = start;
        while (i < b.length) {
            int c = b[i] & 0xff;
            int n = c < 0x80 ? 0 : c >= 0xC2 && c <= 0xDF ? 1 : c >= 0xE0 && c <= 0xEF ? 2 : c >= 0xF0 && c <= 0xF4 ? 3 : -1;
            if (n < 0) {
                return i;
            }
            for (int k = 1; k <= n; k++) {
                if (i + k >= b.length || (b[i + k] & 0xC0) != 0x80) {
                    return i;
                }
            }
            i += n + 1;
        }
        return Math.max(start, b.length - 1);
    }
}
