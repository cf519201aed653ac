package org.linemass.reports.io;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OutputGuardTest {

    @TempDir
    Path dir;
    Path input;

    @BeforeEach
    void drawing() throws IOException {
        Files.createDirectories(dir.resolve("drawings/sub"));
        input = Files.writeString(dir.resolve("drawings/frame.dxf"), "0\nEOF\n");
    }

    @Test
    void check_samePath_refused() {
        IOException e = assertThrows(IOException.class, () -> OutputGuard.check(input, List.of(input)));
        assertTrue(e.getMessage().contains("refusing to write"), e.getMessage());
    }

    @Test
    void check_throughDotDot_refused() {
        Path tricky = dir.resolve("drawings/sub/../frame.dxf");
        assertThrows(IOException.class, () -> OutputGuard.check(tricky, List.of(input)));
    }

    @Test
    void check_throughSymlinkedFile_refused() throws IOException {
        Path link = Files.createSymbolicLink(dir.resolve("link.dxf"), input);
        assertThrows(IOException.class, () -> OutputGuard.check(link, List.of(input)));
        assertThrows(IOException.class, () -> OutputGuard.check(input, List.of(link)));
    }

    @Test
    void check_throughSymlinkedFolder_refused() throws IOException {
        Path linkDir = Files.createSymbolicLink(dir.resolve("alias"), dir.resolve("drawings"));
        assertThrows(IOException.class, () -> OutputGuard.check(linkDir.resolve("frame.dxf"), List.of(input)));
    }

    @Test
    void check_hardLink_refused() throws IOException {
        Path hard = Files.createLink(dir.resolve("hard.dxf"), input);
        assertThrows(IOException.class, () -> OutputGuard.check(hard, List.of(input)));
    }

    @Test
    void check_otherOrNewFile_allowed() {
        assertDoesNotThrow(() -> OutputGuard.check(dir.resolve("drawings/frame-findings.dxf"), List.of(input)));
        assertDoesNotThrow(() -> OutputGuard.check(dir.resolve("new/deeper/x.html"), List.of(input)));
    }
}
