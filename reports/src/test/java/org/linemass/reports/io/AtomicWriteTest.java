package org.linemass.reports.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicWriteTest {

    @TempDir
    Path dir;

    @Test
    void write_replacesContentAndLeavesNoTemporaryFile() throws IOException {
        Path f = dir.resolve("report.csv");
        Files.writeString(f, "old");
        AtomicWrite.write(f, out -> out.write("new".getBytes(StandardCharsets.UTF_8)));
        assertEquals("new", Files.readString(f));
        assertEquals(List.of(f), list());
    }

    @Test
    void write_newReport_getsTheUsersUsualPermissions() throws IOException {
        org.junit.jupiter.api.Assumptions.assumeTrue(dir.getFileSystem().supportedFileAttributeViews().contains("posix"),
                "no POSIX permissions on this file system");
        // the reference: a file created plainly, which gets the permissions the process umask gives
        Path plain = dir.resolve("plain.txt");
        Files.writeString(plain, "x");
        Path f = dir.resolve("report.json");
        AtomicWrite.write(f, out -> out.write("{}".getBytes(StandardCharsets.UTF_8)));
        assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(f),
                "a report is created like any other file the user makes, not owner-only");
    }

    @Test
    void write_failingHalfway_keepsPreviousFile() throws IOException {
        Path f = dir.resolve("report.html");
        Files.writeString(f, "previous complete report");
        IOException e = assertThrows(IOException.class, () -> AtomicWrite.write(f, out -> {
            out.write("<html><body>half".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full (simulated)");
        }));
        assertEquals("disk full (simulated)", e.getMessage());
        assertEquals("previous complete report", Files.readString(f));
        assertEquals(List.of(f), list(), "the temporary file is removed");
    }

    @Test
    void write_processKilledHalfway_keepsPreviousFile() throws Exception {
        Path f = dir.resolve("report.json");
        Files.writeString(f, "{\"previous\": true}");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                SlowWriter.class.getName(), f.toString()).redirectErrorStream(true).start();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            String line = r.readLine();
            assertEquals("started", line);
            p.destroyForcibly();
            assertTrue(p.waitFor(30, TimeUnit.SECONDS));
        }
        assertEquals("{\"previous\": true}", Files.readString(f));
        assertEquals(1, temporaries().size(), "the killed run could not remove its temporary: " + list());
        // the next write into that folder, for any target, removes what the killed run left
        AtomicWrite.write(dir.resolve("other.csv"), out -> out.write('x'));
        assertEquals(List.of(), temporaries(), "no .part file is left after the next run");
        assertEquals("{\"previous\": true}", Files.readString(f));
    }

    @Test
    void removeStale_keepsTemporariesOfLiveProcessesAndForeignFiles() throws IOException {
        long me = ProcessHandle.current().pid();
        Path mine = Files.writeString(dir.resolve(".a.json.linemass-" + me + "-123.part"), "live");
        Path foreign = Files.writeString(dir.resolve(".a.json.part"), "not ours");
        Path dead = Files.writeString(dir.resolve(".a.json.linemass-" + deadPid() + "-5.part"), "killed");
        AtomicWrite.removeStale(dir);
        assertTrue(Files.exists(mine));
        assertTrue(Files.exists(foreign));
        assertTrue(Files.notExists(dead));
    }

    /** The id of a process that has ended. */
    private static long deadPid() throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-version").redirectErrorStream(true).start();
        try {
            p.getInputStream().readAllBytes();
            p.waitFor(60, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        return p.pid();
    }

    private List<Path> temporaries() throws IOException {
        return list().stream().filter(p -> p.getFileName().toString().endsWith(".part")).toList();
    }

    @Test
    void write_createsMissingFolders() throws IOException {
        Path f = dir.resolve("a/b/out.txt");
        AtomicWrite.write(f, out -> out.write('x'));
        assertEquals("x", Files.readString(f));
    }

    private List<Path> list() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.sorted().toList();
        }
    }
}
