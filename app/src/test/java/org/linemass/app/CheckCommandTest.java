package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.linemass.app.AppFixtures.FakePipeline;
import org.linemass.app.AppFixtures.Run;
import org.linemass.drawing.LengthUnit;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.reports.json.JsonReportWriter;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckCommandTest {

    /** Settings carry lengths converted from text: a few ulps of rounding. */
    private static final double REL = 1e-15;

    @TempDir
    Path dir;
    FakePipeline pipeline;

    @BeforeEach
    void setUp() {
        pipeline = new FakePipeline();
    }

    private Path file(String name) throws IOException {
        Path p = dir.resolve(name);
        Files.createDirectories(p.getParent());
        return Files.writeString(p, "0\nEOF\n");
    }

    private Run check(String... args) {
        String[] all = new String[args.length + 1];
        all[0] = "check";
        System.arraycopy(args, 0, all, 1, args.length);
        return AppFixtures.run(pipeline, all);
    }

    @Test
    void check_cleanDrawing_exit0WithSummary() throws IOException {
        Run r = check(file("ok.dxf").toString());
        assertEquals(0, r.code(), r.err());
        assertEquals("", r.err());
        assertTrue(r.out().contains("0.617 kg"), r.out());
        assertTrue(r.out().contains("Bill of materials"));
    }

    @Test
    void check_errorFinding_exit1_unlessThresholdNever() throws IOException {
        Path gap = file("gap.dxf");
        assertEquals(1, check(gap.toString()).code());
        assertEquals(0, check("--fail-at", "never", gap.toString()).code());
        Path warn = file("warn.dxf");
        assertEquals(0, check(warn.toString()).code());
        assertEquals(1, check("--fail-at", "warning", warn.toString()).code());
        assertEquals(1, check("--fail-at=INFO", warn.toString()).code());
    }

    @Test
    void check_badDrawing_exit2WithOneLineNamingFileLineEntity() throws IOException {
        Path bad = file("bad.dxf");
        Run r = check(bad.toString());
        assertEquals(2, r.code());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains(bad + ":17: LINE (handle 2F): group 10 value 'abc' is not a number"), r.err());
        assertFalse(r.err().contains("\tat "), "no stack trace without --debug");
        Run debug = check("--debug", bad.toString());
        assertTrue(debug.err().contains("\tat "), "stack trace with --debug");
    }

    @Test
    void check_usageErrors_exit2OneLine() throws IOException {
        Path ok = file("ok.dxf");
        Run unknown = check("--no-such-option", ok.toString());
        assertEquals(2, unknown.code());
        assertEquals(1, unknown.err().strip().lines().count(), unknown.err());
        Run join = check("--join", "5", ok.toString());
        assertEquals(2, join.code());
        assertTrue(join.err().contains("'5' has no unit"), join.err());
        Run fail = check("--fail-at", "sometimes", ok.toString());
        assertEquals(2, fail.code());
        assertEquals(2, check().code(), "no drawing given");
        Run missing = check(dir.resolve("nope.dxf").toString());
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("no such file or folder"));
        assertEquals(2, AppFixtures.run(pipeline).code(), "no command");
    }

    @Test
    void check_gapLimitBelowJoin_exit2() throws IOException {
        Run r = check("--join", "2mm", "--gap-limit", "1mm", file("ok.dxf").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--gap-limit"), r.err());
    }

    @Test
    void check_internalError_exit3AsksForReport() throws IOException {
        Run r = check(file("crash.dxf").toString());
        assertEquals(3, r.code());
        assertTrue(r.err().contains("internal error"), r.err());
        assertFalse(r.err().contains("\tat "));
    }

    @Test
    void check_argumentErrorFromInside_isABugNotBadInput() throws IOException {
        // every bad value a user gives is turned into an input problem before it reaches the engine,
        // so an IllegalArgumentException arriving at the command line is a bug: exit 3, not 2
        Run r = check(file("argbug.dxf").toString());
        assertEquals(3, r.code(), r.err());
        assertTrue(r.err().contains("internal error (IllegalArgumentException: radius must be positive"), r.err());
        assertTrue(r.err().contains("please report"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }

    @Test
    void check_internalException_exit3WithItsMessage() throws IOException {
        Run r = check(file("invariant.dxf").toString());
        assertEquals(3, r.code(), r.err());
        assertTrue(r.err().startsWith("linemass: internal error (layer W lost more length than was drawn); please "
                + "report"), r.err());
    }

    @Test
    void check_emptyLayerPattern_exit2NamingTheOption() throws IOException {
        String[][] cases = {{"--only-layer", ""}, {"--skip-layer", ""}, {"--assign", " =B8"}, {"--density", " =1"}};
        for (String[] c : cases) {
            Run r = check(c[0], c[1], file("ok.dxf").toString());
            assertEquals(2, r.code(), c[0] + ": " + r.err());
            assertTrue(r.err().contains(c[0] + ": empty layer pattern"), r.err());
        }
    }

    @Test
    void check_outOfHeapOrStack_oneLineExit2() throws IOException {
        for (String name : new String[] {"huge.dxf", "deep.dxf"}) {
            Run r = check(file(name).toString());
            assertEquals(2, r.code(), r.err());
            assertEquals(1, r.err().strip().lines().count(), r.err());
            assertTrue(r.err().startsWith("linemass: "), r.err());
            assertTrue(r.err().contains("LINEMASS_JAVA_OPTS"), r.err());
            assertFalse(r.err().contains("\tat "));
        }
    }

    @Test
    void outOfResources_namesTheFile() {
        String heap = OutOfResources.of(Path.of("bay-7.dxf"), new OutOfMemoryError()).getMessage();
        assertTrue(heap.startsWith("bay-7.dxf: out of memory (Java heap limit "), heap);
        String stack = OutOfResources.of(Path.of("bay-7.dxf"), new StackOverflowError()).getMessage();
        assertTrue(stack.startsWith("bay-7.dxf: the drawing is nested too deeply"), stack);
    }

    @Test
    void check_folder_findsDxfRecursivelyAnyCase_andCombines() throws IOException {
        file("set/a.dxf");
        file("set/deeper/B.DXF");
        Files.writeString(dir.resolve("set/readme.txt"), "not a drawing");
        Run r = check(dir.resolve("set").toString());
        assertEquals(0, r.code(), r.err());
        assertEquals(2, pipeline.seen.size());
        assertTrue(r.out().contains("All 2 drawings together"), r.out());
        // two 1 m bars of 0.617 kg/m (FACTS.md section 1.1)
        assertTrue(r.out().contains("1.234 kg"), r.out());
        Run quiet = check("-q", dir.resolve("set").toString());
        assertEquals(3, quiet.out().strip().lines().count(), quiet.out());
    }

    @Test
    void check_folderWithOneBadDrawing_reportsListItAsFailedExit2() throws IOException {
        file("mix/a.dxf");
        file("mix/bad.dxf");
        file("mix/c.dxf");
        Path summary = dir.resolve("summary.csv");
        Run r = check(dir.resolve("mix").toString(), "--summary-csv", summary.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("bad.dxf:17"), r.err());
        assertTrue(r.err().strip().endsWith("linemass: 1 of the 3 drawings could not be read; the reports list them "
                + "as failed"), r.err());
        assertTrue(r.out().contains("All 2 drawings together"), r.out());
        String csv = Files.readString(summary);
        assertTrue(csv.contains("bad.dxf,failed,") && csv.contains("group 10 value 'abc' is not a number"), csv);
    }

    @Test
    void check_folderWithOneBadDrawing_allOrNone_namesItExits2AndWritesNoReport() throws IOException {
        file("mix/a.dxf");
        file("mix/bad.dxf");
        file("mix/c.dxf");
        Path json = dir.resolve("r.json");
        Run r = check(dir.resolve("mix").toString(), "--all-or-none", "--json", json.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("bad.dxf:17"), r.err());
        assertTrue(r.err().strip().endsWith("linemass: no report written: 1 of the 3 drawings could not be read "
                + "(see above); correct them or leave them out"), r.err());
        assertEquals(3, pipeline.seen.size(), "the others are still read, so every bad drawing is named");
        assertEquals("", r.out(), "a run that fails prints no summary either");
        assertFalse(Files.exists(json));
    }

    @Test
    void check_emptyFolder_exit2() throws IOException {
        Files.createDirectories(dir.resolve("empty"));
        Run r = check(dir.resolve("empty").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("no .dxf files"), r.err());
    }

    @Test
    void check_outputOverInput_refusedAndInputUntouched() throws IOException {
        Path in = file("ok.dxf");
        Run r = check("--json", dir.resolve("sub/../ok.dxf").toString(), in.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("refusing to write"), r.err());
        assertEquals("0\nEOF\n", Files.readString(in));
        assertTrue(pipeline.seen.isEmpty(), "refused before any analysis");
    }

    @Test
    void check_outputProblems_exit2WithReadableLine() throws IOException {
        Path ok = file("ok.dxf");
        Run same = check("--json", dir.resolve("r.out").toString(), "--html", dir.resolve("r.out").toString(),
                ok.toString());
        assertEquals(2, same.code());
        assertTrue(same.err().contains("same file"), same.err());
        Files.createDirectories(dir.resolve("folder.json"));
        Run folder = check("--json", dir.resolve("folder.json").toString(), ok.toString());
        assertEquals(2, folder.code());
        assertTrue(folder.err().contains("is a folder"), folder.err());
    }

    @Test
    void describe_fileSystemErrors_sayWhatHappened() {
        assertEquals("/x/y: permission denied", Cli.describe(new java.nio.file.AccessDeniedException("/x/y")));
        assertEquals("/x/y: no such file or folder", Cli.describe(new java.nio.file.NoSuchFileException("/x/y")));
        assertEquals("/x/y: directory not empty", Cli.describe(new java.nio.file.DirectoryNotEmptyException("/x/y")));
    }

    @Test
    void check_jsonToStdout_isOnlyValidJson() throws Exception {
        Run r = check("--json", "-", file("ok.dxf").toString(), file("gap.dxf").toString());
        assertEquals(1, r.code());
        JsonNode root = new ObjectMapper().readTree(r.out());
        try (InputStream s = JsonReportWriter.class.getResourceAsStream(JsonReportWriter.SCHEMA_RESOURCE)) {
            var errors = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012).getSchema(s).validate(root);
            assertTrue(errors.isEmpty(), errors.toString());
        }
        assertEquals(2, root.get("drawings").size());
        assertEquals(2.0, root.get("totals").get("length_m").asDouble(), 2.0 * REL);
        Run two = check("--json", "-", "--bom-csv", "-", file("ok.dxf").toString());
        assertEquals(2, two.code());
    }

    @Test
    void check_writesEveryReportFile() throws IOException {
        Path in = dir.resolve("ok.dxf");
        Files.writeString(in, String.join("\n", "0", "SECTION", "2", "ENTITIES", "0", "LINE", "8", "BAR", "10", "0",
                "20", "0", "30", "0", "11", "1000", "21", "0", "31", "0", "0", "ENDSEC", "0", "EOF", ""));
        Path out = dir.resolve("out");
        Run r = check("--json", out.resolve("r.json").toString(), "--bom-csv", out.resolve("bom.csv").toString(),
                "--pieces-csv", out.resolve("pieces.csv").toString(), "--findings-csv",
                out.resolve("findings.csv").toString(), "--html", out.resolve("r.html").toString(), "--markup-dxf",
                out.resolve("marked.dxf").toString(), "--imperial", in.toString());
        assertEquals(0, r.code(), r.err());
        // CSV files start with the UTF-8 byte order mark so spreadsheets read non-ASCII names
        assertTrue(Files.readString(out.resolve("bom.csv")).startsWith("\uFEFFmark,quantity,section,material,cut length each [in]"));
        assertTrue(Files.readString(out.resolve("pieces.csv")).startsWith("\uFEFFpiece,"));
        assertTrue(Files.readString(out.resolve("findings.csv")).startsWith("\uFEFFnumber,"));
        assertTrue(Files.readString(out.resolve("r.json")).startsWith("{"), "no mark before JSON");
        assertTrue(Files.readString(out.resolve("r.html")).contains("<svg class=\"view\""));
        assertTrue(Files.readString(out.resolve("r.json")).contains("\"length_m\""));
        String marked = Files.readString(out.resolve("marked.dxf"));
        assertTrue(marked.startsWith(Files.readString(in).substring(0, Files.readString(in).indexOf("ENDSEC") - 2)));
        assertTrue(marked.contains("LINEMASS_FINDINGS"));
        assertTrue(r.out().contains(" lb"), "imperial console output");
    }

    @Test
    void check_markupForSeveralDrawings_goesToFolderWithoutNameClashes() throws IOException {
        String dxf = String.join("\n", "0", "SECTION", "2", "ENTITIES", "0", "ENDSEC", "0", "EOF", "");
        Files.createDirectories(dir.resolve("a"));
        Files.createDirectories(dir.resolve("b"));
        Files.writeString(dir.resolve("a/gap.dxf"), dxf);
        Files.writeString(dir.resolve("b/gap.dxf"), dxf);
        Path out = dir.resolve("marked");
        Run r = check("--markup-dxf", out.toString(), dir.resolve("a").toString(), dir.resolve("b").toString());
        assertEquals(1, r.code(), r.err());
        assertTrue(Files.readString(out.resolve("gap-findings.dxf")).contains("LINEMASS_FINDINGS"));
        assertTrue(Files.exists(out.resolve("gap-findings-2.dxf")));
    }

    @Test
    void check_optionsReachTheSettings() throws IOException {
        Run r = check("--join", "0.02mm", "--gap-limit", "0.1in", "-a", "FR*=B8", "--assign", "A=B=C", "--only-layer",
                "F*", "--skip-layer", "TEXT*", "--count-hidden-layers", "--mirror-alike", "--units", "in",
                "--paper-space", file("ok.dxf").toString());
        assertEquals(0, r.code(), r.err());
        AnalysisSettings s = pipeline.seen.get(0);
        assertEquals(2e-5, s.joinM().orElseThrow(), 2e-5 * REL);
        // 0.1 in = 2.54 mm exactly (FACTS.md section 0.1)
        assertEquals(0.00254, s.gapLimitM().orElseThrow(), 0.00254 * REL);
        assertEquals(List.of("FR*", "A=B"), s.assignments().stream().map(LayerAssignment::layerGlob).toList());
        assertEquals(List.of("B8", "C"), s.assignments().stream().map(LayerAssignment::sectionId).toList());
        assertEquals(List.of("F*"), s.includeLayers());
        // the layer a marked-up copy adds is always left out as well
        assertEquals(List.of("TEXT*", "LINEMASS_FINDINGS*"), s.excludeLayers());
        assertTrue(s.includeHiddenLayers());
        assertTrue(s.mirrorGrouping());
        assertEquals(Optional.of(LengthUnit.INCH), pipeline.imports.get(0).unitOverride());
        assertTrue(pipeline.imports.get(0).paperSpace());
    }

    @Test
    void check_defaults_leaveTolerancesToTheEngine() throws IOException {
        assertEquals(0, check(file("ok.dxf").toString()).code());
        AnalysisSettings s = pipeline.seen.get(0);
        assertTrue(s.joinM().isEmpty());
        assertTrue(s.gapLimitM().isEmpty());
        assertFalse(s.includeHiddenLayers());
        assertTrue(pipeline.imports.get(0).unitOverride().isEmpty());
        assertFalse(pipeline.imports.get(0).paperSpace());
    }

    @Test
    void check_badAssignment_exit2() throws IOException {
        Run r = check("--assign", "NOSECTION", file("ok.dxf").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("expected LAYER=SECTION"), r.err());
    }

    @Test
    void check_sectionFilesNeedTheEngineReaders() throws IOException {
        Path csv = Files.writeString(dir.resolve("t.csv"), "id\n");
        Run r = check("--section-table", csv.toString(), file("ok.dxf").toString());
        assertEquals(2, r.code());
        assertEquals(1, r.err().strip().lines().count());
    }
}
