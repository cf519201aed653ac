package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.Insert;

/**
 * Hostile and broken inputs: each either fails the whole file with the exact one-line message, or
 * skips the bad entity with an error note carrying the exact message, and always finishes quickly.
 */
class HostileInputTest {

    /** Generous bound for inputs that must be handled in bounded time (they take milliseconds). */
    // a hang guard, not a speed goal (speed is measured by benchmarks): generous enough for a
    // shared 2-core machine running several builds at once
    private static final Duration QUICK = Duration.ofSeconds(120);

    private static String fails(byte[] content) {
        return fails(content, ImportOptions.DEFAULTS);
    }

    private static String fails(byte[] content, ImportOptions o) {
        return assertThrows(DxfInputException.class, () -> DxfImporter.read(Dxf.NAME, content, o)).getMessage();
    }

    private static String fails(Dxf dxf) {
        return fails(dxf.ascii());
    }

    private static byte[] raw(String s) {
        return s.getBytes(StandardCharsets.ISO_8859_1);
    }

    /** The single error note of a drawing with one bad entity. */
    private static ImportNote skipped(Dxf dxf) throws DxfInputException {
        return skipped(dxf, ImportOptions.DEFAULTS);
    }

    private static ImportNote skipped(Dxf dxf, ImportOptions o) throws DxfInputException {
        Drawing d = DxfImporter.read(Dxf.NAME, dxf.ascii(), o);
        List<ImportNote> errors = d.notes().stream().filter(n -> n.severity().equals("error")).toList();
        assertEquals(1, errors.size(), () -> "notes: " + d.notes());
        assertEquals("skipped_entity", errors.get(0).kind());
        assertTrue(d.incomplete());
        return errors.get(0);
    }

    private static Dxf oneEntity(Object... pairs) {
        return Dxf.create().entities().add(pairs).add(0, "LINE", 8, "OK", 11, 1).end();
    }

    @Test
    void emptyFile() {
        assertEquals("t.dxf: empty file: no DXF group codes", fails(new byte[0]));
    }

    @Test
    void pngFile() {
        byte[] png = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n', 0, 0, 0, 13, 'I', 'H', 'D', 'R'};
        assertEquals("t.dxf: this is an image (PNG), not a DXF drawing; linemass reads DXF drawings (lines, arcs,"
                + " polylines, splines), not pictures", fails(png));
    }

    @Test
    void zipFile() {
        byte[] zip = {'P', 'K', 3, 4, 20, 0, 0, 0, 8, 0, '\n', 1, 2};
        assertEquals("t.dxf: this is a ZIP archive, not a DXF drawing; unpack it and read the DXF file inside",
                fails(zip));
    }

    @Test
    void randomBytes_onlyInputErrorsOrDrawings() {
        java.util.Random rnd = new java.util.Random(20261201L);
        for (int i = 0; i < 300; i++) {
            byte[] b = new byte[rnd.nextInt(400)];
            rnd.nextBytes(b);
            try {
                DxfImporter.read(Dxf.NAME, b, ImportOptions.DEFAULTS);
            } catch (DxfInputException e) {
                assertTrue(e.getMessage().startsWith("t.dxf"), e.getMessage());
                assertTrue(!e.getMessage().contains("\n"), "one line");
            }
        }
    }

    @Test
    void notStartingWithSection() {
        assertEquals("t.dxf:1: LINE: not a DXF file: expected '0 SECTION' at the start, got '0 LINE'",
                fails(raw("0\nLINE\n8\n0\n")));
        assertEquals("t.dxf:1: not a DXF file: expected group code 0 at the start, got 10", fails(raw("10\n5\n")));
    }

    @Test
    void oddLineCount() {
        assertEquals("t.dxf:5: SECTION: group code 0 has no value line (odd number of lines: file truncated?)",
                fails(raw("0\nSECTION\n2\nENTITIES\n0")));
    }

    @Test
    void truncatedMidEntity() throws Exception {
        // the cut-off LINE is not read (an error: totals incomplete); the missing ENDSEC is a warning
        Drawing d = DxfImporter.read(Dxf.NAME, raw("0\nSECTION\n2\nENTITIES\n0\nLINE\n5\n1F\n8\n0\n10\n1\n"),
                ImportOptions.DEFAULTS);
        assertEquals(List.of("the file ends inside this record, which may be cut off; not read"), d.notes().stream()
                .filter(n -> n.severity().equals("error")).map(n -> n.message()).toList());
        assertEquals(List.of("file structure repaired at line 5: the file ends inside the ENTITIES section (no"
                + " '0 ENDSEC', no '0 EOF'); the section was read up to there"), d.notes().stream()
                .filter(n -> n.kind().equals("structure_repaired")).map(n -> n.message()).toList());
        assertEquals(0, d.modelSpace().segments().size());
    }

    @Test
    void truncatedPolyline() {
        assertEquals("t.dxf:5: POLYLINE (handle 9): file ends before the SEQEND that closes this POLYLINE",
                fails(raw("0\nSECTION\n2\nENTITIES\n0\nPOLYLINE\n5\n9\n0\nVERTEX\n10\n1\n")));
    }

    @Test
    void groupCodeNotANumber() {
        assertEquals("t.dxf:9: LINE (handle 2B): expected a group code (an integer), got 'X1'",
                fails(raw("0\nSECTION\n2\nENTITIES\n0\nLINE\n5\n2B\nX1\n0\n0\nENDSEC\n0\nEOF\n")));
    }

    @Test
    void valueNotANumber() throws Exception {
        ImportNote n = skipped(oneEntity(0, "LINE", 5, "2C", 8, "W", 10, "abc", 20, 0, 11, 1));
        assertEquals("value of group code 10 at line 12 is not a number: 'abc'", n.message());
        assertEquals(5, n.line());
        assertEquals("LINE", n.entityType());
        assertEquals("2C", n.handle());
        assertEquals("W", n.layer());
        assertEquals(Dxf.NAME, n.file());
    }

    @Test
    void nonFiniteAndHugeCoordinates() throws Exception {
        assertEquals("coordinate (group code 10) is not finite: NaN",
                skipped(oneEntity(0, "LINE", 10, "NaN", 11, 1)).message());
        assertEquals("coordinate (group code 20) is not finite: Infinity",
                skipped(oneEntity(0, "LINE", 20, "Infinity", 11, 1)).message());
        assertEquals("coordinate (group code 11) is out of range: 1.0E308 (limit 1.0E99)",
                skipped(oneEntity(0, "LINE", 11, "1e308")).message());
        assertEquals("coordinate (group code 21) is not finite: Infinity",
                skipped(oneEntity(0, "LINE", 21, "1e309")).message());
        assertEquals("coordinate (group code 10) is not finite: -Infinity",
                skipped(oneEntity(0, "CIRCLE", 10, "-1e400", 40, 1)).message());
    }

    @Test
    void splineWithBillionDeclaredPoints() throws Exception {
        Dxf dxf = oneEntity(0, "SPLINE", 71, 1, 72, 5, 73, 1000000000, 40, 0, 40, 0, 40, 1, 40, 2, 40, 2,
                10, 0, 20, 0, 10, 1, 20, 0, 10, 2, 20, 0);
        assertEquals("declares 1000000000 control points, more than the limit 1000000", skipped(dxf).message());
        ImportOptions unlimited = new ImportOptions(Optional.empty(), 64, 1 << 20, Integer.MAX_VALUE, 10_000_000);
        assertEquals("declares 1000000000 control points but has 3", skipped(dxf, unlimited).message());
    }

    @Test
    void splineInconsistentCounts() throws Exception {
        assertEquals("has 4 knots; 3 control points of degree 1 need 5", skipped(oneEntity(0, "SPLINE", 71, 1,
                72, 4, 73, 3, 40, 0, 40, 0, 40, 1, 40, 1, 10, 0, 20, 0, 10, 1, 20, 0, 10, 2, 20, 0)).message());
        assertEquals("has 2 weights for 3 control points", skipped(oneEntity(0, "SPLINE", 71, 1, 72, 5, 73, 3,
                40, 0, 40, 0, 40, 1, 40, 2, 40, 2, 10, 0, 41, 1, 10, 1, 41, 1, 10, 2)).message());
    }

    @Test
    void negativeCounts() throws Exception {
        assertEquals("negative vertex count (group code 90): -5",
                skipped(oneEntity(0, "LWPOLYLINE", 90, -5, 10, 0, 20, 0)).message());
        assertEquals("negative knot count (group code 72): -1",
                skipped(oneEntity(0, "SPLINE", 71, 1, 72, -1, 73, 2)).message());
        assertEquals("negative column count (group code 70): -2",
                skipped(Dxf.create().add(0, "SECTION", 2, "BLOCKS", 0, "BLOCK", 2, "A", 0, "ENDBLK", 0, "ENDSEC")
                        .entities().add(0, "INSERT", 2, "A", 70, -2).end()).message());
    }

    @Test
    void lwpolylineCountMismatch() throws Exception {
        assertEquals("declares 10000000 vertices but has 2",
                skipped(oneEntity(0, "LWPOLYLINE", 90, 10000000, 10, 0, 20, 0, 10, 1, 20, 1)).message());
        assertEquals("declares 10000001 vertices, more than the limit 10000000",
                skipped(oneEntity(0, "LWPOLYLINE", 90, 10000001, 10, 0, 20, 0)).message());
    }

    @Test
    void decreasingKnots() throws Exception {
        assertEquals("knots decrease at index 3 (1.0 then 0.5)", skipped(oneEntity(0, "SPLINE", 71, 1, 72, 4,
                73, 2, 40, 0, 40, 0, 40, 1, 40, 0.5, 10, 0, 20, 0, 10, 1, 20, 0)).message());
    }

    @Test
    void knotsDecreasingWithinTheKnotTolerance_areTakenAsEqual() throws Exception {
        // FACTS.md §7.2: knot tolerance 42 defaults to 1e-10; a rounding-size decrease is not an error
        Drawing d = Dxf.create().entities().add(0, "SPLINE", 71, 1, 72, 4, 73, 2, 40, 0, 40, 0, 40, 1, 40, "0.9999999999999",
                10, 0, 20, 0, 10, 1, 20, 0).end().read();
        assertEquals(1, d.modelSpace().segments().size());
        assertTrue(d.notes().stream().noneMatch(ImportNote::skippedGeometry));
    }

    @Test
    void zeroRadiusArcAndCircle() throws Exception {
        assertEquals("ARC radius must be positive, got 0.0",
                skipped(oneEntity(0, "ARC", 10, 1, 20, 1, 40, 0, 50, 0, 51, 90)).message());
        assertEquals("CIRCLE radius must be positive, got -2.0",
                skipped(oneEntity(0, "CIRCLE", 10, 1, 20, 1, 40, -2)).message());
    }

    @Test
    void zeroExtrusion() throws Exception {
        assertEquals("extrusion direction (210/220/230) is zero or not finite: Vec3[x=0.0, y=0.0, z=0.0]",
                skipped(oneEntity(0, "CIRCLE", 40, 1, 210, 0, 220, 0, 230, 0)).message());
    }

    private static Dxf blocks(Object... blockPairs) {
        return Dxf.create().add(0, "SECTION", 2, "BLOCKS").add(blockPairs).add(0, "ENDSEC");
    }

    @Test
    void blockInsertingItself() throws Exception {
        Dxf dxf = blocks(0, "BLOCK", 2, "A", 0, "LINE", 11, 1, 0, "INSERT", 5, "7", 8, "L", 2, "A", 0, "ENDBLK")
                .entities().add(0, "INSERT", 2, "A").end();
        ImportNote n = skipped(dxf);
        assertEquals("block 'A' inserts itself", n.message());
        assertEquals("7", n.handle());
        assertEquals("INSERT", n.entityType());
    }

    @Test
    void cycleThroughThreeBlocks() throws Exception {
        Dxf dxf = blocks(0, "BLOCK", 2, "A", 0, "INSERT", 2, "B", 0, "ENDBLK",
                0, "BLOCK", 2, "B", 0, "INSERT", 2, "C", 0, "ENDBLK",
                0, "BLOCK", 2, "C", 0, "INSERT", 2, "A", 0, "LINE", 11, 1, 0, "ENDBLK")
                .entities().add(0, "INSERT", 2, "A").end();
        Drawing d = dxf.read();
        List<String> msgs = d.notes().stream().filter(ImportNote::skippedGeometry).map(ImportNote::message).sorted().collect(Collectors.toList());
        assertEquals(List.of("insert of block 'A' in block 'C' closes a cycle of block references",
                "insert of block 'B' in block 'A' closes a cycle of block references",
                "insert of block 'C' in block 'B' closes a cycle of block references"), msgs);
        assertEquals(1, d.modelSpace().inserts().size(), "model space still places A");
    }

    @Test
    void undefinedBlock() throws Exception {
        assertEquals("block 'NOPE' is not defined",
                skipped(Dxf.create().entities().add(0, "INSERT", 2, "NOPE").end()).message());
    }

    @Test
    void zeroScaleInsert() throws Exception {
        assertEquals("x scale (group code 41) is 0 but block 'A' extends along its x axis (0.0 to 1.0): the insert "
                + "would flatten it and change its lengths", skipped(blocks(0, "BLOCK", 2, "A", 0, "LINE", 11, 1,
                        0, "ENDBLK").entities().add(0, "INSERT", 2, "A", 41, 0).end()).message());
    }

    @Test
    void hugeArray_isKeptAsOneInsert() throws Exception {
        Drawing d = assertTimeoutPreemptively(QUICK, () -> blocks(0, "BLOCK", 2, "A", 0, "LINE", 11, 1, 0, "ENDBLK")
                .entities().add(0, "INSERT", 2, "A", 70, 100000, 71, 100000, 44, 1, 45, 1).end().read());
        Insert i = d.modelSpace().inserts().get(0);
        assertEquals(10_000_000_000L, i.copies());
    }

    @Test
    void blockBomb_isReadWithoutExpanding() {
        Dxf dxf = Dxf.create().add(0, "SECTION", 2, "BLOCKS");
        int levels = 10;
        for (int k = 0; k < levels; k++) {
            dxf.add(0, "BLOCK", 2, "L" + k);
            for (int c = 0; c < 16; c++) {
                dxf.add(0, "INSERT", 2, "L" + (k + 1), 10, c);
            }
            dxf.add(0, "ENDBLK");
        }
        dxf.add(0, "BLOCK", 2, "L" + levels, 0, "LINE", 11, 1, 0, "ENDBLK", 0, "ENDSEC");
        dxf.entities().add(0, "INSERT", 2, "L0").end();
        // 16^10 = 1.1e12 line copies: the importer keeps 11 definitions and 161 inserts
        Drawing d = assertTimeoutPreemptively(QUICK, () -> dxf.read());
        assertEquals(levels + 2, d.blocks().size());
        assertTrue(d.notes().stream().noneMatch(ImportNote::skippedGeometry), () -> d.notes().toString());
    }

    @Test
    void hundredThousandLevelsDeep_stopsAtTheDepthLimit() {
        int levels = 100_000;
        StringBuilder sb = new StringBuilder("0\nSECTION\n2\nBLOCKS\n");
        for (int k = 0; k < levels; k++) {
            sb.append("0\nBLOCK\n2\nB").append(k).append("\n0\nLINE\n11\n1\n");
            if (k + 1 < levels) {
                sb.append("0\nINSERT\n2\nB").append(k + 1).append('\n');
            }
            sb.append("0\nENDBLK\n");
        }
        sb.append("0\nENDSEC\n0\nSECTION\n2\nENTITIES\n0\nINSERT\n2\nB0\n0\nENDSEC\n0\nEOF\n");
        Drawing d = assertTimeoutPreemptively(QUICK,
                () -> DxfImporter.read(Dxf.NAME, raw(sb.toString()), ImportOptions.DEFAULTS));
        List<ImportNote> errors = d.notes().stream().filter(ImportNote::skippedGeometry).toList();
        assertEquals(1, errors.size(), () -> errors.subList(0, Math.min(3, errors.size())).toString());
        // model space is depth 0; B0 is placed at depth 1, so B63 at 64 and B64 would be at 65
        assertEquals("block 'B64' would be nested deeper than the limit of 64 levels", errors.get(0).message());
    }

    @Test
    void lineWithAMillionRepeatedGroups_usesItsFirstValues() throws Exception {
        StringBuilder sb = new StringBuilder("0\nSECTION\n2\nENTITIES\n0\nLINE\n10\n1\n11\n4\n21\n4\n");
        for (int i = 0; i < 1_000_000; i++) {
            sb.append("10\n9\n");
        }
        sb.append("0\nENDSEC\n0\nEOF\n");
        Drawing d = assertTimeoutPreemptively(QUICK, () -> DxfImporter.read(Dxf.NAME, raw(sb.toString()),
                ImportOptions.DEFAULTS));
        org.linemass.geometry.Straight s = (org.linemass.geometry.Straight) d.modelSpace().segments().get(0);
        // closed form: (1,0,0) to (4,4,0) has length 5
        assertEquals(5, s.length(), 1e-12);
    }

    @Test
    void depthLimitIsAnOption() throws Exception {
        Dxf dxf = blocks(0, "BLOCK", 2, "A", 0, "INSERT", 2, "B", 0, "ENDBLK", 0, "BLOCK", 2, "B", 0, "INSERT", 2, "C",
                0, "ENDBLK", 0, "BLOCK", 2, "C", 0, "LINE", 11, 1, 0, "ENDBLK").entities().add(0, "INSERT", 2, "A").end();
        assertTrue(dxf.read().notes().stream().noneMatch(ImportNote::skippedGeometry), "3 levels are within 64");
        ImportOptions two = new ImportOptions(Optional.empty(), 2, 1 << 20, 1000, 1000);
        assertEquals("block 'C' would be nested deeper than the limit of 2 levels", skipped(dxf, two).message());
    }

    @Test
    void carriageReturnOnlyLineEnds_areNotADxf() {
        assertEquals("t.dxf:1: expected a group code (an integer), got '0?SECTION?2?ENTITIES?0?ENDSEC?0?EOF'",
                fails(raw("0\rSECTION\r2\rENTITIES\r0\rENDSEC\r0\rEOF\r")));
    }

    @Test
    void blocksAfterEntitiesAndTwoEntitySections_areFine() throws Exception {
        Drawing d = Dxf.create().entities().add(0, "INSERT", 2, "LATE").add(0, "ENDSEC").entities()
                .add(0, "LINE", 11, 2).add(0, "ENDSEC").add(0, "SECTION", 2, "BLOCKS", 0, "BLOCK", 2, "LATE",
                        0, "LINE", 11, 1, 0, "ENDBLK").end().read();
        assertEquals(1, d.modelSpace().inserts().size());
        assertEquals(1, d.modelSpace().segments().size());
        assertTrue(d.notes().stream().noneMatch(ImportNote::skippedGeometry));
    }

    @Test
    void absurdLineLimit_isBoundedNotAllocated(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("l.dxf");
        Files.write(f, Dxf.create().entities().add(0, "LINE", 11, 1).end().ascii());
        ImportOptions huge = new ImportOptions(Optional.empty(), 64, Integer.MAX_VALUE, 1000, 1000);
        assertEquals(1, DxfImporter.read(f, huge).modelSpace().segments().size());
    }

    @Test
    void tenMegabyteLine() {
        char[] big = new char[10 << 20];
        Arrays.fill(big, 'w');
        // a value the importer keeps (a layer name); the text of a TEXT is stepped over unread
        Dxf dxf = Dxf.create().entities().add(0, "LINE", 8, new String(big)).end();
        assertEquals("t.dxf:8: LINE: line longer than 1048576 bytes", fails(dxf));
    }

    @Test
    void giantCommentFromFile_isSteppedOverBeyondTheLineLimit(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("c.dxf");
        char[] big = new char[50_000];
        Arrays.fill(big, 'c');
        Files.write(f, raw("999\n" + new String(big) + "\n0\nSECTION\n2\nENTITIES\n0\nLINE\n11\n1\n0\nENDSEC\n"
                + "0\nEOF\n"));
        // a comment is never kept, so a line limit of 1000 does not apply to it
        Drawing d = DxfImporter.read(f, new ImportOptions(Optional.empty(), 64, 1000, 1000, 1000));
        assertEquals(1, d.modelSpace().segments().size());
        assertEquals(7, d.modelSpace().segments().get(0).source().line(), "line numbers count the comment's lines");
    }

    @Test
    void binaryTruncated_reportsByteOffset() {
        byte[] full = Dxf.create().entities().add(0, "LINE", 5, "A", 10, 1.0, 20, 2.0).end().binary(true);
        // sentinel 22 + (2+8 SECTION) + (2+9 ENTITIES) + (2+5 LINE) + (2+2 handle) = 54; 10 at byte 54, its value at 56
        byte[] cut = Arrays.copyOf(full, 60);
        assertEquals("t.dxf:byte 54: LINE (handle A): file ends where a 8-byte real for group code 10 was expected",
                fails(cut));
    }

    @Test
    void blockWithoutEndblk() {
        assertEquals("t.dxf:11: ENDSEC: expected '0 ENDBLK' to close block 'A'",
                fails(blocks(0, "BLOCK", 2, "A", 0, "LINE").entities().end()));
    }

    @Test
    void recordBetweenSections() {
        assertEquals("t.dxf:7: LINE: expected '0 SECTION' or '0 EOF' between sections",
                fails(Dxf.create().add(0, "SECTION", 2, "X", 0, "ENDSEC", 0, "LINE", 0, "EOF")));
    }

    @Test
    void missingFile(@TempDir Path dir) {
        Path f = dir.resolve("none.dxf");
        assertEquals(f + ": file not found",
                assertThrows(DxfInputException.class, () -> DxfImporter.read(f, ImportOptions.DEFAULTS)).getMessage());
    }
}
