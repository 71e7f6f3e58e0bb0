package org.ventcase.common;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/** Outputs only to regular files; inputs read with their size limit enforced while reading. */
class SpecialFilesTest {

    @TempDir
    Path dir;

    @Test
    void aSymbolicLinkIsRefusedAndItsTargetLeftAlone() throws Exception {
        Path target = dir.resolve("real.json");
        Files.writeString(target, "old");
        Path link = Files.createSymbolicLink(dir.resolve("link.json"), target);
        FileSystemException e = assertThrows(FileSystemException.class, () -> AtomicFiles.writeText("new", link));
        assertTrue(e.getReason().contains("symbolic link"), e.getReason());
        assertTrue(Files.isSymbolicLink(link), "the link is still a link");
        assertEquals("old", Files.readString(target));
        try (var s = Files.list(dir)) {
            assertEquals(2, s.count(), "no temporary file left");
        }
    }

    @Test
    @EnabledOnOs(OS.LINUX)
    void aDeviceIsRefusedNotReplaced() {
        Path dev = Path.of("/dev/null");
        FileSystemException e = assertThrows(FileSystemException.class, () -> AtomicFiles.writeText("x", dev));
        assertTrue(e.getReason().contains("not a regular file"), e.getReason());
        assertTrue(Files.exists(dev) && !Files.isRegularFile(dev), "still the device");
    }

    @Test
    @EnabledOnOs(OS.LINUX)
    void anEndlessStreamStopsAtTheLimit() throws Exception {
        // /dev/zero reports size 0 and never ends: the limit must hold while reading
        assertTrue(BoundedRead.bytes(Path.of("/dev/zero"), 1000).isEmpty());
        Path f = dir.resolve("small.txt");
        Files.writeString(f, "0123456789");
        assertEquals(10, BoundedRead.bytes(f, 10).orElseThrow().length);
        assertTrue(BoundedRead.bytes(f, 9).isEmpty());
    }

    @Test
    void aStaleTemporaryFileOfAKilledRunIsRemovedAtTheNextWrite() throws Exception {
        Path target = dir.resolve("out.json");
        Path stale = dir.resolve(".out.json.1a2b3c4d5e6f7081.tmp");
        Path fresh = dir.resolve(".out.json.00ff00ff00ff00ff.tmp");
        Path other = dir.resolve(".other.json.1a2b3c4d5e6f7081.tmp");
        for (Path p : new Path[] {stale, fresh, other}) {
            Files.writeString(p, "partial");
        }
        java.nio.file.attribute.FileTime old = java.nio.file.attribute.FileTime.fromMillis(
                System.currentTimeMillis() - 2 * AtomicFiles.STALE_AFTER_MS);
        Files.setLastModifiedTime(stale, old);
        Files.setLastModifiedTime(other, old);
        AtomicFiles.writeText("{}", target);
        assertTrue(Files.notExists(stale), "the stale temporary file of this target is removed");
        assertTrue(Files.exists(fresh), "a young one may be a write in progress: kept");
        assertTrue(Files.exists(other), "another target's file is not ours to remove");
        assertEquals("{}", Files.readString(target));
    }

    @Test
    void anInterruptedWriteLeavesNoTemporaryFile() throws Exception {
        // the shutdown hook's work (Ctrl-C during a write): the temporary file of a write in progress goes
        Path target = dir.resolve("sheet.pdf");
        java.util.concurrent.CountDownLatch inside = new java.util.concurrent.CountDownLatch(1);
        java.util.concurrent.CountDownLatch release = new java.util.concurrent.CountDownLatch(1);
        Thread w = new Thread(() -> {
            try {
                AtomicFiles.write(target, out -> {
                    out.write(1);
                    inside.countDown();
                    try {
                        release.await();
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                    throw new java.io.IOException("interrupted for the test");
                });
            } catch (java.io.IOException expected) {
                // the write fails, as an interrupted one would
            }
        });
        w.start();
        inside.await();
        try (var s = Files.list(dir)) {
            assertEquals(1, s.filter(p -> p.getFileName().toString().endsWith(".tmp")).count(), "a write in progress");
        }
        AtomicFiles.deletePending();
        try (var s = Files.list(dir)) {
            assertEquals(0, s.count(), "the hook removed the temporary file");
        }
        release.countDown();
        w.join();
        assertTrue(Files.notExists(target));
    }
}
