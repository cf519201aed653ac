package org.linemass.reports.io;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
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
        IOException e = assertThrows(IOException.class, () -> OutputGuard.check(input, drawings(input)));
        assertTrue(e.getMessage().contains("refusing to write"), e.getMessage());
    }

    @Test
    void check_throughDotDot_refused() {
        Path tricky = dir.resolve("drawings/sub/../frame.dxf");
        assertThrows(IOException.class, () -> OutputGuard.check(tricky, drawings(input)));
    }

    @Test
    void check_throughSymlinkedFile_refused() throws IOException {
        Path link = Files.createSymbolicLink(dir.resolve("link.dxf"), input);
        assertThrows(IOException.class, () -> OutputGuard.check(link, drawings(input)));
        assertThrows(IOException.class, () -> OutputGuard.check(input, drawings(link)));
    }

    @Test
    void check_throughSymlinkedFolder_refused() throws IOException {
        Path linkDir = Files.createSymbolicLink(dir.resolve("alias"), dir.resolve("drawings"));
        assertThrows(IOException.class, () -> OutputGuard.check(linkDir.resolve("frame.dxf"), drawings(input)));
    }

    @Test
    void check_hardLink_refused() throws IOException {
        Path hard = Files.createLink(dir.resolve("hard.dxf"), input);
        assertThrows(IOException.class, () -> OutputGuard.check(hard, drawings(input)));
    }

    @Test
    void check_otherOrNewFile_allowed() {
        assertDoesNotThrow(() -> OutputGuard.check(dir.resolve("drawings/frame-findings.dxf"), drawings(input)));
        assertDoesNotThrow(() -> OutputGuard.check(dir.resolve("new/deeper/x.html"), drawings(input)));
    }

    @Test
    void check_symlinkedFolderThenDotDot_resolvedLikeTheFileSystem() throws IOException {
        // drawings/alias -> elsewhere/deep; drawings/alias/../frame.dxf is elsewhere/frame.dxf for the
        // operating system, not drawings/frame.dxf as a textual normalisation would say
        Path deep = Files.createDirectories(dir.resolve("elsewhere/deep"));
        Files.createSymbolicLink(dir.resolve("drawings/alias"), deep);
        Path given = dir.resolve("drawings/alias/../frame.dxf");
        OutputPath p = OutputGuard.check(given, drawings(input));
        assertEquals(dir.resolve("elsewhere").toRealPath().resolve("frame.dxf"), p.resolved());
        AtomicWrite.write(p, out -> out.write('x'));
        assertEquals("0\nEOF\n", Files.readString(input), "the input drawing is untouched");
        assertEquals("x", Files.readString(dir.resolve("elsewhere/frame.dxf")));
        // and the other way round: the link leads back onto the input, which is refused
        Files.createSymbolicLink(dir.resolve("elsewhere/back"), dir.resolve("drawings/sub"));
        IOException e = assertThrows(IOException.class,
                () -> OutputGuard.check(dir.resolve("elsewhere/back/../frame.dxf"), drawings(input)));
        assertTrue(e.getMessage().contains("input drawing"), e.getMessage());
    }

    @Test
    void check_everyRegisteredFileIsProtected() throws IOException {
        Path table = Files.writeString(dir.resolve("sections.csv"), "id,mass_kg_per_m\n");
        Path rules = Files.writeString(dir.resolve("rules.csv"), "layer,section\n");
        ProtectedFiles files = drawings(input).add(table, "section table").add(rules, "assignment file");
        IOException e = assertThrows(IOException.class, () -> OutputGuard.check(table, files));
        assertEquals("refusing to write " + table + ": it is the section table " + table + " read by this run",
                e.getMessage());
        e = assertThrows(IOException.class, () -> OutputGuard.check(dir.resolve("sub/../rules.csv"), files));
        assertTrue(e.getMessage().contains("assignment file"), e.getMessage());
    }

    @Test
    void outputThatIsASymlink_refusedWithItsTarget() throws IOException {
        Path other = Files.writeString(dir.resolve("precious.txt"), "keep");
        Path link = Files.createSymbolicLink(dir.resolve("report.json"), other);
        IOException e = assertThrows(IOException.class, () -> AtomicWrite.write(link, out -> out.write('x')));
        assertEquals(link + " is a symbolic link (to " + other + "); linemass does not write through links: "
                + "give the file it points to, or remove the link", e.getMessage());
        assertEquals("keep", Files.readString(other));
        assertTrue(Files.isSymbolicLink(link), "the link itself is left as it was");
    }

    @Test
    void outputThatIsAFolder_refused() throws IOException {
        IOException e = assertThrows(IOException.class, () -> OutputPath.of(dir.resolve("drawings")));
        assertTrue(e.getMessage().endsWith("is a folder; give a file name"), e.getMessage());
        assertThrows(IOException.class, () -> OutputPath.of(dir.resolve("drawings/..")));
    }

    @Test
    void missingFoldersAndDotDot_resolvedTextuallyBelowTheLastExistingFolder() throws IOException {
        OutputPath p = OutputPath.of(dir.resolve("new/a/../b/x.html"));
        assertEquals(dir.toRealPath().resolve("new/b/x.html"), p.resolved());
    }

    private static ProtectedFiles drawings(Path... p) {
        return new ProtectedFiles().addAll(java.util.List.of(p), "input drawing");
    }
}
