package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.linemass.app.AppFixtures.FakePipeline;
import org.linemass.app.AppFixtures.Run;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Output paths built to trick the overwrite guard: a linked folder followed by {@code ..}, reports
 * onto the user's own tables, and outputs that are links. Nothing the run reads may change.
 */
class HostilePathsTest {

    private static final String DRAWING = "0\nSECTION\n2\nENTITIES\n0\nENDSEC\n0\nEOF\n";

    @TempDir
    Path dir;
    Path in;
    FakePipeline pipeline;

    @BeforeEach
    void setUp() throws IOException {
        pipeline = new FakePipeline();
        Files.createDirectories(dir.resolve("job"));
        Files.createDirectories(dir.resolve("elsewhere/deep"));
        in = Files.writeString(dir.resolve("job/in.dxf"), DRAWING);
        // in the drawing's folder: alias -> elsewhere/deep
        Files.createSymbolicLink(dir.resolve("job/alias"), dir.resolve("elsewhere/deep"));
    }

    private Run check(String... args) {
        String[] all = new String[args.length + 1];
        all[0] = "check";
        System.arraycopy(args, 0, all, 1, args.length);
        return AppFixtures.run(pipeline, all);
    }

    @Test
    void linkedFolderThenDotDot_writesWhereTheFileSystemSaysAndNeverOnTheInput() throws IOException {
        for (String option : new String[] {"--json", "--bom-csv", "--pieces-csv", "--findings-csv", "--html",
                "--markup-dxf"}) {
            String target = dir.resolve("job/alias/../in.dxf").toString();
            Run r = check(option, target, in.toString());
            assertEquals(DRAWING, Files.readString(in), option + " must not touch the input");
            // for the operating system job/alias/.. is elsewhere, so the report goes to elsewhere/in.dxf
            assertEquals(0, r.code(), option + ": " + r.err());
            assertTrue(Files.isRegularFile(dir.resolve("elsewhere/in.dxf")), option);
            Files.delete(dir.resolve("elsewhere/in.dxf"));
        }
    }

    @Test
    void linkedFolderLeadingBackToTheInput_refusedForEveryReport() throws IOException {
        Files.createDirectories(dir.resolve("job/sub"));
        Files.createSymbolicLink(dir.resolve("elsewhere/back"), dir.resolve("job/sub"));
        for (String option : new String[] {"--json", "--bom-csv", "--pieces-csv", "--findings-csv", "--html",
                "--markup-dxf"}) {
            Run r = check(option, dir.resolve("elsewhere/back/../in.dxf").toString(), in.toString());
            assertEquals(2, r.code(), option);
            assertTrue(r.err().contains("refusing to write") && r.err().contains("input drawing"), r.err());
            assertEquals(DRAWING, Files.readString(in), option);
        }
        assertTrue(pipeline.seen.isEmpty(), "refused before any analysis");
    }

    @Test
    void reportsOntoTheSectionTableOrAssignmentFile_refused() throws IOException {
        Path table = Files.writeString(dir.resolve("job/sections.csv"), "id,mass_kg_per_m\nB8,0.395\n");
        Path rules = Files.writeString(dir.resolve("job/rules.csv"), "layer,section\nFRAME,B8\n");
        Run r = check("--section-table", table.toString(), "--bom-csv", table.toString(), in.toString());
        assertEquals(2, r.code());
        assertEquals("linemass: refusing to write " + table + ": it is the section table " + table
                + " read by this run", r.err().strip());
        r = check("--assign-file", rules.toString(), "--findings-csv", dir.resolve("job/alias/../../job/rules.csv")
                .toString(), in.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("it is the assignment file"), r.err());
        assertEquals("id,mass_kg_per_m\nB8,0.395\n", Files.readString(table));
        assertEquals("layer,section\nFRAME,B8\n", Files.readString(rules));
    }

    @Test
    void outputThatIsALink_refusedAndTheLinkedFileKept() throws IOException {
        Path precious = Files.writeString(dir.resolve("elsewhere/notes.txt"), "mine");
        Path link = Files.createSymbolicLink(dir.resolve("job/out.json"), precious);
        Run r = check("--json", link.toString(), in.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains(link + " is a symbolic link"), r.err());
        assertEquals("mine", Files.readString(precious));
        assertTrue(Files.isSymbolicLink(link));
    }

    @Test
    void sameFileThroughTwoSpellings_refusedAsTwoReportsOnOneFile() {
        Run r = check("--json", dir.resolve("job/r.out").toString(), "--html",
                dir.resolve("job/alias/../../job/r.out").toString(), in.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("same file"), r.err());
    }

    @Test
    void noTemporaryLeftBehind() throws IOException {
        Path out = dir.resolve("job/r.json");
        assertEquals(0, check("--json", out.toString(), in.toString()).code());
        try (Stream<Path> s = Files.list(dir.resolve("job"))) {
            assertEquals(0, s.filter(p -> p.toString().endsWith(".part")).count());
        }
    }

    @Test
    void runThatFailsWritingOneReport_writesNoneAndKeepsTheOldOnes() throws IOException {
        // the marked-up copy is refused (binary DXF); the JSON and HTML before it must not appear
        Path binary = Files.write(dir.resolve("job/bin.dxf"), "AutoCAD Binary DXF\r\n\u001a\u0000".getBytes(
                java.nio.charset.StandardCharsets.ISO_8859_1));
        Path json = Files.writeString(dir.resolve("job/r.json"), "old json");
        Path html = dir.resolve("job/r.html");
        Run r = check("--json", json.toString(), "--html", html.toString(), "--markup-dxf",
                dir.resolve("job/m.dxf").toString(), binary.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("can only be written for ASCII DXF"), r.err());
        assertEquals("old json", Files.readString(json));
        assertTrue(Files.notExists(html));
        assertTrue(Files.notExists(dir.resolve("job/m.dxf")));
        assertEquals("", r.out());
        try (Stream<Path> s = Files.list(dir.resolve("job"))) {
            assertEquals(0, s.filter(p -> p.toString().endsWith(".part")).count());
        }
    }

    @Test
    void temporaryOfAKilledRun_removedAtStartUpEvenWhenThisRunFails() throws IOException {
        Path stale = Files.writeString(dir.resolve("job/.r.json.linemass-" + endedProcess() + "-77.part"), "half");
        Run r = check("--json", dir.resolve("job/r.json").toString(), dir.resolve("job/missing.dxf").toString());
        assertEquals(2, r.code());
        // the input is missing, so nothing is written; the killed run's temporary is gone all the same
        assertTrue(Files.notExists(stale), "stale temporary removed at start-up");
    }

    private static long endedProcess() throws IOException {
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-version")
                .redirectErrorStream(true).start();
        p.getInputStream().readAllBytes();
        try {
            p.waitFor();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        return p.pid();
    }
}
