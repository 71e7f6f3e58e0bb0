package org.ventcase.common;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.ThreadLocalRandom;

/**
 * The one way Ventcase writes an output file: into a hidden temporary file in the target's own
 * folder, flushed to disk, then moved over the target in one step (atomically where the file
 * system allows). A failed write leaves the old file as it was and no temporary file behind. The
 * temporary file is created like any other file, so the result has the user's usual permissions
 * (a {@code Files.createTempFile} file would stay readable by its owner only). The target's folder
 * must exist: a mistyped folder is reported, not created.
 */
public final class AtomicFiles {

    private AtomicFiles() {
    }

    /**
     * Temporary files being written now. A JVM shutdown hook (Ctrl-C, SIGTERM) deletes them, so an
     * interrupted write leaves nothing behind; a killed process (SIGKILL) cannot run it, and the
     * next write to the same target removes what it left ({@link #removeStaleTemps}).
     */
    private static final java.util.Set<Path> PENDING = java.util.concurrent.ConcurrentHashMap.newKeySet();

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(AtomicFiles::deletePending, "ventcase-temp-cleanup"));
    }

    /** Deletes the temporary files of writes still in progress (the shutdown hook's work). */
    static void deletePending() {
        for (Path p : PENDING) {
            try {
                Files.deleteIfExists(p);
            } catch (IOException ignored) {
                // the next write to the same target removes it
            }
        }
    }

    /** What writes the content. */
    @FunctionalInterface
    public interface Writer {
        void write(OutputStream out) throws IOException;
    }

    /** Writes text as UTF-8. */
    public static void writeText(String text, Path target) throws IOException {
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        write(target, out -> out.write(bytes));
    }

    /** Writes whatever {@code writer} produces. */
    public static void write(Path target, Writer writer) throws IOException {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        if (!Files.isDirectory(dir)) {
            throw new java.nio.file.NoSuchFileException(dir.toString(), null,
                    "the folder does not exist (create it first; a mistyped folder is not created)");
        }
        if (Files.exists(abs, java.nio.file.LinkOption.NOFOLLOW_LINKS)
                && !Files.isRegularFile(abs, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
            throw new java.nio.file.FileSystemException(abs.toString(), null, Files.isSymbolicLink(abs)
                    ? "is a symbolic link: Ventcase writes an output through a temporary file moved into place, which "
                            + "would replace the link and leave its target as it was; name the target file itself"
                    : "is not a regular file (a device, a pipe or a folder): name a regular file to write to");
        }
        removeStaleTemps(dir, abs.getFileName().toString());
        Path tmp = null;
        Path pending = null;
        try {
            tmp = newTemp(dir, abs.getFileName().toString());
            pending = tmp;
            PENDING.add(tmp);
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
                 OutputStream out = Channels.newOutputStream(ch)) {
                writer.write(out);
                out.flush();
                ch.force(true);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
            tmp = null;
        } finally {
            if (pending != null) {
                PENDING.remove(pending);
            }
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // the write has already failed; that error is the one reported
                }
            }
        }
    }

    /**
     * A scratch file beside {@code target}, named as this class names its temporary files, so that
     * the shutdown hook deletes it and a killed run's leftover is removed by the next write to the
     * same target. The caller deletes it with {@link #discard} when done.
     */
    public static Path scratch(Path target) throws IOException {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        if (!Files.isDirectory(dir)) {
            throw new java.nio.file.NoSuchFileException(dir.toString(), null,
                    "the folder does not exist (create it first; a mistyped folder is not created)");
        }
        removeStaleTemps(dir, abs.getFileName().toString());
        Path tmp = newTemp(dir, abs.getFileName().toString());
        PENDING.add(tmp);
        return tmp;
    }

    /** Deletes a scratch file made by {@link #scratch} (best effort). */
    public static void discard(Path scratch) {
        try {
            Files.deleteIfExists(scratch);
        } catch (IOException ignored) {
            // the next write to the same target removes it
        } finally {
            PENDING.remove(scratch);
        }
    }

    /** A temporary file of ours older than this is left over from a killed run. */
    static final long STALE_AFTER_MS = 10 * 60 * 1000L;

    /**
     * Deletes the temporary files a killed run of ours left beside this target (".NAME.HEX.tmp",
     * older than {@link #STALE_AFTER_MS}: a younger one may belong to a write still going on).
     * Best effort: a file that cannot be deleted is left.
     */
    static void removeStaleTemps(Path dir, String name) {
        String prefix = "." + name + ".";
        long now = System.currentTimeMillis();
        try (java.nio.file.DirectoryStream<Path> ds = Files.newDirectoryStream(dir, p -> {
            String f = p.getFileName().toString();
            return f.startsWith(prefix) && f.endsWith(".tmp")
                    && f.substring(prefix.length(), f.length() - 4).matches("-?[0-9a-f]{1,16}");
        })) {
            for (Path p : ds) {
                try {
                    if (Files.isRegularFile(p, java.nio.file.LinkOption.NOFOLLOW_LINKS)
                            && now - Files.getLastModifiedTime(p).toMillis() > STALE_AFTER_MS) {
                        Files.deleteIfExists(p);
                    }
                } catch (IOException ignored) {
                    // left for the next write
                }
            }
        } catch (IOException ignored) {
            // the folder cannot be listed: nothing to clean, the write itself will report
        }
    }

    private static Path newTemp(Path dir, String name) throws IOException {
        for (int i = 0; i < 100; i++) {
            Path p = dir.resolve("." + name + "." + Long.toHexString(ThreadLocalRandom.current().nextLong()) + ".tmp");
            try {
                return Files.createFile(p);
            } catch (FileAlreadyExistsException e) {
                // try another name
            }
        }
        throw new IOException("cannot create a temporary file in " + dir);
    }
}
