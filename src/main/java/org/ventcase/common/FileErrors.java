package org.ventcase.common;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;

/**
 * What went wrong with a file, in the user's terms: "no such file or folder", "permission denied",
 * the file system's own reason, never the exception's class name or the path said twice (a
 * NoSuchFileException's message is only the path).
 */
public final class FileErrors {

    private FileErrors() {
    }

    /** The reason of a file error, without the path. */
    public static String reason(IOException e) {
        if (e instanceof NoSuchFileException) {
            return "no such file or folder";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof NotDirectoryException) {
            return "a part of the path is not a folder";
        }
        if (e instanceof FileSystemException f) {
            return f.getReason() != null ? plain(f.getReason()) : "the file cannot be used";
        }
        String m = e.getMessage();
        return m == null || m.isBlank() ? "the file cannot be read or written" : plain(m);
    }

    /** The operating system's usual reasons (lower case) in plain words. */
    private static final java.util.Map<String, String> PLAIN = java.util.Map.of(
            "is a directory", "it is a folder, not a file",
            "no space left on device", "the disk is full",
            "read-only file system", "the disk or folder is read-only");

    /** A reason in plain words where it is one of the usual ones; any other reason as it is. */
    static String plain(String reason) {
        String r = reason.strip();
        return PLAIN.getOrDefault(r.toLowerCase(java.util.Locale.ROOT), r);
    }
}
