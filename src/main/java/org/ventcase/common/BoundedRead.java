package org.ventcase.common;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.OptionalLong;

/**
 * Reads a file with a size limit enforced while reading, not from the size the file system
 * reports: a stream, a pipe or a device (e.g. /dev/zero) reports 0 and would otherwise be read
 * until memory runs out.
 */
public final class BoundedRead {

    private BoundedRead() {
    }

    /**
     * The file's bytes, or empty when it holds more than {@code max} bytes (then only max + 1 bytes
     * were read).
     */
    public static java.util.Optional<byte[]> bytes(Path file, long max) throws IOException {
        if (max > Integer.MAX_VALUE - 16) {
            throw new IllegalArgumentException("limit too large: " + max);
        }
        try (InputStream in = Files.newInputStream(file)) {
            byte[] buf = new byte[(int) Math.min(max + 1, 64 * 1024)];
            int n = 0;
            while (true) {
                if (n == buf.length) {
                    if (n > max) {
                        return java.util.Optional.empty();
                    }
                    buf = Arrays.copyOf(buf, (int) Math.min(max + 1, 2L * buf.length));
                }
                int r = in.read(buf, n, buf.length - n);
                if (r < 0) {
                    break;
                }
                n += r;
                if (n > max) {
                    return java.util.Optional.empty();
                }
            }
            return java.util.Optional.of(Arrays.copyOf(buf, n));
        }
    }

    /** The size the file system reports, when it is a regular file. */
    public static OptionalLong regularSize(Path file) throws IOException {
        return Files.isRegularFile(file) ? OptionalLong.of(Files.size(file)) : OptionalLong.empty();
    }
}
