package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A full file system while the reports are written: on a 32 KiB tmpfs mounted by the test (only
 * possible as root; skipped with a message elsewhere), each report that does not fit stops the
 * run within seconds with one line naming the file and "no space left on device", exit 2, the
 * previous file kept and no temporary left.
 */
class FullDiskTest {

    /** Small enough that the HTML report of a corpus drawing (tens of KiB) does not fit. */
    private static final String SIZE = "32k";

    @TempDir
    Path dir;
    Path disk;
    boolean mounted;

    @BeforeEach
    void mount() throws Exception {
        disk = Files.createDirectories(dir.resolve("disk"));
        Process p = new ProcessBuilder("mount", "-t", "tmpfs", "-o", "size=" + SIZE, "tmpfs", disk.toString())
                .redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        mounted = p.waitFor(30, TimeUnit.SECONDS) && p.exitValue() == 0;
        assumeTrue(mounted, "cannot mount a small tmpfs here (needs root and mount rights): " + out
                + "; the full-file-system test is skipped");
    }

    @AfterEach
    void unmount() throws Exception {
        if (mounted) {
            new ProcessBuilder("umount", disk.toString()).redirectErrorStream(true).start().waitFor(30, TimeUnit.SECONDS);
        }
    }

    private static Path drawing() {
        Path d = Path.of(System.getProperty("linemass.repo", "..")).resolve("testdata/demo");
        try (Stream<Path> s = Files.list(d)) {
            return s.filter(p -> p.toString().endsWith(".dxf")).sorted().findFirst().orElseThrow();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void fullDiskWhileWritingHtmlOrJson_failsNamingTheFileAndKeepsTheOldOne() throws IOException {
        for (String option : List.of("--html", "--json")) {
            Path target = disk.resolve(option.substring(2) + "-report");
            Files.writeString(target, "previous report");
            // fill the disk, leaving less than the report needs
            Path filler = disk.resolve("filler");
            try {
                Files.write(filler, new byte[28 * 1024]);
            } catch (IOException e) {
                // full already: what we want
            }
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            AppContext ctx = new AppContext(new PrintWriter(out), new PrintWriter(err), new EnginePipeline(),
                    new EngineSectionCatalog(), new EngineFieldIntegrator(), false);
            int code = assertTimeoutPreemptively(Duration.ofSeconds(60),
                    () -> Cli.run(ctx, "check", "--fail-at", "never", option, target.toString(), drawing().toString()),
                    "a full file system must not hang the run");
            assertEquals(2, code, err.toString());
            assertEquals("linemass: " + target + ": cannot write the file: no space left on device; the previous "
                    + "file, if any, is kept", err.toString().strip());
            assertEquals("previous report", Files.readString(target));
            try (Stream<Path> s = Files.list(disk)) {
                assertEquals(0, s.filter(p -> p.toString().endsWith(".part")).count(), "temporary removed");
            }
            assertEquals("", out.toString(), "a failed run prints no summary");
            Files.deleteIfExists(filler);
        }
    }
}
